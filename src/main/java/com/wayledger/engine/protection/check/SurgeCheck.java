package com.wayledger.engine.protection.check;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
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
    String[] shown = Rounding.comparedAmps(surgeAmps, trip);
    if (surgeAmps < trip) {
      return Finding.pass(
          CheckKind.START_UP_SURGE,
          "start-up surge "
              + shown[0]
              + " below the "
              + device.label()
              + " instantaneous band ("
              + shown[1]
              + ")",
          values,
          REFERENCE);
    }
    return new Finding(
        CheckKind.START_UP_SURGE,
        Verdict.WARNING,
        "start-up surge "
            + shown[0]
            + " reaches the "
            + device.label()
            + " instantaneous band (from "
            + shown[1]
            + "): nuisance trips likely",
        values,
        REFERENCE,
        "use a curve with a higher instantaneous band (C or D) if Zs allows it, a soft starter, or stagger the"
            + " starts; see the device proposal");
  }

  /**
   * Categories whose loads start with a surge (motors, compressors): a load of these with no
   * start-up multiple recorded leaves the check not assessed rather than passed. Common practice:
   * direct-on-line motors draw several times their running current while they start.
   */
  public static final java.util.Set<LoadCategory> SURGE_PRONE =
      java.util.EnumSet.of(LoadCategory.MOTOR, LoadCategory.AIR_CONDITIONING);

  /** The first load of a surge-prone category with no start-up multiple; null when none. */
  public static LoadSpec surgeUnrecorded(List<LoadSpec> loads) {
    for (LoadSpec load : loads) {
      if (SURGE_PRONE.contains(load.category()) && load.startUpSurgeMultiple() == null) {
        return load;
      }
    }
    return null;
  }

  /** The check cannot be made: a motor-like load has no start-up multiple recorded. */
  public static Finding missingMultiple(LoadSpec load) {
    return Finding.notAssessed(
        CheckKind.START_UP_SURGE,
        "start-up multiple of \""
            + load.description()
            + "\" ("
            + load.category().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')
            + " loads start with a surge)",
        REFERENCE);
  }

  /** A circuit whose loads are of no surge-prone category and record no start-up multiple. */
  public static Finding noSurgeRecorded() {
    return Finding.pass(
        CheckKind.START_UP_SURGE,
        "no motor or air-conditioning load, and no load records a start-up surge",
        List.of(),
        REFERENCE);
  }
}
