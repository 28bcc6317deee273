package com.wayledger.engine.demand;

import java.util.List;

/**
 * Demand of every board of a site, evaluated children first so each sub-board's demand is a load on
 * the way that feeds it.
 *
 * @param siteId the site's id
 * @param siteName its name
 * @param settings the settings used
 * @param nominalVoltageVolts U0 used, V
 * @param boards each board's figures, children before parents
 * @param problems faults in the board tree (cycles, unknown sub-boards, boards fed twice)
 */
public record SiteDemand(
    long siteId,
    String siteName,
    DemandSettings settings,
    double nominalVoltageVolts,
    List<BoardDemand> boards,
    List<String> problems) {

  public SiteDemand {
    boards = List.copyOf(boards);
    problems = List.copyOf(problems);
  }

  /** The figures of a board; null when the site has no such board. */
  public BoardDemand board(long boardId) {
    for (BoardDemand board : boards) {
      if (board.boardId() == boardId) {
        return board;
      }
    }
    return null;
  }
}
