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
 * @param poles 1, or 2 for a two-pole breaker on a three-line panelboard: then the phases are the
 *     first lines of its pairs (L1 for L1–L2, L2 for L2–L3, L3 for L3–L1), the ways its top spaces,
 *     and {@code demandAmps} the current on each of its two lines
 */
public record CircuitMove(
    long circuitId,
    String description,
    double demandAmps,
    Phase fromPhase,
    Integer fromWay,
    Phase toPhase,
    Integer toWay,
    int poles) {

  /** A single-pole circuit's move. */
  public CircuitMove(
      long circuitId,
      String description,
      double demandAmps,
      Phase fromPhase,
      Integer fromWay,
      Phase toPhase,
      Integer toWay) {
    this(circuitId, description, demandAmps, fromPhase, fromWay, toPhase, toWay, 1);
  }

  /** Whether this moves a two-pole breaker. */
  public boolean isTwoPole() {
    return poles == 2;
  }

  /** The second line of the pair it leaves (two-pole only, else null): L2 for L1–L2. */
  public Phase fromSecondLine() {
    return isTwoPole() && fromPhase != null ? PhasePosition.twoPoleFrom(fromPhase).toLine() : null;
  }

  /** The second line of the pair it goes to (two-pole only, else null): L3 for L2–L3. */
  public Phase toSecondLine() {
    return isTwoPole() ? PhasePosition.twoPoleFrom(toPhase).toLine() : null;
  }

  /**
   * The move in plain words on a board of ways: "move circuit 'Bakery mixer' from way 4 L2 to way 7
   * L1".
   */
  public String inWords() {
    return inWords(PositionWords.WAYS);
  }

  /**
   * The move in the board's own words: "… from way 4 L2 to way 7 L1" on a board of ways, "… from
   * space 4 B to space 7 A" on a panelboard, "move two-pole circuit 'X' from spaces 1 and 3 A–B to
   * spaces 4 and 6 B–C" for a two-pole breaker.
   */
  public String inWords(PositionWords words) {
    if (isTwoPole()) {
      return "move two-pole circuit '"
          + description
          + "' from "
          + spacePair(words, fromWay, fromPhase)
          + " to "
          + spacePair(words, toWay, toPhase);
    }
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

  /** "spaces 1 and 3 A–B": a two-pole breaker's spaces and its pair of lines. */
  private static String spacePair(PositionWords words, Integer firstSpace, Phase firstLine) {
    // two-pole moves exist on panelboards only, whose positions are spaces
    return "spaces "
        + firstSpace
        + " and "
        + (firstSpace + 2)
        + " "
        + words.lines(PhasePosition.twoPoleFrom(firstLine));
  }
}
