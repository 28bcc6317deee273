package com.wayledger.board;

import com.wayledger.system.NotFoundException;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Component;
import org.springframework.ui.Model;
import org.springframework.web.context.request.RequestContextHolder;
import org.springframework.web.context.request.ServletRequestAttributes;

/**
 * Gathers what the schedule table of a board needs, for the full page and for its htmx fragments.
 * The gathered view ({@link BoardPage}) is built once per site data generation, locale and context
 * path and kept beside the site's analysis ({@link AnalysisService#keptBoardView}): a read after no
 * change costs the one generation query, and every change moves the generation on, so an edit shows
 * at once.
 */
@Component
class SchedulePage {

  /** What a board's view depends on besides its board and the site's data generation. */
  private record ViewKey(Locale locale, String contextPath) {}

  private final BoardRepository boards;
  private final CircuitRepository circuits;
  private final AnalysisService analysis;
  private final MessageSource messages;

  SchedulePage(
      BoardRepository boards,
      CircuitRepository circuits,
      AnalysisService analysis,
      MessageSource messages) {
    this.boards = boards;
    this.circuits = circuits;
    this.analysis = analysis;
    this.messages = messages;
  }

  public BoardPage fill(Model model, long boardId) {
    return fill(model, boardId, null);
  }

  /**
   * As {@link #fill(Model, long)}, and puts the keyboard focus on the first free position after the
   * given way, so that after saving one row the next is one keystroke away.
   */
  public BoardPage fill(Model model, long boardId, Integer focusAfterWay) {
    Locale locale = LocaleContextHolder.getLocale();
    String contextPath = contextPath();
    BoardPage page =
        analysis.keptBoardView(
            boardId,
            new ViewKey(locale, contextPath),
            results -> build(boardId, results, locale, contextPath));
    page.addTo(model, focusAfterWay);
    return page;
  }

  /** Reads the board and its circuits (in the caller's transaction) and builds the page's view. */
  private BoardPage build(long boardId, SiteAnalysis results, Locale locale, String contextPath) {
    Board board =
        boards.findById(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    var onBoard = circuits.findByBoard(boardId);
    // "MDB, way 3 L1 “Kitchen DB”": the board and its way by name, never an id
    String feedingWay =
        board.getFedFromCircuitId() == null
            ? null
            : circuits
                .findById(board.getFedFromCircuitId())
                .map(
                    way ->
                        way.positionLabel()
                            + (way.getDescription() == null || way.getDescription().isBlank()
                                ? ""
                                : " “" + way.getDescription() + "”"))
                .orElse(null);
    var rows = ScheduleRows.of(board, onBoard);
    Map<Long, List<String>> missing = new HashMap<>();
    // the dwelling boards as the kept analysis saw them: the same data generation, no extra read
    boolean locationChecked =
        MissingInputs.locationChecked(board, results.dwellingBoardIds().contains(boardId));
    onBoard.forEach(
        circuit -> missing.put(circuit.getId(), MissingInputs.of(circuit, locationChecked)));
    var demand = results.boardDemand(boardId);
    var circuitDemands = results.circuitDemands(boardId);
    Map<Long, ScheduleFigures> figures =
        demand == null
            ? Map.of()
            : ScheduleFigures.of(rows, circuitDemands, demand.nominalVoltageVolts(), locale);
    var circuitProblems = results.circuitProblemCounts(boardId);
    // the schedule table's rows with their words, links and figures as text: one read per cell
    PageWords words = new PageWords(messages, locale);
    List<ScheduleLine> lines =
        ScheduleLines.of(
            board,
            rows,
            contextPath,
            missing,
            circuitDemands,
            figures,
            circuitProblems,
            null,
            words);
    var boardFindings = results.boardFindings(boardId).orElse(null);
    Double dividingVolts =
        results.spec().boards().stream()
            .filter(spec -> spec.id() == boardId)
            .findFirst()
            .map(
                spec ->
                    com.wayledger.engine.dwelling.DwellingSite.dividingVolts(
                        spec, results.spec().supply().nominalVoltageToEarthVolts()))
            .orElse(null);
    return new BoardPage(
        BoardView.of(board),
        SiteView.of(board.getSite()),
        feedingWay,
        PanelLayout.of(board, onBoard),
        List.copyOf(lines),
        onBoard.size(),
        demand,
        circuitDemands,
        new Decimals(locale),
        results.circuitFindings(boardId),
        circuitProblems,
        ScheduleLine.Words.of(words),
        results.problems(boardId),
        results.problemCounts(boardId),
        boardFindings,
        // the findings list's lines with their words, links and notes as text: no fragment per line
        FindingLines.ofBoard(boardId, results, onBoard, contextPath, words),
        results.findings().settings(),
        results.dwellingWorksheets(boardId),
        dividingVolts,
        demand == null
            ? null
            : PhaseChart.of(
                demand, board.getIncomer() == null ? null : board.getIncomer().tripRatingAmps()),
        demand == null ? null : PhaseChart.connectedAmps(demand));
  }

  /** The application's context path, put before every link a row prints ("" at the root). */
  private static String contextPath() {
    return RequestContextHolder.getRequestAttributes() instanceof ServletRequestAttributes request
        ? request.getRequest().getContextPath()
        : "";
  }
}
