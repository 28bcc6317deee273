package com.wayledger.engine;

/**
 * The supply at a site's origin.
 *
 * @param earthingSystem earthing arrangement
 * @param nominalVoltageToEarthVolts U0, line to earth (230 V typical; 120 V or 277 V on the North
 *     American systems)
 * @param phases 1 or 3
 * @param frequencyHertz 50 or 60
 * @param externalLoopImpedanceOhms Ze at the origin; null when unknown
 * @param prospectiveFaultCurrentKiloAmps prospective fault current at the origin; null when unknown
 * @param supplyFuseRatingAmps rating of the supplier's cut-out fuse; null when unknown
 * @param system the geometry of the lines (angles, count); {@link SupplySystem#IEC_WYE} when null
 */
public record SupplySpec(
    EarthingSystem earthingSystem,
    double nominalVoltageToEarthVolts,
    int phases,
    double frequencyHertz,
    Double externalLoopImpedanceOhms,
    Double prospectiveFaultCurrentKiloAmps,
    Double supplyFuseRatingAmps,
    SupplySystem system) {

  public SupplySpec {
    if (system == null) {
      system = SupplySystem.IEC_WYE;
    }
  }

  /** An IEC supply (lines at 0°, −120°, +120°): the argument list from before supply systems. */
  public SupplySpec(
      EarthingSystem earthingSystem,
      double nominalVoltageToEarthVolts,
      int phases,
      double frequencyHertz,
      Double externalLoopImpedanceOhms,
      Double prospectiveFaultCurrentKiloAmps,
      Double supplyFuseRatingAmps) {
    this(
        earthingSystem,
        nominalVoltageToEarthVolts,
        phases,
        frequencyHertz,
        externalLoopImpedanceOhms,
        prospectiveFaultCurrentKiloAmps,
        supplyFuseRatingAmps,
        SupplySystem.IEC_WYE);
  }

  /** Line-to-line voltage UL = √3·U0 of a three-phase supply (2·U0 on a split-phase one). */
  public double lineVoltageVolts() {
    return system.lineToLineFactor() * nominalVoltageToEarthVolts;
  }
}
