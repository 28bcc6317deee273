package com.wayledger.board;

import com.wayledger.engine.Phase;

/**
 * Where one single-pole circuit should sit: a way and a line. Written and read as
 * "circuitId:way:phase" so that a page can carry a whole rearrangement (and its undo) in a form.
 */
public record Placement(long circuitId, int wayNumber, Phase phase) {

  public String token() {
    return circuitId + ":" + wayNumber + ":" + phase;
  }

  /** Parses "12:4:L2"; null when the text is not of that form. */
  public static Placement parse(String token) {
    String[] parts = token == null ? new String[0] : token.strip().split(":");
    if (parts.length != 3) {
      return null;
    }
    try {
      return new Placement(
          Long.parseLong(parts[0]), Integer.parseInt(parts[1]), Phase.valueOf(parts[2]));
    } catch (IllegalArgumentException malformed) {
      return null;
    }
  }
}
