package com.wayledger.loadlog;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.ChangeKind;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.springframework.format.annotation.DateTimeFormat;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * The board history page, the site-wide log with its filters, and the headroom part of the site
 * page.
 */
@Controller
public class LoadLogController {

  private final ChangeLog log;
  private final HistoryService history;
  private final BoardService boards;
  private final SiteService sites;
  private final AnalysisService analysis;

  public LoadLogController(
      ChangeLog log,
      HistoryService history,
      BoardService boards,
      SiteService sites,
      AnalysisService analysis) {
    this.log = log;
    this.history = history;
    this.boards = boards;
    this.sites = sites;
    this.analysis = analysis;
  }

  @GetMapping("/boards/{id}/history")
  public String boardHistory(@PathVariable long id, Model model) {
    Board board = boards.get(id);
    List<HistoryPoint> points = history.points(id);
    model.addAttribute("board", board);
    model.addAttribute("site", sites.get(board.getSite().getId()));
    List<HistoryPoint> newestFirst = new ArrayList<>(points);
    java.util.Collections.reverse(newestFirst);
    model.addAttribute("points", newestFirst);
    model.addAttribute("chart", history.chart(id, points));
    // the board's own lines: A and B on a 120/240 V panel, L1–L3 on a 400 V board, L1 alone
    model.addAttribute("lines", List.of(Phase.values()).subList(0, board.lineCount()));
    return "loadlog/history";
  }

  @GetMapping("/sites/{id}/log")
  public String siteLog(
      @PathVariable long id,
      @RequestParam(required = false) Long boardId,
      @RequestParam(required = false) String username,
      @RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE) LocalDate from,
      @RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE) LocalDate to,
      @RequestParam(required = false) ChangeKind kind,
      Model model) {
    Site site = sites.get(id);
    LogFilter filter = new LogFilter(boardId, username, from, to, kind);
    model.addAttribute("site", site);
    model.addAttribute("filter", filter);
    model.addAttribute("entries", log.ofSite(id, filter));
    model.addAttribute("boards", boards.onSite(id));
    model.addAttribute("users", log.usersOf(id));
    model.addAttribute("kinds", ChangeKind.values());
    model.addAttribute("limit", ChangeLog.PAGE_LIMIT);
    return "loadlog/log";
  }

  /** The log page with the result of checking the site's hash chain. */
  @GetMapping("/sites/{id}/log/verify")
  public String verify(@PathVariable long id, Model model) {
    model.addAttribute("verification", log.verify(id));
    return siteLog(id, null, null, null, null, null, model);
  }

  /**
   * The headroom table: the bare table when the site page fetches it after it loads, a whole page
   * (layout, caution and all) when the address is opened directly or from the link without script.
   */
  @GetMapping("/sites/{id}/headroom")
  public String headroom(
      @PathVariable long id,
      @org.springframework.web.bind.annotation.RequestHeader(value = "HX-Request", required = false)
          String htmx,
      Model model) {
    Site site = sites.get(id);
    model.addAttribute("site", site);
    model.addAttribute("headroom", headroomOf(site));
    return "true".equals(htmx) ? "loadlog/headroom :: table" : "loadlog/headroom-page";
  }

  List<Headroom> headroomOf(Site site) {
    var results = analysis.ofSite(site.getId());
    List<Headroom> rows = new ArrayList<>();
    for (BoardTreeNode node : boards.tree(site.getId())) {
      Board board = node.board();
      BoardDemand demand = results.boardDemand(board.getId());
      Map<Phase, Double> room = new EnumMap<>(Phase.class);
      Double loading = null;
      if (demand != null) {
        for (PhaseDemand phase : demand.phases()) {
          if (phase.headroomAmps() != null) {
            room.put(phase.phase(), phase.headroomAmps());
          }
        }
        loading = demand.incomer().loadingPercent();
      }
      rows.add(
          new Headroom(
              board.getId(),
              board.getReference(),
              node.depth(),
              board.getIncomer() == null ? null : board.getIncomer().tripRatingAmps(),
              room,
              loading,
              loading != null && loading >= site.getLoadingThresholdPercent()));
    }
    return rows;
  }
}
