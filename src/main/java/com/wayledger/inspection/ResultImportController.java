package com.wayledger.inspection;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.exchange.ImportRefused;
import com.wayledger.exchange.SheetTable;
import com.wayledger.exchange.SpreadsheetReader;
import com.wayledger.exchange.UploadStore;
import com.wayledger.system.FormStatus;
import com.wayledger.system.NotFoundException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.security.Principal;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;

/**
 * Test results from a spreadsheet, in three steps on the same upload store as the schedule import:
 * upload; the columns (guessed from their headers) with the inspection's own details; a preview of
 * every row graded, with its problems beside it; and recording it as a new inspection. Nothing is
 * stored before the last step, and then all of it or nothing.
 */
@Controller
public class ResultImportController {

  private static final String UPLOAD = "inspection/import-upload";
  private static final String COLUMNS = "inspection/import";

  private final BoardService boards;
  private final ResultImportService imports;
  private final UploadStore uploads;

  public ResultImportController(
      BoardService boards, ResultImportService imports, UploadStore uploads) {
    this.boards = boards;
    this.imports = imports;
    this.uploads = uploads;
  }

  @GetMapping("/boards/{boardId}/inspections/import")
  public String uploadPage(@PathVariable long boardId, Model model) {
    uploadModel(boards.get(boardId), model);
    return UPLOAD;
  }

  @PostMapping("/boards/{boardId}/inspections/import")
  public String upload(
      @PathVariable long boardId,
      @RequestParam(name = "file", required = false) MultipartFile file,
      Principal principal,
      HttpServletResponse response,
      Model model)
      throws IOException {
    Board board = boards.get(boardId);
    try {
      if (file == null || file.isEmpty()) {
        throw new ImportRefused("import.refused.noFile");
      }
      if (file.getSize() > SpreadsheetReader.MAX_BYTES) {
        throw new ImportRefused(
            "import.refused.tooBig", SpreadsheetReader.MAX_BYTES / (1024 * 1024));
      }
      byte[] bytes = file.getBytes();
      SheetTable table = SpreadsheetReader.read(bytes, file.getOriginalFilename(), -1);
      UploadStore.Upload upload =
          uploads.save(boardId, principal.getName(), file.getOriginalFilename(), bytes);
      uploads.remember(upload, -1, table);
      return "redirect:/boards/" + boardId + "/inspections/import/" + upload.token();
    } catch (ImportRefused refused) {
      response.setStatus(FormStatus.UNPROCESSABLE);
      uploadModel(board, model);
      model.addAttribute("refusal", refused);
      return UPLOAD;
    }
  }

  /** The columns as guessed, and the inspection's details to fill in. */
  @GetMapping("/boards/{boardId}/inspections/import/{token}")
  public String columns(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam(name = "sheet", required = false) Integer sheet,
      Principal principal,
      HttpServletResponse response,
      Model model) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    try {
      SheetTable table = uploads.table(upload, sheet == null ? -1 : sheet);
      ResultImportService.Header header =
          new ResultImportService.Header(
              LocalDate.now().toString(), principal.getName(), "", "", "500", "");
      model.addAttribute("mapping", ResultColumnGuesser.guess(table.headers()));
      model.addAttribute("header", header);
      columnsModel(boards.get(boardId), upload, table, model);
      return COLUMNS;
    } catch (ImportRefused refused) {
      return refusedUpload(boardId, refused, response, model);
    }
  }

  /** Every row read with the chosen columns, graded, with its problems beside it. */
  @PostMapping("/boards/{boardId}/inspections/import/{token}/preview")
  public String preview(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam("sheet") int sheet,
      Principal principal,
      HttpServletRequest request,
      HttpServletResponse response,
      Model model) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    try {
      SheetTable table = uploads.table(upload, sheet);
      List<ResultColumn> mapping = mapping(request, table);
      ResultImportService.Header header = header(request);
      ResultImportPlan plan = imports.plan(boardId, table, mapping, header);
      model.addAttribute("mapping", mapping);
      model.addAttribute("header", header);
      model.addAttribute("plan", plan);
      columnsModel(boards.get(boardId), upload, table, model);
      if (!plan.isAllValid()) {
        response.setStatus(FormStatus.UNPROCESSABLE);
      }
      return COLUMNS;
    } catch (ImportRefused refused) {
      return refusedUpload(boardId, refused, response, model);
    }
  }

  /** Records the rows as a new inspection, or shows the preview again with why not (422). */
  @PostMapping("/boards/{boardId}/inspections/import/{token}")
  public String record(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam("sheet") int sheet,
      Principal principal,
      HttpServletRequest request,
      HttpServletResponse response,
      Model model) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    try {
      SheetTable table = uploads.table(upload, sheet);
      List<ResultColumn> mapping = mapping(request, table);
      ResultImportService.Header header = header(request);
      ResultImportService.Outcome outcome = imports.record(boardId, table, mapping, header);
      if (outcome.id() != null) {
        uploads.remove(upload);
        return "redirect:/boards/" + boardId + "/inspections/" + outcome.id();
      }
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute("mapping", mapping);
      model.addAttribute("header", header);
      model.addAttribute("plan", outcome.plan());
      model.addAttribute("refused", true);
      columnsModel(boards.get(boardId), upload, table, model);
      return COLUMNS;
    } catch (ImportRefused refused) {
      return refusedUpload(boardId, refused, response, model);
    }
  }

  private String refusedUpload(
      long boardId, ImportRefused refused, HttpServletResponse response, Model model) {
    response.setStatus(FormStatus.UNPROCESSABLE);
    uploadModel(boards.get(boardId), model);
    model.addAttribute("refusal", refused);
    return UPLOAD;
  }

  private static void uploadModel(Board board, Model model) {
    model.addAttribute("board", board);
    model.addAttribute("maxMegabytes", SpreadsheetReader.MAX_BYTES / (1024 * 1024));
    model.addAttribute("maxRows", SpreadsheetReader.MAX_ROWS);
  }

  private static void columnsModel(
      Board board, UploadStore.Upload upload, SheetTable table, Model model) {
    model.addAttribute("board", board);
    model.addAttribute("upload", upload);
    model.addAttribute("table", table);
    model.addAttribute("samples", table.rows().subList(0, Math.min(3, table.rows().size())));
    model.addAttribute("meanings", ResultColumn.values());
  }

  /** The chosen meaning of each column; an unknown name reads as "not read". */
  private static List<ResultColumn> mapping(HttpServletRequest request, SheetTable table) {
    List<ResultColumn> mapping = new ArrayList<>();
    for (int c = 0; c < table.headers().size(); c++) {
      String value = request.getParameter("column" + c);
      ResultColumn meaning = ResultColumn.IGNORE;
      if (value != null) {
        try {
          meaning = ResultColumn.valueOf(value);
        } catch (IllegalArgumentException e) {
          meaning = ResultColumn.IGNORE;
        }
      }
      mapping.add(meaning);
    }
    return mapping;
  }

  private static ResultImportService.Header header(HttpServletRequest request) {
    return new ResultImportService.Header(
        text(request, "inspectedOn"),
        text(request, "inspector"),
        text(request, "instruments"),
        text(request, "testCelsius"),
        text(request, "insulationTestVolts"),
        text(request, "confirmedOutcome"));
  }

  private static String text(HttpServletRequest request, String name) {
    String value = request.getParameter(name);
    return value == null ? "" : value;
  }

  private UploadStore.Upload upload(String token, long boardId, Principal principal) {
    return uploads
        .find(token, boardId, principal.getName())
        .orElseThrow(() -> new NotFoundException("Upload", boardId));
  }
}
