package com.wayledger.inspection;

import com.wayledger.engine.inspection.CircuitResults;
import com.wayledger.engine.inspection.GradedValue;
import com.wayledger.engine.inspection.Outcome;
import com.wayledger.engine.inspection.Urgency;
import com.wayledger.inspection.InspectionForm.ObservationEntry;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.net.URI;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springframework.context.MessageSource;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * Inspections over JSON. A record is created whole, with its results in bulk, and never changed:
 * there is no PUT, PATCH or DELETE. Grade first (nothing stored) to see every value graded and the
 * proposed observations, then create with the observations kept and the outcome confirmed.
 */
@RestController
@RequestMapping("/api")
@Tag(name = "Inspections", description = "Append-only test records of a board, graded")
public class InspectionApiController {

  private final InspectionService inspections;
  private final ComparisonService comparisons;
  private final MessageSource messages;

  public InspectionApiController(
      InspectionService inspections, ComparisonService comparisons, MessageSource messages) {
    this.inspections = inspections;
    this.comparisons = comparisons;
    this.messages = messages;
  }

  /** One circuit's measured values; null = not measured. Yes/no tests: true, false or null. */
  public record CircuitResultsIn(
      long circuitId,
      Double r1PlusR2Ohms,
      Double r2Ohms,
      Double ringLineOhms,
      Double ringNeutralOhms,
      Double ringProtectiveOhms,
      Double insulationLineLineMegaohms,
      Double insulationLineEarthMegaohms,
      Double insulationNeutralEarthMegaohms,
      Boolean polarityCorrect,
      Double loopImpedanceOhms,
      Double rcdRatedMillis,
      Double rcdFiveTimesMillis,
      Boolean rcdButtonWorks,
      Boolean rcdDelayed) {}

  /** An observation to keep: circuitId null for the board. */
  public record ObservationIn(Long circuitId, Urgency urgency, String text) {}

  /**
   * A whole inspection with its results in bulk.
   *
   * @param confirmedOutcome the outcome the observations lead to, as the inspector confirms it
   *     (required to create; ignored when grading)
   */
  public record InspectionIn(
      LocalDate inspectedOn,
      String inspector,
      String instruments,
      Double testCelsius,
      Double insulationTestVolts,
      Double externalLoopImpedanceOhms,
      Double prospectiveFaultKiloAmps,
      Double earthElectrodeOhms,
      Boolean mainBondingPresent,
      String notes,
      Long correctsId,
      Outcome confirmedOutcome,
      List<CircuitResultsIn> results,
      List<ObservationIn> observations) {}

  public record CircuitGrading(
      long circuitId, String wayLabel, String description, List<GradedValue> values) {}

  public record ProposedObservation(
      Long circuitId, String wayLabel, Urgency urgency, String text) {}

  public record Grading(
      List<GradedValue> board,
      List<CircuitGrading> circuits,
      List<ProposedObservation> proposedObservations,
      Outcome outcome) {}

  public record InspectionOut(
      long id,
      long boardId,
      String boardReference,
      LocalDate inspectedOn,
      String inspector,
      String instruments,
      double testCelsius,
      Outcome outcome,
      Long correctsId,
      String recordedBy,
      Instant recordedAt,
      List<Observation> observations,
      Grading grading) {}

  @GetMapping("/boards/{boardId}/inspections")
  @Operation(summary = "A board's inspections, newest first (without their results)")
  public List<InspectionOut> list(@PathVariable long boardId) {
    return inspections.ofBoard(boardId).stream().map(r -> out(r, null)).toList();
  }

  @GetMapping("/boards/{boardId}/inspections/{id}")
  @Operation(summary = "One inspection with every value graded")
  public InspectionOut get(@PathVariable long boardId, @PathVariable long id) {
    InspectionRecord record = inspections.get(boardId, id);
    return out(record, grading(inspections.graded(record), false));
  }

  @PostMapping("/boards/{boardId}/inspections/grade")
  @Operation(summary = "Grade results and propose observations without storing anything")
  public ResponseEntity<?> grade(
      @PathVariable long boardId, @RequestBody InspectionIn body, Locale locale) {
    InspectionSheet sheet = inspections.grade(boardId, form(body, List.of()));
    Map<String, String> errors = new java.util.LinkedHashMap<>(sheet.errors());
    if (!errors.isEmpty()) {
      return invalid(errors, locale);
    }
    return ResponseEntity.ok(grading(sheet, true));
  }

  @PostMapping("/boards/{boardId}/inspections")
  @Operation(
      summary = "Record an inspection with its results in bulk; it can never be changed after")
  public ResponseEntity<?> create(
      @PathVariable long boardId, @RequestBody InspectionIn body, Locale locale) {
    List<ObservationEntry> kept = new ArrayList<>();
    if (body.observations() != null) {
      for (ObservationIn o : body.observations()) {
        kept.add(
            new ObservationEntry(
                "keep",
                o.urgency() == null ? "" : o.urgency().name(),
                o.text() == null ? "" : o.text(),
                o.circuitId(),
                null,
                null,
                null));
      }
    }
    InspectionService.Recorded recorded = inspections.recordAsGiven(boardId, form(body, kept));
    if (recorded.id() == null) {
      return invalid(recorded.sheet().errors(), locale);
    }
    InspectionRecord record = inspections.get(boardId, recorded.id());
    return ResponseEntity.created(
            URI.create("/api/boards/" + boardId + "/inspections/" + recorded.id()))
        .body(out(record, grading(inspections.graded(record), false)));
  }

  @GetMapping("/boards/{boardId}/inspections/compare")
  @Operation(summary = "What changed between an inspection and a later one (or now)")
  public Comparison compare(
      @PathVariable long boardId,
      @RequestParam long from,
      @RequestParam(required = false) Long to) {
    return comparisons.compare(boardId, from, to);
  }

  private static InspectionForm form(InspectionIn in, List<ObservationEntry> observations) {
    List<ResultEntry> rows = new ArrayList<>();
    if (in.results() != null) {
      for (CircuitResultsIn r : in.results()) {
        if (r != null) {
          rows.add(
              FormText.entry(
                  r.circuitId(),
                  new CircuitResults(
                      r.r1PlusR2Ohms(),
                      r.r2Ohms(),
                      r.ringLineOhms(),
                      r.ringNeutralOhms(),
                      r.ringProtectiveOhms(),
                      r.insulationLineLineMegaohms(),
                      r.insulationLineEarthMegaohms(),
                      r.insulationNeutralEarthMegaohms(),
                      r.polarityCorrect(),
                      r.loopImpedanceOhms(),
                      r.rcdRatedMillis(),
                      r.rcdFiveTimesMillis(),
                      r.rcdButtonWorks(),
                      Boolean.TRUE.equals(r.rcdDelayed()))));
        }
      }
    }
    return new InspectionForm(
        in.inspectedOn() == null ? "" : in.inspectedOn().toString(),
        in.inspector(),
        in.instruments(),
        FormText.number(in.testCelsius()),
        FormText.number(in.insulationTestVolts()),
        FormText.number(in.externalLoopImpedanceOhms()),
        FormText.number(in.prospectiveFaultKiloAmps()),
        FormText.number(in.earthElectrodeOhms()),
        FormText.yesNo(in.mainBondingPresent()),
        in.notes(),
        in.correctsId(),
        in.confirmedOutcome() == null ? "" : in.confirmedOutcome().name(),
        rows,
        observations);
  }

  private static Grading grading(InspectionSheet sheet, boolean withProposals) {
    List<CircuitGrading> circuits =
        sheet.rows().stream()
            .map(r -> new CircuitGrading(r.circuitId(), r.wayLabel(), r.description(), r.graded()))
            .toList();
    List<ProposedObservation> proposals =
        withProposals
            ? sheet.observations().stream()
                .filter(ObservationEntry::isProposal)
                .map(
                    o ->
                        new ProposedObservation(
                            o.circuitId(),
                            o.wayLabel(),
                            Urgency.valueOf(o.proposedUrgency()),
                            o.proposedText()))
                .toList()
            : List.of();
    return new Grading(sheet.boardValues(), circuits, proposals, sheet.outcome());
  }

  private static InspectionOut out(InspectionRecord r, Grading grading) {
    return new InspectionOut(
        r.id(),
        r.boardId(),
        r.boardReference(),
        r.inspectedOn(),
        r.inspector(),
        r.instruments(),
        r.testCelsius(),
        r.outcome(),
        r.correctsId(),
        r.recordedBy(),
        r.recordedAt(),
        r.observations(),
        grading);
  }

  private ResponseEntity<ProblemDetail> invalid(Map<String, String> errors, Locale locale) {
    ProblemDetail problem =
        ProblemDetail.forStatusAndDetail(
            HttpStatus.UNPROCESSABLE_CONTENT,
            "Some values are not acceptable; nothing was stored.");
    problem.setType(URI.create("about:blank"));
    problem.setProperty(
        "fields",
        errors.entrySet().stream()
            .map(
                e ->
                    Map.of(
                        "field",
                        e.getKey(),
                        "message",
                        messages.getMessage(e.getValue(), null, e.getValue(), locale)))
            .toList());
    return ResponseEntity.unprocessableContent().body(problem);
  }
}
