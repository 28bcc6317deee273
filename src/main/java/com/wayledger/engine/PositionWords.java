package com.wayledger.engine;

/**
 * How a board names a circuit's position in words, as its page does: "way 9 L2" on a board of ways,
 * "space 5 A" or "space 3 A–B" on a panelboard (a North American board under the NEC rule set,
 * whose way number is the circuit's first space).
 *
 * @param panelboard whether the board is laid out in spaces
 * @param system the board's supply system, which names its lines (L1…L3 or A…C)
 */
public record PositionWords(boolean panelboard, SupplySystem system) {

  /** The words of a board of ways on the IEC supply: "way 9 L2". */
  public static final PositionWords WAYS = new PositionWords(false, SupplySystem.IEC_WYE);

  public PositionWords {
    if (system == null) {
      system = SupplySystem.IEC_WYE;
    }
  }

  /** The words of a board of a site. */
  public static PositionWords of(SiteSpec site, BoardSpec board) {
    return new PositionWords(site.panelSpacesOf(board) != null, site.systemOf(board));
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

  /** "way 9 L2", "space 5 A"; without the line when the position is not recorded. */
  public String place(int wayNumber, PhasePosition position) {
    String where = (panelboard ? "space " : "way ") + wayNumber;
    return position == null ? where : where + " " + lines(position);
  }
}
