package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.rules.CableUnits;

/**
 * A board as its page prints it (title, facts, menu, layout footer): plain values read from the
 * stored board in the transaction that built the page's view, so that the view can be kept and
 * shared after that transaction ends (no entity, nothing lazy).
 *
 * @param id the board's id (links)
 * @param reference its reference ("DB1")
 * @param location where it is; null when not recorded
 * @param phases 1 or 3
 * @param wayCount its ways (a panelboard's spaces)
 * @param threePhase whether it has three phases
 * @param panelboard whether it is laid out as a panelboard
 * @param incomerLabel its incomer's label ("MCCB 100 A"); null when none is recorded
 * @param busbarRatingAmps its busbar rating; null when not recorded
 * @param parentReference the reference of the board that feeds it; null at the origin
 * @param submainLabel its submain in the site's units; null when none is recorded
 * @param unbalanceLimitPercent the unbalance it is checked against
 * @param supplySystem its own supply system; null when it is its site's
 * @param system the supply system it is on (its own, else its site's)
 * @param cableUnits the units its cables are printed in (its site's)
 */
public record BoardView(
    long id,
    String reference,
    String location,
    int phases,
    int wayCount,
    boolean threePhase,
    boolean panelboard,
    String incomerLabel,
    Double busbarRatingAmps,
    String parentReference,
    String submainLabel,
    double unbalanceLimitPercent,
    SupplySystem supplySystem,
    SupplySystem system,
    CableUnits cableUnits) {

  /** The board's printed facts, read from the stored board (its site and parent loaded). */
  static BoardView of(Board board) {
    CableDetails submain = board.getSubmain();
    return new BoardView(
        board.getId(),
        board.getReference(),
        board.getLocation(),
        board.getPhases(),
        board.getWayCount(),
        board.isThreePhase(),
        board.isPanelboard(),
        board.getIncomer() == null ? null : board.getIncomer().label(),
        board.getBusbarRatingAmps(),
        board.getParent() == null ? null : board.getParent().getReference(),
        submain != null && submain.isRecorded() ? submain.label(board.cableUnits()) : null,
        board.getUnbalanceLimitPercent(),
        board.getSupplySystem(),
        board.system(),
        board.cableUnits());
  }

  /** A line's name for people on this board: A, B, C on a North American supply, else L1…L3. */
  public String lineName(Phase line) {
    return system.lineName(line);
  }
}
