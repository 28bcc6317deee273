package com.wayledger.board;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Lays a board's circuits out as schedule rows in way order, one per position. */
final class ScheduleRows {

  private ScheduleRows() {}

  static List<ScheduleRow> of(Board board, List<Circuit> circuits) {
    Map<String, Circuit> bySlot = new HashMap<>();
    for (Circuit circuit : circuits) {
      for (Phase phase : circuit.getPosition().phases()) {
        bySlot.put(circuit.getWayNumber() + ":" + phase, circuit);
      }
    }
    List<Phase> lines = board.isThreePhase() ? List.of(Phase.values()) : List.of(Phase.L1);
    List<ScheduleRow> rows = new ArrayList<>();
    for (int way = 1; way <= board.getWayCount(); way++) {
      for (Phase phase : lines) {
        Circuit circuit = bySlot.get(way + ":" + phase);
        boolean threePole = circuit != null && !circuit.getPosition().isSinglePole();
        boolean continuation = threePole && phase != Phase.L1;
        rows.add(new ScheduleRow(way, phase, circuit, continuation, threePole ? 3 : 1));
      }
    }
    return rows;
  }
}
