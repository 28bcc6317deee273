package com.wayledger.account;

import com.wayledger.system.FormRecovery;
import com.wayledger.system.FormStatus;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.security.Principal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BeanPropertyBindingResult;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;

/**
 * The signed-in user's own account page: the interface language, and personal API tokens, created
 * (the secret shown once), listed with their scope and the day they were last used, and revoked.
 */
@Controller
public class AccountController {

  private static final String VIEW = "account/account";

  private final ApiTokens tokens;
  private final UserLanguages languages;

  public AccountController(ApiTokens tokens, UserLanguages languages) {
    this.tokens = tokens;
    this.languages = languages;
  }

  @ModelAttribute("interfaceLanguages")
  InterfaceLanguage[] interfaceLanguages() {
    return InterfaceLanguage.values();
  }

  @ModelAttribute("scopes")
  TokenScope[] scopes() {
    return TokenScope.values();
  }

  @GetMapping("/account")
  public String account(Principal who, Model model) {
    model.addAttribute("form", TokenForm.blank());
    model.addAttribute("languageForm", languages.formOf(who.getName()));
    model.addAttribute("tokens", tokens.of(who.getName()));
    return VIEW;
  }

  /**
   * Stores the interface language; a choice made on a page opened before another change to it is
   * refused beside the field (409), and nothing is stored.
   */
  @PostMapping("/account/language")
  public String language(
      Principal who,
      @Valid @ModelAttribute("languageForm") LanguageForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "languageForm", LanguageForm.class, request);
    if (!errors.hasErrors()) {
      try {
        languages.choose(who.getName(), form);
        return "redirect:/account?language#language";
      } catch (StaleEditException stale) {
        // The stored choice, at its current version, with the refusal beside the field.
        LanguageForm current = languages.formOf(who.getName());
        BeanPropertyBindingResult refused = new BeanPropertyBindingResult(current, "languageForm");
        refused.rejectValue("language", "error.stale");
        model.addAttribute("languageForm", current);
        model.addAttribute(BindingResult.MODEL_KEY_PREFIX + "languageForm", refused);
        model.addAttribute("form", TokenForm.blank());
        model.addAttribute("tokens", tokens.of(who.getName()));
        response.setStatus(HttpServletResponse.SC_CONFLICT);
        return VIEW;
      }
    }
    model.addAttribute("form", TokenForm.blank());
    model.addAttribute("tokens", tokens.of(who.getName()));
    return FormStatus.invalid(response, VIEW);
  }

  /** Creates a token and shows it on this response only: it is never shown again. */
  @PostMapping("/account/tokens")
  public String create(
      Principal who,
      @Valid @ModelAttribute("form") TokenForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", TokenForm.class, request);
    if (!errors.hasErrors()) {
      try {
        model.addAttribute("created", tokens.create(who.getName(), form));
        model.addAttribute("form", TokenForm.blank());
        model.addAttribute("languageForm", languages.formOf(who.getName()));
        model.addAttribute("tokens", tokens.of(who.getName()));
        return VIEW;
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    model.addAttribute("languageForm", languages.formOf(who.getName()));
    model.addAttribute("tokens", tokens.of(who.getName()));
    return FormStatus.invalid(response, VIEW);
  }

  @PostMapping("/account/tokens/{id}/revoke")
  public String revoke(Principal who, @PathVariable long id) {
    tokens.revoke(who.getName(), id);
    return "redirect:/account?revoked";
  }
}
