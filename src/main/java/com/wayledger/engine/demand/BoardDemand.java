package com.wayledger.engine.demand;

import com.wayledger.engine.Phase;
import com.wayledger.engine.SupplySystem;
import java.util.List;

/**
 * Demand of one board at its incomer, with the settings it rests on.
 *
 * @param boardId the board's id
 * @param reference the board's name on site
 * @param lines 1 or 3
 * @param nominalVoltageVolts U0 used, V
 * @param methodKey key of the diversity method applied
 * @param methodName its name
 * @param methodSource where its figures come from
 * @param coincidenceFactor factor applied to this board's demand as seen by its parent
 * @param circuits each circuit's figures, in way order
 * @param groups how each line of the method worked out
 * @param phases demand per line: L1 only on a single-phase board, L1 to L3 on a three-phase one
 * @param connectedWatts P of the assessed nameplate loads, sub-boards' connected load included, W
 * @param connectedVars Q of the same, var
 * @param demandWatts total P after diversity, W
 * @param demandVars total Q after diversity, var
 * @param allowanceVoltAmperes part of the demand not carried by any circuit (an NEC dwelling unit
 *     load with no lighting or socket circuits to carry it), spread evenly over the lines at unity
 *     power factor, VA
 * @param neutralCurrentAmps neutral current, A (on a single-phase board, the line current)
 * @param unbalancePercent NEMA MG-1 unbalance of the line currents over the board's lines (three
 *     phases, or the two lines A and B of a split-phase board), %; null on a single-line board
 * @param unbalanceLimitPercent the limit it is compared with, %
 * @param incomer highest phase current against the incomer device rating In
 * @param busbar against the busbar rating
 * @param supplyFuse against the supply fuse (origin boards only)
 * @param notAssessed inputs missing, each saying what was left out of the figures; empty when
 *     complete
 * @param notes other facts about how the figures were made
 * @param system the supply system the board is on (its line angles and line-to-line voltage)
 */
public record BoardDemand(
    long boardId,
    String reference,
    int lines,
    double nominalVoltageVolts,
    String methodKey,
    String methodName,
    String methodSource,
    double coincidenceFactor,
    List<CircuitDemand> circuits,
    List<GroupDemand> groups,
    List<PhaseDemand> phases,
    double connectedWatts,
    double connectedVars,
    double demandWatts,
    double demandVars,
    double allowanceVoltAmperes,
    double neutralCurrentAmps,
    Double unbalancePercent,
    double unbalanceLimitPercent,
    RatingLoading incomer,
    RatingLoading busbar,
    RatingLoading supplyFuse,
    List<String> notAssessed,
    List<String> notes,
    SupplySystem system) {

  public BoardDemand {
    circuits = List.copyOf(circuits);
    groups = List.copyOf(groups);
    phases = List.copyOf(phases);
    notAssessed = List.copyOf(notAssessed);
    notes = List.copyOf(notes);
  }

  /** |S| of the connected load, VA. */
  public double connectedVoltAmperes() {
    return Math.hypot(connectedWatts, connectedVars);
  }

  /** |S| of the total demand, VA. */
  public double demandVoltAmperes() {
    return Math.hypot(demandWatts, demandVars);
  }

  /** The figures of one line; null when the board has no such line. */
  public PhaseDemand onPhase(Phase phase) {
    for (PhaseDemand demand : phases) {
      if (demand.phase() == phase) {
        return demand;
      }
    }
    return null;
  }

  /** Whether every input was there. */
  public boolean isComplete() {
    return notAssessed.isEmpty();
  }

  /** Whether the unbalance exceeds the limit; false when not assessed. */
  public boolean isUnbalancedBeyondLimit() {
    return unbalancePercent != null && unbalancePercent > unbalanceLimitPercent;
  }
}
