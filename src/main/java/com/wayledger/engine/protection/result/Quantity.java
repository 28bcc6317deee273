package com.wayledger.engine.protection.result;

/**
 * One number behind a finding, with its unit, e.g. {@code ("Zs", 1.31, "Ω")}.
 *
 * @param name the trade symbol or a short name ("Ib", "Iz", "Zs max (80 %)")
 * @param value the value in {@code unit}
 * @param unit "A", "kA", "Ω", "%", "V", "s" or "" for a pure number
 */
public record Quantity(String name, double value, String unit) {

  @Override
  public String toString() {
    return name + " = " + value + (unit.isEmpty() ? "" : " " + unit);
  }
}
