package com.wayledger.support;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import java.util.UUID;

/**
 * An invented NEC-set site with a 42-space 120/240 V panelboard holding 120 V breakers, a two-pole
 * 240 V water heater and free spaces, stored through the services (for page tests that need a
 * panelboard to look at; the journey test types its own in the browser).
 */
public final class NecPanels {

  private NecPanels() {}

  /** An invented NEC site on a 208Y/120 V service, named {@code name} and a random suffix. */
  public static Site wyeSite(SiteService sites, String name) {
    return necSite(sites, name, 3, SupplySystem.WYE_208Y_120);
  }

  private static Site necSite(SiteService sites, String name, int phases, SupplySystem system) {
    return sites.create(
        new SiteForm(
            name + " " + UUID.randomUUID(),
            null,
            EarthingSystem.TN_C_S,
            120.0,
            phases,
            60.0,
            null,
            10.0,
            null,
            null,
            null,
            null,
            null,
            "NEC",
            system));
  }

  /** The stored panelboard. */
  public static Board splitPhasePanel(
      SiteService sites, BoardService boards, ScheduleService schedule) {
    Site site = necSite(sites, "Invented duplex", 1, SupplySystem.SPLIT_PHASE_120_240);
    Board board = boards.create(site.getId(), panelForm("LP-A", 1, 42));
    schedule.addCircuit(board.getId(), breaker(1, PhasePosition.L1, "Kitchen receptacles", 1500));
    schedule.addCircuit(board.getId(), breaker(2, PhasePosition.L1, "Bedroom lights", 600));
    schedule.addCircuit(board.getId(), breaker(3, PhasePosition.L1_L2, "Water heater", 4500));
    schedule.addCircuit(board.getId(), breaker(8, PhasePosition.L1, "Garage receptacles", 900));
    return board;
  }

  /** A panelboard's form: MCCB main, the given phases (1 on split-phase) and space count. */
  public static BoardForm panelForm(String reference, int phases, int spaces) {
    return new BoardForm(
        reference,
        "Utility room",
        phases,
        spaces,
        200.0,
        DeviceKind.MCCB,
        null,
        200.0,
        phases == 1 ? 2 : 3,
        22.0,
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

  /** A breaker at a first space with a load of the given watts at unity power factor. */
  public static CircuitForm breaker(
      int space, PhasePosition poles, String description, double watts) {
    return new CircuitForm(
        space,
        poles,
        description,
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        null,
        poles.poles() == 1 ? 20.0 : 30.0,
        poles.poles(),
        10.0,
        null,
        null,
        null,
        null,
        ConductorMaterial.COPPER,
        Insulation.THERMOSETTING_90,
        null,
        null,
        null,
        null,
        null,
        null,
        description,
        LoadCategory.OTHER,
        1,
        watts,
        RatingUnit.W,
        1.0,
        null,
        null,
        null,
        null,
        null);
  }

  /** A breaker with no load of its own (a feeder to another panel). */
  public static CircuitForm feeder(int space, PhasePosition poles, String description) {
    return new CircuitForm(
        space,
        poles,
        description,
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        null,
        poles.poles() == 1 ? 20.0 : 100.0,
        poles.poles(),
        10.0,
        null,
        null,
        null,
        null,
        ConductorMaterial.COPPER,
        Insulation.THERMOSETTING_90,
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
        null,
        null,
        null,
        null);
  }
}
