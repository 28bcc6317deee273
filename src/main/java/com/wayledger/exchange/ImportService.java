package com.wayledger.exchange;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.Phase;
import jakarta.validation.Validator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Plans an import against a board and stores it through the schedule service, all or nothing. */
@Service
public class ImportService {

  private final BoardService boards;
  private final ScheduleService schedule;
  private final RowReader rows;

  public ImportService(BoardService boards, ScheduleService schedule, Validator validator) {
    this.boards = boards;
    this.schedule = schedule;
    this.rows = new RowReader(validator);
  }

  /** Every row of the table checked against the board as it is now. */
  @Transactional(readOnly = true)
  public ImportPlan plan(long boardId, SheetTable table, List<ImportField> mapping) {
    Board board = boards.get(boardId);
    Set<String> occupied = new HashSet<>();
    for (Circuit circuit : board.getCircuits()) {
      for (Phase phase : circuit.getPosition().phases()) {
        occupied.add(RowReader.BoardContext.slot(circuit.getWayNumber(), phase));
      }
    }
    return rows.read(
        table,
        mapping,
        new RowReader.BoardContext(board.getPhases(), board.getWayCount(), occupied));
  }

  /**
   * Stores the planned circuits and their loads in one transaction: if the schedule service refuses
   * any of them (someone filled a position meanwhile), nothing is stored.
   *
   * @return the number of circuits and loads stored
   */
  @Transactional
  public int[] store(long boardId, List<ImportPlan.PlannedCircuit> circuits) {
    int loads = 0;
    for (ImportPlan.PlannedCircuit planned : circuits) {
      Circuit circuit = schedule.addCircuit(boardId, planned.circuit());
      for (LoadForm load : planned.loads()) {
        schedule.addLoad(circuit.getId(), load);
        loads++;
      }
    }
    return new int[] {circuits.size(), loads};
  }
}
