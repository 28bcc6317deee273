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

  static String fixed(double v, int decimals) {
    return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
  }
}
