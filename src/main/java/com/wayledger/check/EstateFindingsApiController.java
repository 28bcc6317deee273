package com.wayledger.check;

import com.wayledger.board.AnalysisApiController;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.util.List;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** The estate-wide findings list over JSON: the same filter, order and pages as the page. */
@RestController
@Tag(name = "Demand and checks")
public class EstateFindingsApiController {

  private final EstateFindings findings;

  public EstateFindingsApiController(EstateFindings findings) {
    this.findings = findings;
  }

  /**
   * One page of findings across all sites, with the caution; each line links to its board and
   * circuit in the API.
   */
  public record FindingsPage(
      List<LineView> lines,
      int page,
      int size,
      long total,
      int pages,
      int sitesRead,
      String caution) {}

  /**
   * One finding with where it is: the board's findings in the API, and the circuit's checks page
   * (null when the finding is not about a board or a circuit).
   */
  public record LineView(
      long siteId,
      String siteName,
      Long boardId,
      String boardReference,
      Long circuitId,
      Integer wayNumber,
      String line,
      String circuit,
      String grade,
      String check,
      String summary,
      String reference,
      String remedy,
      String boardFindings,
      String circuitPage) {

    static LineView of(EstateFindings.Line l) {
      return new LineView(
          l.siteId(),
          l.siteName(),
          l.boardId(),
          l.boardReference(),
          l.circuitId(),
          l.wayNumber(),
          l.line(),
          l.circuit(),
          l.grade().name(),
          l.check(),
          l.summary(),
          l.reference(),
          l.remedy(),
          l.boardId() == null ? null : "/api/boards/" + l.boardId() + "/findings",
          l.circuitId() == null ? null : "/circuits/" + l.circuitId());
    }
  }

  @GetMapping("/api/findings")
  @Operation(
      summary = "Findings across every site, filtered by grade and site name, a page at a time",
      description =
          "Read from each site's kept analysis (computed once per change of that site). Without a"
              + " grade, every problem (DANGER, WARNING, ADVICE); worst first, then by site, board"
              + " and way.")
  public FindingsPage findings(
      @Parameter(description = "DANGER, WARNING, ADVICE or NOT_ASSESSED")
          @RequestParam(name = "grade", required = false)
          String grade,
      @Parameter(description = "text the site's name contains, ignoring case")
          @RequestParam(name = "site", required = false, defaultValue = "")
          String site,
      @RequestParam(name = "page", required = false, defaultValue = "0") int page,
      @Parameter(description = "lines per page, 1 to 200")
          @RequestParam(name = "size", required = false, defaultValue = "50")
          int size) {
    EstateFindings.Page found =
        findings.page(
            EstateFindingsController.grade(grade),
            site.length() > 120 ? site.substring(0, 120) : site,
            Math.max(0, page),
            size);
    return new FindingsPage(
        found.lines().stream().map(LineView::of).toList(),
        found.number(),
        found.size(),
        found.total(),
        found.pages(),
        found.sitesRead(),
        AnalysisApiController.CAUTION);
  }
}
