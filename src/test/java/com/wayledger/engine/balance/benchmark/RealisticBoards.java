package com.wayledger.engine.balance.benchmark;

import com.wayledger.engine.Phase;
import com.wayledger.engine.balance.BalanceItem;
import com.wayledger.engine.balance.BalanceProblem;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Generated benchmark boards (invented demo data, not measurements): 72 single-phase circuits on a
 * 24-way three-phase board, 24 positions per line, all full, in a random current arrangement. Mix:
 * 40 % lighting 1–6 A, 35 % socket circuits 8–20 A, 15 % heaters 8–13 A, 10 % cookers 15–30 A, each
 * demand uniform in its range to 0.01 A.
 */
public final class RealisticBoards {

  public static final long SEED = 20_260_212L;
  public static final int CIRCUITS = 72;
  public static final int POSITIONS_PER_LINE = 24;

  private RealisticBoards() {}

  public static List<BalanceProblem> generate(int count) {
    Random random = new Random(SEED);
    List<BalanceProblem> boards = new ArrayList<>();
    for (int b = 0; b < count; b++) {
      boards.add(board(random));
    }
    return boards;
  }

  static BalanceProblem board(Random random) {
    List<Phase> slots = new ArrayList<>();
    for (Phase phase : Phase.values()) {
      for (int w = 0; w < POSITIONS_PER_LINE; w++) {
        slots.add(phase);
      }
    }
    Collections.shuffle(slots, random);
    int[] nextWay = new int[3];
    List<BalanceItem> items = new ArrayList<>();
    for (int i = 0; i < CIRCUITS; i++) {
      double roll = random.nextDouble();
      String kind;
      double low;
      double high;
      if (roll < 0.40) {
        kind = "Lighting";
        low = 1;
        high = 6;
      } else if (roll < 0.75) {
        kind = "Sockets";
        low = 8;
        high = 20;
      } else if (roll < 0.90) {
        kind = "Heater";
        low = 8;
        high = 13;
      } else {
        kind = "Cooker";
        low = 15;
        high = 30;
      }
      double amps = Math.round((low + random.nextDouble() * (high - low)) * 100) / 100.0;
      Phase phase = slots.get(i);
      items.add(
          new BalanceItem(
              i + 1, kind + " " + (i + 1), amps, phase, ++nextWay[phase.ordinal()], true));
    }
    Map<Phase, Integer> positions = new EnumMap<>(Phase.class);
    Map<Phase, List<Integer>> free = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      positions.put(phase, POSITIONS_PER_LINE);
      free.put(phase, List.of());
    }
    return new BalanceProblem(items, Map.of(), positions, free, 10.0, true);
  }
}
