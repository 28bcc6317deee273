package com.wayledger.engine;

/** A line conductor of a three-phase supply, with its nominal angle in the positive sequence. */
public enum Phase {
  L1(0.0),
  L2(-120.0),
  L3(120.0);

  private final double angleDegrees;

  Phase(double angleDegrees) {
    this.angleDegrees = angleDegrees;
  }

  /** Nominal voltage angle of this line to neutral, degrees (L1 0°, L2 −120°, L3 +120°). */
  public double angleDegrees() {
    return angleDegrees;
  }
}
