package com.wayledger.exchange;

import com.wayledger.system.FormStatus;
import com.wayledger.system.PagePermissions;
import jakarta.servlet.http.HttpServletResponse;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.multipart.MaxUploadSizeExceededException;

/**
 * An upload beyond the server's multipart limit is refused before any controller runs; this turns
 * it into a readable page with a 413 instead of an error.
 */
@ControllerAdvice
@Order(Ordered.HIGHEST_PRECEDENCE)
public class UploadLimitHandling {

  private final PagePermissions permissions;

  public UploadLimitHandling(PagePermissions permissions) {
    this.permissions = permissions;
  }

  @ExceptionHandler(MaxUploadSizeExceededException.class)
  public String tooBig(HttpServletResponse response, Model model) {
    permissions.addTo(model);
    response.setStatus(413);
    model.addAttribute("status", 413);
    model.addAttribute("messageCode", "import.refused.tooBigForServer");
    return "error/problem";
  }

  static int unprocessable() {
    return FormStatus.UNPROCESSABLE;
  }
}
