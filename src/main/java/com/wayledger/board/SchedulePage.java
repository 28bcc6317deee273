package com.wayledger.board;

import com.wayledger.system.NotFoundException;
import java.util.Locale;
import java.util.Map;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.ui.Model;
import org.springframework.web.context.request.RequestContextHolder;
import org.springframework.web.context.request.ServletRequestAttributes;

/**
 * Gathers what the schedule table of a board needs, for the full page and for its htmx fragments.
 */
@Component
class SchedulePage {

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

  @Transactional(readOnly = true)
  public Board fill(Model model, long boardId) {
    return fill(model, boardId, null);
  }

  /**
   * As {@link #fill(Model, long)}, and puts the keyboard focus on the first free position after the
   * given way, so that after saving one row the next is one keystroke away.
   */
  @Transactional(readOnly = true)
  public Board fill(Model model, long boardId, Integer focusAfterWay) {
    Board board =
        boards.findById(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    var onBoard = circuits.findByBoard(boardId);
    onBoard.forEach(circuit -> circuit.getLoads().size());
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    board.getSite().getName();
    if (board.getParent() != null) {
      board.getParent().getReference();
    }
    // "MDB, way 3 L1 “Kitchen DB”": the board and its way by name, never an id
    model.addAttribute(
        "feedingWay",
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
                .orElse(null));
    model.addAttribute("panel", PanelLayout.of(board, onBoard));
    var rows = ScheduleRows.of(board, onBoard);
    model.addAttribute("rows", rows);
    model.addAttribute(
        "focusElementId",
        focusAfterWay == null
            ? null
            : rows.stream()
                .filter(row -> row.isFree() && row.wayNumber() >= focusAfterWay)
                .map(ScheduleRow::elementId)
                .findFirst()
                .orElse(null));
    model.addAttribute("circuitCount", onBoard.size());
    SiteAnalysis results = analysis.ofSite(board.getSite().getId());
    java.util.Map<Long, java.util.List<String>> missing = new java.util.HashMap<>();
    // the dwelling boards as the kept analysis saw them: the same data generation, no extra read
    boolean locationChecked =
        MissingInputs.locationChecked(board, results.dwellingBoardIds().contains(boardId));
    onBoard.forEach(
        circuit -> missing.put(circuit.getId(), MissingInputs.of(circuit, locationChecked)));
    var demand = results.boardDemand(boardId);
    model.addAttribute("demand", demand);
    var circuitDemands = results.circuitDemands(boardId);
    model.addAttribute("circuitDemand", circuitDemands);
    Locale locale = LocaleContextHolder.getLocale();
    model.addAttribute("decimals", new Decimals(locale));
    Map<Long, ScheduleFigures> figures =
        demand == null
            ? Map.of()
            : ScheduleFigures.of(rows, circuitDemands, demand.nominalVoltageVolts(), locale);
    model.addAttribute("circuitFindings", results.circuitFindings(boardId));
    var circuitProblems = results.circuitProblemCounts(boardId);
    model.addAttribute("circuitProblems", circuitProblems);
    // the schedule table's rows with their words, links and figures as text: one read per cell
    PageWords words = new PageWords(messages, locale);
    model.addAttribute("scheduleWords", ScheduleLine.Words.of(words));
    model.addAttribute(
        "lines",
        ScheduleLines.of(
            board,
            rows,
            contextPath(),
            missing,
            circuitDemands,
            figures,
            circuitProblems,
            (String) model.getAttribute("focusElementId"),
            words));
    model.addAttribute("problems", results.problems(boardId));
    model.addAttribute("problemCounts", results.problemCounts(boardId));
    model.addAttribute("boardFindings", results.boardFindings(boardId).orElse(null));
    // the findings list's lines with their words, links and notes as text: no fragment per line
    model.addAttribute(
        "findingLines", FindingLines.ofBoard(boardId, results, onBoard, contextPath(), words));
    model.addAttribute("findingSettings", results.findings().settings());
    model.addAttribute("worksheets", results.dwellingWorksheets(boardId));
    results.spec().boards().stream()
        .filter(spec -> spec.id() == boardId)
        .findFirst()
        .ifPresent(
            spec ->
                model.addAttribute(
                    "dividingVolts",
                    com.wayledger.engine.dwelling.DwellingSite.dividingVolts(
                        spec, results.spec().supply().nominalVoltageToEarthVolts())));
    if (demand != null) {
      model.addAttribute(
          "phaseChart",
          PhaseChart.of(
              demand, board.getIncomer() == null ? null : board.getIncomer().tripRatingAmps()));
      model.addAttribute("connectedAmps", PhaseChart.connectedAmps(demand));
    }
    return board;
  }

  /** The application's context path, put before every link a row prints ("" at the root). */
  private static String contextPath() {
    return RequestContextHolder.getRequestAttributes() instanceof ServletRequestAttributes request
        ? request.getRequest().getContextPath()
        : "";
  }
}
