package com.wayledger.board;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.device.MccbSettings;
import com.wayledger.system.EnumWords;
import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;

/**
 * A protective device as stored on a circuit or as a board's incomer (columns prefixed by the
 * owner).
 */
@Embeddable
public class DeviceDetails {

  @Enumerated(EnumType.STRING)
  private DeviceKind kind;

  @Enumerated(EnumType.STRING)
  private TripCurve curve;

  private Double ratingAmps;
  private Integer poles;

  @Column(name = "breaking_capacity_kiloamps")
  private Double breakingCapacityKiloAmps;

  @Column(name = "residual_milliamps")
  private Double residualMilliAmps;

  @Enumerated(EnumType.STRING)
  private RcdType rcdType;

  /** Ir of a moulded-case breaker, A; null for any other kind or when not recorded. */
  private Double overloadSettingAmps;

  /** Ii of a moulded-case breaker, A; null for any other kind or when not recorded. */
  private Double instantaneousSettingAmps;

  protected DeviceDetails() {}

  public DeviceDetails(
      DeviceKind kind,
      TripCurve curve,
      Double ratingAmps,
      Integer poles,
      Double breakingCapacityKiloAmps,
      Double residualMilliAmps,
      RcdType rcdType) {
    this(
        kind,
        curve,
        ratingAmps,
        poles,
        breakingCapacityKiloAmps,
        residualMilliAmps,
        rcdType,
        null,
        null);
  }

  /** A device with moulded-case breaker settings Ir and Ii (kept only when the kind is MCCB). */
  public DeviceDetails(
      DeviceKind kind,
      TripCurve curve,
      Double ratingAmps,
      Integer poles,
      Double breakingCapacityKiloAmps,
      Double residualMilliAmps,
      RcdType rcdType,
      Double overloadSettingAmps,
      Double instantaneousSettingAmps) {
    this.kind = kind;
    this.overloadSettingAmps = kind == DeviceKind.MCCB ? overloadSettingAmps : null;
    this.instantaneousSettingAmps = kind == DeviceKind.MCCB ? instantaneousSettingAmps : null;
    this.curve = kind != null && kind.hasCurve() ? curve : null;
    this.ratingAmps = ratingAmps;
    this.poles = poles;
    this.breakingCapacityKiloAmps = breakingCapacityKiloAmps;
    this.residualMilliAmps = kind != null && kind.isResidualCurrent() ? residualMilliAmps : null;
    this.rcdType = kind != null && kind.isResidualCurrent() ? rcdType : null;
  }

  /** A stored device from the engine's description of one (for instance a proposed device). */
  public static DeviceDetails fromSpec(DeviceSpec spec) {
    return new DeviceDetails(
        spec.kind(),
        spec.curve(),
        spec.ratedCurrentAmps(),
        spec.poles(),
        spec.breakingCapacityKiloAmps(),
        spec.residualCurrentMilliAmps(),
        spec.rcdType());
  }

  /** The engine's view of this device, or null when no device kind is recorded. */
  DeviceSpec toSpec(int defaultPoles) {
    if (kind == null) {
      return null;
    }
    return new DeviceSpec(
        kind,
        curve,
        ratingAmps,
        poles == null ? defaultPoles : poles,
        breakingCapacityKiloAmps,
        residualMilliAmps,
        rcdType);
  }

  /**
   * The recorded Ir/Ii for the engine, or null (the engine then assumes Ir = In, Ii = 10·In and
   * says so) when this is no MCCB or the two settings are not both recorded. The services refuse
   * one without the other, so a half record can only come from old data; it is not completed with
   * an assumption that would then read as recorded.
   */
  /**
   * The current at which the device trips on overload: Ir of a moulded-case breaker with its
   * settings recorded, In otherwise (the figure every loading is taken against).
   */
  public Double tripRatingAmps() {
    MccbSettings settings = mccbSettings();
    return settings != null ? Double.valueOf(settings.longTimeSettingAmps()) : getRatingAmps();
  }

  public MccbSettings mccbSettings() {
    if (kind != DeviceKind.MCCB
        || overloadSettingAmps == null
        || instantaneousSettingAmps == null) {
      return null;
    }
    return new MccbSettings(overloadSettingAmps, instantaneousSettingAmps);
  }

  /**
   * Short text as the trade writes it: "MCB C32", "RCBO B16 30 mA", "Fuse 32 A" or "MCCB 125 A (Ir
   * 100 A, Ii 800 A)".
   */
  public String label() {
    if (kind == null) {
      return "";
    }
    StringBuilder text = new StringBuilder(describe(kind, curve, ratingAmps, residualMilliAmps));
    if (overloadSettingAmps != null || instantaneousSettingAmps != null) {
      text.append(" (");
      if (overloadSettingAmps != null) {
        text.append("Ir ").append(Numbers.plain(overloadSettingAmps)).append(" A");
      }
      if (instantaneousSettingAmps != null) {
        text.append(overloadSettingAmps != null ? ", " : "")
            .append("Ii ")
            .append(Numbers.plain(instantaneousSettingAmps))
            .append(" A");
      }
      text.append(')');
    }
    return text.toString().strip();
  }

  /**
   * A device as the trade writes it: the kind's words, then the curve letter joined to the rating
   * ("B6") or the rating in amps ("32 A"), then the residual rating ("30 mA"). Empty for no kind.
   */
  public static String describe(
      DeviceKind kind, TripCurve curve, Double ratingAmps, Double residualMilliAmps) {
    if (kind == null) {
      return "";
    }
    StringBuilder text = new StringBuilder(EnumWords.standard().shortOf(kind)).append(' ');
    if (curve != null) {
      text.append(curve.name());
    }
    if (ratingAmps != null) {
      text.append(Numbers.plain(ratingAmps)).append(curve == null ? " A" : "");
    }
    if (residualMilliAmps != null) {
      text.append(' ').append(Numbers.plain(residualMilliAmps)).append(" mA");
    }
    return text.toString().strip();
  }

  public DeviceKind getKind() {
    return kind;
  }

  public TripCurve getCurve() {
    return curve;
  }

  public Double getRatingAmps() {
    return ratingAmps;
  }

  public Integer getPoles() {
    return poles;
  }

  public Double getBreakingCapacityKiloAmps() {
    return breakingCapacityKiloAmps;
  }

  public Double getResidualMilliAmps() {
    return residualMilliAmps;
  }

  public RcdType getRcdType() {
    return rcdType;
  }

  public Double getOverloadSettingAmps() {
    return overloadSettingAmps;
  }

  public Double getInstantaneousSettingAmps() {
    return instantaneousSettingAmps;
  }
}
