package com.wayledger.hardening;

import static com.wayledger.hardening.Fixture.api;
import static com.wayledger.hardening.Fixture.pageEditor;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;

import com.wayledger.account.AccountService;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

/**
 * Phase counts stay consistent from the supply down to the circuits, on the pages and the API: a
 * site cannot become single-phase while it has three-phase boards; a board cannot become
 * single-phase while it holds circuits on L2, L3 or all three lines, or feeds a three-phase board.
 * The refusal names what must change first, and nothing is stored.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ConsistencyRulesIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AccountService accounts;

  Fixture fixture;

  @BeforeEach
  void fixture() throws Exception {
    Fixture.ensureApiUser(accounts);
    fixture = new Fixture(mvc, jdbc);
  }

  private int phasesOf(String table, long id) {
    return jdbc.sql("SELECT phases FROM " + table + " WHERE id = ?")
        .param(id)
        .query(Integer.class)
        .single();
  }

  private MvcResult putJson(String url, Object body) throws Exception {
    return mvc.perform(
            put(url)
                .contentType(MediaType.APPLICATION_JSON)
                .content(Fixture.JSON.writeValueAsString(body))
                .with(api()))
        .andReturn();
  }

  @Test
  void siteWithAThreePhaseBoardCannotBecomeSinglePhase() throws Exception {
    Map<String, Object> site = Fixture.siteJson("Consistency " + fixture.siteId);
    site.put("phases", 1);
    MvcResult viaApi = putJson("/api/sites/" + fixture.siteId, site);
    assertThat(viaApi.getResponse().getStatus()).isEqualTo(422);
    assertThat(viaApi.getResponse().getContentAsString()).contains("site.phases.boardsThreePhase");
    var page = post("/sites/{id}", fixture.siteId);
    site.forEach((name, value) -> page.param(name, String.valueOf(value)));
    MvcResult onPage = mvc.perform(page.with(pageEditor()).with(csrf())).andReturn();
    assertThat(onPage.getResponse().getStatus()).isEqualTo(422);
    String reference =
        jdbc.sql("SELECT reference FROM board WHERE id = ?")
            .param(fixture.boardId)
            .query(String.class)
            .single();
    assertThat(onPage.getResponse().getContentAsString())
        .contains("Make these boards single-phase first: " + reference);
    assertThat(phasesOf("site", fixture.siteId)).isEqualTo(3);
  }

  @Test
  void boardHoldingAnL2CircuitCannotBecomeSinglePhase() throws Exception {
    Fixture.postJson(
        mvc,
        "/api/boards/" + fixture.boardId + "/circuits",
        Fixture.circuitJson(4, "L2", "Fridge"));
    Map<String, Object> board = Fixture.boardJson("ONE-" + fixture.boardId, 1);
    MvcResult viaApi = putJson("/api/boards/" + fixture.boardId, board);
    assertThat(viaApi.getResponse().getStatus()).isEqualTo(422);
    assertThat(viaApi.getResponse().getContentAsString()).contains("board.phases.circuitsBeyondL1");
    var page = post("/boards/{id}", fixture.boardId);
    board.forEach((name, value) -> page.param(name, String.valueOf(value)));
    MvcResult onPage = mvc.perform(page.with(pageEditor()).with(csrf())).andReturn();
    assertThat(onPage.getResponse().getStatus()).isEqualTo(422);
    assertThat(onPage.getResponse().getContentAsString())
        .contains("Move or remove these circuits first (way and position): 4 L2");
    assertThat(phasesOf("board", fixture.boardId)).isEqualTo(3);
  }

  @Test
  void boardFeedingAThreePhaseBoardCannotBecomeSinglePhase() throws Exception {
    Map<String, Object> child = Fixture.boardJson("CHILD-" + fixture.boardId, 3);
    child.put("parentBoardId", fixture.boardId);
    Fixture.postJson(mvc, "/api/sites/" + fixture.siteId + "/boards", child);
    jdbc.sql("DELETE FROM circuit WHERE board_id = ?").param(fixture.boardId).update();
    MvcResult result = putJson("/api/boards/" + fixture.boardId, Fixture.boardJson("PARENT", 1));
    assertThat(result.getResponse().getStatus()).isEqualTo(422);
    assertThat(result.getResponse().getContentAsString())
        .contains("board.phases.childrenThreePhase");
    assertThat(phasesOf("board", fixture.boardId)).isEqualTo(3);
  }

  @Test
  void theRulesDoNotRefuseAConsistentChange() throws Exception {
    jdbc.sql("DELETE FROM circuit WHERE board_id = ?").param(fixture.boardId).update();
    MvcResult board = putJson("/api/boards/" + fixture.boardId, Fixture.boardJson("NOW-ONE", 1));
    assertThat(board.getResponse().getStatus()).isEqualTo(200);
    Map<String, Object> site = Fixture.siteJson("Now single " + fixture.siteId);
    site.put("phases", 1);
    assertThat(putJson("/api/sites/" + fixture.siteId, site).getResponse().getStatus())
        .isEqualTo(200);
    assertThat(phasesOf("site", fixture.siteId)).isEqualTo(1);
  }
}
