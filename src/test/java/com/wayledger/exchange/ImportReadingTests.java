package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.board.CircuitForm;
import com.wayledger.engine.PhasePosition;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Our own exports read back into the same circuits and loads, and rows with wrong values get a
 * message per cell.
 */
class ImportReadingTests {

  private static ValidatorFactory factory;
  private static Validator validator;

  @BeforeAll
  static void validator() {
    factory = Validation.buildDefaultValidatorFactory();
    validator = factory.getValidator();
  }

  @AfterAll
  static void close() {
    factory.close();
  }

  static byte[] xlsx(ExportData data) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new WorkbookWriter(ExchangeFixtures.CAUTION).write(data, false, out);
    return out.toByteArray();
  }

  static byte[] csv(ExportData data) throws IOException {
    StringWriter out = new StringWriter();
    CsvWriter.write(data, data.boards().get(0), ExchangeFixtures.CAUTION, out);
    return out.toString().getBytes(StandardCharsets.UTF_8);
  }

  static ImportPlan plan(byte[] bytes, String name, int phases, int ways) {
    SheetTable table = SpreadsheetReader.read(bytes, name, -1);
    return new RowReader(validator)
        .read(
            table, ColumnGuesser.guess(table), new RowReader.BoardContext(phases, ways, Set.of()));
  }

  /**
   * What was exported, one board, as the importer would rebuild it (ids and versions are not
   * exchanged).
   */
  static List<CircuitEntry> expected(BoardEntry board) {
    return board.circuits().stream()
        .map(e -> new CircuitEntry(null, e.circuit(), e.loads()))
        .toList();
  }

  static List<CircuitEntry> imported(ImportPlan plan) {
    List<CircuitEntry> entries = new ArrayList<>();
    for (ImportPlan.PlannedCircuit c : plan.circuits()) {
      entries.add(new CircuitEntry(null, c.circuit(), c.loads()));
    }
    return entries;
  }

  @Test
  void ourWorkbookReadsBackIntoTheSameCircuitsAndLoads() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    SheetTable table = SpreadsheetReader.read(xlsx(data), "shop.xlsx", -1);
    assertThat(table.isOwnExport()).as("headers recognised as ours").isTrue();
    ImportPlan plan = plan(xlsx(data), "shop.xlsx", 3, 12);
    assertThat(plan.rows()).as("rows").allMatch(ImportPlan.PreviewRow::isValid);
    assertThat(imported(plan)).isEqualTo(expected(data.boards().get(0)));
    assertThat(imported(plan))
        .as("the ring survives the round trip")
        .anyMatch(
            e ->
                e.circuit().description().equals("Counter sockets")
                    && Boolean.TRUE.equals(e.circuit().ringFinal()))
        .anyMatch(
            e ->
                e.circuit().description().equals("Cooker")
                    && Boolean.FALSE.equals(e.circuit().ringFinal()));
  }

  @Test
  void circuitLocationSurvivesTheWorkbookRoundTrip() throws IOException {
    List<BoardEntry> shop = ExchangeFixtures.shop();
    BoardEntry main = shop.get(0);
    List<CircuitEntry> located = new ArrayList<>();
    for (CircuitEntry e : main.circuits()) {
      com.wayledger.engine.CircuitLocation where =
          e.circuit().description().equals("Shop lights")
              ? com.wayledger.engine.CircuitLocation.OUTDOORS
              : e.circuit().description().equals("Cooker")
                  ? com.wayledger.engine.CircuitLocation.INDOORS
                  : null;
      located.add(new CircuitEntry(e.circuitId(), e.circuit().at(where), e.loads()));
    }
    BoardEntry changed =
        new BoardEntry(
            main.id(),
            main.reference(),
            main.location(),
            main.phases(),
            main.wayCount(),
            main.parentReference(),
            main.incomerLabel(),
            main.depth(),
            located);
    ExportData data =
        ExchangeFixtures.export(
            List.of(changed, shop.get(1)),
            com.wayledger.engine.demand.DiversityMethods.UK_SMALL_SHOP);

    ImportPlan plan = plan(xlsx(data), "shop.xlsx", 3, 12);

    assertThat(plan.rows()).as("rows").allMatch(ImportPlan.PreviewRow::isValid);
    assertThat(imported(plan)).isEqualTo(expected(changed));
  }

  @Test
  void circuitLocationIsReadInWordsOrCodesAndAnUnknownOneIsRefusedOnItsRow() {
    String csv =
        """
        Way,Line,Circuit,Device,Curve,In A,Location,Load,Category,Rating,Unit,PF
        1,L1,Yard lights,MCB,B,6,OUTDOORS,Lamps,LIGHTING,100,W,0.9
        2,L2,Bath fan,MCB,B,6,Bath or shower,Fan,OTHER,30,W,0.9
        3,L3,Store lights,MCB,B,6,,Lamps,LIGHTING,100,W,0.9
        4,L1,Odd lights,MCB,B,6,cellar,Lamps,LIGHTING,100,W,0.9
        """;
    ImportPlan plan = plan(csv.getBytes(StandardCharsets.UTF_8), "where.csv", 3, 12);

    assertThat(plan.circuits())
        .extracting(c -> c.circuit().description(), c -> c.circuit().location())
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(
                "Yard lights", com.wayledger.engine.CircuitLocation.OUTDOORS),
            org.assertj.core.groups.Tuple.tuple(
                "Bath fan", com.wayledger.engine.CircuitLocation.BATH_OR_SHOWER),
            org.assertj.core.groups.Tuple.tuple("Store lights", null));
    assertThat(problem(plan, 5))
        .as("unknown location")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.LOCATION, "import.cell.unknownChoice");
  }

  @Test
  void ourCsvEndsWithTheRuleSetAndTheCautionAfterABlankLine() throws IOException {
    String[] lines =
        new String(csv(ExchangeFixtures.shopExport()), StandardCharsets.UTF_8).split("\r?\n");
    assertThat(lines[lines.length - 3]).as("blank line after the schedule").isEmpty();
    assertThat(lines[lines.length - 2])
        .as("then what the schedule was checked against, as the workbook's facts row")
        .startsWith("\"Rule set\",\"IEC 60364 / BS 7671\",\"Supply system\",");
    assertThat(lines[lines.length - 1]).contains("Caution: " + ExchangeFixtures.CAUTION);
  }

  @Test
  void ourCsvReadsBackIntoTheSameCircuitsAndLoads() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    byte[] bytes = csv(data);
    String text = new String(bytes, StandardCharsets.UTF_8);
    assertThat(text).as("formula-like circuit text quoted").contains("'=HYPERLINK");
    assertThat(text).as("formula-like load text quoted").contains("'+Water heater");
    assertThat(text.lines().findFirst().orElseThrow())
        .as("header row")
        .startsWith("\"Way\",\"Line\",\"Circuit\",\"State\"");
    ImportPlan plan = plan(bytes, "shop.csv", 3, 12);
    assertThat(plan.isAllValid()).as("all rows valid: %s", plan.rows()).isTrue();
    assertThat(imported(plan)).isEqualTo(expected(data.boards().get(0)));
  }

  @Test
  void wrongValuesGetAMessageOnTheirRowAndColumn() throws IOException {
    String csv =
        """
        Way,Line,Circuit,Device,Curve,In A,Load,Category,Rating,Unit,PF
        1,L1,Lights,MCB,E,10,Lamps,LIGHTING,100,W,0.9
        2,L2,Sockets,MCB,B,sixteen,Sockets,SOCKET_OUTLETS,2000,W,0.95
        3,L3,Heater,MCB,B,16,Heater,SPACE_HEATING,2000,W,1.4
        3,L3,Other heater,MCB,B,16,Heater,SPACE_HEATING,2000,W,1
        4,L4,Pump,MCB,C,16,Pump,MOTOR,2,A,0.8
        20,L1,Far way,MCB,B,16,Thing,OTHER,100,W,1
        5,L1,Good,MCB,B,16,Thing,OTHER,100,W,1
        """;
    ImportPlan plan = plan(csv.getBytes(StandardCharsets.UTF_8), "bad.csv", 3, 12);
    assertThat(problem(plan, 2))
        .as("unknown curve")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.CURVE, "import.cell.unknownChoice");
    assertThat(problem(plan, 3))
        .as("rating not a number")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.RATING_AMPS, "import.cell.notNumber");
    assertThat(problem(plan, 4))
        .as("power factor out of range")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.POWER_FACTOR, "import.cell.invalid");
    assertThat(problem(plan, 5))
        .as("duplicate position")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.LINE, "import.cell.duplicate");
    assertThat(problem(plan, 6))
        .as("unknown line")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.LINE, "import.cell.unknownLine");
    assertThat(problem(plan, 7))
        .as("way beyond the board")
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(ImportField.WAY, "import.cell.beyondBoard");
    assertThat(plan.circuits())
        .as("only the valid circuit would be stored")
        .extracting(c -> c.circuit().description())
        .containsExactly("Good");
  }

  @Test
  void aPositionAlreadyTakenOnTheBoardIsRefused() {
    String csv = "Way,Line,Circuit,Device,Curve,In A\n2,3P,Oven,MCB,C,32\n";
    SheetTable table = SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "t.csv", -1);
    ImportPlan plan =
        new RowReader(validator)
            .read(
                table,
                ColumnGuesser.guess(table),
                new RowReader.BoardContext(
                    3, 12, Set.of(RowReader.BoardContext.slot(2, com.wayledger.engine.Phase.L2))));
    assertThat(problem(plan, 2))
        .extracting(ImportPlan.Problem::code)
        .isEqualTo("import.cell.taken");
  }

  @Test
  void singlePhaseBoardTakesBlankLinesAsL1AndRefusesL2() {
    String csv = "Way,Circuit,Device,Curve,In A,Line\n1,Lights,MCB,B,6,\n2,Sockets,MCB,B,32,L2\n";
    ImportPlan plan = plan(csv.getBytes(StandardCharsets.UTF_8), "t.csv", 1, 6);
    CircuitForm first = plan.rows().get(0).circuit();
    assertThat(first.position()).isEqualTo(PhasePosition.L1);
    assertThat(problem(plan, 3))
        .extracting(ImportPlan.Problem::code)
        .isEqualTo("import.cell.singlePhaseBoard");
  }

  @Test
  void emptySheetAndHeaderOnlySheetAreRefusedWithAMessage() throws IOException {
    try (XSSFWorkbook workbook = new XSSFWorkbook()) {
      workbook.createSheet("Empty");
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      assertThatThrownBy(() -> SpreadsheetReader.read(out.toByteArray(), "empty.xlsx", -1))
          .isInstanceOf(ImportRefused.class)
          .extracting(e -> ((ImportRefused) e).messageCode())
          .isEqualTo("import.refused.emptySheet");
    }
    try (XSSFWorkbook workbook = new XSSFWorkbook()) {
      Sheet sheet = workbook.createSheet("Header only");
      Row header = sheet.createRow(0);
      header.createCell(0).setCellValue("Way");
      header.createCell(1).setCellValue("Circuit");
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      assertThatThrownBy(() -> SpreadsheetReader.read(out.toByteArray(), "header.xlsx", -1))
          .isInstanceOf(ImportRefused.class)
          .extracting(e -> ((ImportRefused) e).messageCode())
          .isEqualTo("import.refused.noRows");
    }
  }

  private static ImportPlan.Problem problem(ImportPlan plan, int rowNumber) {
    ImportPlan.PreviewRow row =
        plan.rows().stream().filter(r -> r.number() == rowNumber).findFirst().orElseThrow();
    assertThat(row.problems()).as("problems of row %d", rowNumber).hasSize(1);
    return row.problems().get(0);
  }
}
