package com.wayledger.engine.protection.cable;

/**
 * A cable's current-carrying capacity in its installed conditions: Iz = It · Ca · Cg · Ci.
 *
 * @param tabulatedAmps It from the table for the installation method and loaded conductors, A
 * @param ambientFactor Ca
 * @param groupingFactor Cg
 * @param thermalInsulationFactor Ci
 */
public record CableRating(
    double tabulatedAmps,
    double ambientFactor,
    double groupingFactor,
    double thermalInsulationFactor) {

  /** Iz, amperes. */
  public double capacityAmps() {
    return tabulatedAmps * ambientFactor * groupingFactor * thermalInsulationFactor;
  }
}
