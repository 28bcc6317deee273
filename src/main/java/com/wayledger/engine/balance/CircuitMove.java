package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.PositionWords;

/**
 * One circuit changing line (or, on a new board, being placed).
 *
 * @param circuitId the circuit
 * @param description what it feeds
 * @param demandAmps its demand, amperes
 * @param fromPhase the line it leaves; {@code null} when it was not placed yet
 * @param fromWay the way it leaves; {@code null} when not placed or not recorded
 * @param toPhase the line it goes to
 * @param toWay the way it goes to; {@code null} when no free position was recorded on that line
 */
public record CircuitMove(
    long circuitId,
    String description,
    double demandAmps,
    Phase fromPhase,
    Integer fromWay,
    Phase toPhase,
    Integer toWay) {

  /**
   * The move in plain words on a board of ways: "move circuit 'Bakery mixer' from way 4 L2 to way 7
   * L1".
   */
  public String inWords() {
    return inWords(PositionWords.WAYS);
  }

  /**
   * The move in the board's own words: "… from way 4 L2 to way 7 L1" on a board of ways, "… from
   * space 4 B to space 7 A" on a panelboard.
   */
  public String inWords(PositionWords words) {
    String target =
        toWay == null
            ? words.line(toPhase)
                + " (no free "
                + words.position()
                + " recorded on "
                + words.line(toPhase)
                + ")"
            : words.place(toWay, PhasePosition.valueOf(toPhase.name()));
    if (fromPhase == null) {
      return "place circuit '" + description + "' on " + target;
    }
    String source =
        fromWay == null
            ? words.line(fromPhase)
            : words.place(fromWay, PhasePosition.valueOf(fromPhase.name()));
    return "move circuit '" + description + "' from " + source + " to " + target;
  }
}
