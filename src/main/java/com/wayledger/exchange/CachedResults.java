package com.wayledger.exchange;

import com.wayledger.board.LoadForm;
import com.wayledger.engine.Phase;
import com.wayledger.engine.RatingUnit;

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
  private final boolean threePhaseBoard;
  private final double[] connectedKw = new double[3];
  private final double[] connectedKvar = new double[3];
  private final double[] demandKw = new double[3];
  private final double[] demandKvar = new double[3];

  CachedResults(double u0, boolean threePhaseBoard) {
    this.u0 = u0;
    this.threePhaseBoard = threePhaseBoard;
  }

  /**
   * The CONNECTED_KW / CONNECTED_KVAR formulas of a row; zero for a row without a complete load.
   */
  RowPower rowPower(LoadForm load, boolean threePole) {
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
    double perLine = u0 * (threePole ? 3 : 1);
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

  /**
   * Adds a row to the per-line sums behind the totals (a three-pole row counts a third on each
   * line).
   */
  void add(
      RowPower row,
      double diversityActive,
      double diversityReactive,
      Phase phase,
      boolean threePole) {
    add(
        row.kilowatts(),
        row.kilovars(),
        row.kilowatts() * diversityActive,
        row.kilovars() * diversityReactive,
        phase,
        threePole);
  }

  /**
   * Adds connected and demand power to the per-line sums as the sheet's line totals count a row (a
   * three-pole row a third on each line).
   */
  void add(
      double connectedKilowatts,
      double connectedKilovars,
      double demandKilowatts,
      double demandKilovars,
      Phase phase,
      boolean threePole) {
    for (Phase line : Phase.values()) {
      double share;
      if (!threePhaseBoard) {
        share = line == Phase.L1 ? 1.0 : 0.0;
      } else if (threePole) {
        share = 1.0 / 3;
      } else {
        share = line == phase ? 1.0 : 0.0;
      }
      int i = line.ordinal();
      connectedKw[i] += share * connectedKilowatts;
      connectedKvar[i] += share * connectedKilovars;
      demandKw[i] += share * demandKilowatts;
      demandKvar[i] += share * demandKilovars;
    }
  }

  /**
   * The IB_CONNECTED formula of a circuit: |S| of its rows over U0 (times three on a three-pole
   * way).
   */
  double circuitCurrentAmps(double kilowatts, double kilovars, boolean threePole) {
    return Math.hypot(kilowatts, kilovars) * 1000 / (u0 * (threePole ? 3 : 1));
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
