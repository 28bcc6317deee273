package com.wayledger.engine.demand;

import com.wayledger.engine.Phase;

/** Neutral current and unbalance from per-phase figures; plain numbers in, plain numbers out. */
public final class PhaseCurrents {

  private PhaseCurrents() {}

  /**
   * Neutral current of a four-wire three-phase system, A: the magnitude of the phasor sum of the
   * line currents, each at its line's voltage angle (L1 0°, L2 −120°, L3 +120°) shifted back by its
   * own power-factor angle φ = atan2(Q, P). With V = U0∠θ and S = P + jQ the line current is
   * conj(S/V).
   *
   * @param activeWatts P per phase in {@link Phase} order, W
   * @param reactiveVars Q per phase in {@link Phase} order, var
   * @param nominalVoltageVolts U0, V
   */
  public static double neutralCurrentAmps(
      double[] activeWatts, double[] reactiveVars, double nominalVoltageVolts) {
    double real = 0.0;
    double imaginary = 0.0;
    Phase[] phases = Phase.values();
    for (int k = 0; k < phases.length; k++) {
      double angle = Math.toRadians(phases[k].angleDegrees());
      double cos = Math.cos(angle);
      double sin = Math.sin(angle);
      // I = conj(S)·e^{jθ}/U0 = (P − jQ)(cos θ + j sin θ)/U0
      real += activeWatts[k] * cos + reactiveVars[k] * sin;
      imaginary += activeWatts[k] * sin - reactiveVars[k] * cos;
    }
    return Math.hypot(real, imaginary) / nominalVoltageVolts;
  }

  /**
   * Unbalance as the NEMA MG-1 definition applied to currents: the largest deviation from the mean
   * of the three phase currents divided by the mean, %; 0 when the mean is 0.
   */
  public static double unbalancePercent(
      double currentL1Amps, double currentL2Amps, double currentL3Amps) {
    double mean = (currentL1Amps + currentL2Amps + currentL3Amps) / 3.0;
    if (mean <= 0.0) {
      return 0.0;
    }
    double deviation =
        Math.max(
            Math.abs(currentL1Amps - mean),
            Math.max(Math.abs(currentL2Amps - mean), Math.abs(currentL3Amps - mean)));
    return 100.0 * deviation / mean;
  }

  /**
   * Unbalance of a two-line (split-phase) board, %: the same definition over two lines, the largest
   * deviation from the mean divided by the mean, which is |IA − IB|/(IA + IB); 0 when both are 0.
   * The NEMA MG-1 definition is written for three phases; its use on two lines is our own
   * extension.
   */
  public static double unbalancePercent(double currentAAmps, double currentBAmps) {
    double sum = currentAAmps + currentBAmps;
    return sum <= 0.0 ? 0.0 : 100.0 * Math.abs(currentAAmps - currentBAmps) / sum;
  }
}
