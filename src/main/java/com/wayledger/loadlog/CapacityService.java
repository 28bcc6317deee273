package com.wayledger.loadlog;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.capacity.CandidateKind;
import com.wayledger.engine.capacity.CandidateOutcome;
import com.wayledger.engine.capacity.CapacityAdvisor;
import com.wayledger.engine.capacity.CapacityAnswer;
import com.wayledger.engine.capacity.NewLoad;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.system.RuleViolation;
import java.util.Objects;
import java.util.Set;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Answers "can it take it?" on a stored site, and adds the load at the chosen candidate. */
@Service
public class CapacityService {

  private final AnalysisService analysis;
  private final BoardService boards;
  private final ScheduleService schedule;

  public CapacityService(AnalysisService analysis, BoardService boards, ScheduleService schedule) {
    this.analysis = analysis;
    this.boards = boards;
    this.schedule = schedule;
  }

  /** Candidates on one board ({@code boardId}) or, when it is null, on every board of the site. */
  @Transactional(readOnly = true)
  public CapacityAnswer ask(long siteId, Long boardId, CapacityForm form) {
    var spec = analysis.ofSite(siteId).spec();
    return CapacityAdvisor.ask(
        spec,
        boardId == null ? Set.of() : Set.of(boardId),
        form.toNewLoad(),
        analysis.methods(),
        analysis.mccbSettingsOfSite(siteId),
        ProtectionSettings.DEFAULTS);
  }

  /**
   * Adds the load at the candidate named by {@code choice} (see {@link
   * #choiceOf(CandidateOutcome)}), worked out again from the stored schedule so that what is stored
   * is what the engines assessed now. One transaction: the circuit (when new or spare) and the
   * load, each logged with the reason.
   *
   * @return the circuit that now carries the load
   */
  @Transactional
  public Circuit add(long boardId, CapacityForm form, String choice, String reason) {
    long siteId = boards.get(boardId).getSite().getId();
    CandidateOutcome picked =
        ask(siteId, boardId, form).outcomes().stream()
            .filter(outcome -> choiceOf(outcome).equals(choice))
            .findFirst()
            .orElseThrow(() -> new RuleViolation("choice", "loadlog.capacity.choice.gone"));
    var candidate = picked.candidate();
    NewLoad load = form.toNewLoad();
    LoadForm loadForm = loadForm(load);
    long circuitId;
    if (candidate.kind() == CandidateKind.SHARED_CIRCUIT) {
      circuitId = candidate.circuitId();
    } else if (candidate.device() == null) {
      throw new RuleViolation("choice", "loadlog.capacity.noDevice");
    } else if (candidate.circuitId() != null) {
      Circuit existing = schedule.circuit(candidate.circuitId());
      CircuitForm now = CircuitForm.of(existing);
      DeviceSpec device = candidate.kind() == CandidateKind.SPARE_WAY ? null : candidate.device();
      schedule.updateCircuit(
          existing.getId(), now.inUseAs(load.description(), device).at(load.location()), reason);
      circuitId = existing.getId();
    } else {
      CircuitForm blank = CircuitForm.blankAt(candidate.wayNumber(), candidate.position());
      Circuit added =
          schedule.addCircuit(
              boardId,
              blank.inUseAs(load.description(), candidate.device()).at(load.location()),
              reason);
      circuitId = added.getId();
    }
    schedule.addLoad(circuitId, loadForm, reason);
    return schedule.circuit(circuitId);
  }

  /** A stable name of a candidate for the "add it" form: board, way, position, kind, circuit. */
  public static String choiceOf(CandidateOutcome outcome) {
    var c = outcome.candidate();
    return c.boardId()
        + ":"
        + c.wayNumber()
        + ":"
        + c.position()
        + ":"
        + c.kind()
        + ":"
        + Objects.toString(c.circuitId(), "new");
  }

  static LoadForm loadForm(NewLoad load) {
    var spec = load.toLoadSpec();
    return new LoadForm(
        spec.description(),
        spec.category(),
        1,
        spec.ratingValue(),
        spec.ratingUnit(),
        spec.powerFactor(),
        spec.startUpSurgeMultiple(),
        spec.startUpSurgeMillis(),
        false);
  }
}
