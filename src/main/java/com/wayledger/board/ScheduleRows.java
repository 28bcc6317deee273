package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
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
    List<Phase> lines = List.of(Phase.values()).subList(0, board.lineCount());
    List<ScheduleRow> rows = new ArrayList<>();
    for (int way = 1; way <= board.getWayCount(); way++) {
      for (Phase phase : lines) {
        Circuit circuit = bySlot.get(way + ":" + phase);
        int poles = circuit == null ? 1 : circuit.getPosition().poles();
        // a multi-pole circuit is shown on its first line; its other lines continue it
        // (L3–L1 is shown on L1, its earlier row; L2 lies between its lines, so it spans no rows)
        Phase first =
            circuit == null || poles == 1
                ? phase
                : circuit.getPosition().phases().iterator().next();
        boolean continuation = poles > 1 && phase != first;
        int span = circuit != null && circuit.getPosition() == PhasePosition.L3_L1 ? 1 : poles;
        rows.add(new ScheduleRow(way, phase, circuit, continuation, span));
      }
    }
    return rows;
  }
}
