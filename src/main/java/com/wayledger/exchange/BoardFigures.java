package com.wayledger.exchange;

import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.result.Finding;
import java.util.HashMap;
import java.util.Map;

/**
 * The engine's figures for one board, rearranged for a sheet whose totals are live formulas: for
 * each circuit the factors that turn its own connected load into its demand and the sub-board whose
 * load its way carries, and for the board what the sheet's rows cannot hold (an allowance carried
 * by no way).
 */
final class BoardFigures {

  /**
   * Figures of one circuit; factors are 1 where there is no connected load to scale.
   *
   * @param carriedBoard the sub-board whose demand the engine carries on this way (times its
   *     coincidence factor); null when the way carries none
   */
  record CircuitFigures(
      double diversityActive,
      double diversityReactive,
      double ownConnectedWatts,
      double ownConnectedVars,
      double connectedCurrentAmps,
      double designCurrentAmps,
      boolean feedsSubBoard,
      int problemFindings,
      boolean assessed,
      BoardDemand carriedBoard) {}

  private final BoardDemand demand;
  private final Map<Long, CircuitFigures> byCircuit = new HashMap<>();

  BoardFigures(BoardEntry board, SiteDemand site, SiteFindings findings) {
    this.demand = site.board(board.id());
    Map<Long, Integer> problems = problemCounts(board.id(), findings);
    if (demand == null) {
      return;
    }
    for (CircuitDemand circuit : demand.circuits()) {
      BoardDemand child =
          circuit.feedsBoardId() == null ? null : site.board(circuit.feedsBoardId());
      double childWatts = 0;
      double childVars = 0;
      double childConnectedWatts = 0;
      double childConnectedVars = 0;
      // the engine carries a sub-board's load on one way only (a second way feeding the same
      // board carries nothing); that way's connected load then includes the sub-board's
      boolean carried = child != null && circuit.isAssessed() && carries(circuit, child);
      if (carried) {
        double k = child.coincidenceFactor();
        childWatts = child.demandWatts() * k;
        childVars = child.demandVars() * k;
        childConnectedWatts = child.connectedWatts();
        childConnectedVars = child.connectedVars();
      }
      double ownConnectedWatts = circuit.connectedWatts() - childConnectedWatts;
      double ownConnectedVars = circuit.connectedVars() - childConnectedVars;
      double ownDemandWatts = circuit.demandWatts() - childWatts;
      double ownDemandVars = circuit.demandVars() - childVars;
      byCircuit.put(
          circuit.circuitId(),
          new CircuitFigures(
              ratio(ownDemandWatts, ownConnectedWatts),
              ratio(ownDemandVars, ownConnectedVars),
              ownConnectedWatts,
              ownConnectedVars,
              circuit.connectedCurrentAmps(),
              circuit.designCurrentAmps(),
              child != null,
              problems.getOrDefault(circuit.circuitId(), 0),
              circuit.isAssessed(),
              carried ? child : null));
    }
  }

  /** Whether the engine counted the sub-board on this way (its demand or its connected load). */
  private static boolean carries(CircuitDemand circuit, BoardDemand child) {
    if (circuit.subBoardDemandVoltAmperes() > 0) {
      return true;
    }
    double childConnected = Math.hypot(child.connectedWatts(), child.connectedVars());
    return childConnected > 0
        && Math.hypot(circuit.connectedWatts(), circuit.connectedVars()) >= childConnected - 1e-6;
  }

  private static double ratio(double demand, double connected) {
    return Math.abs(connected) > 1e-9 ? demand / connected : 1.0;
  }

  private static Map<Long, Integer> problemCounts(long boardId, SiteFindings findings) {
    Map<Long, Integer> counts = new HashMap<>();
    if (findings == null) {
      return counts;
    }
    for (BoardFindings board : findings.boards()) {
      if (board.boardId() != boardId) {
        continue;
      }
      for (CircuitFindings circuit : board.circuits()) {
        counts.put(
            circuit.circuitId(),
            (int) circuit.findings().stream().filter(Finding::isProblem).count());
      }
    }
    return counts;
  }

  /** The engine's board figures; null when the engine did not evaluate the board. */
  BoardDemand demand() {
    return demand;
  }

  CircuitFigures circuit(Long circuitId) {
    return circuitId == null ? null : byCircuit.get(circuitId);
  }

  /** Demand carried by no way (an NEC dwelling allowance), per line, W at unity power factor. */
  double allowanceWattsPerLine() {
    return demand == null || demand.lines() == 0
        ? 0
        : demand.allowanceVoltAmperes() / demand.lines();
  }
}
