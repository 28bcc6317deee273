package com.wayledger.engine;

/**
 * The supply at a site's origin.
 *
 * @param earthingSystem earthing arrangement
 * @param nominalVoltageToEarthVolts U0, line to earth (230 V typical)
 * @param phases 1 or 3
 * @param frequencyHertz 50 or 60
 * @param externalLoopImpedanceOhms Ze at the origin; null when unknown
 * @param prospectiveFaultCurrentKiloAmps prospective fault current at the origin; null when unknown
 * @param supplyFuseRatingAmps rating of the supplier's cut-out fuse; null when unknown
 */
public record SupplySpec(
    EarthingSystem earthingSystem,
    double nominalVoltageToEarthVolts,
    int phases,
    double frequencyHertz,
    Double externalLoopImpedanceOhms,
    Double prospectiveFaultCurrentKiloAmps,
    Double supplyFuseRatingAmps) {

  /** Line-to-line voltage UL = √3·U0 of a three-phase supply. */
  public double lineVoltageVolts() {
    return Math.sqrt(3.0) * nominalVoltageToEarthVolts;
  }
}
