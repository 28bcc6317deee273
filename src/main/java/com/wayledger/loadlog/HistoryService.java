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

  public HistoryService(ChangeLog log, BoardService boards, AnalysisService analysis) {
    this.log = log;
    this.boards = boards;
    this.analysis = analysis;
  }

  @Transactional(readOnly = true)
  public List<HistoryPoint> points(long boardId) {
    Board board = boards.get(boardId);
    var site = board.getSite();
    return HistoryReplay.replay(
        log.boardHistory(boardId),
        ScheduleMapper.headerOf(board),
        ScheduleMapper.supplyOf(site),
        analysis.methods(),
        site.getDefaultDiversityMethod());
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
