package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.UUID;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
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
 * Panelboards on NEC-set sites, through the form and the API: the space count is even, a breaker's
 * lines follow from its space (odd left, even right, rows alternating A, B — common practice), and
 * a breaker that overlaps another, starts past the last space or runs off the bottom is refused
 * beside its field with nothing saved. Sites, boards and circuits are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class PanelboardSpacesIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;

  private MockHttpServletRequestBuilder editor(MockHttpServletRequestBuilder request) {
    return request.with(user("ed").roles("EDITOR")).with(csrf());
  }

  private long necSite(String system) throws Exception {
    String name = "Invented panel shop " + UUID.randomUUID();
    mvc.perform(
            editor(post("/api/sites"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 120,
                     "phases": %d, "frequencyHertz": 60, "prospectiveFaultCurrentKiloAmps": 10,
                     "ruleSet": "NEC", "supplySystem": "%s"}
                    """
                        .formatted(name, system.startsWith("SPLIT") ? 1 : 3, system)))
        .andExpect(status().isCreated());
    return jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
  }

  private MockHttpServletRequestBuilder boardForm(
      MockHttpServletRequestBuilder request, String reference, int phases, String spaces) {
    return editor(request)
        .param("reference", reference)
        .param("phases", Integer.toString(phases))
        .param("wayCount", spaces)
        .param("unbalanceLimitPercent", "10")
        .param("coincidenceFactor", "1");
  }

  private long panel(long siteId, int phases, int spaces) throws Exception {
    mvc.perform(
            boardForm(post("/sites/{id}/boards", siteId), "LP-1", phases, Integer.toString(spaces)))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ?")
        .param(siteId)
        .query(Long.class)
        .single();
  }

  private MockHttpServletRequestBuilder breaker(
      long boardId, int space, String position, String description) {
    return editor(post("/boards/{id}/circuits", boardId))
        .param("wayNumber", Integer.toString(space))
        .param("position", position)
        .param("description", description)
        .param("status", "IN_USE")
        .param("deviceKind", "MCB")
        .param("deviceRatingAmps", "20")
        .param("deviceBreakingCapacityKiloAmps", "10");
  }

  private int circuitsOn(long boardId) {
    return jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
        .param(boardId)
        .query(Integer.class)
        .single();
  }

  private String storedPosition(long boardId, int space) {
    return jdbc.sql(
            "SELECT position || CASE WHEN line_to_line THEN '+LL' ELSE '' END FROM circuit"
                + " WHERE board_id = ? AND way_number = ?")
        .params(boardId, space)
        .query(String.class)
        .single();
  }

  @Test
  void anOddSpaceCountIsRefusedBesideTheFieldAndNoBoardIsSaved() throws Exception {
    long siteId = necSite("SPLIT_PHASE_120_240");
    String page =
        mvc.perform(boardForm(post("/sites/{id}/boards", siteId), "LP-ODD", 1, "41"))
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).contains("two spaces to a row");
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM board WHERE site_id = ?")
                .param(siteId)
                .query(Integer.class)
                .single())
        .isZero();
  }

  @Test
  void anOddSpaceCountIsRefusedByTheApiToo() throws Exception {
    long siteId = necSite("WYE_208Y_120");
    mvc.perform(
            editor(post("/api/sites/{id}/boards", siteId))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"reference": "HP-ODD", "phases": 3, "wayCount": 29,
                     "unbalanceLimitPercent": 10, "coincidenceFactor": 1}
                    """))
        .andExpect(status().isUnprocessableContent())
        .andExpect(jsonPath("$.fields[0].field").value("wayCount"));
  }

  @Test
  void theLinesOfABreakerFollowFromItsSpaceNotFromWhatWasSent() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 42);
    // rows alternate A, B from the top (common practice): space 3 is row 2, line B
    mvc.perform(breaker(boardId, 3, "L1", "Bath receptacles"))
        .andExpect(status().is3xxRedirection());
    // a two-pole at space 6 takes 6 and 8: rows 3 and 4, lines A and B (a 240 V load)
    mvc.perform(breaker(boardId, 6, "L1_L2", "Water heater"))
        .andExpect(status().is3xxRedirection());

    assertThat(storedPosition(boardId, 3)).isEqualTo("L2");
    assertThat(storedPosition(boardId, 6)).isEqualTo("L1+LL");
    assertThat(
            jdbc.sql(
                    "SELECT way_number || ':' || phase FROM way_slot WHERE board_id = ? ORDER BY way_number")
                .param(boardId)
                .query(String.class)
                .list())
        .as("one slot per space taken, on that space's line")
        .containsExactly("3:L2", "6:L1", "8:L2");
  }

  @Test
  void aTwoPoleBreakerStartingOnTheLastRowIsRefusedBesideTheSpace() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 42);
    String page =
        mvc.perform(breaker(boardId, 41, "L1_L2", "Range"))
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).contains("run past the bottom of the panel");
    assertThat(circuitsOn(boardId)).isZero();
  }

  @Test
  void aSpacePastTheCountIsRefused() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 24);
    String page =
        mvc.perform(breaker(boardId, 25, "L1", "Garage"))
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).contains("This panelboard has spaces 1 to 24.");
    assertThat(circuitsOn(boardId)).isZero();
  }

  @Test
  void aBreakerOnASpaceUnderATwoPoleBreakerIsRefusedOnThePageAndInTheApi() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 42);
    mvc.perform(breaker(boardId, 7, "L1_L2", "Dryer")).andExpect(status().is3xxRedirection());

    String page =
        mvc.perform(breaker(boardId, 9, "L1", "Hall lights"))
            .andExpect(status().isUnprocessableContent())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page).contains("Space 9 is already taken by “Dryer”.");
    mvc.perform(
            editor(post("/api/boards/{id}/circuits", boardId))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"wayNumber": 5, "position": "L1_L2", "description": "Heat pump",
                     "status": "IN_USE", "deviceKind": "MCB", "deviceRatingAmps": 30}
                    """))
        .andExpect(status().isUnprocessableContent())
        .andExpect(jsonPath("$.fields[0].field").value("wayNumber"))
        .andExpect(jsonPath("$.fields[0].message").value("Space 7 is already taken by “Dryer”."));
    assertThat(circuitsOn(boardId)).isEqualTo(1);
  }

  @Test
  void aPanelCannotShrinkBelowTheLowestSpaceABreakerReaches() throws Exception {
    long siteId = necSite("SPLIT_PHASE_120_240");
    long boardId = panel(siteId, 1, 42);
    mvc.perform(breaker(boardId, 21, "L1_L2", "Range")).andExpect(status().is3xxRedirection());
    // the range takes 21 and 23: a 22-space panel would cut it off
    mvc.perform(boardForm(post("/boards/{id}", boardId), "LP-1", 1, "22"))
        .andExpect(status().isUnprocessableContent());
    assertThat(
            jdbc.sql("SELECT way_count FROM board WHERE id = ?")
                .param(boardId)
                .query(Integer.class)
                .single())
        .isEqualTo(42);
  }

  @Test
  void theBoardPageDrawsOddSpacesLeftEvenRightWithLinesAAndB() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 24);
    mvc.perform(breaker(boardId, 2, "L1_L2", "Water heater"))
        .andExpect(status().is3xxRedirection());
    String page =
        mvc.perform(get("/boards/{id}", boardId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("class=\"grid panel-layout\"")
        .contains("Panelboard with 24 spaces")
        .contains("id=\"space-1\"")
        .contains("spaces 2/4 · lines A–B")
        .doesNotContain("id=\"space-4\"") // under the water heater's cell, which spans it
        .doesNotContain(">L1<");
  }

  @Test
  void balancingASplitPhasePanelMovesA120VoltBreakerFromAnASpaceToABSpace() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 42);
    // three 1,200 W loads on line A (spaces 1, 2 and 5 are rows 1, 1 and 3: all A)
    for (int space : new int[] {1, 2, 5}) {
      mvc.perform(
              breaker(boardId, space, "L1", "Receptacles " + space)
                  .param("loadDescription", "Receptacles " + space)
                  .param("loadCategory", "OTHER")
                  .param("loadQuantity", "1")
                  .param("loadRatingValue", "1200")
                  .param("loadRatingUnit", "W")
                  .param("loadPowerFactor", "1"))
          .andExpect(status().is3xxRedirection());
    }
    String page =
        mvc.perform(get("/boards/{id}/balance", boardId).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    // 3 × 10 A on A, none on B: the best plan puts one on B (20 A / 10 A), one move
    assertThat(page).containsPattern("space [125] \\(A\\) → space \\d+ \\(B\\), 10\\.0 A");
    assertThat(page).doesNotContain("single-phase board");
  }

  @Test
  void balancingApiTakesTheUnbalanceOfASplitPhasePanelOverItsTwoLinesAsTheDemandApiDoes()
      throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 42);
    // 1,200 W at 120 V = 10 A each (hand calculation): spaces 1, 2, 5 on A, space 3 on B
    for (int space : new int[] {1, 2, 3, 5}) {
      mvc.perform(
              breaker(boardId, space, "L1", "Receptacles " + space)
                  .param("loadDescription", "Receptacles " + space)
                  .param("loadCategory", "OTHER")
                  .param("loadQuantity", "1")
                  .param("loadRatingValue", "1200")
                  .param("loadRatingUnit", "W")
                  .param("loadPowerFactor", "1"))
          .andExpect(status().is3xxRedirection());
    }
    var viewer = user("viewer").roles("VIEWER");

    // A 30 A, B 10 A: unbalance over two lines |30 − 10| / 40 = 50 % (over three lines with an
    // empty third it would read 200 %); one move gives 20 A and 20 A, within a 10 % limit
    mvc.perform(get("/api/boards/{id}/balance", boardId).with(viewer))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.fewestMoves.before.l1Amps").value(30.0))
        .andExpect(jsonPath("$.fewestMoves.before.l2Amps").value(10.0))
        .andExpect(jsonPath("$.fewestMoves.before.lines").value(2))
        .andExpect(jsonPath("$.optimal.unbalanceBeforePercent").value(50.0))
        .andExpect(jsonPath("$.optimal.unbalanceAfterPercent").value(0.0))
        .andExpect(jsonPath("$.fewestMoves.limitVerdict").value("REACHED"))
        .andExpect(jsonPath("$.fewestMoves.movesToReachLimit").value(1))
        .andExpect(jsonPath("$.fewestMoves.limitPlan[0].toPhase").value("L2"))
        // the moves in the panel's words, as its balancing page names them (common practice)
        .andExpect(
            jsonPath("$.movesInWords[0]")
                .value(
                    org.hamcrest.Matchers.matchesPattern(
                        "move circuit 'Receptacles [125]' from space [125] A to space \\d+ B")));
    assertThat(
            jdbc.sql("SELECT summary FROM change_log WHERE board_id = ? ORDER BY id")
                .param(boardId)
                .query(String.class)
                .list())
        .as("the change log names spaces and lines A/B as the panel's page does")
        .contains("Space 3 B “Receptacles 3”: added")
        .noneMatch(line -> line.startsWith("Way "));
    mvc.perform(get("/api/boards/{id}/demand", boardId).with(viewer))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.result.unbalancePercent").value(50.0));
    // the API keeps its codes and names the lines as people do beside them
    mvc.perform(get("/api/boards/{id}", boardId).with(viewer))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.board.lineNames[0]").value("A"))
        .andExpect(jsonPath("$.board.lineNames[1]").value("B"))
        .andExpect(jsonPath("$.board.lineNames.length()").value(2))
        .andExpect(jsonPath("$.circuits[?(@.wayNumber == 3)].position").value("L2"))
        .andExpect(jsonPath("$.circuits[?(@.wayNumber == 3)].lines").value("B"));
  }

  @Test
  void eachBreakerOnThePanelShowsItsConductorInAwgAndFeetWithUsWords() throws Exception {
    long boardId = panel(necSite("SPLIT_PHASE_120_240"), 1, 24);
    mvc.perform(
            breaker(boardId, 1, "L1", "Kitchen counter")
                .param("cableLineSize", "12 AWG")
                .param("cableCpcSize", "12 AWG")
                .param("cableMaterial", "COPPER")
                .param("cableLengthFeet", "40"))
        .andExpect(status().is3xxRedirection());
    mvc.perform(
            breaker(boardId, 2, "L1_L2", "Range")
                .param("cableLineSize", "6 AWG")
                .param("cableCpcSize", "10 AWG")
                .param("cableMaterial", "ALUMINIUM")
                .param("cableLengthFeet", "25"))
        .andExpect(status().is3xxRedirection());
    mvc.perform(breaker(boardId, 5, "L1", "Spare circuit")).andExpect(status().is3xxRedirection());

    Document page =
        Jsoup.parse(
            mvc.perform(get("/boards/{id}", boardId).with(user("ed").roles("EDITOR")))
                .andExpect(status().isOk())
                .andReturn()
                .getResponse()
                .getContentAsString());

    // an NEC site's page is in en-US words (no interface language chosen): "Aluminum"
    assertThat(page.select("#space-1 .conductor").text())
        .isEqualTo("Conductor 12 AWG / 12 AWG 40 ft, Copper");
    assertThat(page.select("#space-2 .conductor").text())
        .isEqualTo("Conductor 6 AWG / 10 AWG 25 ft, Aluminum");
    assertThat(page.select("#space-5 .conductor").text()).isEqualTo("No conductor recorded");
    assertThat(page.select(".conductor").text()).doesNotContain("mm²").doesNotContain(" m,");
  }
}
