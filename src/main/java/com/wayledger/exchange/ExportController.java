package com.wayledger.exchange;

import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import org.springframework.context.MessageSource;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;

/**
 * Schedules out: XLSX of a board or a whole site, CSV of a board, and the printable door chart. Any
 * role may export.
 */
@Controller
public class ExportController {

  static final String XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

  private final ExportReader reader;
  private final MessageSource messages;

  private final java.util.List<WorkbookSheet> extraSheets;

  public ExportController(
      ExportReader reader, MessageSource messages, java.util.List<WorkbookSheet> extraSheets) {
    this.reader = reader;
    this.messages = messages;
    this.extraSheets = extraSheets;
  }

  @GetMapping("/boards/{boardId}/export.xlsx")
  public void boardWorkbook(@PathVariable long boardId, HttpServletResponse response)
      throws IOException {
    ExportData data = reader.board(boardId);
    attachment(
        response,
        XLSX,
        fileName(data.siteName() + "-" + data.boards().get(0).reference()) + ".xlsx");
    new WorkbookWriter(caution()).write(data, false, extraSheets, response.getOutputStream());
  }

  @GetMapping("/sites/{siteId}/export.xlsx")
  public void siteWorkbook(@PathVariable long siteId, HttpServletResponse response)
      throws IOException {
    ExportData data = reader.site(siteId);
    attachment(response, XLSX, fileName(data.siteName()) + ".xlsx");
    new WorkbookWriter(caution()).write(data, true, extraSheets, response.getOutputStream());
  }

  @GetMapping("/boards/{boardId}/export.csv")
  public void boardCsv(@PathVariable long boardId, HttpServletResponse response)
      throws IOException {
    ExportData data = reader.board(boardId);
    attachment(
        response,
        "text/csv;charset=UTF-8",
        fileName(data.siteName() + "-" + data.boards().get(0).reference()) + ".csv");
    Writer out = new OutputStreamWriter(response.getOutputStream(), StandardCharsets.UTF_8);
    CsvWriter.write(data, data.boards().get(0), caution(), out);
    out.flush();
  }

  @GetMapping("/boards/{boardId}/door-chart")
  public String doorChart(@PathVariable long boardId, Model model) {
    ExportData data = reader.board(boardId);
    model.addAttribute("data", data);
    model.addAttribute("board", data.boards().get(0));
    model.addAttribute("rows", DoorChartRow.of(data.boards().get(0)));
    return "exchange/door-chart";
  }

  private String caution() {
    return messages.getMessage("caution.short", null, Locale.UK);
  }

  private static void attachment(HttpServletResponse response, String type, String name) {
    response.setContentType(type);
    response.setHeader(
        HttpHeaders.CONTENT_DISPOSITION,
        ContentDisposition.attachment().filename(name, StandardCharsets.UTF_8).build().toString());
  }

  static String fileName(String text) {
    String cleaned = text.replaceAll("[^\\p{L}\\p{N}._-]+", "-").replaceAll("-+", "-");
    return cleaned.isBlank() ? "schedule" : cleaned;
  }
}
