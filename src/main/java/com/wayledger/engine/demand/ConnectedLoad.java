package com.wayledger.engine.demand;

import com.wayledger.engine.LoadSpec;

/**
 * Nameplate power of one load line (all its identical items together), or the input that prevents
 * computing it.
 *
 * @param activeWatts P, W
 * @param reactiveVars Q, var (positive: lagging)
 * @param missingInput the input that is missing or out of range; null when the figures are valid
 */
public record ConnectedLoad(double activeWatts, double reactiveVars, String missingInput) {

  /** Whether P and Q could be computed. */
  public boolean isAssessed() {
    return missingInput == null;
  }

  /** |S| = √(P² + Q²), VA. */
  public double apparentVoltAmperes() {
    return Math.hypot(activeWatts, reactiveVars);
  }

  static ConnectedLoad notAssessed(String missingInput) {
    return new ConnectedLoad(0.0, 0.0, missingInput);
  }

  /**
   * P and Q of a load line from its rating, unit, quantity and lagging power factor.
   *
   * <p>A rating in W is active power and in VA apparent power, each for one item. A rating in A is
   * the current per line of one item: S = U0·I single-phase, S = √3·UL·I = 3·U0·I three-phase.
   *
   * @param load the load line
   * @param nominalVoltageVolts U0, V
   * @param threePhase whether the load is fed by a three-pole circuit
   */
  public static ConnectedLoad of(LoadSpec load, double nominalVoltageVolts, boolean threePhase) {
    return ofPerAmp(load, nominalVoltageVolts * (threePhase ? 3.0 : 1.0));
  }

  /**
   * P and Q of a load line whose rating in A is converted with {@code voltAmperesPerAmp} (U0 line
   * to neutral, the line-to-line voltage for a two-pole load, 3·U0 for a three-phase one).
   */
  public static ConnectedLoad ofPerAmp(LoadSpec load, double voltAmperesPerAmp) {
    if (load.category() == null) {
      return notAssessed("load category");
    }
    if (load.ratingUnit() == null) {
      return notAssessed("rating unit");
    }
    if (load.quantity() < 1) {
      return notAssessed("quantity (at least 1)");
    }
    double powerFactor = load.powerFactor();
    if (!(powerFactor > 0.0 && powerFactor <= 1.0)) {
      return notAssessed("power factor (in (0, 1])");
    }
    double rating = load.ratingValue();
    if (!(rating >= 0.0) || Double.isInfinite(rating)) {
      return notAssessed("rating (0 or more)");
    }
    double apparent =
        switch (load.ratingUnit()) {
          case W -> rating / powerFactor;
          case VA -> rating;
          case A -> rating * voltAmperesPerAmp;
        };
    apparent *= load.quantity();
    double active = apparent * powerFactor;
    // sin φ from cos φ keeps Q exactly zero at unity power factor
    double reactive = apparent * Math.sqrt(Math.max(0.0, 1.0 - powerFactor * powerFactor));
    return new ConnectedLoad(active, reactive, null);
  }

  /**
   * Design current Ib from apparent power: |S|/U0 on one line, |S|/(3·U0) per line of a three-pole
   * circuit (equal to |S|/(√3·UL)), A.
   */
  public static double designCurrentAmps(
      double apparentVoltAmperes, double nominalVoltageVolts, boolean threePhase) {
    return apparentVoltAmperes / (nominalVoltageVolts * (threePhase ? 3.0 : 1.0));
  }
}
