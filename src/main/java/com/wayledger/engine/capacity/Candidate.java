package com.wayledger.engine.capacity;

import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.PhasePosition;

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
    String deviceNote) {

  /** "KB1 way 11 L2", or "KB1 way 4 L1–L3". */
  public String label() {
    return boardReference + " way " + wayNumber + " " + position.label();
  }
}
