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
    String reason) {
  /** When, as "2025-03-01 14:05:09 UTC". */
  public String when() {
    return java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
        .withZone(java.time.ZoneOffset.UTC)
        .format(happenedAt);
  }
}
