package com.wayledger.check;

import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.system.RuleViolation;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;

/**
 * Findings across every site in one page, filtered by grade and site name, paged; each line links
 * to its site, board and circuit.
 */
@Controller
public class EstateFindingsController {

  private final EstateFindings findings;

  public EstateFindingsController(EstateFindings findings) {
    this.findings = findings;
  }

  @GetMapping("/findings")
  public String list(
      @RequestParam(name = "grade", required = false) String grade,
      @RequestParam(name = "site", required = false, defaultValue = "") String site,
      @RequestParam(name = "page", required = false, defaultValue = "0") int page,
      Model model) {
    Verdict verdict = grade(grade);
    String text = site.length() > 120 ? site.substring(0, 120) : site;
    EstateFindings.Page found =
        findings.page(verdict, text, Math.max(0, page), EstateFindings.PAGE_SIZE);
    model.addAttribute("found", found);
    model.addAttribute("grade", verdict);
    model.addAttribute("gradeName", verdict == null ? "" : verdict.name());
    model.addAttribute("siteText", text);
    model.addAttribute("grades", EstateFindings.GRADES);
    model.addAttribute("previousPage", found.number() - 1);
    model.addAttribute("nextPage", found.number() + 1);
    return "check/estate-findings";
  }

  /** A grade by name; blank for every problem; anything else is refused beside the filter. */
  static Verdict grade(String name) {
    if (name == null || name.isBlank()) {
      return null;
    }
    try {
      Verdict verdict = Verdict.valueOf(name.strip());
      if (EstateFindings.GRADES.contains(verdict)) {
        return verdict;
      }
    } catch (IllegalArgumentException e) {
      // refused below
    }
    throw new RuleViolation("grade", "findings.estate.badGrade");
  }
}
