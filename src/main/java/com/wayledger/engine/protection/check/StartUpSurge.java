package com.wayledger.engine.protection.check;

import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.RatingUnit;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Peak start-up current of a circuit's loads. Rule: the one item with the largest surge starts
 * while every other item of the circuit already runs, so peak = (largest item surge) + (running
 * current of all the rest). Items are taken at their connected (not diversified) running current,
 * which is the conservative side for nuisance trips.
 */
public final class StartUpSurge {

  private StartUpSurge() {}

  /**
   * Running current of one item, A: the rating in A as it stands; W as P/(U·cos φ); VA as S/U, with
   * U = U0 for a single-pole circuit and 3·U0 for a three-pole one (current per line of a balanced
   * load).
   */
  public static double itemRunningAmps(
      LoadSpec load, double nominalVoltageToEarthVolts, boolean threePole) {
    double volts = threePole ? 3.0 * nominalVoltageToEarthVolts : nominalVoltageToEarthVolts;
    RatingUnit unit = load.ratingUnit();
    if (unit == RatingUnit.A) {
      return load.ratingValue();
    }
    if (unit == RatingUnit.W) {
      return load.ratingValue() / (volts * load.powerFactor());
    }
    return load.ratingValue() / volts;
  }

  /** Peak start-up current, A; empty when no load records a surge multiple. */
  public static OptionalDouble peakAmps(
      List<LoadSpec> loads, double nominalVoltageToEarthVolts, boolean threePole) {
    double running = 0.0;
    double bestExtra = -1.0;
    for (LoadSpec load : loads) {
      double item = itemRunningAmps(load, nominalVoltageToEarthVolts, threePole);
      running += item * load.quantity();
      if (load.startUpSurgeMultiple() != null) {
        // the extra current above running is what the starting item adds to the circuit
        bestExtra = Math.max(bestExtra, item * (load.startUpSurgeMultiple() - 1.0));
      }
    }
    return bestExtra < 0 ? OptionalDouble.empty() : OptionalDouble.of(running + bestExtra);
  }
}
