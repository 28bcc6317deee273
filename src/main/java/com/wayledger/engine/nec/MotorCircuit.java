package com.wayledger.engine.nec;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.ConnectedLoad;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The motor branch-circuit checks of NEC Article 430: the full-load current from Table 430.248 or
 * 430.250 and not the nameplate (430.6(A)(1)); the conductor at 125 % of it, plus the other motors'
 * full-load currents and the other loads where several share the circuit (430.22, 430.24); the
 * largest inverse-time breaker or fuse of Table 430.52, the next standard rating up where the
 * percentage falls between two (430.52(C)(1) Exception No. 1). A motor without its horsepower is
 * not assessed.
 */
public final class MotorCircuit {

  public static final String REF_CONDUCTOR =
      "NEC 430.6(A)(1), 430.22, 430.24 with Tables 430.248/430.250";
  public static final String REF_BREAKER = "NEC 430.52(C)(1) and Table 430.52";

  /** Table 430.52: inverse-time breaker, % of full-load current (from memory). */
  public static final double INVERSE_TIME_BREAKER_PERCENT = 250.0;

  /** Table 430.52: dual-element (time-delay) fuse, % of full-load current (from memory). */
  public static final double TIME_DELAY_FUSE_PERCENT = 175.0;

  /** 430.22: a single motor's conductor at 125 % of its full-load current. */
  public static final double CONDUCTOR_FACTOR = 1.25;

  /**
   * What a circuit's motors ask of it.
   *
   * @param missing why the motors cannot be assessed; null when they can
   * @param largestFullLoadAmps the largest motor's table full-load current, A
   * @param requiredConductorAmps 430.22/430.24 conductor ampacity needed, A
   * @param singleMotor whether the circuit feeds exactly one motor and nothing else (430.52 applies
   *     as written)
   * @param readings one line per motor load: "5 hp at 230 V: 28 A (Table 430.248)"
   * @param roundedUp whether a horsepower between two rows was read at the larger one
   * @param motors every motor on the circuit (a load of quantity n counts n times)
   * @param otherLoadAmps the other loads' current, A, as rated (no 125 % for continuous ones)
   * @param circuitVolts the circuit's voltage, V
   */
  public record Duty(
      String missing,
      double largestFullLoadAmps,
      double requiredConductorAmps,
      boolean singleMotor,
      List<String> readings,
      boolean roundedUp,
      List<Motor> motors,
      double otherLoadAmps,
      double circuitVolts) {

    static Duty missing(String why) {
      return new Duty(why, 0, 0, false, List.of(), false, List.of(), 0, 0);
    }

    /** The smallest motor's table full-load current, A. */
    public double smallestFullLoadAmps() {
      return motors.stream().mapToDouble(Motor::fullLoadAmps).min().orElse(0);
    }

    public boolean isAssessed() {
      return missing == null;
    }
  }

  /** One motor: its recorded horsepower and its table full-load current, A. */
  public record Motor(double horsepower, double fullLoadAmps) {}

  private MotorCircuit() {}

  /** Whether a circuit feeds any motor load. */
  public static boolean hasMotor(CircuitSpec circuit) {
    return circuit.loads().stream().anyMatch(l -> l.category() == LoadCategory.MOTOR);
  }

  /**
   * Whether the circuit feeds motors only, every one of them read in the tables: its conductors are
   * then protected under Article 430 and not 240.4 (240.4(G)).
   */
  public static boolean motorsOnly(SupplySystem system, double u0, CircuitSpec circuit) {
    return circuit.feedsBoardId() == null
        && !circuit.loads().isEmpty()
        && circuit.loads().stream().allMatch(l -> l.category() == LoadCategory.MOTOR)
        && duty(system, u0, circuit).isAssessed();
  }

  /** The circuit's voltage, V: line to neutral, line to line, or between lines of three phases. */
  public static double circuitVolts(SupplySystem system, double u0, PhasePosition position) {
    if (position == PhasePosition.THREE_POLE || (position != null && position.isLineToLine())) {
      return system.lineToLineFactor() * u0;
    }
    return u0;
  }

  /** The motors' duty on a circuit; {@link Duty#missing} says why it cannot be worked out. */
  public static Duty duty(SupplySystem system, double u0, CircuitSpec circuit) {
    if (circuit.position() == null) {
      return Duty.missing("missing position");
    }
    boolean threePhase = circuit.position() == PhasePosition.THREE_POLE;
    double volts = circuitVolts(system, u0, circuit.position());
    List<Motor> motors = new ArrayList<>();
    List<String> readings = new ArrayList<>();
    boolean roundedUp = false;
    double otherAmps = 0.0;
    double otherRatedAmps = 0.0;
    double perAmp = LinePhasors.voltAmperesPerAmp(system, circuit.position(), u0);
    for (LoadSpec load : circuit.loads()) {
      if (load.category() != LoadCategory.MOTOR) {
        ConnectedLoad connected = ConnectedLoad.ofPerAmp(load, perAmp);
        if (!connected.isAssessed()) {
          return Duty.missing("missing " + connected.missingInput());
        }
        // 430.24(1): other continuous loads at 125 %
        double amps = connected.apparentVoltAmperes() / perAmp;
        otherAmps += amps * (load.continuous() ? 1.25 : 1.0);
        otherRatedAmps += amps;
        continue;
      }
      if (load.motorHorsepower() == null) {
        return Duty.missing("motor horsepower not recorded (“" + load.description() + "”)");
      }
      Optional<MotorTables.Reading> reading =
          MotorTables.fullLoad(load.motorHorsepower(), volts, threePhase);
      if (reading.isEmpty()) {
        return Duty.missing(
            (threePhase ? "Table 430.250" : "Table 430.248")
                + " has no full-load current for "
                + NecCircuitChecks.fmt(load.motorHorsepower())
                + " hp at "
                + NecCircuitChecks.fmt(volts)
                + " V");
      }
      MotorTables.Reading r = reading.get();
      roundedUp |= r.roundedUp(load.motorHorsepower());
      readings.add(
          (load.quantity() > 1 ? load.quantity() + " × " : "")
              + NecCircuitChecks.fmt(load.motorHorsepower())
              + " hp at "
              + r.columnVolts()
              + " V: "
              + NecCircuitChecks.fmt(r.fullLoadAmps())
              + " A ("
              + r.table()
              + (r.roundedUp(load.motorHorsepower())
                  ? ", row " + NecCircuitChecks.fmt(r.tableHorsepower()) + " hp, the next larger"
                  : "")
              + ")");
      for (int i = 0; i < load.quantity(); i++) {
        motors.add(new Motor(load.motorHorsepower(), r.fullLoadAmps()));
      }
    }
    if (motors.isEmpty()) {
      return Duty.missing("no motor load");
    }
    double largest = motors.stream().mapToDouble(Motor::fullLoadAmps).max().orElse(0);
    double sum = motors.stream().mapToDouble(Motor::fullLoadAmps).sum();
    // 430.24: 125 % of the largest motor's full-load current plus the others' plus the other loads
    double required = sum + (CONDUCTOR_FACTOR - 1.0) * largest + otherAmps;
    boolean single = motors.size() == 1 && otherAmps == 0.0;
    return new Duty(
        null, largest, required, single, readings, roundedUp, motors, otherRatedAmps, volts);
  }

  /** 430.22/430.24: the conductor's ampacity against the motors' duty. */
  static Finding conductor(Duty duty, NecCircuitChecks.Ampacity a) {
    if (!duty.isAssessed()) {
      return notAssessed(CheckKind.MOTOR_CONDUCTOR, duty.missing(), REF_CONDUCTOR);
    }
    if (a.missing() != null) {
      return Finding.notAssessed(CheckKind.MOTOR_CONDUCTOR, a.missing(), REF_CONDUCTOR);
    }
    if (a.tooHot() != null) {
      return new Finding(
          CheckKind.MOTOR_CONDUCTOR,
          Verdict.DANGER,
          a.tooHot(),
          List.of(),
          REF_CONDUCTOR,
          "use a conductor with a higher temperature rating or change the route");
    }
    double ampacity = a.allowableAmps();
    return conductor(duty, ampacity);
  }

  /** The plain-number core of {@link #conductor(Duty, NecCircuitChecks.Ampacity)}. */
  static Finding conductor(Duty duty, double conductorAmps) {
    List<Quantity> values =
        List.of(
            new Quantity("table FLC", duty.largestFullLoadAmps(), "A"),
            new Quantity("required", duty.requiredConductorAmps(), "A"),
            new Quantity("conductor", conductorAmps, "A"));
    String basis =
        String.join("; ", duty.readings())
            + (duty.roundedUp() ? " (horsepower between rows: the larger row taken)" : "");
    String text =
        "conductor "
            + NecCircuitChecks.fmt(conductorAmps)
            + " A against "
            + NecCircuitChecks.fmt(duty.requiredConductorAmps())
            + " A needed ("
            + (duty.singleMotor() ? "125 % of the table full-load current" : severalWords(duty))
            + "); "
            + basis;
    if (conductorAmps + 1e-9 < duty.requiredConductorAmps()) {
      return new Finding(
          CheckKind.MOTOR_CONDUCTOR,
          Verdict.DANGER,
          text,
          values,
          REF_CONDUCTOR,
          "use a conductor of at least "
              + NecCircuitChecks.fmt(duty.requiredConductorAmps())
              + " A ampacity");
    }
    return Finding.pass(CheckKind.MOTOR_CONDUCTOR, text, values, REF_CONDUCTOR);
  }

  /** Table 430.52's percentage for a device of this kind, %. */
  static double table430_52Percent(DeviceKind kind) {
    return kind == DeviceKind.FUSE ? TIME_DELAY_FUSE_PERCENT : INVERSE_TIME_BREAKER_PERCENT;
  }

  /** 430.24's sum in words: 125 % of the largest, the other motors, the other loads. */
  private static String severalWords(Duty duty) {
    double others = duty.motors().stream().mapToDouble(Motor::fullLoadAmps).sum();
    others -= duty.largestFullLoadAmps();
    double otherLoads =
        duty.requiredConductorAmps() - CONDUCTOR_FACTOR * duty.largestFullLoadAmps() - others;
    return "430.24: 125 % of the largest full-load current "
        + NecCircuitChecks.fmt(duty.largestFullLoadAmps())
        + " A + the other motors' "
        + NecCircuitChecks.fmt(others)
        + " A + the other loads' "
        + NecCircuitChecks.fmt(Math.max(0.0, otherLoads))
        + " A (continuous ones at 125 %)";
  }

  /** The largest rating Table 430.52 allows a device of this kind, A; null for none known. */
  public static Integer maximumRatingAmps(double fullLoadAmps, DeviceKind kind) {
    double percent =
        kind == DeviceKind.FUSE ? TIME_DELAY_FUSE_PERCENT : INVERSE_TIME_BREAKER_PERCENT;
    return OvercurrentLimits.nextStandardRatingAtOrAbove(fullLoadAmps * percent / 100.0);
  }

  /** 430.52: the breaker's rating against the motor's maximum. */
  static Finding breaker(Duty duty, DeviceSpec device) {
    if (!duty.isAssessed()) {
      return notAssessed(CheckKind.MOTOR_BREAKER, duty.missing(), REF_BREAKER);
    }
    String reference = duty.singleMotor() ? REF_BREAKER : SeveralMotors.REF;
    if (!device.kind().protectsAgainstOvercurrent()) {
      return Finding.notAssessedBecause(
          CheckKind.MOTOR_BREAKER, "the device gives no overcurrent protection", reference);
    }
    if (device.ratedCurrentAmps() == null) {
      return Finding.notAssessed(CheckKind.MOTOR_BREAKER, "device rating In", reference);
    }
    if (!duty.singleMotor()) {
      return SeveralMotors.breaker(duty, device.ratedCurrentAmps(), device.kind());
    }
    return breaker(duty.largestFullLoadAmps(), device.ratedCurrentAmps(), device.kind());
  }

  /** The plain-number core of 430.52. */
  static Finding breaker(double fullLoadAmps, double in, DeviceKind kind) {
    boolean fuse = kind == DeviceKind.FUSE;
    double percent = fuse ? TIME_DELAY_FUSE_PERCENT : INVERSE_TIME_BREAKER_PERCENT;
    Integer max = maximumRatingAmps(fullLoadAmps, kind);
    List<Quantity> values =
        List.of(
            new Quantity("table FLC", fullLoadAmps, "A"),
            new Quantity(NecCircuitChecks.fmt(percent) + " %", fullLoadAmps * percent / 100, "A"),
            new Quantity("maximum", max == null ? Double.NaN : max, "A"),
            new Quantity("In", in, "A"));
    String basis =
        fuse
            ? " (fuse taken as dual-element time-delay, 175 %: the lowest fuse column, assumed)"
            : " (inverse-time breaker, 250 %)";
    if (max != null && in <= max + 1e-9) {
      return Finding.pass(
          CheckKind.MOTOR_BREAKER,
          "In = " + NecCircuitChecks.fmt(in) + " A within the " + max + " A maximum" + basis,
          values,
          REF_BREAKER);
    }
    return new Finding(
        CheckKind.MOTOR_BREAKER,
        Verdict.DANGER,
        "In = "
            + NecCircuitChecks.fmt(in)
            + " A above the "
            + (max == null ? "largest standard" : max + " A")
            + " maximum"
            + basis,
        values,
        REF_BREAKER,
        "fit a breaker of at most " + max + " A");
  }

  private static Finding notAssessed(CheckKind check, String why, String reference) {
    Finding f = Finding.notAssessedBecause(check, why, reference);
    return new Finding(
        f.check(),
        f.verdict(),
        f.summary(),
        f.values(),
        reference,
        "record the " + (why.contains("horsepower") ? "motor's horsepower" : "missing input"));
  }
}
