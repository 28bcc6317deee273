package com.wayledger.loadlog;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.engine.WayStatus;
import java.time.LocalDate;
import java.util.List;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * What a phone shows when the code on a printed door chart is scanned: the board as it is now, and
 * whether anything about it changed in the log since the chart's position.
 */
@Service
public class LiveBoard {

  private final BoardService boards;
  private final ChangeLog log;

  public LiveBoard(BoardService boards, ChangeLog log) {
    this.boards = boards;
    this.log = log;
  }

  /**
   * The live page's content.
   *
   * @param boardId the board
   * @param printedAt the change-log position the chart was printed at; null when not given
   * @param printedOn the date the chart says it was printed; null when not given
   */
  @Transactional(readOnly = true)
  public View view(long boardId, Long printedAt, LocalDate printedOn) {
    Board board = boards.get(boardId);
    List<Way> ways =
        board.getCircuits().stream()
            .map(
                circuit ->
                    new Way(
                        circuit.getId(),
                        circuit.positionLabel(),
                        circuit.getStatus(),
                        circuit.getDescription() == null ? "" : circuit.getDescription(),
                        circuit.getDevice() == null ? "" : circuit.getDevice().label()))
            .toList();
    long now = log.latestPosition(boardId);
    Banner banner;
    List<ChangeLogEntry> since = List.of();
    if (printedAt == null) {
      banner = Banner.NONE;
    } else if (printedAt > now) {
      banner = Banner.AHEAD;
    } else {
      since = log.boardHistorySince(boardId, printedAt);
      banner = since.isEmpty() ? Banner.UNCHANGED : Banner.CHANGED;
    }
    return new View(
        board.getId(),
        board.getReference(),
        board.getLocation() == null ? "" : board.getLocation(),
        board.getSite().getId(),
        board.getSite().getName(),
        ways,
        banner,
        printedAt,
        printedOn,
        now,
        since);
  }

  /** What the banner says. */
  public enum Banner {
    /** The page was opened without a chart's position: no banner. */
    NONE,
    /** Nothing about the board was logged after the chart's position. */
    UNCHANGED,
    /** Changes were logged after the chart's position: the chart is out of date. */
    CHANGED,
    /** The chart claims a position this log has not reached (another copy of the data?). */
    AHEAD
  }

  /**
   * One way as the live page lists it.
   *
   * @param circuitId the circuit
   * @param position "3 L2"
   * @param status in use, spare device or empty space
   * @param description what it feeds
   * @param device the device as short text
   */
  public record Way(
      long circuitId, String position, WayStatus status, String description, String device) {}

  /**
   * The live page.
   *
   * @param boardId the board
   * @param reference its name on site
   * @param location where it is
   * @param siteId its site
   * @param siteName the site's name
   * @param ways its ways now
   * @param banner what the banner says
   * @param printedAt the chart's log position; null when not given
   * @param printedOn the chart's print date; null when not given
   * @param position the board's log position now
   * @param changes entries after the chart's position, oldest first
   */
  public record View(
      long boardId,
      String reference,
      String location,
      long siteId,
      String siteName,
      List<Way> ways,
      Banner banner,
      Long printedAt,
      LocalDate printedOn,
      long position,
      List<ChangeLogEntry> changes) {}
}
