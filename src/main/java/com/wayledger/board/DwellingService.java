package com.wayledger.board;

import com.wayledger.system.ChangeKind;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RowLocks;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.ScheduleChanged;
import com.wayledger.system.StaleEditException;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.transaction.annotation.Transactional;

/**
 * Stores a board's NEC dwelling inputs and the maximum demands recorded for it. Each change
 * publishes a {@link ScheduleChanged} event, so it reaches the change log and moves the site's data
 * generation (the analysis is worked afresh).
 */
@org.springframework.stereotype.Service
public class DwellingService {

  /** The key of a dwelling entry's snapshots in the change log. */
  public static final String LOG_KEY = "dwelling";

  /** Summary of a dwelling entry of the change log. */
  record DwellingSnapshot(
      Double floorAreaSquareFeet,
      Integer smallApplianceCircuits,
      Integer laundryCircuits,
      boolean optionalMethod,
      String addition) {

    String text() {
      return (floorAreaSquareFeet == null
              ? "floor area not recorded"
              : Math.round(floorAreaSquareFeet) + " ft²")
          + ", small-appliance circuits "
          + (smallApplianceCircuits == null ? "not recorded" : smallApplianceCircuits)
          + ", laundry circuits "
          + (laundryCircuits == null ? "not recorded" : laundryCircuits)
          + ", optional method "
          + (optionalMethod ? "yes" : "no")
          + ", addition "
          + addition;
    }

    /**
     * The log's snapshot of the inputs: {@code {"dwelling": {...}}}, the key telling a replay that
     * the entry is about the dwelling inputs and not the board header (see {@code
     * loadlog.HistoryReplay}).
     */
    java.util.Map<String, Object> logged() {
      java.util.Map<String, Object> inputs = new java.util.LinkedHashMap<>();
      inputs.put("floorAreaSquareFeet", floorAreaSquareFeet);
      inputs.put("smallApplianceCircuits", smallApplianceCircuits);
      inputs.put("laundryCircuits", laundryCircuits);
      inputs.put("optionalMethod", optionalMethod);
      inputs.put("addition", addition);
      return java.util.Map.of(LOG_KEY, inputs);
    }

    static DwellingSnapshot of(DwellingRecord record) {
      return record == null
          ? null
          : new DwellingSnapshot(
              record.getFloorAreaSquareFeet(),
              record.getSmallApplianceCircuits(),
              record.getLaundryCircuits(),
              record.isOptionalMethod(),
              record.getAddition().name());
    }
  }

  private final DwellingRepository dwellings;
  private final MeasuredDemandRepository measured;
  private final BoardRepository boards;
  private final ApplicationEventPublisher events;
  private final RowLocks locks;

  public DwellingService(
      DwellingRepository dwellings,
      MeasuredDemandRepository measured,
      BoardRepository boards,
      ApplicationEventPublisher events,
      RowLocks locks) {
    this.dwellings = dwellings;
    this.measured = measured;
    this.boards = boards;
    this.events = events;
    this.locks = locks;
  }

  @Transactional(readOnly = true)
  public Optional<DwellingRecord> find(long boardId) {
    return dwellings.findById(boardId);
  }

  @Transactional(readOnly = true)
  public List<MeasuredDemand> measuredFor(long boardId) {
    return measured.findByBoardIdOrderByPeriodEndDescIdDesc(boardId);
  }

  /**
   * Creates or replaces a board's dwelling inputs. A form carrying a version older than the stored
   * one is refused (someone saved meanwhile); nothing is stored.
   */
  @Transactional
  public DwellingRecord save(long boardId, DwellingForm form) {
    Board board = lockedBoard(boardId);
    DwellingRecord record = dwellings.findById(boardId).orElse(null);
    if (record != null
        && form.version() != null
        && !Objects.equals(form.version(), record.getVersion())) {
      throw new StaleEditException(
          "Dwelling data of board " + board.getReference(), DwellingForm.of(record));
    }
    DwellingSnapshot before = DwellingSnapshot.of(record);
    if (record == null) {
      record = new DwellingRecord(boardId);
    }
    record.apply(form);
    DwellingRecord saved = dwellings.saveAndFlush(record);
    DwellingSnapshot after = DwellingSnapshot.of(saved);
    if (!Objects.equals(before, after)) {
      events.publishEvent(
          new ScheduleChanged(
              board.getSite().getId(),
              boardId,
              null,
              ChangeKind.BOARD_EDITED,
              "Board “"
                  + board.getReference()
                  + "”: dwelling data "
                  + (before == null ? "added: " : "changed from " + before.text() + " to ")
                  + after.text(),
              // the inputs under their own key, so the history replays them beside the header
              before == null ? null : before.logged(),
              after.logged(),
              form.reason()));
    }
    return saved;
  }

  /** Removes a board's dwelling inputs (the board no longer serves one dwelling unit). */
  @Transactional
  public void remove(long boardId, String reason) {
    Board board = lockedBoard(boardId);
    dwellings
        .findById(boardId)
        .ifPresent(
            record -> {
              DwellingSnapshot before = DwellingSnapshot.of(record);
              dwellings.delete(record);
              events.publishEvent(
                  new ScheduleChanged(
                      board.getSite().getId(),
                      boardId,
                      null,
                      ChangeKind.BOARD_EDITED,
                      "Board “"
                          + board.getReference()
                          + "”: dwelling data removed (was "
                          + before.text()
                          + ")",
                      before.logged(),
                      null,
                      reason));
            });
  }

  /** Appends a recorded maximum demand for a board (NEC 220.87). */
  @Transactional
  public MeasuredDemand record(long boardId, MeasuredDemandForm form) {
    Board board = lockedBoard(boardId);
    if (form.periodEnd().isBefore(form.periodStart())) {
      throw new RuleViolation("periodEnd", "measured.periodEnd.beforeStart");
    }
    if (form.periodEnd().isAfter(LocalDate.now().plusDays(1))) {
      throw new RuleViolation("periodEnd", "measured.periodEnd.future");
    }
    if (form.peakOn() != null
        && (form.peakOn().isBefore(form.periodStart())
            || form.peakOn().isAfter(form.periodEnd()))) {
      throw new RuleViolation("peakOn", "measured.peakOn.outsidePeriod");
    }
    MeasuredDemand saved =
        measured.save(new MeasuredDemand(board.getSite().getId(), boardId, currentUser(), form));
    events.publishEvent(
        new ScheduleChanged(
            board.getSite().getId(),
            boardId,
            null,
            ChangeKind.DEMAND_MEASURED,
            "Board “"
                + board.getReference()
                + "”: maximum demand "
                + saved.getMaximumDemand()
                + " "
                + (saved.getUnit() == MeasuredDemand.Unit.KVA ? "kVA" : "kW")
                + " recorded for "
                + saved.getPeriodStart()
                + " to "
                + saved.getPeriodEnd(),
            null,
            null,
            form.note()));
    return saved;
  }

  private Board lockedBoard(long boardId) {
    Long siteId =
        boards.findSiteIdOf(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    locks.exclusive("site", siteId);
    if (!locks.exclusive("board", boardId)) {
      throw new NotFoundException("Board", boardId);
    }
    return boards.findById(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
  }

  private static String currentUser() {
    Authentication who = SecurityContextHolder.getContext().getAuthentication();
    return who == null || who.getName() == null || !who.isAuthenticated()
        ? "system"
        : who.getName().length() > 60 ? who.getName().substring(0, 60) : who.getName();
  }
}
