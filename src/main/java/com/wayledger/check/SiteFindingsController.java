package com.wayledger.check;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.board.FindingGroups;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.protection.BoardFindings;
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
 * Every problem the checks found on a site, board by board, filterable by grade: the same check and
 * grade on many ways of a board is one row naming the ways, each linked to its circuit.
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

  @GetMapping("/sites/{id}/findings")
  public String findings(
      @PathVariable long id, @RequestParam(required = false) Verdict severity, Model model) {
    SiteAnalysis results = analysis.ofSite(id);
    List<FindingGroups.Group> lines = new ArrayList<>();
    for (BoardTreeNode node : boards.tree(id)) {
      BoardFindings board = results.boardFindings(node.board().getId()).orElse(null);
      lines.addAll(FindingGroups.of(board, FindingGroups.notPassed(severity)));
    }
    // a stable sort: within a grade, boards stay in tree order
    lines.sort(java.util.Comparator.comparing(FindingGroups.Group::verdict));
    model.addAttribute("site", sites.get(id));
    model.addAttribute("lines", lines.stream().filter(g -> g.verdict() != Verdict.ADVICE).toList());
    model.addAttribute(
        "advice", lines.stream().filter(g -> g.verdict() == Verdict.ADVICE).toList());
    model.addAttribute("severity", severity);
    model.addAttribute(
        "verdicts", List.of(Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE, Verdict.NOT_ASSESSED));
    model.addAttribute("settings", results.findings().settings());
    return "check/site-findings";
  }
}
