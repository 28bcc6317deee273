package com.wayledger.engine.protection;

import com.wayledger.engine.PositionWords;
import com.wayledger.engine.protection.result.Finding;
import java.util.ArrayList;
import java.util.List;

/**
 * Every protection finding of a site, with the settings they assumed.
 *
 * @param settings the assumptions used, echoed for display and export
 * @param siteFindings findings about the origin (supply fuse)
 * @param boards one entry per board, in the site's order
 */
public record SiteFindings(
    ProtectionSettings settings, List<Finding> siteFindings, List<BoardFindings> boards) {

  public SiteFindings {
    siteFindings = List.copyOf(siteFindings);
    boards = List.copyOf(boards);
  }

  /**
   * The words of the findings about the origin: the site's nouns (every board of a site shares its
   * rule set) on no board's layout; the base words on a site without boards.
   */
  public PositionWords originWords() {
    if (boards.isEmpty()) {
      return PositionWords.WAYS;
    }
    PositionWords first = boards.get(0).words();
    return new PositionWords(false, first.system(), first.usTrade());
  }

  /** All findings, site first, then each board's own and its circuits'. */
  public List<Finding> allFindings() {
    List<Finding> all = new ArrayList<>(siteFindings);
    for (BoardFindings b : boards) {
      all.addAll(b.findings());
      b.circuits().forEach(c -> all.addAll(c.findings()));
    }
    return all;
  }
}
