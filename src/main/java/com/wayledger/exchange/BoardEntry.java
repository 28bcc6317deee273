package com.wayledger.exchange;

import java.util.List;

/**
 * One board of a site as exported.
 *
 * @param id the board's id
 * @param reference its name on site
 * @param location where it is; may be null
 * @param phases 1 or 3
 * @param wayCount number of ways
 * @param parentReference the board feeding it; null when fed from the origin
 * @param incomerLabel its incomer device as short text; empty when none
 * @param depth depth in the site's board tree (0 at the origin)
 * @param circuits its circuits in way order
 */
public record BoardEntry(
    long id,
    String reference,
    String location,
    int phases,
    int wayCount,
    String parentReference,
    String incomerLabel,
    int depth,
    List<CircuitEntry> circuits) {

  public BoardEntry {
    circuits = List.copyOf(circuits);
  }

  public boolean isThreePhase() {
    return phases == 3;
  }
}
