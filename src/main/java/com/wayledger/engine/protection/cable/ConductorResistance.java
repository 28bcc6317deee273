package com.wayledger.engine.protection.cable;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.protection.data.DataTable;
import com.wayledger.engine.protection.result.Resolved;

/**
 * DC resistance of copper conductors from IEC 60228 Table 2, corrected to the insulation's maximum
 * operating temperature with α20 = 0.004 /K. That gives the multipliers 1.20 (70 °C) and 1.28 (90
 * °C) that BS 7671 uses for R1+R2, so both conventions agree.
 */
public final class ConductorResistance {

  /**
   * Temperature coefficient of resistance of copper at 20 °C, per kelvin (the rounded value used by
   * the trade).
   */
  public static final double COPPER_ALPHA_PER_KELVIN = 0.004;

  private static final DataTable TABLE = DataTable.load("conductor-resistance.csv");

  private ConductorResistance() {}

  /** The shipped table, for its provenance notes. */
  public static DataTable table() {
    return TABLE;
  }

  /**
   * Resistance of one conductor at 20 °C, Ω/km (= mΩ/m); missing for aluminium or a size not
   * tabulated.
   */
  public static Resolved<Double> ohmsPerKmAt20Celsius(
      ConductorMaterial material, Double csaSquareMillimetres) {
    if (material == null) {
      return Resolved.missing("conductor material");
    }
    if (material != ConductorMaterial.COPPER) {
      return Resolved.missing(
          "resistance data for " + material + " conductors (only copper is tabulated)");
    }
    if (csaSquareMillimetres == null) {
      return Resolved.missing("conductor cross-section");
    }
    double r = TABLE.exact(csaSquareMillimetres, "copperOhmsPerKm");
    return Double.isNaN(r)
        ? Resolved.missing(
            "resistance for a " + csaSquareMillimetres + " mm² conductor (not a tabulated size)")
        : Resolved.of(r);
  }

  /**
   * Ratio R(θ)/R(20 °C) at the insulation's maximum conductor temperature: 1.20 for 70 °C, 1.28 for
   * 90 °C.
   */
  public static double operatingTemperatureMultiplier(Insulation insulation) {
    return 1.0 + COPPER_ALPHA_PER_KELVIN * (insulation.maxConductorTemperatureCelsius() - 20.0);
  }

  /**
   * The insulation a resistance-based check uses: the recorded one, or 90 °C thermosetting when
   * none is recorded — the higher operating temperature gives the higher resistance, so Zs and
   * voltage drop come out no better than the truth (the safe side). Callers name the assumption
   * with {@link #ASSUMED_HOT_INSULATION}.
   */
  public static Insulation forResistance(Insulation recorded) {
    return recorded == null ? Insulation.THERMOSETTING_90 : recorded;
  }

  /** How a finding names the assumption of {@link #forResistance(Insulation)}. */
  public static final String ASSUMED_HOT_INSULATION =
      "insulation not recorded: assumed 90 °C thermosetting, the higher resistance (safe side)";

  /**
   * Resistance of one conductor at operating temperature, mΩ/m; an unrecorded insulation is taken
   * as 90 °C (see {@link #forResistance(Insulation)}).
   */
  public static Resolved<Double> milliOhmsPerMetreHot(
      ConductorMaterial material, Double csaSquareMillimetres, Insulation insulation) {
    Insulation used = forResistance(insulation);
    return ohmsPerKmAt20Celsius(material, csaSquareMillimetres)
        .map(r -> r * operatingTemperatureMultiplier(used));
  }
}
