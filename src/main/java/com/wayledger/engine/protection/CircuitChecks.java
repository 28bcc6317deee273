package com.wayledger.engine.protection;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.cable.CableRating;
import com.wayledger.engine.protection.cable.ConductorResistance;
import com.wayledger.engine.protection.cable.CurrentCapacity;
import com.wayledger.engine.protection.cable.VoltageDrop;
import com.wayledger.engine.protection.check.BreakingCapacityCheck;
import com.wayledger.engine.protection.check.CableProtectionCheck;
import com.wayledger.engine.protection.check.LoopImpedanceCheck;
import com.wayledger.engine.protection.check.OverloadCheck;
import com.wayledger.engine.protection.check.ResidualCurrentRules;
import com.wayledger.engine.protection.check.RingFinalCheck;
import com.wayledger.engine.protection.check.SocketRcdCheck;
import com.wayledger.engine.protection.check.StartUpSurge;
import com.wayledger.engine.protection.check.SurgeCheck;
import com.wayledger.engine.protection.check.VoltageDropCheck;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.device.MccbSettings;
import com.wayledger.engine.protection.fault.BoardFaultLevel;
import com.wayledger.engine.protection.fault.LoopImpedance;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Runs every circuit-level check on one way, turning missing inputs into "not assessed" findings.
 */
final class CircuitChecks {

  private CircuitChecks() {}

  static CircuitFindings assess(
      SupplySpec supply,
      CircuitSpec circuit,
      BoardFaultLevel board,
      Double designCurrentAmps,
      MccbSettings mccb,
      ProtectionSettings settings) {
    DeviceSpec device = circuit.device();
    List<Finding> findings = new ArrayList<>();
    SourcedValue zs = LoopImpedance.of(circuit, board);
    if (circuit.status() != WayStatus.IN_USE) {
      // a spare device still has to survive a fault at the board
      if (device != null) {
        findings.add(
            BreakingCapacityCheck.assess(
                device.kind(), device.breakingCapacityKiloAmps(), board.faultCurrentKiloAmps()));
      }
      return new CircuitFindings(circuit.id(), circuit.wayNumber(), zs, null, null, null, findings);
    }
    double u0 = supply.nominalVoltageToEarthVolts();
    String ibMissing = IB_FROM_DEMAND;
    if (circuit.loads().isEmpty()
        && circuit.feedsBoardId() == null
        && (designCurrentAmps == null || designCurrentAmps == 0.0)) {
      // an in-use way with nothing recorded on it: its current is unknown, not 0 A (a caller that
      // knows Ib otherwise, e.g. from a measurement, passes it)
      designCurrentAmps = null;
      ibMissing = NO_LOADS;
    }
    boolean threePole = circuit.position() == PhasePosition.THREE_POLE;
    Resolved<DeviceCharacteristic> overcurrent =
        DeviceCharacteristic.of(device, mccb, settings.mccbInstantaneousMultiple());
    Resolved<CableRating> rating = CurrentCapacity.of(circuit.cable(), threePole ? 3 : 2);

    findings.add(overload(designCurrentAmps, ibMissing, device, overcurrent));
    Finding protection =
        circuit.ringFinal()
            ? ringCableProtection(circuit, overcurrent, rating)
            : cableProtection(circuit, overcurrent, rating, threePole ? 3 : 2);
    if (rating.isKnown() && rating.value().assumption() != null) {
      protection = assumed(protection, rating.value().assumption());
    }
    findings.add(protection);
    findings.add(
        device == null
            ? Finding.notAssessed(
                CheckKind.BREAKING_CAPACITY, "protective device", BreakingCapacityCheck.REFERENCE)
            : BreakingCapacityCheck.assess(
                device.kind(), device.breakingCapacityKiloAmps(), board.faultCurrentKiloAmps()));

    Double ownResidual = residualOf(device);
    Double residual = ownResidual != null ? ownResidual : board.upstreamResidualMilliAmps();
    boolean finalCircuit =
        circuit.feedsBoardId() == null
            && (device == null
                || device.ratedCurrentAmps() == null
                || device.ratedCurrentAmps() <= settings.finalCircuitMaxRatedAmps());
    Finding loop =
        LoopImpedanceCheck.assess(
            supply.earthingSystem(), u0, zs, overcurrent, residual, finalCircuit, limits(settings));
    loop = resistanceAssumptions(loop, circuit, board);
    findings.add(circuit.ringFinal() ? RingFinalCheck.noted(loop, RingFinalCheck.LOOP_NOTE) : loop);

    Double totalDrop = null;
    Finding drop =
        voltageDrop(circuit, board, designCurrentAmps, ibMissing, u0, threePole, settings);
    drop = resistanceAssumptions(drop, circuit, board);
    if (drop.verdict() != Verdict.NOT_ASSESSED && !board.dropNotes().isEmpty()) {
      drop = RingFinalCheck.noted(drop, String.join("; ", board.dropNotes()));
    }
    if (circuit.ringFinal()) {
      drop = RingFinalCheck.noted(drop, RingFinalCheck.DROP_NOTE);
    }
    findings.add(drop);
    if (drop.verdict() != Verdict.NOT_ASSESSED) {
      totalDrop = drop.value("total drop");
    }

    OptionalDouble surge = StartUpSurge.peakAmps(circuit.loads(), u0, threePole);
    LoadSpec unrecordedSurge = SurgeCheck.surgeUnrecorded(circuit.loads());
    if (circuit.loads().isEmpty() && circuit.feedsBoardId() != null) {
      findings.add(
          Finding.notAssessedBecause(
              CheckKind.START_UP_SURGE,
              "a sub-board feeder: start-up surges are checked on the sub-board's own ways",
              SurgeCheck.REFERENCE));
    } else if (circuit.loads().isEmpty()) {
      findings.add(Finding.notAssessed(CheckKind.START_UP_SURGE, NO_LOADS, SurgeCheck.REFERENCE));
    } else if (unrecordedSurge != null) {
      findings.add(SurgeCheck.missingMultiple(unrecordedSurge));
    } else if (surge.isEmpty()) {
      findings.add(SurgeCheck.noSurgeRecorded());
    } else if (!overcurrent.isKnown()) {
      findings.add(
          Finding.notAssessedBecause(
              CheckKind.START_UP_SURGE, "no " + overcurrent.missing(), SurgeCheck.REFERENCE));
    } else {
      findings.add(SurgeCheck.assess(surge.getAsDouble(), overcurrent.value()));
    }

    // a submain is judged by the rules for its sub-board's circuits, not by a location of its own
    boolean feedsFinalEquipment = circuit.feedsBoardId() == null;
    ResidualCurrentRules.Rule rcdRule =
        feedsFinalEquipment
            ? ResidualCurrentRules.forCircuit(circuit.loads(), circuit.location())
            : ResidualCurrentRules.forLoads(circuit.loads());
    if (feedsFinalEquipment
        && ResidualCurrentRules.needsLocation(
            circuit.loads(),
            circuit.location(),
            device == null ? null : device.ratedCurrentAmps())) {
      findings.add(SocketRcdCheck.locationNotRecorded());
    } else if (rcdRule != null) {
      findings.add(
          socketRcd(rcdRule, device, ownResidual, board.upstreamResidualMilliAmps(), settings));
    }
    return new CircuitFindings(
        circuit.id(),
        circuit.wayNumber(),
        zs,
        rating.isKnown() ? rating.value().capacityAmps() : null,
        totalDrop,
        surge.isPresent() ? surge.getAsDouble() : null,
        findings);
  }

  static final String IB_FROM_DEMAND = "design current Ib (from the demand calculation)";

  static final String NO_LOADS =
      "loads (an in-use way with no load recorded has an unknown design current Ib, not 0 A)";

  /**
   * A finding that rests on an input taken on the safe side, naming it; unchanged if unassessed.
   */
  static Finding assumed(Finding finding, String assumption) {
    if (finding.verdict() == Verdict.NOT_ASSESSED) {
      return finding;
    }
    return new Finding(
        finding.check(),
        finding.verdict(),
        finding.summary() + " (assumed — " + assumption + ")",
        finding.values(),
        finding.reference(),
        finding.remedy().isEmpty()
            ? "record the actual value to replace the assumption"
            : finding.remedy());
  }

  /**
   * Names the insulation taken as 90 °C for resistances (the circuit's own cable, or a submain up
   * the tree) in a Zs or voltage-drop finding.
   */
  private static Finding resistanceAssumptions(
      Finding finding, CircuitSpec circuit, BoardFaultLevel board) {
    List<String> assumed = new ArrayList<>(board.assumptions());
    if (circuit.cable() != null && circuit.cable().insulation() == null) {
      assumed.add(0, "circuit cable: " + ConductorResistance.ASSUMED_HOT_INSULATION);
    }
    return assumed.isEmpty() ? finding : assumed(finding, String.join("; ", assumed));
  }

  static LoopImpedanceCheck.Limits limits(ProtectionSettings s) {
    return new LoopImpedanceCheck.Limits(
        s.minimumVoltageFactor(), s.measuredLoopImpedanceFraction(), s.touchVoltageLimitVolts());
  }

  private static Finding overload(
      Double ib, String ibMissing, DeviceSpec device, Resolved<DeviceCharacteristic> overcurrent) {
    if (ib == null) {
      return Finding.notAssessed(CheckKind.WAY_OVERLOAD, ibMissing, OverloadCheck.REFERENCE);
    }
    if (overcurrent.isKnown()) {
      return OverloadCheck.assess(ib, overcurrent.value().overloadSettingAmps());
    }
    // a fuse has no characteristic here, but its rating is enough for Ib ≤ In
    if (device != null && device.kind() == DeviceKind.FUSE && device.ratedCurrentAmps() != null) {
      return OverloadCheck.assess(ib, device.ratedCurrentAmps());
    }
    return Finding.notAssessedBecause(
        CheckKind.WAY_OVERLOAD, "no " + overcurrent.missing(), OverloadCheck.REFERENCE);
  }

  private static Finding cableProtection(
      CircuitSpec circuit,
      Resolved<DeviceCharacteristic> overcurrent,
      Resolved<CableRating> rating,
      int loadedConductors) {
    if (!overcurrent.isKnown()) {
      return Finding.notAssessedBecause(
          CheckKind.CABLE_PROTECTION,
          "no " + overcurrent.missing(),
          CableProtectionCheck.REFERENCE);
    }
    DeviceCharacteristic d = overcurrent.value();
    if (!rating.isKnown()) {
      // a size outside the table can still be proved too small by the next size up
      Finding proved =
          CurrentCapacity.upperBound(circuit.cable(), loadedConductors)
              .map(
                  bound ->
                      CableProtectionCheck.provenBySize(
                          d.overloadSettingAmps(),
                          d.conventionalTrippingAmps(),
                          circuit.cable().lineCsaSquareMillimetres(),
                          bound.csaSquareMillimetres(),
                          bound.rating()))
              .orElse(null);
      return proved != null
          ? proved
          : Finding.notAssessed(
              CheckKind.CABLE_PROTECTION, rating.missing(), CableProtectionCheck.REFERENCE);
    }
    return CableProtectionCheck.assess(
        d.overloadSettingAmps(), d.conventionalTrippingAmps(), rating.value());
  }

  private static Finding ringCableProtection(
      CircuitSpec circuit,
      Resolved<DeviceCharacteristic> overcurrent,
      Resolved<CableRating> rating) {
    DeviceSpec device = circuit.device();
    Double ratedAmps =
        overcurrent.isKnown()
            ? Double.valueOf(overcurrent.value().overloadSettingAmps())
            : device != null && device.kind() == DeviceKind.FUSE ? device.ratedCurrentAmps() : null;
    if (ratedAmps == null) {
      String missing = overcurrent.isKnown() ? "device rating In" : overcurrent.missing();
      return Finding.notAssessedBecause(
          CheckKind.CABLE_PROTECTION,
          "ring final circuit: no " + missing,
          RingFinalCheck.CABLE_REFERENCE);
    }
    if (!rating.isKnown()) {
      return Finding.notAssessed(
          CheckKind.CABLE_PROTECTION,
          rating.missing() + " of the ring final circuit",
          RingFinalCheck.CABLE_REFERENCE);
    }
    return RingFinalCheck.cableProtection(ratedAmps, circuit.cable(), rating.value());
  }

  private static Finding voltageDrop(
      CircuitSpec circuit,
      BoardFaultLevel board,
      Double ib,
      String ibMissing,
      double u0,
      boolean threePole,
      ProtectionSettings s) {
    boolean lighting =
        circuit.loads().stream().anyMatch(l -> l.category() == LoadCategory.LIGHTING);
    SourcedValue boardDrop = board.voltageDropFromOriginPercent();
    if (!boardDrop.isKnown()) {
      return Finding.notAssessed(
          CheckKind.VOLTAGE_DROP, boardDrop.missing(), VoltageDropCheck.REFERENCE);
    }
    if (ib == null) {
      return Finding.notAssessed(CheckKind.VOLTAGE_DROP, ibMissing, VoltageDropCheck.REFERENCE);
    }
    CableSpec cable = circuit.cable();
    if (cable == null) {
      return Finding.notAssessed(
          CheckKind.VOLTAGE_DROP, "circuit cable", VoltageDropCheck.REFERENCE);
    }
    if (cable.lengthMetres() == null) {
      return Finding.notAssessed(
          CheckKind.VOLTAGE_DROP, "cable length", VoltageDropCheck.REFERENCE);
    }
    Resolved<Double> mv =
        VoltageDrop.milliVoltsPerAmpMetre(
            cable.material(), cable.lineCsaSquareMillimetres(), cable.insulation(), threePole);
    if (!mv.isKnown()) {
      return Finding.notAssessed(CheckKind.VOLTAGE_DROP, mv.missing(), VoltageDropCheck.REFERENCE);
    }
    double nominal = threePole ? Math.sqrt(3.0) * u0 : u0;
    // a ring fed from both ends with the load at its mid-point: a quarter of the whole ring's
    // resistance
    double length =
        cable.lengthMetres() * (circuit.ringFinal() ? RingFinalCheck.MID_POINT_FRACTION : 1.0);
    double circuitDrop = VoltageDrop.percent(mv.value(), ib, length, nominal);
    return VoltageDropCheck.assess(
        boardDrop.value(), circuitDrop, s.voltageDropLimitPercent(lighting), lighting);
  }

  private static Finding socketRcd(
      ResidualCurrentRules.Rule rule,
      DeviceSpec device,
      Double own,
      Double upstream,
      ProtectionSettings s) {
    if (device == null || device.ratedCurrentAmps() == null) {
      return Finding.notAssessed(CheckKind.SOCKET_RCD, "device rating In", rule.reference());
    }
    if (rule.maxRatedAmps() != null) {
      return SocketRcdCheck.assess(
          device.ratedCurrentAmps(),
          own,
          upstream,
          s.socketRcdMaxRatedAmps(),
          s.socketRcdMaxResidualMilliAmps());
    }
    return SocketRcdCheck.assess(
        rule, device.ratedCurrentAmps(), own, upstream, s.socketRcdMaxResidualMilliAmps());
  }

  static Double residualOf(DeviceSpec device) {
    if (device == null || device.kind() == null || !device.kind().isResidualCurrent()) {
      return null;
    }
    return device.residualCurrentMilliAmps();
  }
}
