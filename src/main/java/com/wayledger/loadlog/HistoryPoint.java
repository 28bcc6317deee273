package com.wayledger.loadlog;

import com.wayledger.engine.Phase;
import java.time.Instant;
import java.util.Map;

/**
 * A board's demand as it stood right after one logged change.
 *
 * @param entryId the log entry
 * @param at when it happened
 * @param username who made the change
 * @param kind what kind of change
 * @param summary what happened
 * @param reason the reason given, or null
 * @param phaseCurrentsAmps demand current per line after the change, A (L1 only on a single-phase
 *     board)
 * @param removed whether the board itself was removed by this change (no figures then)
 */
public record HistoryPoint(
    long entryId,
    Instant at,
    String username,
    com.wayledger.system.ChangeKind kind,
    String summary,
    String reason,
    Map<Phase, Double> phaseCurrentsAmps,
    boolean removed) {

  /** When, as "2025-03-01 14:05:09 UTC". */
  public String when() {
    return java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
        .withZone(java.time.ZoneOffset.UTC)
        .format(at);
  }

  public Double on(Phase phase) {
    return phaseCurrentsAmps.get(phase);
  }
}
