package com.wayledger.loadlog;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethodCatalog;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.system.ChangeKind;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Rebuilds a board at every logged change from the log's snapshots and evaluates it with the demand
 * engine.
 *
 * <p>The state before the first entry is the baseline: a circuit whose first entry is an edit or
 * removal existed before logging began, so its "before" snapshot is in the baseline; likewise the
 * board header. Then each entry's "after" snapshot replaces the circuit (or header), and a removal
 * drops it. The board is evaluated on its own (sub-boards' demand is not carried onto the ways
 * feeding them), with today's supply and diversity catalogue: the log records the schedule, not the
 * site's supply. A dwelling board's NEC dwelling inputs (floor area, small-appliance and laundry
 * circuits) are replayed from their own entries (snapshots under a "dwelling" key): before the
 * first such entry they are that entry's "before" (none, when it added them). A log whose dwelling
 * entries carry no snapshots (written before they did) says nothing of them: today's are taken at
 * every point.
 */
final class HistoryReplay {

  private HistoryReplay() {}

  /**
   * @param entries the board's entries, oldest first
   * @param currentHeader the board's header now, used when no board entry carries one
   */
  static List<HistoryPoint> replay(
      List<ChangeLogEntry> entries,
      BoardSpec currentHeader,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey) {
    return replay(
        entries,
        currentHeader,
        supply,
        methods,
        siteDefaultMethodKey,
        com.wayledger.engine.demand.DwellingParameters.UNKNOWN);
  }

  /**
   * @param dwelling the board's NEC dwelling inputs as they now stand; {@code UNKNOWN} for a board
   *     without them; used where the log has no dwelling snapshots
   */
  static List<HistoryPoint> replay(
      List<ChangeLogEntry> entries,
      BoardSpec currentHeader,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey,
      com.wayledger.engine.demand.DwellingParameters dwelling) {
    BoardSpec header = null;
    Map<Long, CircuitSpec> circuits = new LinkedHashMap<>();
    Set<Long> seen = new HashSet<>();
    boolean boardSeen = false;
    com.wayledger.engine.demand.DwellingParameters inputs = dwelling;
    boolean dwellingSeen = false;
    for (ChangeLogEntry entry : entries) {
      if (isDwelling(entry)) {
        if (!dwellingSeen) {
          inputs = Snapshots.dwelling(entry.before());
          dwellingSeen = true;
        }
      } else if (isManyCircuits(entry)) {
        for (CircuitSpec moved : Snapshots.circuits(entry.before())) {
          if (seen.add(moved.id())) {
            circuits.put(moved.id(), moved);
          }
        }
        for (CircuitSpec added : Snapshots.circuits(entry.after())) {
          seen.add(added.id());
        }
      } else if (entry.circuitId() == null) {
        if (!boardSeen && entry.kind() != ChangeKind.BOARD_ADDED && entry.before() != null) {
          header = Snapshots.board(entry.before());
        }
        boardSeen = true;
      } else if (seen.add(entry.circuitId())
          && entry.kind() != ChangeKind.CIRCUIT_ADDED
          && entry.before() != null) {
        circuits.put(entry.circuitId(), Snapshots.circuit(entry.before()));
      }
    }
    if (header == null) {
      header = currentHeader;
    }
    List<HistoryPoint> points = new ArrayList<>();
    for (ChangeLogEntry entry : entries) {
      boolean removed = false;
      if (isDwelling(entry)) {
        inputs = Snapshots.dwelling(entry.after());
      } else if (isManyCircuits(entry)) {
        List<CircuitSpec> after = Snapshots.circuits(entry.after());
        Set<Long> kept = new HashSet<>();
        after.forEach(circuit -> kept.add(circuit.id()));
        for (CircuitSpec gone : Snapshots.circuits(entry.before())) {
          if (!kept.contains(gone.id())) {
            circuits.remove(gone.id()); // removed by an import
          }
        }
        after.forEach(circuit -> circuits.put(circuit.id(), circuit));
      } else if (entry.circuitId() == null) {
        if (entry.after() != null) {
          header = Snapshots.board(entry.after());
        } else if (entry.kind() == ChangeKind.BOARD_REMOVED) {
          removed = true;
        }
      } else if (entry.after() == null) {
        circuits.remove(entry.circuitId());
      } else {
        circuits.put(entry.circuitId(), Snapshots.circuit(entry.after()));
      }
      Map<Phase, Double> currents =
          removed || header == null
              ? Map.of()
              : currents(
                  com.wayledger.board.ScheduleMapper.replayed(header, circuits.values()),
                  supply,
                  methods,
                  siteDefaultMethodKey,
                  inputs);
      points.add(
          new HistoryPoint(
              entry.id(),
              entry.effectiveAt(),
              entry.username(),
              entry.kind(),
              entry.summary(),
              entry.reason(),
              currents,
              removed,
              entry.isBackDated()));
    }
    return points;
  }

  /** An entry about the board's dwelling inputs, with their snapshots. */
  private static boolean isDwelling(ChangeLogEntry entry) {
    return entry.circuitId() == null && Snapshots.isDwelling(entry.before(), entry.after());
  }

  /**
   * An entry about many circuits at once (a balancing plan, an import): its snapshots list the
   * circuits before (changed and removed) and after (added and changed).
   */
  private static boolean isManyCircuits(ChangeLogEntry entry) {
    return entry.kind() == ChangeKind.BALANCING_APPLIED || entry.kind() == ChangeKind.IMPORT;
  }

  static Map<Phase, Double> currents(
      BoardSpec board,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey,
      com.wayledger.engine.demand.DwellingParameters dwelling) {
    BoardDemand demand =
        DemandEngine.evaluateBoard(
            board,
            supply,
            methods,
            siteDefaultMethodKey,
            com.wayledger.engine.demand.DemandSettings.DEFAULTS,
            dwelling);
    Map<Phase, Double> currents = new EnumMap<>(Phase.class);
    for (PhaseDemand phase : demand.phases()) {
      currents.put(phase.phase(), phase.currentAmps());
    }
    return currents;
  }
}
