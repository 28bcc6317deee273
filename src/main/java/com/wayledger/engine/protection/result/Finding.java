package com.wayledger.engine.protection.result;

import java.util.List;

/**
 * The result of one check on one circuit or board.
 *
 * @param check which check
 * @param verdict danger, warning, advice, pass or not assessed
 * @param summary one sentence for a person: what was found, or "not assessed — missing …"
 * @param values the numbers behind the verdict, with units (empty when not assessed)
 * @param reference the clause or table the rule comes from
 * @param remedy what to do about it; empty for a pass
 */
public record Finding(
    CheckKind check,
    Verdict verdict,
    String summary,
    List<Quantity> values,
    String reference,
    String remedy) {

  public Finding {
    values = List.copyOf(values);
  }

  /** A finding that could not be assessed because {@code missingInput} is unknown. */
  public static Finding notAssessed(CheckKind check, String missingInput, String reference) {
    return new Finding(
        check,
        Verdict.NOT_ASSESSED,
        "not assessed — missing " + missingInput,
        List.of(),
        reference,
        "record the " + missingInput);
  }

  /** A finding that could not be assessed for a reason other than a missing input (e.g. fuses). */
  public static Finding notAssessedBecause(CheckKind check, String reason, String reference) {
    return new Finding(
        check, Verdict.NOT_ASSESSED, "not assessed — " + reason, List.of(), reference, "");
  }

  public static Finding pass(
      CheckKind check, String summary, List<Quantity> values, String reference) {
    return new Finding(check, Verdict.PASS, summary, values, reference, "");
  }

  public boolean isProblem() {
    return verdict.isProblem();
  }

  /** The value named {@code name}, or NaN when the finding carries none. */
  public double value(String name) {
    return values.stream()
        .filter(q -> q.name().equals(name))
        .mapToDouble(Quantity::value)
        .findFirst()
        .orElse(Double.NaN);
  }
}
