package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SheetDataWriter;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The exported workbook read back with POI: every formula evaluates, and what it evaluates to
 * equals the demand engine's own figure. Tolerance: 1e-6 relative (both sides do the same double
 * arithmetic in a different order; the workbook works in kW, the engine in W).
 */
class WorkbookWriterTests {

  private static final double RELATIVE = 1e-6;

  static XSSFWorkbook written(ExportData data, boolean summary) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new WorkbookWriter(ExchangeFixtures.CAUTION).write(data, summary, out);
    return new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()));
  }

  @ParameterizedTest
  @ValueSource(
      strings = {
        DiversityMethods.NONE,
        DiversityMethods.UK_SMALL_SHOP,
        DiversityMethods.UK_HOUSEHOLD
      })
  void everyFormulaEvaluatesAndPhaseTotalsEqualTheEngine(String method) throws IOException {
    ExportData data = ExchangeFixtures.export(ExchangeFixtures.shop(), method);
    try (XSSFWorkbook workbook = written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      int formulas = 0;
      for (Sheet sheet : workbook) {
        for (Row row : sheet) {
          for (Cell cell : row) {
            if (cell.getCellType() == CellType.FORMULA) {
              assertThat(evaluator.evaluate(cell).getCellType())
                  .as(
                      "formula %s!%s (%s) gives a number",
                      sheet.getSheetName(), cell.getAddress(), cell.getCellFormula())
                  .isEqualTo(CellType.NUMERIC);
              formulas++;
            }
          }
        }
      }
      assertThat(formulas).as("formulas in the workbook").isGreaterThan(50);
      for (BoardEntry board : data.boards()) {
        BoardDemand engine = data.demand().board(board.id());
        XSSFSheet sheet = workbook.getSheet("Board " + board.reference());
        Totals totals = Totals.find(sheet, evaluator);
        for (Phase phase : Phase.values()) {
          assertThat(totals.value(phase.name(), 6))
              .as("%s demand current on %s (method %s)", board.reference(), phase, method)
              .isCloseTo(
                  engine.onPhase(phase).currentAmps(),
                  within(RELATIVE * Math.max(1, engine.onPhase(phase).currentAmps())));
        }
        assertThat(totals.value("Board", 4) * 1000)
            .as("%s demand kW", board.reference())
            .isCloseTo(engine.demandWatts(), within(RELATIVE * Math.max(1, engine.demandWatts())));
        assertThat(totals.value("Board", 5) * 1000)
            .as("%s demand kvar", board.reference())
            .isCloseTo(
                engine.demandVars(), within(RELATIVE * Math.max(1, Math.abs(engine.demandVars()))));
        assertThat(totals.value("Board", 1) * 1000)
            .as("%s connected kW", board.reference())
            .isCloseTo(
                engine.connectedWatts(), within(RELATIVE * Math.max(1, engine.connectedWatts())));
        assertThat(totals.value("Unbalance %", 6))
            .as("%s unbalance", board.reference())
            .isCloseTo(
                engine.unbalancePercent(), within(1e-6 * Math.max(1, engine.unbalancePercent())));
      }
    }
  }

  @Test
  void connectedCurrentOfEachCircuitEqualsTheEngine() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    try (XSSFWorkbook workbook = written(data, false)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      XSSFSheet sheet = workbook.getSheet("Board MDB");
      BoardDemand engine = data.demand().board(1L);
      int checked = 0;
      for (int r = WorkbookWriter.HEADER_ROW + 1; r <= sheet.getLastRowNum(); r++) {
        Row row = sheet.getRow(r);
        Cell ib = row == null ? null : row.getCell(ScheduleColumn.IB_CONNECTED.ordinal());
        if (ib == null) {
          continue;
        }
        int way = (int) row.getCell(ScheduleColumn.WAY.ordinal()).getNumericCellValue();
        String line = row.getCell(ScheduleColumn.LINE.ordinal()).getStringCellValue();
        CircuitDemand circuit =
            engine.circuits().stream()
                .filter(c -> c.wayNumber() == way && Codes.line(c.position()).equals(line))
                .findFirst()
                .orElseThrow();
        double value =
            ib.getCellType() == CellType.FORMULA
                ? evaluator.evaluate(ib).getNumberValue()
                : ib.getNumericCellValue();
        assertThat(value)
            .as("Ib connected of way %d %s", way, line)
            .isCloseTo(
                circuit.connectedCurrentAmps(),
                within(RELATIVE * Math.max(1, circuit.connectedCurrentAmps())));
        checked++;
      }
      assertThat(checked).as("circuits checked").isEqualTo(data.boards().get(0).circuits().size());
    }
  }

  @Test
  void editingALoadInTheSheetMovesThePhaseAndBoardTotals() throws IOException {
    ExportData data = ExchangeFixtures.export(ExchangeFixtures.shop(), DiversityMethods.NONE);
    try (XSSFWorkbook workbook = written(data, false)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      XSSFSheet sheet = workbook.getSheet("Board MDB");
      double before = Totals.find(sheet, evaluator).value("L2", 4);
      Row counter = rowOf(sheet, "Counter sockets");
      counter
          .getCell(ScheduleColumn.RATING.ordinal())
          .setCellValue(2800); // 1800 W → 2800 W, no diversity
      evaluator.clearAllCachedResultValues();
      double after = Totals.find(sheet, evaluator).value("L2", 4);
      assertThat(after - before)
          .as("L2 demand kW moves by the added 1 kW")
          .isCloseTo(1.0, within(1e-9));
    }
  }

  @Test
  void everyFormulaCellStoresTheResultASpreadsheetWouldCompute() throws IOException {
    // A program that opens the file without recalculating shows the stored results: they must be
    // right.
    ExportData data = ExchangeFixtures.shopExport();
    try (XSSFWorkbook workbook = written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      int formulas = 0;
      for (org.apache.poi.ss.usermodel.Sheet sheet : workbook) {
        for (org.apache.poi.ss.usermodel.Row row : sheet) {
          for (org.apache.poi.ss.usermodel.Cell cell : row) {
            if (cell.getCellType() != org.apache.poi.ss.usermodel.CellType.FORMULA) {
              continue;
            }
            formulas++;
            double stored = cell.getNumericCellValue();
            double computed = evaluator.evaluate(cell).getNumberValue();
            assertThat(stored)
                .as(
                    "stored result of %s!%s (%s)",
                    sheet.getSheetName(), cell.getAddress(), cell.getCellFormula())
                .isCloseTo(
                    computed,
                    org.assertj.core.api.Assertions.within(1e-9 + Math.abs(computed) * 1e-9));
          }
        }
      }
      assertThat(formulas).as("formula cells checked").isGreaterThan(50);
    }
  }

  @Test
  void userTextThatLooksLikeAFormulaIsWrittenAsAStringCell() throws IOException {
    try (XSSFWorkbook workbook = written(ExchangeFixtures.shopExport(), false)) {
      Row row =
          rowOf(workbook.getSheet("Board MDB"), "=HYPERLINK(\"http://example.invalid\",\"x\")");
      assertThat(row.getCell(ScheduleColumn.CIRCUIT.ordinal()).getCellType())
          .as("circuit text cell")
          .isEqualTo(CellType.STRING);
      assertThat(row.getCell(ScheduleColumn.LOAD.ordinal()).getCellType())
          .as("load text cell")
          .isEqualTo(CellType.STRING);
      assertThat(row.getCell(ScheduleColumn.LOAD.ordinal()).getStringCellValue())
          .isEqualTo("+Water heater");
    }
  }

  @Test
  void boardSheetsPrintOnA4LandscapeOnePageWideWithHeaderAndFooter() throws IOException {
    try (XSSFWorkbook workbook = written(ExchangeFixtures.shopExport(), true)) {
      XSSFSheet sheet = workbook.getSheet("Board MDB");
      assertThat(sheet.getPrintSetup().getPaperSize())
          .as("paper")
          .isEqualTo(PrintSetup.A4_PAPERSIZE);
      assertThat(sheet.getPrintSetup().getLandscape()).as("landscape").isTrue();
      assertThat(sheet.getPrintSetup().getFitWidth()).as("pages wide").isEqualTo((short) 1);
      assertThat(sheet.getPrintSetup().getFitHeight())
          .as("pages high (0 = as many as needed)")
          .isEqualTo((short) 0);
      assertThat(sheet.getRepeatingRows().formatAsString()).as("repeated header").isEqualTo("4:4");
      assertThat(sheet.getFooter().getLeft()).contains("Tallow test shop").contains("MDB");
      assertThat(sheet.getFooter().getCenter()).contains("2025-03-14");
      assertThat(sheet.getFooter().getRight()).contains("&P");
      assertThat(sheet.getCTWorksheet().getAutoFilter().getRef())
          .as("autofilter")
          .startsWith("A4:");
      assertThat(sheet.getPaneInformation().getHorizontalSplitPosition())
          .as("frozen below header")
          .isEqualTo((short) 4);
      assertThat(workbook.getSheetIndex("Summary")).as("summary first").isZero();
      assertThat(workbook.getSheet("Methods").getRow(2).getCell(1).getStringCellValue())
          .isEqualTo(ExchangeFixtures.CAUTION);
      assertThat(workbook.getSheet("Findings"))
          .as("findings sheet when findings exist")
          .isNotNull();
      assertThat(sheet.getRow(2).getCell(0).getStringCellValue())
          .contains(ExchangeFixtures.CAUTION);
    }
  }

  @Test
  void summaryRefersToEachBoardSheetsTotals() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    try (XSSFWorkbook workbook = written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      Sheet summary = workbook.getSheet("Summary");
      Row mdb = summary.getRow(WorkbookWriter.HEADER_ROW + 1);
      assertThat(mdb.getCell(0).getStringCellValue()).isEqualTo("MDB");
      assertThat(evaluator.evaluate(mdb.getCell(7)).getNumberValue() * 1000)
          .as("MDB demand on the summary")
          .isCloseTo(
              data.demand().board(1L).demandWatts(),
              within(1e-6 * data.demand().board(1L).demandWatts()));
      assertThat(summary.getRow(WorkbookWriter.HEADER_ROW + 2).getCell(0).getStringCellValue())
          .as("child indented")
          .isEqualTo("  DB2");
    }
  }

  @Test
  void findingsSheetListsEveryProblemAndGathersNotAssessedPerBoardAndReason() throws IOException {
    // 2 boards of 6 circuits; the generated circuits record no ambient temperature, so one check is
    // not assessed on each
    ExportData data =
        ExchangeFixtures.export(
            ExchangeFixtures.generated(12, 6, 7L), DiversityMethods.UK_SMALL_SHOP);
    int engineProblems = 0;
    Map<String, Map<Finding, Integer>> engineNotAssessed = new HashMap<>();
    for (Finding finding : data.findings().siteFindings()) {
      engineProblems += finding.isProblem() ? 1 : 0;
    }
    for (BoardFindings board : data.findings().boards()) {
      for (Finding finding : board.findings()) {
        engineProblems += finding.isProblem() ? 1 : 0;
      }
      for (CircuitFindings circuit : board.circuits()) {
        for (Finding finding : circuit.findings()) {
          engineProblems += finding.isProblem() ? 1 : 0;
          if (finding.verdict() == Verdict.NOT_ASSESSED) {
            engineNotAssessed
                .computeIfAbsent(board.reference(), b -> new HashMap<>())
                .merge(finding, 1, Integer::sum);
          }
        }
      }
    }
    assertThat(engineNotAssessed.values())
        .as("the engine leaves a check not assessed on several circuits of a board")
        .anySatisfy(
            byFinding ->
                assertThat(byFinding.values()).anySatisfy(n -> assertThat(n).isGreaterThan(1)));
    try (XSSFWorkbook workbook = written(data, true)) {
      Sheet findings = workbook.getSheet("Findings");
      int problemRows = 0;
      Map<String, Map<String, String>> notAssessedRows = new HashMap<>();
      for (Row row : findings) {
        if (row.getRowNum() <= WorkbookWriter.HEADER_ROW) {
          continue;
        }
        Verdict verdict =
            com.wayledger.system.EnumWords.standard()
                .parse(Verdict.class, row.getCell(3).getStringCellValue());
        if (verdict == Verdict.NOT_ASSESSED) {
          String before =
              notAssessedRows
                  .computeIfAbsent(row.getCell(0).getStringCellValue(), b -> new HashMap<>())
                  .put(
                      row.getCell(2).getStringCellValue()
                          + " | "
                          + row.getCell(4).getStringCellValue(),
                      row.getCell(5) == null ? "" : row.getCell(5).getStringCellValue());
          assertThat(before).as("one row per board and reason").isNull();
        } else if (verdict.isProblem()) {
          problemRows++;
          if (row.getCell(1) != null) {
            assertThat(row.getCell(9))
                .as("a circuit's finding names the circuit (row %d)", row.getRowNum())
                .isNotNull();
            assertThat(row.getCell(8).getStringCellValue()).as("and its line").startsWith("L");
          }
        }
      }
      assertThat(problemRows)
          .as("every danger, warning and advice on its own row")
          .isEqualTo(engineProblems);
      engineNotAssessed.forEach(
          (board, byFinding) -> {
            assertThat(notAssessedRows.get(board))
                .as("not-assessed rows of %s", board)
                .hasSize(byFinding.size());
            byFinding.forEach(
                (finding, circuits) ->
                    assertThat(
                            notAssessedRows
                                .get(board)
                                .get(finding.check().title() + " | " + finding.summary()))
                        .as("%s %s: how many circuits and which ways", board, finding.check())
                        .isEqualTo(circuits == 1 ? "" : circuits + " circuits, ways 1–2"));
          });
    }
  }

  @Test
  void wayNumbersAreListedAsRanges() {
    assertThat(WorkbookWriter.wayRanges(List.of(8, 1, 3, 2, 5, 7, 3))).isEqualTo("1–3, 5, 7–8");
    assertThat(WorkbookWriter.wayRanges(List.of(4))).isEqualTo("4");
  }

  /** POI's own escaping, reached through a subclass since it is protected. */
  private static final class PoiEscaping extends SheetDataWriter {
    PoiEscaping(Writer out) throws IOException {
      super(out);
    }

    void escapeWithPoi(String text) throws IOException {
      outputEscapedString(text);
    }
  }

  @ParameterizedTest
  @ValueSource(
      strings = {
        "plain text",
        "<a & b> \"q\" 'x'",
        "tab\there\nline\rcr",
        "no\u00a0break",
        "bell\u0007 nul\u0000 esc\u001b",
        "\ufffe\uffff end",
        "emoji \ud83d\ude00 ok",
        "lone \ud800 surrogate \udc00",
        "=SUM(A1)",
        "Ω ° ² Δ × –",
        "",
        "&amp;"
      })
  void runEscapingWritesExactlyWhatPoiWrites(String text) throws IOException {
    StringWriter poi = new StringWriter();
    PoiEscaping reference = new PoiEscaping(poi);
    reference.escapeWithPoi(text);
    StringWriter ours = new StringWriter();
    WorkbookWriter.escape(text, ours);
    assertThat(ours.toString()).isEqualTo(poi.toString());
  }

  static Row rowOf(Sheet sheet, String circuit) {
    for (Row row : sheet) {
      Cell cell = row.getCell(ScheduleColumn.CIRCUIT.ordinal());
      if (row.getRowNum() > WorkbookWriter.HEADER_ROW
          && cell != null
          && cell.getCellType() == CellType.STRING
          && cell.getStringCellValue().equals(circuit)) {
        return row;
      }
    }
    throw new AssertionError("no row for " + circuit);
  }

  /**
   * The parent board's lines carry its sub-board's connected load, as the board page shows it (a
   * three-pole way shares its connected load evenly over its lines): recalculated by POI, each
   * line's connected current equals the page's figure from the demand engine to 0.01 A.
   */
  @Test
  void parentBoardLinesIncludeTheSubBoardConnectedLoadAsThePageShowsIt() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    com.wayledger.engine.demand.BoardDemand mdb = data.demand().board(1L);
    java.util.Map<com.wayledger.engine.Phase, double[]> page =
        new java.util.EnumMap<>(com.wayledger.engine.Phase.class);
    for (com.wayledger.engine.Phase p : com.wayledger.engine.Phase.values()) {
      page.put(p, new double[2]);
    }
    boolean feeds = false;
    for (com.wayledger.engine.demand.CircuitDemand c : mdb.circuits()) {
      if (!c.isAssessed() || c.position() == null) {
        continue;
      }
      feeds |= c.feedsBoardId() != null;
      int lines = c.position() == com.wayledger.engine.PhasePosition.THREE_POLE ? 3 : 1;
      for (com.wayledger.engine.Phase p : c.position().phases()) {
        page.get(p)[0] += c.connectedWatts() / lines;
        page.get(p)[1] += c.connectedVars() / lines;
      }
    }
    assertThat(feeds).as("the fixture's MDB feeds a sub-board").isTrue();
    try (XSSFWorkbook workbook = written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      Totals totals = Totals.find(workbook.getSheet("Board MDB"), evaluator);
      for (com.wayledger.engine.Phase p : com.wayledger.engine.Phase.values()) {
        double expected = Math.hypot(page.get(p)[0], page.get(p)[1]) / mdb.nominalVoltageVolts();
        assertThat(totals.value(p.name(), 3))
            .as("connected A on %s", p)
            .isCloseTo(expected, org.assertj.core.api.Assertions.within(0.01));
      }
    }
  }

  /** The totals block under a board's rows, found by its labels in column A. */
  record Totals(Sheet sheet, FormulaEvaluator evaluator, List<Row> rows) {
    static Totals find(Sheet sheet, FormulaEvaluator evaluator) {
      List<Row> rows = new ArrayList<>();
      boolean in = false;
      for (Row row : sheet) {
        Cell a = row.getCell(0);
        if (a != null
            && a.getCellType() == CellType.STRING
            && a.getStringCellValue().equals("Totals")) {
          in = true;
        }
        if (in) {
          rows.add(row);
        }
      }
      return new Totals(sheet, evaluator, rows);
    }

    double value(String label, int column) {
      for (Row row : rows) {
        Cell a = row.getCell(0);
        if (a != null
            && a.getCellType() == CellType.STRING
            && a.getStringCellValue().equals(label)) {
          return evaluator.evaluate(row.getCell(column)).getNumberValue();
        }
      }
      throw new AssertionError("no totals row " + label);
    }
  }
}
