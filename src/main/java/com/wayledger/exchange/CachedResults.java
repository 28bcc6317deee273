package com.wayledger.exchange;

import com.wayledger.board.LoadForm;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySystem;

/**
 * The results of the board sheet's formulas, worked out in Java as the rows are written, so that
 * every formula cell carries its value as well. A spreadsheet program that recalculates on opening
 * (the workbook asks for it) computes the same numbers; one that shows stored results without
 * recalculating (LibreOffice's default for this file type) still shows the right totals instead of
 * zeros.
 */
final class CachedResults {

  /**
   * Connected active and reactive power of one load row, kW and kvar, exactly as the row's
   * formulas.
   */
  record RowPower(double kilowatts, double kilovars) {}

  private final double u0;
  private final SupplySystem system;
  private final int lines;
  private final double[] connectedKw = new double[3];
  private final double[] connectedKvar = new double[3];
  private final double[] demandKw = new double[3];
  private final double[] demandKvar = new double[3];

  /**
   * @param u0 the board's voltage to neutral, V
   * @param system its supply system (line angles and line-to-line voltage)
   * @param lines its number of lines: 1, 2 (A and B of a single-phase three-wire board) or 3
   */
  CachedResults(double u0, SupplySystem system, int lines) {
    this.u0 = u0;
    this.system = system;
    this.lines = lines;
  }

  /**
   * Volt-amperes per ampere of a row in this position, as the sheet's formula: U0 line to neutral,
   * the line-to-line voltage on two poles, 3·U0 on three.
   */
  double voltAmperesPerAmp(PhasePosition position) {
    return lines == 1 ? u0 : LinePhasors.voltAmperesPerAmp(system, position, u0);
  }

  /**
   * How much of a two-pole row's P and Q lands on each line, as {@link LinePhasors#add}: {@code
   * [line][0]} P from P, {@code [1]} P from Q, {@code [2]} Q from P, {@code [3]} Q from Q.
   */
  double[][] lineShares(PhasePosition position) {
    double[] fromP = new double[3];
    double[] fromPq = new double[3];
    double[] fromQ = new double[3];
    double[] fromQq = new double[3];
    LinePhasors.add(system, position, 1.0, 0.0, fromP, fromPq);
    LinePhasors.add(system, position, 0.0, 1.0, fromQ, fromQq);
    double[][] shares = new double[3][];
    for (int k = 0; k < 3; k++) {
      shares[k] = new double[] {fromP[k], fromQ[k], fromPq[k], fromQq[k]};
    }
    return shares;
  }

  /**
   * The CONNECTED_KW / CONNECTED_KVAR formulas of a row; zero for a row without a complete load.
   */
  RowPower rowPower(LoadForm load, PhasePosition position) {
    if (load == null
        || load.ratingValue() == null
        || load.quantity() == null
        || load.powerFactor() == null) {
      return new RowPower(0, 0);
    }
    double qty = load.quantity();
    double rating = load.ratingValue();
    double pf = load.powerFactor();
    double sin = Math.sqrt(1 - pf * pf);
    double perLine = voltAmperesPerAmp(position);
    RatingUnit unit = load.ratingUnit();
    double p;
    double q;
    if (unit == RatingUnit.W) {
      p = qty * rating;
      q = qty * rating / pf * sin;
    } else if (unit == RatingUnit.VA) {
      p = qty * rating * pf;
      q = qty * rating * sin;
    } else {
      p = qty * rating * perLine * pf;
      q = qty * rating * perLine * sin;
    }
    return new RowPower(p / 1000, q / 1000);
  }

  /** Adds a row to the per-line sums behind the totals, landing on the lines as the engine's. */
  void add(RowPower row, double diversityActive, double diversityReactive, PhasePosition position) {
    add(
        row.kilowatts(),
        row.kilovars(),
        row.kilowatts() * diversityActive,
        row.kilovars() * diversityReactive,
        position);
  }

  /**
   * Adds connected and demand power to the per-line sums as the sheet's line totals count a row:
   * everything on the one line of a single-line board; else a three-pole row a third on each line,
   * a two-pole row S/2 on each line of a split-phase board and S/√3 at ∓30° on two lines of a wye
   * ({@link LinePhasors#add}).
   */
  void add(
      double connectedKilowatts,
      double connectedKilovars,
      double demandKilowatts,
      double demandKilovars,
      PhasePosition position) {
    if (position == null) {
      return;
    }
    if (lines == 1) {
      connectedKw[0] += connectedKilowatts;
      connectedKvar[0] += connectedKilovars;
      demandKw[0] += demandKilowatts;
      demandKvar[0] += demandKilovars;
      return;
    }
    LinePhasors.add(
        system, position, connectedKilowatts, connectedKilovars, connectedKw, connectedKvar);
    LinePhasors.add(system, position, demandKilowatts, demandKilovars, demandKw, demandKvar);
  }

  /** The IB_CONNECTED formula of a circuit: |S| of its rows over the volt-amperes per ampere. */
  double circuitCurrentAmps(double kilowatts, double kilovars, PhasePosition position) {
    return Math.hypot(kilowatts, kilovars) * 1000 / voltAmperesPerAmp(position);
  }

  double connectedKilowatts(Phase phase) {
    return connectedKw[phase.ordinal()];
  }

  double connectedKilovars(Phase phase) {
    return connectedKvar[phase.ordinal()];
  }

  double demandKilowatts(Phase phase) {
    return demandKw[phase.ordinal()];
  }

  double demandKilovars(Phase phase) {
    return demandKvar[phase.ordinal()];
  }

  /** |S| in kVA (or kW, kvar) to amps on one line. */
  double amps(double kilowatts, double kilovars) {
    return Math.hypot(kilowatts, kilovars) * 1000 / u0;
  }
}
