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
 * @param lineNames the names people use for its lines L1, L2, L3 on its supply: A, B, C on a North
 *     American one, else L1, L2, L3 (from {@code Board.lineName}); empty means L1, L2, L3
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
    List<CircuitEntry> circuits,
    List<String> lineNames) {

  public BoardEntry {
    circuits = List.copyOf(circuits);
    lineNames = lineNames == null ? List.of() : List.copyOf(lineNames);
  }

  /** A board whose lines are named L1, L2, L3 (the argument list from before line names). */
  public BoardEntry(
      long id,
      String reference,
      String location,
      int phases,
      int wayCount,
      String parentReference,
      String incomerLabel,
      int depth,
      List<CircuitEntry> circuits) {
    this(
        id,
        reference,
        location,
        phases,
        wayCount,
        parentReference,
        incomerLabel,
        depth,
        circuits,
        List.of());
  }

  /** A line's name on this board: "A" on a North American supply, "L1" otherwise. */
  public String lineName(com.wayledger.engine.Phase line) {
    return line.ordinal() < lineNames.size() ? lineNames.get(line.ordinal()) : line.name();
  }

  public boolean isThreePhase() {
    return phases == 3;
  }
}
