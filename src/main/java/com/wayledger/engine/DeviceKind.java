package com.wayledger.engine;

/** Kind of protective device in a way or at an incomer. */
public enum DeviceKind {
  /** Miniature circuit breaker, IEC 60898-1. */
  MCB,
  /** Residual-current breaker with overcurrent protection, IEC 61009-1. */
  RCBO,
  /** Residual-current device without overcurrent protection, IEC 61008-1. */
  RCD,
  /**
   * Fuse; the engine holds no characteristic for fuses, so checks that need one are not assessed.
   */
  FUSE,
  /** Moulded-case circuit breaker, IEC 60947-2. */
  MCCB;

  /** Whether this kind has a tripping curve letter (B, C or D). */
  public boolean hasCurve() {
    return this == MCB || this == RCBO;
  }

  /** Whether this kind detects residual (earth leakage) current. */
  public boolean isResidualCurrent() {
    return this == RCBO || this == RCD;
  }

  /** Whether this kind protects against overcurrent. */
  public boolean protectsAgainstOvercurrent() {
    return this != RCD;
  }
}
