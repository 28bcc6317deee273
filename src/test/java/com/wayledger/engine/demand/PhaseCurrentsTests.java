package com.wayledger.engine.demand;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;

class PhaseCurrentsTests {

  private static final double U0 = 230.0;

  @Test
  void nemaUnbalanceOfWorkedExampleIsMaxDeviationOverMean() {
    // NEMA MG-1 14.35 worked example (from memory): 460, 467, 450 → mean 459, max deviation 9, 1.96
    // %
    assertThat(PhaseCurrents.unbalancePercent(460.0, 467.0, 450.0)).isCloseTo(1.96, within(0.005));
  }

  @Test
  void unbalanceOfNoLoadIsZero() {
    assertThat(PhaseCurrents.unbalancePercent(0.0, 0.0, 0.0)).isEqualTo(0.0);
  }

  @Test
  void neutralCurrentAtEqualPowerFactorsMatchesHandbookFormula() {
    // handbook formula for equal power factors (common practice):
    // IN = √(Ia² + Ib² + Ic² − Ia·Ib − Ib·Ic − Ic·Ia); 10, 20, 30 A → √300 = 17.32 A
    double[] amps = {10.0, 20.0, 30.0};
    double cos = 0.8;
    double sin = 0.6;
    double[] watts = new double[3];
    double[] vars = new double[3];
    for (int k = 0; k < 3; k++) {
      watts[k] = amps[k] * U0 * cos;
      vars[k] = amps[k] * U0 * sin;
    }

    assertThat(PhaseCurrents.neutralCurrentAmps(watts, vars, U0))
        .isCloseTo(Math.sqrt(300.0), within(1e-9));
  }

  @Test
  void balancedLoadGivesNoNeutralCurrent() {
    double[] watts = {4_000.0, 4_000.0, 4_000.0};
    double[] vars = {1_000.0, 1_000.0, 1_000.0};

    assertThat(PhaseCurrents.neutralCurrentAmps(watts, vars, U0)).isCloseTo(0.0, within(1e-9));
  }

  @RepeatedTest(50)
  void neutralCurrentAtMixedPowerFactorsMatchesComplexPhasorSum() {
    long seed = System.nanoTime();
    Random random = new Random(seed);
    double[] watts = new double[3];
    double[] vars = new double[3];
    Complex sum = Complex.ZERO;
    double[] angles = {0.0, -120.0, 120.0};
    for (int k = 0; k < 3; k++) {
      double amps = random.nextDouble() * 100.0;
      double phi = Math.acos(0.3 + 0.7 * random.nextDouble());
      watts[k] = U0 * amps * Math.cos(phi);
      vars[k] = U0 * amps * Math.sin(phi);
      // independent cross-check: I = |I|∠(θ − φ) built with Commons Math
      sum =
          sum.add(
              Complex.valueOf(amps, 0)
                  .multiply(new Complex(0, Math.toRadians(angles[k]) - phi).exp()));
    }

    assertThat(PhaseCurrents.neutralCurrentAmps(watts, vars, U0))
        .as("neutral current, seed %d", seed)
        .isCloseTo(sum.abs(), within(1e-9));
  }
}
