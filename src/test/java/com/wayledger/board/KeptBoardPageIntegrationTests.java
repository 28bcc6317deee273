package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PhasePosition;
import com.wayledger.loadlog.LogFixtures;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import jakarta.persistence.EntityManagerFactory;
import org.hibernate.SessionFactory;
import org.hibernate.stat.Statistics;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The board page's view (rows, board facts, feeding way) is built once per site data generation and
 * kept beside the analysis: a second read with no change loads no board and no circuit (counted by
 * Hibernate's statistics, which count every statement Hibernate prepares), and a change shows on
 * the very next read.
 */
@SpringBootTest(properties = "spring.jpa.properties.hibernate.generate_statistics=true")
@AutoConfigureMockMvc
@ActiveProfiles("test")
class KeptBoardPageIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;
  @Autowired EntityManagerFactory entityManagers;

  Board board;
  Circuit lights;

  @BeforeEach
  void siteWithOneBoardAndCircuit() {
    Site site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-V1", 63.0));
    lights =
        schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Lights", 500));
  }

  @Test
  void aSecondReadWithNoChangeLoadsNoBoardAndNoCircuit() throws Exception {
    Statistics statistics = entityManagers.unwrap(SessionFactory.class).getStatistics();
    statistics.clear();
    String first = page("viewer", "VIEWER");
    assertThat(statistics.getPrepareStatementCount())
        .as("the first read builds the view from the stored board and circuits")
        .isPositive();
    assertThat(statistics.getEntityStatistics(Board.class.getName()).getLoadCount()).isPositive();

    statistics.clear();
    String second = page("viewer", "VIEWER");

    assertThat(statistics.getEntityStatistics(Board.class.getName()).getLoadCount()).isZero();
    assertThat(statistics.getEntityStatistics(Circuit.class.getName()).getLoadCount()).isZero();
    assertThat(statistics.getQueryExecutionCount()).as("JPA queries").isZero();
    assertThat(statistics.getPrepareStatementCount()).as("statements Hibernate prepared").isZero();
    // the same page, but for the CSRF token (masked afresh on every request)
    assertThat(withoutCsrfTokens(second)).isEqualTo(withoutCsrfTokens(first));
  }

  @Test
  void anEditShowsOnTheNextReadAndTheKeptViewServesAnotherRole() throws Exception {
    String before = page("viewer", "VIEWER");
    // 500 W at unity power factor: 0.50 kW connected
    assertThat(before).contains(">0.50</td>").doesNotContain("Kettle");
    long runsBefore = analysis.siteAnalysisRuns();

    schedule.addLoad(lights.getId(), LogFixtures.load("Kettle", 1500));

    String after = page("viewer", "VIEWER");
    // 500 W + 1500 W at unity power factor: 2.00 kW connected on the circuit
    assertThat(after).contains("Kettle").contains(">2.00</td>").doesNotContain(">0.50</td>");
    assertThat(analysis.siteAnalysisRuns()).isEqualTo(runsBefore + 1);
    // the kept view holds no per-user decision: an editor reading it gets the edit controls
    assertThat(after).doesNotContain("/circuits/" + lights.getId() + "/edit");
    assertThat(page("editor", "EDITOR")).contains("/circuits/" + lights.getId() + "/edit");
  }

  private static String withoutCsrfTokens(String html) {
    return html.replaceAll("X-CSRF-TOKEN&quot;: &quot;[^&]+&quot;", "")
        .replaceAll("name=\"_csrf\" value=\"[^\"]+\"", "");
  }

  private String page(String name, String role) throws Exception {
    return PageFixtures.boardPage(mvc, board.getId(), name, role);
  }
}
