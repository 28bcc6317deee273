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
  void necDemoIsAThreeApartmentBuildingOnA120To240VoltService() {
    assertThat(site.getRuleSet()).isEqualTo("NEC");
    assertThat(site.getSupplySystem()).isEqualTo(SupplySystem.SPLIT_PHASE_120_240);
    // other tests in this context import copies onto the site: the demo's own panels are these
    assertThat(results.spec().boards())
        .extracting(b -> b.reference())
        .contains("HP", "CP", "APT-1", "APT-2", "APT-3");
    assertThat(
            results.spec().boards().stream()
                .filter(b -> b.reference().equals("HP"))
                .findFirst()
                .orElseThrow()
                .parentBoardId())
        .as("the house panel is fed from the origin")
        .isNull();
    assertThat(circuit("APT-1", "Water heater").position())
        .as("a 240 V water heater is connected line to line")
        .isEqualTo(PhasePosition.L1_L2);
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
    // NEC 408.36 / 215.3 (as published): the load on a line must stay within the main's rating;
    // invented demo figures put about 118 A on line A of a 100 A panel and about 80 A on line B
    assertThat(common.onPhase(Phase.L1).currentAmps()).as("line A").isGreaterThan(100.0);
    assertThat(common.onPhase(Phase.L2).currentAmps()).as("line B").isLessThan(100.0);
    Finding overload =
        boardFindings("CP").stream()
            .filter(f -> f.check() == CheckKind.INCOMER_OVERLOAD)
            .findFirst()
            .orElseThrow();
    assertThat(overload.verdict()).as(overload.summary()).isIn(Verdict.DANGER, Verdict.WARNING);
    assertThat(page("CP")).contains(asHtmlText(overload.summary())).contains("408.36");
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
    // NEC 210.8(A)(3) (from memory): outdoor receptacles of a dwelling need GFCI protection; the
    // check itself comes with the NEC ground-fault rules; here the demo's precondition
    CircuitSpec walk = circuit("HP", "Front walk receptacles");
    assertThat(walk.location()).isEqualTo(CircuitLocation.OUTDOORS);
    assertThat(walk.device().kind().isResidualCurrent()).as("no GFCI device").isFalse();
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
