package com.wayledger.engine.inspection;

import com.wayledger.engine.EarthingSystem;
import java.util.ArrayList;
import java.util.List;

/**
 * Board-level results: Ze against the value the design assumed, prospective fault current against
 * the lowest breaking capacity on the board, the earth electrode of a TT installation, and main
 * bonding.
 */
public final class BoardLimits {

  public static final String ZE_SOURCE =
      "common practice: measured Ze not above the value declared for the supply and used in design";
  public static final String FAULT_SOURCE =
      "BS 7671 434.5.1 / IEC 60364-4-43 434.5.1 (from memory): breaking capacity ≥ prospective"
          + " fault current";
  public static final String ELECTRODE_SOURCE =
      "BS 7671 411.5.3 / IEC 60364-4-41 411.5.3: RA·IΔn ≤ 50 V";

  private BoardLimits() {}

  /**
   * @param declaredZeOhms the Ze recorded for the site's supply, null when none
   * @param lowestBreakingKiloAmps lowest breaking capacity of the board's recorded devices, null
   *     when none is recorded
   * @param largestResidualMilliAmps largest IΔn on the board (for the TT electrode), null when none
   */
  public static List<GradedValue> grade(
      BoardResults results,
      EarthingSystem earthing,
      Double declaredZeOhms,
      Double lowestBreakingKiloAmps,
      Double largestResidualMilliAmps) {
    List<GradedValue> out = new ArrayList<>();
    out.add(ze(results.externalLoopImpedanceOhms(), declaredZeOhms));
    out.add(faultCurrent(results.prospectiveFaultKiloAmps(), lowestBreakingKiloAmps));
    if (earthing == EarthingSystem.TT) {
      out.add(electrode(results.earthElectrodeOhms(), largestResidualMilliAmps));
    }
    out.add(YesNoTests.mainBonding(results.mainBondingPresent()));
    return out;
  }

  static GradedValue ze(Double measured, Double declared) {
    if (measured == null) {
      return GradedValue.notMeasured(TestKind.EXTERNAL_LOOP_IMPEDANCE, "Ze", "Ω", ZE_SOURCE);
    }
    if (declared == null) {
      return new GradedValue(
          TestKind.EXTERNAL_LOOP_IMPEDANCE,
          "Ze",
          measured,
          "Ω",
          null,
          "",
          Grade.NOT_ASSESSED,
          "not assessed — no Ze recorded for the supply to compare with",
          ZE_SOURCE);
    }
    boolean pass = measured <= declared;
    return new GradedValue(
        TestKind.EXTERNAL_LOOP_IMPEDANCE,
        "Ze",
        measured,
        "Ω",
        declared,
        "≤ " + Figures.ohms(declared) + " (declared)",
        pass ? Grade.PASS : Grade.FAIL,
        "Ze "
            + Figures.ohms(measured)
            + (pass ? " ≤ " : " above ")
            + "the declared "
            + Figures.ohms(declared)
            + (pass ? "" : ": every Zs on the installation is higher than designed"),
        ZE_SOURCE);
  }

  static GradedValue faultCurrent(Double measuredKiloAmps, Double lowestBreakingKiloAmps) {
    if (measuredKiloAmps == null) {
      return GradedValue.notMeasured(TestKind.FAULT_CURRENT, "PFC", "kA", FAULT_SOURCE);
    }
    if (lowestBreakingKiloAmps == null) {
      return new GradedValue(
          TestKind.FAULT_CURRENT,
          "PFC",
          measuredKiloAmps,
          "kA",
          null,
          "",
          Grade.NOT_ASSESSED,
          "not assessed — no breaking capacity recorded on the board's devices",
          FAULT_SOURCE);
    }
    boolean pass = measuredKiloAmps <= lowestBreakingKiloAmps;
    return new GradedValue(
        TestKind.FAULT_CURRENT,
        "PFC",
        measuredKiloAmps,
        "kA",
        lowestBreakingKiloAmps,
        "≤ " + Figures.fixed(lowestBreakingKiloAmps, 2) + " kA (lowest breaking capacity)",
        pass ? Grade.PASS : Grade.FAIL,
        "PFC "
            + Figures.fixed(measuredKiloAmps, 2)
            + " kA"
            + (pass ? " ≤ " : " above ")
            + "the lowest breaking capacity "
            + Figures.fixed(lowestBreakingKiloAmps, 2)
            + " kA",
        FAULT_SOURCE);
  }

  static GradedValue electrode(Double ohms, Double residualMilliAmps) {
    if (ohms == null) {
      return GradedValue.notMeasured(TestKind.EARTH_ELECTRODE, "RA", "Ω", ELECTRODE_SOURCE);
    }
    if (residualMilliAmps == null) {
      return new GradedValue(
          TestKind.EARTH_ELECTRODE,
          "RA",
          ohms,
          "Ω",
          null,
          "",
          Grade.NOT_ASSESSED,
          "not assessed — no RCD recorded on the board, so no IΔn for RA·IΔn ≤ 50 V",
          ELECTRODE_SOURCE);
    }
    double limit = 50.0 / (residualMilliAmps / 1000.0);
    boolean pass = ohms <= limit;
    return new GradedValue(
        TestKind.EARTH_ELECTRODE,
        "RA",
        ohms,
        "Ω",
        limit,
        "≤ " + Figures.ohms(limit) + " (50 V / " + Figures.fixed(residualMilliAmps, 0) + " mA)",
        pass ? Grade.PASS : Grade.FAIL,
        "RA " + Figures.ohms(ohms) + (pass ? " ≤ " : " above ") + Figures.ohms(limit),
        ELECTRODE_SOURCE);
  }
}
