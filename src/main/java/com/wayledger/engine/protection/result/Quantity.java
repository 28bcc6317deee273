package com.wayledger.engine.protection.result;

/**
 * One number behind a finding, with its unit, e.g. {@code ("Zs", 1.31, "Ω")}.
 *
 * @param name the trade symbol or a short name ("Ib", "Iz", "Zs max (80 %)")
 * @param value the value in {@code unit}
 * @param unit "A", "kA", "Ω", "%", "V", "s" or "" for a pure number
 */
public record Quantity(String name, double value, String unit) {

  /**
   * "Ib = 9.72 A": three significant figures, at most three decimals, for people to read; {@link
   * #value()} keeps all.
   */
  @Override
  public String toString() {
    return name + " = " + readable(value) + (unit.isEmpty() ? "" : " " + unit);
  }

  static String readable(double value) {
    if (value == 0 || Double.isNaN(value) || Double.isInfinite(value)) {
      return String.valueOf(value);
    }
    java.math.BigDecimal rounded =
        new java.math.BigDecimal(value)
            .round(new java.math.MathContext(3, java.math.RoundingMode.HALF_UP));
    if (rounded.scale() > 3) {
      rounded = rounded.setScale(3, java.math.RoundingMode.HALF_UP);
    }
    return rounded.stripTrailingZeros().toPlainString();
  }
}
