package com.wayledger.engine.inspection;

/** Tests whose result is yes or no: polarity, an RCD's test button, main protective bonding. */
public final class YesNoTests {

  public static final String POLARITY_SOURCE =
      "BS 7671 643.6 / IEC 60364-6 6.4.3.6 (from memory): single-pole devices in the line conductor";
  public static final String BUTTON_SOURCE =
      "common practice: the integral test button operates the RCD";
  public static final String BONDING_SOURCE =
      "BS 7671 411.3.1.2 / IEC 60364-4-41 411.3.1.2 (from memory): main protective bonding of"
          + " extraneous-conductive-parts";

  private YesNoTests() {}

  public static GradedValue polarity(Boolean correct) {
    return yesNo(
        TestKind.POLARITY,
        "polarity",
        correct,
        "correct",
        "wrong: a device breaks the neutral, not the line",
        POLARITY_SOURCE);
  }

  public static GradedValue rcdButton(Boolean works) {
    return yesNo(
        TestKind.RCD_BUTTON,
        "RCD test button",
        works,
        "trips the device",
        "does not trip the device",
        BUTTON_SOURCE);
  }

  public static GradedValue mainBonding(Boolean present) {
    return yesNo(
        TestKind.MAIN_BONDING,
        "main bonding",
        present,
        "present",
        "absent or not verified as present",
        BONDING_SOURCE);
  }

  private static GradedValue yesNo(
      TestKind kind, String quantity, Boolean value, String good, String bad, String source) {
    if (value == null) {
      return new GradedValue(
          kind,
          quantity,
          null,
          "",
          null,
          good,
          Grade.NOT_ASSESSED,
          "not assessed — " + quantity + " not checked",
          source);
    }
    return new GradedValue(
        kind,
        quantity,
        null,
        "",
        null,
        good,
        value ? Grade.PASS : Grade.FAIL,
        quantity + " " + (value ? good : bad),
        source);
  }
}
