package com.wayledger.loadlog;

import com.wayledger.system.ChangeKind;
import java.time.Instant;

/**
 * One stored entry of the change log. Never changed once written.
 *
 * @param id position in the log (ascending with time)
 * @param siteId the site
 * @param boardId the board, or null for a site change
 * @param circuitId the circuit, or null for a board or site change
 * @param happenedAt when the change was stored
 * @param username who made it ("system" for changes made without a signed-in user)
 * @param kind what happened
 * @param summary one line for a person
 * @param before JSON snapshot before the change; null when added
 * @param after JSON snapshot after the change; null when removed
 * @param reason the reason or work order given; null when none
 * @param effectiveOn the day the change took effect on site when it was recorded later
 *     (back-dated); null when it took effect when recorded
 */
public record ChangeLogEntry(
    long id,
    long siteId,
    Long boardId,
    Long circuitId,
    Instant happenedAt,
    String username,
    ChangeKind kind,
    String summary,
    String before,
    String after,
    String reason,
    java.time.LocalDate effectiveOn) {

  /** An entry that took effect when it was recorded. */
  public ChangeLogEntry(
      long id,
      long siteId,
      Long boardId,
      Long circuitId,
      Instant happenedAt,
      String username,
      ChangeKind kind,
      String summary,
      String before,
      String after,
      String reason) {
    this(
        id,
        siteId,
        boardId,
        circuitId,
        happenedAt,
        username,
        kind,
        summary,
        before,
        after,
        reason,
        null);
  }

  /** Whether the change took effect before it was recorded. */
  public boolean isBackDated() {
    return effectiveOn != null;
  }

  /**
   * When the change took effect: the start of its effective day (UTC) when back-dated, else when it
   * was recorded. The board's history is drawn on this time.
   */
  public Instant effectiveAt() {
    return effectiveOn == null
        ? happenedAt
        : effectiveOn.atStartOfDay(java.time.ZoneOffset.UTC).toInstant();
  }

  /** When, as "2025-03-01 14:05:09 UTC", or the effective day "2021-03-09" when back-dated. */
  public String when() {
    return effectiveOn != null ? effectiveOn.toString() : recordedWhen();
  }

  /** When the entry was recorded, as "2025-03-01 14:05:09 UTC". */
  public String recordedWhen() {
    return java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
        .withZone(java.time.ZoneOffset.UTC)
        .format(happenedAt);
  }
}
