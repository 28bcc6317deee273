package com.wayledger.engine.nec;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The NEC set's proposal for a circuit: a breaker at a 240.6(A) standard rating and an AWG or kcmil
 * conductor of the recorded metal, insulation and conditions that together pass every NEC check the
 * engine runs on the circuit ({@link NecCircuitChecks#assess(CircuitContext, CircuitSpec,
 * Double)}): 210.19(A)/210.20(A) or 215.2/215.3, 240.4 and 240.4(D), Table 310.16 with its
 * corrections, 110.14(C), and for a motor 430.22 and 430.52; the branch voltage-drop recommendation
 * where the length is recorded; the interrupting rating (the lowest common rating covering the
 * available fault current, never below the one fitted); and the GFCI or AFCI function the dwelling
 * location asks for. The lowest breaker is chosen and, for it, the smallest conductor; for a motor
 * circuit the largest breaker 430.52 allows, so that the motor can start. Candidates are judged by
 * running the checks themselves, so a proposal cannot fall below them.
 */
public final class NecDeviceProposer {

  /** Checks that may stay not assessed for reasons a breaker or conductor cannot change. */
  private static final Set<CheckKind> MAY_BE_NOT_ASSESSED =
      EnumSet.of(
          CheckKind.TOTAL_VOLTAGE_DROP,
          CheckKind.BRANCH_VOLTAGE_DROP,
          CheckKind.INTERRUPTING_RATING,
          CheckKind.GROUND_FAULT_PROTECTION,
          CheckKind.ARC_FAULT_PROTECTION,
          CheckKind.MOTOR_BREAKER);

  private NecDeviceProposer() {}

  /** The proposal for one circuit in its context, with its design current (null: not known). */
  public static DeviceProposal propose(
      CircuitSpec circuit, CircuitContext context, Double designCurrentAmps) {
    long id = circuit.id();
    if (circuit.loads().isEmpty()
        && circuit.feedsBoardId() == null
        && (designCurrentAmps == null || designCurrentAmps == 0.0)) {
      return none(id, "missing loads: no load recorded on the circuit");
    }
    if (designCurrentAmps == null) {
      return none(id, "missing design current Ib (from the demand calculation)");
    }
    if (circuit.position() == null) {
      return none(id, "missing position");
    }
    boolean motorsOnly = MotorCircuit.motorsOnly(context.system(), context.u0(), circuit);
    if (MotorCircuit.hasMotor(circuit)) {
      MotorCircuit.Duty duty = MotorCircuit.duty(context.system(), context.u0(), circuit);
      if (!duty.isAssessed()) {
        return none(id, "not assessed — " + duty.missing());
      }
    }
    CableSpec recorded = circuit.cable();
    if (recorded == null) {
      return none(id, "missing the conductor's insulation, ambient temperature and grouping");
    }
    if (recorded.insulation() == null) {
      return none(id, "missing insulation temperature rating");
    }
    if (recorded.ambientCelsius() == null) {
      return none(id, "missing ambient temperature");
    }
    if (recorded.groupedCircuits() == null) {
      return none(id, "missing number of circuits grouped together");
    }
    List<String> notes = new ArrayList<>();
    ConductorMaterial material = recorded.material();
    if (material == null) {
      material = ConductorMaterial.COPPER;
      notes.add("conductor metal not recorded: copper proposed");
    }
    Double interrupting = interruptingRating(circuit.device(), context, notes);
    if (interrupting == null && context.availableFaultKiloAmps() != null) {
      return none(
          id,
          "available fault current "
              + NecCircuitChecks.fmt(context.availableFaultKiloAmps())
              + " kA is beyond the interrupting ratings the proposer knows (200 kA)");
    }
    int poles = circuit.position().poles();
    List<Integer> ratings = new ArrayList<>(OvercurrentLimits.STANDARD_RATINGS_AMPS);
    if (motorsOnly) {
      MotorCircuit.Duty duty = MotorCircuit.duty(context.system(), context.u0(), circuit);
      if (duty.singleMotor()) {
        java.util.Collections.reverse(ratings);
        notes.add("motor: the largest breaker 430.52 allows, so that the motor can start");
      }
    }
    List<Finding> lastProblems = List.of();
    for (int rating : ratings) {
      if (rating + 1e-9 < designCurrentAmps) {
        continue;
      }
      for (ConductorSize size : ConductorSize.values()) {
        if (AmpacityTable.ampacityAmps(size, material, 60) == null) {
          continue;
        }
        CableSpec cable =
            new CableSpec(
                size.squareMillimetres(),
                recorded.protectiveCsaSquareMillimetres(),
                material,
                recorded.insulation(),
                recorded.lengthMetres(),
                recorded.installationMethod(),
                recorded.ambientCelsius(),
                recorded.groupedCircuits(),
                recorded.thermalInsulationMillimetres(),
                recorded.conduit());
        DeviceSpec device =
            new DeviceSpec(
                circuit.device() != null && circuit.device().kind() == DeviceKind.FUSE
                    ? DeviceKind.FUSE
                    : DeviceKind.MCCB,
                null,
                (double) rating,
                poles,
                interrupting,
                null,
                null,
                null);
        CircuitSpec trial = with(circuit, device, cable);
        device =
            device.withFaultInterrupter(
                DwellingProtection.needed(trial, context.u0(), context.dwelling()));
        trial = with(circuit, device, cable);
        List<Finding> findings = NecCircuitChecks.assess(context, trial, designCurrentAmps);
        List<Finding> problems = problems(findings);
        if (problems.isEmpty()) {
          List<String> reasons = new ArrayList<>(notes);
          List<Finding> passed = new ArrayList<>();
          for (Finding f : findings) {
            if (f.verdict() == Verdict.PASS) {
              passed.add(f);
            } else {
              reasons.add(f.check().title() + ": " + f.summary());
            }
          }
          return new DeviceProposal(id, device, passed, reasons, cable);
        }
        lastProblems = problems;
      }
    }
    List<String> reasons = new ArrayList<>(notes);
    reasons.add(
        "no standard breaker with a conductor up to 1000 kcmil passes every check; the last tried"
            + " failed on:");
    lastProblems.forEach(f -> reasons.add(f.check().title() + ": " + f.summary()));
    return new DeviceProposal(id, null, List.of(), reasons, null);
  }

  /** The findings that rule a candidate out. */
  static List<Finding> problems(List<Finding> findings) {
    List<Finding> problems = new ArrayList<>();
    for (Finding f : findings) {
      if (f.check() == CheckKind.TOTAL_VOLTAGE_DROP) {
        continue; // the feeders' share is not the branch circuit's to fix
      }
      if (f.isProblem()
          || (f.verdict() == Verdict.NOT_ASSESSED && !MAY_BE_NOT_ASSESSED.contains(f.check()))) {
        problems.add(f);
      }
    }
    return problems;
  }

  private static Double interruptingRating(
      DeviceSpec fitted, CircuitContext context, List<String> notes) {
    Double fittedRating = fitted == null ? null : fitted.breakingCapacityKiloAmps();
    if (context.availableFaultKiloAmps() == null) {
      notes.add(
          "interrupting rating "
              + (fittedRating == null
                  ? "not chosen"
                  : "kept at the fitted " + NecCircuitChecks.fmt(fittedRating) + " kA")
              + ": available fault current at the panelboard not recorded");
      return fittedRating;
    }
    Double covering = InterruptingRating.lowestCovering(context.availableFaultKiloAmps());
    if (covering == null) {
      return null;
    }
    return fittedRating != null && fittedRating > covering ? fittedRating : covering;
  }

  private static CircuitSpec with(CircuitSpec c, DeviceSpec device, CableSpec cable) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        device,
        cable,
        c.loads(),
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        c.ringFinal(),
        c.location());
  }

  private static DeviceProposal none(long id, String reason) {
    return new DeviceProposal(id, null, List.of(), List.of(reason), null);
  }

  /** Whether a device is one of the NEC set's (no IEC tripping curve). */
  public static boolean isNecDevice(DeviceSpec device) {
    return device.curve() == null && device.residualCurrentMilliAmps() == null;
  }

  /** The function the proposal fits where the location asks for one, for tests. */
  static FaultInterrupter neededFor(CircuitSpec circuit, double u0) {
    return DwellingProtection.needed(circuit, u0);
  }
}
