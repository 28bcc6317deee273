package com.wayledger.loadlog;

import com.wayledger.engine.Phase;
import java.util.Map;

/**
 * How much room a board has left, for the site overview.
 *
 * @param boardId the board
 * @param reference its name
 * @param depth its depth in the board tree (0 for a board fed from the origin)
 * @param incomerRatingAmps the current its incomer trips at: Ir of a moulded-case breaker with its
 *     setting recorded, In otherwise; null when not recorded
 * @param headroomAmps incomer rating minus the demand current, per line, A; empty when the rating
 *     is unknown
 * @param loadingPercent largest line current ÷ incomer rating, %; null when not assessed
 * @param aboveThreshold whether the loading is at or above the site's threshold
 */
public record Headroom(
    long boardId,
    String reference,
    int depth,
    Double incomerRatingAmps,
    Map<Phase, Double> headroomAmps,
    Double loadingPercent,
    boolean aboveThreshold) {

  public Double on(Phase phase) {
    return headroomAmps.get(phase);
  }
}
