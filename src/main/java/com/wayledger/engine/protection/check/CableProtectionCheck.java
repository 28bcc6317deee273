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
    if (inOk && i2Ok) {
      return Finding.pass(
          CheckKind.CABLE_PROTECTION,
          "In " + Rounding.amps(ratedAmps) + " ≤ Iz " + Rounding.amps(iz),
          values,
          REFERENCE);
    }
    String why =
        !inOk
            ? "In " + Rounding.amps(ratedAmps) + " > Iz " + Rounding.amps(iz)
            : "I2 "
                + Rounding.amps(conventionalTrippingAmps)
                + " > 1.45·Iz "
                + Rounding.amps(1.45 * iz);
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
}
