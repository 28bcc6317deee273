package com.wayledger.diversity;

import com.wayledger.engine.demand.CategoryGroup;
import com.wayledger.system.FormStatus;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import jakarta.servlet.http.HttpServletResponse;
import java.security.Principal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.orm.ObjectOptimisticLockingFailureException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;

/** View the diversity methods, copy any of them, and edit the factors of a copy. */
@Controller
public class MethodController {

  private final MethodLibrary library;
  private final MessageSource messages;

  public MethodController(MethodLibrary library, MessageSource messages) {
    this.library = library;
    this.messages = messages;
  }

  /** One group of a method as the edit form shows it. */
  public record GroupView(int index, CategoryGroup group, List<RuleParameters.Field> fields) {}

  @GetMapping("/methods")
  public String list(Model model) {
    model.addAttribute("entries", library.entries());
    return "diversity/list";
  }

  @GetMapping("/methods/{key}")
  public String view(@PathVariable String key, Model model) {
    fill(model, library.entry(key), Map.of(), Map.of());
    return "diversity/method";
  }

  @PostMapping("/methods/{key}/copy")
  public String copy(
      @PathVariable String key,
      @RequestParam(defaultValue = "") String newKey,
      @RequestParam(defaultValue = "") String newName,
      Principal user,
      Model model,
      HttpServletResponse response) {
    try {
      library.copy(key, newKey, newName, user.getName());
      return "redirect:/methods/" + newKey.strip();
    } catch (RuleViolation violation) {
      fill(
          model,
          library.entry(key),
          Map.of(),
          Map.of("copy." + violation.field(), violation.messageCode()));
      model.addAttribute("newKey", newKey);
      model.addAttribute("newName", newName);
      return FormStatus.invalid(response, "diversity/method");
    }
  }

  @PostMapping("/methods/{key}")
  public String update(
      @PathVariable String key,
      @RequestParam long version,
      @RequestParam(defaultValue = "") String name,
      @RequestParam Map<String, String> submitted,
      Principal user,
      Model model,
      HttpServletResponse response) {
    Map<String, String> problems;
    try {
      problems = library.update(key, version, name, submitted, user.getName());
    } catch (RuleViolation violation) {
      problems =
          Map.of(
              "name",
              messages.getMessage(violation.messageCode(), null, LocaleContextHolder.getLocale()));
    } catch (StaleEditException | ObjectOptimisticLockingFailureException stale) {
      // The form comes back with the saved method's version and the user's typed values: saving
      // again is a deliberate overwrite, and nothing typed is lost.
      fill(
          model,
          library.entry(key),
          submitted,
          Map.of(
              "name", messages.getMessage("method.stale", null, LocaleContextHolder.getLocale())));
      response.setStatus(HttpServletResponse.SC_CONFLICT);
      return "diversity/method";
    }
    if (problems.isEmpty()) {
      return "redirect:/methods/" + key + "?saved";
    }
    fill(model, library.entry(key), submitted, problems);
    return FormStatus.invalid(response, "diversity/method");
  }

  private static void fill(
      Model model,
      MethodLibrary.Entry entry,
      Map<String, String> submitted,
      Map<String, String> problems) {
    List<GroupView> groups = new ArrayList<>();
    List<CategoryGroup> all = entry.method().groups();
    for (int i = 0; i < all.size(); i++) {
      List<RuleParameters.Field> fields = new ArrayList<>();
      for (RuleParameters.Field field :
          RuleParameters.fieldsOf(all.get(i).rule(), MethodLibrary.prefix(i))) {
        String typed = submitted.get(field.name());
        fields.add(
            typed == null
                ? field
                : new RuleParameters.Field(
                    field.name(), field.label(), field.kind(), typed, field.options()));
      }
      groups.add(new GroupView(i, all.get(i), fields));
    }
    model.addAttribute("entry", entry);
    model.addAttribute("groups", groups);
    model.addAttribute("problems", problems);
    model.addAttribute("typedName", submitted.getOrDefault("name", entry.method().name()));
  }
}
