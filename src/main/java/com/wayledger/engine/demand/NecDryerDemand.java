package com.wayledger.engine.demand;

/**
 * NEC 220.54: each household clothes dryer at 5,000 VA or its nameplate rating, whichever is
 * larger, with the demand factors of Table 220.54 by number of dryers (2023 edition and earlier).
 */
public final class NecDryerDemand {

  /** Smallest load taken for one dryer, VA. */
  public static final double MINIMUM_VOLT_AMPERES_PER_DRYER = 5_000.0;

  private NecDryerDemand() {}

  /** Table 220.54 demand factor for a number of dryers. */
  public static double factor(int count) {
    if (count <= 0) {
      return 0.0;
    }
    if (count <= 4) {
      return 1.0;
    }
    return switch (count) {
      case 5 -> 0.85;
      case 6 -> 0.75;
      case 7 -> 0.65;
      case 8 -> 0.60;
      case 9 -> 0.55;
      case 10 -> 0.50;
      case 11 -> 0.47;
      default -> {
        if (count <= 23) {
          yield (47 - (count - 11)) / 100.0;
        }
        if (count <= 42) {
          yield (35 - 0.5 * (count - 23)) / 100.0;
        }
        yield 0.25;
      }
    };
  }

  /** Load taken for one dryer of a nameplate rating, VA. */
  public static double loadPerDryerVoltAmperes(double nameplateVoltAmperes) {
    return Math.max(MINIMUM_VOLT_AMPERES_PER_DRYER, nameplateVoltAmperes);
  }
}
