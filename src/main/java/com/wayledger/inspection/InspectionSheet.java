package com.wayledger.inspection;

import com.wayledger.engine.inspection.GradedValue;
import com.wayledger.engine.inspection.Outcome;
import com.wayledger.engine.inspection.Urgency;
import com.wayledger.inspection.InspectionForm.ObservationEntry;
import java.util.List;
import java.util.Map;

/**
 * The result grid with everything the page shows: the form as typed, each value's grade, the
 * observations (proposals merged with the inspector's), the outcome they lead to, and the errors by
 * field path (message keys).
 */
public record InspectionSheet(
    long boardId,
    long siteId,
    String boardReference,
    String siteName,
    boolean tt,
    InspectionForm form,
    List<SheetRow> rows,
    List<GradedValue> boardValues,
    List<ObservationEntry> observations,
    Outcome outcome,
    Urgency worst,
    Map<String, String> errors) {

  public boolean hasErrors() {
    return !errors.isEmpty();
  }

  public String error(String path) {
    return errors.get(path);
  }

  public GradedValue boardValue(String quantity) {
    return boardValues.stream().filter(v -> v.quantity().equals(quantity)).findFirst().orElse(null);
  }
}
