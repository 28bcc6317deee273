package com.wayledger.loadlog;

import com.wayledger.engine.Phase;
import java.time.Instant;
import java.util.Map;

/**
 * A board's demand as it stood right after one logged change.
 *
 * @param entryId the log entry
 * @param at when it happened
 * @param summary what happened
 * @param phaseCurrentsAmps demand current per line after the change, A (L1 only on a single-phase board)
 * @param removed whether the board itself was removed by this change (no figures then)
 */
public record HistoryPoint(
    long entryId, Instant at, String summary, Map<Phase, Double> phaseCurrentsAmps, boolean removed) {

  public Double on(Phase phase) {
    return phaseCurrentsAmps.get(phase);
  }
}
