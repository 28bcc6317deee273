package com.wayledger.board;

import java.util.List;

/**
 * One circuit's part in a change applied to a whole board at once (a schedule brought back from a
 * spreadsheet): a circuit to add, a stored circuit to change, or a stored circuit to remove.
 *
 * @param circuitId the stored circuit; null when the circuit is added
 * @param expectedVersion the stored circuit's {@link Circuit#recordVersion()} when the edit was
 *     made (from the export); null when not known (a sheet of another origin), then not checked
 * @param circuit the circuit's new fields (no first load); null when the circuit is removed
 * @param loads its load lines in order, replacing the stored ones line by line
 */
public record CircuitEdit(
    Long circuitId, String expectedVersion, CircuitForm circuit, List<LoadForm> loads) {

  public CircuitEdit {
    loads = loads == null ? List.of() : List.copyOf(loads);
  }

  public static CircuitEdit add(CircuitForm circuit, List<LoadForm> loads) {
    return new CircuitEdit(null, null, circuit, loads);
  }

  public static CircuitEdit change(
      long circuitId, String expectedVersion, CircuitForm circuit, List<LoadForm> loads) {
    return new CircuitEdit(circuitId, expectedVersion, circuit, loads);
  }

  public static CircuitEdit remove(long circuitId, String expectedVersion) {
    return new CircuitEdit(circuitId, expectedVersion, null, List.of());
  }

  public boolean isAdded() {
    return circuitId == null;
  }

  public boolean isRemoved() {
    return circuitId != null && circuit == null;
  }
}
