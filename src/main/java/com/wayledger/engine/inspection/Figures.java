package com.wayledger.engine.inspection;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Fixed decimals for graded-value sentences (Ω and MΩ to 2, ms to 0). */
final class Figures {

  private Figures() {}

  static String fixed(double v, int decimals) {
    return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
  }

  static String ohms(double v) {
    return fixed(v, 2) + " Ω";
  }

  static String megaohms(double v) {
    return fixed(v, 2) + " MΩ";
  }

  static String millis(double v) {
    return fixed(v, 0) + " ms";
  }
}
