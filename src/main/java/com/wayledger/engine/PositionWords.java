package com.wayledger.engine;

/**
 * How a board names a circuit's position in words, as its page does: "way 9 L2" on a board of ways,
 * "space 5 A" or "space 3 A–B" on a panelboard (a North American board under the NEC rule set,
 * whose way number is the circuit's first space). Engine texts about a board (not-assessed notes,
 * balancing moves, loading findings) take their nouns from here too, so that a board under the NEC
 * rule set reads "panelboard", "subpanel" and "space" and a board under the IEC set "board",
 * "sub-board" and "way", on every surface that shows the text (docs/wording.md).
 *
 * @param panelboard whether the board is laid out in spaces
 * @param system the board's supply system, which names its lines (L1…L3 or A…C)
 * @param usTrade whether the board is under the NEC rule set, whose trade says panelboard and
 *     subpanel for board and sub-board (a single-line NEC board keeps its way layout but not the
 *     British nouns)
 */
public record PositionWords(boolean panelboard, SupplySystem system, boolean usTrade) {

  /** The words of a board of ways on the IEC supply: "way 9 L2". */
  public static final PositionWords WAYS = new PositionWords(false, SupplySystem.IEC_WYE, false);

  public PositionWords {
    if (system == null) {
      system = SupplySystem.IEC_WYE;
    }
  }

  /** A board whose nouns follow its layout: a panelboard speaks the US trade's words. */
  public PositionWords(boolean panelboard, SupplySystem system) {
    this(panelboard, system, panelboard);
  }

  /** The words of a board of a site. */
  public static PositionWords of(SiteSpec site, BoardSpec board) {
    return new PositionWords(
        site.panelSpacesOf(board) != null,
        site.systemOf(board),
        !SiteSpec.DEFAULT_RULE_SET_KEY.equals(site.ruleSetKey()));
  }

  /**
   * The words of a board evaluated without its site (the demand API's one-board calculation): a
   * board of ways, its lines named by its supply system.
   */
  public static PositionWords ofSystem(SupplySystem system) {
    return new PositionWords(false, system, false);
  }

  /** The line(s) of a position: "L2", "A", "A–B", "L1–L3"; empty when not recorded. */
  public String lines(PhasePosition position) {
    if (position == null) {
      return "";
    }
    if (position.isLineToLine()) {
      return system.lineName(position.fromLine()) + "–" + system.lineName(position.toLine());
    }
    if (position == PhasePosition.THREE_POLE) {
      return system.lineName(Phase.L1) + "–" + system.lineName(Phase.L3);
    }
    return system.lineName(position.phases().iterator().next());
  }

  /** One line's name: "L2" or "B". */
  public String line(Phase line) {
    return system.lineName(line);
  }

  /** The first {@code count} lines in words: "L1, L2 and L3", "A and B", "L1". */
  public String linesInWords(int count) {
    Phase[] all = Phase.values();
    int n = Math.max(1, Math.min(count, all.length));
    StringBuilder words = new StringBuilder(line(all[0]));
    for (int i = 1; i < n; i++) {
      words.append(i == n - 1 ? " and " : ", ").append(line(all[i]));
    }
    return words.toString();
  }

  /** "way 9 L2", "space 5 A"; without the line when the position is not recorded. */
  public String place(int wayNumber, PhasePosition position) {
    String where = position() + " " + wayNumber;
    return position == null ? where : where + " " + lines(position);
  }

  /** The board's word for one of its positions: "way" or "space". */
  public String position() {
    return panelboard ? "space" : "way";
  }

  /** The board's word for itself: "board" or "panelboard". */
  public String board() {
    return usTrade ? "panelboard" : "board";
  }

  /** The word for a board fed from one of its positions: "sub-board" or "subpanel". */
  public String subBoard() {
    return usTrade ? "subpanel" : "sub-board";
  }
}
