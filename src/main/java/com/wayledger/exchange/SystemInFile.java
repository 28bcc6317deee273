package com.wayledger.exchange;

import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * The rule set and supply system our own export names: on a board sheet in its facts row (row 2:
 * the rule set's title in column O, the supply system in words in column Q); in a CSV file on the
 * line after its schedule ("Rule set", title, "Supply system", words). An import into a board whose
 * site is under another rule set, or whose supply is another system, is refused with both named:
 * its sizes, lengths, lines and checks would mean something else there.
 *
 * @param ruleSetTitle the file's rule set, as its title ("NEC (NFPA 70) …")
 * @param supplySystemWords the file's supply system in words; empty when the file names none (an
 *     export from before supply systems)
 */
public record SystemInFile(String ruleSetTitle, String supplySystemWords) {

  /** Row 2 of our board sheet (spreadsheet numbering) holds the facts. */
  static final int FACTS_ROW = 2;

  static final int RULE_SET_COLUMN = 14;
  static final int SUPPLY_SYSTEM_COLUMN = 16;

  /** The labels the CSV writes before each value, as the workbook's facts row names them. */
  static final String RULE_SET_LABEL = "Rule set";

  static final String SUPPLY_SYSTEM_LABEL = "Supply system";

  /**
   * Labels read before the values, in either trade vocabulary (lower case): the en-GB words the
   * export writes and the en-US words a person may have typed over them.
   */
  private static final Set<String> RULE_SET_LABELS = Set.of("rule set", "rules", "code");

  private static final Set<String> SUPPLY_SYSTEM_LABELS =
      Set.of("supply system", "supply", "system", "service", "electrical service", "service type");

  /** What the file says, when it is our own export and names a rule set. */
  public static Optional<SystemInFile> of(SheetTable table) {
    if (!table.isOwnExport()) {
      return Optional.empty();
    }
    SheetTable.Row facts = table.aboveRow(FACTS_ROW);
    if (facts != null && !facts.cell(RULE_SET_COLUMN).isBlank()) {
      return Optional.of(
          new SystemInFile(
              facts.cell(RULE_SET_COLUMN).strip(), facts.cell(SUPPLY_SYSTEM_COLUMN).strip()));
    }
    for (SheetTable.Row row : table.below()) {
      String ruleSet = valueAfter(row, RULE_SET_LABELS);
      if (ruleSet != null && !ruleSet.isBlank()) {
        String system = valueAfter(row, SUPPLY_SYSTEM_LABELS);
        return Optional.of(new SystemInFile(ruleSet.strip(), system == null ? "" : system.strip()));
      }
    }
    return Optional.empty();
  }

  /** The cell after the first cell of the row that reads as one of {@code labels}; else null. */
  private static String valueAfter(SheetTable.Row row, Set<String> labels) {
    for (int i = 0; i + 1 < row.cells().size(); i++) {
      String label = row.cell(i).strip().toLowerCase(Locale.ROOT);
      if (label.endsWith(":")) {
        label = label.substring(0, label.length() - 1).strip();
      }
      if (labels.contains(label)) {
        return row.cell(i + 1);
      }
    }
    return null;
  }

  /**
   * Whether a board under {@code ruleSetTitle} on {@code supplySystemWords} may take this file: the
   * same rule set, and the same system when the file names one.
   */
  public boolean fits(String boardRuleSetTitle, String boardSupplySystemWords) {
    if (!ruleSetTitle.equals(boardRuleSetTitle)) {
      return false;
    }
    return supplySystemWords.isEmpty() || supplySystemWords.equals(boardSupplySystemWords);
  }
}
