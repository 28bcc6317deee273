package com.wayledger.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.balance.BalancePlans.Basis;
import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.ScheduleService;
import com.wayledger.site.SiteService;
import com.wayledger.system.StaleEditException;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;

/** Balancing the demo's lopsided bakery board for real: apply, check the limit, undo. */
@SpringBootTest
@ActiveProfiles({"test", "demo"})
@DirtiesContext
class BalancingIntegrationTests {

  @Autowired BalanceService balancing;
  @Autowired ScheduleService schedule;
  @Autowired BoardService boards;
  @Autowired SiteService sites;
  @Autowired AnalysisService analysis;
  @Autowired org.springframework.jdbc.core.simple.JdbcClient jdbc;
  @Autowired com.wayledger.loadlog.HistoryService history;

  @Test
  void applyingTheOptimalPlanBringsTheBakeryWithinItsLimitAndUndoRestoresEveryPosition() {
    Board bakery = bakery();
    Map<Long, String> before = positions(bakery.getId());
    BalancePlans plans = balancing.plans(bakery.getId(), Basis.DEMAND, null);
    assertThat(plans.before().isUnbalancedBeyondLimit()).as("lopsided to begin with").isTrue();
    assertThat(plans.placements()).isNotEmpty();

    schedule.rearrange(bakery.getId(), schedule.scheduleToken(bakery.getId()), plans.placements());

    var after = analysis.ofBoard(bakery.getId()).boardDemand(bakery.getId());
    assertThat(after.unbalancePercent())
        .as("unbalance after applying the plan, recomputed from the stored board")
        .isLessThan(after.unbalanceLimitPercent());
    assertThat(after.demandWatts())
        .as("moving circuits does not change the demand")
        .isCloseTo(plans.before().demandWatts(), org.assertj.core.api.Assertions.within(1e-6));

    schedule.rearrange(bakery.getId(), schedule.scheduleToken(bakery.getId()), plans.undo());
    assertThat(positions(bakery.getId())).as("undo puts every circuit back").isEqualTo(before);
  }

  @Test
  void aPlanShownBeforeSomeoneElseChangedTheBoardIsRefused() {
    Board bakery = bakery();
    String shownVersion = schedule.scheduleToken(bakery.getId());
    BalancePlans plans = balancing.plans(bakery.getId(), Basis.DEMAND, 2);
    schedule.rearrange(bakery.getId(), shownVersion, plans.placements());
    assertThatThrownBy(() -> schedule.rearrange(bakery.getId(), shownVersion, plans.undo()))
        .isInstanceOf(StaleEditException.class);
  }

  @Test
  void applyingAPlanIsOneEntryInTheBoardsHistoryWithItsReason() {
    Board bakery = bakery();
    BalancePlans plans = balancing.plans(bakery.getId(), Basis.DEMAND, 1);
    long entriesBefore = logEntries(bakery.getId());
    schedule.rearrange(
        bakery.getId(), schedule.scheduleToken(bakery.getId()), plans.placements(), "WO-77");
    assertThat(logEntries(bakery.getId()))
        .as("one log row for the whole plan")
        .isEqualTo(entriesBefore + 1);
    String kind =
        jdbc.sql("SELECT kind FROM change_log WHERE board_id = ? AND reason = 'WO-77'")
            .param(bakery.getId())
            .query(String.class)
            .single();
    assertThat(kind).isEqualTo("BALANCING_APPLIED");
  }

  @Test
  void theDemandHistoryReplaysABalancingPlanToTheBoardAsItNowStands() {
    Board bakery = bakery();
    BalancePlans plans = balancing.plans(bakery.getId(), Basis.DEMAND, null);
    schedule.rearrange(
        bakery.getId(), schedule.scheduleToken(bakery.getId()), plans.placements(), "replay check");
    var points = history.points(bakery.getId());
    var last = points.get(points.size() - 1);
    var now = analysis.ofBoard(bakery.getId()).boardDemand(bakery.getId());
    assertThat(last.kind().name()).isEqualTo("BALANCING_APPLIED");
    for (var phase : now.phases()) {
      assertThat(last.on(phase.phase()))
          .as("replayed current on %s", phase.phase())
          .isCloseTo(phase.currentAmps(), org.assertj.core.api.Assertions.within(1e-6));
    }
  }

  private long logEntries(long boardId) {
    return jdbc.sql("SELECT COUNT(*) FROM change_log WHERE board_id = ?")
        .param(boardId)
        .query(Long.class)
        .single();
  }

  private Board bakery() {
    long siteId = sites.all().get(0).getId();
    return boards.onSite(siteId).stream()
        .filter(b -> b.getReference().equals("KB1"))
        .findFirst()
        .orElseThrow();
  }

  private Map<Long, String> positions(long boardId) {
    return jdbc
        .sql("SELECT id, way_number, position FROM circuit WHERE board_id = ?")
        .param(boardId)
        .query(
            (row, n) ->
                Map.entry(
                    row.getLong("id"), row.getInt("way_number") + " " + row.getString("position")))
        .list()
        .stream()
        .collect(Collectors.toMap(Map.Entry::getKey, Map.Entry::getValue));
  }
}
