package com.wayledger.engine.nec;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Conduit;

/**
 * NEC Chapter 9 Table 9: AC resistance and reactance of 600 V cables, three single conductors in
 * conduit, 60 Hz, 75 °C, in ohms to neutral per 1000 ft. Values of NFPA 70 (2020 edition) from
 * memory; not read in the code book itself. Aluminium has no 14 AWG row.
 *
 * <p>The table's note 2 gives the effective impedance at a power factor other than 1 as Ze = R·cosθ
 * + X·sinθ; its own effective-Z columns are that figure at 0.85 lagging, which {@link
 * #effectiveOhmsPer1000Feet} reproduces within the table's rounding.
 */
public final class ConductorImpedance {

  /** The power factor of the table's effective-Z columns. */
  public static final double TABLE_POWER_FACTOR = 0.85;

  private static final double N = Double.NaN;

  // rows in ConductorSize order: XL PVC/aluminum conduit, XL steel conduit,
  // R copper PVC, aluminum, steel conduit, R aluminum PVC, aluminum, steel conduit
  private static final double[][] ROWS = {
    {0.058, 0.073, 3.1, 3.1, 3.1, N, N, N}, // 14
    {0.054, 0.068, 2.0, 2.0, 2.0, 3.2, 3.2, 3.2}, // 12
    {0.050, 0.063, 1.2, 1.2, 1.2, 2.0, 2.0, 2.0}, // 10
    {0.052, 0.065, 0.78, 0.78, 0.78, 1.3, 1.3, 1.3}, // 8
    {0.051, 0.064, 0.49, 0.49, 0.49, 0.81, 0.81, 0.81}, // 6
    {0.048, 0.060, 0.31, 0.31, 0.31, 0.51, 0.51, 0.51}, // 4
    {0.047, 0.059, 0.25, 0.25, 0.25, 0.40, 0.41, 0.40}, // 3
    {0.045, 0.057, 0.19, 0.20, 0.20, 0.32, 0.32, 0.32}, // 2
    {0.046, 0.057, 0.15, 0.16, 0.16, 0.25, 0.26, 0.25}, // 1
    {0.044, 0.055, 0.12, 0.13, 0.12, 0.20, 0.21, 0.20}, // 1/0
    {0.043, 0.054, 0.10, 0.10, 0.10, 0.16, 0.16, 0.16}, // 2/0
    {0.042, 0.052, 0.077, 0.082, 0.079, 0.13, 0.13, 0.13}, // 3/0
    {0.041, 0.051, 0.062, 0.067, 0.063, 0.10, 0.11, 0.10}, // 4/0
    {0.041, 0.052, 0.052, 0.057, 0.054, 0.085, 0.090, 0.086}, // 250
    {0.041, 0.051, 0.044, 0.049, 0.045, 0.071, 0.076, 0.072}, // 300
    {0.040, 0.050, 0.038, 0.043, 0.039, 0.061, 0.066, 0.063}, // 350
    {0.040, 0.049, 0.033, 0.038, 0.035, 0.054, 0.059, 0.055}, // 400
    {0.039, 0.048, 0.027, 0.032, 0.029, 0.043, 0.048, 0.045}, // 500
    {0.039, 0.048, 0.023, 0.028, 0.025, 0.036, 0.041, 0.038}, // 600
    {0.038, 0.048, 0.019, 0.024, 0.021, 0.029, 0.034, 0.031}, // 750
    {0.037, 0.046, 0.015, 0.019, 0.018, 0.023, 0.027, 0.025}, // 1000
  };

  private ConductorImpedance() {}

  /** AC resistance, Ω to neutral per 1000 ft; NaN where the table has no entry. */
  public static double resistanceOhmsPer1000Feet(
      ConductorSize size, ConductorMaterial material, Conduit conduit) {
    int base = material == ConductorMaterial.COPPER ? 2 : 5;
    return ROWS[size.ordinal()][base + conduit.ordinal()];
  }

  /** Reactance XL, Ω to neutral per 1000 ft (PVC and aluminum conduit share a column). */
  public static double reactanceOhmsPer1000Feet(ConductorSize size, Conduit conduit) {
    return ROWS[size.ordinal()][conduit == Conduit.STEEL ? 1 : 0];
  }

  /**
   * Effective impedance Ze = R·cosθ + X·sinθ at a lagging power factor (Table 9 note 2), Ω to
   * neutral per 1000 ft; NaN where the table has no entry.
   */
  public static double effectiveOhmsPer1000Feet(
      ConductorSize size, ConductorMaterial material, Conduit conduit, double powerFactor) {
    double pf = Math.max(0.0, Math.min(1.0, powerFactor));
    double sin = Math.sqrt(1.0 - pf * pf);
    return resistanceOhmsPer1000Feet(size, material, conduit) * pf
        + reactanceOhmsPer1000Feet(size, conduit) * sin;
  }

  /**
   * The conduit whose effective impedance is highest at this power factor: the one taken when the
   * conduit is not recorded (the safe side).
   */
  public static Conduit worstConduit(
      ConductorSize size, ConductorMaterial material, double powerFactor) {
    Conduit worst = Conduit.STEEL;
    for (Conduit c : Conduit.values()) {
      if (effectiveOhmsPer1000Feet(size, material, c, powerFactor)
          > effectiveOhmsPer1000Feet(size, material, worst, powerFactor) + 1e-12) {
        worst = c;
      }
    }
    return worst;
  }
}
