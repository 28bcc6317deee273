package com.wayledger.loadlog;

import com.wayledger.engine.Phase;
import java.time.Instant;
import java.util.Map;

/**
 * A board's demand as it stood right after one logged change.
 *
 * @param entryId the log entry
 * @param at when it took effect (the effective day of a back-dated entry, else when recorded)
 * @param username who made the change
 * @param kind what kind of change
 * @param summary what happened
 * @param reason the reason given, or null
 * @param phaseCurrentsAmps demand current per line after the change, A (L1 only on a single-phase
 *     board)
 * @param removed whether the board itself was removed by this change (no figures then)
 * @param backDated whether the entry was recorded after the day it took effect
 */
public record HistoryPoint(
    long entryId,
    Instant at,
    String username,
    com.wayledger.system.ChangeKind kind,
    String summary,
    String reason,
    Map<Phase, Double> phaseCurrentsAmps,
    boolean removed,
    boolean backDated) {

  /** When, as "2025-03-01 14:05:09 UTC", or as the day "2021-03-09" when back-dated. */
  public String when() {
    return java.time.format.DateTimeFormatter.ofPattern(
            backDated ? "yyyy-MM-dd" : "yyyy-MM-dd HH:mm:ss 'UTC'")
        .withZone(java.time.ZoneOffset.UTC)
        .format(at);
  }

  public Double on(Phase phase) {
    return phaseCurrentsAmps.get(phase);
  }
}
