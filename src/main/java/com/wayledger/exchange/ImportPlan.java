package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import java.util.List;

/**
 * What an import would store, row by row, with every problem found.
 *
 * @param rows every row of the sheet as it will be stored, with its problems
 * @param circuits the circuits built from rows without problems, each with its loads
 */
public record ImportPlan(List<PreviewRow> rows, List<PlannedCircuit> circuits) {

  public ImportPlan {
    rows = List.copyOf(rows);
    circuits = List.copyOf(circuits);
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

  /** A circuit to add, with its loads and the rows it came from. */
  public record PlannedCircuit(
      CircuitForm circuit, List<LoadForm> loads, List<Integer> rowNumbers) {}

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
