package com.wayledger.inspection;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.exchange.SheetTable;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Reads a results sheet into the result grid of a board: each row finds its circuit by the circuit
 * key (when the sheet carries one) or by way and line, its readings are graded exactly as typed
 * ones are, and the inspection is recorded as a new record only when every row reads — all or
 * nothing, never changing a record already saved.
 */
@Service
public class ResultImportService {

  /** "3", "3.0" (a number cell), "Way 3", "3 L2", "3 L1–L3". */
  private static final Pattern WAY =
      Pattern.compile("(?i)^(?:way|cct|ckt|no\\.?)?\\s*(\\d{1,4})(?:\\.0+)?(?:\\s+(.+))?$");

  /** A unit written after a reading, which the grid implies. */
  private static final Pattern UNIT =
      Pattern.compile("(?i)\\s*(mΩ|MΩ|Ω|megohms?|mohms?|ohms?|ms)$");

  private static final Pattern KEY = Pattern.compile("^\\d{1,18}(\\.0+)?$");

  private final BoardService boards;
  private final InspectionService inspections;

  public ResultImportService(BoardService boards, InspectionService inspections) {
    this.boards = boards;
    this.inspections = inspections;
  }

  /**
   * The header fields typed beside the import: the same as the result grid's.
   *
   * @param confirmedOutcome the outcome the inspector confirmed (SATISFACTORY or UNSATISFACTORY)
   */
  public record Header(
      String inspectedOn,
      String inspector,
      String instruments,
      String testCelsius,
      String insulationTestVolts,
      String confirmedOutcome) {}

  /** Every row matched and graded against the board as it is now; nothing is stored. */
  @Transactional(readOnly = true)
  public ResultImportPlan plan(
      long boardId, SheetTable table, List<ResultColumn> mapping, Header header) {
    Board board = boards.get(boardId);
    Read read = read(board, table, mapping);
    InspectionSheet sheet = inspections.grade(boardId, form(read, header));
    return plan(read, sheet);
  }

  /**
   * Records the sheet as a new inspection when every row reads and the header is complete and
   * confirmed; otherwise stores nothing and returns the plan showing why.
   *
   * @return the new inspection's id, or null with the plan
   */
  @Transactional
  public Outcome record(long boardId, SheetTable table, List<ResultColumn> mapping, Header header) {
    Board board = boards.get(boardId);
    Read read = read(board, table, mapping);
    InspectionForm form = form(read, header);
    if (read.problems().values().stream().anyMatch(p -> !p.isEmpty())) {
      return new Outcome(null, plan(read, inspections.grade(boardId, form)));
    }
    InspectionService.Recorded recorded = inspections.record(boardId, form);
    return new Outcome(recorded.id(), plan(read, recorded.sheet()));
  }

  /** The result of {@link #record}: the new record's id, or null; and the plan as graded. */
  public record Outcome(Long id, ResultImportPlan plan) {}

  // --- reading rows ---

  /** Each sheet row's circuit, typed readings and problems, by row index. */
  private record Read(
      List<SheetTable.Row> rows,
      Map<Integer, Circuit> circuits,
      Map<Integer, ResultEntry> entries,
      Map<Integer, List<ResultImportPlan.Problem>> problems) {}

  private Read read(Board board, SheetTable table, List<ResultColumn> mapping) {
    Map<ResultColumn, Integer> columns = new EnumMap<>(ResultColumn.class);
    for (int c = 0; c < mapping.size(); c++) {
      if (mapping.get(c) != ResultColumn.IGNORE) {
        columns.putIfAbsent(mapping.get(c), c);
      }
    }
    List<Circuit> inUse =
        board.getCircuits().stream().filter(c -> c.getStatus() == WayStatus.IN_USE).toList();
    Map<Integer, Circuit> circuits = new HashMap<>();
    Map<Integer, ResultEntry> entries = new HashMap<>();
    Map<Integer, List<ResultImportPlan.Problem>> problems = new HashMap<>();
    Map<Long, Integer> firstRowOf = new HashMap<>();
    for (int i = 0; i < table.rows().size(); i++) {
      SheetTable.Row row = table.rows().get(i);
      List<ResultImportPlan.Problem> found = new ArrayList<>();
      Circuit circuit = match(board, inUse, row, columns, found);
      if (circuit != null) {
        Integer earlier = firstRowOf.putIfAbsent(circuit.getId(), row.number());
        if (earlier != null) {
          found.add(problem(null, "inspection.import.error.twice", earlier));
          circuit = null;
        }
      }
      ResultEntry entry = entry(circuit, row, columns, found);
      if (circuit != null) {
        circuits.put(i, circuit);
        entries.put(i, entry);
      }
      problems.put(i, found);
    }
    return new Read(table.rows(), circuits, entries, problems);
  }

  private static Circuit match(
      Board board,
      List<Circuit> inUse,
      SheetTable.Row row,
      Map<ResultColumn, Integer> columns,
      List<ResultImportPlan.Problem> found) {
    String key = cell(row, columns, ResultColumn.CIRCUIT_KEY);
    if (!key.isEmpty()) {
      if (KEY.matcher(key).matches()) {
        long id = Long.parseLong(key.replaceAll("\\.0+$", ""));
        for (Circuit c : inUse) {
          if (c.getId() == id) {
            return c;
          }
        }
      }
      found.add(problem(ResultColumn.CIRCUIT_KEY, "inspection.import.error.key", key));
      return null;
    }
    String wayText = cell(row, columns, ResultColumn.WAY);
    if (wayText.isEmpty()) {
      found.add(problem(ResultColumn.WAY, "inspection.import.error.noWay"));
      return null;
    }
    Matcher way = WAY.matcher(wayText);
    if (!way.matches()) {
      found.add(problem(ResultColumn.WAY, "inspection.import.error.way", wayText));
      return null;
    }
    int number = Integer.parseInt(way.group(1));
    String lineText = cell(row, columns, ResultColumn.LINE);
    if (lineText.isEmpty() && way.group(2) != null) {
      lineText = way.group(2);
    }
    PhasePosition line = null;
    if (!lineText.isEmpty() && board.isThreePhase()) {
      line = line(lineText);
      if (line == null) {
        found.add(problem(ResultColumn.LINE, "inspection.import.error.line", lineText));
        return null;
      }
    }
    List<Circuit> atWay = new ArrayList<>();
    for (Circuit c : inUse) {
      if (c.getWayNumber() == number && (line == null || c.getPosition() == line)) {
        atWay.add(c);
      }
    }
    if (atWay.size() == 1) {
      return atWay.get(0);
    }
    if (atWay.isEmpty()) {
      found.add(
          problem(
              ResultColumn.WAY,
              "inspection.import.error.noCircuit",
              line == null ? Integer.toString(number) : number + " " + lineText.strip()));
    } else {
      found.add(problem(ResultColumn.LINE, "inspection.import.error.severalAtWay", number));
    }
    return null;
  }

  /** L1, L2, L3 (or 1, 2, 3) or a three-pole position (3P, TP, L1–L3, L123). */
  static PhasePosition line(String text) {
    String t = text.toUpperCase(Locale.ROOT).replaceAll("[\\s\\-–/,.]", "");
    return switch (t) {
      case "L1", "1" -> PhasePosition.L1;
      case "L2", "2" -> PhasePosition.L2;
      case "L3", "3" -> PhasePosition.L3;
      case "3P", "TP", "TPN", "L1L3", "L1L2L3", "L123", "3PH" -> PhasePosition.THREE_POLE;
      default -> null;
    };
  }

  private static ResultEntry entry(
      Circuit circuit,
      SheetTable.Row row,
      Map<ResultColumn, Integer> columns,
      List<ResultImportPlan.Problem> found) {
    Map<ResultColumn, String> text = new EnumMap<>(ResultColumn.class);
    for (ResultColumn column : ResultColumn.values()) {
      if (column.isReading() && column != ResultColumn.RCD_DELAYED) {
        String raw = cell(row, columns, column);
        text.put(
            column,
            column == ResultColumn.POLARITY || column == ResultColumn.RCD_BUTTON
                ? yesNo(raw)
                : reading(raw));
      }
    }
    Boolean delayed = delayed(cell(row, columns, ResultColumn.RCD_DELAYED));
    if (delayed == null) {
      found.add(problem(ResultColumn.RCD_DELAYED, "inspection.import.error.delayed"));
    }
    return new ResultEntry(
        circuit == null ? null : circuit.getId(),
        text.get(ResultColumn.R1R2),
        text.get(ResultColumn.R2),
        text.get(ResultColumn.RING_R1),
        text.get(ResultColumn.RING_RN),
        text.get(ResultColumn.RING_R2),
        text.get(ResultColumn.IR_LL),
        text.get(ResultColumn.IR_LE),
        text.get(ResultColumn.IR_NE),
        text.get(ResultColumn.POLARITY),
        text.get(ResultColumn.ZS),
        text.get(ResultColumn.RCD_RATED),
        text.get(ResultColumn.RCD_FIVE),
        text.get(ResultColumn.RCD_BUTTON),
        Boolean.TRUE.equals(delayed));
  }

  /**
   * A reading with the unit the grid implies taken off ("0.45 Ω", "200 MΩ", "24 ms"); "N/A" and a
   * dash are "not measured" (the trade's way of marking a test that does not apply).
   */
  static String reading(String raw) {
    String t = raw.strip();
    if (t.matches("(?i)n/?a|-|–|—")) {
      return "";
    }
    return UNIT.matcher(t).replaceFirst("").strip();
  }

  /** Ticks and words for a yes/no test; anything else is left for the grid to refuse. */
  static String yesNo(String raw) {
    String t = raw.strip().toLowerCase(Locale.ROOT);
    return switch (t) {
      case "n/a", "na", "-", "–", "—" -> "";
      case "ok", "yes", "y", "✓", "✔", "√", "pass", "correct", "true" -> "ok";
      case "wrong", "no", "n", "✗", "✘", "fail", "incorrect", "false" -> "wrong";
      default -> raw.strip();
    };
  }

  /** A time-delayed (type S) RCD: "S", yes or a tick; blank or no otherwise; null if unreadable. */
  static Boolean delayed(String raw) {
    String t = raw.strip().toLowerCase(Locale.ROOT);
    return switch (t) {
      case "s", "yes", "y", "✓", "✔", "true", "delayed" -> true;
      case "", "no", "n", "-", "–", "n/a", "na", "false", "g", "general" -> false;
      default -> null;
    };
  }

  private static String cell(
      SheetTable.Row row, Map<ResultColumn, Integer> columns, ResultColumn column) {
    Integer c = columns.get(column);
    return c == null ? "" : row.cell(c).strip();
  }

  private static ResultImportPlan.Problem problem(
      ResultColumn column, String code, Object... arguments) {
    return new ResultImportPlan.Problem(column, code, arguments);
  }

  // --- the grid and the plan ---

  private static InspectionForm form(Read read, Header header) {
    List<ResultEntry> rows = new ArrayList<>();
    for (int i = 0; i < read.rows().size(); i++) {
      ResultEntry entry = read.entries().get(i);
      if (entry != null) {
        rows.add(entry);
      }
    }
    return new InspectionForm(
        header.inspectedOn(),
        header.inspector(),
        header.instruments(),
        header.testCelsius(),
        header.insulationTestVolts(),
        "",
        "",
        "",
        "",
        "",
        null,
        header.confirmedOutcome(),
        rows,
        List.of());
  }

  private static ResultImportPlan plan(Read read, InspectionSheet sheet) {
    Map<Long, SheetRow> byCircuit = new LinkedHashMap<>();
    sheet.rows().forEach(r -> byCircuit.put(r.circuitId(), r));
    Map<String, ResultColumn> byGridColumn = new HashMap<>();
    for (ResultColumn column : ResultColumn.values()) {
      if (column.isReading()) {
        byGridColumn.put(column.gridColumn(), column);
      }
    }
    List<ResultImportPlan.Row> rows = new ArrayList<>();
    for (int i = 0; i < read.rows().size(); i++) {
      SheetTable.Row row = read.rows().get(i);
      List<ResultImportPlan.Problem> problems = new ArrayList<>(read.problems().get(i));
      Circuit circuit = read.circuits().get(i);
      SheetRow graded = circuit == null ? null : byCircuit.get(circuit.getId());
      if (graded != null) {
        String prefix = "rows[" + graded.index() + "].";
        for (Map.Entry<String, String> error : sheet.errors().entrySet()) {
          if (error.getKey().startsWith(prefix)) {
            ResultColumn column = byGridColumn.get(error.getKey().substring(prefix.length()));
            problems.add(problem(column, error.getValue()));
          }
        }
      }
      rows.add(
          new ResultImportPlan.Row(
              row.number(),
              circuit == null ? null : circuit.getId(),
              circuit == null ? "" : circuit.positionLabel(),
              circuit == null ? "" : circuit.getDescription(),
              graded,
              problems));
    }
    return new ResultImportPlan(rows, sheet);
  }
}
