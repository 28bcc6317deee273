package com.wayledger.check;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.SiteService;
import java.util.ArrayList;
import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * Every problem the checks found on a site, board by board, filterable by grade, each linked to its
 * circuit.
 */
@Controller
public class SiteFindingsController {

  private final SiteService sites;
  private final BoardService boards;
  private final AnalysisService analysis;

  public SiteFindingsController(SiteService sites, BoardService boards, AnalysisService analysis) {
    this.sites = sites;
    this.boards = boards;
    this.analysis = analysis;
  }

  /** One line of the site's findings list. */
  public record Line(
      long boardId,
      String boardReference,
      Long circuitId,
      Integer wayNumber,
      Finding finding,
      String place) {}

  @GetMapping("/sites/{id}/findings")
  public String findings(
      @PathVariable long id, @RequestParam(required = false) Verdict severity, Model model) {
    SiteAnalysis results = analysis.ofSite(id);
    List<Line> lines = new ArrayList<>();
    for (BoardTreeNode node : boards.tree(id)) {
      long boardId = node.board().getId();
      BoardFindings board = results.boardFindings(boardId).orElse(null);
      if (board == null) {
        continue;
      }
      board.findings().stream()
          .filter(finding -> shown(finding, severity))
          .forEach(
              finding ->
                  lines.add(
                      new Line(
                          boardId, board.reference(), null, null, finding, board.reference())));
      board
          .circuits()
          .forEach(
              circuit ->
                  circuit.findings().stream()
                      .filter(finding -> shown(finding, severity))
                      .forEach(
                          finding ->
                              lines.add(
                                  new Line(
                                      boardId,
                                      board.reference(),
                                      circuit.circuitId(),
                                      circuit.wayNumber(),
                                      finding,
                                      circuit.placeOnBoard()))));
    }
    lines.sort(java.util.Comparator.comparing(line -> line.finding().verdict()));
    model.addAttribute("site", sites.get(id));
    model.addAttribute("lines", lines);
    model.addAttribute("severity", severity);
    model.addAttribute(
        "verdicts", List.of(Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE, Verdict.NOT_ASSESSED));
    model.addAttribute("settings", results.findings().settings());
    return "check/site-findings";
  }

  private static boolean shown(Finding finding, Verdict severity) {
    return finding.verdict() != Verdict.PASS && (severity == null || finding.verdict() == severity);
  }
}
