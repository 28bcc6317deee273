package com.wayledger.board;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.system.NotFoundException;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.ExampleObject;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * Demand and findings over JSON. Results are computed on every request from the stored schedule;
 * the stateless endpoint computes a board description sent in the request and stores nothing.
 */
@RestController
@RequestMapping("/api")
@Tag(
    name = "Demand and checks",
    description = "Demand after diversity, per-line currents and protection findings")
public class AnalysisApiController {

  /** The caution that travels with every computed result. */
  public static final String CAUTION =
      "Figures assist a competent person; local wiring regulations and the current edition of the relevant"
          + " standard govern; electrical work must be designed, done and certified by qualified people.";

  private final AnalysisService analysis;

  public AnalysisApiController(AnalysisService analysis) {
    this.analysis = analysis;
  }

  /** A computed result with the caution beside it. */
  public record Result<T>(T result, String caution) {
    static <T> Result<T> of(T result) {
      return new Result<>(result, CAUTION);
    }
  }

  /** A board described in full, with the supply it hangs from, for the stateless calculation. */
  /**
   * A board to compute. {@code dwelling} carries the NEC dwelling inputs (floor area ft², small-
   * appliance and laundry circuits) read by the NEC dwelling diversity methods; without it their
   * general lighting group is "not assessed, taken at 100 %" as on a stored board without inputs.
   */
  public record BoardRequest(
      @NotNull SupplySpec supply,
      @NotNull BoardSpec board,
      String siteDefaultMethodKey,
      @Valid DwellingRequest dwelling) {}

  /** NEC dwelling inputs of a what-if board; each may be left out (not assessed). */
  public record DwellingRequest(
      @jakarta.validation.constraints.Positive
          @jakarta.validation.constraints.DecimalMax("10000000")
          Double floorAreaSquareFeet,
      @jakarta.validation.constraints.Min(0) @jakarta.validation.constraints.Max(1000)
          Integer smallApplianceCircuits,
      @jakarta.validation.constraints.Min(0) @jakarta.validation.constraints.Max(1000)
          Integer laundryCircuits) {

    com.wayledger.engine.demand.DwellingParameters parameters() {
      return new com.wayledger.engine.demand.DwellingParameters(
          floorAreaSquareFeet, smallApplianceCircuits, laundryCircuits);
    }
  }

  @GetMapping("/sites/{id}/demand")
  @Operation(summary = "Demand on every board of a stored site")
  public Result<SiteDemand> siteDemand(@PathVariable long id) {
    return Result.of(analysis.ofSite(id).demand());
  }

  @GetMapping("/boards/{id}/demand")
  @Operation(
      summary = "Demand on a stored board: per circuit, per line, neutral, unbalance, loading")
  public Result<BoardDemand> boardDemand(@PathVariable long id) {
    BoardDemand demand = analysis.ofBoard(id).boardDemand(id);
    if (demand == null) {
      throw new NotFoundException("Board", id);
    }
    return Result.of(demand);
  }

  @GetMapping("/sites/{id}/findings")
  @Operation(summary = "Protection and cable findings for every board and circuit of a stored site")
  public Result<SiteFindings> siteFindings(@PathVariable long id) {
    return Result.of(analysis.ofSite(id).findings());
  }

  @GetMapping("/boards/{id}/findings")
  @Operation(summary = "Protection and cable findings of a stored board and its circuits")
  public Result<BoardFindings> boardFindings(@PathVariable long id) {
    return Result.of(
        analysis
            .ofBoard(id)
            .boardFindings(id)
            .orElseThrow(() -> new NotFoundException("Board", id)));
  }

  @PostMapping("/demand")
  @Operation(
      summary = "Compute the demand of a board described in the request; nothing is stored",
      requestBody =
          @io.swagger.v3.oas.annotations.parameters.RequestBody(
              content =
                  @Content(
                      examples =
                          @ExampleObject(
                              name = "small three-phase board",
                              value =
                                  """
                                  {"supply": {"earthingSystem": "TN_C_S", "nominalVoltageToEarthVolts": 230, "phases": 3,
                                    "frequencyHertz": 50, "externalLoopImpedanceOhms": 0.35,
                                    "prospectiveFaultCurrentKiloAmps": 6, "supplyFuseRatingAmps": 100},
                                   "siteDefaultMethodKey": "uk-small-shop",
                                   "board": {"id": 1, "reference": "DB1", "phases": 3, "wayCount": 4, "busbarRatingAmps": 100,
                                    "incomer": {"kind": "MCCB", "ratedCurrentAmps": 63, "poles": 3, "breakingCapacityKiloAmps": 10},
                                    "unbalanceLimitPercent": 10, "coincidenceFactor": 1,
                                    "circuits": [
                                     {"id": 11, "wayNumber": 1, "position": "THREE_POLE", "description": "Oven", "status": "IN_USE",
                                      "lockedForBalancing": false, "ringFinal": false,
                                      "device": {"kind": "MCB", "curve": "C", "ratedCurrentAmps": 32, "poles": 3, "breakingCapacityKiloAmps": 10},
                                      "loads": [{"description": "Oven", "category": "COOKING", "quantity": 1, "ratingValue": 15000,
                                                 "ratingUnit": "W", "powerFactor": 1, "continuous": false}]},
                                     {"id": 12, "wayNumber": 2, "position": "L1", "description": "Sockets", "status": "IN_USE",
                                      "lockedForBalancing": false, "ringFinal": false,
                                      "device": {"kind": "RCBO", "curve": "B", "ratedCurrentAmps": 32, "poles": 1,
                                                 "breakingCapacityKiloAmps": 6, "residualCurrentMilliAmps": 30, "rcdType": "A"},
                                      "loads": [{"description": "Sockets", "category": "SOCKET_OUTLETS", "quantity": 1,
                                                 "ratingValue": 3000, "ratingUnit": "W", "powerFactor": 0.95, "continuous": false}]}]}}
                                  """))))
  public Result<BoardDemand> computeDemand(
      @Valid @org.springframework.web.bind.annotation.RequestBody BoardRequest request) {
    return Result.of(
        DemandEngine.evaluateBoard(
            request.board(),
            request.supply(),
            analysis.methods(),
            request.siteDefaultMethodKey(),
            com.wayledger.engine.demand.DemandSettings.DEFAULTS,
            request.dwelling() == null
                ? com.wayledger.engine.demand.DwellingParameters.UNKNOWN
                : request.dwelling().parameters()));
  }
}
