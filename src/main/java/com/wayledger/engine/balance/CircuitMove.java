package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;

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

  /** The move in plain words: "move circuit 'Bakery mixer' from way 4 L2 to way 7 L1". */
  public String inWords() {
    String target =
        toWay == null
            ? toPhase + " (no free position recorded on " + toPhase + ")"
            : "way " + toWay + " " + toPhase;
    if (fromPhase == null) {
      return "place circuit '" + description + "' on " + target;
    }
    String source = fromWay == null ? fromPhase.name() : "way " + fromWay + " " + fromPhase;
    return "move circuit '" + description + "' from " + source + " to " + target;
  }
}
