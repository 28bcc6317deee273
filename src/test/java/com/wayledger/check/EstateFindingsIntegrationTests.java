package com.wayledger.check;

import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.loadlog.LogFixtures;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.TestPropertySource;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Findings across every site (the demo site and one made here): filtered by grade and site name,
 * paged, open to a viewer, and read from the kept analysis, so a second read after no change runs
 * the engine zero times. There is no per-site access: every signed-in user sees every site.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
// The analysis service keeps one site only: the estate list must still not recompute on a re-read.
@TestPropertySource(properties = "wayledger.analysis.kept-sites=1")
@DirtiesContext
class EstateFindingsIntegrationTests {

  private static final JsonMapper JSON = JsonMapper.builder().build();

  @Autowired MockMvc mvc;
  @Autowired EstateFindings findings;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;

  Site extra;
  Board board;

  @BeforeEach
  void aSecondSiteWithAnOverloadedWay() {
    extra = sites.create(LogFixtures.site());
    board = boards.create(extra.getId(), LogFixtures.board("EST-1", 63.0));
    // 9 kW at 230 V and unity power factor is 39 A on a 32 A breaker: Ib > In
    schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Kiln", 9000));
  }

  @Test
  void aGradeFilterShowsOnlyThatGradeAndTheGradesAddUpToEveryProblem() throws Exception {
    long every = findings.page(null, "", 0, 200).total();
    long sum = 0;
    for (Verdict grade : List.of(Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE)) {
      JsonNode page = api("/api/findings?grade=" + grade + "&size=200");
      for (JsonNode line : page.get("lines")) {
        assertThat(line.get("grade").asString())
            .as("grade of a %s line", grade)
            .isEqualTo(grade.name());
      }
      sum += page.get("total").asLong();
    }
    assertThat(sum).as("danger + warning + advice = every problem").isEqualTo(every);
    assertThat(every).as("the demo site and the kiln have problems").isPositive();
    JsonNode notAssessed = api("/api/findings?grade=NOT_ASSESSED&size=200");
    assertThat(notAssessed.get("total").asLong())
        .as("the kiln's cable is not recorded: its cable checks are not assessed")
        .isPositive();
  }

  @Test
  void pagesFollowOnWithoutGapsOrRepeats() throws Exception {
    JsonNode first = api("/api/findings?size=5&page=0");
    JsonNode second = api("/api/findings?size=5&page=1");
    JsonNode both = api("/api/findings?size=10&page=0");
    assertThat(first.get("total").asLong()).isGreaterThan(10);
    assertThat(first.get("pages").asInt()).isEqualTo((int) ((first.get("total").asLong() + 4) / 5));
    List<String> joined = new ArrayList<>(keys(first));
    joined.addAll(keys(second));
    assertThat(joined).hasSize(10).doesNotHaveDuplicates().isEqualTo(keys(both));
    assertThat(first.get("caution").asString()).contains("competent person");
  }

  @Test
  void everySiteIsReadAndTheSiteSearchNarrowsToOne() {
    EstateFindings.Page all = findings.page(null, "", 0, 50);
    assertThat(all.sitesRead()).as("no per-site access: every site").isEqualTo(sites.all().size());
    EstateFindings.Page kiln = findings.page(null, extra.getName().toUpperCase(), 0, 50);
    assertThat(kiln.sitesRead()).isEqualTo(1);
    assertThat(kiln.lines())
        .isNotEmpty()
        .allMatch(l -> l.siteId() == extra.getId())
        .anyMatch(
            l ->
                "EST-1".equals(l.boardReference())
                    && Integer.valueOf(1).equals(l.wayNumber())
                    && "L1".equals(l.line())
                    && "Kiln".equals(l.circuit())
                    && l.circuitId() != null);
  }

  @Test
  void aViewerSeesThePageWithEachLineLinkedToItsSiteBoardAndCircuit() throws Exception {
    String page =
        mvc.perform(get("/findings").param("site", extra.getName()).with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("href=\"/sites/" + extra.getId() + "\"")
        .contains("href=\"/boards/" + board.getId() + "\"")
        .contains("way 1 L1 “Kiln”")
        .contains("href=\"/circuits/")
        .contains("assist a competent person");
  }

  @Test
  void anUnknownGradeIsRefusedWith422() throws Exception {
    mvc.perform(get("/findings").param("grade", "PASS").with(viewer())).andExpect(status().is(422));
    mvc.perform(get("/api/findings").param("grade", "LOUD").with(viewer()))
        .andExpect(status().is(422));
  }

  @Test
  void noneSignedInSeesNothing() throws Exception {
    mvc.perform(get("/api/findings")).andExpect(status().isUnauthorized());
    mvc.perform(get("/findings")).andExpect(status().is3xxRedirection());
  }

  @Test
  void aSecondReadAfterNoChangeRunsTheEngineZeroTimes() throws Exception {
    mvc.perform(get("/findings").with(viewer())).andExpect(status().isOk());
    long afterFirstRead = analysis.siteAnalysisRuns();
    assertThat(sites.all()).as("more sites than the analysis service keeps").hasSizeGreaterThan(1);

    mvc.perform(get("/findings").with(viewer())).andExpect(status().isOk());
    mvc.perform(get("/findings").param("grade", "DANGER").param("page", "1").with(viewer()))
        .andExpect(status().isOk());
    api("/api/findings?size=3");

    assertThat(analysis.siteAnalysisRuns())
        .as("engine runs after three more estate-wide reads of unchanged sites")
        .isEqualTo(afterFirstRead);

    schedule.addCircuit(board.getId(), LogFixtures.circuit(2, PhasePosition.L2, "Fan", 100));
    mvc.perform(get("/findings").with(viewer())).andExpect(status().isOk());
    assertThat(analysis.siteAnalysisRuns())
        .as("a change to one site recomputes that site once, and no other")
        .isEqualTo(afterFirstRead + 1);
  }

  private JsonNode api(String path) throws Exception {
    return JSON.readTree(
        mvc.perform(get(path).with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString());
  }

  private static List<String> keys(JsonNode page) {
    List<String> keys = new ArrayList<>();
    for (JsonNode line : page.get("lines")) {
      keys.add(
          line.get("siteId").toString()
              + "/"
              + line.get("boardId").toString()
              + "/"
              + line.get("circuitId").toString()
              + "/"
              + line.get("check").toString()
              + "/"
              + line.get("summary").toString());
    }
    return keys;
  }
}
