package com.wayledger.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.demand.PhaseDemand;
import java.util.List;
import java.util.UUID;
import org.jsoup.Jsoup;
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
 * A two-pole load on a 208Y/120 V panelboard moved by the balancing page through the stored path:
 * the plan shown is applied, and the circuit is read back in its new two spaces with their pair of
 * lines, and the board's line currents come out balanced. Site, board and loads are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class TwoPolePanelBalancingIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired JdbcClient jdbc;
  @Autowired AnalysisService analysis;
  @Autowired ScheduleService schedule;

  private MockHttpServletRequestBuilder editor(MockHttpServletRequestBuilder request) {
    return request.with(user("ed").roles("EDITOR")).with(csrf());
  }

  private long panel() throws Exception {
    String name = "Invented rooftop shop " + UUID.randomUUID();
    mvc.perform(
            editor(post("/api/sites"))
                .contentType(MediaType.APPLICATION_JSON)
                .content(
                    """
                    {"name": "%s", "earthingSystem": "TN_C_S", "nominalVoltageVolts": 120,
                     "phases": 3, "frequencyHertz": 60, "prospectiveFaultCurrentKiloAmps": 10,
                     "ruleSet": "NEC", "supplySystem": "WYE_208Y_120"}
                    """
                        .formatted(name)))
        .andExpect(status().isCreated());
    long siteId =
        jdbc.sql("SELECT id FROM site WHERE name = ?").param(name).query(Long.class).single();
    mvc.perform(
            editor(post("/sites/{id}/boards", siteId))
                .param("reference", "RP-1")
                .param("phases", "3")
                .param("wayCount", "12")
                .param("unbalanceLimitPercent", "10")
                .param("coincidenceFactor", "1"))
        .andExpect(status().is3xxRedirection());
    return jdbc.sql("SELECT id FROM board WHERE site_id = ?")
        .param(siteId)
        .query(Long.class)
        .single();
  }

  private void breaker(
      long boardId, int space, String position, int poles, double watts, boolean locked)
      throws Exception {
    mvc.perform(
            editor(post("/boards/{id}/circuits", boardId))
                .param("wayNumber", Integer.toString(space))
                .param("position", position)
                .param("description", "Load at space " + space)
                .param("status", "IN_USE")
                .param("lockedForBalancing", Boolean.toString(locked))
                .param("deviceKind", "MCB")
                .param("deviceRatingAmps", "30")
                .param("devicePoles", Integer.toString(poles))
                .param("deviceBreakingCapacityKiloAmps", "10")
                .param("loadDescription", "Load at space " + space)
                .param("loadCategory", "FIXED_APPLIANCE")
                .param("loadQuantity", "1")
                .param("loadRatingValue", Double.toString(watts))
                .param("loadRatingUnit", "W")
                .param("loadPowerFactor", "1"))
        .andExpect(status().is3xxRedirection());
  }

  @Test
  void theBalancingPageMovesATwoPoleLoadFromAbToBcAndTheStoredBoardComesOutBalanced()
      throws Exception {
    long board = panel();
    // 4160 W across A–B (spaces 1 and 3): 4160 / (√3·120 V) = 20.0 A on A and B; a locked 2400 W
    // on A (space 2): 20 A. By hand, only the pair B–C leaves every line at about 20 A.
    breaker(board, 1, "L1_L2", 2, 4160.0, false);
    breaker(board, 2, "L1", 1, 2400.0, true);

    String page =
        mvc.perform(get("/boards/{id}/balance", board).with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    var html = Jsoup.parse(page);
    String placements = html.selectFirst("input[name=placements]").val();
    assertThat(placements).as("the two-pole breaker's placement").endsWith(":4:L2:2");
    assertThat(html.select("li.space-move").text()).contains("two-pole").contains("spaces 4 and 6");

    mvc.perform(
            editor(post("/boards/{id}/balance/apply", board))
                .param("placements", placements)
                .param("version", html.selectFirst("input[name=version]").val())
                .param("reason", "rebalance"))
        .andExpect(status().is3xxRedirection());

    assertThat(
            jdbc.sql(
                    "SELECT way_number || ' ' || position || CASE WHEN line_to_line THEN '+LL' ELSE ''"
                        + " END || ' ' || device_poles FROM circuit WHERE board_id = ? AND"
                        + " description = 'Load at space 1'")
                .param(board)
                .query(String.class)
                .single())
        .as("top space, first line with the line-to-line mark (B–C), device poles unchanged")
        .isEqualTo("4 L2+LL 2");
    List<String> slots =
        jdbc.sql(
                "SELECT s.way_number || ' ' || s.phase FROM way_slot s JOIN circuit c ON"
                    + " c.id = s.circuit_id WHERE c.board_id = ? AND c.description = 'Load at space"
                    + " 1' ORDER BY s.way_number")
            .param(board)
            .query(String.class)
            .list();
    assertThat(slots).as("the two spaces it now takes, on B and C").containsExactly("4 L2", "6 L3");

    List<PhaseDemand> lines = analysis.ofBoard(board).boardDemand(board).phases();
    double heater = 4160.0 / (Math.sqrt(3.0) * 120.0);
    // each line now carries one load: A 20 A, B and C 20.0 A (hand-worked above)
    assertThat(lines.get(0).currentAmps()).as("A").isCloseTo(20.0, within(0.01));
    assertThat(lines.get(1).currentAmps()).as("B").isCloseTo(heater, within(0.01));
    assertThat(lines.get(2).currentAmps()).as("C").isCloseTo(heater, within(0.01));

    String undo = html.selectFirst("input[name=undo]").val();
    mvc.perform(
            editor(post("/boards/{id}/balance/apply", board))
                .param("placements", undo)
                .param("version", schedule.scheduleToken(board))
                .param("undoing", "true"))
        .andExpect(status().is3xxRedirection());
    assertThat(
            jdbc.sql(
                    "SELECT s.way_number || ' ' || s.phase FROM way_slot s JOIN circuit c ON"
                        + " c.id = s.circuit_id WHERE c.board_id = ? AND c.description = 'Load at"
                        + " space 1' ORDER BY s.way_number")
                .param(board)
                .query(String.class)
                .list())
        .as("undo puts it back on spaces 1 and 3, A and B")
        .containsExactly("1 L1", "3 L2");
  }
}
