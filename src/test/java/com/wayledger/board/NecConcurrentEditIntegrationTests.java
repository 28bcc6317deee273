package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;

import com.jayway.jsonpath.JsonPath;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.support.NecPanels;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
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
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

/**
 * Two people save the same NEC record at the same moment, from the same version, on two threads:
 * the row locks let one in first, its save moves the version on, and the other is refused with 409
 * and the values saved meanwhile; the stored row is the winner's whole, the version moved once, and
 * the change log holds one entry. Sites and panels are invented.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class NecConcurrentEditIntegrationTests {

  @Autowired MockMvc mvc;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired JdbcClient jdbc;

  Board panel;
  Circuit circuit;

  @BeforeEach
  void aServicePanelWithOneBreaker() {
    Site site = NecPanels.wyeSite(sites, "Invented race building");
    panel = boards.create(site.getId(), NecPanels.panelForm("RP", 1, 24));
    circuit =
        schedule.addCircuit(panel.getId(), NecPanels.breaker(1, PhasePosition.L1, "Lights", 1200));
  }

  @Test
  void twoConduitSavesAtOnceStoreOneAndRefuseTheOtherWith409() throws Exception {
    String read = body(get("/api/circuits/{id}", circuit.getId()));
    long version = ((Number) JsonPath.read(read, "$.fields.version")).longValue();
    String pvc = withField(read, "$.fields", "cableConduit", "PVC");
    String steel = withField(read, "$.fields", "cableConduit", "STEEL");

    List<MvcResult> answers =
        race(
            () -> put("/api/circuits/{id}", circuit.getId()).content(pvc),
            () -> put("/api/circuits/{id}", circuit.getId()).content(steel));

    MvcResult winner = onlyOne(answers, 200);
    MvcResult loser = onlyOne(answers, 409);
    String won =
        (String) JsonPath.read(winner.getResponse().getContentAsString(), "$.fields.cableConduit");
    assertThat(loser.getResponse().getContentAsString())
        .as("the refused save is handed the conduit saved meanwhile")
        .contains(won);
    assertThat(
            jdbc.sql("SELECT cable_conduit FROM circuit WHERE id = ?")
                .param(circuit.getId())
                .query(String.class)
                .single())
        .as("the winner's conduit stored")
        .isEqualTo(won);
    assertThat(
            jdbc.sql("SELECT version FROM circuit WHERE id = ?")
                .param(circuit.getId())
                .query(Long.class)
                .single())
        .as("the version moved once")
        .isEqualTo(version + 1);
    assertThat(logEntries(circuit.getId(), "CIRCUIT_EDITED"))
        .as("one change recorded")
        .isEqualTo(1);
  }

  @Test
  void twoSupplySystemSavesAtOnceStoreOneAndRefuseTheOtherWith409() throws Exception {
    String read = body(get("/api/boards/{id}", panel.getId()));
    long version = ((Number) JsonPath.read(read, "$.fields.version")).longValue();
    // a panel fed from the origin may be a second service on either two-line system at 120 V
    String splitPhase = withField(read, "$.fields", "supplySystem", "SPLIT_PHASE_120_240");
    String twoOfTheWye = withField(read, "$.fields", "supplySystem", "SINGLE_PHASE_120_208");

    List<MvcResult> answers =
        race(
            () -> put("/api/boards/{id}", panel.getId()).content(splitPhase),
            () -> put("/api/boards/{id}", panel.getId()).content(twoOfTheWye));

    onlyOne(answers, 200);
    onlyOne(answers, 409);
    String afterwards = body(get("/api/boards/{id}", panel.getId()));
    String storedSystem = JsonPath.read(afterwards, "$.fields.supplySystem");
    assertThat(storedSystem).isIn("SPLIT_PHASE_120_240", "SINGLE_PHASE_120_208");
    assertThat(((Number) JsonPath.read(afterwards, "$.fields.version")).longValue())
        .as("the version moved once")
        .isEqualTo(version + 1);
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM change_log WHERE board_id = ? AND kind = 'BOARD_EDITED'")
                .param(panel.getId())
                .query(Long.class)
                .single())
        .as("one change recorded")
        .isEqualTo(1L);
  }

  private long logEntries(long circuitId, String kind) {
    return jdbc.sql("SELECT COUNT(*) FROM change_log WHERE circuit_id = ? AND kind = ?")
        .param(circuitId)
        .param(kind)
        .query(Long.class)
        .single();
  }

  private String body(org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder r)
      throws Exception {
    return mvc.perform(r.with(user("ed").roles("EDITOR")))
        .andReturn()
        .getResponse()
        .getContentAsString();
  }

  /** The JSON object at {@code path} of {@code json}, with one field set. */
  private static String withField(String json, String path, String field, String value) {
    Map<String, Object> fields = JsonPath.read(json, path);
    Map<String, Object> copy = new java.util.LinkedHashMap<>(fields);
    copy.put(field, value);
    return JsonPath.parse(copy).jsonString();
  }

  private interface Request {
    org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder build();
  }

  /** Both requests sent at the same moment from two threads; their answers. */
  private List<MvcResult> race(Request first, Request second) throws Exception {
    CountDownLatch start = new CountDownLatch(1);
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      List<Future<MvcResult>> futures = new ArrayList<>();
      for (Request request : List.of(first, second)) {
        Callable<MvcResult> call =
            () -> {
              start.await();
              return mvc.perform(
                      request
                          .build()
                          .contentType(MediaType.APPLICATION_JSON)
                          .with(user("ed").roles("EDITOR"))
                          .with(csrf()))
                  .andReturn();
            };
        futures.add(pool.submit(call));
      }
      start.countDown();
      List<MvcResult> answers = new ArrayList<>();
      for (Future<MvcResult> future : futures) {
        answers.add(future.get(60, TimeUnit.SECONDS));
      }
      return answers;
    } finally {
      pool.shutdownNow();
    }
  }

  private static MvcResult onlyOne(List<MvcResult> answers, int status) {
    List<MvcResult> with =
        answers.stream().filter(a -> a.getResponse().getStatus() == status).toList();
    assertThat(with)
        .as(
            "exactly one answer %d among %s",
            status, answers.stream().map(a -> a.getResponse().getStatus()).toList())
        .hasSize(1);
    return with.get(0);
  }
}
