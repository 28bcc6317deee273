package com.wayledger.exchange;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleMapper;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.EnumWords;
import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Reads what an export writes in one read-only transaction (entities are lazy and the session
 * closes with the transaction), and runs both engines (through the board feature's analysis) over
 * the whole site, since a board's figures depend on the boards it feeds.
 */
@Service
public class ExportReader {

  private final BoardService boards;
  private final SiteService sites;
  private final AnalysisService analyses;
  private final Clock clock;

  public ExportReader(BoardService boards, SiteService sites, AnalysisService analyses) {
    this.boards = boards;
    this.sites = sites;
    this.analyses = analyses;
    this.clock = Clock.systemDefaultZone();
  }

  /** One board, with the site's figures. */
  @Transactional(readOnly = true)
  public ExportData board(long boardId) {
    Board board = boards.get(boardId);
    return read(board.getSite(), boardId);
  }

  /** Every board of the site, in tree order. */
  @Transactional(readOnly = true)
  public ExportData site(long siteId) {
    return read(sites.get(siteId), null);
  }

  private ExportData read(Site site, Long onlyBoardId) {
    List<BoardTreeNode> tree = boards.tree(site.getId());
    List<Board> all = tree.stream().map(BoardTreeNode::board).toList();
    SiteAnalysis analysis =
        analyses.analyse(ScheduleMapper.toSpec(site, all), ScheduleMapper.mccbSettingsOf(all));
    List<BoardEntry> entries =
        tree.stream()
            .filter(node -> onlyBoardId == null || node.board().getId().equals(onlyBoardId))
            .map(node -> entry(node.board(), node.depth()))
            .toList();
    return new ExportData(
        site.getId(),
        site.getName(),
        site.getEarthingSystem() == null ? "" : EnumWords.standard().of(site.getEarthingSystem()),
        entries,
        analysis.demand(),
        analysis.findings(),
        LocalDate.now(clock),
        com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).title(),
        site.getSupplySystem() == null ? null : EnumWords.standard().of(site.getSupplySystem()),
        site.cableUnits());
  }

  /** The rule set a board is checked against, as the workbook's facts row names it. */
  static String ruleSetTitleOf(Board board) {
    return com.wayledger.engine.rules.RuleSets.of(board.getSite().getRuleSet()).title();
  }

  /**
   * The board's supply system in the words the workbook's facts row writes ("" when none): its
   * site's system, the one every board of the site is on.
   */
  static String supplySystemWordsOf(Board board) {
    var system = board.system();
    return system == null ? "" : EnumWords.standard().of(system);
  }

  static BoardEntry entry(Board board, int depth) {
    List<CircuitEntry> circuits =
        board.getCircuits().stream()
            .map(
                (Circuit circuit) ->
                    new CircuitEntry(
                        circuit.getId(),
                        CircuitForm.of(circuit),
                        circuit.getLoads().stream().map(LoadForm::of).toList(),
                        circuit.recordVersion()))
            .toList();
    return new BoardEntry(
        board.getId(),
        board.getReference(),
        board.getLocation(),
        board.getPhases(),
        board.getWayCount(),
        board.getParent() == null ? null : board.getParent().getReference(),
        board.getIncomer() == null ? "" : board.getIncomer().label(),
        depth,
        circuits,
        java.util.Arrays.stream(com.wayledger.engine.Phase.values()).map(board::lineName).toList());
  }
}
