package com.wayledger.engine.inspection;

import com.wayledger.engine.protection.device.ResidualTripTimes;

/**
 * Operating-time limits of residual-current devices at IΔn and 5·IΔn.
 *
 * <p>General (non-delayed) type: at most 300 ms at IΔn and 40 ms at 5·IΔn, IEC 61008-1 / IEC
 * 61009-1 Table 1 (the values {@link ResidualTripTimes} already holds). Time-delayed type S:
 * between 130 ms and 500 ms at IΔn, between 50 ms and 150 ms at 5·IΔn, same tables (from memory,
 * not read from the standard at hand). A type S device that operates faster than its minimum fails
 * too: it would not give selectivity with the general-type devices after it.
 */
public final class RcdTimeLimits {

  public static final String SOURCE =
      "IEC 61008-1 / IEC 61009-1 Table 1 (type S values from memory): RCD break times";

  /** General type, maximum at IΔn, ms. */
  public static final double GENERAL_MAX_AT_RATED_MILLIS =
      ResidualTripTimes.maxBreakSeconds(1.0) * 1000;

  /** General type, maximum at 5·IΔn, ms. */
  public static final double GENERAL_MAX_AT_FIVE_TIMES_MILLIS =
      ResidualTripTimes.maxBreakSeconds(5.0) * 1000;

  /** Type S, at IΔn: minimum and maximum, ms (from memory). */
  public static final double DELAYED_MIN_AT_RATED_MILLIS = 130;

  public static final double DELAYED_MAX_AT_RATED_MILLIS = 500;

  /** Type S, at 5·IΔn: minimum and maximum, ms (from memory). */
  public static final double DELAYED_MIN_AT_FIVE_TIMES_MILLIS = 50;

  public static final double DELAYED_MAX_AT_FIVE_TIMES_MILLIS = 150;

  private RcdTimeLimits() {}

  /** Grades the operating time at IΔn. */
  public static GradedValue atRated(Double millis, boolean delayed) {
    return delayed
        ? grade("RCD at IΔn", millis, DELAYED_MIN_AT_RATED_MILLIS, DELAYED_MAX_AT_RATED_MILLIS)
        : grade("RCD at IΔn", millis, null, GENERAL_MAX_AT_RATED_MILLIS);
  }

  /** Grades the operating time at 5·IΔn. */
  public static GradedValue atFiveTimes(Double millis, boolean delayed) {
    return delayed
        ? grade(
            "RCD at 5×IΔn",
            millis,
            DELAYED_MIN_AT_FIVE_TIMES_MILLIS,
            DELAYED_MAX_AT_FIVE_TIMES_MILLIS)
        : grade("RCD at 5×IΔn", millis, null, GENERAL_MAX_AT_FIVE_TIMES_MILLIS);
  }

  private static GradedValue grade(String quantity, Double millis, Double min, double max) {
    if (millis == null) {
      return GradedValue.notMeasured(TestKind.RCD_TIME, quantity, "ms", SOURCE);
    }
    String limitText =
        min == null
            ? "≤ " + Figures.millis(max)
            : Figures.fixed(min, 0) + "–" + Figures.millis(max) + " (type S)";
    boolean tooSlow = millis > max;
    boolean tooFast = min != null && millis < min;
    String message;
    if (tooSlow) {
      message = quantity + " " + Figures.millis(millis) + " slower than " + Figures.millis(max);
    } else if (tooFast) {
      message =
          quantity
              + " "
              + Figures.millis(millis)
              + " faster than the type S minimum "
              + Figures.millis(min)
              + ": no selectivity with downstream RCDs";
    } else {
      message = quantity + " " + Figures.millis(millis) + " within " + limitText;
    }
    return new GradedValue(
        TestKind.RCD_TIME,
        quantity,
        millis,
        "ms",
        max,
        limitText,
        tooSlow || tooFast ? Grade.FAIL : Grade.PASS,
        message,
        SOURCE);
  }
}
