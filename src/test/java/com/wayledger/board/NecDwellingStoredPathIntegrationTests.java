package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.dwelling.Worksheet;
import com.wayledger.engine.dwelling.WorksheetMethod;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * The NEC Informative Annex D dwelling examples entered as a user would — site, boards, circuits,
 * loads and dwelling data through the pages' HTTP forms — and read back from the stored site's one
 * analysis. Sources beside each figure; "flylib" is the copy of Annex D read at flylib.com (an NEC
 * Handbook edition before 2008, same figures as the later editions from memory).
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class NecDwellingStoredPathIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired AnalysisService analysis;
  @Autowired JdbcClient jdbc;
  @Autowired com.wayledger.loadlog.HistoryService history;

  private MockHttpServletRequestBuilder editor(MockHttpServletRequestBuilder request) {
    return request.with(user("ed").roles("EDITOR")).with(csrf());
  }

  /** A 120/240 V site: U0 = 120 V, single phase, 60 Hz. */
  private long site() throws Exception {
    String name = "Annex D " + UUID.randomUUID();
    mvc.perform(
            editor(post("/sites"))
                .param("name", name)
                .param("earthingSystem", "TN_C_S")
                .param("nominalVoltageVolts", "120")
                .param("phases", "1")
                .param("frequencyHertz", "60"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private long board(long siteId, String reference, Long parentId, String method) throws Exception {
    MockHttpServletRequestBuilder request =
        editor(post("/sites/{id}/boards", siteId))
            .param("reference", reference)
            .param("phases", "1")
            .param("wayCount", "42")
            .param("incomerKind", "MCCB")
            .param("incomerRatingAmps", "200")
            .param("incomerPoles", "2")
            .param("incomerBreakingCapacityKiloAmps", "10")
            .param("unbalanceLimitPercent", "10")
            .param("coincidenceFactor", "1");
    if (parentId != null) {
      request.param("parentBoardId", parentId.toString());
    }
    if (method != null) {
      request.param("diversityMethod", method);
    }
    mvc.perform(request).andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = ?")
        .param(siteId)
        .param(reference)
        .query(Long.class)
        .single();
  }

  private void circuit(
      long boardId,
      int way,
      String description,
      String category,
      int quantity,
      double rating,
      String unit)
      throws Exception {
    mvc.perform(
            editor(post("/boards/{id}/circuits", boardId))
                .param("wayNumber", Integer.toString(way))
                .param("position", "L1")
                .param("description", description)
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceCurve", "B")
                .param("deviceRatingAmps", "50")
                .param("devicePoles", "2")
                .param("deviceBreakingCapacityKiloAmps", "10")
                .param("loadDescription", description)
                .param("loadCategory", category)
                .param("loadQuantity", Integer.toString(quantity))
                .param("loadRatingValue", Double.toString(rating))
                .param("loadRatingUnit", unit)
                .param("loadPowerFactor", "1"))
        .andExpect(status().is3xxRedirection());
  }

  private void dwelling(
      long boardId, String area, String areaUnit, int smallAppliance, int laundry, boolean optional)
      throws Exception {
    mvc.perform(
            editor(post("/boards/{id}/dwelling", boardId))
                .param("floorArea", area)
                .param("areaUnit", areaUnit)
                .param("smallApplianceCircuits", Integer.toString(smallAppliance))
                .param("laundryCircuits", Integer.toString(laundry))
                .param("optionalMethod", Boolean.toString(optional))
                .param("addition", "NONE"))
        .andExpect(status().is3xxRedirection());
  }

  private Worksheet sheet(long boardId, WorksheetMethod method) {
    return analysis.ofBoard(boardId).dwellingWorksheets(boardId).stream()
        .filter(sheet -> sheet.method() == method)
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + method + " worksheet on board " + boardId));
  }

  /** Annex D Example D1(a) on a stored board: 1,500 ft², 12 kW range, 5.5 kW dryer (flylib). */
  private long exampleD1a(long siteId, String method) throws Exception {
    long board = board(siteId, "D1a", null, method);
    circuit(board, 1, "Range", "COOKING", 1, 12_000, "W");
    circuit(board, 3, "Clothes dryer", "CLOTHES_DRYER", 1, 5_500, "W");
    dwelling(board, "1500", "FT2", 2, 1, false);
    return board;
  }

  @Test
  void exampleD1aThroughTheStoredBoardIsEighteenThousandSixHundredVoltAmperes() throws Exception {
    long board = exampleD1a(site(), null);

    // Annex D D1(a): net calculated load 18,600 VA; 18,600 / 240 = 77.5 A (flylib)
    Worksheet standard = sheet(board, WorksheetMethod.STANDARD);
    assertThat(standard.resultVoltAmperes()).isCloseTo(18_600.0, within(1e-6));
    assertThat(standard.amperesAt(240)).isCloseTo(77.5, within(1e-9));
    // Annex D D1(a): neutral 5,100 + 5,600 + 3,850 = 14,550 VA (flylib)
    assertThat(sheet(board, WorksheetMethod.NEUTRAL).resultVoltAmperes())
        .isCloseTo(14_550.0, within(1e-6));
  }

  @Test
  void theBoardPageAndTheApiShowTheSameWorksheet() throws Exception {
    long board = exampleD1a(site(), null);

    mvc.perform(get("/boards/{id}", board).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("18,600 VA")))
        .andExpect(content().string(Matchers.containsString("77.5 A")));
    mvc.perform(get("/api/boards/{id}/dwelling", board).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.inputs.floorArea").value(1500.0))
        .andExpect(jsonPath("$.worksheets[0].method").value("STANDARD"))
        .andExpect(jsonPath("$.worksheets[0].resultVoltAmperes").value(18_600.0))
        .andExpect(jsonPath("$.caution").exists());
  }

  @Test
  void theWorkbookCarriesTheWorksheetLineByLineAndTheInputs() throws Exception {
    long board = exampleD1a(site(), null);

    byte[] xlsx =
        mvc.perform(get("/boards/{id}/export.xlsx", board).with(user("vi").roles("VIEWER")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();

    try (var workbook =
        new org.apache.poi.xssf.usermodel.XSSFWorkbook(new java.io.ByteArrayInputStream(xlsx))) {
      var sheet = workbook.getSheet("Dwelling load");
      assertThat(sheet).as("the dwelling sheet").isNotNull();
      assertThat(sheet.getRow(2).getCell(0).getStringCellValue()).startsWith("Caution");
      java.util.Map<String, Double> results = new java.util.HashMap<>();
      for (var row : sheet) {
        if (row.getCell(2) != null
            && row.getCell(6) != null
            && row.getCell(6).getCellType() == org.apache.poi.ss.usermodel.CellType.NUMERIC) {
          results.putIfAbsent(
              row.getCell(1).getStringCellValue() + " | " + row.getCell(2).getStringCellValue(),
              row.getCell(6).getNumericCellValue());
        }
      }
      // Annex D D1(a): 18,600 VA; the 3,001–120,000 VA band gives 2,100 VA (flylib)
      assertThat(results)
          .containsEntry("Dwelling inputs | Floor area (ft²)", 1_500.0)
          .anySatisfy(
              (key, value) -> {
                assertThat(key).startsWith("Standard method").endsWith("| Calculated load");
                assertThat(value).isCloseTo(18_600.0, within(1e-6));
              })
          .anySatisfy(
              (key, value) -> {
                assertThat(key).contains("3,001 to 120,000 VA");
                assertThat(value).isCloseTo(2_100.0, within(1e-6));
              });
    }
  }

  @Test
  void theNecDiversityMethodOfTheBoardReadsTheStoredInputs() throws Exception {
    // Before these inputs were stored, the general-lighting group was always "not assessed, taken
    // at 100 %". Annex D D1(a): the same 18,600 VA through the board's diversity method (flylib)
    long board = exampleD1a(site(), "nec-220-standard-dwelling");

    var demand = analysis.ofBoard(board).boardDemand(board);
    assertThat(demand.notAssessed()).isEmpty();
    assertThat(demand.demandVoltAmperes()).isCloseTo(18_600.0, within(1e-6));
    // one figure: a re-analysis of the stored spec (as balancing plans and exports do) reads the
    // same stored inputs
    var again = analysis.analyse(analysis.ofBoard(board).spec()).boardDemand(board);
    assertThat(again.demandVoltAmperes()).isCloseTo(18_600.0, within(1e-6));
  }

  @Test
  void floorAreaGivenInSquareMetresIsStoredInSquareFeet() throws Exception {
    long board = board(site(), "Metric", null, null);
    // 1,500 ft² × 0.09290304 m²/ft² = 139.35456 m² (the foot is 0.3048 m exactly, NIST SP 811)
    dwelling(board, "139.35456", "M2", 2, 1, false);

    double stored =
        jdbc.sql("SELECT floor_area_square_feet FROM board_dwelling WHERE board_id = ?")
            .param(board)
            .query(Double.class)
            .single();
    assertThat(stored).isCloseTo(1_500.0, within(1e-6));
  }

  @Test
  void exampleD2aByTheOptionalMethodThroughTheStoredBoard() throws Exception {
    // Annex D Example D2(a): 1,500 ft², 12 kW range, 2.5 kW water heater, 1.2 kW dishwasher, 9 kW
    // of heat in five rooms, 5 kW dryer, 6 A room air conditioner → 21,480 VA (flylib)
    long board = board(site(), "D2a", null, null);
    circuit(board, 1, "Range", "COOKING", 1, 12_000, "W");
    circuit(board, 3, "Water heater", "WATER_HEATING_STORAGE", 1, 2_500, "W");
    circuit(board, 5, "Dishwasher", "FIXED_APPLIANCE", 1, 1_200, "W");
    circuit(board, 7, "Room heaters", "SPACE_HEATING", 5, 1_800, "W");
    circuit(board, 9, "Clothes dryer", "CLOTHES_DRYER", 1, 5_000, "W");
    circuit(board, 11, "Room air conditioner", "AIR_CONDITIONING", 1, 6, "A");
    dwelling(board, "1500", "FT2", 2, 1, true);

    assertThat(sheet(board, WorksheetMethod.OPTIONAL).resultVoltAmperes())
        .isCloseTo(21_480.0, within(1e-6));
  }

  @Test
  void meterBankOfExampleD4aFeedingTwentyStoredDwellingBoards() throws Exception {
    // Annex D Example D4(a), one meter bank: 20 units of 840 ft², two small-appliance circuits,
    // no laundry circuit, 10 with 12 kW ranges. Lighting and appliance load 40,590 VA (flylib,
    // D5(a)); 10 ranges, Table 220.55 Column C: 25 kW (as published); 65,590 VA in all
    long siteId = site();
    long bank = board(siteId, "Meter bank", null, null);
    for (int unit = 1; unit <= 20; unit++) {
      long board = board(siteId, "Unit " + unit, bank, null);
      if (unit <= 10) {
        circuit(board, 1, "Range", "COOKING", 1, 12_000, "W");
      }
      dwelling(board, "840", "FT2", 2, 0, false);
    }

    Worksheet standard = sheet(bank, WorksheetMethod.STANDARD);
    assertThat(standard.line("Net general lighting").orElseThrow().resultVoltAmperes())
        .isCloseTo(40_590.0, within(1e-6));
    assertThat(standard.resultVoltAmperes()).isCloseTo(65_590.0, within(1e-6));
    // each unit on its own board: 3,882 + 8,000 = 11,882 VA with a range (D4(a), flylib)
    long first =
        jdbc.sql("SELECT id FROM board WHERE site_id = ? AND reference = 'Unit 1'")
            .param(siteId)
            .query(Long.class)
            .single();
    assertThat(sheet(first, WorksheetMethod.STANDARD).resultVoltAmperes())
        .isCloseTo(11_882.0, within(1e-6));
  }

  @Test
  void aBadFloorAreaIsRefusedBesideTheFieldAndNothingIsStored() throws Exception {
    long board = board(site(), "Bad", null, null);

    mvc.perform(
            editor(post("/boards/{id}/dwelling", board))
                .param("floorArea", "-5")
                .param("areaUnit", "FT2")
                .param("smallApplianceCircuits", "2")
                .param("laundryCircuits", "1"))
        .andExpect(status().is(422))
        .andExpect(content().string(Matchers.containsString("floorArea-error")));
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM board_dwelling WHERE board_id = ?")
                .param(board)
                .query(Long.class)
                .single())
        .isZero();
  }

  @Test
  void aStaleVersionIsRefusedWithAConflictOverTheApi() throws Exception {
    long board = exampleD1a(site(), null);
    long version =
        jdbc.sql("SELECT version FROM board_dwelling WHERE board_id = ?")
            .param(board)
            .query(Long.class)
            .single();
    String body =
        "{\"floorArea\": 1600, \"areaUnit\": \"FT2\", \"smallApplianceCircuits\": 2,"
            + " \"laundryCircuits\": 1, \"optionalMethod\": false, \"addition\": \"NONE\","
            + " \"version\": %d}";

    mvc.perform(
            put("/api/boards/{id}/dwelling", board)
                .with(user("ed").roles("EDITOR"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(body.formatted(version)))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.worksheets[0].lines[0].resultVoltAmperes").value(4_800.0));
    mvc.perform(
            put("/api/boards/{id}/dwelling", board)
                .with(user("ed").roles("EDITOR"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(body.formatted(version)))
        .andExpect(status().isConflict());
  }

  @Test
  void aYearOfRecordedMaximumDemandGivesTheExistingLoadAtOneHundredTwentyFivePercent()
      throws Exception {
    long board = board(site(), "Existing", null, null);

    mvc.perform(
            editor(post("/boards/{id}/measured-demands", board))
                .param("periodStart", "2025-01-01")
                .param("periodEnd", "2025-12-31")
                .param("peakOn", "2025-07-14")
                .param("maximumDemand", "32")
                .param("unit", "KVA")
                .param("intervalMinutes", "15"))
        .andExpect(status().is3xxRedirection());

    // NEC 220.87: 32 kVA × 125 % = 40,000 VA; a 200 A incomer at 240 V = 48,000 VA leaves 8,000 VA
    Worksheet measured = sheet(board, WorksheetMethod.MEASURED);
    assertThat(measured.resultVoltAmperes()).isCloseTo(40_000.0, within(1e-6));
    assertThat(measured.line("Load left").orElseThrow().resultVoltAmperes())
        .isCloseTo(8_000.0, within(1e-6));
    assertThat(
            jdbc.sql(
                    "SELECT COUNT(*) FROM change_log WHERE board_id = ? AND kind = 'DEMAND_MEASURED'")
                .param(board)
                .query(Long.class)
                .single())
        .isEqualTo(1L);
    // the board's history replays its log; dwelling and demand entries carry no board snapshot
    dwelling(board, "1500", "FT2", 2, 1, false);
    mvc.perform(get("/boards/{id}/history", board).with(user("vi").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(Matchers.containsString("maximum demand recorded")))
        .andExpect(content().string(Matchers.containsString("dwelling data added: 1500 ft²")));
  }

  @Test
  void aRecordingThatEndsBeforeItStartsIsRefusedOverTheApi() throws Exception {
    long board = board(site(), "Backwards", null, null);

    mvc.perform(
            post("/api/boards/{id}/measured-demands", board)
                .with(user("ed").roles("EDITOR"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    "{\"periodStart\": \"2025-12-31\", \"periodEnd\": \"2025-01-01\","
                        + " \"maximumDemand\": 10, \"unit\": \"KVA\"}"))
        .andExpect(status().is(422));
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM measured_demand WHERE board_id = ?")
                .param(board)
                .query(Long.class)
                .single())
        .isZero();
  }

  @Test
  void theHistoryReplaysTheDwellingInputsAsTheyWereAtEachChange() throws Exception {
    // Annex D D1(a) (flylib): 1,500 ft² gives 18,600 VA. The same house recorded later as 3,000
    // ft²:
    // 220.12 3 VA/ft² = 9,000 + 3,000 small appliance + 1,500 laundry = 13,500 VA; 220.42 first
    // 3,000 VA at 100 %, the rest at 35 % = 6,675 VA; + 8,000 VA range (Table 220.55 col. C,
    // 12 kW) + 5,500 VA dryer = 20,175 VA
    long board = exampleD1a(site(), "nec-220-standard-dwelling");
    dwelling(board, "3000", "FT2", 2, 1, false);

    var points =
        history.points(board).stream().filter(p -> p.summary().contains("dwelling data")).toList();
    assertThat(points).as("the two dwelling entries").hasSize(2);
    double earlier = total(points.get(0).phaseCurrentsAmps());
    double later = total(points.get(1).phaseCurrentsAmps());
    assertThat(later / earlier)
        .as("replayed demand at 3,000 ft² over that at 1,500 ft² (the earlier date)")
        .isCloseTo(20_175.0 / 18_600.0, within(1e-6));
    // the latest point is today's analysis: one figure
    double today = analysis.ofBoard(board).boardDemand(board).demandVoltAmperes();
    assertThat(today).isCloseTo(20_175.0, within(1e-6));
  }

  private static double total(java.util.Map<com.wayledger.engine.Phase, Double> currents) {
    return currents.values().stream().mapToDouble(Double::doubleValue).sum();
  }
}
