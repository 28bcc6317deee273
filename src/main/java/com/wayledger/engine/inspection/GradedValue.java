package com.wayledger.engine.inspection;

/**
 * One measured value graded against its limit.
 *
 * @param kind what was tested
 * @param quantity the trade's name of the value, e.g. "R1+R2" or "IR L–E"
 * @param measured the reading, in {@code unit}; null when not measured (or for a yes/no test)
 * @param unit the reading's unit ("Ω", "MΩ", "ms", "kA", or "" for a yes/no test)
 * @param limit the limit used, in {@code unit}; null when there is none to compare with
 * @param limitText the limit as words, e.g. "≥ 1.00 MΩ at 500 V DC"
 * @param grade pass, fail or not assessed
 * @param message one sentence on what the comparison found, or why it could not be made
 * @param source where the limit comes from, with "from memory" or "common practice" where so
 */
public record GradedValue(
    TestKind kind,
    String quantity,
    Double measured,
    String unit,
    Double limit,
    String limitText,
    Grade grade,
    String message,
    String source) {

  static GradedValue notMeasured(TestKind kind, String quantity, String unit, String source) {
    return new GradedValue(
        kind,
        quantity,
        null,
        unit,
        null,
        "",
        Grade.NOT_ASSESSED,
        "not assessed — " + quantity + " not measured",
        source);
  }

  public boolean failed() {
    return grade == Grade.FAIL;
  }
}
