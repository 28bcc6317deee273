package com.wayledger.engine.protection.check;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.protection.cable.CableRating;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Ring final circuits: a cable that leaves the board and returns to it, so every point is fed by
 * two paths.
 *
 * <p>Cable protection follows the ring rule of BS 7671 433.1.204 (from memory, not read in a
 * document at hand): a ring of 2.5 mm² copper line conductors with a 1.5 mm² protective conductor,
 * thermoplastic (70 °C) or thermosetting (90 °C) insulated, on a device of In ≤ 32 A, is protected
 * when the cable's Iz (after correction factors) is at least 20 A. Any other ring is not assessed:
 * no source at hand gives a rule for it.
 *
 * <p>Loop impedance and voltage drop use the trade's common practice for a ring whose recorded
 * length is the whole ring: the end-to-end resistances r1 + r2 give (R1+R2) = (r1+r2)/4 at the
 * mid-point, and a load taken at the mid-point sees a quarter of the ring's resistance (two halves
 * of half the length in parallel).
 */
public final class RingFinalCheck {

  public static final String CABLE_REFERENCE =
      "BS 7671 433.1.204 (from memory): ring final circuit of 2.5 mm² copper line / 1.5 mm² cpc, 70 °C or 90 °C"
          + " insulation, device In ≤ 32 A, cable Iz ≥ 20 A";

  public static final String LOOP_NOTE =
      "ring final circuit: R1+R2 at the mid-point = (r1+r2)/4 of the whole ring (common practice)";

  public static final String DROP_NOTE =
      "ring final circuit: load taken at the mid-point, a quarter of the ring's resistance (common practice)";

  /** The largest device rating the ring rule allows, A. */
  public static final double MAX_RATED_AMPS = 32.0;

  /** The smallest cable Iz the ring rule asks for, A. */
  public static final double MIN_CAPACITY_AMPS = 20.0;

  /**
   * A ring's end-to-end resistance seen at its mid-point: two halves in parallel, each half as
   * long.
   */
  public static final double MID_POINT_FRACTION = 0.25;

  private static final double LINE_MM2 = 2.5;
  private static final double CPC_MM2 = 1.5;

  private RingFinalCheck() {}

  /**
   * Whether the cable is the one the ring rule covers: 2.5/1.5 mm² copper, thermoplastic or
   * thermosetting.
   */
  public static boolean coveredCable(CableSpec cable) {
    return cable != null
        && cable.material() == ConductorMaterial.COPPER
        && (cable.insulation() == Insulation.THERMOPLASTIC_70
            || cable.insulation() == Insulation.THERMOSETTING_90)
        && same(cable.lineCsaSquareMillimetres(), LINE_MM2)
        && same(cable.protectiveCsaSquareMillimetres(), CPC_MM2);
  }

  /**
   * Cable protection of a ring final circuit.
   *
   * @param ratedAmps the device's In (Ir for a moulded-case breaker), A
   * @param cable the ring's cable
   * @param rating the cable's Iz as a single cable in its installed conditions
   */
  public static Finding cableProtection(double ratedAmps, CableSpec cable, CableRating rating) {
    double iz = rating.capacityAmps();
    List<Quantity> values =
        List.of(
            new Quantity("In", ratedAmps, "A"),
            new Quantity("In allowed (ring)", MAX_RATED_AMPS, "A"),
            new Quantity("It", rating.tabulatedAmps(), "A"),
            new Quantity("Ca", rating.ambientFactor(), ""),
            new Quantity("Cg", rating.groupingFactor(), ""),
            new Quantity("Ci", rating.thermalInsulationFactor(), ""),
            new Quantity("Iz", iz, "A"),
            new Quantity("Iz needed (ring)", MIN_CAPACITY_AMPS, "A"));
    if (!coveredCable(cable)) {
      return new Finding(
          CheckKind.CABLE_PROTECTION,
          Verdict.NOT_ASSESSED,
          "not assessed — ring final circuit of this size: check against the standard (the ring rule covers"
              + " 2.5/1.5 mm² copper cable only)",
          List.of(),
          CABLE_REFERENCE,
          "check the ring's cable against the standard, or record it as a radial");
    }
    if (ratedAmps > MAX_RATED_AMPS + 1e-9) {
      return new Finding(
          CheckKind.CABLE_PROTECTION,
          Verdict.NOT_ASSESSED,
          "not assessed — ring final circuit of this size: In "
              + Rounding.amps(ratedAmps)
              + " is above the 32 A the ring rule covers; check against the standard",
          values,
          CABLE_REFERENCE,
          "a 2.5 mm² ring is normally protected by a device of 30 or 32 A; check the device against the standard");
    }
    if (iz + 1e-9 >= MIN_CAPACITY_AMPS) {
      return Finding.pass(
          CheckKind.CABLE_PROTECTION,
          "ring final circuit: In "
              + Rounding.amps(ratedAmps)
              + " ≤ 32 A and Iz "
              + Rounding.amps(iz)
              + " ≥ 20 A",
          values,
          CABLE_REFERENCE);
    }
    return new Finding(
        CheckKind.CABLE_PROTECTION,
        Verdict.DANGER,
        "ring final circuit: cable not protected against overload: Iz "
            + Rounding.amps(iz)
            + " < 20 A the ring rule needs",
        values,
        CABLE_REFERENCE,
        "route the ring out of thermal insulation or away from grouped cables, or use a larger cable");
  }

  /**
   * A loop impedance or voltage drop finding with the ring's basis named in its summary and
   * reference.
   */
  public static Finding noted(Finding finding, String note) {
    return new Finding(
        finding.check(),
        finding.verdict(),
        finding.summary() + " (" + note + ")",
        finding.values(),
        finding.reference() + "; " + note,
        finding.remedy());
  }

  private static boolean same(Double value, double expected) {
    return value != null && Math.abs(value - expected) < 1e-9;
  }
}
