package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Additional protection of socket-outlet circuits up to 32 A by a residual-current device of IΔn ≤
 * 30 mA. The engine sees the way's own device, the board's incomer and the incomers and ways above;
 * an RCD outside the schedule (an RCD socket-outlet, a separate RCD unit) cannot be seen, so a
 * missing RCD is a warning to look.
 */
public final class SocketRcdCheck {

  public static final String REFERENCE = "BS 7671 411.3.3 / IEC 60364-4-41 411.3.3";

  private SocketRcdCheck() {}

  /**
   * @param ratedAmps the way's In, A
   * @param ownResidualMilliAmps IΔn of the way's own RCBO or RCD; null when it has none
   * @param upstreamResidualMilliAmps smallest IΔn seen upstream; null when none
   */
  public static Finding assess(
      double ratedAmps,
      Double ownResidualMilliAmps,
      Double upstreamResidualMilliAmps,
      double maxRatedAmps,
      double maxResidualMilliAmps) {
    if (ratedAmps > maxRatedAmps) {
      return Finding.pass(
          CheckKind.SOCKET_RCD,
          "socket-outlet circuit rated "
              + Rounding.amps(ratedAmps)
              + ", above the "
              + Rounding.amps(maxRatedAmps)
              + " the rule covers",
          List.of(new Quantity("In", ratedAmps, "A")),
          REFERENCE);
    }
    if (ownResidualMilliAmps != null && ownResidualMilliAmps <= maxResidualMilliAmps) {
      return Finding.pass(
          CheckKind.SOCKET_RCD,
          "protected by the way's own " + (long) (double) ownResidualMilliAmps + " mA device",
          List.of(new Quantity("IΔn", ownResidualMilliAmps, "mA")),
          REFERENCE);
    }
    if (upstreamResidualMilliAmps != null && upstreamResidualMilliAmps <= maxResidualMilliAmps) {
      return Finding.pass(
          CheckKind.SOCKET_RCD,
          "protected by an upstream " + (long) (double) upstreamResidualMilliAmps + " mA device",
          List.of(new Quantity("IΔn", upstreamResidualMilliAmps, "mA")),
          REFERENCE);
    }
    return new Finding(
        CheckKind.SOCKET_RCD,
        Verdict.WARNING,
        "socket-outlet circuit up to "
            + Rounding.amps(maxRatedAmps)
            + " with no "
            + (long) maxResidualMilliAmps
            + " mA residual-current device on the schedule (an RCD outside the schedule cannot be seen)",
        List.of(new Quantity("In", ratedAmps, "A")),
        REFERENCE,
        "fit a 30 mA RCBO on the way, or confirm on site that an upstream 30 mA RCD covers it");
  }

  /**
   * The same rule for any category of {@link ResidualCurrentRules}: a car-charging circuit needs
   * its 30 mA device whatever its rating.
   */
  public static Finding assess(
      ResidualCurrentRules.Rule rule,
      double ratedAmps,
      Double ownResidualMilliAmps,
      Double upstreamResidualMilliAmps,
      double maxResidualMilliAmps) {
    if (rule.maxRatedAmps() != null) {
      return assess(
          ratedAmps,
          ownResidualMilliAmps,
          upstreamResidualMilliAmps,
          rule.maxRatedAmps(),
          maxResidualMilliAmps);
    }
    Double seen =
        ownResidualMilliAmps != null && ownResidualMilliAmps <= maxResidualMilliAmps
            ? ownResidualMilliAmps
            : upstreamResidualMilliAmps != null && upstreamResidualMilliAmps <= maxResidualMilliAmps
                ? upstreamResidualMilliAmps
                : null;
    if (seen != null) {
      return Finding.pass(
          CheckKind.SOCKET_RCD,
          rule.words()
              + " protected by "
              + (seen.equals(ownResidualMilliAmps) ? "the way's own " : "an upstream ")
              + (long) (double) seen
              + " mA device",
          List.of(new Quantity("IΔn", seen, "mA")),
          rule.reference());
    }
    return new Finding(
        CheckKind.SOCKET_RCD,
        Verdict.WARNING,
        rule.words()
            + " with no "
            + (long) maxResidualMilliAmps
            + " mA residual-current device on the schedule (an RCD outside the schedule cannot be seen)",
        List.of(new Quantity("In", ratedAmps, "A")),
        rule.reference(),
        rule.remedy());
  }

  /** The location rules (outdoors, bathrooms…) that the check could not apply. */
  public static final String LOCATION_REFERENCE =
      "BS 7671 411.3.3, 701.411.3.3, 703.411.3.3, section 702 (from memory)";

  /**
   * A final circuit whose location is not recorded and whose loads do not already ask for 30 mA
   * protection: whether outdoors, a bathroom or another special location demands it cannot be told,
   * so the check is not assessed (never passed), whatever device is fitted.
   */
  public static Finding locationNotRecorded() {
    return new Finding(
        CheckKind.SOCKET_RCD,
        Verdict.NOT_ASSESSED,
        "not assessed — location not recorded (outdoor, bathroom, pool and sauna circuits need 30 mA"
            + " residual-current protection)",
        List.of(),
        LOCATION_REFERENCE,
        "record where the circuit's equipment is");
  }
}
