package com.wayledger.exchange;

import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.system.FormStatus;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.security.Principal;
import java.util.ArrayList;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * Spreadsheets in, in four steps: upload, column mapping (skipped for our own export), a preview of
 * every row with its problems, and the import itself. Nothing is stored before the last step, and
 * then all of it in one transaction. Every step needs the editor role.
 */
@Controller
public class ImportController {

  private final BoardService boards;
  private final ImportService imports;
  private final UploadStore uploads;

  public ImportController(BoardService boards, ImportService imports, UploadStore uploads) {
    this.boards = boards;
    this.imports = imports;
    this.uploads = uploads;
  }

  @GetMapping("/boards/{boardId}/import")
  public String uploadPage(@PathVariable long boardId, Model model) {
    model.addAttribute("board", boards.get(boardId));
    model.addAttribute("maxMegabytes", SpreadsheetReader.MAX_BYTES / (1024 * 1024));
    model.addAttribute("maxRows", SpreadsheetReader.MAX_ROWS);
    return "exchange/upload";
  }

  @PostMapping("/boards/{boardId}/import")
  public String upload(
      @PathVariable long boardId,
      @RequestParam(name = "file", required = false) MultipartFile file,
      Principal principal,
      HttpServletRequest request,
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
      String next;
      if (table.isOwnExport()) {
        upload = upload.withMapping(table.sheetIndex(), ColumnGuesser.guess(table));
        uploads.update(upload);
        next = "/boards/" + boardId + "/import/" + upload.token() + "/preview";
      } else {
        next = "/boards/" + boardId + "/import/" + upload.token() + "/mapping";
      }
      return redirect(request, response, next);
    } catch (ImportRefused refused) {
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute("board", board);
      model.addAttribute("maxMegabytes", SpreadsheetReader.MAX_BYTES / (1024 * 1024));
      model.addAttribute("maxRows", SpreadsheetReader.MAX_ROWS);
      model.addAttribute("refusal", refused);
      return "exchange/upload";
    }
  }

  @GetMapping("/boards/{boardId}/import/{token}/mapping")
  public String mapping(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam(name = "sheet", required = false) Integer sheet,
      Principal principal,
      Model model) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    int sheetIndex = sheet != null ? sheet : upload.sheetIndex();
    SheetTable table = uploads.table(upload, sheetIndex);
    List<ImportField> mapping =
        sheet == null
                && upload.mapping().size() == table.headers().size()
                && upload.sheetIndex() == table.sheetIndex()
            ? upload.mapping()
            : ColumnGuesser.guess(table);
    model.addAttribute("board", boards.get(boardId));
    model.addAttribute("upload", upload);
    model.addAttribute("table", table);
    model.addAttribute("mapping", mapping);
    model.addAttribute("samples", table.rows().subList(0, Math.min(5, table.rows().size())));
    model.addAttribute("fields", ImportField.values());
    return "exchange/mapping";
  }

  @PostMapping("/boards/{boardId}/import/{token}/mapping")
  public String saveMapping(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam("sheet") int sheet,
      HttpServletRequest request,
      Principal principal) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    SheetTable table = uploads.table(upload, sheet);
    List<ImportField> mapping = new ArrayList<>();
    for (int c = 0; c < table.headers().size(); c++) {
      String value = request.getParameter("column" + c);
      ImportField field = ImportField.IGNORE;
      if (value != null) {
        try {
          field = ImportField.valueOf(value);
        } catch (IllegalArgumentException e) {
          throw new RuleViolation("column" + c, "import.mapping.unknownField");
        }
      }
      mapping.add(field);
    }
    uploads.update(upload.withMapping(table.sheetIndex(), mapping));
    return "redirect:/boards/" + boardId + "/import/" + token + "/preview";
  }

  @GetMapping("/boards/{boardId}/import/{token}/preview")
  public String preview(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam(name = "remove", defaultValue = "false") boolean removeMissing,
      Principal principal,
      Model model) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    if (upload.mapping().isEmpty()) {
      return "redirect:/boards/" + boardId + "/import/" + token + "/mapping";
    }
    fillPreview(boardId, upload, removeMissing, model);
    return "exchange/preview";
  }

  @PostMapping("/boards/{boardId}/import/{token}")
  public String store(
      @PathVariable long boardId,
      @PathVariable String token,
      @RequestParam(name = "mode", defaultValue = "all") String mode,
      @RequestParam(name = "remove", defaultValue = "false") boolean removeMissing,
      @RequestParam(name = "reason", required = false) String reason,
      Principal principal,
      HttpServletRequest request,
      HttpServletResponse response,
      Model model,
      RedirectAttributes redirect) {
    UploadStore.Upload upload = upload(token, boardId, principal);
    ImportPlan plan = fillPreview(boardId, upload, removeMissing, model);
    if (model.getAttribute("otherSystem") instanceof ImportRefused otherSystem) {
      // another rule set or supply system: nothing of the file is stored
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute("refusal", otherSystem);
      return "exchange/preview";
    }
    boolean validOnly = "valid".equals(mode);
    if (!plan.isAllValid() && !validOnly) {
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute(
          "refusal", new ImportRefused("import.refused.hasErrors", plan.invalidRows()));
      return "exchange/preview";
    }
    if (!plan.isAllValid() && removeMissing) {
      // a row left out for its problems would otherwise read as a circuit missing from the file
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute("refusal", new ImportRefused("import.refused.removeNeedsAllValid"));
      return "exchange/preview";
    }
    DwellingInputsInFile dwellingInputs =
        (DwellingInputsInFile) model.getAttribute("dwellingInputs");
    if (dwellingInputs != null && !dwellingInputs.isValid()) {
      response.setStatus(FormStatus.UNPROCESSABLE);
      model.addAttribute("refusal", new ImportRefused("import.refused.dwellingInputs"));
      return "exchange/preview";
    }
    if (plan.hasConflicts()) {
      response.setStatus(HttpStatus.CONFLICT.value());
      model.addAttribute(
          "refusal",
          new ImportRefused("import.refused.conflicts", plan.count(ImportOutcome.Kind.CONFLICT)));
      return "exchange/preview";
    }
    if (plan.changesNothing()) {
      return "exchange/preview"; // says so; nothing stored, nothing logged
    }
    try {
      int[] stored = imports.store(boardId, plan, upload.fileName(), reason, dwellingInputs);
      uploads.remove(upload);
      redirect.addFlashAttribute("imported", stored);
      return redirect(request, response, "/boards/" + boardId);
    } catch (StaleEditException stale) {
      response.setStatus(HttpStatus.CONFLICT.value());
      fillPreview(boardId, upload, removeMissing, model);
      model.addAttribute("refusal", new ImportRefused("import.refused.changedMeanwhile"));
      return "exchange/preview";
    } catch (RuleViolation violation) {
      response.setStatus(HttpStatus.CONFLICT.value());
      model.addAttribute("refusal", new ImportRefused("import.refused.changedMeanwhile"));
      return "exchange/preview";
    }
  }

  /**
   * A stored upload that cannot be read any more (or a sheet that is empty) goes back to the upload
   * step.
   */
  @org.springframework.web.bind.annotation.ExceptionHandler(ImportRefused.class)
  public String refused(
      ImportRefused refused,
      HttpServletRequest request,
      HttpServletResponse response,
      Model model) {
    response.setStatus(FormStatus.UNPROCESSABLE);
    String[] parts = request.getRequestURI().split("/");
    long boardId = Long.parseLong(parts[java.util.Arrays.asList(parts).indexOf("boards") + 1]);
    model.addAttribute("board", boards.get(boardId));
    model.addAttribute("maxMegabytes", SpreadsheetReader.MAX_BYTES / (1024 * 1024));
    model.addAttribute("maxRows", SpreadsheetReader.MAX_ROWS);
    model.addAttribute("refusal", refused);
    return "exchange/upload";
  }

  private ImportPlan fillPreview(
      long boardId, UploadStore.Upload upload, boolean removeMissing, Model model) {
    SheetTable table = uploads.table(upload, upload.sheetIndex());
    List<ImportField> mapping = upload.mapping();
    if (mapping.size() != table.headers().size()) {
      mapping = ColumnGuesser.guess(table);
    }
    ImportPlan plan = imports.plan(boardId, table, mapping, removeMissing);
    model.addAttribute(
        "dwellingInputs",
        DwellingInputsInFile.read(uploads.bytes(upload), upload.fileName()).orElse(null));
    var board = boards.get(boardId);
    model.addAttribute("board", board);
    SystemInFile.of(table)
        .filter(
            inFile ->
                !inFile.fits(
                    ExportReader.ruleSetTitleOf(board), ExportReader.supplySystemWordsOf(board)))
        .ifPresent(
            inFile -> {
              ImportRefused otherSystem =
                  new ImportRefused(
                      "import.refused.otherSystem",
                      inFile.ruleSetTitle(),
                      inFile.supplySystemWords(),
                      ExportReader.ruleSetTitleOf(board),
                      ExportReader.supplySystemWordsOf(board));
              model.addAttribute("otherSystem", otherSystem);
              model.addAttribute("refusal", otherSystem);
            });
    model.addAttribute("upload", upload);
    model.addAttribute("table", table);
    model.addAttribute("plan", plan);
    model.addAttribute("ownExport", table.isOwnExport());
    model.addAttribute("unitsRead", unitsRead(table, mapping));
    model.addAttribute("removeMissing", removeMissing);
    model.addAttribute(
        "nothingToChange",
        plan.isAllValid() && !plan.outcomes().isEmpty() && plan.changesNothing());
    return plan;
  }

  /** units (AWG/feet): a column holding sizes or lengths, and the unit its values are read in. */
  public record UnitReading(String header, String messageKey) {}

  /** The size and length columns of the mapping, each with how its values are read. */
  static List<UnitReading> unitsRead(SheetTable table, List<ImportField> mapping) {
    List<UnitReading> readings = new ArrayList<>();
    for (int i = 0; i < mapping.size() && i < table.headers().size(); i++) {
      ImportField field = mapping.get(i);
      switch (field) {
        case LINE_CSA, CPC_CSA, LENGTH_METRES, LINE_AWG, CPC_AWG, LENGTH_FEET ->
            readings.add(new UnitReading(table.headers().get(i), "import.units." + field.name()));
        default -> {}
      }
    }
    return readings;
  }

  private UploadStore.Upload upload(String token, long boardId, Principal principal) {
    return uploads
        .find(token, boardId, principal.getName())
        .orElseThrow(() -> new NotFoundException("Upload", boardId));
  }

  /** A redirect that htmx follows as a page load (HX-Redirect), and a plain 303 otherwise. */
  private static String redirect(
      HttpServletRequest request, HttpServletResponse response, String path) {
    if ("true".equals(request.getHeader("HX-Request"))) {
      response.setHeader("HX-Redirect", request.getContextPath() + path);
      return "exchange/redirect";
    }
    return "redirect:" + path;
  }
}
