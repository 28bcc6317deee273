package com.wayledger.engine.protection;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.cable.CableRating;
import com.wayledger.engine.protection.cable.CurrentCapacity;
import com.wayledger.engine.protection.check.BreakingCapacityCheck;
import com.wayledger.engine.protection.check.CableProtectionCheck;
import com.wayledger.engine.protection.check.LoopImpedanceCheck;
import com.wayledger.engine.protection.check.OverloadCheck;
import com.wayledger.engine.protection.check.ResidualCurrentRules;
import com.wayledger.engine.protection.check.SocketRcdCheck;
import com.wayledger.engine.protection.check.StartUpSurge;
import com.wayledger.engine.protection.check.SurgeCheck;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.device.McbStandard;
import com.wayledger.engine.protection.fault.BoardFaultLevel;
import com.wayledger.engine.protection.fault.FaultLevels;
import com.wayledger.engine.protection.fault.LoopImpedance;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Proposes for a circuit the lowest-rated IEC 60898-1 breaker (rating first, then curve B, C, D,
 * then the smallest standard breaking capacity) that passes every check at once: Ib ≤ In ≤ Iz,
 * start-up surge below the instantaneous band, Zs within the limit for that curve, and breaking
 * capacity at least the fault current (with Ics covering it). An RCBO 30 mA type A is proposed
 * instead of an MCB where a socket-outlet circuit up to 32 A, or a TT circuit, has no
 * residual-current device upstream. The circuit's cable is kept as recorded; when no breaker fits,
 * the reasons say what would have to change.
 */
public final class DeviceProposer {

  /** IΔn proposed for additional protection, mA. */
  public static final double PROPOSED_RESIDUAL_MILLIAMPS = 30.0;

  private DeviceProposer() {}

  /**
   * The proposal for circuit {@code circuitId} of {@code site}, with its design current from {@code
   * loading}.
   */
  public static DeviceProposal propose(
      SiteSpec site, long circuitId, CircuitLoading loading, ProtectionSettings settings) {
    for (BoardSpec board : site.boards()) {
      for (CircuitSpec circuit : board.circuits()) {
        if (circuit.id() == circuitId) {
          BoardFaultLevel level = FaultLevels.of(site, Map.of()).get(board.id());
          return propose(
              site, circuit, level, loading == null ? null : loading.designCurrentAmps(), settings);
        }
      }
    }
    return new DeviceProposal(
        circuitId, null, List.of(), List.of("circuit " + circuitId + " is not on the site"));
  }

  static DeviceProposal propose(
      SiteSpec site,
      CircuitSpec circuit,
      BoardFaultLevel level,
      Double designCurrentAmps,
      ProtectionSettings settings) {
    long id = circuit.id();
    if (circuit.loads().isEmpty()
        && circuit.feedsBoardId() == null
        && (designCurrentAmps == null || designCurrentAmps == 0.0)) {
      return none(id, "missing " + CircuitChecks.NO_LOADS);
    }
    if (designCurrentAmps == null) {
      return none(id, "missing design current Ib (from the demand calculation)");
    }
    LoadSpec unrecordedSurge = SurgeCheck.surgeUnrecorded(circuit.loads());
    if (unrecordedSurge != null) {
      return none(id, SurgeCheck.missingMultiple(unrecordedSurge).summary());
    }
    if (circuit.ringFinal()) {
      return none(id, "ring final circuit: the proposer chooses devices for radial circuits only");
    }
    boolean threePole = circuit.position() == PhasePosition.THREE_POLE;
    Resolved<CableRating> rating = CurrentCapacity.of(circuit.cable(), threePole ? 3 : 2);
    if (!rating.isKnown()) {
      return none(id, "missing " + rating.missing());
    }
    SourcedValue zs = LoopImpedance.of(circuit, level);
    if (!zs.isKnown()) {
      return none(id, "missing " + zs.missing());
    }
    SourcedValue ka = level.faultCurrentKiloAmps();
    if (!ka.isKnown()) {
      return none(id, "missing " + ka.missing());
    }
    EarthingSystem earthing = site.supply().earthingSystem();
    if (earthing == null) {
      return none(id, "missing earthing system of the supply");
    }
    double u0 = site.supply().nominalVoltageToEarthVolts();
    OptionalDouble surge = StartUpSurge.peakAmps(circuit.loads(), u0, threePole);
    boolean finalCircuit = circuit.feedsBoardId() == null;
    ResidualCurrentRules.Rule rcdRule =
        !finalCircuit
            ? ResidualCurrentRules.forLoads(circuit.loads())
            : ResidualCurrentRules.needsLocation(circuit.loads(), circuit.location(), null)
                // where it is cannot be told: 30 mA on the safe side, named in the check
                ? ResidualCurrentRules.LOCATION_NOT_RECORDED
                : ResidualCurrentRules.forCircuit(circuit.loads(), circuit.location());
    // never below the breaking capacity fitted, unless a measured fault level proves a lower one
    double fittedIcn =
        circuit.device() != null
                && circuit.device().breakingCapacityKiloAmps() != null
                && ka.source() != com.wayledger.engine.protection.result.ValueSource.MEASURED
            ? circuit.device().breakingCapacityKiloAmps()
            : 0.0;
    Double upstreamResidual = level.upstreamResidualMilliAmps();
    boolean upstream30 =
        upstreamResidual != null && upstreamResidual <= settings.socketRcdMaxResidualMilliAmps();
    int poles = threePole ? 3 : 1;
    double iz = rating.value().capacityAmps();
    double ib = designCurrentAmps;

    List<String> reasons = new ArrayList<>();
    for (double in : McbStandard.STANDARD_RATINGS_AMPS) {
      if (in < ib) {
        continue;
      }
      if (in > iz) {
        reasons.add(
            reasons.isEmpty()
                ? "a larger cable is needed: the smallest rating not below Ib "
                    + fixed(ib)
                    + " A is "
                    + fixed(in)
                    + " A, above the cable's Iz "
                    + fixed(iz)
                    + " A"
                : "a larger cable is needed: no rating from Ib "
                    + fixed(ib)
                    + " A up to the cable's Iz "
                    + fixed(iz)
                    + " A passes (reasons above)");
        return new DeviceProposal(id, null, List.of(), reasons);
      }
      boolean rcbo =
          (rcdRule != null && rcdRule.covers(in) && !upstream30)
              || (earthing == EarthingSystem.TT && upstreamResidual == null);
      Double ownResidual = rcbo ? PROPOSED_RESIDUAL_MILLIAMPS : null;
      DeviceKind kind = rcbo ? DeviceKind.RCBO : DeviceKind.MCB;
      for (TripCurve curve : TripCurve.values()) {
        DeviceCharacteristic d = DeviceCharacteristic.miniature(kind, curve, in, ownResidual);
        String label = "type " + curve + " " + fixed(in) + " A";
        if (surge.isPresent() && surge.getAsDouble() >= d.lowestInstantaneousAmps()) {
          reasons.add(
              label
                  + ": start-up surge "
                  + fixed(surge.getAsDouble())
                  + " A reaches the instantaneous band from "
                  + fixed(d.lowestInstantaneousAmps())
                  + " A");
          continue;
        }
        Finding loop =
            LoopImpedanceCheck.assess(
                earthing,
                u0,
                zs,
                Resolved.of(d),
                ownResidual != null ? ownResidual : upstreamResidual,
                finalCircuit,
                CircuitChecks.limits(settings));
        if (loop.verdict() != Verdict.PASS) {
          reasons.add(
              label
                  + ": "
                  + loop.summary()
                  + " — a larger cable (lower R1+R2) is needed for this curve");
          continue;
        }
        Finding breaking = null;
        Double icn = null;
        for (double candidate : McbStandard.STANDARD_BREAKING_CAPACITIES_KILOAMPS) {
          if (candidate < fittedIcn - 1e-9) {
            continue;
          }
          Finding f = BreakingCapacityCheck.assess(kind, candidate, ka.value(), ka.source());
          if (f.verdict() == Verdict.PASS) {
            breaking = f;
            icn = candidate;
            break;
          }
        }
        if (breaking == null) {
          reasons.add(
              label
                  + ": fault current "
                  + fixed(ka.value())
                  + " kA is beyond the standard MCB breaking"
                  + " capacities (service capacity Ics of 25 kA is 12.5 kA)");
          continue;
        }
        List<Finding> checks = new ArrayList<>();
        checks.add(OverloadCheck.assess(ib, in));
        checks.add(CableProtectionCheck.assess(in, d.conventionalTrippingAmps(), rating.value()));
        checks.add(
            surge.isPresent()
                ? SurgeCheck.assess(surge.getAsDouble(), d)
                : SurgeCheck.noSurgeRecorded());
        checks.add(loop);
        checks.add(breaking);
        if (rcdRule == ResidualCurrentRules.LOCATION_NOT_RECORDED) {
          // not a pass: the check stays not assessed until the location is recorded
          reasons.add(
              "30 mA RCBO proposed because the "
                  + rcdRule.words()
                  + "; outdoor, bathroom, pool and sauna circuits need it ("
                  + rcdRule.reference()
                  + ")");
        } else if (rcdRule != null) {
          checks.add(
              SocketRcdCheck.assess(
                  rcdRule,
                  in,
                  ownResidual,
                  upstreamResidual,
                  settings.socketRcdMaxResidualMilliAmps()));
        }
        DeviceSpec device =
            new DeviceSpec(kind, curve, in, poles, icn, ownResidual, rcbo ? RcdType.A : null);
        return new DeviceProposal(id, device, checks, reasons);
      }
    }
    if (reasons.isEmpty()) {
      reasons.add(
          "design current "
              + fixed(ib)
              + " A is above the largest standard MCB rating (125 A): a moulded-case"
              + " breaker is needed, which the proposer does not choose");
    }
    return new DeviceProposal(id, null, List.of(), reasons);
  }

  private static DeviceProposal none(long id, String reason) {
    return new DeviceProposal(id, null, List.of(), List.of(reason));
  }

  private static String fixed(double v) {
    return v == Math.rint(v)
        ? String.valueOf((long) v)
        : String.format(java.util.Locale.ROOT, "%.2f", v);
  }
}
