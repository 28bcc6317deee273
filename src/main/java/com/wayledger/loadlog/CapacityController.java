package com.wayledger.loadlog;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.capacity.CapacityAnswer;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.FormRecovery;
import com.wayledger.system.FormStatus;
import com.wayledger.system.RuleViolation;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * "Can it take it?" for one board or a whole site. Asking is a GET (any signed-in user may ask, and
 * the answer can be bookmarked); adding the load at a candidate is a POST for editors.
 */
@Controller
public class CapacityController {

  private static final String VIEW = "loadlog/capacity";

  private final CapacityService capacity;
  private final BoardService boards;
  private final SiteService sites;

  public CapacityController(CapacityService capacity, BoardService boards, SiteService sites) {
    this.capacity = capacity;
    this.boards = boards;
    this.sites = sites;
  }

  @ModelAttribute
  void choices(Model model) {
    model.addAttribute("categories", LoadCategory.values());
    model.addAttribute("locations", com.wayledger.engine.CircuitLocation.values());
    model.addAttribute("ratingUnits", List.of(RatingUnit.W, RatingUnit.A));
  }

  @GetMapping("/boards/{id}/can-it-take-it")
  public String askBoard(
      @PathVariable long id,
      @RequestParam(required = false) String ask,
      @Valid @ModelAttribute("form") CapacityForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    Board board = boards.get(id);
    model.addAttribute("board", board);
    // the board's own lines by their names: A and B on a 120/240 V panel, L1–L3 on a 400 V board
    model.addAttribute("allLines", java.util.Arrays.copyOf(Phase.values(), board.lineCount()));
    model.addAttribute("lineNames", lineNames(board.system()));
    return answer(board.getSite().getId(), id, ask, form, errors, request, model, response);
  }

  @GetMapping("/sites/{id}/can-it-take-it")
  public String askSite(
      @PathVariable long id,
      @RequestParam(required = false) String ask,
      @Valid @ModelAttribute("form") CapacityForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    // the boards of a site differ in lines: every line, named as the site's supply names them
    model.addAttribute("allLines", Phase.values());
    model.addAttribute("lineNames", lineNames(sites.get(id).getSupplySystem()));
    return answer(id, null, ask, form, errors, request, model, response);
  }

  /** Each line's name on a supply system: "L1" or "A". */
  static java.util.Map<Phase, String> lineNames(com.wayledger.engine.SupplySystem system) {
    java.util.Map<Phase, String> names = new java.util.EnumMap<>(Phase.class);
    for (Phase line : Phase.values()) {
      names.put(line, system.lineName(line));
    }
    return names;
  }

  private String answer(
      long siteId,
      Long boardId,
      String ask,
      CapacityForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    Site site = sites.get(siteId);
    model.addAttribute("site", site);
    // only the locations the site's rule set knows (the other set's mean nothing to its rules)
    model.addAttribute(
        "locations", com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).circuitLocations());
    if (ask == null) {
      model.asMap().remove(BindingResult.MODEL_KEY_PREFIX + "form");
      model.addAttribute("form", CapacityForm.blank());
      return VIEW;
    }
    form = FormRecovery.ensure(form, errors, model, "form", CapacityForm.class, request);
    if (errors.hasErrors()) {
      return FormStatus.invalid(response, VIEW);
    }
    CapacityAnswer answer = capacity.ask(siteId, boardId, form);
    model.addAttribute("answer", answer);
    model.addAttribute(
        "choices", answer.outcomes().stream().map(CapacityService::choiceOf).toList());
    return VIEW;
  }

  @PostMapping("/boards/{id}/can-it-take-it/add")
  public String add(
      @PathVariable long id,
      @Valid @ModelAttribute("form") CapacityForm form,
      BindingResult errors,
      @RequestParam String choice,
      @RequestParam(required = false) String reason,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response,
      org.springframework.web.servlet.mvc.support.RedirectAttributes redirect) {
    Board board = boards.get(id);
    form = FormRecovery.ensure(form, errors, model, "form", CapacityForm.class, request);
    if (!errors.hasErrors()) {
      try {
        var circuit = capacity.add(id, form, choice, reason);
        // the history page confirms what was added where
        redirect.addFlashAttribute(
            "loadAdded",
            java.util.List.of(
                form.description() == null ? "" : form.description(),
                circuit.positionLabel(),
                circuit.getDescription() == null ? "" : circuit.getDescription()));
        return "redirect:/boards/" + id + "/history";
      } catch (RuleViolation violation) {
        model.addAttribute("addProblem", violation.messageCode());
      }
    }
    model.addAttribute("board", board);
    model.addAttribute("site", sites.get(board.getSite().getId()));
    if (!errors.hasErrors()) {
      CapacityAnswer answer = capacity.ask(board.getSite().getId(), id, form);
      model.addAttribute("answer", answer);
      model.addAttribute(
          "choices", answer.outcomes().stream().map(CapacityService::choiceOf).toList());
    }
    return FormStatus.invalid(response, VIEW);
  }
}
