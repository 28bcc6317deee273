package com.wayledger.engine.nec;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * The breaker of a branch circuit with two or more motors, or motors and other loads, NEC 430.53
 * (NFPA 70-2020, from memory). What a schedule can tell is read from the ratings:
 *
 * <ul>
 *   <li>430.53(B): a breaker within 430.52's maximum for the smallest motor protects every motor on
 *       the circuit — a pass (each motor still needs its own overload protection, 430.32, as a
 *       single motor does);
 *   <li>430.53(A): motors of 1 hp or less, each of 6 A full-load current or less, on a nominal 120
 *       V circuit protected at 20 A or less, or any circuit up to 1000 V protected at 15 A or less
 *       — allowed only where no controller is marked for a smaller breaker and every motor has
 *       overload protection, which the schedule cannot see: advice to check on site;
 *   <li>430.53(C): a group installation may go up to 430.52's maximum for the largest motor plus
 *       the other motors' full-load currents and the other loads (430.53(C)(4)), only with
 *       controllers and overload devices listed for group installation and marked with the
 *       breaker's maximum, and taps sized per 430.53(D): the schedule cannot see these, so a
 *       breaker that needs them is a warning naming what must be checked on site;
 *   <li>above that: danger.
 * </ul>
 *
 * The table full-load currents of 430.6(A)(1) stand for the motors' ratings (6 A of (A)(1) too, the
 * safe side: a table current is at least a typical nameplate's).
 */
final class SeveralMotors {

  static final String REF = "NEC 430.53 several motors or loads on one branch circuit";

  /** 430.53(A): the largest motor, hp. */
  static final double SMALL_MOTOR_MAX_HORSEPOWER = 1.0;

  /** 430.53(A)(1): the largest full-load current of each motor, A. */
  static final double SMALL_MOTOR_MAX_FULL_LOAD_AMPS = 6.0;

  /** 430.53(A): the largest breaker on a nominal 120 V branch circuit, A. */
  static final double SMALL_MOTORS_120_VOLT_MAX_AMPS = 20.0;

  /** 430.53(A): the largest breaker on any other branch circuit of 1000 V or less, A. */
  static final double SMALL_MOTORS_OTHER_MAX_AMPS = 15.0;

  private SeveralMotors() {}

  /** Whether the circuit's voltage is a nominal 120 V (110 to 125 V). */
  static boolean nominal120Volts(double circuitVolts) {
    return circuitVolts >= 110.0 - 1e-9 && circuitVolts <= 125.0 + 1e-9;
  }

  /** Whether 430.53(A)'s ratings allow the breaker: small motors, small breaker. */
  static boolean smallMotorsAllow(MotorCircuit.Duty duty, double in) {
    boolean small =
        duty.motors().stream()
            .allMatch(
                m ->
                    m.horsepower() <= SMALL_MOTOR_MAX_HORSEPOWER + 1e-9
                        && m.fullLoadAmps() <= SMALL_MOTOR_MAX_FULL_LOAD_AMPS + 1e-9);
    double limit =
        nominal120Volts(duty.circuitVolts())
            ? SMALL_MOTORS_120_VOLT_MAX_AMPS
            : SMALL_MOTORS_OTHER_MAX_AMPS;
    return small && in <= limit + 1e-9;
  }

  /**
   * 430.53(C)(4): 430.52's maximum for the largest motor plus the others and the other loads, A.
   */
  static double groupMaximumAmps(MotorCircuit.Duty duty, DeviceKind kind) {
    Integer largest = MotorCircuit.maximumRatingAmps(duty.largestFullLoadAmps(), kind);
    double others =
        duty.motors().stream().mapToDouble(MotorCircuit.Motor::fullLoadAmps).sum()
            - duty.largestFullLoadAmps();
    return (largest == null ? Double.NaN : largest) + others + duty.otherLoadAmps();
  }

  /** 430.53: the breaker of a circuit with several motors or motors and other loads. */
  static Finding breaker(MotorCircuit.Duty duty, double in, DeviceKind kind) {
    Integer smallest = MotorCircuit.maximumRatingAmps(duty.smallestFullLoadAmps(), kind);
    double group = groupMaximumAmps(duty, kind);
    List<Quantity> values =
        List.of(
            new Quantity("smallest FLC", duty.smallestFullLoadAmps(), "A"),
            new Quantity("largest FLC", duty.largestFullLoadAmps(), "A"),
            new Quantity("430.53(B) maximum", smallest == null ? Double.NaN : smallest, "A"),
            new Quantity("430.53(C) maximum", group, "A"),
            new Quantity("In", in, "A"));
    String percent =
        NecCircuitChecks.fmt(MotorCircuit.table430_52Percent(kind))
            + " %"
            + (kind == DeviceKind.FUSE
                ? ", fuse taken as dual-element time-delay (assumed)"
                : ", inverse-time breaker");
    String basis = " (" + percent + "; " + String.join("; ", duty.readings()) + ")";
    String inWords = "In = " + NecCircuitChecks.fmt(in) + " A";
    if (smallest != null && in <= smallest + 1e-9) {
      return new Finding(
          CheckKind.MOTOR_BREAKER,
          Verdict.PASS,
          inWords
              + " within the "
              + smallest
              + " A that 430.52 allows the smallest motor: every motor is protected (430.53(B))"
              + basis,
          values,
          "NEC 430.53(B) with 430.52",
          "each motor keeps its own overload protection (430.32); check that the breaker does not"
              + " open when the motors start together");
    }
    if (smallMotorsAllow(duty, in)) {
      return new Finding(
          CheckKind.MOTOR_BREAKER,
          Verdict.ADVICE,
          inWords
              + " on motors of 1 hp or less, each of 6 A or less: allowed by 430.53(A) where the"
              + " conditions the schedule cannot see hold"
              + basis,
          values,
          "NEC 430.53(A)",
          "check on site that every motor has running overload protection (430.32) and that no"
              + " motor controller is marked for a breaker smaller than "
              + NecCircuitChecks.fmt(in)
              + " A (430.53(A)(2), (3))");
    }
    if (!Double.isNaN(group) && in <= group + 1e-9) {
      return new Finding(
          CheckKind.MOTOR_BREAKER,
          Verdict.WARNING,
          inWords
              + " is above the "
              + (smallest == null ? "" : smallest + " A ")
              + "430.52 maximum for the smallest motor; it is allowed only as a group installation"
              + " (430.53(C), at most "
              + NecCircuitChecks.fmt(group)
              + " A: the largest motor's 430.52 maximum + the other motors' full-load currents +"
              + " the other loads)"
              + basis,
          values,
          "NEC 430.53(C)",
          "check on site that every motor controller and overload device is listed for group"
              + " installation and marked for a breaker of at least "
              + NecCircuitChecks.fmt(in)
              + " A, that the breaker is an inverse-time breaker listed for it, and that taps to"
              + " each motor meet 430.53(D); otherwise fit a breaker of at most "
              + (smallest == null ? "the smallest motor's 430.52 maximum" : smallest + " A"));
    }
    return new Finding(
        CheckKind.MOTOR_BREAKER,
        Verdict.DANGER,
        inWords
            + " above the "
            + NecCircuitChecks.fmt(group)
            + " A that even a group installation allows (430.53(C)(4))"
            + basis,
        values,
        "NEC 430.53(C)(4)",
        "fit a breaker of at most "
            + (smallest == null ? NecCircuitChecks.fmt(group) + " A" : smallest + " A")
            + " (430.53(B))");
  }
}
