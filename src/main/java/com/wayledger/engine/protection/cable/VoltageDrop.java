package com.wayledger.engine.protection.cable;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.protection.data.DataTable;
import com.wayledger.engine.protection.result.Resolved;

/**
 * Voltage drop per ampere per metre, computed from the conductor resistance at maximum operating
 * temperature (the basis of the BS 7671 Appendix 4 "r" columns): 2·R(θ) for a single-phase loop,
 * √3·R(θ) for a balanced three-phase circuit, plus a tabulated reactance from 25 mm² up. Below 25
 * mm² this reproduces the tabulated figures (2.5 mm² two-core 70 °C: 2 × 7.41 × 1.20 = 17.8 → 18
 * mV/A/m).
 */
public final class VoltageDrop {

  private static final DataTable REACTANCE = DataTable.load("multicore-reactance.csv");

  private VoltageDrop() {}

  /**
   * mV/A/m of a cable; {@code threePhase} selects √3·r (line-to-line) rather than 2·r (line and
   * neutral).
   */
  public static Resolved<Double> milliVoltsPerAmpMetre(
      ConductorMaterial material,
      Double csaSquareMillimetres,
      Insulation insulation,
      boolean threePhase) {
    return ConductorResistance.milliOhmsPerMetreHot(material, csaSquareMillimetres, insulation)
        .map(
            r -> {
              double resistive = (threePhase ? Math.sqrt(3.0) : 2.0) * r;
              double x =
                  REACTANCE.exact(csaSquareMillimetres, threePhase ? "threePhase" : "singlePhase");
              double reactive = Double.isNaN(x) ? 0.0 : x;
              return Math.hypot(resistive, reactive);
            });
  }

  /**
   * Voltage drop as a percentage of the nominal voltage the drop is measured against: U0 for
   * single-phase, UL for three-phase (so the caller passes the matching voltage).
   */
  public static double percent(
      double milliVoltsPerAmpMetre, double currentAmps, double lengthMetres, double nominalVolts) {
    double volts = milliVoltsPerAmpMetre * currentAmps * lengthMetres / 1000.0;
    return 100.0 * volts / nominalVolts;
  }
}
