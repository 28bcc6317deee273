package com.wayledger.exchange;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.DwellingForm;
import com.wayledger.board.ScheduleService;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Plans an import against a board (matching the file's circuits to the board's own, so that an
 * edited export can come back) and stores it through the schedule service, all or nothing, as one
 * change-log entry.
 */
@Service
public class ImportService {

  private final BoardService boards;
  private final ScheduleService schedule;
  private final RowReader rows;
  private final com.wayledger.board.DwellingService dwellings;

  public ImportService(
      BoardService boards,
      ScheduleService schedule,
      jakarta.validation.Validator validator,
      com.wayledger.board.DwellingService dwellings) {
    this.boards = boards;
    this.schedule = schedule;
    this.rows = new RowReader(validator);
    this.dwellings = dwellings;
  }

  /** Every row of the table checked, and matched against the board as it is now. */
  @Transactional(readOnly = true)
  public ImportPlan plan(long boardId, SheetTable table, List<ImportField> mapping) {
    return plan(boardId, table, mapping, false);
  }

  /**
   * Every row of the table checked, and matched against the board as it is now.
   *
   * @param removeMissing whether the board's circuits that the file leaves out are removed (else
   *     they are kept, and a row for a position one of them holds is a problem)
   */
  @Transactional(readOnly = true)
  public ImportPlan plan(
      long boardId, SheetTable table, List<ImportField> mapping, boolean removeMissing) {
    Board board = boards.get(boardId);
    ImportPlan read =
        rows.read(
            table,
            mapping,
            new RowReader.BoardContext(
                board.getPhases(),
                board.getWayCount(),
                Set.of(),
                board.getPositions(),
                java.util.Arrays.stream(com.wayledger.engine.Phase.values())
                    .map(board::lineName)
                    .toList()));
    List<CircuitEntry> stored = ExportReader.entry(board, 0).circuits();
    ScheduleMatcher.Result matched =
        ScheduleMatcher.match(
            read.circuits(), stored, removeMissing, board::lineName, absentOptional(mapping));
    Map<Integer, ImportPlan.Problem> taken = new HashMap<>();
    matched
        .blocked()
        .forEach(
            (circuit, where) -> {
              String holder =
                  stored.stream()
                      .filter(
                          s ->
                              s.circuit().wayNumber() == where.wayNumber()
                                  && s.circuit().position().phases().contains(where.phase()))
                      .map(s -> s.circuit().description())
                      .findFirst()
                      .orElse("");
              for (int row : circuit.rowNumbers()) {
                taken.put(
                    row,
                    new ImportPlan.Problem(
                        ImportField.LINE,
                        "import.cell.takenKept",
                        new Object[] {where.wayNumber(), board.lineName(where.phase()), holder}));
              }
            });
    List<ImportPlan.PreviewRow> previewRows = new ArrayList<>();
    for (ImportPlan.PreviewRow row : read.rows()) {
      ImportPlan.Problem problem = taken.get(row.number());
      if (problem == null) {
        previewRows.add(row);
      } else {
        List<ImportPlan.Problem> problems = new ArrayList<>(row.problems());
        problems.add(problem);
        previewRows.add(
            new ImportPlan.PreviewRow(
                row.number(), row.circuit(), row.load(), problems, row.notes()));
      }
    }
    List<ImportPlan.PlannedCircuit> circuits =
        read.circuits().stream().filter(c -> !matched.blocked().containsKey(c)).toList();
    return new ImportPlan(previewRows, circuits, matched.outcomes());
  }

  /**
   * Stores what the plan adds, changes and removes in one transaction and one change-log entry with
   * the reason: if the schedule service refuses any of it (a position filled meanwhile, a circuit
   * changed since the preview), nothing is stored.
   *
   * @return the number of circuits added, changed and removed
   */
  @Transactional
  public int[] store(long boardId, ImportPlan plan, String fileName, String reason) {
    return store(boardId, plan, fileName, reason, null);
  }

  /**
   * Stores the plan and, when the file carries one board's NEC dwelling inputs (all of them valid),
   * those inputs on the board, in the same transaction: both or neither.
   */
  @Transactional
  public int[] store(
      long boardId,
      ImportPlan plan,
      String fileName,
      String reason,
      DwellingInputsInFile dwellingInputs) {
    int[] stored = storePlan(boardId, plan, fileName, reason);
    if (dwellingInputs != null && dwellingInputs.isValid()) {
      DwellingForm form = dwellingInputs.form();
      dwellings.save(
          boardId,
          new DwellingForm(
              form.floorArea(),
              form.areaUnit(),
              form.smallApplianceCircuits(),
              form.laundryCircuits(),
              form.optionalMethod(),
              form.addition(),
              null,
              reason));
    }
    return stored;
  }

  private int[] storePlan(long boardId, ImportPlan plan, String fileName, String reason) {
    int added = (int) plan.count(ImportOutcome.Kind.ADDED);
    int changed = (int) plan.count(ImportOutcome.Kind.CHANGED);
    int removed = (int) plan.count(ImportOutcome.Kind.REMOVED);
    String summary =
        "Imported from “"
            + (fileName == null || fileName.isBlank() ? "a spreadsheet" : fileName)
            + "”: "
            + added
            + " added, "
            + changed
            + " changed, "
            + removed
            + " removed";
    return schedule.applyEdits(boardId, plan.edits(), summary, reason);
  }

  /**
   * The optional circuit columns the file does not have: an absent column leaves the stored value
   * as it is, as a column the user set to "ignore" does; only a present empty cell clears it.
   */
  static Set<ImportField> absentOptional(List<ImportField> mapping) {
    return AbsentColumns.of(mapping);
  }
}
