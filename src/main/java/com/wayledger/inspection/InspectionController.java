package com.wayledger.inspection;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.engine.inspection.Urgency;
import jakarta.servlet.http.HttpServletResponse;
import java.security.Principal;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Controller;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;

/** A board's inspections: the list, the result grid, a record, its PDF, and a comparison. */
@Controller
public class InspectionController {

  /** The grid's value columns, in entry order. */
  static final List<String> COLUMNS =
      List.of(
          "r1r2",
          "r2",
          "ringR1",
          "ringRn",
          "ringR2",
          "irLl",
          "irLe",
          "irNe",
          "polarity",
          "zs",
          "rcd1",
          "rcd5",
          "rcdButton",
          "rcdDelayed");

  private static final DateTimeFormatter WHEN =
      DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(ZoneOffset.UTC);

  private final InspectionService inspections;
  private final ComparisonService comparisons;
  private final BoardService boards;
  private final ReportPdf pdf;

  public InspectionController(
      InspectionService inspections,
      ComparisonService comparisons,
      BoardService boards,
      ReportPdf pdf) {
    this.inspections = inspections;
    this.comparisons = comparisons;
    this.boards = boards;
    this.pdf = pdf;
  }

  @ModelAttribute
  void choices(Model model) {
    model.addAttribute("columns", COLUMNS);
    model.addAttribute("urgencies", Urgency.values());
  }

  @GetMapping("/boards/{boardId}/inspections")
  @Transactional(readOnly = true)
  public String list(@PathVariable long boardId, Model model) {
    Board board = boards.get(boardId);
    model.addAttribute("board", board);
    model.addAttribute("site", board.getSite());
    model.addAttribute("records", inspections.ofBoard(boardId));
    model.addAttribute("corrections", inspections.corrections(boardId));
    return "inspection/list";
  }

  @GetMapping("/boards/{boardId}/inspections/new")
  public String blank(
      @PathVariable long boardId,
      @RequestParam(required = false) Long corrects,
      Principal who,
      Model model) {
    model.addAttribute(
        "sheet",
        corrects == null
            ? inspections.blank(boardId, who == null ? "" : who.getName())
            : inspections.correcting(boardId, corrects));
    model.addAttribute("graded", corrects != null);
    return "inspection/grid";
  }

  @PostMapping("/boards/{boardId}/inspections/grade")
  public String grade(
      @PathVariable long boardId,
      @ModelAttribute("form") InspectionForm form,
      Model model,
      HttpServletResponse response) {
    InspectionSheet sheet = inspections.grade(boardId, form);
    model.addAttribute("sheet", sheet);
    model.addAttribute("graded", true);
    if (sheet.hasErrors() && !onlyMissingConfirmation(sheet)) {
      response.setStatus(422);
    }
    return "inspection/grid";
  }

  @PostMapping("/boards/{boardId}/inspections")
  public String record(
      @PathVariable long boardId,
      @ModelAttribute("form") InspectionForm form,
      Model model,
      HttpServletResponse response) {
    InspectionService.Recorded recorded = inspections.record(boardId, form);
    if (recorded.id() == null) {
      model.addAttribute("sheet", recorded.sheet());
      model.addAttribute("graded", true);
      response.setStatus(422);
      return "inspection/grid";
    }
    return "redirect:/boards/" + boardId + "/inspections/" + recorded.id();
  }

  @GetMapping("/boards/{boardId}/inspections/{id}")
  public String view(@PathVariable long boardId, @PathVariable long id, Model model) {
    model.addAllAttributes(reportModel(boardId, id));
    model.addAttribute("correctedBy", inspections.corrections(boardId).get(id));
    return "inspection/view";
  }

  @GetMapping("/boards/{boardId}/inspections/{id}/report.pdf")
  public ResponseEntity<byte[]> report(
      @PathVariable long boardId, @PathVariable long id, Locale locale) {
    Map<String, Object> model = reportModel(boardId, id);
    model.put("columns", COLUMNS);
    InspectionRecord record = (InspectionRecord) model.get("record");
    byte[] body = pdf.render(model, locale);
    String name =
        "inspection-"
            + record.boardReference().replaceAll("[^A-Za-z0-9._-]", "_")
            + "-"
            + record.inspectedOn()
            + ".pdf";
    return ResponseEntity.ok()
        .contentType(MediaType.APPLICATION_PDF)
        .header(
            HttpHeaders.CONTENT_DISPOSITION,
            ContentDisposition.attachment().filename(name).build().toString())
        .body(body);
  }

  @GetMapping("/boards/{boardId}/inspections/compare")
  @Transactional(readOnly = true)
  public String compare(
      @PathVariable long boardId,
      @RequestParam long from,
      @RequestParam(required = false) Long to,
      Model model) {
    Board board = boards.get(boardId);
    model.addAttribute("board", board);
    model.addAttribute("comparison", comparisons.compare(boardId, from, to));
    return "inspection/compare";
  }

  /** The model the record page and the PDF share. */
  @Transactional(readOnly = true)
  Map<String, Object> reportModel(long boardId, long id) {
    InspectionRecord record = inspections.get(boardId, id);
    Board board = boards.get(boardId);
    Map<String, Object> model = new HashMap<>();
    model.put("record", record);
    model.put("sheet", inspections.graded(record));
    model.put("address", board.getSite().getAddress());
    model.put(
        "earthing",
        board.getSite().getEarthingSystem() == null
            ? "—"
            : board.getSite().getEarthingSystem().name().replace('_', '-'));
    model.put("location", board.getLocation());
    model.put("recordedAt", WHEN.format(record.recordedAt()));
    InspectionRecord previous = comparisons.previous(record);
    model.put(
        "comparison",
        previous == null ? null : comparisons.compare(boardId, previous.id(), record.id()));
    return model;
  }

  private static boolean onlyMissingConfirmation(InspectionSheet sheet) {
    return sheet.errors().keySet().stream().allMatch(k -> k.equals("confirmedOutcome"));
  }
}
