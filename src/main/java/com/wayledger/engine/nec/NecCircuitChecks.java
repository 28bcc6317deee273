package com.wayledger.engine.nec;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.Insulation;
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
 * The NEC checks of one circuit: pole count, standard rating (240.6(A)), small-conductor limit
 * (240.4(D)), conductor ampacity from Table 310.16 with ambient correction and the adjustment for
 * more than three current-carrying conductors (310.15, 240.4, 240.4(B)), the termination
 * temperature limit (110.14(C)) and continuous loads at 125 % (210.19(A), 210.20(A), 215.2(A),
 * 215.3). Every check lacking an input says "not assessed" and names it.
 */
public final class NecCircuitChecks {

  public static final String REF_POLES =
      "NEC 210.4(B), 240.15(B): the ungrounded conductors of a line-to-line circuit open together"
          + " (a breaker on a 2-pole position must be 2-pole)";
  public static final String REF_STANDARD = "NEC 240.6(A) standard ampere ratings";
  public static final String REF_SMALL = "NEC 240.4(D) small conductors";
  public static final String REF_AMPACITY =
      "NEC 240.4 with Table 310.16, 310.15(B) ambient correction, 310.15(C)(1) adjustment";
  public static final String REF_TERMINATION = "NEC 110.14(C)(1) termination temperature";
  public static final String REF_BRANCH = "NEC 210.19(A)(1), 210.20(A) continuous loads";
  public static final String REF_FEEDER = "NEC 215.2(A)(1), 215.3 continuous loads";

  /** Above this rating 240.4(B)'s next-higher-standard-rating allowance does not apply, A. */
  static final double NEXT_HIGHER_LIMIT_AMPS = 800.0;

  private NecCircuitChecks() {}

  /**
   * The checks of one circuit.
   *
   * @param system the supply's line geometry (for the current of line-to-line loads)
   * @param nominalVoltageVolts voltage line to neutral, V
   * @param designCurrentAmps Ib from the demand calculation; null when not known
   */
  public static List<Finding> assess(
      SupplySystem system,
      double nominalVoltageVolts,
      CircuitSpec circuit,
      Double designCurrentAmps) {
    List<Finding> findings = new ArrayList<>();
    DeviceSpec device = circuit.device();
    if (device == null) {
      return findings;
    }
    MotorCircuit.Duty motors =
        MotorCircuit.motorsOnly(system, nominalVoltageVolts, circuit)
            ? MotorCircuit.duty(system, nominalVoltageVolts, circuit)
            : null;
    findings.add(poles(circuit.position(), device));
    findings.add(standardRating(device));
    Conductor conductor = Conductor.of(circuit.cable());
    Ampacity ampacity = Ampacity.of(conductor, circuit.cable(), circuit.position(), device);
    if (motors != null) {
      // 240.4(G): motor circuit conductors are protected under Article 430, not 240.4
      findings.add(motorCircuitProtection(CheckKind.SMALL_CONDUCTOR, REF_SMALL));
      findings.add(motorCircuitProtection(CheckKind.CONDUCTOR_AMPACITY, REF_AMPACITY));
    } else {
      findings.add(smallConductor(conductor, device));
      findings.add(ampacityFinding(ampacity, device, hasReceptacleLoads(circuit)));
    }
    findings.add(terminationFinding(ampacity, device, hasReceptacleLoads(circuit), motors));
    findings.add(
        continuous(system, nominalVoltageVolts, circuit, designCurrentAmps, ampacity, device));
    return findings;
  }

  /**
   * Every NEC check of one circuit: those of {@link #assess(SupplySystem, double, CircuitSpec,
   * Double)}, then the motor checks (where the circuit feeds a motor), voltage drop, interrupting
   * rating and the dwelling GFCI and AFCI rules.
   */
  public static List<Finding> assess(
      CircuitContext context, CircuitSpec circuit, Double designCurrentAmps) {
    List<Finding> findings =
        new ArrayList<>(assess(context.system(), context.u0(), circuit, designCurrentAmps));
    DeviceSpec device = circuit.device();
    if (device == null) {
      return findings;
    }
    if (MotorCircuit.hasMotor(circuit)) {
      MotorCircuit.Duty duty = MotorCircuit.duty(context.system(), context.u0(), circuit);
      Ampacity ampacity =
          Ampacity.of(Conductor.of(circuit.cable()), circuit.cable(), circuit.position(), device);
      findings.add(MotorCircuit.conductor(duty, ampacity));
      findings.add(MotorCircuit.breaker(duty, device));
    }
    VoltageDrop.Run run = branchRun(context, circuit, designCurrentAmps);
    findings.add(VoltageDrop.branch(run, designCurrentAmps));
    findings.add(
        VoltageDrop.total(
            designCurrentAmps == null ? VoltageDrop.Run.missing("design current Ib") : run,
            context.feederDropPercent(),
            context.feederMissing(),
            context.feederNote()));
    findings.add(
        InterruptingRating.assess(device, context.availableFaultKiloAmps(), context.faultBasis()));
    findings.add(DwellingProtection.groundFault(circuit, context.u0(), context.dwelling()));
    findings.add(DwellingProtection.arcFault(circuit, context.u0(), context.dwelling()));
    return findings;
  }

  static VoltageDrop.Run branchRun(
      CircuitContext context, CircuitSpec circuit, Double designCurrentAmps) {
    if (designCurrentAmps == null) {
      return VoltageDrop.Run.missing("design current Ib");
    }
    if (circuit.position() == null) {
      return VoltageDrop.Run.missing("position");
    }
    if (circuit.cable() == null) {
      return VoltageDrop.Run.missing("conductor size");
    }
    return VoltageDrop.of(
        circuit.cable(),
        designCurrentAmps,
        VoltageDrop.powerFactor(
            context.system(), context.u0(), circuit.position(), circuit.loads()),
        circuit.position() == PhasePosition.THREE_POLE,
        MotorCircuit.circuitVolts(context.system(), context.u0(), circuit.position()));
  }

  private static Finding motorCircuitProtection(CheckKind check, String reference) {
    return Finding.pass(
        check,
        "motor branch circuit: its conductors are protected under Article 430 (240.4(G)); see the"
            + " motor conductor and breaker findings",
        List.of(),
        reference + ", 240.4(G)");
  }

  /** The ampacity the checks used, A, or null when it could not be worked out. */
  public static Double ampacityAmps(CircuitSpec circuit) {
    if (circuit.device() == null) {
      return null;
    }
    Ampacity a =
        Ampacity.of(
            Conductor.of(circuit.cable()), circuit.cable(), circuit.position(), circuit.device());
    return a.missing == null ? a.allowableAmps() : null;
  }

  // --- poles

  static Finding poles(PhasePosition position, DeviceSpec device) {
    if (position == null) {
      return Finding.notAssessed(CheckKind.POLE_COUNT, "position", REF_POLES);
    }
    int needed = position.poles();
    List<Quantity> values =
        List.of(new Quantity("poles", device.poles(), ""), new Quantity("position", needed, ""));
    if (device.poles() < needed) {
      return new Finding(
          CheckKind.POLE_COUNT,
          Verdict.DANGER,
          device.poles() + "-pole device on a " + needed + "-pole position",
          values,
          REF_POLES,
          "fit a " + needed + "-pole breaker (common trip)");
    }
    return Finding.pass(
        CheckKind.POLE_COUNT,
        needed + "-pole device on a " + needed + "-pole position",
        values,
        REF_POLES);
  }

  // --- 240.6(A)

  static Finding standardRating(DeviceSpec device) {
    if (device.ratedCurrentAmps() == null) {
      return Finding.notAssessed(CheckKind.STANDARD_RATING, "device rating In", REF_STANDARD);
    }
    double in = device.ratedCurrentAmps();
    List<Quantity> values = List.of(new Quantity("In", in, "A"));
    if (OvercurrentLimits.isStandardRating(in, device.kind() == DeviceKind.FUSE)) {
      return Finding.pass(
          CheckKind.STANDARD_RATING,
          "In = " + fmt(in) + " A is a standard rating",
          values,
          REF_STANDARD);
    }
    return new Finding(
        CheckKind.STANDARD_RATING,
        Verdict.ADVICE,
        "In = " + fmt(in) + " A is not a standard rating",
        values,
        REF_STANDARD,
        "check the recorded rating; choose a standard rating");
  }

  // --- 240.4(D)

  static Finding smallConductor(Conductor conductor, DeviceSpec device) {
    if (conductor.missing != null) {
      return conductor.notAssessed(CheckKind.SMALL_CONDUCTOR, REF_SMALL);
    }
    if (device.ratedCurrentAmps() == null) {
      return Finding.notAssessed(CheckKind.SMALL_CONDUCTOR, "device rating In", REF_SMALL);
    }
    Integer limit =
        OvercurrentLimits.smallConductorLimitAmps(conductor.size, conductor.cable.material());
    double in = device.ratedCurrentAmps();
    if (limit == null) {
      return Finding.pass(
          CheckKind.SMALL_CONDUCTOR,
          conductor.size.label() + " is not a small conductor of 240.4(D)",
          List.of(new Quantity("In", in, "A")),
          REF_SMALL);
    }
    List<Quantity> values =
        List.of(new Quantity("In", in, "A"), new Quantity("240.4(D) limit", limit, "A"));
    String what = conductor.size.label() + " " + materialWord(conductor);
    if (in > limit + 1e-9) {
      return new Finding(
          CheckKind.SMALL_CONDUCTOR,
          Verdict.DANGER,
          fmt(in) + " A breaker on " + what + ": above the " + limit + " A limit",
          values,
          REF_SMALL,
          "fit a breaker of at most " + limit + " A or a larger conductor");
    }
    return Finding.pass(
        CheckKind.SMALL_CONDUCTOR, fmt(in) + " A ≤ " + limit + " A for " + what, values, REF_SMALL);
  }

  // --- 240.4 with 310.16 / 310.15

  static Finding ampacityFinding(Ampacity a, DeviceSpec device, boolean receptacles) {
    if (a.missing != null) {
      return Finding.notAssessed(CheckKind.CONDUCTOR_AMPACITY, a.missing, REF_AMPACITY);
    }
    if (a.tooHot != null) {
      return new Finding(
          CheckKind.CONDUCTOR_AMPACITY,
          Verdict.DANGER,
          a.tooHot,
          List.of(),
          REF_AMPACITY,
          "use a conductor with a higher temperature rating or change the route");
    }
    double in = device.ratedCurrentAmps();
    List<Quantity> values =
        List.of(
            new Quantity("In", in, "A"),
            new Quantity("Table 310.16 (" + a.insulationColumn + " °C)", a.tableAmps, "A"),
            new Quantity("ambient factor", a.ambientFactor, ""),
            new Quantity("adjustment factor", a.adjustmentFactor, ""),
            new Quantity("ampacity", a.correctedAmps(), "A"));
    String assumed = a.assumptions();
    if (in <= a.correctedAmps() + 1e-9) {
      return Finding.pass(
          CheckKind.CONDUCTOR_AMPACITY,
          "In = " + fmt(in) + " A ≤ ampacity " + fmt(a.correctedAmps()) + " A" + assumed,
          values,
          REF_AMPACITY);
    }
    if (nextHigherAllowed(in, a.correctedAmps(), receptacles)) {
      return Finding.pass(
          CheckKind.CONDUCTOR_AMPACITY,
          "In = "
              + fmt(in)
              + " A is the next standard rating above the ampacity "
              + fmt(a.correctedAmps())
              + " A (240.4(B))"
              + assumed,
          values,
          REF_AMPACITY);
    }
    return new Finding(
        CheckKind.CONDUCTOR_AMPACITY,
        Verdict.DANGER,
        "In = "
            + fmt(in)
            + " A above the conductor's ampacity "
            + fmt(a.correctedAmps())
            + " A"
            + assumed,
        values,
        REF_AMPACITY,
        "fit a smaller breaker or a larger conductor");
  }

  // --- 110.14(C)

  static Finding terminationFinding(Ampacity a, DeviceSpec device, boolean receptacles) {
    return terminationFinding(a, device, receptacles, null);
  }

  static Finding terminationFinding(
      Ampacity a, DeviceSpec device, boolean receptacles, MotorCircuit.Duty motors) {
    if (a.missing != null) {
      return Finding.notAssessed(CheckKind.TERMINATION_TEMPERATURE, a.missing, REF_TERMINATION);
    }
    if (motors != null) {
      // a motor circuit's conductor is held to 125 % of the full-load current, not to In
      double needed = motors.requiredConductorAmps();
      List<Quantity> values =
          List.of(
              new Quantity("required", needed, "A"),
              new Quantity(
                  "Table 310.16 (" + a.terminationColumn + " °C)", a.terminationAmps, "A"));
      String text =
          fmt(needed)
              + " A (430.22) against the "
              + a.terminationColumn
              + " °C ampacity "
              + a.terminationAmps
              + " A (terminations assumed rated "
              + a.terminationColumn
              + " °C, equipment not marked otherwise)";
      if (needed <= a.terminationAmps + 1e-9) {
        return Finding.pass(CheckKind.TERMINATION_TEMPERATURE, text, values, REF_TERMINATION);
      }
      return new Finding(
          CheckKind.TERMINATION_TEMPERATURE,
          Verdict.WARNING,
          text + ": too small",
          values,
          REF_TERMINATION,
          "use a larger conductor, or record terminations listed for a higher temperature");
    }
    double in = device.ratedCurrentAmps();
    List<Quantity> values =
        List.of(
            new Quantity("In", in, "A"),
            new Quantity("Table 310.16 (" + a.terminationColumn + " °C)", a.terminationAmps, "A"));
    String basis =
        " (terminations assumed rated "
            + a.terminationColumn
            + " °C: 110.14(C)(1)"
            + (a.terminationColumn == 60 ? "(a), circuit ≤ 100 A or 14–1 AWG" : "(b)")
            + ", equipment not marked otherwise)";
    if (in <= a.terminationAmps + 1e-9 || nextHigherAllowed(in, a.terminationAmps, receptacles)) {
      return Finding.pass(
          CheckKind.TERMINATION_TEMPERATURE,
          "In = "
              + fmt(in)
              + " A within the "
              + a.terminationColumn
              + " °C ampacity "
              + fmt(a.terminationAmps)
              + " A"
              + basis,
          values,
          REF_TERMINATION);
    }
    return new Finding(
        CheckKind.TERMINATION_TEMPERATURE,
        Verdict.WARNING,
        "In = "
            + fmt(in)
            + " A above the "
            + a.terminationColumn
            + " °C ampacity "
            + fmt(a.terminationAmps)
            + " A"
            + basis,
        values,
        REF_TERMINATION,
        "use a larger conductor, or record terminations listed for a higher temperature");
  }

  // --- 210.19(A), 210.20(A), 215.2(A), 215.3

  static Finding continuous(
      SupplySystem system,
      double u0,
      CircuitSpec circuit,
      Double designCurrentAmps,
      Ampacity a,
      DeviceSpec device) {
    boolean feeder = circuit.feedsBoardId() != null;
    String reference = feeder ? REF_FEEDER : REF_BRANCH;
    if (designCurrentAmps == null) {
      return Finding.notAssessed(CheckKind.CONTINUOUS_LOAD, "design current Ib", reference);
    }
    if (device.ratedCurrentAmps() == null) {
      return Finding.notAssessed(CheckKind.CONTINUOUS_LOAD, "device rating In", reference);
    }
    double perAmp = LinePhasors.voltAmperesPerAmp(system, circuit.position(), u0);
    double continuousAmps = 0.0;
    for (LoadSpec load : circuit.loads()) {
      if (load.continuous()) {
        ConnectedLoad connected = ConnectedLoad.ofPerAmp(load, perAmp);
        if (connected.isAssessed()) {
          continuousAmps += connected.apparentVoltAmperes() / perAmp;
        }
      }
    }
    // non-continuous + 125 % continuous; when diversity brought Ib below the continuous load, the
    // continuous load is taken whole (the safe side)
    double required = Math.max(designCurrentAmps, continuousAmps) + 0.25 * continuousAmps;
    double in = device.ratedCurrentAmps();
    List<Quantity> values = new ArrayList<>();
    values.add(new Quantity("Ib", designCurrentAmps, "A"));
    values.add(new Quantity("continuous", continuousAmps, "A"));
    values.add(new Quantity("required", required, "A"));
    values.add(new Quantity("In", in, "A"));
    List<String> short_ = new ArrayList<>();
    if (in + 1e-9 < required) {
      short_.add("breaker " + fmt(in) + " A");
    }
    if (a.missing == null && a.tooHot == null) {
      double conductorAmps = Math.min(a.tableAmps * a.ambientFactor, a.terminationAmps);
      values.add(new Quantity("conductor", conductorAmps, "A"));
      if (conductorAmps + 1e-9 < required) {
        short_.add("conductor " + fmt(conductorAmps) + " A");
      }
    }
    String load =
        "Ib "
            + fmt(designCurrentAmps)
            + " A with "
            + fmt(continuousAmps)
            + " A continuous needs "
            + fmt(required)
            + " A";
    if (!short_.isEmpty()) {
      return new Finding(
          CheckKind.CONTINUOUS_LOAD,
          Verdict.WARNING,
          load + ": " + String.join(", ", short_) + " too small",
          values,
          reference,
          "rate the breaker and conductor for 125 % of the continuous load");
    }
    if (a.missing != null) {
      return Finding.notAssessed(CheckKind.CONTINUOUS_LOAD, a.missing, reference);
    }
    return Finding.pass(
        CheckKind.CONTINUOUS_LOAD, load + ": breaker and conductor suffice", values, reference);
  }

  private static boolean nextHigherAllowed(double in, double ampacity, boolean receptacles) {
    if (receptacles || in > NEXT_HIGHER_LIMIT_AMPS) {
      return false;
    }
    Integer next = OvercurrentLimits.nextStandardRatingAtOrAbove(ampacity);
    return next != null && Math.abs(next - in) < 1e-9;
  }

  private static boolean hasReceptacleLoads(CircuitSpec circuit) {
    // 240.4(B)(1): not for a branch circuit supplying more than one receptacle for cord-and-plug
    // loads; a circuit with any socket-outlet load is taken as one (the safe side)
    return circuit.loads().stream().anyMatch(l -> l.category() == LoadCategory.SOCKET_OUTLETS)
        || circuit.loads().isEmpty();
  }

  private static String materialWord(Conductor conductor) {
    return switch (conductor.cable.material()) {
      case COPPER -> "copper";
      case ALUMINIUM -> "aluminum";
    };
  }

  public static String fmt(double value) {
    return new Quantity("", value, "").toString().substring(3);
  }

  /** A circuit's conductor as an NEC size, or what is missing. */
  public record Conductor(CableSpec cable, ConductorSize size, String missing) {
    public static Conductor of(CableSpec cable) {
      if (cable == null || cable.lineCsaSquareMillimetres() == null) {
        return new Conductor(cable, null, "conductor size");
      }
      if (cable.material() == null) {
        return new Conductor(cable, null, "conductor material");
      }
      Optional<ConductorSize> size =
          ConductorSize.ofSquareMillimetres(cable.lineCsaSquareMillimetres());
      return size.map(s -> new Conductor(cable, s, null))
          .orElseGet(
              () ->
                  new Conductor(
                      cable,
                      null,
                      "an AWG or kcmil conductor size ("
                          + fmt(cable.lineCsaSquareMillimetres())
                          + " mm² is none)"));
    }

    Finding notAssessed(CheckKind check, String reference) {
      return Finding.notAssessed(check, missing, reference);
    }
  }

  /** Ampacity of a conductor in its conditions. */
  record Ampacity(
      String missing,
      String tooHot,
      int insulationColumn,
      boolean insulationAssumed,
      int tableAmps,
      double ambientFactor,
      double adjustmentFactor,
      int currentCarryingConductors,
      int terminationColumn,
      int terminationAmps) {

    static Ampacity missing(String what) {
      return new Ampacity(what, null, 0, false, 0, 0, 0, 0, 0, 0);
    }

    double correctedAmps() {
      return tableAmps * ambientFactor * adjustmentFactor;
    }

    /**
     * The figure a breaker is set against: corrected ampacity, never above the termination column.
     */
    double allowableAmps() {
      return Math.min(correctedAmps(), terminationAmps);
    }

    String assumptions() {
      StringBuilder text = new StringBuilder();
      text.append("; ").append(currentCarryingConductors).append(" current-carrying conductors");
      if (insulationAssumed) {
        text.append("; 70 °C insulation assessed in the 60 °C column (assumed)");
      }
      return text.toString();
    }

    static Ampacity of(
        Conductor conductor, CableSpec cable, PhasePosition position, DeviceSpec device) {
      if (conductor.missing != null) {
        return missing(conductor.missing);
      }
      if (device.ratedCurrentAmps() == null) {
        return missing("device rating In");
      }
      if (cable.insulation() == null) {
        return missing("insulation temperature rating");
      }
      if (cable.ambientCelsius() == null) {
        return missing("ambient temperature");
      }
      if (cable.groupedCircuits() == null) {
        return missing("number of circuits grouped together");
      }
      if (position == null) {
        return missing("position");
      }
      // Table 310.16 has 60, 75 and 90 °C columns; a 70 °C conductor is read in the 60 °C one
      boolean assumed = cable.insulation() == Insulation.THERMOPLASTIC_70;
      int column = cable.insulation() == Insulation.THERMOSETTING_90 ? 90 : 60;
      Integer table = AmpacityTable.ampacityAmps(conductor.size, cable.material(), column);
      if (table == null) {
        return missing("a Table 310.16 entry for " + conductor.size.label() + " aluminum");
      }
      Double ambient = AmbientCorrection.factor(cable.ambientCelsius(), column);
      // 310.15(E)(1): the neutral of a balanced three-phase circuit is not counted; a two-wire
      // line-to-neutral or line-to-line circuit has two current-carrying conductors
      int perCircuit = position == PhasePosition.THREE_POLE ? 3 : 2;
      int conductors = perCircuit * Math.max(1, cable.groupedCircuits());
      double in = device.ratedCurrentAmps();
      int termination = in <= 100.0 || conductor.size.isOneAwgOrSmaller() ? 60 : 75;
      Integer terminationAmps =
          AmpacityTable.ampacityAmps(conductor.size, cable.material(), termination);
      if (ambient == null) {
        return new Ampacity(
            null,
            "ambient "
                + fmt(cable.ambientCelsius())
                + " °C is beyond the "
                + column
                + " °C conductor's rating",
            column,
            assumed,
            table,
            0,
            0,
            conductors,
            termination,
            terminationAmps);
      }
      return new Ampacity(
          null,
          null,
          column,
          assumed,
          table,
          ambient,
          ConductorAdjustment.factor(conductors),
          conductors,
          termination,
          terminationAmps);
    }
  }
}
