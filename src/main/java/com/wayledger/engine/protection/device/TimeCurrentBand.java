package com.wayledger.engine.protection.device;

import java.util.ArrayList;
import java.util.List;

/**
 * A device's time–current band for charts: the region between the "does not trip before" and "has
 * tripped by" edges, as points ordered by current. A repeated multiple marks a vertical step (the
 * instantaneous band).
 *
 * <p>The thermal part is an envelope drawn through the conventional test points of the product
 * standard (straight lines on log–log axes between them), not a manufacturer's curve: a real device
 * sits inside it.
 *
 * @param basis what the band is drawn from
 * @param points slices ordered by current
 */
public record TimeCurrentBand(String basis, List<TimeCurrentPoint> points) {

  /** Shortest time drawn, s: "instant" operation is shown at 10 ms. */
  public static final double INSTANT_SECONDS = 0.01;

  public TimeCurrentBand {
    points = List.copyOf(points);
  }

  /** The band of an MCB, RCBO (overcurrent part) or MCCB. */
  public static TimeCurrentBand of(DeviceCharacteristic device) {
    return device.curve() != null ? miniature(device) : mouldedCase(device);
  }

  private static TimeCurrentBand miniature(DeviceCharacteristic d) {
    double in = d.ratedCurrentAmps();
    double hours = d.conventionalTimeHours() * 3600.0;
    double lo = d.curve().lowestInstantMultiple();
    double hi = d.curve().highestInstantMultiple();
    double k = McbStandard.THERMAL_TEST_MULTIPLE;
    double kMax = McbStandard.thermalTestMaxSeconds(in);
    double tInst = McbStandard.INSTANTANEOUS_TIME_SECONDS;
    // lower edge through (1.13, conventional time) and (2.55, 1 s); upper edge through (1.45,
    // conventional time)
    // and (2.55, 60/120 s), both extended as straight log-log lines to the instantaneous band
    // clamped so that no edge falls below the 0.1 s no-trip limit at the band's lower edge and the
    // upper edge
    // never lies under the lower one (the extension is steep for type D)
    double upperAtLo =
        Math.max(tInst, logLine(McbStandard.CONVENTIONAL_TRIPPING_MULTIPLE, hours, k, kMax, lo));
    double lowerAtLo =
        Math.min(
            upperAtLo,
            Math.max(
                tInst, logLine(McbStandard.CONVENTIONAL_NON_TRIPPING_MULTIPLE, hours, k, 1.0, lo)));
    double upperAtHi =
        Math.min(
            upperAtLo,
            Math.max(
                tInst, logLine(McbStandard.CONVENTIONAL_TRIPPING_MULTIPLE, hours, k, kMax, hi)));
    double lowerAt145 =
        logLine(McbStandard.CONVENTIONAL_NON_TRIPPING_MULTIPLE, hours, k, 1.0, 1.45);
    List<TimeCurrentPoint> p = new ArrayList<>();
    p.add(point(1.13, in, hours, null));
    p.add(point(1.45, in, lowerAt145, hours));
    p.add(point(k, in, 1.0, kMax));
    p.add(point(lo, in, lowerAtLo, upperAtLo));
    p.add(point(lo, in, INSTANT_SECONDS, upperAtLo));
    p.add(point(hi, in, INSTANT_SECONDS, upperAtHi));
    p.add(point(hi, in, INSTANT_SECONDS, tInst));
    p.add(point(2 * hi, in, INSTANT_SECONDS, tInst));
    return new TimeCurrentBand(
        "IEC 60898-1 Table 7 conventional points, type "
            + d.curve()
            + "; thermal part is an envelope, not a"
            + " manufacturer curve",
        p);
  }

  private static TimeCurrentBand mouldedCase(DeviceCharacteristic d) {
    double ir = d.overloadSettingAmps();
    double hours = d.conventionalTimeHours() * 3600.0;
    double tInst = McbStandard.INSTANTANEOUS_TIME_SECONDS;
    double lo = d.lowestInstantaneousAmps() / ir;
    double hi = d.highestInstantaneousAmps() / ir;
    List<TimeCurrentPoint> p = new ArrayList<>();
    p.add(point(MccbStandard.CONVENTIONAL_NON_TRIPPING_MULTIPLE, ir, hours, null));
    p.add(point(MccbStandard.CONVENTIONAL_TRIPPING_MULTIPLE, ir, null, hours));
    // IEC 60947-2 fixes no point between 1.30·Ir and the instantaneous band: the envelope joins the
    // conventional
    // points to the band edges with straight log-log lines
    p.add(
        point(
            lo,
            ir,
            tInst,
            logLine(MccbStandard.CONVENTIONAL_TRIPPING_MULTIPLE, hours, hi, tInst, lo)));
    p.add(
        point(
            lo,
            ir,
            INSTANT_SECONDS,
            logLine(MccbStandard.CONVENTIONAL_TRIPPING_MULTIPLE, hours, hi, tInst, lo)));
    p.add(point(hi, ir, INSTANT_SECONDS, tInst));
    p.add(point(2 * hi, ir, INSTANT_SECONDS, tInst));
    return new TimeCurrentBand(
        "IEC 60947-2 conventional currents 1.05/1.30·Ir and Ii ±20 %; multiples are of Ir; envelope, not a"
            + " manufacturer curve",
        p);
  }

  /**
   * The band of a general residual-current device of rating IΔn, multiples of IΔn, currents in mA.
   */
  public static TimeCurrentBand residual(double ratedResidualMilliAmps) {
    List<TimeCurrentPoint> p = new ArrayList<>();
    p.add(point(ResidualTripTimes.NON_OPERATING_MULTIPLE, ratedResidualMilliAmps, null, null));
    for (double m : new double[] {1.0, 2.0, 5.0, 10.0}) {
      p.add(point(m, ratedResidualMilliAmps, null, ResidualTripTimes.maxBreakSeconds(m)));
    }
    return new TimeCurrentBand(
        "IEC 61008-1/61009-1 maximum break times, general type; multiples are of IΔn", p);
  }

  private static TimeCurrentPoint point(double multiple, double rated, Double min, Double max) {
    return new TimeCurrentPoint(multiple, multiple * rated, min, max);
  }

  /** Time at {@code x} on the straight log-log line through (x1, t1) and (x2, t2). */
  static double logLine(double x1, double t1, double x2, double t2, double x) {
    double slope = Math.log(t2 / t1) / Math.log(x2 / x1);
    return t1 * Math.pow(x / x1, slope);
  }
}
