package com.wayledger.system;

import jakarta.servlet.http.HttpServletResponse;
import org.springframework.dao.PessimisticLockingFailureException;
import org.springframework.http.HttpStatus;
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

  @ExceptionHandler({NotFoundException.class, NoResourceFoundException.class})
  public String notFound(Exception e, Model model, HttpServletResponse response) {
    return problem(HttpStatus.NOT_FOUND, "error.notFound", model, response);
  }

  @ExceptionHandler({
    MethodArgumentTypeMismatchException.class,
    MissingServletRequestParameterException.class
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

  private static String problem(
      HttpStatus status, String messageCode, Model model, HttpServletResponse response) {
    response.setStatus(status.value());
    model.addAttribute("status", status.value());
    model.addAttribute("messageCode", messageCode);
    return "error/problem";
  }
}
