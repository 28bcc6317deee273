package com.wayledger.loadlog;

import com.wayledger.system.ScheduleChanged;
import java.sql.Timestamp;
import java.time.Instant;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.stereotype.Component;
import tools.jackson.databind.json.JsonMapper;

/**
 * Writes one change-log row per {@link ScheduleChanged} event. The listener is synchronous, so the
 * row is written in the transaction of the change: if either fails, neither is stored. This class
 * only ever INSERTs; nothing in the application updates or deletes a log row.
 */
@Component
class ChangeRecorder {

  /** Who a change is attributed to when no user is signed in (start-up data, scheduled jobs). */
  static final String NO_USER = "system";

  static final int REASON_MAX = 200;
  static final int SUMMARY_MAX = 500;

  private final JdbcClient jdbc;
  private final JsonMapper json;

  ChangeRecorder(JdbcClient jdbc) {
    this.jdbc = jdbc;
    this.json = Snapshots.MAPPER;
  }

  @EventListener
  void record(ScheduleChanged change) {
    jdbc.sql(
            "INSERT INTO change_log (site_id, board_id, circuit_id, happened_at, username, kind, summary,"
                + " before_snapshot, after_snapshot, reason) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
        .params(
            change.siteId(),
            change.boardId(),
            change.circuitId(),
            Timestamp.from(Instant.now()),
            currentUser(),
            change.kind().name(),
            clip(change.summary(), SUMMARY_MAX),
            change.before() == null ? null : json.writeValueAsString(change.before()),
            change.after() == null ? null : json.writeValueAsString(change.after()),
            reason(change.reason()))
        .update();
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
}
