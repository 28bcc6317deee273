package com.wayledger.system;

import jakarta.servlet.http.HttpServletResponse;
import org.springframework.validation.BindingResult;

/**
 * Shared handling of a form that comes back with problems: 422 and the messages beside the fields.
 */
public final class FormStatus {

  /** 422 Unprocessable Content: the request was understood but a value breaks a rule. */
  public static final int UNPROCESSABLE = 422;

  private FormStatus() {}

  /** Marks the response as rejected input and returns the view that shows the form again. */
  public static String invalid(HttpServletResponse response, String view) {
    response.setStatus(UNPROCESSABLE);
    return view;
  }

  /** Puts a domain rule's message beside its field. */
  public static void reject(BindingResult errors, RuleViolation violation) {
    errors.rejectValue(violation.field(), violation.messageCode(), violation.arguments(), null);
  }
}
