package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;

/**
 * The current on each line of a board, amperes, as the arithmetic sum of the circuit demands on it
 * (see docs/calculations/balance.md for why the balancer adds magnitudes).
 */
public record PhaseCurrents(double l1Amps, double l2Amps, double l3Amps) {

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
   * Largest deviation from the mean phase current divided by the mean, percent (the NEMA MG-1
   * definition applied to currents); 0 for a board that carries no current.
   */
  public double unbalancePercent() {
    double mean = totalAmps() / 3.0;
    if (mean <= 0.0) {
      return 0.0;
    }
    double deviation =
        Math.max(
            Math.abs(l1Amps - mean), Math.max(Math.abs(l2Amps - mean), Math.abs(l3Amps - mean)));
    return 100.0 * deviation / mean;
  }

  static PhaseCurrents ofCentiamps(long[] centiamps) {
    return new PhaseCurrents(centiamps[0] / 100.0, centiamps[1] / 100.0, centiamps[2] / 100.0);
  }
}
