package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import java.util.List;

/**
 * One circuit of a board as exchanged with a spreadsheet: its own fields (as the schedule form
 * holds them, without a first load) and its load lines.
 *
 * @param circuitId the stored circuit's id; null for a circuit read from a file
 * @param circuit the circuit's fields
 * @param loads its load lines in order
 * @param recordVersion the stored circuit's edition ({@code Circuit.recordVersion()}); null for a
 *     circuit read from a file
 */
public record CircuitEntry(
    Long circuitId, CircuitForm circuit, List<LoadForm> loads, String recordVersion) {

  public CircuitEntry {
    loads = List.copyOf(loads);
  }

  /** A circuit without a record version (read from a file, or made for a test). */
  public CircuitEntry(Long circuitId, CircuitForm circuit, List<LoadForm> loads) {
    this(circuitId, circuit, loads, null);
  }
}
