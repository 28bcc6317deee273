package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.ScheduleService;
import com.wayledger.diversity.MethodLibrary;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.SiteGenerations;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * A site's analysis is computed once per change, not once per read: every change recorded in the
 * change log moves the site's data generation on in the change's transaction, and reads at the same
 * generation reuse the kept analysis. The engine runs are counted by the analysis service.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class KeptAnalysisIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired AnalysisService analysis;
  @Autowired SiteGenerations generations;
  @Autowired MethodLibrary methods;
  @Autowired JdbcClient jdbc;

  Site site;
  Board board;
  Circuit lights;

  @BeforeEach
  void siteWithOneBoardAndCircuit() {
    site = sites.create(LogFixtures.site());
    board = boards.create(site.getId(), LogFixtures.board("DB-K", 63.0));
    lights =
        schedule.addCircuit(board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Lights", 500));
  }

  @Test
  void readingTheBoardPageAgainWithoutAChangeRunsNoAnalysis() throws Exception {
    readBoardPage();
    long afterFirstRead = analysis.siteAnalysisRuns();

    readBoardPage();
    readBoardPage();
    mvc.perform(get("/sites/{id}", site.getId()).with(user("viewer").roles("VIEWER")))
        .andExpect(status().isOk());
    mvc.perform(get("/api/boards/{id}/demand", board.getId()).with(user("viewer").roles("VIEWER")))
        .andExpect(status().isOk());

    assertThat(analysis.siteAnalysisRuns())
        .as("engine runs after four more reads of an unchanged site")
        .isEqualTo(afterFirstRead);
  }

  @Test
  void aChangeMovesTheGenerationOnceAndTheNextReadRecomputesOnceWithTheChange() throws Exception {
    readBoardPage();
    long generationBefore = generations.current(site.getId());
    long runsBefore = analysis.siteAnalysisRuns();

    schedule.addCircuit(board.getId(), LogFixtures.circuit(2, PhasePosition.L2, "Heater", 2000));

    assertThat(generations.current(site.getId())).isEqualTo(generationBefore + 1);
    // 500 W + 2000 W at unity power factor: connected load is their sum (no diversity method set)
    assertThat(analysis.ofSite(site.getId()).boardDemand(board.getId()).connectedWatts())
        .isEqualTo(2500.0);
    readBoardPage();
    assertThat(analysis.siteAnalysisRuns())
        .as("one engine run for the change, none for the page read after it")
        .isEqualTo(runsBefore + 1);
  }

  @Test
  void aRefusedChangeMovesNothingAndKeepsTheAnalysis() throws Exception {
    readBoardPage();
    long generationBefore = generations.current(site.getId());
    long runsBefore = analysis.siteAnalysisRuns();

    // way 99 is beyond the six-way board: refused, nothing stored
    assertThatThrownBy(
            () ->
                schedule.addCircuit(
                    board.getId(), LogFixtures.circuit(99, PhasePosition.L1, "Nowhere", 100)))
        .isInstanceOf(RuntimeException.class);
    readBoardPage();

    assertThat(generations.current(site.getId())).isEqualTo(generationBefore);
    assertThat(analysis.siteAnalysisRuns()).isEqualTo(runsBefore);
  }

  @Test
  void aChangeCommittedByAnotherInstanceIsSeenThroughTheSharedGeneration() {
    assertThat(analysis.ofSite(site.getId()).boardDemand(board.getId()).connectedWatts())
        .isEqualTo(500.0);

    // Another instance sharing the database: its change and its generation step arrive together.
    jdbc.sql("UPDATE load_item SET rating_value = 800 WHERE circuit_id = ?")
        .param(lights.getId())
        .update();
    jdbc.sql("UPDATE site SET data_generation = data_generation + 1 WHERE id = ?")
        .param(site.getId())
        .update();

    assertThat(analysis.ofSite(site.getId()).boardDemand(board.getId()).connectedWatts())
        .isEqualTo(800.0);
  }

  @Test
  void concurrentChangesToOneSiteAreAllCountedAndNoneIsRefused() throws Exception {
    // Each change is to another board, so no board version conflicts; they share only the site row.
    List<Long> boardIds = new ArrayList<>();
    for (String reference : List.of("DB-K2", "DB-K3", "DB-K4", "DB-K5")) {
      boardIds.add(boards.create(site.getId(), LogFixtures.board(reference, 63.0)).getId());
    }
    long generationBefore = generations.current(site.getId());
    ExecutorService pool = Executors.newFixedThreadPool(boardIds.size());
    CountDownLatch start = new CountDownLatch(1);
    List<Future<Circuit>> added = new ArrayList<>();
    try {
      for (long boardId : boardIds) {
        added.add(
            pool.submit(
                () -> {
                  start.await();
                  return schedule.addCircuit(
                      boardId, LogFixtures.circuit(3, PhasePosition.L3, "Socket", 100));
                }));
      }
      start.countDown();
      for (Future<Circuit> each : added) {
        assertThat(each.get(30, TimeUnit.SECONDS).getId()).isNotNull();
      }
    } finally {
      pool.shutdownNow();
    }

    assertThat(generations.current(site.getId())).isEqualTo(generationBefore + boardIds.size());
  }

  @Test
  void editingADiversityMethodMovesEverySitesGeneration() {
    Site other = sites.create(LogFixtures.site());
    methods.copy("uk-household", "kept-test-" + System.nanoTime() % 100000, "Kept test", "editor");
    String key =
        methods.entries().stream()
            .filter(entry -> entry.method().key().startsWith("kept-test-"))
            .reduce((first, last) -> last)
            .orElseThrow()
            .method()
            .key();
    long thisBefore = generations.current(site.getId());
    long otherBefore = generations.current(other.getId());

    Map<String, String> problems =
        methods.update(key, methods.entry(key).version(), "Kept test renamed", Map.of(), "editor");

    assertThat(problems).isEmpty();
    assertThat(generations.current(site.getId())).isEqualTo(thisBefore + 1);
    assertThat(generations.current(other.getId())).isEqualTo(otherBefore + 1);
  }

  private void readBoardPage() throws Exception {
    mvc.perform(get("/boards/{id}", board.getId()).with(user("viewer").roles("VIEWER")))
        .andExpect(status().isOk());
  }
}
