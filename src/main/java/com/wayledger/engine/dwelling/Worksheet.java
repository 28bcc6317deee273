package com.wayledger.engine.dwelling;

import java.util.List;

/**
 * One worked Article 220 calculation.
 *
 * @param method which calculation it is
 * @param edition the edition of NFPA 70 whose section numbers and values it follows
 * @param lines the working, line by line
 * @param resultVoltAmperes the calculated load, VA; null when the calculation is not assessed
 * @param notAssessed why the result is missing ("not assessed — missing floor area"); empty when
 *     the result stands
 * @param assumptions assumptions taken on the safe side, each in words
 */
public record Worksheet(
    WorksheetMethod method,
    String edition,
    List<WorkingLine> lines,
    Double resultVoltAmperes,
    List<String> notAssessed,
    List<String> assumptions) {

  public Worksheet {
    lines = List.copyOf(lines);
    notAssessed = List.copyOf(notAssessed);
    assumptions = List.copyOf(assumptions);
  }

  public boolean isAssessed() {
    return resultVoltAmperes != null && notAssessed.isEmpty();
  }

  /**
   * The result as a current at a voltage (240 V for a 120/240 V single-phase three-wire service, as
   * the Annex D examples divide), A; null when not assessed.
   */
  public Double amperesAt(double volts) {
    return resultVoltAmperes == null ? null : resultVoltAmperes / volts;
  }

  /** The first line whose description starts with the given text; for tests and exports. */
  public java.util.Optional<WorkingLine> line(String startsWith) {
    return lines.stream().filter(l -> l.description().startsWith(startsWith)).findFirst();
  }
}
