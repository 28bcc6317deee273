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
 */
public record PhaseDemand(
    Phase phase,
    double demandWatts,
    double demandVars,
    double currentAmps,
    Double headroomAmps,
    Double headroomKilowatts) {

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
