package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import java.util.List;

/**
 * What an import would store, row by row, with every problem found.
 *
 * @param rows every row of the sheet as it will be stored, with its problems
 * @param circuits the circuits built from rows without problems, each with its loads
 * @param outcomes what the import does to each circuit of the board (added, changed, unchanged,
 *     conflict, removed, kept); empty until matched against the board
 */
public record ImportPlan(
    List<PreviewRow> rows, List<PlannedCircuit> circuits, List<ImportOutcome> outcomes) {

  public ImportPlan {
    rows = List.copyOf(rows);
    circuits = List.copyOf(circuits);
    outcomes = List.copyOf(outcomes);
  }

  public ImportPlan(List<PreviewRow> rows, List<PlannedCircuit> circuits) {
    this(rows, circuits, List.of());
  }

  /** How many circuits the import would treat this way. */
  public long count(ImportOutcome.Kind kind) {
    return outcomes.stream().filter(o -> o.kind() == kind).count();
  }

  public boolean hasConflicts() {
    return count(ImportOutcome.Kind.CONFLICT) > 0;
  }

  /** The edits applying stores: added, changed and removed circuits, in that order of the list. */
  public List<com.wayledger.board.CircuitEdit> edits() {
    return outcomes.stream().filter(ImportOutcome::isStored).map(ImportOutcome::edit).toList();
  }

  /** Whether the file's circuits and the board's are the same already: applying stores nothing. */
  public boolean changesNothing() {
    return edits().isEmpty();
  }

  /** A problem with one cell: the column's field and a message code with its arguments. */
  public record Problem(ImportField field, String code, Object[] arguments) {}

  /**
   * One row as it will be stored.
   *
   * @param number the row's number in the sheet
   * @param circuit the circuit fields read (null when the row continues the circuit above)
   * @param load the load read (null when the row holds none)
   * @param problems problems, each tied to a column
   * @param notes assumptions made for this row (a default power factor, a category from the
   *     description)
   */
  public record PreviewRow(
      int number, CircuitForm circuit, LoadForm load, List<Problem> problems, List<String> notes) {

    public boolean isValid() {
      return problems.isEmpty();
    }

    public boolean hasProblem(ImportField field) {
      return problems.stream().anyMatch(p -> p.field() == field);
    }
  }

  /**
   * A circuit read from the file, with its loads and the rows it came from.
   *
   * @param key the stored circuit the rows were exported from (the export's circuit key column);
   *     null when the file has none
   * @param recordVersion that circuit's edition when exported; null when the file has none
   */
  public record PlannedCircuit(
      CircuitForm circuit,
      List<LoadForm> loads,
      List<Integer> rowNumbers,
      Long key,
      String recordVersion) {

    public PlannedCircuit(CircuitForm circuit, List<LoadForm> loads, List<Integer> rowNumbers) {
      this(circuit, loads, rowNumbers, null, null);
    }
  }

  public long validRows() {
    return rows.stream().filter(PreviewRow::isValid).count();
  }

  public long invalidRows() {
    return rows.size() - validRows();
  }

  public boolean isAllValid() {
    return invalidRows() == 0;
  }

  public int loadCount() {
    return circuits.stream().mapToInt(c -> c.loads().size()).sum();
  }
}
