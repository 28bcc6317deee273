package com.wayledger.engine.protection.device;

/** Figures of IEC 60947-2 for moulded-case circuit-breakers. */
public final class MccbStandard {

  /** Conventional non-tripping current, multiple of Ir (Table 6). */
  public static final double CONVENTIONAL_NON_TRIPPING_MULTIPLE = 1.05;

  /** Conventional tripping current, multiple of Ir (Table 6). */
  public static final double CONVENTIONAL_TRIPPING_MULTIPLE = 1.30;

  /** Tolerance of the instantaneous pick-up around its setting Ii (±20 %). */
  public static final double INSTANTANEOUS_TOLERANCE = 0.20;

  private MccbStandard() {}

  /** Conventional time, hours: 1 h for In ≤ 63 A, 2 h above. */
  public static double conventionalTimeHours(double ratedCurrentAmps) {
    return ratedCurrentAmps <= 63.0 ? 1.0 : 2.0;
  }
}
