package com.wayledger.engine.demand;

import com.wayledger.engine.PhasePosition;

/**
 * Demand figures of one circuit.
 *
 * @param circuitId the circuit's id
 * @param wayNumber its way number
 * @param description what it feeds
 * @param position the line(s) it occupies as evaluated (a single-pole circuit on a single-phase
 *     board counts as L1); null when not assessed for want of a position
 * @param notAssessedReason what is missing when the circuit could not be assessed; null when
 *     assessed. A circuit not assessed contributes nothing to the board's figures.
 * @param connectedWatts P of the nameplate loads, sub-board connected load included, W
 * @param connectedVars Q of the nameplate loads, sub-board connected load included, var
 * @param connectedCurrentAmps Ib before any diversity: |S|/U0, or |S|/(3·U0) per line for three
 *     poles, A
 * @param designCurrentAmps Ib after the method's within-circuit rules (e.g. the cooker allowance),
 *     with a fed sub-board's demand, A; for a three-pole way feeding a three-phase sub-board, the
 *     heaviest of its three line currents (the sub-board's lines after its coincidence factor)
 * @param demandWatts P this circuit adds to the board after all diversity, W
 * @param demandVars Q this circuit adds to the board after all diversity, var
 * @param feedsBoardId the sub-board fed, or null
 * @param subBoardDemandVoltAmperes |S| of the sub-board's demand carried by this circuit after the
 *     sub-board's coincidence factor, VA
 */
public record CircuitDemand(
    long circuitId,
    int wayNumber,
    String description,
    PhasePosition position,
    String notAssessedReason,
    double connectedWatts,
    double connectedVars,
    double connectedCurrentAmps,
    double designCurrentAmps,
    double demandWatts,
    double demandVars,
    Long feedsBoardId,
    double subBoardDemandVoltAmperes) {

  public boolean isAssessed() {
    return notAssessedReason == null;
  }

  /** |S| of the connected load, VA. */
  public double connectedVoltAmperes() {
    return Math.hypot(connectedWatts, connectedVars);
  }

  /** |S| of the demand after diversity, VA. */
  public double demandVoltAmperes() {
    return Math.hypot(demandWatts, demandVars);
  }
}
