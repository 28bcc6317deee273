package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * The circuit editor opened from a circuit's checks page: it posts as a plain form, Save and Cancel
 * both return to the checks page, and a save that changes nothing adds nothing to the change log.
 * Also the board page's live panels: an htmx save answers with the demand panel, the circuit count
 * and the findings as out-of-band swaps.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class CircuitEditReturnIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired ChangeLog log;

  Board board;
  Circuit circuit;

  @BeforeEach
  void boardWithOneCircuit() {
    Site site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-E", 63.0));
    circuit =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 2300));
  }

  @Test
  void editPageOpenedFromTheChecksPostsPlainlyAndCancelGoesBackThere() throws Exception {
    String page =
        mvc.perform(
                get("/circuits/{id}/edit", circuit.getId())
                    .param("back", "checks")
                    .with(user("ed").roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(page)
        .as("no htmx post: the schedule table it would swap into is not on this page")
        .doesNotContain("hx-post=\"/circuits/" + circuit.getId() + "\"")
        .contains("action=\"/circuits/" + circuit.getId() + "\"")
        .contains("name=\"back\" value=\"checks\"")
        .as("Cancel is a link back to the checks page")
        .containsPattern(
            "<a class=\"button\" href=\"/circuits/" + circuit.getId() + "\">Cancel</a>");
  }

  @Test
  void savingFromTheChecksPageReturnsThereAndSaysSo() throws Exception {
    // The notice itself is read in the real-browser journey: sessions live in the database here, so
    // a MockHttpSession would not carry the flash message.
    mvc.perform(editedRow("20").param("back", "checks"))
        .andExpect(status().is3xxRedirection())
        .andExpect(redirectedUrl("/circuits/" + circuit.getId()))
        .andExpect(flash().attribute("saved", "circuit.saved"));

    String checks =
        mvc.perform(get("/circuits/{id}", circuit.getId()).with(user("ed").roles("EDITOR")))
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(checks)
        .as("the checks page after the save shows the new rating")
        .contains("MCB B20");
  }

  @Test
  void aSaveThatChangesNothingRecordsNothing() throws Exception {
    int before = log.boardHistory(board.getId()).size();

    mvc.perform(editedRow("32").param("back", "checks"))
        .andExpect(status().is3xxRedirection())
        .andExpect(flash().attribute("saved", "circuit.unchanged"));
    mvc.perform(editedRow("32").header("HX-Request", "true")).andExpect(status().isOk());

    assertThat(log.boardHistory(board.getId()))
        .as("change-log entries after two saves of the unchanged row (rated 32 A as stored)")
        .hasSize(before);

    mvc.perform(editedRow("40")).andExpect(status().is3xxRedirection());
    assertThat(log.boardHistory(board.getId()))
        .as("a real change is still recorded, once")
        .hasSize(before + 1);
  }

  @Test
  void htmxSaveBringsTheDemandPanelCountAndFindingsAlong() throws Exception {
    String answer =
        mvc.perform(
                post("/boards/{id}/circuits", board.getId())
                    .header("HX-Request", "true")
                    .with(user("ed").roles("EDITOR"))
                    .with(csrf())
                    .param("wayNumber", "2")
                    .param("position", "L2")
                    .param("description", "Mixer")
                    .param("status", "IN_USE")
                    .param("deviceKind", "MCB")
                    .param("deviceCurve", "C")
                    .param("deviceRatingAmps", "16")
                    .param("loadCategory", "FIXED_APPLIANCE")
                    .param("loadQuantity", "1")
                    .param("loadRatingValue", "2300")
                    .param("loadRatingUnit", "W")
                    .param("loadPowerFactor", "1"))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(answer)
        .as("the table itself, swapped into the target")
        .contains("id=\"schedule\"")
        .as("demand panel out of band")
        .contains("id=\"demand-panel\" hx-swap-oob=\"true\"")
        .as("count out of band, with both circuits")
        .containsPattern("id=\"circuit-count\" class=\"muted\" hx-swap-oob=\"true\">2 circuits")
        .as("findings out of band")
        .contains("id=\"findings\" class=\"findings\" hx-swap-oob=\"true\"");
    // 2300 W at 230 V = 10.0 A on L2 (I = P / U0, DESIGN.md connected load)
    assertThat(answer).as("L2 demand in the refreshed panel").contains("10.0");
  }

  private MockHttpServletRequestBuilder editedRow(String ratingAmps) {
    Circuit stored = schedule.circuit(circuit.getId());
    return post("/circuits/{id}", circuit.getId())
        .with(user("ed").roles("EDITOR"))
        .with(csrf())
        .param("version", String.valueOf(stored.getVersion()))
        .param("wayNumber", "1")
        .param("position", "L1")
        .param("description", "Prover")
        .param("status", "IN_USE")
        .param("lockedForBalancing", "false")
        .param("deviceKind", "MCB")
        .param("deviceCurve", "B")
        .param("deviceRatingAmps", ratingAmps)
        .param("devicePoles", "1")
        .param("deviceBreakingCapacityKiloAmps", "6")
        .param("_ringFinal", "on");
  }
}
