package com.wayledger.loadlog;

import com.wayledger.board.BoardForm;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.SiteForm;
import java.util.UUID;

/**
 * Forms for tests that store a site of their own (load log, estate findings); figures are chosen
 * per test and explained there.
 */
public final class LogFixtures {

  private LogFixtures() {}

  public static SiteForm site() {
    return new SiteForm(
        "Log test " + UUID.randomUUID(),
        null,
        EarthingSystem.TN_S,
        230.0,
        3,
        50.0,
        null,
        null,
        null,
        null,
        null,
        null);
  }

  /** A three-phase board fed from the origin with a 63 A incomer, no diversity method. */
  public static BoardForm board(String reference, double incomerAmps) {
    return new BoardForm(
        reference,
        "Test room",
        3,
        6,
        100.0,
        DeviceKind.MCCB,
        null,
        incomerAmps,
        3,
        10.0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0,
        1.0,
        null,
        null,
        null,
        null);
  }

  /** An in-use single-pole circuit with one load of {@code watts} at unity power factor. */
  public static CircuitForm circuit(
      int way, PhasePosition position, String description, double watts) {
    return new CircuitForm(
        way,
        position,
        description,
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        TripCurve.B,
        32.0,
        1,
        6.0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        description,
        LoadCategory.FIXED_APPLIANCE,
        1,
        watts,
        RatingUnit.W,
        1.0,
        null);
  }

  public static LoadForm load(String description, double watts) {
    return new LoadForm(
        description, LoadCategory.FIXED_APPLIANCE, 1, watts, RatingUnit.W, 1.0, null, null, false);
  }
}
