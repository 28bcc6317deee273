package com.wayledger.board;

import com.wayledger.engine.dwelling.Worksheet;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/** A board's NEC dwelling inputs, recorded maximum demands and Article 220 worksheets over JSON. */
@RestController
@RequestMapping("/api")
@Tag(name = "Dwellings", description = "NEC Article 220 dwelling inputs and load calculations")
public class DwellingApiController {

  private final DwellingService dwellings;
  private final AnalysisService analysis;

  public DwellingApiController(DwellingService dwellings, AnalysisService analysis) {
    this.dwellings = dwellings;
    this.analysis = analysis;
  }

  /**
   * A board's dwelling inputs (floor area in ft²) and its worksheets.
   *
   * @param inputs the stored inputs; null when the board is not a dwelling unit
   * @param worksheets standard method, neutral, optional, addition and recorded-demand worksheets
   * @param caution the short caution every result carries
   */
  public record DwellingView(DwellingForm inputs, List<Worksheet> worksheets, String caution) {}

  public static final String CAUTION =
      "Figures assist a competent person; local wiring regulations and the current edition of the"
          + " relevant standard govern; electrical work must be designed, done and certified by"
          + " qualified people.";

  @GetMapping("/boards/{id}/dwelling")
  @Operation(summary = "A board's NEC dwelling inputs and Article 220 worksheets")
  public DwellingView get(@PathVariable long id) {
    DwellingRecord record = dwellings.find(id).orElse(null);
    return new DwellingView(
        record == null ? null : DwellingForm.of(record),
        analysis.ofBoard(id).dwellingWorksheets(id),
        CAUTION);
  }

  @PutMapping("/boards/{id}/dwelling")
  @Operation(
      summary = "Store a board's dwelling inputs",
      description =
          "floorArea in areaUnit (FT2 or M2; stored in ft²). With version, a stale edit is"
              + " refused with 409.")
  public DwellingView put(@PathVariable long id, @Valid @RequestBody DwellingForm form) {
    dwellings.save(id, form);
    return get(id);
  }

  /** One recorded maximum demand. */
  public record MeasuredView(
      long id,
      String periodStart,
      String periodEnd,
      String peakOn,
      double maximumDemand,
      MeasuredDemand.Unit unit,
      Integer intervalMinutes,
      String note,
      String recordedBy,
      String recordedAt) {

    static MeasuredView of(MeasuredDemand m) {
      return new MeasuredView(
          m.getId(),
          m.getPeriodStart().toString(),
          m.getPeriodEnd().toString(),
          m.getPeakOn() == null ? null : m.getPeakOn().toString(),
          m.getMaximumDemand(),
          m.getUnit(),
          m.getIntervalMinutes(),
          m.getNote(),
          m.getUsername(),
          m.getRecordedAt() == null ? null : m.getRecordedAt().toString());
    }
  }

  @GetMapping("/boards/{id}/measured-demands")
  @Operation(summary = "Maximum demands recorded for a board (NEC 220.87), newest period first")
  public List<MeasuredView> measured(@PathVariable long id) {
    return dwellings.measuredFor(id).stream().map(MeasuredView::of).toList();
  }

  @PostMapping("/boards/{id}/measured-demands")
  @ResponseStatus(HttpStatus.CREATED)
  @Operation(summary = "Record a maximum demand for a board (append-only)")
  public MeasuredView record(@PathVariable long id, @Valid @RequestBody MeasuredDemandForm form) {
    return MeasuredView.of(dwellings.record(id, form));
  }
}
