package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.UUID;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * One figure everywhere: for every board of the demo site and of seeded random sites stored through
 * the application (origin boards, sub-boards on three-pole and single-pole feeders, a sub-board of
 * a sub-board, coincidence factors, moulded-case incomers with Ir below In), the rendered board
 * page (parsed with Jsoup), the JSON API and the exported site workbook recalculated by POI's
 * formula evaluator agree on each line's connected current, demand current, headroom and loading,
 * and on each feeder row's connected current, Ib and demand. API and workbook to 0.01 A; the page
 * to the precision it prints (A and % to one decimal: half a unit of the last digit, plus 0.01).
 *
 * <p>Invented data only.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
class CrossSurfaceIntegrationTests {

  private static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");
  private static final double AMPS = 0.01;
  private static final double PRINTED = 0.05 + 0.01;

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;

  // ------------------------------------------------------------ the engine and the workbook alone

  private static double pageConnectedAmps(BoardDemand board, Phase phase) {
    double p = 0;
    double q = 0;
    for (CircuitDemand c : board.circuits()) {
      if (!c.isAssessed() || c.position() == null || !c.position().phases().contains(phase)) {
        continue;
      }
      int lines = c.position() == PhasePosition.THREE_POLE ? 3 : 1;
      p += c.connectedWatts() / lines;
      q += c.connectedVars() / lines;
    }
    return Math.hypot(p, q) / board.nominalVoltageVolts();
  }

  @ParameterizedTest
  @ValueSource(longs = {0, 1, 2, 3, 4})
  void workbookLinesAgreeWithThePageAndApiFigures(long seed) throws IOException {
    ExportData data =
        seed == 0
            ? ExchangeFixtures.shopExport()
            : ExchangeFixtures.export(
                ExchangeFixtures.generated(60, 9, seed), DiversityMethods.UK_SMALL_SHOP);
    List<String> compared = new ArrayList<>();
    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      for (BoardEntry entry : data.boards()) {
        BoardDemand board = data.demand().board(entry.id());
        var totals =
            WorkbookWriterTests.Totals.find(
                workbook.getSheet("Board " + entry.reference()), evaluator);
        for (Phase phase : entry.isThreePhase() ? List.of(Phase.values()) : List.of(Phase.L1)) {
          String label = entry.isThreePhase() ? phase.name() : "L–N";
          assertThat(totals.value(label, 3))
              .as("seed %d, %s %s connected A", seed, entry.reference(), phase)
              .isCloseTo(pageConnectedAmps(board, phase), within(AMPS))
              .isCloseTo(board.onPhase(phase).connectedCurrentAmps(), within(AMPS));
          assertThat(totals.value(label, 6))
              .as("seed %d, %s %s demand A", seed, entry.reference(), phase)
              .isCloseTo(board.onPhase(phase).currentAmps(), within(AMPS));
          compared.add(entry.reference() + phase);
        }
      }
    }
    assertThat(compared).as("lines compared").hasSizeGreaterThanOrEqualTo(3);
  }

  // ------------------------------------------------------------ page, API and workbook

  /**
   * The demo site's MDB feeds the bakery board on a three-pole way and the flats on single-pole
   * ways: the workbook's feeder rows carry each sub-board's load (not 0 kW / 0 A) and its lines
   * include the sub-boards' connected load (not 0.55 A where the page shows 241.1 A on L1).
   */
  @Test
  void demoSiteMdbFeederRowsAndLinesCarryTheSubBoardsAsThePageShowsThem() throws Exception {
    Site demo =
        sites.all().stream()
            .filter(s -> s.getName().equals("Tallow Lane Works"))
            .findFirst()
            .orElseThrow();
    Compared compared = compareSite(demo.getId());
    assertThat(compared.feederRows()).as("demo feeder rows compared").isGreaterThanOrEqualTo(3);
    assertThat(compared.boardsByReference()).containsKey("MDB");
    assertThat(compared.connectedOnL1("MDB"))
        .as("MDB L1 connected current carries the sub-boards")
        .isGreaterThan(100.0);
  }

  /**
   * The NEC demo: 120/240 V panels with 240 V loads, a 208Y/120 V house panel with two-pole loads
   * and feeders; page, API and the recalculated workbook agree line by line (A, B, C).
   */
  @Test
  void necDemoSitePanelsAgreeLineByLineOnPageApiAndWorkbook() throws Exception {
    Site demo =
        sites.all().stream()
            .filter(s -> s.getName().equals("Wrenfield Court Apartments"))
            .findFirst()
            .orElseThrow();
    Compared compared = compareSite(demo.getId());
    assertThat(compared.lines())
        .as("lines compared on the NEC demo's panels")
        .isGreaterThanOrEqualTo(5);
    assertThat(
            boards.onSite(demo.getId()).stream()
                .anyMatch(
                    b ->
                        b.getPositions().contains(com.wayledger.engine.PhasePosition.L1_L2)
                            && b.lineCount() == 2))
        .as("the demo has a two-line panel that takes two-pole breakers")
        .isTrue();
  }

  @ParameterizedTest
  @ValueSource(longs = {11, 12, 13, 14, 15, 16})
  void randomSitesAgreeOnPageApiAndWorkbook(long seed) throws Exception {
    long siteId = randomSite(seed);
    Compared compared = compareSite(siteId);
    assertThat(compared.lines()).as("seed %d: lines compared", seed).isGreaterThanOrEqualTo(4);
    assertThat(compared.feederRows()).as("seed %d: feeder rows compared", seed).isPositive();
  }

  record Compared(
      int lines, int feederRows, Map<String, Long> boardsByReference, Map<String, Double> l1) {
    double connectedOnL1(String reference) {
      return l1.get(reference);
    }
  }

  private Compared compareSite(long siteId) throws Exception {
    byte[] xlsx =
        mvc.perform(get("/sites/{id}/export.xlsx", siteId).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    int lines = 0;
    int feeders = 0;
    Map<String, Long> byReference = new HashMap<>();
    Map<String, Double> l1 = new HashMap<>();
    try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(xlsx))) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      for (Board board : boards.onSite(siteId)) {
        long id = board.getId();
        String reference = board.getReference();
        byReference.put(reference, id);
        String json =
            mvc.perform(get("/api/boards/{id}/demand", id).with(EDITOR))
                .andExpect(status().isOk())
                .andReturn()
                .getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        String html =
            mvc.perform(get("/boards/{id}", id).with(EDITOR))
                .andExpect(status().isOk())
                .andReturn()
                .getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        Document page = Jsoup.parse(html);
        Sheet sheet = workbook.getSheet("Board " + reference);
        assertThat(sheet).as("sheet of board %s", reference).isNotNull();
        var totals = WorkbookWriterTests.Totals.find(sheet, evaluator);
        List<Map<String, Object>> phases = JsonPath.read(json, "$.result.phases[*]");
        boolean oneLine = phases.size() == 1;
        for (Map<String, Object> phase : phases) {
          String line = (String) phase.get("phase");
          // the sheet names lines as the board does (A, B on a North American panel)
          String label = oneLine ? "L–N" : board.lineName(com.wayledger.engine.Phase.valueOf(line));
          String where = "board " + reference + " " + line;
          Element row = pageRow(page, line);
          double apiConnected = number(phase.get("connectedCurrentAmps"));
          double apiDemand = number(phase.get("currentAmps"));
          double bookConnected = totals.value(label, 3);
          double bookDemand = totals.value(label, 6);
          assertThat(bookConnected)
              .as("%s connected A: workbook vs API", where)
              .isCloseTo(apiConnected, within(AMPS));
          assertThat(cell(row, 0))
              .as("%s connected A: page vs workbook", where)
              .isCloseTo(bookConnected, within(PRINTED));
          assertThat(bookDemand)
              .as("%s demand A: workbook vs API", where)
              .isCloseTo(apiDemand, within(AMPS));
          assertThat(cell(row, 1))
              .as("%s demand A: page vs workbook", where)
              .isCloseTo(bookDemand, within(PRINTED));
          Object headroom = phase.get("headroomAmps");
          if (headroom == null) {
            assertThat(row.select("td").get(3).text())
                .as("%s headroom on the page", where)
                .doesNotMatch(".*\\d.*");
            assertThat(textAt(totals, label, 10))
                .as("%s rating in the workbook", where)
                .startsWith("not assessed");
          } else {
            double bookHeadroom = totals.value(label, 11);
            double bookLoading = totals.value(label, 12);
            assertThat(bookHeadroom)
                .as("%s headroom A: workbook vs API", where)
                .isCloseTo(number(headroom), within(AMPS));
            assertThat(cell(row, 3))
                .as("%s headroom A: page vs workbook", where)
                .isCloseTo(bookHeadroom, within(PRINTED));
            assertThat(bookLoading)
                .as("%s loading %%: workbook vs API", where)
                .isCloseTo(number(phase.get("loadingPercent")), within(0.01));
            assertThat(cell(row, 2))
                .as("%s loading %%: page vs workbook", where)
                .isCloseTo(bookLoading, within(PRINTED));
          }
          if ("L1".equals(line)) {
            l1.put(reference, bookConnected);
          }
          lines++;
        }
        List<Map<String, Object>> circuits =
            JsonPath.read(json, "$.result.circuits[?(@.feedsBoardId != null)]");
        for (Map<String, Object> feeder : circuits) {
          if (feeder.get("notAssessedReason") != null) {
            continue;
          }
          int way = ((Number) feeder.get("wayNumber")).intValue();
          PhasePosition position = PhasePosition.valueOf((String) feeder.get("position"));
          Row row = firstRowOf(sheet, way, Codes.line(position, board::lineName));
          String where = "board " + reference + " feeder way " + way;
          assertThat(value(evaluator, row, ScheduleColumn.IB_CONNECTED))
              .as("%s Ib connected: workbook vs API", where)
              .isCloseTo(number(feeder.get("connectedCurrentAmps")), within(AMPS));
          assertThat(value(evaluator, row, ScheduleColumn.IB_DESIGN))
              .as("%s Ib (heaviest line after coincidence): workbook vs API", where)
              .isCloseTo(number(feeder.get("designCurrentAmps")), within(AMPS));
          assertThat(value(evaluator, row, ScheduleColumn.DEMAND_KW) * 1000)
              .as("%s demand W: workbook vs API", where)
              .isCloseTo(number(feeder.get("demandWatts")), within(1.0));
          assertThat(value(evaluator, row, ScheduleColumn.CONNECTED_KW) * 1000)
              .as("%s connected W: workbook vs API", where)
              .isCloseTo(number(feeder.get("connectedWatts")), within(1.0));
          feeders++;
        }
      }
    }
    return new Compared(lines, feeders, byReference, l1);
  }

  private static Element pageRow(Document page, String line) {
    for (Element row : page.select("#demand-summary table.phases tbody tr")) {
      if (row.id().equals("line-" + line)) {
        return row;
      }
    }
    throw new AssertionError("no line " + line + " in the page's demand table");
  }

  /** A printed number of the row's n-th data cell. */
  private static double cell(Element row, int n) {
    String text = row.select("td").get(n).text().replace(",", "").replace('−', '-').strip();
    return Double.parseDouble(text);
  }

  private static String textAt(WorkbookWriterTests.Totals totals, String label, int column) {
    for (Row row : totals.rows()) {
      Cell a = row.getCell(0);
      if (a != null && a.getCellType() == CellType.STRING && a.getStringCellValue().equals(label)) {
        Cell cell = row.getCell(column);
        return cell == null ? "" : cell.getStringCellValue();
      }
    }
    throw new AssertionError("no totals row " + label);
  }

  /** The first row of a way, its Line cell as the sheet names it ("1 A-B" on a panel). */
  private static Row firstRowOf(Sheet sheet, int way, String line) {
    for (int r = WorkbookWriter.HEADER_ROW + 1; r <= sheet.getLastRowNum(); r++) {
      Row row = sheet.getRow(r);
      Cell wayCell = row == null ? null : row.getCell(ScheduleColumn.WAY.ordinal());
      Cell lineCell = row == null ? null : row.getCell(ScheduleColumn.LINE.ordinal());
      if (wayCell != null
          && wayCell.getCellType() == CellType.NUMERIC
          && (int) wayCell.getNumericCellValue() == way
          && lineCell != null
          && line.equals(lineCell.getStringCellValue())) {
        return row;
      }
    }
    throw new AssertionError("no row for way " + way + " " + line + " on " + sheet.getSheetName());
  }

  private static double value(FormulaEvaluator evaluator, Row row, ScheduleColumn column) {
    Cell cell = row.getCell(column.ordinal());
    assertThat(cell).as("%s on row %d", column.header(), row.getRowNum() + 1).isNotNull();
    return cell.getCellType() == CellType.FORMULA
        ? evaluator.evaluate(cell).getNumberValue()
        : cell.getNumericCellValue();
  }

  private static double number(Object json) {
    return ((Number) json).doubleValue();
  }

  // ------------------------------------------------------------ seeded random sites

  private static final LoadCategory[] CATEGORIES = {
    LoadCategory.LIGHTING,
    LoadCategory.SOCKET_OUTLETS,
    LoadCategory.SPACE_HEATING,
    LoadCategory.MOTOR,
    LoadCategory.COOKING,
    LoadCategory.OTHER
  };
  private static final String[] METHODS = {
    DiversityMethods.UK_SMALL_SHOP, DiversityMethods.UK_HOUSEHOLD, DiversityMethods.NONE
  };

  /**
   * An origin board, two to four sub-boards on three-pole or single-pole ways (a single-pole way
   * feeds a single-phase board), sometimes a sub-board of a sub-board; each board's own circuits
   * with one to three loads in W, VA or A.
   */
  private long randomSite(long seed) {
    Random r = new Random(seed);
    Site site =
        sites.create(
            new SiteForm(
                "Cross-surface " + seed + " " + UUID.randomUUID(),
                null,
                EarthingSystem.TN_C_S,
                230.0,
                3,
                50.0,
                0.3,
                10.0,
                r.nextBoolean() ? 200.0 : 315.0,
                METHODS[r.nextInt(METHODS.length)],
                null,
                null));
    double originIn = r.nextBoolean() ? 160.0 : 250.0;
    BoardForm originForm = board("MDB", 3, 24, originIn, null, null, 1.0, r);
    if (r.nextBoolean()) {
      originForm = originForm.withIncomerMccbSettings(originIn * 0.8, originIn * 8);
    }
    Board origin = boards.create(site.getId(), originForm);
    int[] nextWay = {1};
    finals(origin.getId(), 3, r, nextWay, 3 + r.nextInt(5));
    int children = 2 + r.nextInt(3);
    List<Board> threeLineChildren = new ArrayList<>();
    for (int c = 0; c < children; c++) {
      Board child = subBoard(origin, 3, "DB" + (c + 1), r, nextWay);
      if (child.getPhases() == 3) {
        threeLineChildren.add(child);
      }
    }
    if (!threeLineChildren.isEmpty() && r.nextBoolean()) {
      Board parent = threeLineChildren.get(0);
      subBoard(parent, 3, parent.getReference() + "-1", r, new int[] {17});
    }
    return site.getId();
  }

  private Board subBoard(Board parent, int parentLines, String reference, Random r, int[] nextWay) {
    boolean threePole = parentLines == 3 && r.nextInt(3) > 0;
    PhasePosition position =
        threePole ? PhasePosition.THREE_POLE : PhasePosition.values()[r.nextInt(3)];
    double rating = threePole ? 63.0 : 40.0;
    Circuit feeder =
        schedule.addCircuit(
            parent.getId(),
            ExchangeFixtures.circuit(
                nextWay[0]++,
                position,
                "Submain to " + reference,
                DeviceKind.MCB,
                TripCurve.C,
                rating,
                null,
                16.0,
                15.0 + r.nextInt(30)));
    int lines = threePole ? 3 : 1;
    Board child =
        boards.create(
            parent.getSite().getId(),
            board(
                reference,
                lines,
                18,
                rating,
                parent.getId(),
                feeder.getId(),
                0.7 + r.nextInt(4) / 10.0,
                r));
    finals(child.getId(), lines, r, new int[] {1}, 3 + r.nextInt(6));
    return child;
  }

  private void finals(long boardId, int lines, Random r, int[] nextWay, int count) {
    for (int i = 0; i < count; i++) {
      boolean threePole = lines == 3 && r.nextInt(5) == 0;
      PhasePosition position =
          threePole
              ? PhasePosition.THREE_POLE
              : lines == 3 ? PhasePosition.values()[r.nextInt(3)] : PhasePosition.L1;
      Circuit circuit =
          schedule.addCircuit(
              boardId,
              ExchangeFixtures.circuit(
                  nextWay[0]++,
                  position,
                  "Final " + (i + 1),
                  DeviceKind.MCB,
                  TripCurve.B,
                  threePole ? 20.0 : 16.0 + 4 * r.nextInt(3),
                  null,
                  2.5,
                  5.0 + r.nextInt(30)));
      int loads = 1 + r.nextInt(3);
      for (int l = 0; l < loads; l++) {
        RatingUnit unit = RatingUnit.values()[r.nextInt(RatingUnit.values().length)];
        double rating =
            switch (unit) {
              case A -> 1 + r.nextInt(8);
              default -> 100 + r.nextInt(2400);
            };
        LoadForm load =
            ExchangeFixtures.load(
                "Load " + (l + 1),
                CATEGORIES[r.nextInt(CATEGORIES.length)],
                1 + r.nextInt(3),
                rating,
                unit,
                0.8 + r.nextInt(21) / 100.0);
        schedule.addLoad(circuit.getId(), load);
      }
    }
  }

  private static BoardForm board(
      String reference,
      int lines,
      int ways,
      double incomerAmps,
      Long parentId,
      Long feederId,
      double coincidence,
      Random r) {
    return new BoardForm(
        reference,
        "Invented room",
        lines,
        ways,
        incomerAmps * 1.25,
        DeviceKind.MCCB,
        null,
        incomerAmps,
        lines == 3 ? 3 : 2,
        10.0,
        null,
        null,
        parentId,
        feederId,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0 + r.nextInt(10),
        coincidence,
        null,
        null,
        null,
        null);
  }
}
