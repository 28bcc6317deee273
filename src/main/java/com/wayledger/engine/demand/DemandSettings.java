package com.wayledger.engine.demand;

/**
 * Assumptions behind a demand evaluation, echoed in every result so each figure states what it
 * rests on.
 *
 * @param nominalVoltageVolts U0, line to neutral, used when the site gives no supply voltage, V
 * @param unbalanceLimitPercent unbalance limit used when a board gives none (a limit of 0 or less),
 *     %
 * @param fallbackMethodKey diversity method used when neither the board nor the site names one
 * @param coincidenceFactor factor between boards used when a board gives none in (0, 1]
 */
public record DemandSettings(
    double nominalVoltageVolts,
    double unbalanceLimitPercent,
    String fallbackMethodKey,
    double coincidenceFactor) {

  /** U0 of a European low-voltage supply (IEC 60038: 230/400 V). */
  public static final double DEFAULT_NOMINAL_VOLTAGE_VOLTS = 230.0;

  /**
   * Unbalance limit used when a board states none (common practice: phase currents within 10 % of
   * their mean).
   */
  public static final double DEFAULT_UNBALANCE_LIMIT_PERCENT = 10.0;

  /** With no method chosen anywhere the engine applies no diversity, the safe side. */
  public static final String DEFAULT_FALLBACK_METHOD_KEY = DiversityMethods.NONE;

  /** Without a stated coincidence factor a sub-board's demand reaches its parent whole. */
  public static final double DEFAULT_COINCIDENCE_FACTOR = 1.0;

  public static final DemandSettings DEFAULTS =
      new DemandSettings(
          DEFAULT_NOMINAL_VOLTAGE_VOLTS,
          DEFAULT_UNBALANCE_LIMIT_PERCENT,
          DEFAULT_FALLBACK_METHOD_KEY,
          DEFAULT_COINCIDENCE_FACTOR);
}
