package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The change log's hash chain on H2, where the application stamps and chains each entry itself (on
 * PostgreSQL the trigger does: PostgresLogGuardIntegrationTests). H2 has no trigger to stop the
 * UPDATE and DELETE below; the point here is that the check finds them, at the right entry.
 */
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class ChangeLogChainIntegrationTests {

  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired ChangeLog log;
  @Autowired JdbcClient jdbc;
  @Autowired MockMvc mvc;

  @Test
  void entriesOfASiteFormOneUnbrokenChain() {
    long siteId = siteWithFourEntries();
    LogVerification verification = log.verify(siteId);
    assertThat(verification.intact()).isTrue();
    assertThat(verification.entriesChecked()).as("site, board, circuit, load").isEqualTo(4);
    assertThat(
            jdbc.sql("SELECT site_seq FROM change_log WHERE site_id = ? ORDER BY id")
                .param(siteId)
                .query(Long.class)
                .list())
        .containsExactly(1L, 2L, 3L, 4L);
  }

  @Test
  void aRewrittenEntryIsReportedAsAlteredAtThatEntry() {
    long siteId = siteWithFourEntries();
    long third = entry(siteId, 3);
    jdbc.sql("UPDATE change_log SET summary = 'nothing happened' WHERE id = ?")
        .param(third)
        .update();
    LogVerification verification = log.verify(siteId);
    assertThat(verification.intact()).isFalse();
    assertThat(verification.brokenAtEntryId()).isEqualTo(third);
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.ALTERED);
  }

  @Test
  void aRemovedEntryIsReportedAtTheOneAfterIt() {
    long siteId = siteWithFourEntries();
    long third = entry(siteId, 3);
    jdbc.sql("DELETE FROM change_log WHERE id = ?").param(entry(siteId, 2)).update();
    LogVerification verification = log.verify(siteId);
    assertThat(verification.brokenAtEntryId()).isEqualTo(third);
    assertThat(verification.brokenAtSequence()).isEqualTo(3L);
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.GAP);
  }

  @Test
  void entriesSwappedBetweenSitesBreakTheLink() {
    long siteId = siteWithFourEntries();
    long other = siteWithFourEntries();
    // Move the other site's second entry into this chain's place 2, after removing ours.
    long ours = entry(siteId, 2);
    jdbc.sql("DELETE FROM change_log WHERE id = ?").param(ours).update();
    jdbc.sql("UPDATE change_log SET site_id = ? WHERE id = ?")
        .params(siteId, entry(other, 2))
        .update();
    LogVerification verification = log.verify(siteId);
    assertThat(verification.intact()).isFalse();
    assertThat(verification.brokenAtSequence()).isEqualTo(2L);
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.LINK);
  }

  @Test
  void thePageAndTheApiSayWhereTheChainBreaks() throws Exception {
    long siteId = siteWithFourEntries();
    long third = entry(siteId, 3);
    mvc.perform(get("/api/sites/{id}/log/verify", siteId).with(user("vera").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.intact").value(true))
        .andExpect(jsonPath("$.entriesChecked").value(4));
    jdbc.sql("UPDATE change_log SET reason = 'back-filled' WHERE id = ?").param(third).update();

    mvc.perform(get("/api/sites/{id}/log/verify", siteId).with(user("vera").roles("VIEWER")))
        .andExpect(status().isOk())
        .andExpect(jsonPath("$.intact").value(false))
        .andExpect(jsonPath("$.brokenAtEntryId").value(third))
        .andExpect(jsonPath("$.problem").value("ALTERED"));
    String page =
        mvc.perform(get("/sites/{id}/log/verify", siteId).with(user("vera").roles("VIEWER")))
            .andExpect(status().isOk())
            .andReturn()
            .getResponse()
            .getContentAsString();
    assertThat(page)
        .contains("id=\"verify-result\"")
        .contains("tampered with at entry " + third)
        .contains("no longer matches its hash");
  }

  private long siteWithFourEntries() {
    Site site = sites.create(LogFixtures.site());
    Board board = boards.create(site.getId(), LogFixtures.board("DB-H", 63.0));
    var circuit =
        schedule.addCircuit(
            board.getId(), LogFixtures.circuit(1, PhasePosition.L1, "Küche “oven”", 2000));
    schedule.addLoad(circuit.getId(), LogFixtures.load("Lamp ½", 60));
    return site.getId();
  }

  private long entry(long siteId, long seq) {
    return jdbc.sql("SELECT id FROM change_log WHERE site_id = ? AND site_seq = ?")
        .params(siteId, seq)
        .query(Long.class)
        .single();
  }
}
