package com.wayledger.system;

import jakarta.servlet.http.HttpServletResponse;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.dao.PessimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.orm.ObjectOptimisticLockingFailureException;
import org.springframework.ui.Model;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.servlet.resource.NoResourceFoundException;

/** Turns the errors a user can cause on the pages into a readable page with a 4xx status. */
@ControllerAdvice(annotations = org.springframework.stereotype.Controller.class)
public class PageErrorHandling {

  private static final Logger LOG = LoggerFactory.getLogger(PageErrorHandling.class);

  private final MessageSource messages;
  private final PagePermissions permissions;

  public PageErrorHandling(MessageSource messages, PagePermissions permissions) {
    this.messages = messages;
    this.permissions = permissions;
  }

  /** A parameter refused by the request text rules: 400 naming the field and the character. */
  @ExceptionHandler(TextRefused.class)
  public String textRefused(TextRefused e, Model model, HttpServletResponse response) {
    String why =
        messages.getMessage(e.messageCode(), null, e.messageCode(), LocaleContextHolder.getLocale())
            + (e.character().isEmpty() ? "" : " (" + e.character() + ")");
    model.addAttribute("messageArgs", new Object[] {e.field(), why});
    return problem(HttpStatus.BAD_REQUEST, "error.textRefused", model, response);
  }

  /**
   * A domain rule broken by a request that has no form to show the message in (a mapping step, a
   * method key): 422 naming the field and the rule.
   */
  @ExceptionHandler(RuleViolation.class)
  public String rule(RuleViolation e, Model model, HttpServletResponse response) {
    String why =
        messages.getMessage(
            e.messageCode(), e.arguments(), e.messageCode(), LocaleContextHolder.getLocale());
    model.addAttribute("messageArgs", new Object[] {e.field(), why});
    return problem(HttpStatus.UNPROCESSABLE_CONTENT, "error.rule", model, response);
  }

  /** A change the database refused (a unique name taken meanwhile, a value it cannot store). */
  @ExceptionHandler(DataIntegrityViolationException.class)
  public String conflict(Exception e, Model model, HttpServletResponse response) {
    LOG.info("Database refused a change: {}", e.getMessage());
    return problem(HttpStatus.CONFLICT, "error.conflict", model, response);
  }

  @ExceptionHandler({NotFoundException.class, NoResourceFoundException.class})
  public String notFound(Exception e, Model model, HttpServletResponse response) {
    return problem(HttpStatus.NOT_FOUND, "error.notFound", model, response);
  }

  @ExceptionHandler({
    MethodArgumentTypeMismatchException.class,
    MissingServletRequestParameterException.class,
    HttpMessageNotReadableException.class,
    org.springframework.beans.InvalidPropertyException.class,
    org.springframework.web.bind.MissingPathVariableException.class
  })
  public String badRequest(Exception e, Model model, HttpServletResponse response) {
    return problem(HttpStatus.BAD_REQUEST, "error.badRequest", model, response);
  }

  @ExceptionHandler({
    StaleEditException.class,
    ObjectOptimisticLockingFailureException.class,
    PessimisticLockingFailureException.class
  })
  public String stale(Exception e, Model model, HttpServletResponse response) {
    return problem(HttpStatus.CONFLICT, "error.stale", model, response);
  }

  private String problem(
      HttpStatus status, String messageCode, Model model, HttpServletResponse response) {
    // an exception handler's model gets no @ModelAttribute methods: the layout's menu needs these
    permissions.addTo(model);
    response.setStatus(status.value());
    model.addAttribute("status", status.value());
    model.addAttribute("messageCode", messageCode);
    return "error/problem";
  }
}
