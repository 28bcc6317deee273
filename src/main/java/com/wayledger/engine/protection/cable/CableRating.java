package com.wayledger.engine.protection.cable;

/**
 * A cable's current-carrying capacity in its installed conditions: Iz = It · Ca · Cg · Ci.
 *
 * @param tabulatedAmps It from the table for the installation method and loaded conductors, A
 * @param ambientFactor Ca
 * @param groupingFactor Cg
 * @param thermalInsulationFactor Ci
 * @param assumption an input taken on the safe side because it was not recorded, in words; null
 *     when every input was recorded
 */
public record CableRating(
    double tabulatedAmps,
    double ambientFactor,
    double groupingFactor,
    double thermalInsulationFactor,
    String assumption) {

  /** A rating resting on recorded inputs only. */
  public CableRating(
      double tabulatedAmps,
      double ambientFactor,
      double groupingFactor,
      double thermalInsulationFactor) {
    this(tabulatedAmps, ambientFactor, groupingFactor, thermalInsulationFactor, null);
  }

  /** The same rating with an assumption named; null keeps none. */
  public CableRating assuming(String what) {
    return new CableRating(
        tabulatedAmps, ambientFactor, groupingFactor, thermalInsulationFactor, what);
  }

  /** Iz, amperes. */
  public double capacityAmps() {
    return tabulatedAmps * ambientFactor * groupingFactor * thermalInsulationFactor;
  }
}
