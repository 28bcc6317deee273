package com.wayledger.engine.nec;

import com.wayledger.engine.SupplySystem;

/**
 * What the NEC checks of one circuit need from around it: the supply, whether its panelboard serves
 * a dwelling unit, the available fault current at the panelboard and the feeders' voltage drop from
 * the origin.
 *
 * @param system the supply's line geometry
 * @param u0 voltage line to neutral, V
 * @param dwelling whether the panelboard is recorded as serving a dwelling unit
 * @param availableFaultKiloAmps available fault current at the panelboard, kA; null when not known
 * @param faultBasis where that figure comes from, in words ("recorded at the panelboard")
 * @param feederDropPercent the feeders' voltage drop from the origin to the panelboard, %; null
 *     when not known
 * @param feederMissing what is missing for the feeders' drop, when it is not known
 * @param feederNote how the feeders' drop was worked out
 */
public record CircuitContext(
    SupplySystem system,
    double u0,
    boolean dwelling,
    Double availableFaultKiloAmps,
    String faultBasis,
    Double feederDropPercent,
    String feederMissing,
    String feederNote) {

  /** A context with nothing known beyond the supply. */
  public static CircuitContext of(SupplySystem system, double u0) {
    return new CircuitContext(
        system, u0, false, null, "", null, "feeder conductors up to the origin", "");
  }
}
