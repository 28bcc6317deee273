package com.wayledger.exchange;

import com.wayledger.board.CircuitEdit;
import java.util.List;

/**
 * What an import does to one circuit of a board that already has circuits: the preview lists one
 * per circuit, in the file's order, then the board's circuits that the file leaves out.
 *
 * @param kind added, changed, unchanged, in conflict, removed or kept
 * @param circuitId the stored circuit; null when added
 * @param position its position as the sheet writes it ("3 L2"), after the import
 * @param description its description, after the import (before it, when removed or kept)
 * @param rowNumbers the sheet rows it comes from; empty for a circuit the file leaves out
 * @param changes field by field, old → new (changed and conflict only)
 * @param edit what applying stores; null for unchanged, conflict and kept
 */
public record ImportOutcome(
    Kind kind,
    Long circuitId,
    String position,
    String description,
    List<Integer> rowNumbers,
    List<Change> changes,
    CircuitEdit edit) {

  public ImportOutcome {
    rowNumbers = List.copyOf(rowNumbers);
    changes = List.copyOf(changes);
  }

  /** What happens to the circuit. */
  public enum Kind {
    /** A row for a circuit the board does not have: added. */
    ADDED,
    /** A row for a stored circuit with other values: the circuit takes them. */
    CHANGED,
    /** A row for a stored circuit with the same values: nothing stored. */
    UNCHANGED,
    /**
     * A row with other values for a stored circuit that was changed since the file was exported:
     * not overwritten, and the import is refused until the file is exported again.
     */
    CONFLICT,
    /** A stored circuit the file leaves out, removed because the user asked for it. */
    REMOVED,
    /** A stored circuit the file leaves out, kept (the user did not ask to remove it). */
    KEPT;

    /** Key of the kind's name in i18n/exchange.properties. */
    public String messageKey() {
      return "import.outcome." + name();
    }
  }

  /**
   * One field that differs.
   *
   * @param field the column
   * @param loadLine the load line (from 1) for a load field; 0 for the circuit's own fields
   * @param before the stored value as the sheet writes it ("" when none)
   * @param after the file's value ("" when none)
   */
  public record Change(ImportField field, int loadLine, String before, String after) {}

  public boolean isStored() {
    return edit != null;
  }
}
