package com.wayledger.diagram;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestParam;

/** The site's single-line diagram: the page (with pan and zoom) and the SVG file. */
@Controller
public class DiagramController {

  private final DiagramReader reader;
  private final MessageSource messages;

  public DiagramController(DiagramReader reader, MessageSource messages) {
    this.reader = reader;
    this.messages = messages;
  }

  @GetMapping("/sites/{siteId}/diagram")
  public String page(
      @PathVariable long siteId,
      @RequestParam(required = false) Long expand,
      HttpServletRequest request,
      Model model) {
    SiteDiagram diagram = reader.read(siteId, expand);
    model.addAttribute("diagram", diagram);
    model.addAttribute("svg", svg(request.getContextPath()).draw(diagram));
    return "diagram/site";
  }

  @GetMapping("/sites/{siteId}/diagram.svg")
  public void file(
      @PathVariable long siteId, HttpServletRequest request, HttpServletResponse response)
      throws IOException {
    SiteDiagram diagram = reader.read(siteId, null);
    String document =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
            + svg(request.getContextPath()).draw(diagram)
            + "\n";
    response.setContentType("image/svg+xml;charset=UTF-8");
    response.setHeader(
        HttpHeaders.CONTENT_DISPOSITION,
        ContentDisposition.attachment()
            .filename(fileName(diagram.siteName()) + "-diagram.svg", StandardCharsets.UTF_8)
            .build()
            .toString());
    response.getOutputStream().write(document.getBytes(StandardCharsets.UTF_8));
  }

  private DiagramSvg svg(String base) {
    return new DiagramSvg(words(messages), base, caution(messages));
  }

  static Words words(MessageSource messages) {
    return (key, args) -> messages.getMessage(key, args, LocaleContextHolder.getLocale());
  }

  static String caution(MessageSource messages) {
    return messages.getMessage("caution.short", null, LocaleContextHolder.getLocale());
  }

  static String fileName(String text) {
    String cleaned = text.replaceAll("[^\\p{L}\\p{N}._-]+", "-").replaceAll("-+", "-");
    return cleaned.isBlank() ? "site" : cleaned;
  }
}
