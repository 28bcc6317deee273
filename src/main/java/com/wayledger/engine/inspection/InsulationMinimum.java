package com.wayledger.engine.inspection;

/**
 * Minimum insulation resistance by circuit voltage band, with the DC test voltage for that band.
 *
 * <p>Source: BS 7671:2018 Table 64 and IEC 60364-6:2016 Table 6.1 (from memory, not read from the
 * documents at hand): SELV and PELV — 250 V DC, ≥ 0.5 MΩ; up to and including 500 V — 500 V DC, ≥
 * 1.0 MΩ; above 500 V — 1000 V DC, ≥ 1.0 MΩ. A reading entered as "&gt;299" is the instrument's
 * upper range and is graded as that lower bound, which is on the safe side.
 */
public final class InsulationMinimum {

  public static final String SOURCE =
      "BS 7671 Table 64 / IEC 60364-6 Table 6.1 (from memory): minimum insulation resistance by"
          + " voltage band";

  /** A circuit's nominal voltage band for the insulation test. */
  public enum VoltageBand {
    /** Extra-low voltage from a safety source (SELV, PELV). */
    SELV_PELV(250, 0.5),
    /** Up to and including 500 V, other than SELV/PELV (230/400 V circuits). */
    UP_TO_500_VOLTS(500, 1.0),
    /** Above 500 V. */
    ABOVE_500_VOLTS(1000, 1.0);

    private final double testVolts;
    private final double minimumMegaohms;

    VoltageBand(double testVolts, double minimumMegaohms) {
      this.testVolts = testVolts;
      this.minimumMegaohms = minimumMegaohms;
    }

    /** The DC test voltage for this band, V. */
    public double testVolts() {
      return testVolts;
    }

    /** The least acceptable insulation resistance, MΩ. */
    public double minimumMegaohms() {
      return minimumMegaohms;
    }

    /**
     * The band of a circuit whose highest nominal voltage (line to line where it has several lines)
     * is {@code nominalVolts}; circuits are not recorded as SELV, so anything above 50 V counts as
     * low voltage.
     */
    public static VoltageBand ofNominalVolts(double nominalVolts) {
      if (nominalVolts <= 50) {
        return SELV_PELV;
      }
      return nominalVolts <= 500 ? UP_TO_500_VOLTS : ABOVE_500_VOLTS;
    }
  }

  private InsulationMinimum() {}

  /**
   * Grades one insulation reading.
   *
   * @param quantity "IR L–L", "IR L–E" or "IR N–E"
   * @param megaohms the reading, MΩ; null when not measured
   * @param band the circuit's voltage band
   * @param testVolts the DC voltage the instrument applied; null when not recorded
   */
  public static GradedValue grade(
      String quantity, Double megaohms, VoltageBand band, Double testVolts) {
    if (megaohms == null) {
      return GradedValue.notMeasured(TestKind.INSULATION, quantity, "MΩ", SOURCE);
    }
    double minimum = band.minimumMegaohms();
    String limitText =
        "≥ " + Figures.megaohms(minimum) + " at " + Figures.fixed(band.testVolts(), 0) + " V DC";
    String note = "";
    if (testVolts == null) {
      note = "; test voltage not recorded, taken as " + Figures.fixed(band.testVolts(), 0) + " V";
    } else if (testVolts < band.testVolts()) {
      // A reduced test voltage (250 V where surge devices stay connected) keeps the same minimum:
      // common practice.
      note =
          "; tested at "
              + Figures.fixed(testVolts, 0)
              + " V, below the band's "
              + Figures.fixed(band.testVolts(), 0)
              + " V (same minimum applies, common practice)";
    }
    boolean pass = megaohms >= minimum;
    String message =
        quantity
            + " "
            + Figures.megaohms(megaohms)
            + (pass ? " ≥ " : " below the minimum ")
            + Figures.megaohms(minimum)
            + note;
    return new GradedValue(
        TestKind.INSULATION,
        quantity,
        megaohms,
        "MΩ",
        minimum,
        limitText,
        pass ? Grade.PASS : Grade.FAIL,
        message,
        SOURCE);
  }
}
