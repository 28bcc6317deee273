package com.wayledger.exchange;

import com.wayledger.board.DwellingForm;
import com.wayledger.engine.dwelling.DwellingAddition;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The NEC dwelling inputs a workbook of ours carries on its "Dwelling load" sheet (rows "Dwelling
 * inputs": floor area, small-appliance and laundry circuits, optional method, addition), read back
 * on import. Only a file that holds one board's inputs (a board export) is read: a site export's
 * several boards would leave the importer guessing whose to take.
 *
 * @param boardReference the board the inputs were exported from
 * @param form the inputs as the dwelling form takes them (floor area in ft²); null when a value is
 *     refused
 * @param problems message keys with their value, one per refused value; empty when all are good
 */
public record DwellingInputsInFile(
    String boardReference, DwellingForm form, List<Problem> problems) {

  /** A refused value: the message key and the cell's text. */
  public record Problem(String code, String label, String value) {}

  static final String SECTION = "Dwelling inputs";
  static final String FLOOR_AREA = "Floor area (ft²)";
  static final String SMALL_APPLIANCE = "Small-appliance branch circuits";
  static final String LAUNDRY = "Laundry branch circuits";
  static final String OPTIONAL = "Optional method (220.82)";
  static final String ADDITION = "Addition (220.83)";

  public DwellingInputsInFile {
    problems = List.copyOf(problems);
  }

  public boolean isValid() {
    return problems.isEmpty() && form != null;
  }

  /** The inputs of the file's one dwelling board, if it holds exactly one. */
  public static Optional<DwellingInputsInFile> read(byte[] bytes, String fileName) {
    if (SpreadsheetReader.detect(bytes, fileName) != SpreadsheetReader.Kind.XLSX) {
      return Optional.empty();
    }
    int index = SpreadsheetReader.sheetNames(bytes, fileName).indexOf(DwellingSheet.NAME);
    if (index < 0) {
      return Optional.empty();
    }
    SheetTable table;
    try {
      table = SpreadsheetReader.read(bytes, fileName, index);
    } catch (ImportRefused unreadable) {
      return Optional.empty();
    }
    Map<String, Map<String, String>> byBoard = new LinkedHashMap<>();
    for (SheetTable.Row row : table.rows()) {
      if (SECTION.equals(row.cell(1).strip())) {
        byBoard
            .computeIfAbsent(row.cell(0).strip(), k -> new LinkedHashMap<>())
            .put(row.cell(2).strip(), row.cell(6).strip());
      }
    }
    if (byBoard.size() != 1) {
      return Optional.empty();
    }
    var only = byBoard.entrySet().iterator().next();
    return Optional.of(of(only.getKey(), only.getValue()));
  }

  /** The inputs from the label → value cells of one board; refused values named. */
  static DwellingInputsInFile of(String board, Map<String, String> values) {
    List<Problem> problems = new ArrayList<>();
    Double area = number(values, FLOOR_AREA, problems);
    if (area != null && !(area > 0 && area <= 10_000_000)) {
      problems.add(new Problem("import.dwelling.outOfRange", FLOOR_AREA, values.get(FLOOR_AREA)));
    }
    Integer smallAppliance = count(values, SMALL_APPLIANCE, problems);
    Integer laundry = count(values, LAUNDRY, problems);
    Boolean optional = null;
    String optionalText = values.getOrDefault(OPTIONAL, "").toLowerCase(Locale.ROOT);
    if (optionalText.equals("yes")) {
      optional = true;
    } else if (optionalText.equals("no") || optionalText.isEmpty()) {
      optional = false;
    } else {
      problems.add(new Problem("import.dwelling.notYesNo", OPTIONAL, values.get(OPTIONAL)));
    }
    DwellingAddition addition = DwellingAddition.NONE;
    String additionText = values.getOrDefault(ADDITION, "");
    if (!additionText.isEmpty()) {
      try {
        addition = DwellingAddition.valueOf(additionText.toUpperCase(Locale.ROOT));
      } catch (IllegalArgumentException unknown) {
        problems.add(new Problem("import.dwelling.unknownAddition", ADDITION, additionText));
      }
    }
    DwellingForm form =
        problems.isEmpty()
            ? new DwellingForm(
                area,
                DwellingForm.SQUARE_FEET,
                smallAppliance,
                laundry,
                optional,
                addition,
                null,
                null)
            : null;
    return new DwellingInputsInFile(board, form, problems);
  }

  private static Double number(Map<String, String> values, String label, List<Problem> problems) {
    String text = values.getOrDefault(label, "");
    if (text.isEmpty() || text.equalsIgnoreCase("not recorded")) {
      return null;
    }
    try {
      return Double.valueOf(text.replace(",", ""));
    } catch (NumberFormatException notNumber) {
      problems.add(new Problem("import.dwelling.notNumber", label, text));
      return null;
    }
  }

  private static Integer count(Map<String, String> values, String label, List<Problem> problems) {
    Double value = number(values, label, problems);
    if (value == null) {
      return null;
    }
    if (value != Math.rint(value) || value < 0 || value > 1000) {
      problems.add(new Problem("import.dwelling.outOfRange", label, values.get(label)));
      return null;
    }
    return value.intValue();
  }
}
