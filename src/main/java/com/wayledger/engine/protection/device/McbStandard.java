package com.wayledger.engine.protection.device;

import java.util.List;

/** Figures of IEC 60898-1 for household and similar circuit-breakers. */
public final class McbStandard {

  /**
   * Conventional non-tripping current, multiple of In: no trip within the conventional time from
   * cold (Table 7 a).
   */
  public static final double CONVENTIONAL_NON_TRIPPING_MULTIPLE = 1.13;

  /**
   * Conventional tripping current I2, multiple of In: trip within the conventional time (Table 7
   * b).
   */
  public static final double CONVENTIONAL_TRIPPING_MULTIPLE = 1.45;

  /**
   * The 2.55·In test point of Table 7 c: trip after more than 1 s and within 60 s (In ≤ 32 A) or
   * 120 s.
   */
  public static final double THERMAL_TEST_MULTIPLE = 2.55;

  /**
   * Time within which the instantaneous element must (or must not) operate at the band edges, s
   * (Table 7 d, e).
   */
  public static final double INSTANTANEOUS_TIME_SECONDS = 0.1;

  /** Preferred rated currents In, A. */
  public static final List<Double> STANDARD_RATINGS_AMPS =
      List.of(6.0, 10.0, 13.0, 16.0, 20.0, 25.0, 32.0, 40.0, 50.0, 63.0, 80.0, 100.0, 125.0);

  /** Preferred rated short-circuit capacities Icn, kA. */
  public static final List<Double> STANDARD_BREAKING_CAPACITIES_KILOAMPS =
      List.of(1.5, 3.0, 4.5, 6.0, 10.0, 15.0, 20.0, 25.0);

  private McbStandard() {}

  /** Conventional time for the 1.13/1.45·In tests, hours: 1 h for In ≤ 63 A, 2 h above. */
  public static double conventionalTimeHours(double ratedCurrentAmps) {
    return ratedCurrentAmps <= 63.0 ? 1.0 : 2.0;
  }

  /** Upper time limit at 2.55·In, s: 60 s for In ≤ 32 A, 120 s above. The lower limit is 1 s. */
  public static double thermalTestMaxSeconds(double ratedCurrentAmps) {
    return ratedCurrentAmps <= 32.0 ? 60.0 : 120.0;
  }

  /**
   * Service short-circuit capacity Ics from Icn, kA: Ics = Icn up to 6 kA; 0.75·Icn (at least 6 kA)
   * from 6 to 10 kA; 0.5·Icn (at least 7.5 kA) above 10 kA.
   */
  public static double serviceBreakingCapacityKiloAmps(double icnKiloAmps) {
    if (icnKiloAmps <= 6.0) {
      return icnKiloAmps;
    }
    if (icnKiloAmps <= 10.0) {
      return Math.max(6.0, 0.75 * icnKiloAmps);
    }
    return Math.max(7.5, 0.5 * icnKiloAmps);
  }
}
