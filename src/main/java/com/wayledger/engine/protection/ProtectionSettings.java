package com.wayledger.engine.protection;

/**
 * The assumptions every protection result states. Echoed in {@link SiteFindings} so each figure
 * carries them.
 *
 * @param supplyOwnership public or private supply (chooses the default voltage-drop limits)
 * @param lightingDropLimitPercent largest voltage drop from the origin for lighting circuits, %
 * @param otherDropLimitPercent largest voltage drop from the origin for other circuits, %
 * @param minimumVoltageFactor Cmin, the factor for the lowest supply voltage in the Zs limit (0.95)
 * @param measuredLoopImpedanceFraction fraction of the tabulated Zs limit a measured (cold) Zs is
 *     compared with
 * @param touchVoltageLimitVolts touch voltage limit of the TT condition RA·IΔn ≤ 50 V, V
 * @param mccbInstantaneousMultiple Ii/In assumed for an MCCB whose settings are not recorded
 * @param socketRcdMaxRatedAmps socket-outlet circuits up to this In need 30 mA additional
 *     protection, A
 * @param socketRcdMaxResidualMilliAmps the IΔn that counts as additional protection, mA
 * @param finalCircuitMaxRatedAmps final circuits up to this In get the Table 41.1 disconnection
 *     time, A
 */
public record ProtectionSettings(
    SupplyOwnership supplyOwnership,
    double lightingDropLimitPercent,
    double otherDropLimitPercent,
    double minimumVoltageFactor,
    double measuredLoopImpedanceFraction,
    double touchVoltageLimitVolts,
    double mccbInstantaneousMultiple,
    double socketRcdMaxRatedAmps,
    double socketRcdMaxResidualMilliAmps,
    double finalCircuitMaxRatedAmps) {

  /** BS 7671 Appendix 12 Table 12A, public supply. */
  public static final double DEFAULT_PUBLIC_LIGHTING_DROP_PERCENT = 3.0;

  public static final double DEFAULT_PUBLIC_OTHER_DROP_PERCENT = 5.0;

  /** BS 7671 Appendix 12 Table 12A, private supply. */
  public static final double DEFAULT_PRIVATE_LIGHTING_DROP_PERCENT = 6.0;

  public static final double DEFAULT_PRIVATE_OTHER_DROP_PERCENT = 8.0;

  /** BS 7671 411.4.4 / Table 41.3 note: Cmin = 0.95. */
  public static final double DEFAULT_MINIMUM_VOLTAGE_FACTOR = 0.95;

  /**
   * Rule of thumb for comparing a Zs measured at ambient temperature (BS 7671 Appendix 3 approach).
   */
  public static final double DEFAULT_MEASURED_LOOP_IMPEDANCE_FRACTION = 0.80;

  /** BS 7671 411.5.3: RA·IΔn ≤ 50 V. */
  public static final double DEFAULT_TOUCH_VOLTAGE_LIMIT_VOLTS = 50.0;

  /** A typical fixed thermal-magnetic MCCB pick-up (common practice). */
  public static final double DEFAULT_MCCB_INSTANTANEOUS_MULTIPLE = 10.0;

  /** BS 7671 411.3.3: socket-outlets rated up to 32 A. */
  public static final double DEFAULT_SOCKET_RCD_MAX_RATED_AMPS = 32.0;

  public static final double DEFAULT_SOCKET_RCD_MAX_RESIDUAL_MILLIAMPS = 30.0;

  /** BS 7671 411.3.2.2: Table 41.1 times apply to final circuits up to 63 A. */
  public static final double DEFAULT_FINAL_CIRCUIT_MAX_RATED_AMPS = 63.0;

  /** The defaults for a public supply. */
  public static final ProtectionSettings DEFAULTS = defaults(SupplyOwnership.PUBLIC);

  /** The defaults, with the voltage-drop limits of the given supply ownership. */
  public static ProtectionSettings defaults(SupplyOwnership ownership) {
    boolean pub = ownership == SupplyOwnership.PUBLIC;
    return new ProtectionSettings(
        ownership,
        pub ? DEFAULT_PUBLIC_LIGHTING_DROP_PERCENT : DEFAULT_PRIVATE_LIGHTING_DROP_PERCENT,
        pub ? DEFAULT_PUBLIC_OTHER_DROP_PERCENT : DEFAULT_PRIVATE_OTHER_DROP_PERCENT,
        DEFAULT_MINIMUM_VOLTAGE_FACTOR,
        DEFAULT_MEASURED_LOOP_IMPEDANCE_FRACTION,
        DEFAULT_TOUCH_VOLTAGE_LIMIT_VOLTS,
        DEFAULT_MCCB_INSTANTANEOUS_MULTIPLE,
        DEFAULT_SOCKET_RCD_MAX_RATED_AMPS,
        DEFAULT_SOCKET_RCD_MAX_RESIDUAL_MILLIAMPS,
        DEFAULT_FINAL_CIRCUIT_MAX_RATED_AMPS);
  }

  /** The voltage-drop limit for a lighting or other circuit, %. */
  public double voltageDropLimitPercent(boolean lighting) {
    return lighting ? lightingDropLimitPercent : otherDropLimitPercent;
  }
}
