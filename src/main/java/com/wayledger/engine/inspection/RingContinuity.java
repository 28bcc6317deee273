package com.wayledger.engine.inspection;

import java.util.ArrayList;
import java.util.List;

/**
 * End-to-end and cross-connected readings of a ring final circuit (common practice, as taught for
 * the three-step ring test):
 *
 * <ul>
 *   <li>the end-to-end line and neutral readings r1 and rn agree within {@link #TOLERANCE_OHMS};
 *   <li>the protective conductor's r2 ≈ (line csa / cpc csa)·r1, 1.67 × r1 for 2.5/1.5 mm², within
 *       the same tolerance;
 *   <li>the highest cross-connected line–cpc reading (the circuit's R1+R2) ≈ (r1 + r2)/4, within
 *       the same tolerance; a larger reading points to an interconnection or a spur off the ring.
 * </ul>
 */
public final class RingContinuity {

  public static final String SOURCE =
      "common practice: ring end-to-end readings agree within 0.05 Ω; r2 ≈ (line/cpc csa)·r1;"
          + " cross-connected R1+R2 ≈ (r1 + r2)/4";

  /** Agreement expected between readings that should match, Ω (common practice). */
  public static final double TOLERANCE_OHMS = 0.05;

  private RingContinuity() {}

  /**
   * @param r1 end-to-end line reading, Ω (null when not measured)
   * @param rn end-to-end neutral reading, Ω
   * @param r2 end-to-end cpc reading, Ω
   * @param crossConnected highest cross-connected line–cpc reading (R1+R2), Ω
   * @param lineCsa recorded line conductor size, mm² (null when not recorded)
   * @param protectiveCsa recorded cpc size, mm²
   */
  public static List<GradedValue> grade(
      Double r1,
      Double rn,
      Double r2,
      Double crossConnected,
      Double lineCsa,
      Double protectiveCsa) {
    List<GradedValue> out = new ArrayList<>();
    if (r1 == null || rn == null) {
      out.add(
          notAssessed(
              "ring r1/rn",
              r1 == null ? "end-to-end r1 not measured" : "end-to-end rn not measured"));
    } else {
      out.add(
          agreement("ring r1/rn", rn, r1, "rn " + Figures.ohms(rn) + " vs r1 " + Figures.ohms(r1)));
    }
    if (r1 == null || r2 == null) {
      out.add(
          notAssessed(
              "ring r2", r2 == null ? "end-to-end r2 not measured" : "end-to-end r1 not measured"));
    } else if (lineCsa == null || protectiveCsa == null) {
      out.add(notAssessed("ring r2", "line and cpc sizes not recorded, so no r2/r1 ratio"));
    } else {
      double ratio = lineCsa / protectiveCsa;
      double expected = ratio * r1;
      out.add(
          agreement(
              "ring r2",
              r2,
              expected,
              "r2 "
                  + Figures.ohms(r2)
                  + " vs "
                  + Figures.fixed(ratio, 2)
                  + " × r1 = "
                  + Figures.ohms(expected)));
    }
    if (crossConnected != null && r1 != null && r2 != null) {
      double expected = (r1 + r2) / 4.0;
      out.add(
          agreement(
              "ring cross-connected",
              crossConnected,
              expected,
              "highest cross-connected reading "
                  + Figures.ohms(crossConnected)
                  + " vs (r1 + r2)/4 = "
                  + Figures.ohms(expected)));
    }
    return out;
  }

  private static GradedValue agreement(
      String quantity, double measured, double expected, String sentence) {
    boolean pass = Math.abs(measured - expected) <= TOLERANCE_OHMS + 1e-9;
    return new GradedValue(
        TestKind.RING_CONTINUITY,
        quantity,
        measured,
        "Ω",
        expected,
        Figures.ohms(expected) + " ± " + Figures.ohms(TOLERANCE_OHMS),
        pass ? Grade.PASS : Grade.FAIL,
        sentence
            + (pass
                ? ": agree"
                : ": differ by more than 0.05 Ω — broken ring, interconnection or poor joint"),
        SOURCE);
  }

  private static GradedValue notAssessed(String quantity, String why) {
    return new GradedValue(
        TestKind.RING_CONTINUITY,
        quantity,
        null,
        "Ω",
        null,
        "",
        Grade.NOT_ASSESSED,
        "not assessed — " + why,
        SOURCE);
  }
}
