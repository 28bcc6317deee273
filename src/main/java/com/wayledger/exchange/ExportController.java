package com.wayledger.exchange;

import com.wayledger.diagram.DiagramPicture;
import com.wayledger.loadlog.ChangeLog;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.servlet.support.ServletUriComponentsBuilder;

/**
 * Schedules out: XLSX of a board or a whole site, CSV of a board, and the printable door chart. Any
 * role may export.
 */
@Controller
public class ExportController {

  static final String XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

  private final ExportReader reader;
  private final com.wayledger.board.AnalysisService analysis;
  private final MessageSource messages;
  private final ChangeLog changeLog;
  private final DiagramPicture diagramPicture;
  private final String publicBaseUrl;

  private final java.util.List<WorkbookSheet> extraSheets;

  public ExportController(
      ExportReader reader,
      MessageSource messages,
      ChangeLog changeLog,
      DiagramPicture diagramPicture,
      java.util.List<WorkbookSheet> extraSheets,
      com.wayledger.board.AnalysisService analysis,
      @Value("${wayledger.public-base-url:}") String publicBaseUrl) {
    this.reader = reader;
    this.analysis = analysis;
    this.messages = messages;
    this.changeLog = changeLog;
    this.diagramPicture = diagramPicture;
    this.extraSheets = extraSheets;
    this.publicBaseUrl = publicBaseUrl == null ? "" : publicBaseUrl.strip();
  }

  @GetMapping("/boards/{boardId}/export.xlsx")
  public void boardWorkbook(@PathVariable long boardId, HttpServletResponse response)
      throws IOException {
    ExportData data = reader.board(boardId);
    attachment(
        response,
        XLSX,
        fileName(data.siteName() + "-" + data.boards().get(0).reference()) + ".xlsx");
    new WorkbookWriter(caution(), sheetWords())
        .write(data, false, extraSheets, response.getOutputStream());
  }

  @GetMapping("/sites/{siteId}/export.xlsx")
  public void siteWorkbook(@PathVariable long siteId, HttpServletResponse response)
      throws IOException {
    ExportData data = reader.site(siteId);
    byte[] diagram = data.boards().isEmpty() ? null : diagramPicture.png(siteId);
    attachment(response, XLSX, fileName(data.siteName()) + ".xlsx");
    new WorkbookWriter(caution(), sheetWords())
        .withDiagram(diagram)
        .write(data, true, extraSheets, response.getOutputStream());
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
    BoardEntry board = data.boards().get(0);
    model.addAttribute("data", data);
    model.addAttribute("board", board);
    List<DoorChartRow> rows = DoorChartRow.of(board);
    model.addAttribute("rows", rows);
    var results = analysis.ofBoard(boardId);
    var boardSpec =
        results.spec().boards().stream().filter(spec -> spec.id() == boardId).findFirst();
    com.wayledger.engine.PanelSpaces panel =
        boardSpec.map(spec -> results.spec().panelSpacesOf(spec)).orElse(null);
    model.addAttribute("panelboard", panel != null);
    if (panel != null) {
      // a panelboard's chart is the panel itself: odd spaces left, even right, row by row
      var system = results.spec().systemOf(boardSpec.get());
      List<List<DoorChartRow>> columns = DoorChartRow.ofPanel(board, panel, system::lineName);
      model.addAttribute("halves", columns);
      List<String> free = new java.util.ArrayList<>();
      columns.forEach(
          column ->
              column.stream()
                  .filter(row -> row.device().isEmpty() && row.description().equals("free space"))
                  .forEach(row -> free.add(Integer.toString(row.way()))));
      free.sort(java.util.Comparator.comparingInt(Integer::parseInt));
      model.addAttribute("free", new FreePositions(free, free.size()));
    } else {
      model.addAttribute("halves", halves(rows));
      model.addAttribute("free", FreePositions.of(board));
    }
    model.addAttribute(
        "code",
        DoorChartCode.of(baseUrl(), boardId, data.exportedOn(), changeLog.latestPosition(boardId)));
    return "exchange/door-chart";
  }

  /**
   * The rows in one column, or in two side by side when there are more than {@link
   * #ONE_COLUMN_ROWS}, so that a 72-position board fits one A4 page.
   */
  static List<List<DoorChartRow>> halves(List<DoorChartRow> rows) {
    if (rows.size() <= ONE_COLUMN_ROWS) {
      return List.of(rows);
    }
    int split = (rows.size() + 1) / 2;
    return List.of(rows.subList(0, split), rows.subList(split, rows.size()));
  }

  /** Rows a door chart prints in one column before it splits into two. */
  static final int ONE_COLUMN_ROWS = 16;

  /**
   * The address the door chart's code links to: the documented setting {@code
   * wayledger.public-base-url} when set (the app behind a proxy), else the address this request
   * came in on.
   */
  private String baseUrl() {
    return publicBaseUrl.isEmpty()
        ? ServletUriComponentsBuilder.fromCurrentContextPath().build().toUriString()
        : publicBaseUrl;
  }

  /** The workbook's titles and labels in the language of the page it is exported from. */
  private SheetWords sheetWords() {
    java.util.Locale locale = LocaleContextHolder.getLocale();
    return SheetWords.of((key, args) -> messages.getMessage(key, args, locale));
  }

  private String caution() {
    return messages.getMessage("caution.short", null, LocaleContextHolder.getLocale());
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
