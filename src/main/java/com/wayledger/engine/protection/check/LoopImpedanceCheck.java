package com.wayledger.engine.protection.check;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.ValueSource;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;

/**
 * Automatic disconnection: the earth fault loop impedance Zs is low enough for the device to
 * disconnect in time.
 *
 * <ul>
 *   <li>Overcurrent device: Zs ≤ Cmin·U0/Ia, Ia the current that trips the instantaneous element
 *       for certain (5, 10, 20·In for B, C, D; 1.2·Ii for an MCCB). Because a breaker's
 *       instantaneous element acts within 0.1 s, the same limit serves the 0.4 s and 5 s times (as
 *       BS 7671 Table 41.3 does).
 *   <li>TT with a residual-current device: RA·IΔn ≤ 50 V, with Zs standing in for RA (Zs ≥ RA, so
 *       conservative).
 *   <li>TN where the overcurrent limit fails but a residual-current device is present: Zs·IΔn ≤
 *       Cmin·U0 passes as advice (disconnection relies on the RCD).
 *   <li>A measured Zs is compared with 80 % of the limit (the rule of thumb for a value measured
 *       cold, when the conductors are below operating temperature).
 * </ul>
 */
public final class LoopImpedanceCheck {

  public static final String REFERENCE_TN =
      "BS 7671 411.4.4, 411.4.5, Tables 41.1 and 41.3 / IEC 60364-4-41 411.4: Zs·Ia ≤ Cmin·U0";
  public static final String REFERENCE_TT =
      "BS 7671 411.5.3, Table 41.5 / IEC 60364-4-41 411.5.3: RA·IΔn ≤ 50 V";

  private LoopImpedanceCheck() {}

  /**
   * Cmin·U0/Ia, Ω: the largest Zs with which a fault current reaches Ia at the minimum supply
   * voltage.
   */
  public static double maxLoopImpedanceOhms(
      double minimumVoltageFactor, double nominalVoltageToEarthVolts, double iaAmps) {
    return minimumVoltageFactor * nominalVoltageToEarthVolts / iaAmps;
  }

  /** The rules and their figures, from the settings. */
  public record Limits(
      double minimumVoltageFactor, double measuredFraction, double touchVoltageLimitVolts) {}

  /**
   * @param earthing the supply's earthing system
   * @param nominalVoltageToEarthVolts U0
   * @param zs Zs at the circuit's far end, with its source
   * @param overcurrent the circuit's overcurrent characteristic, or why there is none
   * @param residualMilliAmps IΔn of the residual-current device protecting the circuit (its own or
   *     upstream); null
   * @param finalCircuit true for a final circuit up to 63 A (Table 41.1 times), false for a
   *     distribution circuit
   */
  public static Finding assess(
      EarthingSystem earthing,
      double nominalVoltageToEarthVolts,
      SourcedValue zs,
      Resolved<DeviceCharacteristic> overcurrent,
      Double residualMilliAmps,
      boolean finalCircuit,
      Limits limits) {
    boolean tt = earthing == EarthingSystem.TT;
    String reference = tt ? REFERENCE_TT : REFERENCE_TN;
    if (earthing == null) {
      return Finding.notAssessed(
          CheckKind.LOOP_IMPEDANCE, "earthing system of the supply", REFERENCE_TN);
    }
    if (!zs.isKnown()) {
      return Finding.notAssessed(CheckKind.LOOP_IMPEDANCE, zs.missing(), reference);
    }
    boolean measured = zs.source() == ValueSource.MEASURED;
    double fraction = measured ? limits.measuredFraction() : 1.0;
    String zsName = measured ? "Zs (measured)" : "Zs (calculated)";
    double timeSeconds = tt ? (finalCircuit ? 0.2 : 1.0) : (finalCircuit ? 0.4 : 5.0);

    if (tt && residualMilliAmps != null) {
      double limit = fraction * limits.touchVoltageLimitVolts() / (residualMilliAmps / 1000.0);
      List<Quantity> values =
          List.of(
              new Quantity(zsName, zs.value(), "Ω"),
              new Quantity("IΔn", residualMilliAmps, "mA"),
              new Quantity(measured ? "Zs max (80 %)" : "Zs max", limit, "Ω"));
      return compare(
          zs.value(),
          limit,
          values,
          REFERENCE_TT,
          measured,
          "RCD " + (long) (double) residualMilliAmps + " mA",
          "improve the installation earth electrode (lower RA)");
    }
    if (!overcurrent.isKnown()) {
      return Finding.notAssessedBecause(
          CheckKind.LOOP_IMPEDANCE, "no " + overcurrent.missing(), reference);
    }
    DeviceCharacteristic d = overcurrent.value();
    double ia = d.highestInstantaneousAmps();
    double limit =
        fraction
            * maxLoopImpedanceOhms(limits.minimumVoltageFactor(), nominalVoltageToEarthVolts, ia);
    List<Quantity> values =
        new ArrayList<>(
            List.of(
                new Quantity(zsName, zs.value(), "Ω"),
                new Quantity("Ia", ia, "A"),
                new Quantity("Cmin", limits.minimumVoltageFactor(), ""),
                new Quantity("U0", nominalVoltageToEarthVolts, "V"),
                new Quantity("disconnection time", timeSeconds, "s"),
                new Quantity(measured ? "Zs max (80 %)" : "Zs max", limit, "Ω")));
    if (zs.value() <= limit) {
      return compare(zs.value(), limit, values, REFERENCE_TN, measured, d.label(), "");
    }
    if (residualMilliAmps != null
        && zs.value() * residualMilliAmps / 1000.0
            <= limits.minimumVoltageFactor() * nominalVoltageToEarthVolts) {
      values.add(new Quantity("IΔn", residualMilliAmps, "mA"));
      return new Finding(
          CheckKind.LOOP_IMPEDANCE,
          Verdict.ADVICE,
          zsName
              + " "
              + Rounding.comparedOhms(zs.value(), limit)[0]
              + " is above the "
              + d.label()
              + " limit "
              + Rounding.comparedOhms(zs.value(), limit)[1]
              + "; disconnection in "
              + timeSeconds
              + " s relies on the "
              + (long) (double) residualMilliAmps
              + " mA RCD",
          values,
          reference,
          "acceptable by 411.4.5 with the RCD, but the overcurrent device will not clear an earth fault quickly:"
              + " consider a larger cpc or a lower curve");
    }
    return compare(
        zs.value(),
        limit,
        values,
        reference,
        measured,
        d.label(),
        "fit a larger cable (lower R1+R2), a lower trip curve or rating, or an RCD");
  }

  private static Finding compare(
      double zs,
      double limit,
      List<Quantity> values,
      String reference,
      boolean measured,
      String device,
      String remedy) {
    String basis =
        measured
            ? "80 % of the " + device + " limit (measured value, taken cold)"
            : device + " limit";
    String[] shown = Rounding.comparedOhms(zs, limit);
    if (zs <= limit) {
      return Finding.pass(
          CheckKind.LOOP_IMPEDANCE,
          "Zs " + shown[0] + " ≤ " + shown[1] + ", " + basis,
          values,
          reference);
    }
    return new Finding(
        CheckKind.LOOP_IMPEDANCE,
        Verdict.DANGER,
        "Zs " + shown[0] + " above " + shown[1] + ", " + basis + ": disconnection not in time",
        values,
        reference,
        remedy);
  }
}
