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
 * <p>A multi-pole feeder's rows land on its lines as every such way does (a third on each line for
 * three poles, the two-pole phasor shares for two); a sub-board with as many lines as the way has
 * poles carries its lines as they are (a 120/208 V panel on two poles of a 208Y/120 V one), so each
 * line the way feeds gets a share correction: k·(sub-board line demand) − the way's landing of
 * k·(sub-board demand) on that line.
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

    static TotalsLayout of(String sheetName, BoardEntry board, int lines) {
      int dataRows = 0;
      for (CircuitEntry entry : board.circuits()) {
        dataRows += Math.max(1, entry.loads().size());
      }
      // 0-based: header, data rows (at least one), a blank row, the "Totals" heading, a blank row
      int totalsHeading = WorkbookWriter.HEADER_ROW + 1 + Math.max(1, dataRows) + 1;
      return new TotalsLayout(sheetName, totalsHeading + 2, lines);
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
  private final java.util.List<Phase> fed;
  private final double[][] shares;
  private final String k;
  private final double coincidence;

  /**
   * @param child the sub-board's figures
   * @param layout where its sheet keeps its totals; null when the workbook has no sheet for it
   * @param position the feeder way's position
   * @param cache the parent sheet's line landing of a row in a position
   */
  SubBoardCells(
      BoardDemand child,
      TotalsLayout layout,
      com.wayledger.engine.PhasePosition position,
      CachedResults cache) {
    this.child = child;
    this.layout = layout;
    this.fed =
        position == null
            ? java.util.List.of()
            : position.isLineToLine()
                ? java.util.List.of(position.fromLine(), position.toLine())
                : position == com.wayledger.engine.PhasePosition.THREE_POLE
                    ? java.util.List.of(Phase.values())
                    : java.util.List.of(position.phases().iterator().next());
    this.shares = position == null ? new double[3][4] : cache.lineShares(position);
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

  /**
   * Whether the sub-board's lines are carried as they are: a way of two or three poles feeding a
   * board of as many lines.
   */
  boolean carriesLinesAsTheyAre() {
    return fed.size() > 1 && child.phases().size() == fed.size();
  }

  /** Whether the feeder way feeds this line of its board. */
  boolean feeds(Phase phase) {
    return fed.contains(phase);
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
    return lineShare(phase, false);
  }

  double lineShareKilowattsValue(Phase phase) {
    return lineShareValue(phase, false);
  }

  String lineShareKilovars(Phase phase) {
    return lineShare(phase, true);
  }

  double lineShareKilovarsValue(Phase phase) {
    return lineShareValue(phase, true);
  }

  private String lineShare(Phase phase, boolean reactive) {
    if (!carriesLinesAsTheyAre() || !feeds(phase)) {
      return "0";
    }
    if (layout == null) {
      return literal(lineShareValue(phase, reactive));
    }
    double[] share = shares[phase.ordinal()];
    double fromP = reactive ? share[2] : share[0];
    double fromQ = reactive ? share[3] : share[1];
    String column = reactive ? "F" : "E";
    return k
        + "*("
        + layout.cell(column, layout.firstLineRow() + fed.indexOf(phase))
        + "-"
        + literal(fromP)
        + "*"
        + layout.cell("E", layout.totalRow())
        + "-"
        + literal(fromQ)
        + "*"
        + layout.cell("F", layout.totalRow())
        + ")";
  }

  private double lineShareValue(Phase phase, boolean reactive) {
    if (!carriesLinesAsTheyAre() || !feeds(phase)) {
      return 0;
    }
    PhaseDemand line = child.phases().get(fed.indexOf(phase));
    double[] share = shares[phase.ordinal()];
    double fromP = reactive ? share[2] : share[0];
    double fromQ = reactive ? share[3] : share[1];
    double own = reactive ? line.demandVars() : line.demandWatts();
    return coincidence * (own - fromP * child.demandWatts() - fromQ * child.demandVars()) / 1000;
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
