package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockHttpSession;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Two people edit the same circuit, each in their own session: the first save wins, the second gets
 * 409 with the values saved meanwhile in the form and their own values beside them, and nothing of
 * theirs is stored.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ConcurrentEditIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired ChangeLog log;

  Board board;
  Circuit circuit;
  final MockHttpSession aliceSession = new MockHttpSession();
  final MockHttpSession bobSession = new MockHttpSession();

  @BeforeEach
  void circuitBothWillEdit() {
    Site site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-C", 63.0));
    circuit =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(3, PhasePosition.L2, "Worktop sockets", 2000));
  }

  @Test
  void secondSaveGetsAConflictShowingTheSavedValuesAndKeepsItsOwn() throws Exception {
    String aliceVersion = openEditor("alice", aliceSession);
    String bobVersion = openEditor("bob", bobSession);
    assertThat(bobVersion).as("both opened the same version").isEqualTo(aliceVersion);

    mvc.perform(save("alice", aliceSession, "Worktop sockets (left)", "20", aliceVersion))
        .andExpect(status().is3xxRedirection());
    String answer =
        mvc.perform(save("bob", bobSession, "Worktop sockets, bakery side", "25", bobVersion))
            .andExpect(status().isConflict())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(answer).as("conflict notice").contains("id=\"edit-conflict\"");
    assertThat(answer)
        .as("the form holds Alice's saved description")
        .containsPattern("id=\"description\"[^>]*value=\"Worktop sockets \\(left\\)\"");
    assertThat(answer)
        .as("Bob's own values are shown")
        .contains("Worktop sockets, bakery side")
        .contains(">25.0<");
    assertThat(answer).as("not the generic error page").doesNotContain("error.stale");
    assertThat(schedule.circuit(circuit.getId()).getDescription())
        .as("stored")
        .isEqualTo("Worktop sockets (left)");
    assertThat(log.boardHistory(board.getId()))
        .as("only Alice's edit is logged")
        .filteredOn(e -> e.kind() == com.wayledger.system.ChangeKind.CIRCUIT_EDITED)
        .singleElement()
        .satisfies(e -> assertThat(e.username()).isEqualTo("alice"));
  }

  @Test
  void htmxSaveGetsTheSameConflictAsAnEditorFragment() throws Exception {
    String version = openEditor("alice", aliceSession);
    mvc.perform(save("alice", aliceSession, "Sockets A", "16", version))
        .andExpect(status().is3xxRedirection());

    String fragment =
        mvc.perform(
                save("bob", bobSession, "Sockets B", "16", version).header("HX-Request", "true"))
            .andExpect(status().isConflict())
            .andReturn()
            .getResponse()
            .getContentAsString();

    assertThat(fragment)
        .as("a table row to swap in, not a page")
        .startsWith("<tr")
        .doesNotContain("<html");
    assertThat(fragment).contains("id=\"edit-conflict\"").contains("Sockets B");
    assertThat(schedule.circuit(circuit.getId()).getDescription()).isEqualTo("Sockets A");
  }

  @Test
  void savingAgainFromTheConflictFormIsAcceptedAsADeliberateOverwrite() throws Exception {
    String version = openEditor("alice", aliceSession);
    mvc.perform(save("alice", aliceSession, "Sockets A", "16", version))
        .andExpect(status().is3xxRedirection());
    String conflict =
        mvc.perform(save("bob", bobSession, "Sockets B", "16", version))
            .andExpect(status().isConflict())
            .andReturn()
            .getResponse()
            .getContentAsString();

    mvc.perform(save("bob", bobSession, "Sockets B", "16", versionIn(conflict)))
        .andExpect(status().is3xxRedirection());
    assertThat(schedule.circuit(circuit.getId()).getDescription()).isEqualTo("Sockets B");
  }

  private String openEditor(String who, MockHttpSession session) throws Exception {
    String html =
        mvc.perform(
                get("/circuits/{id}/edit", circuit.getId())
                    .session(session)
                    .with(user(who).roles("EDITOR")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    return versionIn(html);
  }

  private static String versionIn(String html) {
    Matcher m =
        Pattern.compile("name=\"version\" value=\"(\\d+)\"|value=\"(\\d+)\"[^>]*name=\"version\"")
            .matcher(html);
    assertThat(m.find()).as("version field in the editor").isTrue();
    return m.group(1) != null ? m.group(1) : m.group(2);
  }

  private MockHttpServletRequestBuilder save(
      String who, MockHttpSession session, String description, String ratingAmps, String version) {
    return post("/circuits/{id}", circuit.getId())
        .session(session)
        .with(user(who).roles("EDITOR"))
        .with(csrf())
        .param("wayNumber", "3")
        .param("position", "L2")
        .param("description", description)
        .param("status", "IN_USE")
        .param("deviceKind", "MCB")
        .param("deviceCurve", "B")
        .param("deviceRatingAmps", ratingAmps)
        .param("version", version);
  }
}
