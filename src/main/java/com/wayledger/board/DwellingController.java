package com.wayledger.board;

import com.wayledger.engine.dwelling.DwellingAddition;
import com.wayledger.engine.dwelling.DwellingSite;
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

/**
 * The dwelling page of a board: its NEC dwelling inputs (floor area, small-appliance and laundry
 * circuits, optional and addition methods), the maximum demands recorded for it (NEC 220.87,
 * append-only), and the Article 220 worksheets worked from them — the same worksheets the board
 * page, the API and the workbook show, from one analysis.
 */
@Controller
public class DwellingController {

  static final String VIEW = "board/dwelling";

  private final BoardService boards;
  private final DwellingService dwellings;
  private final AnalysisService analysis;

  public DwellingController(
      BoardService boards, DwellingService dwellings, AnalysisService analysis) {
    this.boards = boards;
    this.dwellings = dwellings;
    this.analysis = analysis;
  }

  @GetMapping("/boards/{id}/dwelling")
  public String show(@PathVariable long id, Model model) {
    DwellingForm form = DwellingForm.of(dwellings.find(id).orElse(null));
    fill(id, model, form, MeasuredDemandForm.empty());
    return VIEW;
  }

  @PostMapping("/boards/{id}/dwelling")
  public String save(
      @PathVariable long id,
      @Valid @ModelAttribute("form") DwellingForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", DwellingForm.class, request);
    if (!errors.hasErrors()) {
      try {
        dwellings.save(id, form);
        return "redirect:/boards/" + id + "/dwelling";
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    fill(id, model, form, MeasuredDemandForm.empty());
    return FormStatus.invalid(response, VIEW);
  }

  @PostMapping("/boards/{id}/dwelling/remove")
  public String remove(@PathVariable long id, @RequestParam(required = false) String reason) {
    dwellings.remove(id, reason);
    return "redirect:/boards/" + id + "/dwelling";
  }

  @PostMapping("/boards/{id}/measured-demands")
  public String record(
      @PathVariable long id,
      @Valid @ModelAttribute("measured") MeasuredDemandForm measured,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    measured =
        FormRecovery.ensure(measured, errors, model, "measured", MeasuredDemandForm.class, request);
    if (!errors.hasErrors()) {
      try {
        dwellings.record(id, measured);
        return "redirect:/boards/" + id + "/dwelling";
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    fill(id, model, DwellingForm.of(dwellings.find(id).orElse(null)), measured);
    return FormStatus.invalid(response, VIEW);
  }

  private void fill(long id, Model model, DwellingForm form, MeasuredDemandForm measured) {
    Board board = boards.get(id);
    SiteAnalysis results = analysis.ofBoard(id);
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    model.addAttribute("dwelling", dwellings.find(id).orElse(null));
    if (!model.containsAttribute("form")) {
      model.addAttribute("form", form);
    }
    if (!model.containsAttribute("measured")) {
      model.addAttribute("measured", measured);
    }
    model.addAttribute("additions", DwellingAddition.values());
    model.addAttribute("demandUnits", MeasuredDemand.Unit.values());
    model.addAttribute("records", dwellings.measuredFor(id));
    model.addAttribute("worksheets", results.dwellingWorksheets(id));
    results.spec().boards().stream()
        .filter(spec -> spec.id() == id)
        .findFirst()
        .ifPresent(
            spec ->
                model.addAttribute(
                    "dividingVolts",
                    DwellingSite.dividingVolts(
                        spec, results.spec().supply().nominalVoltageToEarthVolts())));
  }
}
