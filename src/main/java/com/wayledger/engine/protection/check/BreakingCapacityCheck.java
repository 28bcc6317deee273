package com.wayledger.engine.protection.check;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.protection.device.McbStandard;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.ValueSource;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/** Breaking capacity at least the prospective fault current at the board. */
public final class BreakingCapacityCheck {

  public static final String REFERENCE =
      "BS 7671 434.5.1 / IEC 60364-4-43 434.5.1; Ics from IEC 60898-1";

  private BreakingCapacityCheck() {}

  /**
   * @param kind device kind (an RCD has no fault-breaking rating of its own)
   * @param breakingCapacityKiloAmps Icn (MCB, RCBO) or Icu (MCCB, fuse), kA; null when unknown
   * @param faultCurrentKiloAmps prospective fault current at the board, kA, with its source
   */
  public static Finding assess(
      DeviceKind kind, Double breakingCapacityKiloAmps, SourcedValue faultCurrentKiloAmps) {
    if (kind == DeviceKind.RCD) {
      return Finding.notAssessedBecause(
          CheckKind.BREAKING_CAPACITY,
          "an RCD relies on the conditional short-circuit rating with its backup device, which the schedule does not"
              + " record",
          REFERENCE);
    }
    if (breakingCapacityKiloAmps == null) {
      return Finding.notAssessed(
          CheckKind.BREAKING_CAPACITY, "device breaking capacity", REFERENCE);
    }
    if (!faultCurrentKiloAmps.isKnown()) {
      return Finding.notAssessed(
          CheckKind.BREAKING_CAPACITY, faultCurrentKiloAmps.missing(), REFERENCE);
    }
    return assess(
        kind,
        breakingCapacityKiloAmps,
        faultCurrentKiloAmps.value(),
        faultCurrentKiloAmps.source());
  }

  /** The comparison on plain numbers. */
  public static Finding assess(
      DeviceKind kind,
      double breakingCapacityKiloAmps,
      double faultCurrentKiloAmps,
      ValueSource source) {
    String pf = (source == ValueSource.MEASURED ? "measured" : "calculated") + " fault current";
    List<Quantity> values =
        List.of(
            new Quantity("Icn", breakingCapacityKiloAmps, "kA"),
            new Quantity("Ipf", faultCurrentKiloAmps, "kA"));
    if (breakingCapacityKiloAmps < faultCurrentKiloAmps) {
      return new Finding(
          CheckKind.BREAKING_CAPACITY,
          Verdict.DANGER,
          "breaking capacity "
              + Rounding.kiloAmps(breakingCapacityKiloAmps)
              + " below the "
              + pf
              + " "
              + Rounding.kiloAmps(faultCurrentKiloAmps),
          values,
          REFERENCE,
          "fit a device of breaking capacity at least "
              + Rounding.kiloAmps(faultCurrentKiloAmps)
              + ", or rely on a coordinated backup device with a manufacturer's combination rating");
    }
    if (kind != null && kind.hasCurve()) {
      double ics = McbStandard.serviceBreakingCapacityKiloAmps(breakingCapacityKiloAmps);
      if (faultCurrentKiloAmps > ics) {
        return new Finding(
            CheckKind.BREAKING_CAPACITY,
            Verdict.ADVICE,
            "fault current "
                + Rounding.kiloAmps(faultCurrentKiloAmps)
                + " is within Icn but above Ics "
                + Rounding.kiloAmps(ics)
                + ": the breaker may not be fit for service after clearing it",
            List.of(values.get(0), new Quantity("Ics", ics, "kA"), values.get(1)),
            REFERENCE,
            "consider a breaker whose Ics covers the fault current");
      }
    }
    return Finding.pass(
        CheckKind.BREAKING_CAPACITY,
        "breaking capacity "
            + Rounding.kiloAmps(breakingCapacityKiloAmps)
            + " ≥ "
            + pf
            + " "
            + Rounding.kiloAmps(faultCurrentKiloAmps),
        values,
        REFERENCE);
  }
}
