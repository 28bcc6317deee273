package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.ChangeKind;
import java.util.ArrayList;
import java.util.EnumMap;
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
 * The change log on the embedded database: what is recorded, that it cannot be altered, and the
 * replay.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ChangeLogIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;
  @Autowired ChangeLog log;
  @Autowired HistoryService history;
  @Autowired JdbcClient jdbc;

  Site site;
  Board board;

  @BeforeEach
  void freshSiteAndBoard() {
    site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-L", 63.0));
  }

  @Test
  void circuitAddedInTheEditorIsLoggedWithItsUserReasonAndSnapshot() throws Exception {
    mvc.perform(
            post("/boards/{id}/circuits", board.getId())
                .with(user("alice").roles("EDITOR"))
                .with(csrf())
                .param("wayNumber", "2")
                .param("position", "L2")
                .param("description", "Dough sheeter")
                .param("status", "IN_USE")
                .param("deviceKind", "MCB")
                .param("deviceCurve", "C")
                .param("deviceRatingAmps", "16")
                .param("loadCategory", "MOTOR")
                .param("loadQuantity", "1")
                .param("loadRatingValue", "1100")
                .param("loadRatingUnit", "W")
                .param("loadPowerFactor", "0.8")
                .param("reason", "WO-4471"))
        .andExpect(status().is3xxRedirection());

    ChangeLogEntry entry = log.ofSite(site.getId(), LogFilter.board(board.getId())).get(0);
    assertThat(entry.kind()).isEqualTo(ChangeKind.CIRCUIT_ADDED);
    assertThat(entry.username()).as("who").isEqualTo("alice");
    assertThat(entry.reason()).as("reason").isEqualTo("WO-4471");
    assertThat(entry.summary()).contains("Dough sheeter");
    assertThat(entry.before()).as("nothing before an addition").isNull();
    assertThat(Snapshots.circuit(entry.after()).loads())
        .as("the snapshot holds the first load")
        .singleElement()
        .satisfies(load -> assertThat(load.ratingValue()).isEqualTo(1100.0));
  }

  @Test
  void everyKindOfScheduleChangeLeavesOneEntry() {
    Circuit circuit =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 3000));
    var load = schedule.addLoad(circuit.getId(), LogFixtures.load("Lamp", 100), "WO-1");
    schedule.updateLoad(load.getId(), LogFixtures.load("Lamp", 150), null);
    schedule.deleteLoad(load.getId(), null);
    schedule.deleteCircuit(circuit.getId(), "removed for works");

    List<ChangeKind> kinds =
        log.boardHistory(board.getId()).stream().map(ChangeLogEntry::kind).toList();
    assertThat(kinds)
        .containsExactly(
            ChangeKind.BOARD_ADDED,
            ChangeKind.CIRCUIT_ADDED,
            ChangeKind.LOAD_ADDED,
            ChangeKind.LOAD_EDITED,
            ChangeKind.LOAD_REMOVED,
            ChangeKind.CIRCUIT_REMOVED);
    ChangeLogEntry removal = log.boardHistory(board.getId()).get(5);
    assertThat(removal.circuitId()).as("the entry outlives the circuit").isEqualTo(circuit.getId());
    assertThat(removal.before()).contains("Prover");
  }

  @Test
  void aRefusedChangeLeavesNoEntry() {
    schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 3000));
    long before = log.boardHistory(board.getId()).size();
    try {
      schedule.addCircuit(
          board.getId(),
          LogFixtures.circuit(1, PhasePosition.L1, "Second on the same position", 100));
    } catch (RuntimeException expected) {
      // occupied position
    }
    assertThat(log.boardHistory(board.getId()))
        .as("entries after a refused change")
        .hasSize((int) before);
  }

  @Test
  void logCannotBeChangedOrDeletedThroughTheApi() throws Exception {
    long entryId = log.boardHistory(board.getId()).get(0).id();
    var editor = user("ed").roles("ADMIN");
    mvc.perform(get("/api/log/{id}", entryId).with(editor))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.kind").value("BOARD_ADDED"));
    mvc.perform(
            put("/api/log/{id}", entryId)
                .with(editor)
                .contentType("application/json")
                .content("{\"summary\":\"x\"}"))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(
            patch("/api/log/{id}", entryId)
                .with(editor)
                .contentType("application/json")
                .content("{}"))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(delete("/api/log/{id}", entryId).with(editor))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(delete("/api/sites/{id}/log", site.getId()).with(editor))
        .andExpect(status().isMethodNotAllowed());
    mvc.perform(
            put("/api/sites/{id}/log", site.getId())
                .with(editor)
                .contentType("application/json")
                .content("[]"))
        .andExpect(status().isMethodNotAllowed());
    assertThat(log.find(entryId).orElseThrow().summary()).as("entry untouched").contains("DB-L");
  }

  @Test
  void apiFiltersTheSiteLogByKindAndUser() throws Exception {
    schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 3000));
    mvc.perform(
            get("/api/sites/{id}/log", site.getId())
                .param("kind", "CIRCUIT_ADDED")
                .with(user("v").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.length()").value(1))
        .andExpect(jsonPath("$[0].summary").value(org.hamcrest.Matchers.containsString("Prover")));
    mvc.perform(
            get("/api/sites/{id}/log", site.getId())
                .param("username", "nobody")
                .with(user("v").roles("VIEWER")))
        .andExpect(jsonPath("$.length()").value(0));
  }

  @Test
  void historyChartValuesEqualTheDemandRecomputedAfterEachChange() {
    List<Map<Phase, Double>> expected = new ArrayList<>();
    Circuit prover =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 3000));
    expected.add(currentDemand());
    Circuit dryer =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(1, PhasePosition.L2, "Hand dryer", 1800));
    expected.add(currentDemand());
    schedule.addLoad(prover.getId(), LogFixtures.load("Proving cabinet lamp", 460), null);
    expected.add(currentDemand());
    CircuitForm moved = CircuitForm.of(schedule.circuit(dryer.getId()));
    schedule.updateCircuit(
        dryer.getId(),
        new CircuitForm(
            2,
            PhasePosition.L3,
            moved.description(),
            moved.status(),
            false,
            moved.deviceKind(),
            moved.deviceCurve(),
            moved.deviceRatingAmps(),
            moved.devicePoles(),
            moved.deviceBreakingCapacityKiloAmps(),
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            moved.version()),
        "moved to L3");
    expected.add(currentDemand());
    schedule.deleteCircuit(prover.getId(), null);
    expected.add(currentDemand());

    List<HistoryPoint> points = history.points(board.getId());
    assertThat(points).as("board added + five changes").hasSize(6);
    for (int i = 0; i < expected.size(); i++) {
      HistoryPoint point = points.get(i + 1);
      for (Phase phase : Phase.values()) {
        assertThat(point.on(phase))
            .as("%s after change %d (%s)", phase, i + 1, point.summary())
            .isCloseTo(expected.get(i).get(phase), within(1e-9));
      }
    }
    assertThat(expected.get(1).get(Phase.L2))
        .as("sanity: the hand dryer is on L2, 1800/230 A")
        .isCloseTo(1800.0 / 230.0, within(1e-9));
  }

  @Test
  void historyPageDrawsOneLinePerPhase() throws Exception {
    schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Prover", 3000));
    mvc.perform(get("/boards/{id}/history", board.getId()).with(user("v").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(content().string(org.hamcrest.Matchers.containsString("data-phase=\"L1\"")))
        .andExpect(content().string(org.hamcrest.Matchers.containsString("data-phase=\"L3\"")))
        .andExpect(content().string(org.hamcrest.Matchers.containsString("Prover")));
  }

  @Test
  void headroomMarksBoardsAboveTheSiteThreshold() throws Exception {
    // 13.8 kW on L1 of a 63 A incomer: 60 A, 95 % — above the default 80 %.
    schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Ovens", 13800));
    Board quiet = boards.create(site.getId(), LogFixtures.board("DB-Q", 63.0));
    // 2.3 kW: 10 A, 16 % of 63 A.
    schedule.addCircuit(quiet.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Lights", 2300));

    String html =
        mvc.perform(get("/sites/{id}/headroom", site.getId()).with(user("v").roles("VIEWER")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(html).containsPattern("data-board=\"DB-L\"[^>]*class=\"above-threshold\"");
    assertThat(html).doesNotContainPattern("data-board=\"DB-Q\"[^>]*class=\"above-threshold\"");
    assertThat(html).as("threshold stated").contains("80 %");
    assertThat(html).as("headroom on L1 of DB-L: 63 - 60 A").contains(">3.0<");
  }

  private Map<Phase, Double> currentDemand() {
    Map<Phase, Double> currents = new EnumMap<>(Phase.class);
    for (PhaseDemand phase : analysis.ofBoard(board.getId()).boardDemand(board.getId()).phases()) {
      currents.put(phase.phase(), phase.currentAmps());
    }
    return currents;
  }
}
