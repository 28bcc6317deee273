package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.support.NecPanels;
import java.io.ByteArrayInputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.hamcrest.Matchers;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * A stored 120/240 V panelboard whose leg A carries more than leg B: the unbalance over its two
 * legs is checked against its limit, and the board page, the balancing page, the API and the
 * workbook show one figure, in the panelboard's words; an IEC board keeps its British words. Sites,
 * panels and loads are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class SplitPhaseUnbalanceIntegrationTests {

  private static final RequestPostProcessor VIEWER = user("viewer").roles("VIEWER");
  private static final RequestPostProcessor EDITOR = user("ed").roles("EDITOR");

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;

  private static Finding unbalanceOf(SiteAnalysis results, long boardId) {
    return results.boardFindings(boardId).orElseThrow().findings().stream()
        .filter(f -> f.check() == CheckKind.PHASE_UNBALANCE)
        .findFirst()
        .orElseThrow();
  }

  private static double figure(Finding finding) {
    return finding.values().stream()
        .filter(q -> q.name().equals("unbalance"))
        .mapToDouble(Quantity::value)
        .findFirst()
        .orElseThrow();
  }

  @Test
  void theLegsOfASplitPhasePanelAreCheckedAndEverySurfaceShowsOneFigure() throws Exception {
    long panel = NecPanels.splitPhasePanel(sites, boards, schedule).getId();
    SiteAnalysis results = analysis.ofBoard(panel);
    BoardDemand demand = results.boardDemand(panel);
    double legA = demand.onPhase(Phase.L1).currentAmps();
    double legB = demand.onPhase(Phase.L2).currentAmps();

    // by hand (invented loads, unity power factor; a space's line follows from its row, rows
    // alternating A, B — common practice): spaces 1 and 2 (row 1, A) 1,500 + 600 W at 120 V =
    // 17.5 A, space 8 (row 4, B) 900 W = 7.5 A, and the 4,500 W water heater at 240 V = 18.75 A on
    // each leg: A 36.25 A, B 26.25 A
    assertThat(legA).as("leg A").isCloseTo(36.25, within(1e-6));
    assertThat(legB).as("leg B").isCloseTo(26.25, within(1e-6));
    // NEMA MG-1 definition over the two legs: mean 31.25 A, deviation 5 A, 5 / 31.25 = 16 %
    double mean = (legA + legB) / 2;
    double expected = 100 * Math.max(Math.abs(legA - mean), Math.abs(legB - mean)) / mean;
    assertThat(expected).isCloseTo(16.0, within(1e-6));
    Finding finding = unbalanceOf(results, panel);
    assertThat(finding.verdict()).as(finding.summary()).isEqualTo(Verdict.WARNING);
    assertThat(figure(finding)).as("the check's figure").isCloseTo(expected, within(1e-9));
    assertThat(demand.unbalancePercent())
        .as("the demand's figure")
        .isCloseTo(expected, within(1e-9));

    Document page =
        Jsoup.parse(
            mvc.perform(get("/boards/{id}", panel).with(VIEWER))
                .andExpect(status().isOk())
                .andReturn()
                .getResponse()
                .getContentAsString());
    assertThat(page.select("li.finding").eachText())
        .as("the board page's findings")
        .anyMatch(text -> text.contains("lines A and B unbalanced: 16.0 % > 10.0 %"));
    assertThat(page.select("dl.facts").text())
        .as("the board page's unbalance figure, now shown on a two-line panel")
        .contains("16.0 %")
        .contains("beyond the panelboard's limit");

    String siteFindings =
        mvc.perform(get("/sites/{id}/findings", results.spec().id()).with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(Jsoup.parse(siteFindings).text())
        .as("the site's findings page")
        .contains("lines A and B unbalanced: 16.0 % > 10.0 %");

    String balancing =
        mvc.perform(get("/boards/{id}/balance", panel).with(VIEWER))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(Jsoup.parse(balancing).text())
        .as("the balancing page, as it stands")
        .contains("16.0 %");

    mvc.perform(get("/api/boards/{id}/demand", panel).with(VIEWER))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.result.unbalancePercent", Matchers.closeTo(expected, 1e-9)));
    mvc.perform(get("/api/boards/{id}/findings", panel).with(VIEWER))
        .andExpect(status().isOk())
        .andExpect(
            jsonPath(
                "$.result.findings[?(@.check == 'PHASE_UNBALANCE')].values[0].value",
                Matchers.contains(Matchers.closeTo(expected, 1e-9))));

    List<String[]> rows = findingsSheet(panel);
    assertThat(rows)
        .as("the workbook's Findings sheet: the title in the panelboard's words, the same sentence")
        .anySatisfy(
            row -> {
              assertThat(row[2]).isEqualTo("Line unbalance within the panelboard's limit");
              assertThat(row[4]).isEqualTo(finding.summary());
            });
  }

  @Test
  void anIecBoardKeepsItsBritishTitleAndWords() throws Exception {
    Site site =
        sites.create(
            new SiteForm(
                "Invented workshop " + UUID.randomUUID(),
                null,
                EarthingSystem.TN_C_S,
                230.0,
                3,
                50.0,
                0.35,
                6.0,
                100.0,
                null,
                null,
                null,
                null));
    long board = boards.create(site.getId(), NecPanels.panelForm("DB-W", 3, 12)).getId();
    // all the load on L1: an unbalanced three-phase board
    schedule.addCircuit(board, NecPanels.breaker(1, PhasePosition.L1, "Workshop sockets", 2300));

    Finding finding = unbalanceOf(analysis.ofBoard(board), board);
    assertThat(finding.verdict()).as(finding.summary()).isEqualTo(Verdict.WARNING);
    assertThat(finding.summary()).startsWith("phases unbalanced: ");

    assertThat(findingsSheet(board))
        .anySatisfy(
            row -> {
              assertThat(row[2]).isEqualTo("Phase unbalance within the board's limit");
              assertThat(row[4]).isEqualTo(finding.summary());
            });
  }

  /** The Findings sheet of a board's workbook, each row's cells as text. */
  private List<String[]> findingsSheet(long boardId) throws Exception {
    byte[] workbook =
        mvc.perform(get("/boards/{id}/export.xlsx", boardId).with(EDITOR))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsByteArray();
    List<String[]> rows = new ArrayList<>();
    try (XSSFWorkbook book = new XSSFWorkbook(new ByteArrayInputStream(workbook))) {
      Sheet sheet = book.getSheet("Findings");
      DataFormatter text = new DataFormatter();
      for (Row row : sheet) {
        String[] cells = new String[10];
        for (int c = 0; c < cells.length; c++) {
          cells[c] = text.formatCellValue(row.getCell(c));
        }
        rows.add(cells);
      }
    }
    return rows;
  }
}
