package com.wayledger.system;

import java.net.URI;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.springframework.context.MessageSource;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.dao.PessimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.orm.ObjectOptimisticLockingFailureException;
import org.springframework.web.bind.MethodArgumentNotValidException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.exc.MismatchedInputException;

/**
 * Errors of the JSON API as RFC 9457 problem details: the status, a sentence, and for bad input a
 * list of {field, message} so a client can show each message beside its field.
 */
@RestControllerAdvice(annotations = org.springframework.web.bind.annotation.RestController.class)
public class ApiErrorHandling {

  private final MessageSource messages;

  public ApiErrorHandling(MessageSource messages) {
    this.messages = messages;
  }

  /** A message code in words, as the pages show it; the code itself when the bundles lack it. */
  private String words(String code, Object... arguments) {
    return messages.getMessage(code, arguments, code, Locale.UK);
  }

  @ExceptionHandler(MethodArgumentNotValidException.class)
  public ProblemDetail invalid(MethodArgumentNotValidException e) {
    List<Map<String, String>> fields =
        e.getBindingResult().getFieldErrors().stream()
            .map(
                error ->
                    Map.of(
                        "field",
                        error.getField(),
                        "message",
                        String.valueOf(error.getDefaultMessage())))
            .toList();
    ProblemDetail problem = problem(HttpStatus.BAD_REQUEST, "Some values are not acceptable.");
    problem.setProperty("fields", fields);
    return problem;
  }

  @ExceptionHandler(RuleViolation.class)
  public ProblemDetail rule(RuleViolation e) {
    ProblemDetail problem =
        problem(HttpStatus.UNPROCESSABLE_CONTENT, "A value breaks a rule of the schedule.");
    problem.setProperty(
        "fields",
        List.of(
            Map.of(
                "field",
                e.field(),
                "message",
                words(e.messageCode(), e.arguments()),
                "code",
                e.messageCode())));
    return problem;
  }

  @ExceptionHandler(TextRefused.class)
  public ProblemDetail textRefused(TextRefused e) {
    ProblemDetail problem = problem(HttpStatus.BAD_REQUEST, "A text value is not acceptable.");
    problem.setProperty(
        "fields",
        List.of(
            Map.of(
                "field",
                e.field(),
                "message",
                words(e.messageCode()) + (e.character().isEmpty() ? "" : " " + e.character()),
                "code",
                e.messageCode())));
    return problem;
  }

  @ExceptionHandler(HttpMessageNotReadableException.class)
  public ProblemDetail unreadable(HttpMessageNotReadableException e) {
    ProblemDetail problem =
        problem(HttpStatus.BAD_REQUEST, "The request body or a parameter is malformed.");
    // A value of the wrong type ("abc" for a rating, an unknown enum name) names its field in
    // Jackson's path;
    // broken JSON syntax has no path and gets no field.
    if (e.getCause() instanceof JacksonException jackson && !jackson.getPath().isEmpty()) {
      String field =
          jackson.getPath().stream()
              .map(
                  step ->
                      step.getPropertyName() != null
                          ? step.getPropertyName()
                          : "[" + step.getIndex() + "]")
              .collect(Collectors.joining("."));
      problem.setProperty("fields", List.of(Map.of("field", field, "message", notValid(jackson))));
    }
    return problem;
  }

  /**
   * For a value outside a closed vocabulary, the accepted codes each with its words ("COPPER
   * (Copper)"), so a client learns what to send and what it means.
   */
  private static String notValid(JacksonException jackson) {
    if (jackson instanceof MismatchedInputException mismatch
        && mismatch.getTargetType() != null
        && mismatch.getTargetType().isEnum()) {
      EnumWords words = EnumWords.standard();
      String accepted =
          Arrays.stream(mismatch.getTargetType().getEnumConstants())
              .map(constant -> (Enum<?>) constant)
              .map(constant -> constant.name() + " (" + words.of(constant) + ")")
              .collect(Collectors.joining(", "));
      return "not a valid value here; one of " + accepted;
    }
    return "not a valid value here";
  }

  @ExceptionHandler(MethodArgumentTypeMismatchException.class)
  public ProblemDetail mismatch(MethodArgumentTypeMismatchException e) {
    return problem(HttpStatus.BAD_REQUEST, "The request body or a parameter is malformed.");
  }

  @ExceptionHandler(NotFoundException.class)
  public ProblemDetail notFound(NotFoundException e) {
    return problem(HttpStatus.NOT_FOUND, e.getMessage());
  }

  @ExceptionHandler({StaleEditException.class, ObjectOptimisticLockingFailureException.class})
  public ProblemDetail stale(Exception e) {
    ProblemDetail problem =
        problem(
            HttpStatus.CONFLICT,
            "Someone else changed this record; nothing of this change was stored. \"current\""
                + " holds the values saved now, with their version.");
    if (e instanceof StaleEditException stale && stale.current() != null) {
      problem.setProperty("current", stale.current());
    }
    return problem;
  }

  @ExceptionHandler(PessimisticLockingFailureException.class)
  public ProblemDetail busy(PessimisticLockingFailureException e) {
    return problem(
        HttpStatus.CONFLICT,
        "The record is being changed by someone else right now; nothing was stored. Retry.");
  }

  @ExceptionHandler(DataIntegrityViolationException.class)
  public ProblemDetail conflict(DataIntegrityViolationException e) {
    return problem(HttpStatus.CONFLICT, "The change conflicts with stored data and was not saved.");
  }

  private static ProblemDetail problem(HttpStatus status, String detail) {
    ProblemDetail problem = ProblemDetail.forStatusAndDetail(status, detail);
    problem.setType(URI.create("about:blank"));
    return problem;
  }
}
