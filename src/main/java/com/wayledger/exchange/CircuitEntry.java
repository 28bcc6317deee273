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
 */
public record CircuitEntry(Long circuitId, CircuitForm circuit, List<LoadForm> loads) {

  public CircuitEntry {
    loads = List.copyOf(loads);
  }
}
