package com.wayledger.engine.dwelling;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Collects the working lines, reasons and assumptions of one worksheet as it is worked. */
final class Lines {

  final List<WorkingLine> lines = new ArrayList<>();
  final List<String> notAssessed = new ArrayList<>();
  final List<String> assumptions = new ArrayList<>();

  double add(String description, String clause, double voltAmperes, double factor) {
    double result = voltAmperes * factor;
    lines.add(WorkingLine.of(description, clause, voltAmperes, factor, result));
    return result;
  }

  double total(String description, String clause, double result) {
    lines.add(WorkingLine.total(description, clause, result));
    return result;
  }

  void note(String description, String clause) {
    lines.add(WorkingLine.note(description, clause));
  }

  void assume(String assumption) {
    if (!assumptions.contains(assumption)) {
      assumptions.add(assumption);
    }
  }

  Worksheet sheet(WorksheetMethod method, Double result) {
    return new Worksheet(
        method,
        NecDwellingCalculator.EDITION,
        lines,
        notAssessed.isEmpty() ? result : null,
        notAssessed,
        assumptions);
  }

  /** A quantity with thousands separators and no decimals (1,500). */
  static String whole(double value) {
    return String.format(Locale.ROOT, "%,.0f", value);
  }

  /** A figure with up to two decimals and no trailing zeros (5.5, 12, 0.35). */
  static String figure(double value) {
    String text = String.format(Locale.ROOT, "%.2f", value);
    return text.contains(".") ? text.replaceAll("0+$", "").replaceAll("\\.$", "") : text;
  }
}
