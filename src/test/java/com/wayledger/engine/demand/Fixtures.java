package com.wayledger.engine.demand;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import java.util.List;

/** Small builders for engine inputs used by the demand tests. */
final class Fixtures {

  static final SupplySpec SUPPLY_230 =
      new SupplySpec(EarthingSystem.TN_C_S, 230.0, 3, 50.0, 0.35, 16.0, 100.0);

  private Fixtures() {}

  static LoadSpec load(
      LoadCategory category, int quantity, double rating, RatingUnit unit, double powerFactor) {
    return new LoadSpec(
        category + " load", category, quantity, rating, unit, powerFactor, null, null, false);
  }

  static LoadSpec watts(LoadCategory category, double watts) {
    return load(category, 1, watts, RatingUnit.W, 1.0);
  }

  static LoadSpec amps(LoadCategory category, double amps) {
    return load(category, 1, amps, RatingUnit.A, 1.0);
  }

  static CircuitSpec circuit(long id, int way, PhasePosition position, LoadSpec... loads) {
    return new CircuitSpec(
        id,
        way,
        position,
        "way " + way,
        WayStatus.IN_USE,
        false,
        mcb(32.0),
        null,
        List.of(loads),
        null,
        null);
  }

  static CircuitSpec feeder(long id, int way, PhasePosition position, long childBoardId) {
    return new CircuitSpec(
        id,
        way,
        position,
        "submain",
        WayStatus.IN_USE,
        false,
        mcb(63.0),
        null,
        List.of(),
        childBoardId,
        null);
  }

  static DeviceSpec mcb(Double ratedAmps) {
    return new DeviceSpec(DeviceKind.MCB, TripCurve.B, ratedAmps, 1, 6.0, null, null);
  }

  static BoardSpec board(
      long id,
      int phases,
      Long parent,
      String methodKey,
      Double incomerAmps,
      List<CircuitSpec> circuits) {
    return new BoardSpec(
        id,
        "DB" + id,
        phases,
        36,
        null,
        incomerAmps == null ? null : mcb(incomerAmps),
        parent,
        null,
        10.0,
        1.0,
        methodKey,
        null,
        null,
        circuits);
  }

  static BoardSpec board(int phases, String methodKey, CircuitSpec... circuits) {
    return board(1, phases, null, methodKey, 100.0, List.of(circuits));
  }

  static SiteSpec site(BoardSpec... boards) {
    return new SiteSpec(1, "site", SUPPLY_230, DiversityMethods.NONE, List.of(boards));
  }

  static BoardDemand evaluate(BoardSpec board) {
    return DemandEngine.evaluateBoard(board, SUPPLY_230, DiversityMethods.builtIn(), null);
  }

  static BoardDemand evaluate(BoardSpec board, DwellingParameters dwelling) {
    return DemandEngine.evaluateBoard(
        board, SUPPLY_230, DiversityMethods.builtIn(), null, DemandSettings.DEFAULTS, dwelling);
  }
}
