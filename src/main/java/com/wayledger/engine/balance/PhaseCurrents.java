package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;

/**
 * The current on each line of a board, amperes, as the arithmetic sum of the circuit demands on it
 * (see docs/calculations/balance.md for why the balancer adds magnitudes).
 *
 * @param lines the board's lines: 3, or 2 on a 120/240 V split-phase board (L1 = A, L2 = B, no L3);
 *     the mean and the unbalance are taken over these lines only
 */
public record PhaseCurrents(double l1Amps, double l2Amps, double l3Amps, int lines) {

  /** The currents of a three-line board. */
  public PhaseCurrents(double l1Amps, double l2Amps, double l3Amps) {
    this(l1Amps, l2Amps, l3Amps, 3);
  }

  public double onPhase(Phase phase) {
    return switch (phase) {
      case L1 -> l1Amps;
      case L2 -> l2Amps;
      case L3 -> l3Amps;
    };
  }

  public double largestAmps() {
    return Math.max(l1Amps, Math.max(l2Amps, l3Amps));
  }

  public double totalAmps() {
    return l1Amps + l2Amps + l3Amps;
  }

  /**
   * Largest deviation from the mean line current divided by the mean, percent (the NEMA MG-1
   * definition applied to currents, over the board's lines: on two lines |IA − IB| / (IA + IB), as
   * the demand engine takes it); 0 for a board that carries no current.
   */
  public double unbalancePercent() {
    if (lines == 2) {
      return com.wayledger.engine.demand.PhaseCurrents.unbalancePercent(l1Amps, l2Amps);
    }
    return com.wayledger.engine.demand.PhaseCurrents.unbalancePercent(l1Amps, l2Amps, l3Amps);
  }

  static PhaseCurrents ofCentiamps(long[] centiamps, int lines) {
    return new PhaseCurrents(
        centiamps[0] / 100.0, centiamps[1] / 100.0, centiamps[2] / 100.0, lines);
  }
}
