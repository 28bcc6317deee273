package com.wayledger.demo;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import com.wayledger.inspection.InspectionForm;
import com.wayledger.inspection.InspectionForm.ObservationEntry;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import com.wayledger.inspection.InspectionService;
import com.wayledger.inspection.InspectionSheet;
import com.wayledger.inspection.SheetRow;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.EffectiveDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.annotation.Profile;
import org.springframework.stereotype.Component;

/**
 * Adds two periodic inspections of the demo's flat 1 board, three years apart, with a load added in
 * between: the later one finds the socket ring's insulation resistance below the minimum, its RCBO
 * slow at IΔn, the kitchen radial's insulation halved and a lighting circuit's R1+R2 risen. All
 * names, dates and readings are invented.
 */
@Component
@Profile("demo")
class DemoInspections {

  static final String BOARD = "FLAT-1";
  static final String EARLIER = "2022-05-12";
  static final String LATER = "2025-06-03";

  /** The day the dishwasher went onto the kitchen radial, between the two inspections. */
  static final java.time.LocalDate DISHWASHER_ADDED = java.time.LocalDate.of(2024, 1, 22);

  static final String INSPECTOR = "Morven Tallis (invented)";

  private static final Logger LOG = LoggerFactory.getLogger(DemoInspections.class);

  private final SiteService sites;
  private final BoardService boards;
  private final ScheduleService schedule;
  private final InspectionService inspections;

  DemoInspections(
      SiteService sites,
      BoardService boards,
      ScheduleService schedule,
      InspectionService inspections) {
    this.sites = sites;
    this.boards = boards;
    this.schedule = schedule;
    this.inspections = inspections;
  }

  /**
   * Called by {@link DemoSite} while the app starts, before the web server answers: the first page
   * served already finds both inspections.
   */
  void loadOnce() {
    Site site =
        sites.all().stream()
            .filter(s -> s.getName().equals(DemoSite.SITE_NAME))
            .findFirst()
            .orElse(null);
    if (site == null) {
      return;
    }
    Board flat =
        boards.onSite(site.getId()).stream()
            .filter(b -> b.getReference().equals(BOARD))
            .findFirst()
            .orElse(null);
    if (flat == null || !inspections.ofBoard(flat.getId()).isEmpty()) {
      return;
    }
    long boardId = flat.getId();
    record(
        boardId,
        EARLIER,
        "18",
        "Insulation and loop tester serial MT-40117 (invented)",
        Map.of(
            "Cooker",
            new String[] {"0.10", "", "", "", "", ">299", ">299", ">299", "ok", "0.55"},
            "Shower",
            new String[] {"0.08", "", "", "", "", ">299", ">299", ">299", "ok", "0.53"},
            "Sockets ring, living and bedrooms",
            new String[] {
              "0.32", "", "0.47", "0.48", "0.78", "250", "200", "220", "ok", "0.77", "26", "12",
              "ok"
            },
            "Sockets radial, kitchen",
            new String[] {"0.33", "", "", "", "", "180", "150", "160", "ok", "0.78"},
            "Washer-dryer",
            new String[] {"0.16", "", "", "", "", ">299", ">299", ">299", "ok", "0.62"},
            "Lighting, downstairs rooms",
            new String[] {"0.86", "", "", "", "", ">299", "240", ">299", "ok", "1.31"},
            "Lighting, bedrooms and bathroom",
            new String[] {"0.94", "", "", "", "", ">299", ">299", ">299", "ok", "1.40"}),
        "Circuit chart inside the board door is faded and hand-amended: renew it.");

    // Between the inspections the tenant's dishwasher went onto the kitchen radial (logged).
    InspectionSheet blank = inspections.blank(boardId, "");
    blank.rows().stream()
        .filter(r -> r.description().equals("Sockets radial, kitchen"))
        .findFirst()
        .ifPresent(
            kitchen ->
                EffectiveDate.during(
                    DISHWASHER_ADDED,
                    () ->
                        schedule.addLoad(
                            kitchen.circuitId(),
                            new LoadForm(
                                "Dishwasher",
                                LoadCategory.FIXED_APPLIANCE,
                                1,
                                1800.0,
                                RatingUnit.W,
                                0.95,
                                null,
                                null,
                                false),
                            "Tenant's dishwasher plugged into the kitchen radial (invented)")));

    record(
        boardId,
        LATER,
        "14",
        "Multifunction tester serial MF-22864 (invented)",
        Map.of(
            "Cooker",
            new String[] {"0.11", "", "", "", "", ">299", ">299", ">299", "ok", "0.56"},
            "Shower",
            new String[] {"0.09", "", "", "", "", ">299", "210", ">299", "ok", "0.54"},
            "Sockets ring, living and bedrooms",
            new String[] {
              "0.33", "", "0.48", "0.49", "0.79", "120", "0.7", "95", "ok", "0.78", "340", "38",
              "ok"
            },
            "Sockets radial, kitchen",
            new String[] {"0.34", "", "", "", "", "150", "60", "140", "ok", "0.79"},
            "Washer-dryer",
            new String[] {"0.16", "", "", "", "", ">299", ">299", ">299", "ok", "0.63"},
            "Lighting, downstairs rooms",
            new String[] {"0.99", "", "", "", "", ">299", "190", ">299", "ok", "1.44"},
            "Lighting, bedrooms and bathroom",
            new String[] {"0.95", "", "", "", "", ">299", ">299", ">299", "ok", "1.41"}),
        "Scorching at the double socket behind the living-room sofa, found while tracing the low"
            + " insulation reading on the ring: open up and inspect the whole ring.");
    LOG.info("Added two demo inspections of board {}.", BOARD);
  }

  /**
   * Grades the readings, keeps every proposed observation, adds the inspector's own and records the
   * inspection with the outcome confirmed.
   */
  private void record(
      long boardId,
      String date,
      String celsius,
      String instruments,
      Map<String, String[]> readings,
      String ownObservation) {
    InspectionSheet blank = inspections.blank(boardId, INSPECTOR);
    List<ResultEntry> rows = new ArrayList<>();
    for (SheetRow row : blank.rows()) {
      String[] v = readings.get(row.description());
      rows.add(v == null ? row.entry() : entry(row.circuitId(), v));
    }
    InspectionForm typed =
        new InspectionForm(
            date,
            INSPECTOR,
            instruments,
            celsius,
            "500",
            "",
            "2.1",
            "",
            "ok",
            "",
            null,
            "",
            rows,
            List.of());
    InspectionSheet graded = inspections.grade(boardId, typed);
    List<ObservationEntry> observations = new ArrayList<>();
    graded.observations().stream().filter(ObservationEntry::isProposal).forEach(observations::add);
    boolean investigate = ownObservation.startsWith("Scorching");
    observations.add(
        new ObservationEntry(
            "keep",
            investigate ? "INVESTIGATE" : "ADVISORY",
            ownObservation,
            null,
            null,
            null,
            null));
    InspectionForm withObservations =
        new InspectionForm(
            date,
            INSPECTOR,
            instruments,
            celsius,
            "500",
            "",
            "2.1",
            "",
            "ok",
            "",
            null,
            "",
            rows,
            observations);
    String outcome = inspections.grade(boardId, withObservations).outcome().name();
    InspectionService.Recorded recorded =
        inspections.record(
            boardId,
            new InspectionForm(
                date,
                INSPECTOR,
                instruments,
                celsius,
                "500",
                "",
                "2.1",
                "",
                "ok",
                "",
                null,
                outcome,
                rows,
                observations));
    if (recorded.id() == null) {
      throw new IllegalStateException(
          "demo inspection of " + date + " refused: " + recorded.sheet().errors());
    }
  }

  private static ResultEntry entry(long circuitId, String[] v) {
    return new ResultEntry(
        circuitId,
        v[0],
        v[1],
        v[2],
        v[3],
        v[4],
        v[5],
        v[6],
        v[7],
        v[8],
        v[9],
        v.length > 10 ? v[10] : "",
        v.length > 11 ? v[11] : "",
        v.length > 12 ? v[12] : "",
        false);
  }
}
