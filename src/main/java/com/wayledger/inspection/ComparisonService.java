package com.wayledger.inspection;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.inspection.ResultDrift;
import com.wayledger.inspection.Comparison.Change;
import com.wayledger.inspection.Comparison.CircuitDrift;
import com.wayledger.loadlog.ChangeLog;
import com.wayledger.loadlog.ChangeLogEntry;
import com.wayledger.loadlog.HistoryPoint;
import com.wayledger.loadlog.HistoryService;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Compares a board at two points. Each inspection remembers the newest change-log entry about the
 * board when it was recorded, so the schedule changes in between are exactly the log entries after
 * the earlier one's and up to the later one's (or up to now).
 */
@Service
public class ComparisonService {

  private final InspectionService inspections;
  private final ChangeLog log;
  private final HistoryService history;

  private final MessageSource messages;

  public ComparisonService(
      InspectionService inspections,
      ChangeLog log,
      HistoryService history,
      MessageSource messages) {
    this.inspections = inspections;
    this.log = log;
    this.history = history;
    this.messages = messages;
  }

  /** A sentence of the comparison in the reader's language (the page's, else en-GB). */
  private String words(String key, Object... args) {
    return messages.getMessage(key, args, LocaleContextHolder.getLocale());
  }

  /**
   * @param toId the later inspection, or null for the board as it is now
   */
  @Transactional(readOnly = true)
  public Comparison compare(long boardId, long fromId, Long toId) {
    InspectionRecord from = inspections.get(boardId, fromId);
    InspectionRecord to = toId == null ? null : inspections.get(boardId, toId);
    if (to != null && isLater(from, to)) {
      InspectionRecord swap = from;
      from = to;
      to = swap;
    }
    List<ChangeLogEntry> entries = log.boardHistory(boardId);
    long fromEntry = from.scheduleLogEntryId() == null ? 0 : from.scheduleLogEntryId();
    long toEntry =
        to == null ? Long.MAX_VALUE : to.scheduleLogEntryId() == null ? 0 : to.scheduleLogEntryId();
    List<Change> changes = new ArrayList<>();
    for (ChangeLogEntry e : entries) {
      if (e.id() > fromEntry && e.id() <= toEntry) {
        changes.add(new Change(e.when(), category(e), e.summary()));
      }
    }
    List<HistoryPoint> points = history.points(boardId);
    Double before = peakAt(points, fromEntry);
    Double after = peakAt(points, toEntry);

    List<CircuitDrift> drift = new ArrayList<>();
    if (to != null) {
      Map<Long, ResultRow> earlier =
          from.results().stream()
              .collect(Collectors.toMap(ResultRow::circuitId, Function.identity(), (a, b) -> a));
      for (ResultRow later : to.results()) {
        ResultRow then = earlier.get(later.circuitId());
        if (then != null) {
          List<ResultDrift.Move> moves = ResultDrift.between(then.results(), later.results());
          if (!moves.isEmpty()) {
            drift.add(new CircuitDrift(later.wayLabel(), later.description(), moves));
          }
        }
      }
    }
    List<String> attention = new ArrayList<>();
    for (CircuitDrift d : drift) {
      for (ResultDrift.Move m : d.moves()) {
        if (m.attention()) {
          attention.add(
              words("inspection.compare.note.drift", d.wayLabel(), d.description(), m.message()));
        }
      }
    }
    for (Change c : changes) {
      if (c.category().equals("added")
          || c.category().equals("device")
          || c.category().equals("cable")) {
        attention.add(words("inspection.compare.note.untested", c.summary()));
      }
    }
    if (before != null && after != null && after > before * 1.1) {
      attention.add(
          words(
              "inspection.compare.note.demandRose",
              String.format(java.util.Locale.ROOT, "%.1f", before),
              String.format(java.util.Locale.ROOT, "%.1f", after)));
    }
    return new Comparison(
        words("inspection.compare.side.of", from.inspectedOn().toString()),
        to == null
            ? words("inspection.compare.side.now")
            : words("inspection.compare.side.of", to.inspectedOn().toString()),
        changes,
        before,
        after,
        drift,
        attention);
  }

  /** The inspection recorded before this one on its board, or null. */
  @Transactional(readOnly = true)
  public InspectionRecord previous(InspectionRecord record) {
    return inspections.ofBoard(record.boardId()).stream()
        .filter(r -> r.id() != record.id() && isLater(record, r))
        .findFirst()
        .orElse(null);
  }

  /** Whether a was inspected after b (by date, then by id). */
  private static boolean isLater(InspectionRecord a, InspectionRecord b) {
    int byDate = a.inspectedOn().compareTo(b.inspectedOn());
    return byDate != 0 ? byDate > 0 : a.id() > b.id();
  }

  private static Double peakAt(List<HistoryPoint> points, long entryId) {
    HistoryPoint last = null;
    for (HistoryPoint p : points) {
      if (p.entryId() <= entryId) {
        last = p;
      }
    }
    if (last == null || last.removed() || last.phaseCurrentsAmps() == null) {
      return null;
    }
    return last.phaseCurrentsAmps().values().stream()
        .filter(Objects::nonNull)
        .max(Double::compare)
        .orElse(null);
  }

  static String category(ChangeLogEntry e) {
    return switch (e.kind()) {
      case CIRCUIT_ADDED -> "added";
      case CIRCUIT_REMOVED -> "removed";
      case BALANCING_APPLIED -> "moved";
      case LOAD_ADDED, LOAD_EDITED, LOAD_REMOVED -> "load";
      case CIRCUIT_EDITED -> circuitEdit(e.before(), e.after());
      default -> "board";
    };
  }

  private static String circuitEdit(String beforeJson, String afterJson) {
    if (beforeJson == null || afterJson == null) {
      return "edited";
    }
    CircuitSpec before = InspectionStore.JSON.readValue(beforeJson, CircuitSpec.class);
    CircuitSpec after = InspectionStore.JSON.readValue(afterJson, CircuitSpec.class);
    if (!Objects.equals(before.device(), after.device())) {
      return "device";
    }
    if (!Objects.equals(before.cable(), after.cable())) {
      return "cable";
    }
    if (before.wayNumber() != after.wayNumber() || before.position() != after.position()) {
      return "moved";
    }
    return "edited";
  }
}
