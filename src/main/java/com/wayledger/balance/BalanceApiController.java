package com.wayledger.balance;

import com.wayledger.balance.BalancePlans.Basis;
import com.wayledger.engine.balance.BalanceProblem;
import com.wayledger.engine.balance.BalanceResult;
import com.wayledger.engine.balance.FewestMovesResult;
import com.wayledger.engine.balance.PhaseBalancer;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.ExampleObject;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.constraints.NotNull;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * Phase balancing over JSON: plans for a stored board, or a stateless solve of a described board.
 */
@RestController
@RequestMapping("/api")
@Tag(name = "Phase balancing", description = "Proved-optimal and fewest-moves phase assignments")
public class BalanceApiController {

  private final BalanceService balancing;

  public BalanceApiController(BalanceService balancing) {
    this.balancing = balancing;
  }

  /**
   * Both plans of one problem.
   *
   * @param movesInWords the optimal plan's moves in the board's own words ("move circuit 'Dryer'
   *     from space 4 B to space 7 A" on a panelboard, "… from way 4 L2 to way 7 L1" on a board of
   *     ways), the same words the balancing page shows
   */
  public record Plans(
      BalanceResult optimal,
      FewestMovesResult fewestMoves,
      String caution,
      java.util.List<String> movesInWords) {}

  @GetMapping("/boards/{id}/balance")
  @Operation(summary = "Balancing plans for a stored board (nothing is changed)")
  public Plans plans(@PathVariable long id, @RequestParam(defaultValue = "DEMAND") Basis basis) {
    BalancePlans plans = balancing.plans(id, basis, null);
    return new Plans(
        plans.optimal(),
        plans.fewestMoves(),
        com.wayledger.board.AnalysisApiController.CAUTION,
        plans.inWords(plans.optimal().moves()));
  }

  @PostMapping("/balance")
  @Operation(
      summary = "Balance a board described in the request; nothing is stored",
      requestBody =
          @io.swagger.v3.oas.annotations.parameters.RequestBody(
              content =
                  @Content(
                      examples =
                          @ExampleObject(
                              name = "five circuits all on L1",
                              value =
                                  """
                                  {"items": [
                                    {"circuitId": 1, "description": "Oven", "demandAmps": 13.0, "currentPhase": "L1", "currentWay": 1, "movable": true},
                                    {"circuitId": 2, "description": "Kettle", "demandAmps": 10.0, "currentPhase": "L1", "currentWay": 2, "movable": true},
                                    {"circuitId": 3, "description": "Heater", "demandAmps": 9.0, "currentPhase": "L1", "currentWay": 3, "movable": true},
                                    {"circuitId": 4, "description": "Lights", "demandAmps": 2.0, "currentPhase": "L1", "currentWay": 4, "movable": false},
                                    {"circuitId": 5, "description": "Sockets", "demandAmps": 8.0, "currentPhase": "L1", "currentWay": 5, "movable": true}],
                                   "fixedLoadAmps": {"L1": 0, "L2": 5, "L3": 5},
                                   "freeWays": {"L1": [6], "L2": [1, 2, 3, 4, 5, 6], "L3": [1, 2, 3, 4, 5, 6]},
                                   "unbalanceLimitPercent": 10, "threePhase": true}
                                  """))))
  public Plans solve(@RequestBody @NotNull BalanceProblem problem) {
    PhaseBalancer balancer = new PhaseBalancer();
    BalanceResult optimal = balancer.optimise(problem);
    return new Plans(
        optimal,
        balancer.fewestMoves(problem),
        com.wayledger.board.AnalysisApiController.CAUTION,
        optimal.moves() == null
            ? java.util.List.of()
            : optimal.moves().stream().map(m -> m.inWords()).toList());
  }
}
