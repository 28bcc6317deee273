package com.wayledger.board;

import com.wayledger.site.DefaultsForm;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.FormRecovery;
import com.wayledger.system.FormStatus;
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

/**
 * The defaults of a site and of a board: the cable conditions, location and start-up multiples
 * their circuits inherit unless they record their own. "Common practice" fills the empty fields
 * with values marked as such; the user saves them or not.
 */
@Controller
public class DefaultsController {

  private static final String VIEW = "board/defaults";

  private final SiteService sites;
  private final BoardService boards;

  public DefaultsController(SiteService sites, BoardService boards) {
    this.sites = sites;
    this.boards = boards;
  }

  @ModelAttribute
  void choices(Model model) {
    FormChoices.addDeviceAndCable(model);
  }

  @GetMapping("/sites/{id}/defaults")
  public String siteDefaults(
      @PathVariable long id,
      @RequestParam(defaultValue = "false") boolean commonPractice,
      Model model) {
    Site site = sites.get(id);
    DefaultsForm stored = DefaultsForm.of(site.getDefaults(), site.getStartUpMultiples());
    forSite(model, site);
    model.addAttribute("form", commonPractice ? filledIn(stored, model) : stored);
    return VIEW;
  }

  @PostMapping("/sites/{id}/defaults")
  public String saveSiteDefaults(
      @PathVariable long id,
      @Valid @ModelAttribute("form") DefaultsForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestParam(required = false) String reason,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", DefaultsForm.class, request);
    refuseOtherRuleSetsLocation(form, sites.get(id), errors);
    if (errors.hasErrors()) {
      forSite(model, sites.get(id));
      return FormStatus.invalid(response, VIEW);
    }
    sites.updateDefaults(id, form, reason);
    return "redirect:/sites/" + id;
  }

  @GetMapping("/boards/{id}/defaults")
  public String boardDefaults(
      @PathVariable long id,
      @RequestParam(defaultValue = "false") boolean commonPractice,
      Model model) {
    Board board = boards.get(id);
    DefaultsForm stored = DefaultsForm.of(board.getDefaults(), board.getStartUpMultiples());
    forBoard(model, board);
    model.addAttribute("form", commonPractice ? filledIn(stored, model) : stored);
    return VIEW;
  }

  @PostMapping("/boards/{id}/defaults")
  public String saveBoardDefaults(
      @PathVariable long id,
      @Valid @ModelAttribute("form") DefaultsForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestParam(required = false) String reason,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", DefaultsForm.class, request);
    refuseOtherRuleSetsLocation(form, boards.get(id).getSite(), errors);
    if (errors.hasErrors()) {
      forBoard(model, boards.get(id));
      return FormStatus.invalid(response, VIEW);
    }
    boards.updateDefaults(id, form, reason);
    return "redirect:/boards/" + id;
  }

  /** A default location must be one of the site's rule set's own, as a circuit's must. */
  private static void refuseOtherRuleSetsLocation(
      DefaultsForm form, Site site, BindingResult errors) {
    if (errors.hasErrors()) {
      return; // a form that did not bind has no value to check (and no target to reject on)
    }
    com.wayledger.engine.rules.RuleSet rules =
        com.wayledger.engine.rules.RuleSets.of(site.getRuleSet());
    if (form.location() != null && !rules.circuitLocations().contains(form.location())) {
      errors.rejectValue(
          "location", "circuit.location.otherRuleSet", new Object[] {rules.title()}, null);
    }
  }

  private static void forSite(Model model, Site site) {
    model.addAttribute("locations", locationsOf(site));
    model.addAttribute("site", site);
    model.addAttribute("action", "/sites/" + site.getId() + "/defaults");
    model.addAttribute("backUrl", "/sites/" + site.getId());
    model.addAttribute("ownerName", site.getName());
    model.addAttribute("siteDefaults", null);
  }

  private static void forBoard(Model model, Board board) {
    model.addAttribute("locations", locationsOf(board.getSite()));
    model.addAttribute("site", board.getSite());
    model.addAttribute("board", board);
    model.addAttribute("action", "/boards/" + board.getId() + "/defaults");
    model.addAttribute("backUrl", "/boards/" + board.getId());
    model.addAttribute("ownerName", board.getReference());
    model.addAttribute(
        "siteDefaults",
        DefaultsForm.of(board.getSite().getDefaults(), board.getSite().getStartUpMultiples())
            .setFields());
  }

  /**
   * The stored defaults with each empty field that has a common-practice value filled in; the names
   * of the filled fields go to the page, which marks them.
   */
  private static DefaultsForm filledIn(DefaultsForm stored, Model model) {
    DefaultsForm usual = DefaultsForm.commonPractice();
    DefaultsForm filled =
        new DefaultsForm(
            first(stored.installationMethod(), usual.installationMethod()),
            first(stored.ambientCelsius(), usual.ambientCelsius()),
            first(stored.groupedCircuits(), usual.groupedCircuits()),
            first(stored.thermalInsulationMm(), usual.thermalInsulationMm()),
            first(stored.material(), usual.material()),
            first(stored.insulation(), usual.insulation()),
            first(stored.location(), usual.location()),
            first(stored.motorStartUpMultiple(), usual.motorStartUpMultiple()),
            first(stored.airConditioningStartUpMultiple(), usual.airConditioningStartUpMultiple()),
            first(stored.lightingStartUpMultiple(), usual.lightingStartUpMultiple()));
    model.addAttribute(
        "commonPracticeFields",
        com.wayledger.system.RecordDiff.between(filled, stored, java.util.Set.of()).stream()
            .map(com.wayledger.system.RecordDiff.FieldChange::field)
            .toList());
    return filled;
  }

  /** The site's rule set's locations, in the order of their declaration. */
  private static java.util.List<com.wayledger.engine.CircuitLocation> locationsOf(Site site) {
    var own = com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).circuitLocations();
    return java.util.Arrays.stream(com.wayledger.engine.CircuitLocation.values())
        .filter(own::contains)
        .toList();
  }

  private static <T> T first(T own, T usual) {
    return own != null ? own : usual;
  }
}
