package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The rule set and supply system our CSV names on the line after its schedule are read back, with
 * the labels in either vocabulary, and never become a circuit.
 */
class SystemInFileTests {

  private static String header() {
    List<String> cells = new ArrayList<>();
    for (ScheduleColumn column : ScheduleColumn.values()) {
      cells.add("\"" + column.header() + "\"");
    }
    return String.join(",", cells);
  }

  private static SheetTable read(String afterSchedule) {
    List<String> row = new ArrayList<>();
    for (ScheduleColumn column : ScheduleColumn.values()) {
      row.add(
          switch (column) {
            case WAY -> "\"1\"";
            case LINE -> "\"A\"";
            case CIRCUIT -> "\"Kitchen\"";
            default -> "\"\"";
          });
    }
    String csv =
        header()
            + "\r\n"
            + String.join(",", row)
            + "\r\n\r\n"
            + afterSchedule
            + "\"Caution: x\"\r\n";
    return SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "panel.csv", -1);
  }

  @Test
  void ourCsvLineAfterTheScheduleIsReadAsTheFilesRuleSetAndSystem() {
    SheetTable table =
        read(
            "\"Rule set\",\"NEC (NFPA 70)\",\"Supply system\","
                + "\"120/240 V single-phase three-wire\"\r\n");

    assertThat(SystemInFile.of(table))
        .contains(new SystemInFile("NEC (NFPA 70)", "120/240 V single-phase three-wire"));
    assertThat(table.rows()).as("only the schedule's row is a row").hasSize(1);
  }

  @Test
  void labelsTypedInUsWordsAreReadAlike() {
    SheetTable table =
        read("\"Code:\",\"NEC (NFPA 70)\",\"Service\",\"208Y/120 V three-phase four-wire\"\r\n");

    assertThat(SystemInFile.of(table))
        .contains(new SystemInFile("NEC (NFPA 70)", "208Y/120 V three-phase four-wire"));
  }

  @Test
  void aCsvFromBeforeTheRuleSetLineNamesNone() {
    assertThat(SystemInFile.of(read(""))).isEmpty();
  }
}
