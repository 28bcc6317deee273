package com.wayledger.engine.inspection;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.protection.check.LoopImpedanceCheck;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.Resolved;

/**
 * A measured Zs against 80 % of the tabulated maximum, the rule the protection checks already use
 * for measured values ({@link LoopImpedanceCheck}).
 *
 * <p>Temperature convention: the reading is taken with the conductors at ambient temperature (about
 * 10–20 °C); under fault they reach their operating temperature and their resistance rises by about
 * a fifth, so the measured value must not exceed 80 % of Cmin·U0/Ia (common practice, as in the IET
 * guidance's rule of thumb; from memory). On TT with an RCD the limit is 80 % of 50 V/IΔn (BS 7671
 * 411.5.3, Zs standing in for RA, which is on the safe side).
 */
public final class LoopImpedanceLimit {

  public static final String SOURCE_TN =
      LoopImpedanceCheck.REFERENCE_TN + "; measured value ≤ 80 % of the maximum (common practice)";
  public static final String SOURCE_TT =
      LoopImpedanceCheck.REFERENCE_TT + "; measured value ≤ 80 % of the maximum (common practice)";

  private LoopImpedanceLimit() {}

  /**
   * @param zsOhms measured Zs, null when not measured
   * @param device the circuit's overcurrent characteristic, or why there is none
   * @param residualMilliAmps IΔn of the circuit's own RCD/RCBO, null when none
   * @param measuredFraction 0.80 by default
   * @param minimumVoltageFactor Cmin, 0.95 by default
   * @param touchVoltageLimitVolts 50 V by default
   */
  public static GradedValue grade(
      Double zsOhms,
      EarthingSystem earthing,
      double nominalVoltageToEarthVolts,
      Resolved<DeviceCharacteristic> device,
      Double residualMilliAmps,
      double measuredFraction,
      double minimumVoltageFactor,
      double touchVoltageLimitVolts) {
    boolean tt = earthing == EarthingSystem.TT;
    String source = tt ? SOURCE_TT : SOURCE_TN;
    if (zsOhms == null) {
      return GradedValue.notMeasured(TestKind.LOOP_IMPEDANCE, "Zs", "Ω", source);
    }
    double limit;
    String basis;
    if (earthing == null) {
      return notAssessed(zsOhms, "earthing system of the supply not recorded", source);
    }
    if (tt && residualMilliAmps != null) {
      limit = measuredFraction * touchVoltageLimitVolts / (residualMilliAmps / 1000.0);
      basis = "80 % of 50 V / " + Figures.fixed(residualMilliAmps, 0) + " mA";
    } else if (device.isKnown()) {
      DeviceCharacteristic d = device.value();
      limit =
          measuredFraction
              * LoopImpedanceCheck.maxLoopImpedanceOhms(
                  minimumVoltageFactor, nominalVoltageToEarthVolts, d.highestInstantaneousAmps());
      basis = "80 % of the " + d.label() + " maximum";
    } else {
      return notAssessed(zsOhms, "no limit: missing " + device.missing(), source);
    }
    boolean pass = zsOhms <= limit;
    return new GradedValue(
        TestKind.LOOP_IMPEDANCE,
        "Zs",
        zsOhms,
        "Ω",
        limit,
        "≤ " + Figures.ohms(limit) + " (" + basis + ")",
        pass ? Grade.PASS : Grade.FAIL,
        "Zs "
            + Figures.ohms(zsOhms)
            + (pass ? " ≤ " : " above ")
            + Figures.ohms(limit)
            + ", "
            + basis
            + (pass ? "" : ": disconnection may not be in time"),
        source);
  }

  private static GradedValue notAssessed(double zsOhms, String why, String source) {
    return new GradedValue(
        TestKind.LOOP_IMPEDANCE,
        "Zs",
        zsOhms,
        "Ω",
        null,
        "",
        Grade.NOT_ASSESSED,
        "not assessed — " + why,
        source);
  }
}
