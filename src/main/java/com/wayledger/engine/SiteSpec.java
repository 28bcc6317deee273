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
 */
public record SiteSpec(
    long id,
    String name,
    SupplySpec supply,
    String defaultDiversityMethodKey,
    List<BoardSpec> boards) {

  public SiteSpec {
    boards = List.copyOf(boards);
  }
}
