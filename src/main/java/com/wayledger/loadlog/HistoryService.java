package com.wayledger.loadlog;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.ScheduleMapper;
import java.time.Instant;
import java.util.List;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** A board's demand at every logged change, rebuilt from the log (see {@link HistoryReplay}). */
@Service
public class HistoryService {

  private final ChangeLog log;
  private final BoardService boards;
  private final AnalysisService analysis;
  private final com.wayledger.board.DwellingService dwellings;

  public HistoryService(
      ChangeLog log,
      BoardService boards,
      AnalysisService analysis,
      com.wayledger.board.DwellingService dwellings) {
    this.log = log;
    this.boards = boards;
    this.analysis = analysis;
    this.dwellings = dwellings;
  }

  @Transactional(readOnly = true)
  public List<HistoryPoint> points(long boardId) {
    Board board = boards.get(boardId);
    var site = board.getSite();
    // in the order the changes took effect: a back-dated entry takes its place in the story
    List<com.wayledger.loadlog.ChangeLogEntry> entries =
        log.boardHistory(boardId).stream()
            .sorted(
                java.util.Comparator.comparing(ChangeLogEntry::effectiveAt)
                    .thenComparingLong(ChangeLogEntry::id))
            .toList();
    return HistoryReplay.replay(
        entries,
        ScheduleMapper.headerOf(board),
        ScheduleMapper.supplyOf(site),
        analysis.methods(),
        site.getDefaultDiversityMethod(),
        dwellings
            .find(boardId)
            .map(
                record -> {
                  var in = record.inputs();
                  return new com.wayledger.engine.demand.DwellingParameters(
                      in.floorAreaSquareFeet(), in.smallApplianceCircuits(), in.laundryCircuits());
                })
            .orElse(com.wayledger.engine.demand.DwellingParameters.UNKNOWN));
  }

  @Transactional(readOnly = true)
  public DemandHistoryChart chart(long boardId, List<HistoryPoint> points) {
    Board board = boards.get(boardId);
    return DemandHistoryChart.of(
        points,
        board.getIncomer() == null ? null : board.getIncomer().tripRatingAmps(),
        Instant.now());
  }
}
