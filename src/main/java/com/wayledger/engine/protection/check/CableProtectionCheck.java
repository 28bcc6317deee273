package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.cable.CableRating;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Cable protected against overload by its device: In ≤ Iz and I2 ≤ 1.45·Iz. For an IEC 60898-1
 * breaker I2 is 1.45·In, so the second condition is the first again; for an IEC 60947-2 breaker I2
 * = 1.30·Ir.
 */
public final class CableProtectionCheck {

  public static final String REFERENCE =
      "BS 7671 433.1.1 (ii), (iii) / IEC 60364-4-43 433.1: In ≤ Iz, I2 ≤ 1.45·Iz";

  private CableProtectionCheck() {}

  /**
   * @param ratedAmps In, or Ir for an MCCB, A
   * @param conventionalTrippingAmps I2, A
   * @param rating the cable's It and correction factors
   */
  public static Finding assess(
      double ratedAmps, double conventionalTrippingAmps, CableRating rating) {
    double iz = rating.capacityAmps();
    List<Quantity> values =
        List.of(
            new Quantity("In", ratedAmps, "A"),
            new Quantity("I2", conventionalTrippingAmps, "A"),
            new Quantity("It", rating.tabulatedAmps(), "A"),
            new Quantity("Ca", rating.ambientFactor(), ""),
            new Quantity("Cg", rating.groupingFactor(), ""),
            new Quantity("Ci", rating.thermalInsulationFactor(), ""),
            new Quantity("Iz", iz, "A"),
            new Quantity("1.45·Iz", 1.45 * iz, "A"));
    boolean inOk = ratedAmps <= iz + 1e-9;
    boolean i2Ok = conventionalTrippingAmps <= 1.45 * iz + 1e-9;
    String[] in = Rounding.comparedAmps(ratedAmps, iz);
    String[] i2 = Rounding.comparedAmps(conventionalTrippingAmps, 1.45 * iz);
    if (inOk && i2Ok) {
      return Finding.pass(
          CheckKind.CABLE_PROTECTION, "In " + in[0] + " ≤ Iz " + in[1], values, REFERENCE);
    }
    String why = !inOk ? "In " + in[0] + " > Iz " + in[1] : "I2 " + i2[0] + " > 1.45·Iz " + i2[1];
    return new Finding(
        CheckKind.CABLE_PROTECTION,
        Verdict.DANGER,
        "cable not protected against overload: " + why,
        values,
        REFERENCE,
        "fit a device rated at most "
            + Rounding.amps(iz)
            + " if the load allows, or a larger cable");
  }

  /**
   * The size is outside the shipped table, but the next larger tabulated size with the same
   * corrections already carries less than the device lets through: since capacity grows with
   * cross-section, the recorded cable carries less still, so the danger is proved without its own
   * figure. Null when the bound does not prove it (the caller then reports "not assessed").
   *
   * @param ratedAmps In, or Ir for an MCCB, A
   * @param conventionalTrippingAmps I2, A
   * @param recordedCsa the recorded cross-section, mm²
   * @param largerCsa the next larger tabulated cross-section, mm²
   * @param largerRating its rating in the same conditions (an upper bound on the recorded Iz)
   */
  public static Finding provenBySize(
      double ratedAmps,
      double conventionalTrippingAmps,
      double recordedCsa,
      double largerCsa,
      CableRating largerRating) {
    double bound = largerRating.capacityAmps();
    boolean inFails = ratedAmps > bound + 1e-9;
    boolean i2Fails = conventionalTrippingAmps > 1.45 * bound + 1e-9;
    if (!inFails && !i2Fails) {
      return null;
    }
    List<Quantity> values =
        List.of(
            new Quantity("In", ratedAmps, "A"),
            new Quantity("I2", conventionalTrippingAmps, "A"),
            new Quantity("recorded size", recordedCsa, "mm²"),
            new Quantity("next tabulated size", largerCsa, "mm²"),
            new Quantity("Iz of the next size (upper bound)", bound, "A"));
    return new Finding(
        CheckKind.CABLE_PROTECTION,
        Verdict.DANGER,
        "cable not protected against overload: In "
            + Rounding.amps(ratedAmps)
            + " exceeds even the Iz "
            + Rounding.amps(bound)
            + " of a "
            + Rounding.plain(largerCsa)
            + " mm² cable in the same conditions, and the recorded "
            + Rounding.plain(recordedCsa)
            + " mm² carries less (capacity grows with size; its own figure is outside the shipped"
            + " table)",
        values,
        REFERENCE,
        "fit a device rated well below " + Rounding.amps(bound) + ", or a larger cable");
  }
}
