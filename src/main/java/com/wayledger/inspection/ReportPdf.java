package com.wayledger.inspection;

import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springframework.stereotype.Component;
import org.thymeleaf.ITemplateEngine;
import org.thymeleaf.context.Context;

/**
 * Renders the report template (XHTML) to PDF with openhtmltopdf. The PDF's text uses DejaVu Sans
 * where the system has it (Debian's fonts-dejavu-core), so Ω, ≤ and Δ print; without it the
 * renderer's built-in fonts show those symbols as blanks, the rest of the text unchanged.
 */
@Component
public class ReportPdf {

  static final List<String> FONT_FILES =
      List.of(
          "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf",
          "/usr/share/fonts/TTF/DejaVuSans.ttf",
          "/usr/share/fonts/dejavu/DejaVuSans.ttf");

  private final ITemplateEngine templates;

  public ReportPdf(ITemplateEngine templates) {
    this.templates = templates;
  }

  public byte[] render(Map<String, Object> model, Locale locale) {
    String html = templates.process("inspection/report", new Context(locale, model));
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      PdfRendererBuilder builder = new PdfRendererBuilder();
      builder.useFastMode();
      for (String path : FONT_FILES) {
        File font = new File(path);
        if (font.canRead()) {
          builder.useFont(font, "DejaVu Sans");
          break;
        }
      }
      builder.withHtmlContent(html, null);
      builder.toStream(out);
      builder.run();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }
}
