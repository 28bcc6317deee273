package com.wayledger.board;

import java.math.BigDecimal;

/** Formatting of stored numbers for short labels: no trailing zeros ("2.5", "32"). */
final class Numbers {

  private Numbers() {}

  static String plain(double value) {
    return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
  }
}
