package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DiversityMethods;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The exported workbook read back with POI: every formula evaluates, and what it evaluates to equals the
 * demand engine's own figure. Tolerance: 1e-6 relative (both sides do the same double arithmetic in a
 * different order; the workbook works in kW, the engine in W).
 */
class WorkbookWriterTests {

  private static final double RELATIVE = 1e-6;

  static XSSFWorkbook written(ExportData data, boolean summary) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new WorkbookWriter(ExchangeFixtures.CAUTION).write(data, summary, out);
    return new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()));
  }

  @ParameterizedTest
  @ValueSource(strings = {DiversityMethods.NONE, DiversityMethods.UK_SMALL_SHOP, DiversityMethods.UK_HOUSEHOLD})
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
                  .as("formula %s!%s (%s) gives a number", sheet.getSheetName(), cell.getAddress(), cell.getCellFormula())
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
              .isCloseTo(engine.onPhase(phase).currentAmps(), within(RELATIVE * Math.max(1, engine.onPhase(phase).currentAmps())));
        }
        assertThat(totals.value("Board", 4) * 1000).as("%s demand kW", board.reference())
            .isCloseTo(engine.demandWatts(), within(RELATIVE * Math.max(1, engine.demandWatts())));
        assertThat(totals.value("Board", 5) * 1000).as("%s demand kvar", board.reference())
            .isCloseTo(engine.demandVars(), within(RELATIVE * Math.max(1, Math.abs(engine.demandVars()))));
        assertThat(totals.value("Board", 1) * 1000).as("%s connected kW", board.reference())
            .isCloseTo(engine.connectedWatts(), within(RELATIVE * Math.max(1, engine.connectedWatts())));
        assertThat(totals.value("Unbalance %", 6)).as("%s unbalance", board.reference())
            .isCloseTo(engine.unbalancePercent(), within(1e-6 * Math.max(1, engine.unbalancePercent())));
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
        CircuitDemand circuit = engine.circuits().stream()
            .filter(c -> c.wayNumber() == way && Codes.line(c.position()).equals(line)).findFirst().orElseThrow();
        double value = ib.getCellType() == CellType.FORMULA ? evaluator.evaluate(ib).getNumberValue() : ib.getNumericCellValue();
        assertThat(value).as("Ib connected of way %d %s", way, line)
            .isCloseTo(circuit.connectedCurrentAmps(), within(RELATIVE * Math.max(1, circuit.connectedCurrentAmps())));
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
      counter.getCell(ScheduleColumn.RATING.ordinal()).setCellValue(2800); // 1800 W → 2800 W, no diversity
      evaluator.clearAllCachedResultValues();
      double after = Totals.find(sheet, evaluator).value("L2", 4);
      assertThat(after - before).as("L2 demand kW moves by the added 1 kW").isCloseTo(1.0, within(1e-9));
    }
  }

  @Test
  void userTextThatLooksLikeAFormulaIsWrittenAsAStringCell() throws IOException {
    try (XSSFWorkbook workbook = written(ExchangeFixtures.shopExport(), false)) {
      Row row = rowOf(workbook.getSheet("Board MDB"), "=HYPERLINK(\"http://example.invalid\",\"x\")");
      assertThat(row.getCell(ScheduleColumn.CIRCUIT.ordinal()).getCellType()).as("circuit text cell").isEqualTo(CellType.STRING);
      assertThat(row.getCell(ScheduleColumn.LOAD.ordinal()).getCellType()).as("load text cell").isEqualTo(CellType.STRING);
      assertThat(row.getCell(ScheduleColumn.LOAD.ordinal()).getStringCellValue()).isEqualTo("+Water heater");
    }
  }

  @Test
  void boardSheetsPrintOnA4LandscapeOnePageWideWithHeaderAndFooter() throws IOException {
    try (XSSFWorkbook workbook = written(ExchangeFixtures.shopExport(), true)) {
      XSSFSheet sheet = workbook.getSheet("Board MDB");
      assertThat(sheet.getPrintSetup().getPaperSize()).as("paper").isEqualTo(PrintSetup.A4_PAPERSIZE);
      assertThat(sheet.getPrintSetup().getLandscape()).as("landscape").isTrue();
      assertThat(sheet.getPrintSetup().getFitWidth()).as("pages wide").isEqualTo((short) 1);
      assertThat(sheet.getPrintSetup().getFitHeight()).as("pages high (0 = as many as needed)").isEqualTo((short) 0);
      assertThat(sheet.getRepeatingRows().formatAsString()).as("repeated header").isEqualTo("4:4");
      assertThat(sheet.getFooter().getLeft()).contains("Tallow test shop").contains("MDB");
      assertThat(sheet.getFooter().getCenter()).contains("2025-03-14");
      assertThat(sheet.getFooter().getRight()).contains("&P");
      assertThat(sheet.getCTWorksheet().getAutoFilter().getRef()).as("autofilter").startsWith("A4:");
      assertThat(sheet.getPaneInformation().getHorizontalSplitPosition()).as("frozen below header").isEqualTo((short) 4);
      assertThat(workbook.getSheetIndex("Summary")).as("summary first").isZero();
      assertThat(workbook.getSheet("Methods").getRow(2).getCell(1).getStringCellValue()).isEqualTo(ExchangeFixtures.CAUTION);
      assertThat(workbook.getSheet("Findings")).as("findings sheet when findings exist").isNotNull();
      assertThat(sheet.getRow(2).getCell(0).getStringCellValue()).contains(ExchangeFixtures.CAUTION);
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
      assertThat(evaluator.evaluate(mdb.getCell(7)).getNumberValue() * 1000).as("MDB demand on the summary")
          .isCloseTo(data.demand().board(1L).demandWatts(), within(1e-6 * data.demand().board(1L).demandWatts()));
      assertThat(summary.getRow(WorkbookWriter.HEADER_ROW + 2).getCell(0).getStringCellValue()).as("child indented").isEqualTo("  DB2");
    }
  }

  static Row rowOf(Sheet sheet, String circuit) {
    for (Row row : sheet) {
      Cell cell = row.getCell(ScheduleColumn.CIRCUIT.ordinal());
      if (row.getRowNum() > WorkbookWriter.HEADER_ROW && cell != null && cell.getCellType() == CellType.STRING
          && cell.getStringCellValue().equals(circuit)) {
        return row;
      }
    }
    throw new AssertionError("no row for " + circuit);
  }

  /** The totals block under a board's rows, found by its labels in column A. */
  record Totals(Sheet sheet, FormulaEvaluator evaluator, List<Row> rows) {
    static Totals find(Sheet sheet, FormulaEvaluator evaluator) {
      List<Row> rows = new ArrayList<>();
      boolean in = false;
      for (Row row : sheet) {
        Cell a = row.getCell(0);
        if (a != null && a.getCellType() == CellType.STRING && a.getStringCellValue().equals("Totals")) {
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
        if (a != null && a.getCellType() == CellType.STRING && a.getStringCellValue().equals(label)) {
          return evaluator.evaluate(row.getCell(column)).getNumberValue();
        }
      }
      throw new AssertionError("no totals row " + label);
    }
  }
}
