package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;

/**
 * Where one circuit should sit: a way and a line. Written and read as "circuitId:way:phase" so that
 * a page can carry a whole rearrangement (and its undo) in a form. A two-pole breaker on a
 * three-line panelboard is "circuitId:space:phase:2": its top space and the first line of its pair
 * (the next space down, two on, carries the next line).
 *
 * @param poles 1 for a single-pole circuit, 2 for a two-pole, line-to-line one
 */
public record Placement(long circuitId, int wayNumber, Phase phase, int poles) {

  public Placement(long circuitId, int wayNumber, Phase phase) {
    this(circuitId, wayNumber, phase, 1);
  }

  /** The position the circuit takes: its line, or the two-pole pair starting on it. */
  public PhasePosition position() {
    return poles == 2 ? PhasePosition.twoPoleFrom(phase) : PhasePosition.on(phase);
  }

  public String token() {
    return circuitId + ":" + wayNumber + ":" + phase + (poles == 2 ? ":2" : "");
  }

  /** Parses "12:4:L2" or "12:4:L2:2"; null when the text is not of that form. */
  public static Placement parse(String token) {
    String[] parts = token == null ? new String[0] : token.strip().split(":");
    if (parts.length != 3 && !(parts.length == 4 && parts[3].equals("2"))) {
      return null;
    }
    try {
      return new Placement(
          Long.parseLong(parts[0]),
          Integer.parseInt(parts[1]),
          Phase.valueOf(parts[2]),
          parts.length == 4 ? 2 : 1);
    } catch (IllegalArgumentException malformed) {
      return null;
    }
  }
}
