package com.wayledger.loadlog;

import com.wayledger.system.ScheduleChanged;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.locks.ReentrantLock;
import javax.sql.DataSource;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionSynchronization;
import org.springframework.transaction.support.TransactionSynchronizationManager;
import tools.jackson.databind.json.JsonMapper;

/**
 * Writes one change-log row per {@link ScheduleChanged} event. The listener is synchronous, so the
 * row is written in the transaction of the change: if either fails, neither is stored. This class
 * only ever INSERTs; nothing in the application updates or deletes a log row.
 *
 * <p>On PostgreSQL the database stamps the row (time, user, database role, place in the site's
 * chain, hashes) in a trigger; the application only names its signed-in user in the
 * transaction-local setting {@code wayledger.username} that the trigger reads. On H2, which cannot
 * run that trigger, this class stamps the row itself with the same {@link LogChain} rules, one
 * entry of a site at a time (an embedded H2 database serves one application process).
 */
@Component
class ChangeRecorder {

  /** Who a change is attributed to when no user is signed in (start-up data, scheduled jobs). */
  static final String NO_USER = "system";

  static final int REASON_MAX = 200;
  static final int SUMMARY_MAX = 500;

  private final JdbcClient jdbc;
  private final JsonMapper json;
  private final boolean stampedByDatabase;
  private final Map<Long, ReentrantLock> siteLocks = new ConcurrentHashMap<>();
  private volatile String databaseUser;

  ChangeRecorder(JdbcClient jdbc, DataSource dataSource) {
    this.jdbc = jdbc;
    this.json = Snapshots.MAPPER;
    this.stampedByDatabase = isPostgres(dataSource);
  }

  @EventListener
  void record(ScheduleChanged change) {
    String user = currentUser();
    String summary = clip(change.summary(), SUMMARY_MAX);
    String before = change.before() == null ? null : json.writeValueAsString(change.before());
    String after = change.after() == null ? null : json.writeValueAsString(change.after());
    String reason = reason(change.reason());
    java.time.LocalDate effectiveOn = com.wayledger.system.EffectiveDate.current();
    if (effectiveOn != null
        && effectiveOn.isAfter(java.time.LocalDate.now(java.time.ZoneOffset.UTC))) {
      throw new IllegalArgumentException(
          "effective day " + effectiveOn + " is after the day of recording");
    }
    if (stampedByDatabase) {
      jdbc.sql("SELECT set_config('wayledger.username', ?, true)")
          .param(user)
          .query(String.class)
          .single();
      jdbc.sql(
              "INSERT INTO change_log (site_id, board_id, circuit_id, username, kind, summary,"
                  + " before_snapshot, after_snapshot, reason, effective_on)"
                  + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
          .params(
              change.siteId(),
              change.boardId(),
              change.circuitId(),
              user,
              change.kind().name(),
              summary,
              before,
              after,
              reason,
              effectiveOn == null ? null : java.sql.Date.valueOf(effectiveOn))
          .update();
      return;
    }
    ReentrantLock releaseAfterInsert = holdSiteUntilCommit(change.siteId());
    try {
      insertChained(change, user, summary, before, after, reason, effectiveOn);
    } finally {
      if (releaseAfterInsert != null) {
        releaseAfterInsert.unlock();
      }
    }
  }

  private void insertChained(
      ScheduleChanged change,
      String user,
      String summary,
      String before,
      String after,
      String reason,
      java.time.LocalDate effectiveOn) {
    record Last(long seq, String hash) {}
    Last last =
        jdbc.sql(
                "SELECT site_seq, entry_hash FROM change_log WHERE site_id = ?"
                    + " ORDER BY site_seq DESC NULLS LAST LIMIT 1")
            .param(change.siteId())
            .query((rs, row) -> new Last(rs.getLong(1), rs.getString(2)))
            .optional()
            .orElse(new Last(0, null));
    LogChain.Fields fields =
        new LogChain.Fields(
            last.seq() + 1,
            change.siteId(),
            change.boardId(),
            change.circuitId(),
            Instant.now().truncatedTo(ChronoUnit.MICROS),
            user,
            databaseUser(),
            change.kind().name(),
            summary,
            before,
            after,
            reason,
            last.hash(),
            effectiveOn);
    jdbc.sql(
            "INSERT INTO change_log (site_id, board_id, circuit_id, happened_at, username, db_user,"
                + " kind, summary, before_snapshot, after_snapshot, reason, site_seq, previous_hash,"
                + " entry_hash, effective_on) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
        .params(
            fields.siteId(),
            fields.boardId(),
            fields.circuitId(),
            Timestamp.from(fields.happenedAt()),
            fields.username(),
            fields.dbUser(),
            fields.kind(),
            fields.summary(),
            fields.before(),
            fields.after(),
            fields.reason(),
            fields.siteSeq(),
            fields.previousHash(),
            fields.hash(),
            effectiveOn == null ? null : java.sql.Date.valueOf(effectiveOn))
        .update();
  }

  /**
   * One entry of a site at a time until the transaction ends, so that the next entry sees this one
   * as the end of the chain. Returns the lock when there is no transaction (the insert commits at
   * once, so the caller releases it straight after), else null.
   */
  private ReentrantLock holdSiteUntilCommit(long siteId) {
    ReentrantLock lock = siteLocks.computeIfAbsent(siteId, id -> new ReentrantLock());
    if (lock.isHeldByCurrentThread()) {
      return null;
    }
    lock.lock();
    if (!TransactionSynchronizationManager.isSynchronizationActive()) {
      return lock;
    }
    TransactionSynchronizationManager.registerSynchronization(
        new TransactionSynchronization() {
          @Override
          public void afterCompletion(int status) {
            lock.unlock();
          }
        });
    return null;
  }

  private String databaseUser() {
    if (databaseUser == null) {
      databaseUser = jdbc.sql("SELECT CURRENT_USER").query(String.class).single();
    }
    return databaseUser;
  }

  static String currentUser() {
    Authentication who = SecurityContextHolder.getContext().getAuthentication();
    return who == null || who.getName() == null || !who.isAuthenticated() ? NO_USER : who.getName();
  }

  private static String reason(String reason) {
    return reason == null || reason.isBlank() ? null : clip(reason.strip(), REASON_MAX);
  }

  private static String clip(String text, int max) {
    return text.length() <= max ? text : text.substring(0, max - 1) + "…";
  }

  static boolean isPostgres(DataSource dataSource) {
    try (Connection connection = dataSource.getConnection()) {
      return connection
          .getMetaData()
          .getDatabaseProductName()
          .toLowerCase(Locale.ROOT)
          .contains("postgresql");
    } catch (SQLException unreadable) {
      return false;
    }
  }
}
