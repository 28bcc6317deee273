package com.wayledger.engine;

import java.util.List;

/**
 * A whole installation: one supply origin and its tree of boards.
 *
 * @param id stable identifier of the stored site
 * @param name the site's name
 * @param supply the supply at the origin
 * @param defaultDiversityMethodKey method used by boards that choose none
 * @param boards every board on the site, in any order; the tree is given by {@link
 *     BoardSpec#parentBoardId()}
 * @param ruleSetKey key of the rule set the site is checked against (engine.rules.RuleSets); "IEC"
 *     when null
 */
public record SiteSpec(
    long id,
    String name,
    SupplySpec supply,
    String defaultDiversityMethodKey,
    List<BoardSpec> boards,
    String ruleSetKey) {

  /** Key of the rule set every site had before rule sets could be chosen. */
  public static final String DEFAULT_RULE_SET_KEY = "IEC";

  public SiteSpec {
    boards = List.copyOf(boards);
    if (ruleSetKey == null) {
      ruleSetKey = DEFAULT_RULE_SET_KEY;
    }
  }

  /** A site under the IEC rule set: the argument list from before rule sets. */
  public SiteSpec(
      long id,
      String name,
      SupplySpec supply,
      String defaultDiversityMethodKey,
      List<BoardSpec> boards) {
    this(id, name, supply, defaultDiversityMethodKey, boards, DEFAULT_RULE_SET_KEY);
  }

  /** The spaces of a board of this site when it is laid out as a panelboard, else null. */
  public PanelSpaces panelSpacesOf(BoardSpec board) {
    return PanelSpaces.ofBoard(
        ruleSetKey, systemOf(board).lineCount(board.phases()), board.wayCount());
  }

  /** The supply system a board of this site is on: its own when it records one, else the site's. */
  public SupplySystem systemOf(BoardSpec board) {
    return board.systemOn(supply.system());
  }

  /** The same site holding other boards. */
  public SiteSpec withBoards(List<BoardSpec> other) {
    return new SiteSpec(id, name, supply, defaultDiversityMethodKey, other, ruleSetKey);
  }
}
