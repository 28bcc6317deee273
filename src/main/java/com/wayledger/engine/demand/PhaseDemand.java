package com.wayledger.engine.demand;

import com.wayledger.engine.Phase;

/**
 * Demand on one line of a board's incomer.
 *
 * @param phase the line
 * @param demandWatts P, W
 * @param demandVars Q, var
 * @param currentAmps |S|/U0, A
 * @param headroomAmps incomer rating In minus the current, A (negative when overloaded); null when
 *     the incomer rating is not known
 * @param headroomKilowatts the headroom as active power at unity power factor, U0·headroom/1000,
 *     kW; null when the incomer rating is not known
 * @param loadingPercent the current over the rating that trips the incomer (Ir for a moulded-case
 *     breaker with its setting recorded, In otherwise), %; null when that rating is not known
 * @param connectedCurrentAmps connected load on the line before diversity, |S|/U0 of the circuits'
 *     connected power (a three-pole way a third on each line, a feeder with its sub-board's), A
 */
public record PhaseDemand(
    Phase phase,
    double demandWatts,
    double demandVars,
    double currentAmps,
    Double headroomAmps,
    Double headroomKilowatts,
    Double loadingPercent,
    double connectedCurrentAmps) {

  /** |S|, VA. */
  public double demandVoltAmperes() {
    return Math.hypot(demandWatts, demandVars);
  }

  /** cos φ of the phase's demand; 1 when there is none. */
  public double powerFactor() {
    double apparent = demandVoltAmperes();
    return apparent > 0 ? demandWatts / apparent : 1.0;
  }
}
