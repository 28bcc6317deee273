package com.wayledger.board;

import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Turns a board's schedule rows into printed lines ({@link ScheduleLine}): the words come from the
 * page's {@link PageWords}, the figures from {@link ScheduleFigures}, the links are written out
 * with the application's context path. The table's HTML is what the template printed when it worked
 * all of this out cell by cell.
 */
final class ScheduleLines {

  private ScheduleLines() {}

  /**
   * @param contextPath the application's context path ("" at the root), put before every link
   * @param missing each circuit's missing inputs by circuit id (form field names)
   * @param demands each circuit's demand by circuit id; null when the board has none
   * @param figures the printed figures of each assessed circuit by circuit id
   * @param problems problem counts per verdict by circuit id
   * @param focusElementId the row whose add button takes the focus; null for none
   */
  static List<ScheduleLine> of(
      Board board,
      List<ScheduleRow> rows,
      String contextPath,
      Map<Long, List<String>> missing,
      Map<Long, CircuitDemand> demands,
      Map<Long, ScheduleFigures> figures,
      Map<Long, Map<Verdict, Long>> problems,
      String focusElementId,
      PageWords words) {
    boolean severalLines = board.lineCount() > 1;
    List<ScheduleLine> lines = new ArrayList<>(rows.size());
    for (ScheduleRow row : rows) {
      String phase = row.phase().name();
      if (row.continuation()) {
        lines.add(continuation(row, phase));
      } else if (row.circuit() == null) {
        lines.add(free(board, row, severalLines ? phase : "", contextPath, focusElementId, words));
      } else {
        lines.add(
            circuit(
                board,
                row,
                severalLines ? phase : "",
                contextPath,
                missing,
                demands,
                figures,
                problems,
                words));
      }
    }
    return lines;
  }

  private static ScheduleLine continuation(ScheduleRow row, String phase) {
    return new ScheduleLine(
        row.elementId(),
        Integer.toString(row.wayNumber()),
        "phase ph-" + phase,
        phase,
        true,
        false,
        false,
        null,
        1,
        null,
        null,
        false,
        false,
        null,
        null,
        null,
        List.of(),
        null,
        null,
        false,
        List.of(),
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        false);
  }

  private static ScheduleLine free(
      Board board,
      ScheduleRow row,
      String printedPhase,
      String contextPath,
      String focusElementId,
      PageWords words) {
    String id = row.elementId();
    String phase = row.phase().name();
    return new ScheduleLine(
        id,
        Integer.toString(row.wayNumber()),
        "phase ph-" + phase,
        printedPhase,
        false,
        false,
        true,
        null,
        1,
        null,
        null,
        false,
        false,
        null,
        null,
        null,
        List.of(),
        null,
        null,
        false,
        List.of(),
        null,
        null,
        null,
        null,
        null,
        contextPath
            + "/boards/"
            + board.getId()
            + "/circuits/new?way="
            + row.wayNumber()
            + "&position="
            + phase,
        words.word("schedule.addHere") + " " + row.wayNumber() + " " + phase,
        id.equals(focusElementId));
  }

  private static ScheduleLine circuit(
      Board board,
      ScheduleRow row,
      String printedPhase,
      String contextPath,
      Map<Long, List<String>> missing,
      Map<Long, CircuitDemand> demands,
      Map<Long, ScheduleFigures> figures,
      Map<Long, Map<Verdict, Long>> problems,
      PageWords words) {
    Circuit circuit = row.circuit();
    long circuitId = circuit.getId();
    String circuitPath = contextPath + "/circuits/" + circuitId;
    CircuitDemand demand = demands == null ? null : demands.get(circuitId);
    String description = circuit.getDescription();
    String none = words.word("common.none");
    return new ScheduleLine(
        row.elementId(),
        Integer.toString(row.wayNumber()),
        "phase ph-" + row.phase().name(),
        printedPhase,
        false,
        true,
        false,
        "status-" + circuit.getStatus().name(),
        row.spanRows(),
        circuitPath,
        description,
        circuit.isLockedForBalancing(),
        circuit.isRingFinal(),
        needed(circuitId, missing == null ? null : missing.get(circuitId), words),
        circuit.getDevice() != null ? circuit.getDevice().label() : none,
        circuit.getCable() != null && circuit.getCable().isRecorded()
            ? circuit.getCable().label(board.cableUnits())
            : none,
        circuit.getLoads().stream()
            .map(load -> new ScheduleLine.Load(load.getDescription(), load.ratingLabel()))
            .toList(),
        figures.get(circuitId),
        demand != null && !demand.isAssessed()
            ? words.sentence("schedule.notAssessed", demand.notAssessedReason())
            : null,
        demand == null,
        badges(circuitId, problems == null ? null : problems.get(circuitId), words),
        words.word("enum.WayStatus." + circuit.getStatus().name()),
        circuitPath + "/edit",
        words.word("action.edit") + " " + description,
        circuitPath + "/delete",
        words.word("action.delete") + " " + description,
        null,
        null,
        false);
  }

  private static ScheduleLine.Needed needed(long circuitId, List<String> fields, PageWords words) {
    if (fields == null || fields.isEmpty()) {
      return null;
    }
    List<String> items = new ArrayList<>(fields.size());
    for (int i = 0; i < fields.size(); i++) {
      items.add(words.word("needed." + fields.get(i)) + (i == fields.size() - 1 ? "" : ","));
    }
    return new ScheduleLine.Needed(
        "needed-c" + circuitId, words.sentence("schedule.needed", fields.size()), items);
  }

  private static List<ScheduleLine.Badge> badges(
      long circuitId, Map<Verdict, Long> counts, PageWords words) {
    if (counts == null) {
      return List.of();
    }
    List<ScheduleLine.Badge> badges = new ArrayList<>(counts.size());
    counts.forEach(
        (verdict, count) ->
            badges.add(
                new ScheduleLine.Badge(
                    "#findings-c" + circuitId,
                    "badge v-" + verdict.name(),
                    count + " " + words.word("verdict." + verdict.name()))));
    return badges;
  }
}
