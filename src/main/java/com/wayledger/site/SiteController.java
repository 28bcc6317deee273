package com.wayledger.site;

import com.wayledger.diversity.MethodLibrary;
import com.wayledger.engine.EarthingSystem;
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

/** The site list and the site create/edit forms. */
@Controller
public class SiteController {

  private static final String FORM_VIEW = "site/form";

  private final SiteService sites;
  private final MethodLibrary methods;

  public SiteController(SiteService sites, MethodLibrary methods) {
    this.sites = sites;
    this.methods = methods;
  }

  @ModelAttribute("methods")
  java.util.List<MethodLibrary.Entry> methods() {
    return methods.entries();
  }

  @ModelAttribute("ruleSets")
  java.util.List<String> ruleSets() {
    return com.wayledger.engine.rules.RuleSets.all().stream()
        .map(com.wayledger.engine.rules.RuleSet::key)
        .toList();
  }

  @ModelAttribute("supplySystems")
  com.wayledger.engine.SupplySystem[] supplySystems() {
    return com.wayledger.engine.SupplySystem.values();
  }

  @ModelAttribute("earthingSystems")
  EarthingSystem[] earthingSystems() {
    return EarthingSystem.values();
  }

  @GetMapping({"/", "/sites"})
  public String list(
      @RequestParam(name = "q", defaultValue = "") String text,
      @RequestParam(name = "page", defaultValue = "0") int page,
      Model model) {
    String wanted = text.length() > 120 ? text.substring(0, 120) : text;
    var found = sites.page(wanted, page);
    model.addAttribute("sites", found.getContent());
    model.addAttribute("found", found);
    model.addAttribute("q", wanted.strip());
    return "site/list";
  }

  @GetMapping("/sites/new")
  public String newSite(Model model) {
    model.addAttribute("form", SiteForm.blank());
    return FORM_VIEW;
  }

  @PostMapping("/sites")
  public String create(
      @Valid @ModelAttribute("form") SiteForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", SiteForm.class, request);
    if (errors.hasErrors()) {
      return FormStatus.invalid(response, FORM_VIEW);
    }
    try {
      Site site = sites.create(form);
      return "redirect:/sites/" + site.getId();
    } catch (RuleViolation violation) {
      FormStatus.reject(errors, violation);
      return FormStatus.invalid(response, FORM_VIEW);
    }
  }

  @GetMapping("/sites/{id}/edit")
  public String edit(@PathVariable long id, Model model) {
    Site site = sites.get(id);
    model.addAttribute("site", site);
    model.addAttribute("form", SiteForm.of(site));
    return FORM_VIEW;
  }

  @PostMapping("/sites/{id}")
  public String update(
      @PathVariable long id,
      @Valid @ModelAttribute("form") SiteForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", SiteForm.class, request);
    Site site = sites.get(id);
    model.addAttribute("site", site);
    if (errors.hasErrors()) {
      return FormStatus.invalid(response, FORM_VIEW);
    }
    try {
      sites.update(id, form);
      return "redirect:/sites/" + id;
    } catch (RuleViolation violation) {
      FormStatus.reject(errors, violation);
      return FormStatus.invalid(response, FORM_VIEW);
    }
  }
}
