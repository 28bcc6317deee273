package com.wayledger.board;

import com.wayledger.engine.PhasePosition;
import com.wayledger.system.FormRecovery;
import com.wayledger.system.FormStatus;
import com.wayledger.system.RecordDiff;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import org.springframework.orm.ObjectOptimisticLockingFailureException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestHeader;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * Inline editing of a board's schedule. With htmx each request answers with the fragment to swap in
 * (the schedule table, or the editor row with its messages and status 422); without it, with a
 * whole page.
 */
@Controller
public class ScheduleController {

  private static final String HX = "HX-Request";
  private static final String SCHEDULE_FRAGMENT = "board/schedule :: scheduleTable";
  private static final String PANEL_FRAGMENT = "board/panel :: panelTable";
  private static final String SCHEDULE_UPDATE = "board/schedule :: scheduleUpdate";
  private static final String EDITOR_FRAGMENT = "board/schedule :: circuitEditor";
  private static final String EDITOR_PAGE = "board/circuit";

  private final ScheduleService schedule;
  private final SchedulePage schedulePage;
  private final BoardService boards;

  public ScheduleController(
      ScheduleService schedule, SchedulePage schedulePage, BoardService boards) {
    this.schedule = schedule;
    this.schedulePage = schedulePage;
    this.boards = boards;
  }

  @ModelAttribute
  void choices(Model model) {
    FormChoices.addCircuit(model);
  }

  @GetMapping("/boards/{boardId}/schedule")
  public String table(@PathVariable long boardId, Model model) {
    return schedulePage.fill(model, boardId).board().panelboard()
        ? PANEL_FRAGMENT
        : SCHEDULE_FRAGMENT;
  }

  @GetMapping("/boards/{boardId}/circuits/new")
  public String newCircuit(
      @PathVariable long boardId,
      @RequestParam int way,
      @RequestParam PhasePosition position,
      @RequestHeader(value = HX, required = false) String htmx,
      Model model) {
    Board board = boards.get(boardId);
    model.addAttribute("board", board);
    model.addAttribute(
        "form", CableUnitsOfForms.shown(blankFor(board, way, position), board.cableUnits()));
    if (htmx == null) {
      ReturnTo.BOARD.standalone(model, null, boardId);
    }
    return htmx != null ? EDITOR_FRAGMENT : EDITOR_PAGE;
  }

  @PostMapping("/boards/{boardId}/circuits")
  public String create(
      @PathVariable long boardId,
      @Valid @ModelAttribute("form") CircuitForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String reason,
      Model model,
      HttpServletResponse response) {
    form = FormRecovery.ensure(form, errors, model, "form", CircuitForm.class, request);
    if (!errors.hasErrors()) {
      try {
        CircuitForm stored = CableUnitsOfForms.stored(form, boards.get(boardId).cableUnits());
        Circuit saved = schedule.addCircuit(boardId, stored, reason);
        return savedSchedule(boardId, saved.getWayNumber(), htmx, model, response);
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    model.addAttribute("board", boards.get(boardId));
    if (htmx == null) {
      ReturnTo.BOARD.standalone(model, null, boardId);
    }
    return rejected(htmx, response);
  }

  /**
   * The editor: with htmx a row swapped into the schedule; without, a page of its own that returns
   * to where it was opened from ({@code back=checks} for the circuit's checks page, else the
   * board).
   */
  @GetMapping("/circuits/{id}/edit")
  public String edit(
      @PathVariable long id,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String back,
      Model model) {
    back = back == null || back.isBlank() ? null : back;
    fillEditor(model, id, CircuitForm.of(schedule.circuit(id)));
    if (htmx == null || back != null) {
      standalone(model, id, back);
    }
    return htmx != null && back == null ? EDITOR_FRAGMENT : EDITOR_PAGE;
  }

  @PostMapping("/circuits/{id}")
  public String update(
      @PathVariable long id,
      @Valid @ModelAttribute("form") CircuitForm form,
      BindingResult errors,
      HttpServletRequest request,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String reason,
      @RequestParam(required = false) String back,
      Model model,
      RedirectAttributes redirect,
      HttpServletResponse response) {
    back = back == null || back.isBlank() ? null : back;
    form = FormRecovery.ensure(form, errors, model, "form", CircuitForm.class, request);
    long boardId = schedule.circuit(id).getBoard().getId();
    if (back != null) {
      htmx = null;
    }
    if (!errors.hasErrors()) {
      try {
        CircuitForm stored = CableUnitsOfForms.stored(form, boards.get(boardId).cableUnits());
        boolean changed =
            stored.hasFirstLoad() || !CircuitForm.of(schedule.circuit(id)).sameRowAs(stored);
        schedule.updateCircuit(id, stored, reason);
        if (back != null) {
          redirect.addFlashAttribute("saved", changed ? "circuit.saved" : "circuit.unchanged");
          return "redirect:" + ReturnTo.of(back).url(id, boardId);
        }
        return savedSchedule(boardId, form.wayNumber(), htmx, model, response);
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      } catch (StaleEditException | ObjectOptimisticLockingFailureException stale) {
        if (back != null) {
          standalone(model, id, back);
        }
        return conflict(id, form, htmx, model, response);
      }
    }
    fillEditor(model, id, null);
    if (back != null) {
      standalone(model, id, back);
    }
    return rejected(htmx, response);
  }

  @PostMapping("/circuits/{id}/delete")
  public String delete(
      @PathVariable long id,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String reason,
      Model model) {
    long boardId = schedule.deleteCircuit(id, reason);
    return savedSchedule(boardId, null, htmx, model, null);
  }

  @PostMapping("/circuits/{id}/loads")
  public String addLoad(
      @PathVariable long id,
      @Valid @ModelAttribute("loadForm") LoadForm loadForm,
      BindingResult errors,
      HttpServletRequest request,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String reason,
      @RequestParam(required = false) String back,
      Model model,
      HttpServletResponse response) {
    back = loadEditorBack(back);
    model.addAttribute("back", back);
    loadForm = FormRecovery.ensure(loadForm, errors, model, "loadForm", LoadForm.class, request);
    if (back != null || htmx == null) {
      standalone(model, id, back);
    }
    if (!errors.hasErrors()) {
      try {
        schedule.addLoad(id, loadForm, reason);
        fillEditor(model, id, CircuitForm.of(schedule.circuit(id)));
        model.addAttribute("loadForm", LoadForm.blank());
        return htmx != null ? EDITOR_FRAGMENT : "redirect:" + editPage(id, back);
      } catch (RuleViolation violation) {
        FormStatus.reject(errors, violation);
      }
    }
    fillEditor(model, id, CircuitForm.of(schedule.circuit(id)));
    return FormStatus.invalid(response, htmx != null ? EDITOR_FRAGMENT : EDITOR_PAGE);
  }

  @GetMapping("/loads/{id}/edit")
  public String editLoad(
      @PathVariable long id, @RequestParam(required = false) String back, Model model) {
    model.addAttribute("back", loadEditorBack(back));
    LoadItem load = schedule.load(id);
    model.addAttribute("load", load);
    model.addAttribute("loadVersion", load.getVersion());
    model.addAttribute("circuitId", load.getCircuit().getId());
    model.addAttribute("loadForm", LoadForm.of(load));
    return "board/load";
  }

  @PostMapping("/loads/{id}")
  public String updateLoad(
      @PathVariable long id,
      @Valid @ModelAttribute("loadForm") LoadForm loadForm,
      BindingResult errors,
      HttpServletRequest request,
      @RequestParam(required = false) String reason,
      @RequestParam(required = false) String back,
      @RequestParam(required = false) Long version,
      Model model,
      HttpServletResponse response) {
    back = loadEditorBack(back);
    model.addAttribute("back", back);
    loadForm = FormRecovery.ensure(loadForm, errors, model, "loadForm", LoadForm.class, request);
    LoadItem load = schedule.load(id);
    long circuitId = load.getCircuit().getId();
    if (errors.hasErrors()) {
      model.addAttribute("load", load);
      model.addAttribute("loadVersion", version);
      model.addAttribute("circuitId", circuitId);
      return FormStatus.invalid(response, "board/load");
    }
    try {
      schedule.updateLoad(id, version, loadForm, reason);
    } catch (StaleEditException | ObjectOptimisticLockingFailureException stale) {
      return loadConflict(id, loadForm, model, response);
    }
    return "redirect:" + editPage(circuitId, back);
  }

  /**
   * The load editor's way back, passed on to the circuit editor: only the known value "checks" (the
   * template reads it from the model, never from the request).
   */
  private static String loadEditorBack(String back) {
    return ReturnTo.of(back) == ReturnTo.CHECKS ? "checks" : null;
  }

  /** As {@link #conflict}, for a load line saved by someone else after its form was opened. */
  private String loadConflict(long id, LoadForm yours, Model model, HttpServletResponse response) {
    LoadItem saved = schedule.load(id);
    LoadForm savedForm = LoadForm.of(saved);
    model.asMap().remove(BindingResult.MODEL_KEY_PREFIX + "loadForm");
    model.addAttribute("conflict", RecordDiff.between(yours, savedForm, java.util.Set.of()));
    model.addAttribute("conflictPrefix", "load.");
    model.addAttribute("yours", yours);
    model.addAttribute("load", saved);
    model.addAttribute("loadVersion", saved.getVersion());
    model.addAttribute("circuitId", saved.getCircuit().getId());
    model.addAttribute("loadForm", savedForm);
    response.setStatus(HttpServletResponse.SC_CONFLICT);
    return "board/load";
  }

  @PostMapping("/loads/{id}/delete")
  public String deleteLoad(
      @PathVariable long id,
      @RequestHeader(value = HX, required = false) String htmx,
      @RequestParam(required = false) String reason,
      @RequestParam(required = false) String back,
      Model model) {
    back = back == null || back.isBlank() ? null : back;
    long circuitId = schedule.deleteLoad(id, reason);
    if (htmx == null) {
      return "redirect:" + editPage(circuitId, back);
    }
    fillEditor(model, circuitId, CircuitForm.of(schedule.circuit(circuitId)));
    if (back != null) {
      standalone(model, circuitId, back);
    }
    return EDITOR_FRAGMENT;
  }

  /**
   * Someone saved the circuit after this editor was opened: 409, the editor again holding the
   * values saved now (and their version, so a second save is a deliberate overwrite), with the
   * user's own values listed beside them so nothing typed is lost. Same answer for htmx (swapped
   * into the row) and plain requests.
   */
  private String conflict(
      long id, CircuitForm yours, String htmx, Model model, HttpServletResponse response) {
    Circuit circuit = schedule.circuit(id);
    CircuitForm saved =
        CableUnitsOfForms.shown(CircuitForm.of(circuit), circuit.getBoard().cableUnits());
    model.asMap().remove(BindingResult.MODEL_KEY_PREFIX + "form");
    model.addAttribute("conflict", RecordDiff.between(yours, saved, java.util.Set.of("version")));
    model.addAttribute("yours", yours);
    fillEditor(model, id, saved);
    response.setStatus(HttpServletResponse.SC_CONFLICT);
    return htmx != null ? EDITOR_FRAGMENT : EDITOR_PAGE;
  }

  /**
   * A new row; where the board or site sets a conductor material or insulation, the row leaves them
   * empty so that it inherits them (and follows the default when it changes).
   */
  private static CircuitForm blankFor(Board board, int way, PhasePosition position) {
    CircuitForm blank = CircuitForm.blankAt(way, position);
    var own = board.getDefaults();
    var site = board.getSite().getDefaults();
    boolean materialSet = own.getMaterial() != null || site.getMaterial() != null;
    boolean insulationSet = own.getInsulation() != null || site.getInsulation() != null;
    return blank.withConductor(
        materialSet ? null : blank.cableMaterial(), insulationSet ? null : blank.cableInsulation());
  }

  private static String editPage(long circuitId, String back) {
    return "/circuits/"
        + circuitId
        + "/edit"
        + (ReturnTo.of(back) == ReturnTo.CHECKS ? "?back=checks" : "");
  }

  private void standalone(Model model, long circuitId, String back) {
    ReturnTo.of(back).standalone(model, circuitId, schedule.circuit(circuitId).getBoard().getId());
  }

  private void fillEditor(Model model, long circuitId, CircuitForm form) {
    Circuit circuit = schedule.circuit(circuitId);
    var units = circuit.getBoard().cableUnits();
    model.addAttribute(
        "missingFields", CableUnitsOfForms.fieldNames(schedule.missingInputs(circuitId), units));
    model.addAttribute("circuit", circuit);
    model.addAttribute("circuitLoads", schedule.loadsOf(circuitId));
    model.addAttribute("board", boards.get(circuit.getBoard().getId()));
    if (form != null) {
      model.addAttribute("form", CableUnitsOfForms.shown(form, units));
    }
    if (!model.containsAttribute("loadForm")) {
      model.addAttribute("loadForm", LoadForm.blank());
    }
  }

  /**
   * After a successful change: with htmx the whole schedule table replaces the editor row (the form
   * aims its response at its own row, for messages; success re-aims it at the table), and the
   * demand panel, the circuit count and the findings come along as out-of-band swaps so that no
   * figure on the page is left stale; without htmx, a redirect.
   */
  private String savedSchedule(
      long boardId, Integer focusAfterWay, String htmx, Model model, HttpServletResponse response) {
    if (htmx == null) {
      return "redirect:/boards/" + boardId;
    }
    if (response != null) {
      response.setHeader("HX-Retarget", "#schedule");
      response.setHeader("HX-Reswap", "outerHTML");
    }
    schedulePage.fill(model, boardId, focusAfterWay);
    return SCHEDULE_UPDATE;
  }

  private static String rejected(String htmx, HttpServletResponse response) {
    return FormStatus.invalid(response, htmx != null ? EDITOR_FRAGMENT : EDITOR_PAGE);
  }
}
