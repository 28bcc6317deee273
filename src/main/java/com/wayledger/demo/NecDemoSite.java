package com.wayledger.demo;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.DwellingForm;
import com.wayledger.board.DwellingService;
import com.wayledger.board.MeasuredDemand;
import com.wayledger.board.MeasuredDemandForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.dwelling.DwellingAddition;
import com.wayledger.engine.nec.ConductorSize;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.system.EffectiveDate;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springframework.context.annotation.Profile;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The second demo site, under the NEC rule set: "Wrenfield Court", an invented three-unit apartment
 * building on a 208Y/120 V service. A 42-space 208Y/120 V house panel feeds each apartment's
 * 120/208 V single-phase three-wire panel through a two-pole breaker (each on another pair of
 * lines) and a common-area panel the same way; the caretaker's cottage has its own 120/240 V
 * service and a 200 A, 42-space dwelling panel. Wrong on purpose: the common-area panel's line A is
 * overloaded (washers added later, all on A), apartment 2 has a 20 A breaker on 14 AWG, apartment
 * 3's balcony receptacle has no GFCI, and apartment 1's dryer is entered at 4.5 kW, below the 5 kW
 * minimum of NEC 220.54. Every name, address, rating, length, area and recorded demand is invented.
 * The circuits are tables in {@link NecDemoCircuits}.
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

  private final SiteService sites;
  private final BoardService boards;
  private final ScheduleService schedule;
  private final DwellingService dwellings;
  private final TransactionTemplate transaction;
  private final Map<Long, Set<Integer>> takenSpaces = new HashMap<>();

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
                3,
                60.0,
                null,
                22.0,
                null,
                DiversityMethods.NEC_STANDARD_DWELLING,
                "Three apartments over a shared laundry room, and the caretaker's cottage on its own"
                    + " service. All names and figures are invented.",
                null,
                null,
                "NEC",
                SupplySystem.WYE_208Y_120));
    long siteId = site.getId();

    Board house =
        boards.create(
            siteId, Panel.service("HP", "Basement electrical room", 3, 400).form(null, null));
    List<Circuit> feeders = fill(house, NecDemoCircuits.HOUSE);

    Board common =
        boards.create(
            siteId,
            Panel.fed("CP", "Ground floor laundry room", 16, 100, ConductorSize.AWG_3)
                .form(house, feeders.get(3))
                .withSupplySystem(SupplySystem.SINGLE_PHASE_120_208));
    fill(common, NecDemoCircuits.COMMON);

    String[] plans = {
      NecDemoCircuits.APARTMENT_ONE, NecDemoCircuits.APARTMENT_TWO, NecDemoCircuits.APARTMENT_THREE
    };
    double[] squareFeet = {1_150, 950, 1_150};
    Board[] units = new Board[3];
    for (int unit = 1; unit <= 3; unit++) {
      units[unit - 1] =
          boards.create(
              siteId,
              Panel.fed(
                      "APT-" + unit,
                      "Apartment " + unit + " kitchen hallway",
                      30,
                      200,
                      ConductorSize.AWG_3_0)
                  .form(house, feeders.get(unit - 1))
                  .withSupplySystem(SupplySystem.SINGLE_PHASE_120_208));
      fill(units[unit - 1], NecDemoCircuits.DWELLING_BASICS);
      fill(units[unit - 1], plans[unit - 1]);
      dwellings.save(units[unit - 1].getId(), dwelling(squareFeet[unit - 1], unit == 1));
    }

    Board cottage =
        boards.create(
            siteId,
            Panel.service("COTTAGE", "Caretaker's cottage, utility room", 1, 200)
                .form(null, null)
                .withSupplySystem(SupplySystem.SPLIT_PHASE_120_240));
    fill(cottage, NecDemoCircuits.DWELLING_BASICS);
    fill(cottage, NecDemoCircuits.COTTAGE);
    dwellings.save(cottage.getId(), dwelling(1_400, false));

    laterYears(units, common);
    measuredDemands(house);
  }

  /**
   * The building's later years, each entry back-dated to the day the work was done: air
   * conditioning in 2021, the shared washers in 2023 (all on line A of the common-area panel: the
   * overloaded leg) and a bedroom circuit extended in apartment 2 in 2025 (on 14 AWG behind a 20 A
   * breaker).
   */
  private void laterYears(Board[] units, Board common) {
    EffectiveDate.set(COOLING_ADDED);
    for (int unit = 0; unit < units.length; unit++) {
      fill(units[unit], NecDemoCircuits.COOLING[unit]);
    }
    EffectiveDate.set(WASHERS_ADDED);
    fill(common, NecDemoCircuits.COMMON_WASHERS);
    EffectiveDate.set(BEDROOM_EXTENDED);
    fill(units[1], NecDemoCircuits.BEDROOM_EXTENSION);
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

  /**
   * Adds a table's circuits to a panel, each on the first free space (top down) whose line(s) are
   * the ones its row names: on a panelboard the lines follow from the space.
   */
  private List<Circuit> fill(Board board, String table) {
    List<Circuit> added = new ArrayList<>();
    for (NecDemoRow row : NecDemoRow.of(table)) {
      Circuit saved = schedule.addCircuit(board.getId(), row.circuit().onWay(spaceFor(board, row)));
      if (row.load() != null) {
        schedule.addLoad(saved.getId(), row.load());
      }
      added.add(saved);
    }
    return added;
  }

  private int spaceFor(Board board, NecDemoRow row) {
    PanelSpaces panel = board.panelSpaces();
    int poles = row.circuit().position().poles();
    Set<Integer> taken = takenSpaces.computeIfAbsent(board.getId(), id -> new HashSet<>());
    for (int space = 1; space <= panel.spaceCount(); space++) {
      if (panel.fitOf(space, poles) != PanelSpaces.Fit.FITS
          || panel.positionOf(space, poles) != row.circuit().position()) {
        continue;
      }
      List<Integer> spaces = panel.spacesOf(space, poles);
      if (spaces.stream().noneMatch(taken::contains)) {
        taken.addAll(spaces);
        return space;
      }
    }
    throw new IllegalStateException(
        "demo panel " + board.getReference() + " has no free space for " + row.circuit());
  }

  /**
   * A panel with a moulded-case main breaker of as many poles as its lines need (three on the
   * 208Y/120 V house panel, two on a single-phase three-wire one) and 22 kA interrupting rating; a
   * fed panel's feeder is copper, 90 °C insulation, with the equipment grounding conductor of NEC
   * Table 250.122 for its breaker (from memory: 6 AWG Cu for 200 A, 8 AWG for 100 A).
   */
  private record Panel(
      String reference,
      String location,
      int phases,
      int spaces,
      double amps,
      ConductorSize feeder,
      String method) {

    static Panel service(String reference, String location, int phases, double amps) {
      return new Panel(reference, location, phases, 42, amps, null, null);
    }

    static Panel fed(
        String reference, String location, int spaces, double amps, ConductorSize feeder) {
      boolean common = feeder == ConductorSize.AWG_3;
      return new Panel(
          reference, location, 1, spaces, amps, feeder, common ? DiversityMethods.NONE : null);
    }

    BoardForm form(Board parent, Circuit feed) {
      boolean fed = parent != null;
      ConductorSize ground = amps > 100 ? ConductorSize.AWG_6 : ConductorSize.AWG_8;
      return new BoardForm(
          reference,
          location,
          phases,
          spaces,
          amps,
          DeviceKind.MCCB,
          null,
          amps,
          phases == 3 ? 3 : 2,
          22.0,
          null,
          null,
          fed ? parent.getId() : null,
          fed ? feed.getId() : null,
          fed ? feeder.squareMillimetres() : null,
          fed ? ground.squareMillimetres() : null,
          fed ? ConductorMaterial.COPPER : null,
          fed ? Insulation.THERMOSETTING_90 : null,
          fed ? feed.getCable().getLengthMetres() : null,
          fed ? InstallationMethod.C : null,
          fed ? 30.0 : null,
          fed ? 1 : null,
          fed ? 0 : null,
          BoardForm.DEFAULT_UNBALANCE_LIMIT_PERCENT,
          1.0,
          method,
          null,
          null,
          null,
          null,
          null);
    }
  }
}
