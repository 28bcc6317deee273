package com.wayledger.engine.protection.device;

/**
 * Maximum break times of general (non-delayed) residual-current devices, IEC 61008-1 / IEC 61009-1
 * Table 1: 300 ms at IΔn, 150 ms at 2·IΔn, 40 ms at 5·IΔn and above. Below 0.5·IΔn the device must
 * not trip.
 */
public final class ResidualTripTimes {

  /** Residual non-operating current, multiple of IΔn. */
  public static final double NON_OPERATING_MULTIPLE = 0.5;

  private ResidualTripTimes() {}

  /**
   * Maximum break time, s, at {@code multipleOfRated}·IΔn; null below IΔn where tripping is not
   * required. Between the tabulated points the time of the lower point applies (the standard gives
   * only these points).
   */
  public static Double maxBreakSeconds(double multipleOfRated) {
    if (multipleOfRated < 1.0) {
      return null;
    }
    if (multipleOfRated < 2.0) {
      return 0.300;
    }
    if (multipleOfRated < 5.0) {
      return 0.150;
    }
    return 0.040;
  }
}
