package com.wayledger.demo;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.DwellingForm;
import com.wayledger.board.DwellingService;
import com.wayledger.board.LoadForm;
import com.wayledger.board.MeasuredDemand;
import com.wayledger.board.MeasuredDemandForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.dwelling.DwellingAddition;
import com.wayledger.engine.nec.ConductorSize;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.system.EffectiveDate;
import java.time.LocalDate;
import java.time.YearMonth;
import org.springframework.context.annotation.Profile;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The second demo site, under the NEC rule set: "Wrenfield Court", an invented three-unit apartment
 * building on a 120/240 V single-phase three-wire service. A house panel feeds three 200 A dwelling
 * panels and a common-area panel. Wrong on purpose: the common-area panel's line A is overloaded
 * (washers added later, all on A), apartment 2 has a 20 A breaker on 14 AWG, the house panel's
 * outdoor receptacles have no GFCI, and apartment 1's dryer is entered at 4.5 kW, below the 5 kW
 * minimum of NEC 220.54. Every name, address, rating, length, area and recorded demand is invented.
 *
 * <p>The supply system is one per site in this version, so the house panel is a 120/240 V panel
 * like the apartments' (a 208Y/120 V house panel feeding 120/240 V apartment panels would need a
 * system per board).
 */
@Component
@Profile("demo")
class NecDemoSite {

  static final String SITE_NAME = "Wrenfield Court Apartments";

  /** Invented days: the building's completion and the later changes, back-dated in the log. */
  static final LocalDate COMPLETED = LocalDate.of(2018, 9, 4);

  static final LocalDate COOLING_ADDED = LocalDate.of(2021, 5, 17);
  static final LocalDate WASHERS_ADDED = LocalDate.of(2023, 10, 2);
  static final LocalDate BEDROOM_EXTENDED = LocalDate.of(2025, 3, 11);

  /** Invented monthly maximum demands of the house panel in 2025, kVA (NEC 220.87). */
  static final double[] MONTHLY_MAXIMUM_KVA = {
    41.2, 39.8, 36.5, 31.0, 33.4, 44.9, 52.6, 51.3, 42.0, 33.8, 37.1, 42.5
  };

  private static final double FEET = 0.3048;

  private final SiteService sites;
  private final BoardService boards;
  private final ScheduleService schedule;
  private final DwellingService dwellings;
  private final TransactionTemplate transaction;

  NecDemoSite(
      SiteService sites,
      BoardService boards,
      ScheduleService schedule,
      DwellingService dwellings,
      TransactionTemplate transaction) {
    this.sites = sites;
    this.boards = boards;
    this.schedule = schedule;
    this.dwellings = dwellings;
    this.transaction = transaction;
  }

  /** Loads the site unless a site of that name exists. */
  void loadOnce() {
    if (sites.all().stream().anyMatch(site -> site.getName().equals(SITE_NAME))) {
      return;
    }
    EffectiveDate.set(COMPLETED);
    try {
      transaction.executeWithoutResult(status -> load());
    } finally {
      EffectiveDate.set(null);
    }
  }

  private void load() {
    Site site =
        sites.create(
            new SiteForm(
                SITE_NAME,
                "418 Thistlewick Lane, Fennimore Falls (invented address)",
                EarthingSystem.TN_C_S,
                120.0,
                1,
                60.0,
                null,
                22.0,
                null,
                DiversityMethods.NEC_STANDARD_DWELLING,
                "Three apartments over a shared laundry room. All names and figures are invented.",
                null,
                null,
                "NEC",
                SupplySystem.SPLIT_PHASE_120_240));
    long siteId = site.getId();

    Board house =
        boards.create(siteId, panel("HP", "Basement electrical room", 12, 400, null, null));
    Circuit[] feeders = new Circuit[3];
    for (int unit = 1; unit <= 3; unit++) {
      feeders[unit - 1] =
          add(
              house,
              circuit(
                  unit,
                  PhasePosition.L1_L2,
                  "Feeder to apartment " + unit + " panel",
                  DeviceKind.MCCB,
                  200,
                  ConductorSize.AWG_3_0,
                  45 + 15 * unit));
    }
    Circuit commonFeeder =
        add(
            house,
            circuit(
                4,
                PhasePosition.L1_L2,
                "Feeder to common-area panel",
                DeviceKind.MCCB,
                100,
                ConductorSize.AWG_3,
                30));
    // deliberate: an outdoor receptacle circuit on a plain breaker, no GFCI (NEC 210.8(A)(3))
    add(
        house,
        circuit(
                5,
                PhasePosition.L1,
                "Front walk receptacles",
                DeviceKind.MCB,
                20,
                ConductorSize.AWG_12,
                70)
            .at(CircuitLocation.OUTDOORS),
        load("Front walk receptacles", LoadCategory.SOCKET_OUTLETS, 2, 180, RatingUnit.VA));
    add(
        house,
        circuit(
                5,
                PhasePosition.L2,
                "Parking lot lighting",
                DeviceKind.MCB,
                15,
                ConductorSize.AWG_14,
                110)
            .at(CircuitLocation.OUTDOORS),
        load("Pole lights", LoadCategory.LIGHTING, 4, 150, RatingUnit.W));

    Board common =
        boards.create(
            siteId,
            panel(
                "CP",
                "Ground floor laundry room",
                8,
                100,
                house,
                commonFeeder,
                DiversityMethods.NONE));
    commonCircuits(common);

    Board[] units = new Board[3];
    for (int unit = 1; unit <= 3; unit++) {
      units[unit - 1] =
          boards.create(
              siteId,
              panel(
                  "APT-" + unit,
                  "Apartment " + unit + " kitchen hallway",
                  12,
                  200,
                  house,
                  feeders[unit - 1]));
    }
    apartmentOne(units[0]);
    apartmentTwo(units[1]);
    apartmentThree(units[2]);
    dwellings.save(units[0].getId(), dwelling(1_150, true));
    dwellings.save(units[1].getId(), dwelling(950, false));
    dwellings.save(units[2].getId(), dwelling(1_150, false));

    laterYears(units, common);
    measuredDemands(house);
  }

  /** Apartment 1: fully populated, the dryer entered below the 220.54 minimum on purpose. */
  private void apartmentOne(Board apt) {
    commonDwellingCircuits(apt);
    add(
        apt,
        circuit(4, PhasePosition.L1_L2, "Range", DeviceKind.MCB, 50, ConductorSize.AWG_6, 35),
        load("Range", LoadCategory.COOKING, 1, 12_000, RatingUnit.W));
    // deliberate: 4.5 kW dryer, below the 5 kW that NEC 220.54 takes as the least per dryer
    add(
        apt,
        circuit(
            5, PhasePosition.L1_L2, "Clothes dryer", DeviceKind.MCB, 30, ConductorSize.AWG_10, 40),
        load("Clothes dryer", LoadCategory.CLOTHES_DRYER, 1, 4_500, RatingUnit.W));
    add(
        apt,
        circuit(
            6, PhasePosition.L1_L2, "Water heater", DeviceKind.MCB, 30, ConductorSize.AWG_10, 30),
        load("Water heater", LoadCategory.WATER_HEATING_STORAGE, 1, 4_500, RatingUnit.W));
    add(
        apt,
        circuit(
            7, PhasePosition.L1_L2, "Baseboard heat", DeviceKind.MCB, 40, ConductorSize.AWG_8, 60),
        load("Baseboard heaters", LoadCategory.SPACE_HEATING, 4, 1_500, RatingUnit.W));
    add(
        apt,
        circuit(8, PhasePosition.L1, "Dishwasher", DeviceKind.MCB, 20, ConductorSize.AWG_12, 25),
        load("Dishwasher", LoadCategory.FIXED_APPLIANCE, 1, 1_200, RatingUnit.VA));
    add(
        apt,
        circuit(
            8, PhasePosition.L2, "Waste disposer", DeviceKind.MCB, 20, ConductorSize.AWG_12, 25),
        load("Waste disposer", LoadCategory.FIXED_APPLIANCE, 1, 900, RatingUnit.VA));
    add(
        apt,
        circuit(
            9,
            PhasePosition.L1,
            "Over-range microwave",
            DeviceKind.MCB,
            20,
            ConductorSize.AWG_12,
            30),
        load("Microwave", LoadCategory.FIXED_APPLIANCE, 1, 1_500, RatingUnit.VA));
    add(
        apt,
        circuit(
                9,
                PhasePosition.L2,
                "Balcony receptacle",
                DeviceKind.RCBO,
                20,
                ConductorSize.AWG_12,
                35)
            .at(CircuitLocation.OUTDOORS),
        load("Balcony receptacle", LoadCategory.SOCKET_OUTLETS, 1, 180, RatingUnit.VA));
  }

  /** Apartment 2: smaller, gas cooking elsewhere in the block is not modelled. */
  private void apartmentTwo(Board apt) {
    commonDwellingCircuits(apt);
    add(
        apt,
        circuit(4, PhasePosition.L1_L2, "Range", DeviceKind.MCB, 40, ConductorSize.AWG_8, 30),
        load("Range", LoadCategory.COOKING, 1, 8_000, RatingUnit.W));
    add(
        apt,
        circuit(
            5, PhasePosition.L1_L2, "Clothes dryer", DeviceKind.MCB, 30, ConductorSize.AWG_10, 40),
        load("Clothes dryer", LoadCategory.CLOTHES_DRYER, 1, 5_500, RatingUnit.W));
    add(
        apt,
        circuit(
            6, PhasePosition.L1_L2, "Water heater", DeviceKind.MCB, 30, ConductorSize.AWG_10, 30),
        load("Water heater", LoadCategory.WATER_HEATING_STORAGE, 1, 4_500, RatingUnit.W));
    add(
        apt,
        circuit(8, PhasePosition.L1, "Dishwasher", DeviceKind.MCB, 20, ConductorSize.AWG_12, 25),
        load("Dishwasher", LoadCategory.FIXED_APPLIANCE, 1, 1_200, RatingUnit.VA));
  }

  /** Apartment 3: the same plan as apartment 1 with a lighter range and a proper dryer. */
  private void apartmentThree(Board apt) {
    commonDwellingCircuits(apt);
    add(
        apt,
        circuit(4, PhasePosition.L1_L2, "Range", DeviceKind.MCB, 40, ConductorSize.AWG_8, 35),
        load("Range", LoadCategory.COOKING, 1, 9_600, RatingUnit.W));
    add(
        apt,
        circuit(
            5, PhasePosition.L1_L2, "Clothes dryer", DeviceKind.MCB, 30, ConductorSize.AWG_10, 40),
        load("Clothes dryer", LoadCategory.CLOTHES_DRYER, 1, 5_000, RatingUnit.W));
    add(
        apt,
        circuit(
            6, PhasePosition.L1_L2, "Water heater", DeviceKind.MCB, 30, ConductorSize.AWG_10, 30),
        load("Water heater", LoadCategory.WATER_HEATING_STORAGE, 1, 4_500, RatingUnit.W));
    add(
        apt,
        circuit(8, PhasePosition.L1, "Dishwasher", DeviceKind.MCB, 20, ConductorSize.AWG_12, 25),
        load("Dishwasher", LoadCategory.FIXED_APPLIANCE, 1, 1_200, RatingUnit.VA));
    add(
        apt,
        circuit(
            8, PhasePosition.L2, "Waste disposer", DeviceKind.MCB, 20, ConductorSize.AWG_12, 25),
        load("Waste disposer", LoadCategory.FIXED_APPLIANCE, 1, 900, RatingUnit.VA));
  }

  /** Lighting, two small-appliance circuits, laundry and a GFCI bathroom receptacle. */
  private void commonDwellingCircuits(Board apt) {
    add(
        apt,
        circuit(
            1,
            PhasePosition.L1,
            "Lighting, living room and hall",
            DeviceKind.MCB,
            15,
            ConductorSize.AWG_14,
            45),
        load("Luminaires", LoadCategory.LIGHTING, 8, 60, RatingUnit.W));
    add(
        apt,
        circuit(
            1,
            PhasePosition.L2,
            "Lighting and receptacles, bedrooms",
            DeviceKind.MCB,
            15,
            ConductorSize.AWG_14,
            55),
        load("Luminaires", LoadCategory.LIGHTING, 6, 60, RatingUnit.W));
    add(
        apt,
        circuit(
            2,
            PhasePosition.L1,
            "Kitchen small-appliance circuit 1",
            DeviceKind.RCBO,
            20,
            ConductorSize.AWG_12,
            30),
        load("Countertop receptacles", LoadCategory.SOCKET_OUTLETS, 1, 1_500, RatingUnit.VA));
    add(
        apt,
        circuit(
            2,
            PhasePosition.L2,
            "Kitchen small-appliance circuit 2",
            DeviceKind.RCBO,
            20,
            ConductorSize.AWG_12,
            30),
        load("Countertop receptacles", LoadCategory.SOCKET_OUTLETS, 1, 1_500, RatingUnit.VA));
    add(
        apt,
        circuit(
            3,
            PhasePosition.L1,
            "Laundry receptacle",
            DeviceKind.RCBO,
            20,
            ConductorSize.AWG_12,
            20),
        load("Washer", LoadCategory.SOCKET_OUTLETS, 1, 1_500, RatingUnit.VA));
    add(
        apt,
        circuit(
                3,
                PhasePosition.L2,
                "Bathroom receptacle",
                DeviceKind.RCBO,
                20,
                ConductorSize.AWG_12,
                25)
            .at(CircuitLocation.BATHROOM),
        load("Bathroom receptacle", LoadCategory.SOCKET_OUTLETS, 1, 1_500, RatingUnit.VA));
  }

  /** Common areas: hot water and corridor heat across both lines, the 120 V loads on line A. */
  private void commonCircuits(Board cp) {
    add(
        cp,
        circuit(
            1,
            PhasePosition.L1_L2,
            "Domestic hot-water heater",
            DeviceKind.MCB,
            60,
            ConductorSize.AWG_6,
            20),
        load("Storage water heater", LoadCategory.WATER_HEATING_STORAGE, 1, 11_500, RatingUnit.W));
    add(
        cp,
        circuit(
            2, PhasePosition.L1_L2, "Corridor heat", DeviceKind.MCB, 40, ConductorSize.AWG_8, 80),
        load("Corridor heaters", LoadCategory.SPACE_HEATING, 3, 2_400, RatingUnit.W));
    add(
        cp,
        circuit(
            3,
            PhasePosition.L1,
            "Corridor lighting",
            DeviceKind.MCB,
            15,
            ConductorSize.AWG_14,
            120),
        load("Corridor luminaires", LoadCategory.LIGHTING, 20, 60, RatingUnit.W));
    add(
        cp,
        circuit(
            3,
            PhasePosition.L2,
            "Laundry room lighting",
            DeviceKind.MCB,
            15,
            ConductorSize.AWG_14,
            20),
        load("Laundry luminaires", LoadCategory.LIGHTING, 4, 75, RatingUnit.W));
    add(
        cp,
        circuit(
            4,
            PhasePosition.L1,
            "Boiler room receptacles",
            DeviceKind.RCBO,
            20,
            ConductorSize.AWG_12,
            25),
        load("Pumps and controls", LoadCategory.FIXED_APPLIANCE, 1, 1_500, RatingUnit.VA));
  }

  /**
   * The building's later years, each entry back-dated to the day the work was done: air
   * conditioning in 2021, the shared washers in 2023 (all on line A of the common-area panel: the
   * overloaded leg) and a bedroom circuit extended in apartment 2 in 2025 (on 14 AWG behind a 20 A
   * breaker).
   */
  private void laterYears(Board[] units, Board common) {
    EffectiveDate.set(COOLING_ADDED);
    add(
        units[0],
        circuit(
            10,
            PhasePosition.L1_L2,
            "Air-conditioning condenser",
            DeviceKind.MCB,
            30,
            ConductorSize.AWG_10,
            50),
        load("Condensing unit", LoadCategory.AIR_CONDITIONING, 1, 5_000, RatingUnit.VA));
    add(
        units[2],
        circuit(
            10,
            PhasePosition.L1_L2,
            "Air-conditioning condenser",
            DeviceKind.MCB,
            25,
            ConductorSize.AWG_10,
            50),
        load("Condensing unit", LoadCategory.AIR_CONDITIONING, 1, 4_200, RatingUnit.VA));
    add(
        units[1],
        circuit(
            10,
            PhasePosition.L1_L2,
            "Through-wall air conditioner",
            DeviceKind.MCB,
            20,
            ConductorSize.AWG_12,
            20),
        load("Air conditioner", LoadCategory.AIR_CONDITIONING, 1, 3_500, RatingUnit.VA));
    EffectiveDate.set(WASHERS_ADDED);
    add(
        common,
        circuit(
            5, PhasePosition.L1, "Shared washers", DeviceKind.RCBO, 20, ConductorSize.AWG_12, 15),
        load("Washers", LoadCategory.FIXED_APPLIANCE, 2, 1_000, RatingUnit.VA));
    add(
        common,
        circuit(
            6,
            PhasePosition.L1,
            "Laundry room receptacles",
            DeviceKind.RCBO,
            20,
            ConductorSize.AWG_12,
            15),
        load("Folding-table receptacles", LoadCategory.SOCKET_OUTLETS, 1, 1_440, RatingUnit.VA));
    EffectiveDate.set(BEDROOM_EXTENDED);
    // deliberate: a 20 A breaker on 14 AWG (NEC 240.4(D)(3) allows 15 A)
    add(
        units[1],
        circuit(
            9,
            PhasePosition.L2,
            "Bedroom receptacles",
            DeviceKind.MCB,
            20,
            ConductorSize.AWG_14,
            40),
        load("Bedroom receptacles", LoadCategory.SOCKET_OUTLETS, 6, 180, RatingUnit.VA));
    EffectiveDate.set(COMPLETED);
  }

  /** A year of monthly maximum demands of the house panel (2025) and the year's own reading. */
  private void measuredDemands(Board house) {
    double largest = 0;
    for (int month = 1; month <= 12; month++) {
      YearMonth period = YearMonth.of(2025, month);
      double kva = MONTHLY_MAXIMUM_KVA[month - 1];
      largest = Math.max(largest, kva);
      dwellings.record(
          house.getId(),
          new MeasuredDemandForm(
              period.atDay(1),
              period.atEndOfMonth(),
              null,
              kva,
              MeasuredDemand.Unit.KVA,
              15,
              "Utility demand meter, monthly reading (invented)"));
    }
    dwellings.record(
        house.getId(),
        new MeasuredDemandForm(
            LocalDate.of(2025, 1, 1),
            LocalDate.of(2025, 12, 31),
            LocalDate.of(2025, 7, 23),
            largest,
            MeasuredDemand.Unit.KVA,
            15,
            "Utility demand meter, twelve-month maximum (invented)"));
  }

  private static DwellingForm dwelling(double squareFeet, boolean optional) {
    return new DwellingForm(
        squareFeet, DwellingForm.SQUARE_FEET, 2, 1, optional, DwellingAddition.NONE, null, null);
  }

  /** A 120/240 V panel with a two-pole main breaker; fed from {@code feed} of {@code parent}. */
  private static BoardForm panel(
      String reference, String location, int ways, double amps, Board parent, Circuit feed) {
    return panel(reference, location, ways, amps, parent, feed, null);
  }

  /** The same with its own diversity method (null: the site's). */
  private static BoardForm panel(
      String reference,
      String location,
      int ways,
      double amps,
      Board parent,
      Circuit feed,
      String method) {
    return new BoardForm(
        reference,
        location,
        1,
        ways,
        amps,
        DeviceKind.MCCB,
        null,
        amps,
        2,
        22.0,
        null,
        null,
        parent == null ? null : parent.getId(),
        feed == null ? null : feed.getId(),
        parent == null ? null : ConductorSize.AWG_3_0.squareMillimetres(),
        parent == null ? null : ConductorSize.AWG_6.squareMillimetres(),
        parent == null ? null : ConductorMaterial.COPPER,
        parent == null ? null : Insulation.THERMOSETTING_90,
        parent == null ? null : 60 * FEET,
        parent == null ? null : InstallationMethod.C,
        parent == null ? null : 30.0,
        parent == null ? null : 1,
        parent == null ? null : 0,
        BoardForm.DEFAULT_UNBALANCE_LIMIT_PERCENT,
        1.0,
        method,
        null,
        null,
        null,
        null,
        null);
  }

  /**
   * A branch circuit: copper 90 °C insulation (THHN-like, in the 90 °C column with 60/75 °C
   * terminations) at 30 °C, length in feet stored in metres, AWG stored as its area in mm². A
   * residual-current breaker stands for a GFCI breaker (Class A, 5 mA: common practice).
   */
  private static CircuitForm circuit(
      int space,
      PhasePosition position,
      String description,
      DeviceKind kind,
      double amps,
      ConductorSize size,
      double feet) {
    // a breaker with a GFCI function is written RCBO in this demo's lists; it is stored as what it
    // is under the NEC set: a breaker (MCB) recording the ground-fault function, no 30 mA rating
    boolean gfci = kind == DeviceKind.RCBO;
    DeviceKind breaker = gfci ? DeviceKind.MCB : kind;
    ConductorSize ground =
        size.ordinal() <= ConductorSize.AWG_10.ordinal() ? size : ConductorSize.AWG_10;
    return new CircuitForm(
        space,
        position,
        description,
        WayStatus.IN_USE,
        false,
        breaker,
        breaker == DeviceKind.MCCB ? null : TripCurve.C,
        amps,
        position.poles(),
        10.0,
        null,
        null,
        size.squareMillimetres(),
        ground.squareMillimetres(),
        ConductorMaterial.COPPER,
        Insulation.THERMOSETTING_90,
        feet * FEET,
        InstallationMethod.C,
        30.0,
        1,
        0,
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
        CircuitLocation.INDOORS,
        gfci ? com.wayledger.engine.FaultInterrupter.GFCI : null);
  }

  private static LoadForm load(
      String description, LoadCategory category, int quantity, double rating, RatingUnit unit) {
    return new LoadForm(description, category, quantity, rating, unit, 1.0, null, null, false);
  }

  private Circuit add(Board board, CircuitForm circuit, LoadForm... loads) {
    Circuit saved = schedule.addCircuit(board.getId(), circuit);
    for (LoadForm load : loads) {
      schedule.addLoad(saved.getId(), load);
    }
    return saved;
  }
}
