package com.wayledger.board;

import com.wayledger.engine.DeviceKind;
import com.wayledger.system.RuleViolation;

/**
 * Service rules for a moulded-case breaker's settings, shared by a circuit's device and a board's
 * incomer. Ir and Ii are ignored for any other kind (as the curve is for an MCCB).
 */
final class MccbSettingRules {

  private MccbSettingRules() {}

  /**
   * Refuses Ir above In (IEC 60947-2: the overload setting is a fraction of the rated current) and
   * one setting recorded without the other (the engine would have to assume the other, and the
   * finding could not say plainly whether the settings were recorded or assumed).
   */
  static void check(
      DeviceKind kind,
      Double ratingAmps,
      Double overloadAmps,
      Double instantaneousAmps,
      String overloadField,
      String instantaneousField) {
    if (kind != DeviceKind.MCCB) {
      return;
    }
    if (overloadAmps != null && ratingAmps != null && overloadAmps > ratingAmps) {
      throw new RuleViolation(
          overloadField, "device.mccb.overloadAboveRating", Numbers.plain(ratingAmps));
    }
    if (overloadAmps != null && instantaneousAmps == null) {
      throw new RuleViolation(instantaneousField, "device.mccb.bothSettings");
    }
    if (instantaneousAmps != null && overloadAmps == null) {
      throw new RuleViolation(overloadField, "device.mccb.bothSettings");
    }
  }
}
