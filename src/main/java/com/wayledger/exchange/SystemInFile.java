package com.wayledger.exchange;

import java.util.Optional;

/**
 * The rule set and supply system our own board sheet names in its facts row (row 2: the rule set's
 * title in column O, the supply system in words in column Q). An import into a board whose site is
 * under another rule set, or whose supply is another system, is refused with both named: its sizes,
 * lengths, lines and checks would mean something else there.
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

  /** What the file says, when it is our own board sheet and names a rule set. */
  public static Optional<SystemInFile> of(SheetTable table) {
    if (!table.isOwnExport()) {
      return Optional.empty();
    }
    SheetTable.Row facts = table.aboveRow(FACTS_ROW);
    if (facts == null || facts.cell(RULE_SET_COLUMN).isBlank()) {
      return Optional.empty();
    }
    return Optional.of(
        new SystemInFile(
            facts.cell(RULE_SET_COLUMN).strip(), facts.cell(SUPPLY_SYSTEM_COLUMN).strip()));
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
