package com.wayledger.exchange;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.result.Finding;
import java.util.HashMap;
import java.util.Map;

/**
 * The engine's figures for one board, rearranged for a sheet whose totals are live formulas: for
 * each circuit the factors that turn its own connected load into its demand, and for the board what
 * the sheet's rows cannot hold (sub-boards' demand carried by feeding ways, an allowance carried by
 * no way).
 */
final class BoardFigures {

  /** Figures of one circuit; factors are 1 where there is no connected load to scale. */
  record CircuitFigures(
      double diversityActive,
      double diversityReactive,
      double ownConnectedWatts,
      double ownConnectedVars,
      double connectedCurrentAmps,
      double designCurrentAmps,
      boolean feedsSubBoard,
      int problemFindings,
      boolean assessed) {}

  private final BoardDemand demand;
  private final Map<Long, CircuitFigures> byCircuit = new HashMap<>();
  private final double[] carriedWatts = new double[3];
  private final double[] carriedVars = new double[3];
  private final double[] carriedConnectedWattsByLine = new double[3];
  private final double[] carriedConnectedVarsByLine = new double[3];
  private double carriedConnectedWatts;
  private double carriedConnectedVars;

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
      // the engine carries a sub-board's demand on the way it chose; that way then shows it
      boolean carried = child != null && circuit.subBoardDemandVoltAmperes() > 0;
      if (carried) {
        double k = child.coincidenceFactor();
        childWatts = child.demandWatts() * k;
        childVars = child.demandVars() * k;
        childConnectedWatts = child.connectedWatts();
        childConnectedVars = child.connectedVars();
        carryToPhases(circuit.position(), child, k);
        // connected load shares the way's lines as the board page shares it: evenly on three poles
        if (circuit.position() == PhasePosition.THREE_POLE) {
          for (int i = 0; i < 3; i++) {
            carriedConnectedWattsByLine[i] += childConnectedWatts / 3.0;
            carriedConnectedVarsByLine[i] += childConnectedVars / 3.0;
          }
        } else if (circuit.position() != null) {
          com.wayledger.engine.LinePhasors.add(
              com.wayledger.engine.LinePhasors.geometryOf(demand.lines()),
              circuit.position(),
              childConnectedWatts,
              childConnectedVars,
              carriedConnectedWattsByLine,
              carriedConnectedVarsByLine);
        }
      }
      double ownConnectedWatts = circuit.connectedWatts() - childConnectedWatts;
      double ownConnectedVars = circuit.connectedVars() - childConnectedVars;
      double ownDemandWatts = circuit.demandWatts() - childWatts;
      double ownDemandVars = circuit.demandVars() - childVars;
      carriedConnectedWatts += childConnectedWatts;
      carriedConnectedVars += childConnectedVars;
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
              circuit.isAssessed()));
    }
  }

  private void carryToPhases(PhasePosition position, BoardDemand child, double k) {
    if (position == null) {
      return;
    }
    if (position == PhasePosition.THREE_POLE && child.phases().size() == 3) {
      for (PhaseDemand phase : child.phases()) {
        carriedWatts[phase.phase().ordinal()] += phase.demandWatts() * k;
        carriedVars[phase.phase().ordinal()] += phase.demandVars() * k;
      }
    } else if (position == PhasePosition.THREE_POLE) {
      for (int i = 0; i < 3; i++) {
        carriedWatts[i] += child.demandWatts() * k / 3.0;
        carriedVars[i] += child.demandVars() * k / 3.0;
      }
    } else {
      com.wayledger.engine.LinePhasors.add(
          com.wayledger.engine.LinePhasors.geometryOf(demand.lines()),
          position,
          child.demandWatts() * k,
          child.demandVars() * k,
          carriedWatts,
          carriedVars);
    }
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

  /** Sub-boards' demand carried on the phase, after their coincidence factors, W. */
  double carriedWatts(Phase phase) {
    return carriedWatts[phase.ordinal()];
  }

  double carriedVars(Phase phase) {
    return carriedVars[phase.ordinal()];
  }

  /** Sub-boards' connected load on the line, as the board page shares it, W. */
  double carriedConnectedWatts(Phase phase) {
    return carriedConnectedWattsByLine[phase.ordinal()];
  }

  double carriedConnectedVars(Phase phase) {
    return carriedConnectedVarsByLine[phase.ordinal()];
  }

  double carriedConnectedWatts() {
    return carriedConnectedWatts;
  }

  double carriedConnectedVars() {
    return carriedConnectedVars;
  }

  /** Demand carried by no way (an NEC dwelling allowance), per line, W at unity power factor. */
  double allowanceWattsPerLine() {
    return demand == null || demand.lines() == 0
        ? 0
        : demand.allowanceVoltAmperes() / demand.lines();
  }
}
