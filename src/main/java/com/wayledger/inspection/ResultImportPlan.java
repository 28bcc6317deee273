package com.wayledger.inspection;

import java.util.List;

/**
 * What importing a results sheet would record: every sheet row with the circuit it was matched to,
 * its readings graded as the result grid grades them, and its problems; and the grid as a whole
 * (header fields, outcome, proposed observations, field errors).
 *
 * @param rows the sheet's rows in order
 * @param sheet the result grid filled from the rows without problems, graded
 */
public record ResultImportPlan(List<Row> rows, InspectionSheet sheet) {

  public ResultImportPlan {
    rows = List.copyOf(rows);
  }

  /**
   * A problem with a row: the column it is about (null for the row as a whole), a message key and
   * its arguments.
   */
  public record Problem(ResultColumn column, String code, Object[] arguments) {}

  /**
   * One sheet row.
   *
   * @param number the row's number as the spreadsheet shows it
   * @param circuitId the circuit it was matched to, or null
   * @param wayLabel the circuit's position ("3", "3 L2"), or what the row said when unmatched
   * @param description what the matched circuit feeds
   * @param graded the matched circuit's line of the graded grid, or null
   * @param problems what stops the row from being recorded
   */
  public record Row(
      int number,
      Long circuitId,
      String wayLabel,
      String description,
      SheetRow graded,
      List<Problem> problems) {

    public boolean isValid() {
      return problems.isEmpty();
    }

    /** The row's problem about a reading column, if any. */
    public Problem problem(ResultColumn column) {
      return problems.stream().filter(p -> p.column() == column).findFirst().orElse(null);
    }

    /** "pass", "fail", "na" or "" for a reading's cell, as in the result grid. */
    public String gradeClass(ResultColumn column) {
      return graded == null || !column.isReading() ? "" : graded.gradeClass(column.gridColumn());
    }

    /** The reading as read, or "" when the row has no graded line. */
    public String value(ResultColumn column) {
      if (graded == null || !column.isReading()) {
        return "";
      }
      if (column == ResultColumn.RCD_DELAYED) {
        return Boolean.TRUE.equals(graded.entry().rcdDelayed()) ? "S" : "";
      }
      return graded.entry().value(column.gridColumn());
    }

    /** The graded value's message for a reading (its limit and source), or null. */
    public String gradeMessage(ResultColumn column) {
      if (graded == null || !column.isReading() || column == ResultColumn.RCD_DELAYED) {
        return null;
      }
      var v = graded.cell(column.gridColumn());
      return v == null ? null : v.message();
    }
  }

  public long invalidRows() {
    return rows.stream().filter(r -> !r.isValid()).count();
  }

  /** How many observations (proposed from failing values and findings) would be recorded. */
  public long keptObservations() {
    return sheet.observations().stream().filter(InspectionForm.ObservationEntry::isKept).count();
  }

  public boolean isAllValid() {
    return invalidRows() == 0;
  }
}
