package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/** Seeded random boards for property tests: small enough for the exhaustive oracle when asked. */
final class RandomBoards {

  private RandomBoards() {}

  /**
   * A board with the given number of circuits, some locked, some fixed load, and (on about half the
   * boards) tight position limits with a few free ways. Demands are random to 0.01 A; about a third
   * of the boards use whole amps drawn from a short list, so equal circuits and ties are common.
   */
  static BalanceProblem board(Random random, int circuits) {
    boolean wholeAmps = random.nextInt(3) == 0;
    List<BalanceItem> items = new ArrayList<>();
    int[] ways = new int[3];
    int[] movableOn = new int[3];
    for (int i = 0; i < circuits; i++) {
      Phase phase = Phase.values()[random.nextInt(3)];
      double amps =
          wholeAmps
              ? 2 + random.nextInt(6) * 2
              : Math.round((0.5 + random.nextDouble() * 29.5) * 100) / 100.0;
      boolean movable = random.nextInt(7) != 0;
      if (movable) {
        movableOn[phase.ordinal()]++;
      }
      items.add(
          new BalanceItem(100 + i, "Circuit " + i, amps, phase, ++ways[phase.ordinal()], movable));
    }
    Map<Phase, Double> fixed = new EnumMap<>(Phase.class);
    if (random.nextBoolean()) {
      for (Phase phase : Phase.values()) {
        fixed.put(phase, Math.round(random.nextDouble() * 2000) / 100.0);
      }
    }
    Map<Phase, List<Integer>> free = null;
    if (random.nextBoolean()) {
      free = new EnumMap<>(Phase.class);
      for (Phase phase : Phase.values()) {
        List<Integer> freeWays = new ArrayList<>();
        int count = random.nextInt(3);
        for (int f = 0; f < count; f++) {
          freeWays.add(++ways[phase.ordinal()]);
        }
        free.put(phase, freeWays);
      }
    }
    double limit = 2 + random.nextInt(19);
    return new BalanceProblem(items, fixed, null, free, limit, true);
  }
}
