package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Selectivity between a board's upstream device (incomer, else the way feeding the board) and one
 * outgoing device, by comparing standard bands only (no manufacturer's selectivity tables): a fault
 * current at the board that reaches both instantaneous bands may trip both devices, so selectivity
 * is only partial, up to the upstream device's lowest instantaneous trip current.
 */
public final class SelectivityCheck {

  public static final String REFERENCE =
      "BS 7671 536.4.1.2 / IEC 60947-2 Annex A (selectivity limit); bands from IEC 60898-1 Table 7 and IEC 60947-2";

  private SelectivityCheck() {}

  /**
   * @param faultCurrentAmps prospective fault current at the board, A
   */
  public static Finding assess(
      DeviceCharacteristic upstream, DeviceCharacteristic outgoing, double faultCurrentAmps) {
    List<Quantity> values =
        List.of(
            new Quantity("fault current at board", faultCurrentAmps, "A"),
            new Quantity("outgoing lowest instantaneous", outgoing.lowestInstantaneousAmps(), "A"),
            new Quantity("upstream lowest instantaneous", upstream.lowestInstantaneousAmps(), "A"),
            new Quantity("upstream In", upstream.overloadSettingAmps(), "A"),
            new Quantity("outgoing In", outgoing.overloadSettingAmps(), "A"));
    String pair = upstream.label() + " upstream of " + outgoing.label();
    if (upstream.overloadSettingAmps() <= outgoing.overloadSettingAmps()) {
      return new Finding(
          CheckKind.SELECTIVITY,
          Verdict.WARNING,
          "no selectivity: " + pair + ", the upstream device is not rated above the outgoing one",
          values,
          REFERENCE,
          "the upstream device should be rated well above every outgoing device");
    }
    boolean upstreamMayTrip = upstream.mayTripInstantlyAt(faultCurrentAmps);
    if (!upstreamMayTrip) {
      return Finding.pass(
          CheckKind.SELECTIVITY,
          pair + ": the fault current at the board stays below the upstream instantaneous band",
          values,
          REFERENCE);
    }
    if (outgoing.lowestInstantaneousAmps() >= upstream.lowestInstantaneousAmps()) {
      return new Finding(
          CheckKind.SELECTIVITY,
          Verdict.WARNING,
          pair
              + ": the upstream instantaneous band starts at or below the outgoing one, so a fault may trip the"
              + " upstream device first",
          values,
          REFERENCE,
          "raise the upstream instantaneous setting or curve, or choose a lower outgoing curve");
    }
    return new Finding(
        CheckKind.SELECTIVITY,
        Verdict.ADVICE,
        "partial selectivity: "
            + pair
            + " selective only up to about "
            + Rounding.amps(upstream.lowestInstantaneousAmps())
            + "; the fault current at the board ("
            + Rounding.amps(faultCurrentAmps)
            + ") can trip both",
        values,
        REFERENCE,
        "check the manufacturer's selectivity tables, or use a time-delayed or higher-setting upstream device");
  }
}
