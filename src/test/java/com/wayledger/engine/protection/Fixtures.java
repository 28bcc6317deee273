package com.wayledger.engine.protection;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import java.util.List;

/** Small builders for test sites; the figures are chosen per test and explained there. */
final class Fixtures {

  private Fixtures() {}

  static SupplySpec supply(EarthingSystem earthing, Double zeOhms, Double faultKiloAmps) {
    return new SupplySpec(earthing, 230.0, 1, 50.0, zeOhms, faultKiloAmps, 100.0);
  }

  static CableSpec twinAndEarth(double line, double cpc, Double lengthMetres) {
    return new CableSpec(
        line,
        cpc,
        ConductorMaterial.COPPER,
        Insulation.THERMOPLASTIC_70,
        lengthMetres,
        InstallationMethod.C,
        30.0,
        1,
        0);
  }

  static DeviceSpec mcb(TripCurve curve, double amps) {
    return new DeviceSpec(DeviceKind.MCB, curve, amps, 1, 6.0, null, null);
  }

  static DeviceSpec rcbo(TripCurve curve, double amps, double milliAmps) {
    return new DeviceSpec(DeviceKind.RCBO, curve, amps, 1, 6.0, milliAmps, RcdType.A);
  }

  static LoadSpec amps(LoadCategory category, double a) {
    return new LoadSpec("load", category, 1, a, RatingUnit.A, 1.0, null, null, false);
  }

  static LoadSpec motor(double runningAmps, double surgeMultiple) {
    return new LoadSpec(
        "motor", LoadCategory.MOTOR, 1, runningAmps, RatingUnit.A, 0.85, surgeMultiple, 10.0, true);
  }

  static CircuitSpec circuit(long id, DeviceSpec device, CableSpec cable, List<LoadSpec> loads) {
    return new CircuitSpec(
        id,
        (int) id,
        PhasePosition.L1,
        "circuit " + id,
        WayStatus.IN_USE,
        false,
        device,
        cable,
        loads,
        null,
        null);
  }

  static CircuitSpec measured(CircuitSpec c, double zsOhms) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        c.device(),
        c.cable(),
        c.loads(),
        c.feedsBoardId(),
        zsOhms,
        c.ringFinal());
  }

  static CircuitSpec withDevice(CircuitSpec c, DeviceSpec device) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        device,
        c.cable(),
        c.loads(),
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        c.ringFinal());
  }

  /**
   * The same circuit recorded as a ring final circuit (its cable length is then the whole ring).
   */
  static CircuitSpec ring(CircuitSpec c) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        c.device(),
        c.cable(),
        c.loads(),
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        true);
  }

  /** A single-phase board at the origin (no submain, no incomer recorded), 100 A busbar. */
  static BoardSpec originBoard(long id, List<CircuitSpec> circuits) {
    return new BoardSpec(
        id, "DB-" + id, 1, 12, 100.0, null, null, null, 10.0, 1.0, null, null, null, circuits);
  }

  static SiteSpec site(SupplySpec supply, BoardSpec... boards) {
    return new SiteSpec(1, "test", supply, null, List.of(boards));
  }

  /**
   * TN-C-S, Ze 0.35 Ω, 6 kA at the origin: the usual UK values (BS 7671 / IET On-Site Guide, from
   * memory).
   */
  static SiteSpec oneCircuitSite(CircuitSpec circuit) {
    return site(supply(EarthingSystem.TN_C_S, 0.35, 6.0), originBoard(10, List.of(circuit)));
  }
}
