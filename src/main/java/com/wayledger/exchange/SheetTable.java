package com.wayledger.exchange;

import java.util.List;

/**
 * The cells of one sheet as text, as read from an uploaded file: its header row and the rows below
 * it.
 *
 * @param sheetNames every sheet of the file (one, named after the file, for CSV)
 * @param sheetIndex the sheet these rows come from
 * @param headerRowNumber the header's row number as a spreadsheet shows it (from 1)
 * @param headers the header cells, one per column
 * @param rows the non-blank rows below the header
 * @param above the non-blank rows above the header (our export's title and facts rows)
 * @param below on our own export, the first non-blank rows after the blank row that ends the
 *     schedule (the workbook's totals block, the CSV's rule set, supply system and caution lines);
 *     empty otherwise
 */
public record SheetTable(
    List<String> sheetNames,
    int sheetIndex,
    int headerRowNumber,
    List<String> headers,
    List<Row> rows,
    List<Row> above,
    List<Row> below) {

  /**
   * One row: its number as the spreadsheet shows it, and its cells (blank as ""), as wide as the
   * header.
   */
  public record Row(int number, List<String> cells) {

    public String cell(int column) {
      return column < cells.size() ? cells.get(column) : "";
    }
  }

  public SheetTable {
    sheetNames = List.copyOf(sheetNames);
    headers = List.copyOf(headers);
    rows = List.copyOf(rows);
    above = above == null ? List.of() : List.copyOf(above);
    below = below == null ? List.of() : List.copyOf(below);
  }

  /** A table with nothing recorded after its rows. */
  public SheetTable(
      List<String> sheetNames,
      int sheetIndex,
      int headerRowNumber,
      List<String> headers,
      List<Row> rows,
      List<Row> above) {
    this(sheetNames, sheetIndex, headerRowNumber, headers, rows, above, List.of());
  }

  /** A table with nothing recorded above its header. */
  public SheetTable(
      List<String> sheetNames,
      int sheetIndex,
      int headerRowNumber,
      List<String> headers,
      List<Row> rows) {
    this(sheetNames, sheetIndex, headerRowNumber, headers, rows, List.of(), List.of());
  }

  /** The row above the header with this spreadsheet row number, or null. */
  public Row aboveRow(int number) {
    return above.stream().filter(row -> row.number() == number).findFirst().orElse(null);
  }

  /** Whether every header is one of ours, written as our export writes it. */
  public boolean isOwnExport() {
    if (headers.isEmpty()) {
      return false;
    }
    for (int i = 0; i < headers.size(); i++) {
      ScheduleColumn column = ScheduleColumn.byHeader(headers.get(i));
      if (column == null || column.ordinal() != i) {
        return false;
      }
    }
    // exports written before the circuit key and record version columns end at Findings; those
    // written before the connection column at the record version; those written before the fault
    // interrupter and motor horsepower columns at the connection; those written before the conduit
    // column at the motor horsepower
    return headers.size() == ScheduleColumn.values().length
        || headers.size() == ScheduleColumn.CONDUIT.ordinal()
        || headers.size() == ScheduleColumn.FAULT_INTERRUPTER.ordinal()
        || headers.size() == ScheduleColumn.CONNECTION.ordinal()
        || headers.size() == ScheduleColumn.CIRCUIT_KEY.ordinal();
  }
}
