package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.protection.result.Verdict;
import java.util.Map;

/**
 * One board's line in a site's tree: its demand, how loaded its incomer is, its busiest line and
 * how many problems the checks found.
 *
 * @param demandKilowatts active demand after diversity, kW
 * @param loadingPercent largest line current as a percentage of the incomer rating; null when
 *     unknown
 * @param worstPhase the busiest line; null when the board carries nothing
 * @param headroom a word for the headroom left
 * @param problems number of problem findings per verdict
 */
public record BoardHeadline(
    double demandKilowatts,
    Double loadingPercent,
    Phase worstPhase,
    Headroom headroom,
    Map<Verdict, Long> problems) {

  /** Loading above which a board is shown as having little headroom, % of the incomer rating. */
  public static final double DEFAULT_LOW_HEADROOM_PERCENT = 80.0;

  public enum Headroom {
    OVERLOADED,
    LOW,
    AMPLE,
    UNKNOWN
  }

  static BoardHeadline of(BoardDemand demand, Phase worstPhase, Map<Verdict, Long> problems) {
    Double loading = demand.incomer() == null ? null : demand.incomer().loadingPercent();
    Headroom headroom;
    if (loading == null) {
      headroom = Headroom.UNKNOWN;
    } else if (loading > 100.0) {
      headroom = Headroom.OVERLOADED;
    } else if (loading > DEFAULT_LOW_HEADROOM_PERCENT) {
      headroom = Headroom.LOW;
    } else {
      headroom = Headroom.AMPLE;
    }
    return new BoardHeadline(
        demand.demandWatts() / 1000.0, loading, worstPhase, headroom, problems);
  }
}
