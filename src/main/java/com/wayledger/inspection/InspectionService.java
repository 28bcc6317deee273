package com.wayledger.inspection;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.ScheduleMapper;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.inspection.BoardLimits;
import com.wayledger.engine.inspection.BoardResults;
import com.wayledger.engine.inspection.CircuitResults;
import com.wayledger.engine.inspection.GradedValue;
import com.wayledger.engine.inspection.InspectionGrader;
import com.wayledger.engine.inspection.Outcome;
import com.wayledger.engine.inspection.TestConditions;
import com.wayledger.engine.inspection.Urgency;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.inspection.InspectionForm.ObservationEntry;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import com.wayledger.loadlog.ChangeLog;
import com.wayledger.loadlog.ChangeLogEntry;
import com.wayledger.site.Site;
import com.wayledger.system.NotFoundException;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Builds the result grid of a board, grades what was typed, proposes observations and records an
 * inspection. Recording never changes the schedule, so the board's findings and demand stay as they
 * were.
 */
@Service
public class InspectionService {

  /** Blank lines offered for the inspector's own observations. */
  static final int BLANK_OBSERVATIONS = 2;

  static final int TEXT_MAX = 1000;

  private final BoardService boards;
  private final AnalysisService analysis;
  private final ChangeLog changeLog;
  private final InspectionStore store;

  public InspectionService(
      BoardService boards, AnalysisService analysis, ChangeLog changeLog, InspectionStore store) {
    this.boards = boards;
    this.analysis = analysis;
    this.changeLog = changeLog;
    this.store = store;
  }

  /** An empty grid for a board's circuits in use, today's date, ungraded. */
  @Transactional(readOnly = true)
  public InspectionSheet blank(long boardId, String inspector) {
    Board board = boards.get(boardId);
    List<ResultEntry> rows = new ArrayList<>();
    for (Circuit c : inUse(board)) {
      rows.add(ResultEntry.blank(c.getId()));
    }
    InspectionForm form =
        new InspectionForm(
            LocalDate.now().toString(),
            inspector,
            "",
            "",
            "500",
            "",
            "",
            "",
            "",
            "",
            null,
            "",
            rows,
            List.of());
    return sheet(board, form, new LinkedHashMap<>(), false, false);
  }

  /** A grid pre-filled from an earlier record, to correct it with a new one. */
  @Transactional(readOnly = true)
  public InspectionSheet correcting(long boardId, long inspectionId) {
    InspectionRecord old = get(boardId, inspectionId);
    Board board = boards.get(boardId);
    Map<Long, ResultRow> byCircuit = new LinkedHashMap<>();
    old.results().forEach(r -> byCircuit.put(r.circuitId(), r));
    List<ResultEntry> rows = new ArrayList<>();
    for (Circuit c : inUse(board)) {
      ResultRow r = byCircuit.get(c.getId());
      rows.add(r == null ? ResultEntry.blank(c.getId()) : FormText.entry(c.getId(), r.results()));
    }
    List<ObservationEntry> observations = new ArrayList<>();
    for (Observation o : old.observations()) {
      observations.add(
          new ObservationEntry(
              "keep", o.urgency().name(), o.text(), o.circuitId(), o.wayLabel(), null, null));
    }
    BoardResults b = old.boardResults();
    InspectionForm form =
        new InspectionForm(
            old.inspectedOn().toString(),
            old.inspector(),
            old.instruments(),
            FormText.number(old.testCelsius()),
            FormText.number(old.insulationTestVolts()),
            FormText.number(b.externalLoopImpedanceOhms()),
            FormText.number(b.prospectiveFaultKiloAmps()),
            FormText.number(b.earthElectrodeOhms()),
            FormText.yesNo(b.mainBondingPresent()),
            old.notes(),
            old.id(),
            "",
            rows,
            observations);
    return sheet(board, form, new LinkedHashMap<>(), true, false);
  }

  /** The grid graded as typed, with observations proposed from failing values and findings. */
  @Transactional(readOnly = true)
  public InspectionSheet grade(long boardId, InspectionForm form) {
    return sheet(boards.get(boardId), form, new LinkedHashMap<>(), true, true);
  }

  /**
   * Records the inspection when every cell parses and the inspector confirmed the outcome the
   * observations lead to; otherwise returns the graded sheet with its errors and stores nothing.
   */
  @Transactional
  public Recorded record(long boardId, InspectionForm form) {
    return record(boardId, form, true);
  }

  /**
   * Records with exactly the observations given (no proposals merged in): the API's way, where the
   * client graded first and sends the observations it keeps.
   */
  @Transactional
  public Recorded recordAsGiven(long boardId, InspectionForm form) {
    return record(boardId, form, false);
  }

  private Recorded record(long boardId, InspectionForm form, boolean mergeProposals) {
    Board board = boards.get(boardId);
    Map<String, String> errors = new LinkedHashMap<>();
    InspectionSheet sheet = sheet(board, form, errors, mergeProposals, true);
    if (!Objects.equals(sheet.outcome().name(), form.confirmedOutcome())) {
      errors.put("confirmedOutcome", "inspection.error.confirm");
    }
    if (form.correctsId() != null
        && store.find(form.correctsId()).filter(r -> r.boardId() == boardId).isEmpty()) {
      errors.put("correctsId", "inspection.error.corrects");
    }
    if (!errors.isEmpty()) {
      return new Recorded(null, sheet);
    }
    long id = store.insert(toRecord(board, form, sheet));
    // Recording an inspection leaves the schedule, and so the findings and demand, untouched. If it
    // ever copies a measured value into the schedule (a circuit's Zs), this is the one place that
    // must also bump the site's data generation and write the change log.
    return new Recorded(id, sheet);
  }

  /** The outcome of {@link #record}: the new id, or null with the sheet showing why not. */
  public record Recorded(Long id, InspectionSheet sheet) {}

  /** A stored record of a board. */
  @Transactional(readOnly = true)
  public InspectionRecord get(long boardId, long inspectionId) {
    return store
        .find(inspectionId)
        .filter(r -> r.boardId() == boardId)
        .orElseThrow(() -> new NotFoundException("Inspection", inspectionId));
  }

  /** A board's records, newest first, without their rows. */
  @Transactional(readOnly = true)
  public List<InspectionRecord> ofBoard(long boardId) {
    return store.ofBoard(boardId);
  }

  /** Corrected record id → the id of the record that corrects it. */
  @Transactional(readOnly = true)
  public Map<Long, Long> corrections(long boardId) {
    return store.correctionsOnBoard(boardId);
  }

  /** A stored record graded for viewing, printing and export. */
  @Transactional(readOnly = true)
  public InspectionSheet graded(InspectionRecord r) {
    Board board = boards.get(r.boardId());
    Site site = board.getSite();
    TestConditions conditions = conditions(site, r.testCelsius(), r.insulationTestVolts());
    List<SheetRow> rows = new ArrayList<>();
    List<CircuitSpec> recorded = new ArrayList<>();
    int i = 0;
    for (ResultRow row : r.results()) {
      recorded.add(row.recorded());
      rows.add(
          new SheetRow(
              i++,
              row.circuitId(),
              row.wayLabel(),
              row.description(),
              recordedLabel(row.recorded(), site.cableUnits()),
              row.recorded().ringFinal(),
              InspectionGrader.residualMilliAmpsOf(row.recorded().device()) != null,
              FormText.entry(row.circuitId(), row.results()),
              InspectionGrader.gradeCircuit(row.recorded(), row.results(), conditions)));
    }
    List<GradedValue> boardValues = boardValues(site, board, recorded, r.boardResults());
    List<ObservationEntry> observations =
        r.observations().stream()
            .map(
                o ->
                    new ObservationEntry(
                        "keep",
                        o.urgency().name(),
                        o.text(),
                        o.circuitId(),
                        o.wayLabel(),
                        null,
                        null))
            .toList();
    Urgency worst = Outcome.worst(r.observations().stream().map(Observation::urgency).toList());
    InspectionForm form =
        new InspectionForm(
            r.inspectedOn().toString(),
            r.inspector(),
            r.instruments(),
            FormText.number(r.testCelsius()),
            FormText.number(r.insulationTestVolts()),
            FormText.number(r.boardResults().externalLoopImpedanceOhms()),
            FormText.number(r.boardResults().prospectiveFaultKiloAmps()),
            FormText.number(r.boardResults().earthElectrodeOhms()),
            FormText.yesNo(r.boardResults().mainBondingPresent()),
            r.notes(),
            r.correctsId(),
            r.outcome().name(),
            rows.stream().map(SheetRow::entry).toList(),
            observations);
    return new InspectionSheet(
        board.getId(),
        site.getId(),
        r.boardReference(),
        site.getName(),
        site.getEarthingSystem() == EarthingSystem.TT,
        form,
        rows,
        boardValues,
        observations,
        r.outcome(),
        worst,
        Map.of());
  }

  // --- building the sheet ---

  /**
   * @param withProposals merge proposed observations into the form's
   * @param submitted the inspector submitted the grid (so an empty grid is an error)
   */
  private InspectionSheet sheet(
      Board board,
      InspectionForm form,
      Map<String, String> errors,
      boolean withProposals,
      boolean submitted) {
    Site site = board.getSite();
    Readings readings = new Readings(errors);
    Double celsius = readings.number("testCelsius", form.testCelsius());
    if (celsius != null && celsius > 60) {
      errors.put("testCelsius", "inspection.error.temperature");
    }
    TestConditions conditions =
        conditions(
            site,
            celsius == null ? TestConditions.DEFAULT_TEST_CELSIUS : celsius,
            readings.number("insulationTestVolts", form.insulationTestVolts()));
    readings.date("inspectedOn", form.inspectedOn());
    if (form.inspector() == null || form.inspector().isBlank()) {
      errors.put("inspector", "inspection.error.inspector");
    } else if (form.inspector().strip().length() > 120) {
      errors.put("inspector", "inspection.error.tooLong");
    }
    if (form.instruments() != null && form.instruments().length() > 300) {
      errors.put("instruments", "inspection.error.tooLong");
    }
    if (form.notes() != null && form.notes().length() > TEXT_MAX) {
      errors.put("notes", "inspection.error.tooLong");
    }

    Map<Long, ResultEntry> typed = new LinkedHashMap<>();
    for (ResultEntry e : form.rows()) {
      if (e.circuitId() != null) {
        typed.put(e.circuitId(), e);
      }
    }
    List<SheetRow> rows = new ArrayList<>();
    List<CircuitSpec> recorded = new ArrayList<>();
    Set<Long> known = new LinkedHashSet<>();
    int i = 0;
    for (Circuit c : inUse(board)) {
      known.add(c.getId());
      ResultEntry entry = typed.getOrDefault(c.getId(), ResultEntry.blank(c.getId()));
      CircuitSpec spec = ScheduleMapper.snapshotOf(c, null);
      recorded.add(spec);
      CircuitResults results = FormText.results(readings, "rows[" + i + "].", entry);
      rows.add(
          new SheetRow(
              i,
              c.getId(),
              c.positionLabel(),
              c.getDescription(),
              recordedLabel(spec, site.cableUnits()),
              spec.ringFinal(),
              InspectionGrader.residualMilliAmpsOf(spec.device()) != null,
              entry,
              InspectionGrader.gradeCircuit(spec, results, conditions)));
      i++;
    }
    if (!known.containsAll(typed.keySet())) {
      errors.put("rows", "inspection.error.unknownCircuit");
    }
    BoardResults boardResults =
        new BoardResults(
            readings.number("ze", form.ze()),
            readings.number("pfc", form.pfc()),
            readings.number("electrode", form.electrode()),
            readings.yesNo("mainBonding", form.mainBonding()));
    List<GradedValue> boardValues = boardValues(site, board, recorded, boardResults);

    List<ObservationEntry> observations =
        withProposals
            ? merge(form.observations(), proposals(board, rows, boardValues))
            : new ArrayList<>(form.observations());
    int o = 0;
    for (ObservationEntry entry : observations) {
      if (entry.isKept()) {
        if (parseUrgency(entry.urgency()) == null) {
          errors.put("observations[" + o + "].urgency", "inspection.error.urgency");
        }
        if (entry.text().length() > TEXT_MAX) {
          errors.put("observations[" + o + "].text", "inspection.error.tooLong");
        }
      }
      o++;
    }
    List<Urgency> kept =
        observations.stream()
            .filter(ObservationEntry::isKept)
            .map(e -> parseUrgency(e.urgency()))
            .filter(Objects::nonNull)
            .toList();
    boolean anything =
        rows.stream().anyMatch(r -> !r.entry().equals(ResultEntry.blank(r.circuitId())))
            || !boardResults.equals(BoardResults.NONE);
    if (!anything && submitted) {
      errors.put("rows", "inspection.error.nothingEntered");
    }
    List<ObservationEntry> shown = new ArrayList<>(observations);
    for (int b = 0; b < BLANK_OBSERVATIONS; b++) {
      shown.add(new ObservationEntry("keep", Urgency.ADVISORY.name(), "", null, null, null, null));
    }
    return new InspectionSheet(
        board.getId(),
        site.getId(),
        board.getReference(),
        site.getName(),
        site.getEarthingSystem() == EarthingSystem.TT,
        form,
        rows,
        boardValues,
        shown,
        Outcome.of(kept),
        Outcome.worst(kept),
        errors);
  }

  private static List<Circuit> inUse(Board board) {
    return board.getCircuits().stream().filter(c -> c.getStatus() == WayStatus.IN_USE).toList();
  }

  private static TestConditions conditions(Site site, double celsius, Double testVolts) {
    double u0 = site.getNominalVoltageVolts();
    double highest = site.getPhases() == 3 ? Math.sqrt(3.0) * u0 : u0;
    return new TestConditions(site.getEarthingSystem(), u0, highest, celsius, testVolts);
  }

  private static List<GradedValue> boardValues(
      Site site, Board board, List<CircuitSpec> circuits, BoardResults results) {
    Double lowestBreaking =
        circuits.stream()
            .map(CircuitSpec::device)
            .filter(Objects::nonNull)
            .map(DeviceSpec::breakingCapacityKiloAmps)
            .filter(Objects::nonNull)
            .min(Double::compare)
            .orElse(null);
    Double largestResidual =
        circuits.stream()
            .map(c -> InspectionGrader.residualMilliAmpsOf(c.device()))
            .filter(Objects::nonNull)
            .max(Double::compare)
            .orElse(null);
    Double declaredZe = board.getParent() == null ? site.getExternalLoopImpedanceOhms() : null;
    return BoardLimits.grade(
        results, site.getEarthingSystem(), declaredZe, lowestBreaking, largestResidual);
  }

  /** The recorded device and cable as short text, sizes and length in the site's units. */
  static String recordedLabel(CircuitSpec spec, com.wayledger.engine.rules.CableUnits units) {
    StringBuilder s = new StringBuilder();
    DeviceSpec d = spec.device();
    if (d != null) {
      s.append(d.curve() != null ? d.curve().name() : d.kind().name());
      if (d.ratedCurrentAmps() != null) {
        s.append(FormText.number(d.ratedCurrentAmps()));
      }
      if (d.residualCurrentMilliAmps() != null) {
        s.append(" ").append(FormText.number(d.residualCurrentMilliAmps())).append(" mA");
      }
    }
    if (units.awgAndFeet()
        && spec.cable() != null
        && spec.cable().lineCsaSquareMillimetres() != null) {
      s.append(" · ").append(units.sizeText(spec.cable().lineCsaSquareMillimetres()));
      if (spec.cable().protectiveCsaSquareMillimetres() != null) {
        s.append(" / ").append(units.sizeText(spec.cable().protectiveCsaSquareMillimetres()));
      }
      if (spec.cable().lengthMetres() != null) {
        s.append(" ").append(units.lengthText(spec.cable().lengthMetres()));
      }
    } else if (spec.cable() != null && spec.cable().lineCsaSquareMillimetres() != null) {
      s.append(" · ")
          .append(FormText.number(spec.cable().lineCsaSquareMillimetres()))
          .append("/")
          .append(FormText.number(spec.cable().protectiveCsaSquareMillimetres()))
          .append(" mm²");
      if (spec.cable().lengthMetres() != null) {
        s.append(" ").append(FormText.number(spec.cable().lengthMetres())).append(" m");
      }
    }
    if (spec.ringFinal()) {
      s.append(" · ring");
    }
    return s.toString();
  }

  // --- observations ---

  /** Proposals from failing values and from the board's existing findings, in that order. */
  private List<ObservationEntry> proposals(
      Board board, List<SheetRow> rows, List<GradedValue> boardValues) {
    List<ObservationEntry> out = new ArrayList<>();
    for (GradedValue v : boardValues) {
      if (v.failed()) {
        out.add(proposal(Urgency.proposedFor(v.kind()), null, null, v.message()));
      }
    }
    Map<Long, String> labels = new LinkedHashMap<>();
    for (SheetRow row : rows) {
      labels.put(row.circuitId(), row.wayLabel());
      for (GradedValue v : row.graded()) {
        if (v.failed()) {
          out.add(
              proposal(
                  Urgency.proposedFor(v.kind()),
                  row.circuitId(),
                  row.wayLabel(),
                  row.description() + ": " + v.message()));
        }
      }
    }
    var results = analysis.ofBoard(board.getId());
    results
        .boardFindings(board.getId())
        .ifPresent(
            findings -> {
              for (Finding f : findings.findings()) {
                Urgency u = fromFinding(f.verdict());
                if (u != null) {
                  out.add(proposal(u, null, null, f.summary()));
                }
              }
              for (var circuit : findings.circuits()) {
                for (Finding f : circuit.findings()) {
                  Urgency u = fromFinding(f.verdict());
                  if (u != null && labels.containsKey(circuit.circuitId())) {
                    out.add(
                        proposal(
                            u,
                            circuit.circuitId(),
                            labels.get(circuit.circuitId()),
                            "schedule check: " + f.summary()));
                  }
                }
              }
            });
    return out;
  }

  /**
   * Danger findings of the schedule checks are proposed as urgent, warnings as advisory; advice and
   * passes are not proposed.
   */
  static Urgency fromFinding(Verdict verdict) {
    return switch (verdict) {
      case DANGER -> Urgency.URGENT;
      case WARNING -> Urgency.ADVISORY;
      default -> null;
    };
  }

  private static ObservationEntry proposal(
      Urgency urgency, Long circuitId, String wayLabel, String text) {
    String t = text.length() > TEXT_MAX ? text.substring(0, TEXT_MAX) : text;
    return new ObservationEntry("keep", urgency.name(), t, circuitId, wayLabel, urgency.name(), t);
  }

  /**
   * The inspector's lines kept as typed; proposals already shown keep the inspector's decision and
   * edits while they are still proposed; new proposals are added, kept by default.
   */
  static List<ObservationEntry> merge(
      List<ObservationEntry> typed, List<ObservationEntry> proposals) {
    Map<String, ObservationEntry> proposedNow = new LinkedHashMap<>();
    proposals.forEach(p -> proposedNow.putIfAbsent(key(p), p));
    List<ObservationEntry> out = new ArrayList<>();
    Set<String> seen = new LinkedHashSet<>();
    for (ObservationEntry e : typed) {
      if (e.isProposal()) {
        if (proposedNow.containsKey(key(e)) && seen.add(key(e))) {
          out.add(e);
        }
      } else if (e.text() != null && !e.text().isBlank()) {
        out.add(e);
      }
    }
    for (ObservationEntry p : proposedNow.values()) {
      if (seen.add(key(p))) {
        out.add(p);
      }
    }
    return out;
  }

  private static String key(ObservationEntry e) {
    return e.circuitId() + "|" + e.proposedText();
  }

  static Urgency parseUrgency(String name) {
    if (name == null) {
      return null;
    }
    try {
      return Urgency.valueOf(name);
    } catch (IllegalArgumentException e) {
      return null;
    }
  }

  // --- storing ---

  private InspectionRecord toRecord(Board board, InspectionForm form, InspectionSheet sheet) {
    Map<String, String> ignored = new LinkedHashMap<>();
    Readings readings = new Readings(ignored);
    List<ResultRow> results = new ArrayList<>();
    Map<Long, CircuitSpec> specs = new LinkedHashMap<>();
    for (Circuit c : inUse(board)) {
      specs.put(c.getId(), ScheduleMapper.snapshotOf(c, null));
    }
    for (SheetRow row : sheet.rows()) {
      CircuitResults r = FormText.results(readings, "", row.entry());
      if (r.anyEntered()) {
        results.add(
            new ResultRow(
                row.circuitId(), row.wayLabel(), row.description(), specs.get(row.circuitId()), r));
      }
    }
    List<Observation> observations = new ArrayList<>();
    for (ObservationEntry e : sheet.observations()) {
      if (!e.isKept()) {
        continue;
      }
      ObservationOrigin origin =
          !e.isProposal()
              ? ObservationOrigin.INSPECTOR
              : e.text().strip().equals(e.proposedText().strip())
                      && Objects.equals(e.urgency(), e.proposedUrgency())
                  ? ObservationOrigin.PROPOSED
                  : ObservationOrigin.EDITED;
      observations.add(
          new Observation(
              e.circuitId(), e.wayLabel(), parseUrgency(e.urgency()), e.text().strip(), origin));
    }
    List<ChangeLogEntry> history = changeLog.boardHistory(board.getId());
    Long logEntry = history.isEmpty() ? null : history.get(history.size() - 1).id();
    Double celsius = readings.number("", form.testCelsius());
    return new InspectionRecord(
        0,
        board.getSite().getId(),
        board.getId(),
        board.getReference(),
        readings.date("", form.inspectedOn()),
        form.inspector().strip(),
        blankToNull(form.instruments()),
        celsius == null ? TestConditions.DEFAULT_TEST_CELSIUS : celsius,
        readings.number("", form.insulationTestVolts()),
        new BoardResults(
            readings.number("", form.ze()),
            readings.number("", form.pfc()),
            readings.number("", form.electrode()),
            readings.yesNo("", form.mainBonding())),
        sheet.outcome(),
        logEntry,
        form.correctsId(),
        blankToNull(form.notes()),
        currentUser(),
        Instant.now(),
        results,
        observations);
  }

  private static String blankToNull(String s) {
    return s == null || s.isBlank() ? null : s.strip();
  }

  static String currentUser() {
    Authentication who = SecurityContextHolder.getContext().getAuthentication();
    return who == null || who.getName() == null || !who.isAuthenticated()
        ? "system"
        : who.getName();
  }
}
