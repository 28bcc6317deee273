package com.wayledger.exchange;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.PhaseDemand;
import java.math.BigDecimal;

/**
 * What a feeder way adds to its board's sheet for the sub-board it carries: the sub-board's
 * connected load and its demand times the coincidence factor, as live references to the totals of
 * the sub-board's own sheet when the workbook holds that sheet (so an edit on the sub-board's sheet
 * reaches its parent's lines), as figures from the engine otherwise (a one-board export).
 *
 * <p>A three-pole feeder's rows count a third on each line, as every three-pole way does; a
 * three-line sub-board carries its lines as they are, so each line of the parent gets a share
 * correction: k·(sub-board line demand − sub-board demand / 3).
 */
final class SubBoardCells {

  /**
   * Where a board sheet keeps its totals (Excel row numbers, from 1), worked out before any sheet
   * is written so that a parent's sheet can refer to its children's sheets.
   *
   * @param sheetName the board's sheet
   * @param firstLineRow the row of the first line's totals (L1, or L–N)
   * @param lines 1 or 3
   */
  record TotalsLayout(String sheetName, int firstLineRow, int lines) {

    static TotalsLayout of(String sheetName, BoardEntry board) {
      int dataRows = 0;
      for (CircuitEntry entry : board.circuits()) {
        dataRows += Math.max(1, entry.loads().size());
      }
      // 0-based: header, data rows (at least one), a blank row, the "Totals" heading, a blank row
      int totalsHeading = WorkbookWriter.HEADER_ROW + 1 + Math.max(1, dataRows) + 1;
      return new TotalsLayout(sheetName, totalsHeading + 2, board.isThreePhase() ? 3 : 1);
    }

    int lastLineRow() {
      return firstLineRow + lines - 1;
    }

    int totalRow() {
      return firstLineRow + lines;
    }

    String cell(String column, int row) {
      return "'" + sheetName.replace("'", "''") + "'!$" + column + "$" + row;
    }
  }

  private final BoardDemand child;
  private final TotalsLayout layout;
  private final boolean threePole;
  private final String k;
  private final double coincidence;

  /**
   * @param child the sub-board's figures
   * @param layout where its sheet keeps its totals; null when the workbook has no sheet for it
   * @param threePole whether the feeder way is three-pole
   */
  SubBoardCells(BoardDemand child, TotalsLayout layout, boolean threePole) {
    this.child = child;
    this.layout = layout;
    this.threePole = threePole;
    this.coincidence = child.coincidenceFactor();
    this.k = literal(coincidence);
  }

  /** Sub-board's connected kW (its sheet's board total). */
  String connectedKilowatts() {
    return layout == null
        ? literal(child.connectedWatts() / 1000)
        : layout.cell("B", layout.totalRow());
  }

  double connectedKilowattsValue() {
    return child.connectedWatts() / 1000;
  }

  String connectedKilovars() {
    return layout == null
        ? literal(child.connectedVars() / 1000)
        : layout.cell("C", layout.totalRow());
  }

  double connectedKilovarsValue() {
    return child.connectedVars() / 1000;
  }

  /** Sub-board's demand kW times its coincidence factor. */
  String demandKilowatts() {
    return layout == null
        ? literal(demandKilowattsValue())
        : k + "*" + layout.cell("E", layout.totalRow());
  }

  double demandKilowattsValue() {
    return coincidence * child.demandWatts() / 1000;
  }

  String demandKilovars() {
    return layout == null
        ? literal(demandKilovarsValue())
        : k + "*" + layout.cell("F", layout.totalRow());
  }

  double demandKilovarsValue() {
    return coincidence * child.demandVars() / 1000;
  }

  /** Whether the sub-board's lines are carried as they are (three-pole way, three-line board). */
  boolean carriesLinesAsTheyAre() {
    return threePole && child.phases().size() == 3;
  }

  /**
   * The feeder's Ib when it has no load lines of its own: its heaviest line, k × the sub-board's
   * heaviest line current on a three-pole way to a three-line board, k·|S| / U0 (per line on three
   * poles) otherwise.
   *
   * @param perLineVolts the parent sheet's expression for U0 times the way's lines
   */
  String designCurrentAmps(String perLineVolts) {
    if (layout != null && carriesLinesAsTheyAre()) {
      return k
          + "*MAX("
          + layout.cell("G", layout.firstLineRow())
          + ":$G$"
          + layout.lastLineRow()
          + ")";
    }
    return "SQRT(("
        + demandKilowatts()
        + ")^2+("
        + demandKilovars()
        + ")^2)*1000/("
        + perLineVolts
        + ")";
  }

  /** The line's share correction, kW (zero unless the lines are carried as they are). */
  String lineShareKilowatts(Phase phase) {
    if (!carriesLinesAsTheyAre()) {
      return "0";
    }
    if (layout == null) {
      return literal(lineShareKilowattsValue(phase));
    }
    return k
        + "*("
        + layout.cell("E", layout.firstLineRow() + phase.ordinal())
        + "-"
        + layout.cell("E", layout.totalRow())
        + "/3)";
  }

  double lineShareKilowattsValue(Phase phase) {
    PhaseDemand line = child.onPhase(phase);
    return !carriesLinesAsTheyAre() || line == null
        ? 0
        : coincidence * (line.demandWatts() - child.demandWatts() / 3) / 1000;
  }

  String lineShareKilovars(Phase phase) {
    if (!carriesLinesAsTheyAre()) {
      return "0";
    }
    if (layout == null) {
      return literal(lineShareKilovarsValue(phase));
    }
    return k
        + "*("
        + layout.cell("F", layout.firstLineRow() + phase.ordinal())
        + "-"
        + layout.cell("F", layout.totalRow())
        + "/3)";
  }

  double lineShareKilovarsValue(Phase phase) {
    PhaseDemand line = child.onPhase(phase);
    return !carriesLinesAsTheyAre() || line == null
        ? 0
        : coincidence * (line.demandVars() - child.demandVars() / 3) / 1000;
  }

  /** A number as a formula can hold it: plain digits, never an exponent. */
  static String literal(double value) {
    if (!Double.isFinite(value)) {
      return "0";
    }
    String text = BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    return value < 0 ? "(" + text + ")" : text;
  }
}
