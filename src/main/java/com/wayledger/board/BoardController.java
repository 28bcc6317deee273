package com.wayledger.board;

import com.wayledger.diversity.MethodLibrary;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.FormRecovery;
import com.wayledger.system.FormStatus;
import com.wayledger.system.RuleViolation;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/** A site's page with its board tree, and the board create/edit/delete forms. */
@Controller
public class BoardController {

  private static final String FORM_VIEW = "board/form";

  private final BoardService boards;
  private final SiteService sites;
  private final SchedulePage schedulePage;
  private final AnalysisService analysis;
  private final MethodLibrary methods;

  public BoardController(
      BoardService boards,
      SiteService sites,
      SchedulePage schedulePage,
      AnalysisService analysis,
      MethodLibrary methods) {
    this.boards = boards;
    this.sites = sites;
    this.schedulePage = schedulePage;
    this.analysis = analysis;
    this.methods = methods;
  }

  /**
   * The board form's choices. Only the form handlers add them: the board page and the site overview
   * need none, and the methods are a database read.
   */
  private void choices(Model model) {
    FormChoices.addDeviceAndCable(model);
    model.addAttribute("methods", methods.entries());
  }

  @GetMapping("/sites/{siteId}")
  public String site(@PathVariable long siteId, Model model) {
    model.addAttribute("site", sites.get(siteId));
    model.addAttribute("tree", boards.tree(siteId));
    SiteAnalysis results = analysis.ofSite(siteId);
    model.addAttribute("headlines", results.headlines());
    model.addAttribute("siteProblems", results.demand().problems());
    return "board/site";
  }

  @GetMapping("/sites/{siteId}/boards/new")
  public String newBoard(@PathVariable long siteId, Model model) {
    choices(model);
    Site site = sites.get(siteId);
    model.addAttribute("site", site);
    model.addAttribute("boardSupplySystems", supplySystemsOf(site));
    model.addAttribute("parents", boards.onSite(siteId));
    model.addAttribute("feeds", boards.feedOptions(siteId));
    model.addAttribute(
        "form", CableUnitsOfForms.shown(BoardForm.blank(site.getPhases()), site.cableUnits()));
    return FORM_VIEW;
  }

  @PostMapping("/sites/{siteId}/boards")
  public String create(
      @PathVariable long siteId,
      @Valid @ModelAttribute("form") BoardForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestParam(required = false) String reason,
      Model model,
      HttpServletResponse response) {
    choices(model);
    form = FormRecovery.ensure(form, errors, model, "form", BoardForm.class, request);
    model.addAttribute("site", sites.get(siteId));
    model.addAttribute("boardSupplySystems", supplySystemsOf(sites.get(siteId)));
    model.addAttribute("parents", boards.onSite(siteId));
    model.addAttribute("feeds", boards.feedOptions(siteId));
    if (errors.hasErrors()) {
      return FormStatus.invalid(response, FORM_VIEW);
    }
    try {
      BoardForm stored = CableUnitsOfForms.stored(form, sites.get(siteId).cableUnits());
      return "redirect:/boards/" + boards.create(siteId, stored, reason).getId();
    } catch (RuleViolation violation) {
      FormStatus.reject(errors, violation);
      return FormStatus.invalid(response, FORM_VIEW);
    }
  }

  @GetMapping("/boards/{id}")
  public String board(@PathVariable long id, Model model) {
    schedulePage.fill(model, id);
    return "board/board";
  }

  @GetMapping("/boards/{id}/edit")
  public String edit(@PathVariable long id, Model model) {
    choices(model);
    Board board = boards.get(id);
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    model.addAttribute("boardSupplySystems", supplySystemsOf(board.getSite()));
    model.addAttribute("parents", parentsFor(board));
    model.addAttribute("feeds", feedsFor(board));
    model.addAttribute("form", CableUnitsOfForms.shown(BoardForm.of(board), board.cableUnits()));
    return FORM_VIEW;
  }

  @PostMapping("/boards/{id}")
  public String update(
      @PathVariable long id,
      @Valid @ModelAttribute("form") BoardForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestParam(required = false) String reason,
      Model model,
      HttpServletResponse response) {
    choices(model);
    form = FormRecovery.ensure(form, errors, model, "form", BoardForm.class, request);
    Board board = boards.get(id);
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    model.addAttribute("boardSupplySystems", supplySystemsOf(board.getSite()));
    model.addAttribute("parents", parentsFor(board));
    model.addAttribute("feeds", feedsFor(board));
    if (errors.hasErrors()) {
      return FormStatus.invalid(response, FORM_VIEW);
    }
    try {
      boards.update(id, CableUnitsOfForms.stored(form, board.cableUnits()), reason);
      return "redirect:/boards/" + id;
    } catch (RuleViolation violation) {
      FormStatus.reject(errors, violation);
      return FormStatus.invalid(response, FORM_VIEW);
    }
  }

  @PostMapping("/boards/{id}/delete")
  public String delete(
      @PathVariable long id,
      @RequestParam(required = false) String reason,
      RedirectAttributes redirect) {
    try {
      return "redirect:/sites/" + boards.delete(id, reason);
    } catch (RuleViolation violation) {
      redirect.addFlashAttribute("problem", violation.messageCode());
      return "redirect:/boards/" + id;
    }
  }

  private java.util.List<FeedOption> feedsFor(Board board) {
    return boards.feedOptions(board.getSite().getId()).stream()
        .filter(option -> option.boardId() != board.getId())
        .toList();
  }

  private java.util.List<Board> parentsFor(Board board) {
    return boards.onSite(board.getSite().getId()).stream()
        .filter(candidate -> !candidate.getId().equals(board.getId()))
        .toList();
  }

  /** The systems a board of the site may record as its own: those of the site's rule set. */
  private static java.util.List<com.wayledger.engine.SupplySystem> supplySystemsOf(Site site) {
    return com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).supplySystems();
  }
}
