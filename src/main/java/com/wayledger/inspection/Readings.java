package com.wayledger.inspection;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.Map;

/**
 * Parses typed readings. A blank cell is "not measured" (null). A reading may carry the
 * instrument's range sign ("&gt;299", "≥ 500", "&lt;0.01"): it is graded as the number itself,
 * which is on the safe side for every limit used (insulation minimums are lower bounds; continuity
 * and times are upper bounds, and "&lt;0.01" is already far below them). A comma decimal is
 * accepted.
 */
final class Readings {

  /** Largest value accepted in any cell (keeps typos like 1e9 out). */
  static final double MAX = 100_000;

  private final Map<String, String> errors;

  Readings(Map<String, String> errors) {
    this.errors = errors;
  }

  Double number(String path, String text) {
    if (text == null || text.isBlank()) {
      return null;
    }
    String t = text.strip().replace(',', '.').replace(" ", "");
    if (t.startsWith(">=") || t.startsWith("<=")) {
      t = t.substring(2);
    } else if (t.startsWith(">") || t.startsWith("<") || t.startsWith("≥") || t.startsWith("≤")) {
      t = t.substring(1);
    }
    try {
      double v = Double.parseDouble(t);
      if (Double.isNaN(v) || Double.isInfinite(v)) {
        throw new NumberFormatException();
      }
      if (v < 0) {
        errors.put(path, "inspection.error.negative");
        return null;
      }
      if (v > MAX) {
        errors.put(path, "inspection.error.tooLarge");
        return null;
      }
      return v;
    } catch (NumberFormatException e) {
      errors.put(path, "inspection.error.number");
      return null;
    }
  }

  Boolean yesNo(String path, String text) {
    if (text == null || text.isBlank()) {
      return null;
    }
    return switch (text.strip().toLowerCase(java.util.Locale.ROOT)) {
      case "ok", "yes", "y", "true", "✓" -> true;
      case "wrong", "no", "n", "false", "✗" -> false;
      default -> {
        errors.put(path, "inspection.error.yesNo");
        yield null;
      }
    };
  }

  LocalDate date(String path, String text) {
    if (text == null || text.isBlank()) {
      errors.put(path, "inspection.error.date");
      return null;
    }
    try {
      LocalDate d = LocalDate.parse(text.strip());
      if (d.isAfter(LocalDate.now().plusDays(1))) {
        errors.put(path, "inspection.error.future");
        return null;
      }
      return d;
    } catch (DateTimeParseException e) {
      errors.put(path, "inspection.error.date");
      return null;
    }
  }
}
