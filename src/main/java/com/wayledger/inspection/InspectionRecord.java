package com.wayledger.inspection;

import com.wayledger.engine.inspection.BoardResults;
import com.wayledger.engine.inspection.Outcome;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;

/**
 * A stored inspection: never changed once written.
 *
 * @param id its id (0 before it is stored)
 * @param scheduleLogEntryId the newest change-log entry about the board when it was recorded: the
 *     schedule's state then; null when the board had no logged change
 * @param correctsId the earlier record this one corrects, or null
 */
public record InspectionRecord(
    long id,
    long siteId,
    long boardId,
    String boardReference,
    LocalDate inspectedOn,
    String inspector,
    String instruments,
    double testCelsius,
    Double insulationTestVolts,
    BoardResults boardResults,
    Outcome outcome,
    Long scheduleLogEntryId,
    Long correctsId,
    String notes,
    String recordedBy,
    Instant recordedAt,
    List<ResultRow> results,
    List<Observation> observations) {

  public InspectionRecord {
    results = List.copyOf(results);
    observations = List.copyOf(observations);
  }

  /** The record without its rows, for lists. */
  public InspectionRecord header() {
    return new InspectionRecord(
        id,
        siteId,
        boardId,
        boardReference,
        inspectedOn,
        inspector,
        instruments,
        testCelsius,
        insulationTestVolts,
        boardResults,
        outcome,
        scheduleLogEntryId,
        correctsId,
        notes,
        recordedBy,
        recordedAt,
        List.of(),
        List.of());
  }
}
