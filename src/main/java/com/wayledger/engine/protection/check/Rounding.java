package com.wayledger.engine.protection.check;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Formats figures for finding sentences: the trade's fixed decimals (A 1, Ω 2, % 1). */
final class Rounding {

  private Rounding() {}

  static String amps(double v) {
    return fixed(v, 1) + " A";
  }

  static String ohms(double v) {
    return fixed(v, 2) + " Ω";
  }

  static String percent(double v) {
    return fixed(v, 1) + " %";
  }

  static String kiloAmps(double v) {
    return fixed(v, 2) + " kA";
  }

  /** A size such as "1" or "2.5", without trailing zeros. */
  static String plain(double v) {
    return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
  }

  /**
   * A value and the limit it is compared with, each with {@code decimals} decimals or more: as many
   * more (up to 4) as it takes for a value above the limit to read above it ("0.364 Ω above 0.360
   * Ω", not "0.36 Ω above 0.36 Ω"). Both get the same number of decimals.
   *
   * @return {value text, limit text}, each with its unit
   */
  static String[] compared(double value, double limit, int decimals, String unit) {
    int d = decimals;
    while (d < 4 && value != limit && round(value, d).compareTo(round(limit, d)) == 0) {
      d++;
    }
    String suffix = unit.isEmpty() ? "" : " " + unit;
    return new String[] {fixed(value, d) + suffix, fixed(limit, d) + suffix};
  }

  static String[] comparedAmps(double value, double limit) {
    return compared(value, limit, 1, "A");
  }

  static String[] comparedOhms(double value, double limit) {
    return compared(value, limit, 2, "Ω");
  }

  static String[] comparedPercent(double value, double limit) {
    return compared(value, limit, 1, "%");
  }

  private static BigDecimal round(double v, int decimals) {
    return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP);
  }

  static String fixed(double v, int decimals) {
    return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
  }
}
