package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Nuisance trip on start-up: a surge at or above the lowest current of the instantaneous band may
 * trip the breaker. A surge of some 10 ms does not operate the thermal element (common practice),
 * so only the magnetic band counts.
 */
public final class SurgeCheck {

  public static final String REFERENCE =
      "IEC 60898-1 Table 7 d (no trip within 0.1 s below 3/5/10·In) / IEC 60947-2 8.3.3.1.2 (Ii −20 %)";

  private SurgeCheck() {}

  public static Finding assess(double surgeAmps, DeviceCharacteristic device) {
    double trip = device.lowestInstantaneousAmps();
    List<Quantity> values =
        List.of(
            new Quantity("start-up surge", surgeAmps, "A"),
            new Quantity("lowest instantaneous trip", trip, "A"));
    if (surgeAmps < trip) {
      return Finding.pass(
          CheckKind.START_UP_SURGE,
          "start-up surge "
              + Rounding.amps(surgeAmps)
              + " below the "
              + device.label()
              + " instantaneous band ("
              + Rounding.amps(trip)
              + ")",
          values,
          REFERENCE);
    }
    return new Finding(
        CheckKind.START_UP_SURGE,
        Verdict.WARNING,
        "start-up surge "
            + Rounding.amps(surgeAmps)
            + " reaches the "
            + device.label()
            + " instantaneous band (from "
            + Rounding.amps(trip)
            + "): nuisance trips likely",
        values,
        REFERENCE,
        "use a curve with a higher instantaneous band (C or D) if Zs allows it, a soft starter, or stagger the"
            + " starts; see the device proposal");
  }

  public static Finding noSurgeRecorded() {
    return Finding.pass(
        CheckKind.START_UP_SURGE, "no load records a start-up surge", List.of(), REFERENCE);
  }
}
