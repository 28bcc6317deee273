package com.wayledger.engine.capacity;

import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.PositionWords;

/**
 * One place a new load could go.
 *
 * @param boardId the board
 * @param boardReference its name
 * @param kind spare way, empty position or shared circuit
 * @param wayNumber the way
 * @param position the line(s)
 * @param circuitId the stored circuit used (spare, shared, or an empty-position record); null for a
 *     new one
 * @param circuitDescription what the circuit feeds now; null for a new one
 * @param device the device that would protect the load (the fitted one, or the proposed one)
 * @param deviceProposed whether {@code device} is a proposal for a new circuit
 * @param deviceNote how the device was chosen and what must still be done (a new circuit's cable);
 *     may be empty
 * @param words how the board names its positions and lines
 */
public record Candidate(
    long boardId,
    String boardReference,
    CandidateKind kind,
    int wayNumber,
    PhasePosition position,
    Long circuitId,
    String circuitDescription,
    DeviceSpec device,
    boolean deviceProposed,
    String deviceNote,
    PositionWords words) {

  public Candidate {
    if (words == null) {
      words = PositionWords.WAYS;
    }
  }

  /** A candidate on a board of ways (IEC words). */
  public Candidate(
      long boardId,
      String boardReference,
      CandidateKind kind,
      int wayNumber,
      PhasePosition position,
      Long circuitId,
      String circuitDescription,
      DeviceSpec device,
      boolean deviceProposed,
      String deviceNote) {
    this(
        boardId,
        boardReference,
        kind,
        wayNumber,
        position,
        circuitId,
        circuitDescription,
        device,
        deviceProposed,
        deviceNote,
        PositionWords.WAYS);
  }

  /** "KB1 way 11 L2", "KB1 way 4 L1–L3", or on a panelboard "P1 space 5 A". */
  public String label() {
    return boardReference + " " + words.place(wayNumber, position);
  }
}
