package com.wayledger.account;

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

/** Sign-in page, and the admin page that adds users and sets their roles. */
@Controller
public class UserAdminController {

  private static final String USERS_VIEW = "account/users";

  private final AccountService accounts;

  public UserAdminController(AccountService accounts) {
    this.accounts = accounts;
  }

  @GetMapping("/login")
  public String login() {
    return "account/login";
  }

  @ModelAttribute("roles")
  Role[] roles() {
    return Role.values();
  }

  @GetMapping("/admin/users")
  public String users(Model model) {
    model.addAttribute("users", accounts.all());
    model.addAttribute("form", UserForm.blank());
    return USERS_VIEW;
  }

  @PostMapping("/admin/users")
  public String create(
      @Valid @ModelAttribute("form") UserForm form,
      BindingResult errors,
      HttpServletRequest request,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", UserForm.class, request);
    if (!errors.hasErrors()) {
      try {
        accounts.create(form);
        return "redirect:/admin/users";
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    model.addAttribute("users", accounts.all());
    return FormStatus.invalid(response, USERS_VIEW);
  }

  @PostMapping("/admin/users/{id}/role")
  public String changeRole(
      @PathVariable long id, @RequestParam Role role, RedirectAttributes redirect) {
    try {
      accounts.changeRole(id, role);
    } catch (RuleViolation violation) {
      redirect.addFlashAttribute("problem", violation.messageCode());
    }
    return "redirect:/admin/users";
  }
}
