package com.wayledger.engine.dwelling;

/**
 * One line of a worked calculation, as the code book lays it out: what is counted, under which
 * clause, the load it starts from, the factor applied, and the result.
 *
 * @param description what the line counts, in words
 * @param clause the NEC section or table it applies; empty when none
 * @param voltAmperes the load the line starts from, VA; null for a line that only states a result
 * @param factor the factor applied (1.0 for 100 %); null when none applies
 * @param resultVoltAmperes what the line contributes, VA; null for a line that contributes nothing
 * @param subtotal whether the line is a subtotal or total of the lines above
 */
public record WorkingLine(
    String description,
    String clause,
    Double voltAmperes,
    Double factor,
    Double resultVoltAmperes,
    boolean subtotal) {

  static WorkingLine of(
      String description, String clause, Double voltAmperes, Double factor, Double result) {
    return new WorkingLine(description, clause, voltAmperes, factor, result, false);
  }

  static WorkingLine total(String description, String clause, double result) {
    return new WorkingLine(description, clause, null, null, result, true);
  }

  static WorkingLine note(String description, String clause) {
    return new WorkingLine(description, clause, null, null, null, false);
  }
}
