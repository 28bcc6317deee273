package com.wayledger.check;

import static com.wayledger.support.Roles.editor;
import static com.wayledger.support.Roles.viewer;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The circuit page and the site findings page on the demo site, as a viewer and an editor see them.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles({"test", "demo"})
@DirtiesContext
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class CheckPagesIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired com.wayledger.board.AnalysisService analysis;

  @Test
  @Order(1) // before the proposal is fitted by the next test
  void mixerPageShowsTheNuisanceTripTheProposalTheChartAndTheCaution() throws Exception {
    mvc.perform(get("/circuits/{id}", circuit("Spiral dough mixer")).with(viewer()))
        .andExpect(status().isOk())
        .andExpect(content().string(containsString("nuisance trips likely")))
        .andExpect(content().string(containsString("A device that passes every check")))
        .andExpect(content().string(containsString("class=\"tcc-chart\"")))
        .andExpect(content().string(containsString("assist a competent person")))
        .andExpect(content().string(not(containsString("Fit this device"))));
  }

  @Test
  @Order(2)
  void editorFitsTheProposedDeviceAndTheSurgeFindingIsGoneAndLogged() throws Exception {
    long mixer = circuit("Spiral dough mixer");
    long version =
        jdbc.sql("SELECT version FROM circuit WHERE id = ?")
            .param(mixer)
            .query(Long.class)
            .single();
    mvc.perform(
            post("/circuits/{id}/apply-proposal", mixer)
                .param("version", String.valueOf(version))
                .with(editor())
                .with(csrf()))
        .andExpect(status().is3xxRedirection());
    String curve =
        jdbc.sql("SELECT device_curve FROM circuit WHERE id = ?")
            .param(mixer)
            .query(String.class)
            .single();
    assertThat(curve).as("the proposal replaces the type B breaker").isNotEqualTo("B");
    mvc.perform(get("/circuits/{id}", mixer).with(viewer()))
        .andExpect(content().string(not(containsString("nuisance trips likely"))));
    Long logged =
        jdbc.sql("SELECT COUNT(*) FROM change_log WHERE circuit_id = ? AND kind = 'CIRCUIT_EDITED'")
            .param(mixer)
            .query(Long.class)
            .single();
    assertThat(logged).isEqualTo(1L);
  }

  @Test
  void viewerCannotFitADevice() throws Exception {
    long mixer = circuit("Bread slicer");
    mvc.perform(
            post("/circuits/{id}/apply-proposal", mixer)
                .param("version", "0")
                .with(viewer())
                .with(csrf()))
        .andExpect(status().isForbidden());
  }

  @Test
  void staleProposalIsRefusedWithAConflictAndNothingChanges() throws Exception {
    long slicer = circuit("Bread slicer");
    String before =
        jdbc.sql("SELECT device_curve || device_rating_amps FROM circuit WHERE id = ?")
            .param(slicer)
            .query(String.class)
            .single();
    mvc.perform(
            post("/circuits/{id}/apply-proposal", slicer)
                .param("version", "999")
                .with(editor())
                .with(csrf()))
        .andExpect(status().isConflict());
    String after =
        jdbc.sql("SELECT device_curve || device_rating_amps FROM circuit WHERE id = ?")
            .param(slicer)
            .query(String.class)
            .single();
    assertThat(after).isEqualTo(before);
  }

  @Test
  void siteFindingsFilteredToDangerListOnlyDangers() throws Exception {
    long site = jdbc.sql("SELECT id FROM site").query(Long.class).list().get(0);
    String page =
        mvc.perform(get("/sites/{id}/findings", site).param("severity", "DANGER").with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("v-DANGER")
        .doesNotContain("class=\"badge v-WARNING\"")
        .doesNotContain("class=\"badge v-ADVICE\"");
    assertThat(page).contains("cable not protected");
  }

  @Test
  void aBoardWithTheSameRemarkOnManyWaysShowsOneRowListingThem() throws Exception {
    long site = jdbc.sql("SELECT id FROM site").query(Long.class).list().get(0);
    var results = analysis.ofSite(site);
    // the demo board with the most findings of one check and grade on different ways
    long boardId = 0;
    String check = null;
    int ways = 0;
    for (long id : jdbc.sql("SELECT id FROM board").query(Long.class).list()) {
      var board = results.boardFindings(id).orElse(null);
      if (board == null) {
        continue;
      }
      java.util.Map<String, Integer> counts = new java.util.HashMap<>();
      board
          .circuits()
          .forEach(
              c ->
                  c.findings().stream()
                      .filter(f -> f.verdict().isProblem())
                      .forEach(f -> counts.merge(f.check() + "|" + f.verdict(), 1, Integer::sum)));
      for (var e : counts.entrySet()) {
        if (e.getValue() > ways) {
          ways = e.getValue();
          check = e.getKey();
          boardId = id;
        }
      }
    }
    assertThat(ways).as("the demo has a remark repeated on several ways").isGreaterThan(2);
    String verdict = check.substring(check.indexOf('|') + 1);
    // the board page filtered to that grade prints its lines in place (advice included)
    String page =
        mvc.perform(get("/boards/{id}", boardId).param("severity", verdict).with(viewer()))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    int rows = page.split("class=\"finding v-" + verdict + " grouped\"", -1).length - 1;
    int list = Math.max(0, page.indexOf("id=\"findings\""));
    assertThat(rows)
        .as(
            "grouped %s rows on board %d in %s",
            check, boardId, page.substring(list, Math.min(page.length(), list + 3000)))
        .isGreaterThanOrEqualTo(1);
    assertThat(page).contains(ways + " ways: ");
    int singles = page.split("class=\"badge v-" + verdict + "\"", -1).length - 1;
    assertThat(singles)
        .as("fewer %s rows than findings (%d on one check alone)", verdict, ways)
        .isLessThan(results.problems(boardId).size());
  }

  @Test
  void theBoardPageFoldsItsAdviceAndFetchesTheLinesWhenTheFoldIsOpened() throws Exception {
    long kb1 = jdbc.sql("SELECT id FROM board WHERE reference = 'KB1'").query(Long.class).single();
    long advice =
        analysis.ofSite(siteOf(kb1)).problems(kb1).stream()
            .filter(f -> f.verdict() == com.wayledger.engine.protection.result.Verdict.ADVICE)
            .count();
    assertThat(advice).as("the demo's KB1 has advice").isGreaterThan(1);

    String page = page("/boards/" + kb1);
    assertThat(page)
        .as("the advice lines are left out of the page, the fold and its fetch are there")
        .doesNotContain("class=\"finding v-ADVICE")
        .contains("<summary>Advice: ")
        .contains("hx-get=\"/boards/" + kb1 + "/findings/advice\"")
        .contains("href=\"/boards/" + kb1 + "?severity=ADVICE#findings\"")
        .contains("class=\"finding v-WARNING")
        .contains("assist a competent person");

    String fetched = page("/boards/" + kb1 + "/findings/advice");
    String inPlace = page("/boards/" + kb1 + "?severity=ADVICE");
    assertThat(fetched)
        .as("the fetched lines: advice only, no page around them")
        .startsWith("<ul class=\"finding-list advice-lines\">")
        .doesNotContain("class=\"finding v-WARNING")
        .doesNotContain("<footer");
    int lines = fetched.split("class=\"finding v-ADVICE", -1).length - 1;
    assertThat(lines)
        .as("one line per advice row, as the fold's summary counts them")
        .isGreaterThan(0)
        .isLessThanOrEqualTo((int) advice);
    assertThat(inPlace)
        .as("filtered to advice, the page prints the same lines in place, opened")
        .contains("<details class=\"advice-rows\" open=\"open\">")
        .contains(fetched.substring(0, Math.min(fetched.length(), 2000)));
  }

  private String page(String path) throws Exception {
    return mvc.perform(get(path).with(viewer()))
        .andExpect(status().isOk())
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  private long siteOf(long board) {
    return jdbc.sql("SELECT site_id FROM board WHERE id = ?")
        .param(board)
        .query(Long.class)
        .single();
  }

  private long circuit(String description) {
    return jdbc.sql("SELECT id FROM circuit WHERE description = ?")
        .param(description)
        .query(Long.class)
        .list()
        .get(0);
  }
}
