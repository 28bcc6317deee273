package com.wayledger.inspection;

import com.wayledger.engine.inspection.Grade;
import com.wayledger.engine.inspection.GradedValue;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import java.util.List;
import java.util.Map;

/**
 * One circuit's line of the result grid or report: what was typed and how each value graded.
 *
 * @param index the row's index in the form
 * @param ring whether the circuit is a ring final circuit (ring columns apply)
 * @param hasRcd whether the circuit has its own RCD or RCBO (RCD columns apply)
 */
public record SheetRow(
    int index,
    long circuitId,
    String wayLabel,
    String description,
    String recordedLabel,
    boolean ring,
    boolean hasRcd,
    ResultEntry entry,
    List<GradedValue> graded) {

  /** The graded quantity behind each grid cell. */
  static final Map<String, String> CELL_QUANTITY =
      Map.ofEntries(
          Map.entry("r1r2", "R1+R2"),
          Map.entry("r2", "R2"),
          Map.entry("ringR1", "ring r1/rn"),
          Map.entry("ringRn", "ring r1/rn"),
          Map.entry("ringR2", "ring r2"),
          Map.entry("irLl", "IR L–L"),
          Map.entry("irLe", "IR L–E"),
          Map.entry("irNe", "IR N–E"),
          Map.entry("polarity", "polarity"),
          Map.entry("zs", "Zs"),
          Map.entry("rcd1", "RCD at IΔn"),
          Map.entry("rcd5", "RCD at 5×IΔn"),
          Map.entry("rcdButton", "RCD test button"));

  /** The graded value of a grid cell, or null when the cell has none. */
  public GradedValue cell(String cell) {
    String quantity = CELL_QUANTITY.get(cell);
    return graded.stream().filter(v -> v.quantity().equals(quantity)).findFirst().orElse(null);
  }

  /** "pass", "fail", "na" or "" for a grid cell's CSS class. */
  public String gradeClass(String cell) {
    GradedValue v = cell(cell);
    if (v == null || v.measured() == null && v.grade() == Grade.NOT_ASSESSED) {
      return "";
    }
    return switch (v.grade()) {
      case PASS -> "pass";
      case FAIL -> "fail";
      case NOT_ASSESSED -> "na";
    };
  }

  /** Whether any value of the row failed. */
  public boolean anyFailed() {
    return graded.stream().anyMatch(GradedValue::failed);
  }
}
