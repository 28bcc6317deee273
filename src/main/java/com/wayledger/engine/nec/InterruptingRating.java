package com.wayledger.engine.nec;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * NEC 110.9 and 110.10: a breaker or fuse interrupts at least the fault current available at its
 * line terminals. The available fault current is a panelboard input (recorded at the panel, else
 * the origin's figure taken at the panel unreduced, the safe side); without one the check is not
 * assessed. Series ratings (240.86) are not recorded and so not credited.
 */
public final class InterruptingRating {

  public static final String REF =
      "NEC 110.9 interrupting rating, 110.10 circuit impedance and short-circuit current ratings";

  /**
   * Interrupting ratings breakers are commonly listed at, kA (common practice; the proposer picks
   * the lowest that covers the available fault current).
   */
  public static final List<Double> COMMON_RATINGS_KILOAMPS =
      List.of(10.0, 14.0, 18.0, 22.0, 25.0, 35.0, 42.0, 65.0, 100.0, 200.0);

  private InterruptingRating() {}

  static Finding assess(DeviceSpec device, Double availableKiloAmps, String basis) {
    if (device.kind() == DeviceKind.RCD) {
      return Finding.notAssessedBecause(
          CheckKind.INTERRUPTING_RATING,
          "the device gives no overcurrent protection of its own",
          REF);
    }
    if (device.breakingCapacityKiloAmps() == null) {
      return Finding.notAssessed(CheckKind.INTERRUPTING_RATING, "interrupting rating", REF);
    }
    if (availableKiloAmps == null) {
      return Finding.notAssessed(
          CheckKind.INTERRUPTING_RATING, "available fault current at the panelboard", REF);
    }
    return assess(device.breakingCapacityKiloAmps(), availableKiloAmps, basis);
  }

  /** The comparison on plain numbers. */
  public static Finding assess(double ratingKiloAmps, double availableKiloAmps, String basis) {
    List<Quantity> values =
        List.of(
            new Quantity("interrupting rating", ratingKiloAmps, "kA"),
            new Quantity("available", availableKiloAmps, "kA"));
    String text =
        "interrupting rating "
            + NecCircuitChecks.fmt(ratingKiloAmps)
            + " kA against "
            + NecCircuitChecks.fmt(availableKiloAmps)
            + " kA available ("
            + basis
            + ")";
    if (ratingKiloAmps + 1e-9 < availableKiloAmps) {
      return new Finding(
          CheckKind.INTERRUPTING_RATING,
          Verdict.DANGER,
          text + ": too low",
          values,
          REF,
          "fit a device rated to interrupt at least "
              + NecCircuitChecks.fmt(availableKiloAmps)
              + " kA, or a listed series combination (240.86)");
    }
    return Finding.pass(CheckKind.INTERRUPTING_RATING, text, values, REF);
  }

  /** The lowest common rating at or above the available fault current, kA; null above 200 kA. */
  public static Double lowestCovering(double availableKiloAmps) {
    for (double rating : COMMON_RATINGS_KILOAMPS) {
      if (rating + 1e-9 >= availableKiloAmps) {
        return rating;
      }
    }
    return null;
  }

  /** 110.9 for a panelboard's main breaker or fuse. */
  public static Finding incomer(DeviceSpec incomer, CircuitContext context) {
    Finding f = assess(incomer, context.availableFaultKiloAmps(), context.faultBasis());
    return new Finding(
        f.check(), f.verdict(), "main: " + f.summary(), f.values(), f.reference(), f.remedy());
  }
}
