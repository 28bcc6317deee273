package com.wayledger.engine.inspection;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.protection.cable.ConductorResistance;
import com.wayledger.engine.protection.result.Resolved;
import java.util.ArrayList;
import java.util.List;

/**
 * Continuity of protective conductors compared with the value expected from the recorded cable.
 *
 * <p>Expected R1+R2 = (r_line + r_cpc)·L·(1 + α·(θ − 20 °C)), with r from IEC 60228 Table 2 at 20
 * °C (the shipped table, see {@link ConductorResistance}), α = 0.004 /K for copper and θ the
 * temperature at which the test was made (the conductors are at ambient, not at operating
 * temperature). For a ring final circuit the cross-connected reading is a quarter of the end-to-end
 * loop: (r1 + r2)/4, common practice.
 *
 * <p>A reading more than {@link #FAR_ABOVE_RATIO} times the expected value fails: a loose or broken
 * conductor, or a cable smaller or longer than recorded. That ratio is Wayledger's own threshold
 * (it leaves room for terminations, test leads and an imprecise recorded length), not a published
 * limit. When the reading matches a smaller common cable pair better than the recorded one, a
 * second value says the record and the test disagree.
 */
public final class ContinuityLimits {

  public static final String SOURCE =
      "IEC 60228 Table 2 conductor resistance (from memory) with α = 0.004 /K; far-above ratio is"
          + " Wayledger's own threshold";

  public static final String RING_SOURCE =
      "common practice: ring cross-connected reading = (r1 + r2)/4";

  /** Readings above this multiple of the expected value fail (Wayledger's own threshold). */
  public static final double FAR_ABOVE_RATIO = 1.5;

  /**
   * Readings below this are too small to tell cable sizes apart (instrument resolution, leads and
   * terminations weigh too much): no record-mismatch finding is raised from them. Wayledger's own
   * threshold.
   */
  public static final double MISMATCH_MIN_OHMS = 0.25;

  /** A common pair matches a reading when within this fraction of it. */
  static final double PAIR_MATCH_FRACTION = 0.15;

  /**
   * Line/cpc sizes in common use for flat twin-and-earth and similar cables, mm² (common practice),
   * searched for the pair a reading implies.
   */
  static final double[][] COMMON_PAIRS = {
    {1.0, 1.0},
    {1.5, 1.0},
    {2.5, 1.5},
    {4, 1.5},
    {6, 2.5},
    {10, 4},
    {16, 6},
    {1.5, 1.5},
    {2.5, 2.5},
    {4, 4},
    {6, 6},
    {10, 10},
    {16, 16}
  };

  private ContinuityLimits() {}

  /** Ratio R(θ)/R(20 °C) of copper at the test temperature. */
  public static double temperatureFactor(double testCelsius) {
    return 1.0 + ConductorResistance.COPPER_ALPHA_PER_KELVIN * (testCelsius - 20.0);
  }

  /**
   * Expected R1+R2, Ω, of a radial copper circuit at the test temperature; missing when a size or
   * the length is not recorded or the size is not tabulated.
   */
  public static Resolved<Double> expectedR1PlusR2Ohms(
      ConductorMaterial material,
      Double lineCsaSquareMillimetres,
      Double protectiveCsaSquareMillimetres,
      Double lengthMetres,
      double testCelsius) {
    if (lengthMetres == null) {
      return Resolved.missing("cable length");
    }
    if (protectiveCsaSquareMillimetres == null) {
      return Resolved.missing("protective conductor (cpc) size");
    }
    Resolved<Double> line =
        ConductorResistance.ohmsPerKmAt20Celsius(material, lineCsaSquareMillimetres);
    Resolved<Double> cpc =
        ConductorResistance.ohmsPerKmAt20Celsius(material, protectiveCsaSquareMillimetres);
    if (!line.isKnown()) {
      return line;
    }
    if (!cpc.isKnown()) {
      return cpc;
    }
    return Resolved.of(
        (line.value() + cpc.value()) * lengthMetres / 1000.0 * temperatureFactor(testCelsius));
  }

  /** Expected resistance of one conductor, Ω, over the length at the test temperature. */
  public static Resolved<Double> expectedConductorOhms(
      ConductorMaterial material,
      Double csaSquareMillimetres,
      Double lengthMetres,
      double testCelsius) {
    if (lengthMetres == null) {
      return Resolved.missing("cable length");
    }
    return ConductorResistance.ohmsPerKmAt20Celsius(material, csaSquareMillimetres)
        .map(r -> r * lengthMetres / 1000.0 * temperatureFactor(testCelsius));
  }

  /**
   * Grades a continuity reading against its expected value.
   *
   * @param quantity "R1+R2" or "R2"
   * @param measuredOhms the reading; null when not measured
   * @param expected the expected value or why it is unknown
   * @param basis what the expectation assumed, e.g. "2.5/1.5 mm² copper, 24 m, at 20 °C"
   */
  public static GradedValue grade(
      String quantity, Double measuredOhms, Resolved<Double> expected, String basis) {
    if (measuredOhms == null) {
      return GradedValue.notMeasured(TestKind.CONTINUITY, quantity, "Ω", SOURCE);
    }
    if (!expected.isKnown()) {
      return new GradedValue(
          TestKind.CONTINUITY,
          quantity,
          measuredOhms,
          "Ω",
          null,
          "",
          Grade.NOT_ASSESSED,
          "not assessed — no expected value: missing " + expected.missing(),
          SOURCE);
    }
    double limit = expected.value() * FAR_ABOVE_RATIO;
    boolean pass = measuredOhms <= limit;
    String message =
        quantity
            + " "
            + Figures.ohms(measuredOhms)
            + (pass ? " within " : " far above ")
            + "the "
            + Figures.ohms(expected.value())
            + " expected ("
            + basis
            + ")"
            + (pass
                ? ""
                : ": loose or broken conductor, or a smaller or longer cable than recorded");
    return new GradedValue(
        TestKind.CONTINUITY,
        quantity,
        measuredOhms,
        "Ω",
        limit,
        "≤ " + Figures.ohms(limit) + " (1.5 × " + Figures.ohms(expected.value()) + " expected)",
        pass ? Grade.PASS : Grade.FAIL,
        message,
        SOURCE);
  }

  /**
   * The common line/cpc pair whose resistance per metre best matches a reading, when it is within
   * {@link #PAIR_MATCH_FRACTION}; null otherwise.
   *
   * @param ohmsPerKmAt20 the reading converted to line+cpc Ω/km at 20 °C
   */
  public static double[] pairMatching(double ohmsPerKmAt20) {
    double[] best = null;
    double bestGap = Double.MAX_VALUE;
    for (double[] pair : COMMON_PAIRS) {
      Resolved<Double> line =
          ConductorResistance.ohmsPerKmAt20Celsius(ConductorMaterial.COPPER, pair[0]);
      Resolved<Double> cpc =
          ConductorResistance.ohmsPerKmAt20Celsius(ConductorMaterial.COPPER, pair[1]);
      if (!line.isKnown() || !cpc.isKnown()) {
        continue;
      }
      double gap = Math.abs(line.value() + cpc.value() - ohmsPerKmAt20) / ohmsPerKmAt20;
      if (gap < bestGap) {
        bestGap = gap;
        best = pair;
      }
    }
    return bestGap <= PAIR_MATCH_FRACTION ? best : null;
  }

  /**
   * A finding when the reading implies a smaller cable than recorded (empty list otherwise).
   *
   * @param readingOhms the R1+R2 reading of a radial circuit (or 4 × the cross-connected reading of
   *     a ring, i.e. its end-to-end r1 + r2)
   */
  public static List<GradedValue> recordMismatch(
      double readingOhms,
      double lengthMetres,
      double testCelsius,
      double recordedLineCsa,
      double recordedProtectiveCsa) {
    List<GradedValue> out = new ArrayList<>();
    if (lengthMetres <= 0 || readingOhms < MISMATCH_MIN_OHMS) {
      return out;
    }
    double perKm = readingOhms / (lengthMetres / 1000.0) / temperatureFactor(testCelsius);
    double[] pair = pairMatching(perKm);
    if (pair != null && (pair[0] < recordedLineCsa || pair[1] < recordedProtectiveCsa)) {
      out.add(
          new GradedValue(
              TestKind.RECORD_MISMATCH,
              "R1+R2 vs record",
              readingOhms,
              "Ω",
              null,
              "",
              Grade.FAIL,
              "R1+R2 "
                  + Figures.ohms(readingOhms)
                  + " over "
                  + Figures.fixed(lengthMetres, 0)
                  + " m implies about "
                  + size(pair[0])
                  + "/"
                  + size(pair[1])
                  + " mm², not the recorded "
                  + size(recordedLineCsa)
                  + "/"
                  + size(recordedProtectiveCsa)
                  + " mm²: a smaller cable than recorded or a poor connection — find out which"
                  + " before correcting the schedule",
              SOURCE));
    }
    return out;
  }

  static String size(double csa) {
    return csa == Math.rint(csa) ? Long.toString((long) csa) : Double.toString(csa);
  }
}
