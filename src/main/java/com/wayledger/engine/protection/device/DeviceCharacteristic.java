package com.wayledger.engine.protection.device;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.Resolved;

/**
 * The overcurrent characteristic of a breaker, reduced to the points the checks use. All currents
 * in amperes.
 *
 * @param kind MCB, RCBO or MCCB
 * @param curve B, C or D for MCBs and RCBOs; null for MCCBs
 * @param ratedCurrentAmps In
 * @param overloadSettingAmps the current the overload element is set to: In for MCBs, Ir for MCCBs
 * @param conventionalNonTrippingAmps I1: 1.13·In (IEC 60898-1) or 1.05·Ir (IEC 60947-2)
 * @param conventionalTrippingAmps I2: 1.45·In (IEC 60898-1) or 1.30·Ir (IEC 60947-2)
 * @param conventionalTimeHours time within which I2 trips and I1 does not, h
 * @param lowestInstantaneousAmps below this the magnetic element never trips within 0.1 s
 *     (3/5/10·In, or 0.8·Ii)
 * @param highestInstantaneousAmps at or above this it always trips within 0.1 s: Ia for the
 *     disconnection-time check (5/10/20·In, or 1.2·Ii)
 * @param residualCurrentMilliAmps IΔn of an RCBO; null for a device without a residual element
 * @param settingsAssumed true when an MCCB had no recorded settings and Ir = In, Ii = default
 *     multiple were assumed
 */
public record DeviceCharacteristic(
    DeviceKind kind,
    TripCurve curve,
    double ratedCurrentAmps,
    double overloadSettingAmps,
    double conventionalNonTrippingAmps,
    double conventionalTrippingAmps,
    double conventionalTimeHours,
    double lowestInstantaneousAmps,
    double highestInstantaneousAmps,
    Double residualCurrentMilliAmps,
    boolean settingsAssumed) {

  /** An IEC 60898-1 breaker (MCB, or an RCBO's overcurrent part) of the given curve and rating. */
  public static DeviceCharacteristic miniature(
      DeviceKind kind, TripCurve curve, double ratedCurrentAmps, Double residualCurrentMilliAmps) {
    return new DeviceCharacteristic(
        kind,
        curve,
        ratedCurrentAmps,
        ratedCurrentAmps,
        McbStandard.CONVENTIONAL_NON_TRIPPING_MULTIPLE * ratedCurrentAmps,
        McbStandard.CONVENTIONAL_TRIPPING_MULTIPLE * ratedCurrentAmps,
        McbStandard.conventionalTimeHours(ratedCurrentAmps),
        curve.lowestInstantMultiple() * ratedCurrentAmps,
        curve.highestInstantMultiple() * ratedCurrentAmps,
        residualCurrentMilliAmps,
        false);
  }

  /** An IEC 60947-2 moulded-case breaker with settings Ir and Ii. */
  public static DeviceCharacteristic mouldedCase(
      double ratedCurrentAmps, MccbSettings settings, boolean settingsAssumed) {
    double ir = settings.longTimeSettingAmps();
    double ii = settings.instantaneousSettingAmps();
    return new DeviceCharacteristic(
        DeviceKind.MCCB,
        null,
        ratedCurrentAmps,
        ir,
        MccbStandard.CONVENTIONAL_NON_TRIPPING_MULTIPLE * ir,
        MccbStandard.CONVENTIONAL_TRIPPING_MULTIPLE * ir,
        MccbStandard.conventionalTimeHours(ratedCurrentAmps),
        (1.0 - MccbStandard.INSTANTANEOUS_TOLERANCE) * ii,
        (1.0 + MccbStandard.INSTANTANEOUS_TOLERANCE) * ii,
        null,
        settingsAssumed);
  }

  /**
   * The characteristic of a recorded device, or why there is none: a fuse (no characteristic
   * shipped), an RCD (no overcurrent element), or a missing rating or curve.
   *
   * @param mccbSettings recorded MCCB settings; null to assume Ir = In and Ii = {@code
   *     defaultMccbInstantMultiple}·In
   */
  public static Resolved<DeviceCharacteristic> of(
      DeviceSpec device, MccbSettings mccbSettings, double defaultMccbInstantMultiple) {
    if (device == null) {
      return Resolved.missing("protective device");
    }
    if (device.kind() == null) {
      return Resolved.missing("device kind");
    }
    if (device.kind() == DeviceKind.FUSE) {
      return Resolved.missing("a characteristic: the engine has none for fuses");
    }
    if (device.kind() == DeviceKind.RCD) {
      return Resolved.missing("an overcurrent device: an RCD alone has no overcurrent element");
    }
    if (device.ratedCurrentAmps() == null) {
      return Resolved.missing("device rating In");
    }
    double in = device.ratedCurrentAmps();
    if (device.kind() == DeviceKind.MCCB) {
      boolean assumed = mccbSettings == null;
      MccbSettings s =
          assumed ? new MccbSettings(in, defaultMccbInstantMultiple * in) : mccbSettings;
      return Resolved.of(mouldedCase(in, s, assumed));
    }
    if (device.curve() == null) {
      return Resolved.missing("trip curve (B, C or D)");
    }
    Double residual = device.kind() == DeviceKind.RCBO ? device.residualCurrentMilliAmps() : null;
    return Resolved.of(miniature(device.kind(), device.curve(), in, residual));
  }

  /** Whether a current this large is sure to trip the magnetic element within 0.1 s. */
  public boolean tripsInstantlyAt(double amps) {
    return amps >= highestInstantaneousAmps;
  }

  /**
   * Whether a current this large might trip the magnetic element (it is inside or above the
   * instantaneous band).
   */
  public boolean mayTripInstantlyAt(double amps) {
    return amps >= lowestInstantaneousAmps;
  }

  /**
   * A short label such as "C20", "MCCB 160 A (Ir 125 A, Ii 800 A, recorded)" or "MCCB 160 A (Ir 160
   * A, Ii 1600 A, assumed)": a moulded-case breaker's label says whether its settings were recorded
   * or assumed.
   */
  public String label() {
    String amps = trim(ratedCurrentAmps);
    if (curve != null) {
      return curve + amps;
    }
    return "MCCB "
        + amps
        + " A (Ir "
        + trim(overloadSettingAmps)
        + " A, Ii "
        + trim(
            Math.round(10 * highestInstantaneousAmps / (1.0 + MccbStandard.INSTANTANEOUS_TOLERANCE))
                / 10.0)
        + " A, "
        + (settingsAssumed ? "assumed" : "recorded")
        + ")";
  }

  private static String trim(double v) {
    return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
  }
}
