package com.wayledger.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.dwelling.Worksheet;
import com.wayledger.engine.dwelling.WorksheetMethod;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.loadlog.HistoryPoint;
import com.wayledger.loadlog.HistoryService;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The NEC demo site holds its promise: each deliberate problem shows on its board page as a finding
 * or a worksheet line, and the IEC demo beside it keeps its rule set and boards. The thresholds are
 * the NEC's own (sources beside each); the demo's figures are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
class NecDemoSiteIntegrationTests {

  @Autowired SiteService sites;
  @Autowired AnalysisService analysis;
  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired HistoryService history;

  Site site;
  SiteAnalysis results;

  @BeforeEach
  void analyseNecDemo() {
    site = siteNamed(NecDemoSite.SITE_NAME);
    results = analysis.ofSite(site.getId());
  }

  @Test
  void necDemoIsAThreeApartmentBuildingOnA208YServiceWithACottageOnItsOwn120To240Service() {
    assertThat(site.getRuleSet()).isEqualTo("NEC");
    assertThat(site.getSupplySystem()).isEqualTo(SupplySystem.WYE_208Y_120);
    // other tests in this context import copies onto the site: the demo's own panels are these
    assertThat(results.spec().boards())
        .extracting(b -> b.reference())
        .contains("HP", "CP", "APT-1", "APT-2", "APT-3", "COTTAGE");
    assertThat(spec("HP").parentBoardId()).as("the house panel is fed from the origin").isNull();
    assertThat(spec("HP").wayCount()).as("a 42-space house panel").isEqualTo(42);
    assertThat(results.spec().systemOf(spec("HP"))).isEqualTo(SupplySystem.WYE_208Y_120);
    for (String apartment : List.of("APT-1", "APT-2", "APT-3", "CP")) {
      assertThat(spec(apartment).supplySystem())
          .as("%s is fed from two poles of the 208Y/120 V panel", apartment)
          .isEqualTo(SupplySystem.SINGLE_PHASE_120_208);
      assertThat(board(apartment).lines()).as("%s has lines A and B", apartment).isEqualTo(2);
    }
    assertThat(
            List.of(
                circuit("HP", "Feeder to apartment 1 panel").position(),
                circuit("HP", "Feeder to apartment 2 panel").position(),
                circuit("HP", "Feeder to apartment 3 panel").position()))
        .as("each apartment on its own pair of lines")
        .containsExactly(PhasePosition.L1_L2, PhasePosition.L2_L3, PhasePosition.L3_L1);
    assertThat(spec("COTTAGE").parentBoardId()).as("a second service").isNull();
    assertThat(spec("COTTAGE").supplySystem()).isEqualTo(SupplySystem.SPLIT_PHASE_120_240);
    assertThat(spec("COTTAGE").incomer().ratedCurrentAmps()).isEqualTo(200.0);
    assertThat(spec("COTTAGE").wayCount()).isEqualTo(42);
    assertThat(circuit("APT-1", "Water heater").position())
        .as("a 208 V water heater is connected line to line")
        .isEqualTo(PhasePosition.L1_L2);
  }

  @Test
  void eachPanelPageNamesItsOwnSupplySystem() throws Exception {
    assertThat(page("APT-2")).contains("120/208 V single-phase three-wire");
    assertThat(page("COTTAGE")).contains("120/240 V single-phase three-wire");
    assertThat(page("HP")).contains("208Y/120 V three-phase four-wire");
  }

  @Test
  void cottageTwoFortyVoltWaterHeaterPutsNothingOnItsNeutral() {
    // NEC 220.61(A) (as published): only the unbalanced load between neutral and a line counts
    Worksheet neutral = sheet(board("COTTAGE").boardId(), WorksheetMethod.NEUTRAL);
    assertThat(neutral.lines())
        .anyMatch(
            line ->
                line.description().startsWith("Water heater")
                    && line.description().contains("line to line, no neutral current")
                    && line.resultVoltAmperes() != null
                    && line.resultVoltAmperes() == 0.0);
    // 4500 W at 240 V = 18.75 A (the site's 120 V system would have none at 240 V)
    assertThat(
            board("COTTAGE").circuits().stream()
                .filter(c -> c.description().equals("Water heater"))
                .findFirst()
                .orElseThrow()
                .designCurrentAmps())
        .as("Ib = 4500 W / 240 V")
        .isCloseTo(18.75, within());
  }

  @Test
  void everyDwellingCircuitRecordsItsRoomSoGroundAndArcFaultAreAssessed() {
    for (String panel : List.of("APT-1", "APT-2", "APT-3", "COTTAGE")) {
      for (CircuitSpec circuit : spec(panel).circuits()) {
        assertThat(circuit.location())
            .as("%s %s records a room", panel, circuit.description())
            .isNotEqualTo(CircuitLocation.INDOORS)
            .isNotNull();
        for (Finding f : circuitFindings(panel, circuit.description())) {
          if (f.check() == CheckKind.GROUND_FAULT_PROTECTION
              || f.check() == CheckKind.ARC_FAULT_PROTECTION) {
            assertThat(f.verdict())
                .as("%s %s: %s", panel, circuit.description(), f.summary())
                .isNotEqualTo(Verdict.NOT_ASSESSED);
          }
        }
      }
    }
    // NEC 210.12(A) (from memory): 120 V 15/20 A bedroom circuits of a dwelling need AFCI
    Finding bedroom =
        circuitFindings("APT-1", "Lighting and receptacles, bedrooms").stream()
            .filter(f -> f.check() == CheckKind.ARC_FAULT_PROTECTION)
            .findFirst()
            .orElseThrow();
    assertThat(bedroom.verdict()).as(bedroom.summary()).isEqualTo(Verdict.PASS);
    assertThat(bedroom.reference()).contains("bedrooms");
  }

  @Test
  void iecDemoIsUnchangedBesideIt() {
    Site iec = siteNamed(DemoSite.SITE_NAME);
    assertThat(iec.getRuleSet()).isEqualTo("IEC");
    assertThat(iec.getSupplySystem()).isEqualTo(SupplySystem.IEC_WYE);
    assertThat(analysis.ofSite(iec.getId()).spec().boards())
        .extracting(b -> b.reference())
        .containsExactlyInAnyOrder("MDB", "KB1", "FLAT-1", "FLAT-2", "LL");
  }

  @Test
  void commonAreaPanelLineAIsOverloadedAndShownOnItsPage() throws Exception {
    BoardDemand common = board("CP");
    // NEC 408.36 / 215.3 (as published): the load on a line must stay within the main's rating.
    // Hand calculation (invented loads, unity power factor, no diversity on CP), 120/208 V with
    // V_A = 120∠0°, V_B = 120∠−120°, V_AB = 207.85∠30°:
    //   208 V loads: 11,500 W + 3 × 2,400 W = 18,700 W → I_AB = 18,700 / 207.85 = 89.97 A ∠30°,
    //     leaving on A and returning on B (I_B = 89.97 A ∠−150°);
    //   120 V on A: 1,200 + 1,500 + 2 × 1,000 + 1,440 = 6,140 W → 51.17 A ∠0°;
    //   120 V on B: 4 × 75 = 300 W → 2.50 A ∠−120°.
    //   |I_A| = |51.17 + 89.97∠30°| = |129.08 + j44.99| = 136.70 A
    //   |I_B| = |2.50∠−120° + 89.97∠−150°| = |−79.17 − j47.15| = 92.14 A
    assertThat(common.onPhase(Phase.L1).currentAmps())
        .as("line A")
        .isCloseTo(136.70, org.assertj.core.data.Offset.offset(0.05));
    assertThat(common.onPhase(Phase.L2).currentAmps())
        .as("line B")
        .isCloseTo(92.14, org.assertj.core.data.Offset.offset(0.05));
    assertThat(common.onPhase(Phase.L1).currentAmps())
        .as("above the 100 A main")
        .isGreaterThan(100.0);
    Finding overload =
        boardFindings("CP").stream()
            .filter(f -> f.check() == CheckKind.INCOMER_OVERLOAD)
            .findFirst()
            .orElseThrow();
    assertThat(overload.verdict()).as(overload.summary()).isIn(Verdict.DANGER, Verdict.WARNING);
    assertThat(page("CP")).contains(asHtmlText(overload.summary())).contains("408.36");
  }

  @Test
  void commonAreaPanelLegsAreUnbalancedBeyondItsLimitAndTheFindingNamesThem() throws Exception {
    // by hand from the line currents worked above (A 136.70 A, B 92.14 A), the NEMA MG-1
    // definition over the two legs (our extension to two lines, common practice for the limit):
    // mean 114.42 A, largest deviation 22.28 A, 22.28 / 114.42 = 19.47 %
    Finding unbalance =
        boardFindings("CP").stream()
            .filter(f -> f.check() == CheckKind.PHASE_UNBALANCE)
            .findFirst()
            .orElseThrow();
    assertThat(unbalance.values().get(0).value())
        .as("unbalance of lines A and B")
        .isCloseTo(19.47, org.assertj.core.data.Offset.offset(0.05));
    assertThat(unbalance.values().get(0).value())
        .as("the same figure as the panel's demand")
        .isEqualTo(board("CP").unbalancePercent());
    assertThat(spec("CP").unbalanceLimitPercent()).as("the panel's limit").isLessThan(19.47);
    assertThat(unbalance.verdict()).as(unbalance.summary()).isEqualTo(Verdict.WARNING);
    assertThat(unbalance.summary()).startsWith("lines A and B unbalanced: 19.5 %");
    assertThat(page("CP")).contains(asHtmlText(unbalance.summary()));
  }

  @Test
  void twentyAmpBreakerOnFourteenAwgIsASmallConductorFinding() throws Exception {
    // NEC 240.4(D)(3) (as published): 14 AWG copper at most 15 A
    Finding small =
        circuitFindings("APT-2", "Bedroom receptacles").stream()
            .filter(f -> f.check() == CheckKind.SMALL_CONDUCTOR)
            .findFirst()
            .orElseThrow();
    assertThat(small.verdict()).as(small.summary()).isIn(Verdict.DANGER, Verdict.WARNING);
    assertThat(page("APT-2")).contains(asHtmlText(small.summary())).contains("240.4(D)");
  }

  @Test
  void outdoorReceptaclesOnTheHousePanelHaveNoGroundFaultProtection() {
    // the house panel is not a dwelling panel: NEC 210.8(B)(4) (2020, from memory) asks for GFCI on
    // outdoor receptacles of other occupancies (120 V to ground, ≤ 50 A single-phase)
    CircuitSpec walk = circuit("HP", "Front walk receptacles");
    assertThat(walk.location()).isEqualTo(CircuitLocation.OUTDOORS);
    assertThat(walk.device().kind().isResidualCurrent()).as("no GFCI device").isFalse();
    Finding gfci =
        circuitFindings("HP", "Front walk receptacles").stream()
            .filter(f -> f.check() == CheckKind.GROUND_FAULT_PROTECTION)
            .findFirst()
            .orElseThrow();
    assertThat(gfci.verdict()).as(gfci.summary()).isEqualTo(Verdict.WARNING);
    assertThat(gfci.reference()).contains("210.8(B)(4)");
  }

  @Test
  void balconyReceptacleOfApartmentThreeLacksGroundFaultProtection() throws Exception {
    // NEC 210.8(A)(3) (from memory): outdoor receptacles of a dwelling unit need GFCI protection
    Finding gfci =
        circuitFindings("APT-3", "Balcony receptacle").stream()
            .filter(f -> f.check() == CheckKind.GROUND_FAULT_PROTECTION)
            .findFirst()
            .orElseThrow();
    assertThat(gfci.verdict()).as(gfci.summary()).isIn(Verdict.DANGER, Verdict.WARNING);
    assertThat(page("APT-3")).contains("210.8(A)");
    Finding protectedOne =
        circuitFindings("APT-1", "Balcony receptacle").stream()
            .filter(f -> f.check() == CheckKind.GROUND_FAULT_PROTECTION)
            .findFirst()
            .orElseThrow();
    assertThat(protectedOne.verdict())
        .as("apartment 1's balcony breaker records the GFCI function: " + protectedOne.summary())
        .isEqualTo(Verdict.PASS);
  }

  @Test
  void dryerBelowFiveKilowattsIsTakenAtFiveThousandVoltAmperesOnTheBoardPage() throws Exception {
    // NEC 220.54 (as published): each dryer at 5,000 VA or its nameplate, whichever is larger
    long unit = board("APT-1").boardId();
    Worksheet standard = sheet(unit, WorksheetMethod.STANDARD);
    assertThat(standard.lines())
        .anyMatch(
            line ->
                line.description().contains("raised to 5,000 VA")
                    && line.resultVoltAmperes() != null
                    && Math.abs(line.resultVoltAmperes() - 5_000.0) < 1e-6);
    assertThat(page("APT-1")).contains("raised to 5,000 VA");
  }

  @Test
  void apartmentWaterHeaterLineToLinePutsNothingOnTheNeutral() {
    // NEC 220.61(A) (as published): only the unbalanced load between neutral and a line counts
    Worksheet neutral = sheet(board("APT-1").boardId(), WorksheetMethod.NEUTRAL);
    assertThat(neutral.lines())
        .anyMatch(
            line ->
                line.description().startsWith("Water heater")
                    && line.description().contains("line to line, no neutral current")
                    && line.resultVoltAmperes() != null
                    && line.resultVoltAmperes() == 0.0);
  }

  @Test
  void housePanelWorksTheMultifamilyOptionalMethodOverItsThreeApartments() {
    // NEC 220.84(A) (from memory): three or more units, each with electric cooking and with
    // electric heating or air-conditioning; Table 220.84 (from memory): 3 units at 45 %
    Worksheet optional = sheet(board("HP").boardId(), WorksheetMethod.MULTIFAMILY_OPTIONAL);
    assertThat(optional.notAssessed()).isEmpty();
    assertThat(optional.lines()).anyMatch(line -> line.description().contains("3 units at 45 %"));
  }

  @Test
  void housePanelHasAYearOfRecordedMaximumDemand() {
    // NEC 220.87(1) (as published): a year of maximum demand × 125 %; the largest invented
    // monthly figure is 52.6 kVA → 65,750 VA
    Worksheet measured = sheet(board("HP").boardId(), WorksheetMethod.MEASURED);
    assertThat(measured.resultVoltAmperes()).isCloseTo(52_600 * 1.25, within());
  }

  @Test
  void historyOfADwellingPanelEndsAtTheFiguresOfItsBoardPage() {
    // one figure everywhere: the replay reads today's dwelling inputs as the page does
    long unit = board("APT-1").boardId();
    List<HistoryPoint> points = history.points(unit);
    Map<Phase, Double> last = points.get(points.size() - 1).phaseCurrentsAmps();
    for (Phase line : List.of(Phase.L1, Phase.L2)) {
      assertThat(last.get(line))
          .as("line %s", line)
          .isCloseTo(board("APT-1").onPhase(line).currentAmps(), within());
    }
  }

  @Test
  void changeLogTellsTheBuildingsYears() {
    List<LocalDate> days =
        jdbc.sql(
                "SELECT DISTINCT effective_on FROM change_log WHERE site_id = ? ORDER BY"
                    + " effective_on")
            .param(site.getId())
            .query(LocalDate.class)
            .list();
    assertThat(days)
        .contains(
            NecDemoSite.COMPLETED,
            NecDemoSite.COOLING_ADDED,
            NecDemoSite.WASHERS_ADDED,
            NecDemoSite.BEDROOM_EXTENDED);
  }

  private static org.assertj.core.data.Offset<Double> within() {
    return org.assertj.core.data.Offset.offset(1e-6);
  }

  /** Text as Thymeleaf writes it into a page (th:text escapes &, <, >, " and '). */
  private static String asHtmlText(String text) {
    return text.replace("&", "&amp;")
        .replace("<", "&lt;")
        .replace(">", "&gt;")
        .replace("\"", "&quot;")
        .replace("'", "&#39;");
  }

  private String page(String reference) throws Exception {
    return mvc.perform(
            get("/boards/{id}", board(reference).boardId()).with(user("viewer").roles("VIEWER")))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private Site siteNamed(String name) {
    return sites.all().stream().filter(s -> s.getName().equals(name)).findFirst().orElseThrow();
  }

  private Worksheet sheet(long boardId, WorksheetMethod method) {
    return results.dwellingWorksheets(boardId).stream()
        .filter(sheet -> sheet.method() == method)
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + method + " worksheet on " + boardId));
  }

  private BoardDemand board(String reference) {
    return results.demand().boards().stream()
        .filter(b -> b.reference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private com.wayledger.engine.BoardSpec spec(String reference) {
    return results.spec().boards().stream()
        .filter(b -> b.reference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private CircuitSpec circuit(String boardReference, String description) {
    return results.spec().boards().stream()
        .filter(b -> b.reference().equals(boardReference))
        .flatMap(b -> b.circuits().stream())
        .filter(c -> c.description().equals(description))
        .findFirst()
        .orElseThrow();
  }

  private List<Finding> boardFindings(String reference) {
    return results.boardFindings(board(reference).boardId()).orElseThrow().findings();
  }

  private List<Finding> circuitFindings(String boardReference, String description) {
    long boardId = board(boardReference).boardId();
    return results
        .circuitFindings(boardId)
        .get(circuit(boardReference, description).id())
        .findings();
  }
}
