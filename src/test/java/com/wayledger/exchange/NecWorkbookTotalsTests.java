package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DiversityMethods;
import java.io.IOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/**
 * The schedule sheet's totals block of North American panels, recalculated by POI, line by line
 * against hand calculations and against the demand engine (which the board page and the demand API
 * read). Hand calculations use the phasor relations of the split-phase and wye systems (from
 * memory: W. D. Stevenson, Elements of Power System Analysis, ch. 2): a 240 V load on 120/240 V
 * draws P/240 on A and on B; a 208 V load between A and B of a 208Y/120 V panel draws P/208 on
 * both, I_A at +30° and I_B at −150° at unity power factor. No diversity (method NONE), so demand
 * equals connected load. Tolerance 0.01 A.
 */
class NecWorkbookTotalsTests {

  private static final double AMPS = 0.01;
  private static final List<String> LETTERS = List.of("A", "B", "C");
  private static final SupplySpec SPLIT_PHASE =
      new SupplySpec(
          EarthingSystem.TN_C_S,
          120.0,
          1,
          60.0,
          null,
          10.0,
          200.0,
          SupplySystem.SPLIT_PHASE_120_240);

  @Test
  void splitPhasePanelTotalsLinesAAndBWithTwoFortyVoltLoadsOnBoth() throws IOException {
    // 2400 W on A (20 A), 1200 W on B (10 A), a 4800 W 240 V heater (20 A on A and B) and a 20 A
    // 240 V load at unity power factor (20 A on A and B): A 60 A, B 50 A
    List<CircuitEntry> circuits = new ArrayList<>();
    circuits.add(entry(1, 1, PhasePosition.L1, "Kitchen", 2400, RatingUnit.W));
    circuits.add(entry(2, 2, PhasePosition.L2, "Bedrooms", 1200, RatingUnit.W));
    circuits.add(entry(3, 3, PhasePosition.L1_L2, "Water heater", 4800, RatingUnit.W));
    circuits.add(entry(4, 5, PhasePosition.L1_L2, "Well pump", 20, RatingUnit.A));
    BoardEntry panel = new BoardEntry(1L, "P1", null, 1, 24, null, "", 0, circuits, LETTERS);
    ExportData data = export(List.of(panel), SPLIT_PHASE, Map.of());

    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      Sheet sheet = workbook.getSheet("Board P1");
      WorkbookWriterTests.Totals totals = WorkbookWriterTests.Totals.find(sheet, evaluator);
      assertThat(totals.value("A", 6))
          .as("demand A on line A: 20 + 20 + 20")
          .isCloseTo(60.0, within(AMPS));
      assertThat(totals.value("B", 6))
          .as("demand A on line B: 10 + 20 + 20")
          .isCloseTo(50.0, within(AMPS));
      assertThat(totals.value("A", 3)).as("connected A on line A").isCloseTo(60.0, within(AMPS));
      assertThat(totals.value("B", 3)).as("connected A on line B").isCloseTo(50.0, within(AMPS));
      assertThat(totals.value("Board", 1))
          .as("connected kW: 2.4 + 1.2 + 4.8 + 20 A × 240 V")
          .isCloseTo(13.2, within(1e-9));
      assertThat(totals.value("Unbalance %", 6))
          .as("largest deviation from the mean over the mean: 5 / 55")
          .isCloseTo(100.0 * 5 / 55, within(1e-6));
      assertThat(ibConnected(sheet, evaluator, "Water heater"))
          .as("Ib connected of the 4.8 kW heater: P / 240 V")
          .isCloseTo(20.0, within(AMPS));
      assertThat(ibConnected(sheet, evaluator, "Well pump"))
          .as("Ib connected of the 20 A pump, not 40 A")
          .isCloseTo(20.0, within(AMPS));
      sameAsTheEngine(totals, data.demand().board(1L), 2);
    }
  }

  @Test
  void findingsOnAPanelboardNameTheSpaceAndLinesAsTheBoardPageDoes() {
    List<CircuitEntry> circuits = new ArrayList<>();
    circuits.add(entry(1, 5, PhasePosition.L1, "Kitchen", 2400, RatingUnit.W));
    circuits.add(entry(2, 3, PhasePosition.L1_L2, "Water heater", 4800, RatingUnit.W));
    BoardEntry panel = new BoardEntry(1L, "P1", null, 1, 24, null, "", 0, circuits, LETTERS);
    ExportData data = export(List.of(panel), SPLIT_PHASE, Map.of());

    List<String> places =
        data.findings().boards().get(0).circuits().stream()
            .map(com.wayledger.engine.protection.CircuitFindings::placeOnBoard)
            .toList();
    assertThat(places)
        .as("positions in a panelboard's words, not \"way 5 L1\"")
        .containsExactlyInAnyOrder("space 5 A “Kitchen”", "space 3 A–B “Water heater”");
  }

  @Test
  void findingsSheetGathersNotAssessedCircuitsOfAPanelboardBySpaces() throws IOException {
    // neither breaker records a conductor: the same "not assessed" on both, gathered in one row
    List<CircuitEntry> circuits = new ArrayList<>();
    circuits.add(entry(1, 5, PhasePosition.L1, "Kitchen", 2400, RatingUnit.W));
    circuits.add(entry(2, 7, PhasePosition.L2, "Bedrooms", 1200, RatingUnit.W));
    BoardEntry panel = new BoardEntry(1L, "P1", null, 1, 24, null, "", 0, circuits, LETTERS);
    ExportData data = export(List.of(panel), SPLIT_PHASE, Map.of());

    List<String> figures = new ArrayList<>();
    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      for (Row row : workbook.getSheet("Findings")) {
        Cell cell = row.getCell(5);
        if (cell != null && cell.getCellType() == CellType.STRING) {
          figures.add(cell.getStringCellValue());
        }
      }
    }
    assertThat(figures)
        .as("gathered rows name the panel's spaces, as its page does")
        .contains("2 circuits, spaces 5, 7")
        .noneMatch(text -> text.contains("circuits, ways"));
  }

  @Test
  void wyePanelCountsTwoPoleLoadsAndCarriesAOneTwentyTwoOhEightPanelLineByLine()
      throws IOException {
    // HP (208Y/120 V): 1200 W on A (10 A ∠0°), 4160 W at 208 V between A and B, and a feeder on
    // B–C to TP, a 120/208 V panel with 2400 W on its A (20 A) and 1200 W on its B (10 A).
    // 4160 W / (120·√3 V) = 20.015 A, I_A ∠+30°, I_B ∠−150°.
    // A: |10 + 20.015∠30°| = √((10 + 17.333)² + 10.007²) = 29.107 A
    // B: S_B = 4160/√3 ∠+30° VA = 2080 W + 1200.9 var, plus TP's A 2400 W → √(4480² + 1200.9²)/120
    //    = 38.65 A
    // C: TP's B, 1200 W / 120 V = 10 A
    List<CircuitEntry> house = new ArrayList<>();
    house.add(entry(10, 1, PhasePosition.L1, "Corridor lights", 1200, RatingUnit.W));
    house.add(entry(11, 3, PhasePosition.L1_L2, "Rooftop unit", 4160, RatingUnit.W));
    house.add(
        new CircuitEntry(12L, breaker(5, PhasePosition.L2_L3, "Sub-board TP", 60.0), List.of()));
    List<CircuitEntry> tenant = new ArrayList<>();
    tenant.add(entry(20, 1, PhasePosition.L1, "Office sockets", 2400, RatingUnit.W));
    tenant.add(entry(21, 2, PhasePosition.L2, "Office lights", 1200, RatingUnit.W));
    BoardEntry hp = new BoardEntry(1L, "HP", null, 3, 42, null, "", 0, house, LETTERS);
    BoardEntry tp = new BoardEntry(2L, "TP", null, 1, 24, "HP", "", 1, tenant, LETTERS);
    ExportData data =
        export(
            List.of(hp, tp),
            new SupplySpec(
                EarthingSystem.TN_C_S,
                120.0,
                3,
                60.0,
                null,
                10.0,
                400.0,
                SupplySystem.WYE_208Y_120),
            Map.of(2L, SupplySystem.SINGLE_PHASE_120_208));

    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      WorkbookWriterTests.Totals house120 =
          WorkbookWriterTests.Totals.find(workbook.getSheet("Board HP"), evaluator);
      double a = Math.hypot(10 + 20.015 * Math.cos(Math.toRadians(30)), 20.015 * 0.5);
      double b = Math.hypot(2080 + 2400, 4160 / Math.sqrt(3) * 0.5) / 120;
      assertThat(house120.value("A", 6)).as("HP demand A on line A").isCloseTo(a, within(AMPS));
      assertThat(house120.value("B", 6)).as("HP demand A on line B").isCloseTo(b, within(AMPS));
      assertThat(house120.value("C", 6)).as("HP demand A on line C").isCloseTo(10.0, within(AMPS));
      assertThat(ibConnected(workbook.getSheet("Board HP"), evaluator, "Rooftop unit"))
          .as("Ib connected of the 208 V unit: P / 208 V, not P / 120 V")
          .isCloseTo(20.015, within(AMPS));
      sameAsTheEngine(house120, data.demand().board(1L), 3);

      WorkbookWriterTests.Totals tenantTotals =
          WorkbookWriterTests.Totals.find(workbook.getSheet("Board TP"), evaluator);
      assertThat(tenantTotals.value("A", 6))
          .as("TP line A: 2400 W / 120 V")
          .isCloseTo(20.0, within(AMPS));
      assertThat(tenantTotals.value("B", 6))
          .as("TP line B: 1200 W / 120 V")
          .isCloseTo(10.0, within(AMPS));
      sameAsTheEngine(tenantTotals, data.demand().board(2L), 2);

      Sheet summary = workbook.getSheet("Summary");
      Row head = summary.getRow(WorkbookWriter.HEADER_ROW);
      Row hpRow = summary.getRow(WorkbookWriter.HEADER_ROW + 1);
      Row tpRow = summary.getRow(WorkbookWriter.HEADER_ROW + 2);
      assertThat(head.getCell(3).getStringCellValue()).isEqualTo("Phases");
      // common practice: a 208Y/120 V panel is three-phase four-wire; a 120/208 V panel (two lines
      // and the neutral of the wye) is single-phase three-wire, however many lines it has
      assertThat(hpRow.getCell(3).getNumericCellValue()).as("HP, 208Y/120 V").isEqualTo(3.0);
      assertThat(tpRow.getCell(3).getNumericCellValue()).as("TP, 120/208 V").isEqualTo(1.0);
      assertThat(head.getCell(12).getStringCellValue()).isEqualTo("Supply system");
      assertThat(hpRow.getCell(12).getStringCellValue())
          .isEqualTo("208Y/120 V three-phase four-wire");
      assertThat(tpRow.getCell(12).getStringCellValue())
          .startsWith("120/208 V single-phase three-wire");
    }
  }

  @Test
  void summaryCountsASplitPhasePanelAsOnePhaseEvenWhenStoredWithThree() throws IOException {
    // a panel recorded with 3 phases before its site took the 120/240 V system: still two lines
    // and a neutral, single-phase three-wire (common practice)
    List<CircuitEntry> circuits = new ArrayList<>();
    circuits.add(entry(1, 1, PhasePosition.L1, "Kitchen", 2400, RatingUnit.W));
    BoardEntry panel = new BoardEntry(1L, "P1", null, 3, 24, null, "", 0, circuits, LETTERS);
    ExportData data = export(List.of(panel), SPLIT_PHASE, Map.of());

    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      Row row = workbook.getSheet("Summary").getRow(WorkbookWriter.HEADER_ROW + 1);
      assertThat(row.getCell(3).getNumericCellValue())
          .as("phases of a 120/240 V panel")
          .isEqualTo(1.0);
      assertThat(row.getCell(12).getStringCellValue())
          .isEqualTo("120/240 V single-phase three-wire");
    }
  }

  /** Each line's demand and connected current, as the page and the API show them. */
  private static void sameAsTheEngine(
      WorkbookWriterTests.Totals totals, BoardDemand engine, int lines) {
    assertThat(engine.lines()).as("lines of the board in the engine").isEqualTo(lines);
    for (int k = 0; k < lines; k++) {
      Phase phase = Phase.values()[k];
      String name = LETTERS.get(k);
      assertThat(totals.value(name, 6))
          .as("sheet demand A on %s equals the engine's", name)
          .isCloseTo(engine.onPhase(phase).currentAmps(), within(AMPS));
      assertThat(totals.value(name, 3))
          .as("sheet connected A on %s equals the engine's", name)
          .isCloseTo(engine.onPhase(phase).connectedCurrentAmps(), within(AMPS));
    }
    assertThat(totals.value("Board", 4) * 1000)
        .as("sheet demand kW equals the engine's")
        .isCloseTo(engine.demandWatts(), within(0.01));
  }

  private static double ibConnected(Sheet sheet, FormulaEvaluator evaluator, String circuit) {
    for (Row row : sheet) {
      Cell description = row.getCell(ScheduleColumn.CIRCUIT.ordinal());
      if (description != null
          && description.getCellType() == CellType.STRING
          && description.getStringCellValue().equals(circuit)) {
        return evaluator
            .evaluate(row.getCell(ScheduleColumn.IB_CONNECTED.ordinal()))
            .getNumberValue();
      }
    }
    throw new AssertionError("no row for " + circuit);
  }

  private static com.wayledger.board.CircuitForm breaker(
      int space, PhasePosition position, String description, double rating) {
    return ExchangeFixtures.circuit(
        space, position, description, DeviceKind.MCCB, null, rating, null, null, null);
  }

  private static CircuitEntry entry(
      long id,
      int space,
      PhasePosition position,
      String description,
      double rating,
      RatingUnit unit) {
    return new CircuitEntry(
        id,
        breaker(space, position, description, 20.0),
        List.of(ExchangeFixtures.load(description, LoadCategory.OTHER, 1, rating, unit, 1.0)));
  }

  /** The site analysed as the page analyses it, on a North American supply and rule set. */
  private static ExportData export(
      List<BoardEntry> boards, SupplySpec supply, Map<Long, SupplySystem> ownSystems) {
    SiteSpec iec = ExchangeFixtures.spec(boards, DiversityMethods.NONE);
    List<BoardSpec> specs = new ArrayList<>();
    for (BoardSpec b : iec.boards()) {
      specs.add(
          new BoardSpec(
              b.id(),
              b.reference(),
              b.phases(),
              b.wayCount(),
              b.busbarRatingAmps(),
              b.incomer(),
              b.parentBoardId(),
              b.submainCable(),
              b.unbalanceLimitPercent(),
              1.0,
              b.diversityMethodKey(),
              b.measuredExternalLoopImpedanceOhms(),
              b.measuredFaultCurrentKiloAmps(),
              b.circuits(),
              b.incomerOverloadSettingAmps(),
              ownSystems.get(b.id())));
    }
    SiteSpec spec = new SiteSpec(9L, "Cedar Row test", supply, DiversityMethods.NONE, specs, "NEC");
    SiteAnalysis analysis = AnalysisService.analyse(spec, DiversityMethods.builtIn());
    return new ExportData(
        9L,
        "Cedar Row test",
        "TN-C-S",
        boards,
        analysis.demand(),
        analysis.findings(),
        LocalDate.of(2026, 3, 14));
  }
}
