package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class BadInputTests {

  private final PhaseBalancer balancer = new PhaseBalancer();

  @Test
  void moreCircuitsThanPositionsIsRefusedWithCounts() {
    List<BalanceItem> items = new ArrayList<>();
    for (int i = 0; i < 7; i++) {
      items.add(new BalanceItem(i, "c" + i, 5.0, Phase.L1, i + 1, true));
    }
    BalanceProblem problem =
        new BalanceProblem(
            items, Map.of(), Map.of(Phase.L1, 2, Phase.L2, 2, Phase.L3, 2), null, 10.0, true);

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.outcome()).isEqualTo(BalanceOutcome.TOO_MANY_CIRCUITS);
    assertThat(result.message()).contains("7 movable", "only 6 positions");
  }

  @Test
  void allCircuitsLockedReportsTheCurrentsAsTheyAre() {
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "a", 10.0, Phase.L1, 1, false),
            new BalanceItem(2, "b", 4.0, Phase.L2, 1, false));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.outcome()).isEqualTo(BalanceOutcome.NOTHING_TO_MOVE);
    assertThat(result.after()).isEqualTo(new PhaseCurrents(10.0, 4.0, 0.0));
    assertThat(result.moves()).isEmpty();
  }

  @Test
  void singlePhaseBoardHasNothingToBalance() {
    List<BalanceItem> items = List.of(new BalanceItem(1, "a", 10.0, Phase.L1, 1, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, false);

    assertThat(balancer.optimise(problem).outcome()).isEqualTo(BalanceOutcome.NOT_THREE_PHASE);
    assertThat(balancer.fewestMoves(problem).outcome()).isEqualTo(BalanceOutcome.NOT_THREE_PHASE);
  }

  @Test
  void missingDemandIsNotAssessedAndNamesTheCircuit() {
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "Walk-in freezer", null, Phase.L1, 1, true),
            new BalanceItem(2, "b", 3.0, Phase.L2, 1, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.outcome()).isEqualTo(BalanceOutcome.NOT_ASSESSED);
    assertThat(result.message()).contains("'Walk-in freezer'");
  }

  @Test
  void negativeDemandIsInvalid() {
    List<BalanceItem> items = List.of(new BalanceItem(1, "a", -2.0, Phase.L1, 1, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    assertThat(balancer.optimise(problem).outcome()).isEqualTo(BalanceOutcome.INVALID_INPUT);
  }

  @Test
  void duplicateCircuitIdIsInvalid() {
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "a", 2.0, Phase.L1, 1, true),
            new BalanceItem(1, "b", 3.0, Phase.L2, 1, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    assertThat(balancer.optimise(problem).outcome()).isEqualTo(BalanceOutcome.INVALID_INPUT);
  }

  @Test
  void lockedCircuitWithoutAPhaseIsNotAssessed() {
    List<BalanceItem> items = List.of(new BalanceItem(1, "Lift", 9.0, null, null, false));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    assertThat(balancer.optimise(problem).outcome()).isEqualTo(BalanceOutcome.NOT_ASSESSED);
  }

  @Test
  void fewestMovesNeedsEveryCircuitPlaced() {
    List<BalanceItem> items = List.of(new BalanceItem(1, "a", 9.0, null, null, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    assertThat(balancer.fewestMoves(problem).outcome()).isEqualTo(BalanceOutcome.NOT_ASSESSED);
  }

  @Test
  void missingUnbalanceLimitLeavesOnlyTheLimitAnswerNotAssessed() {
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "a", 9.0, Phase.L1, 1, true),
            new BalanceItem(2, "b", 9.0, Phase.L1, 2, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, null, true);

    FewestMovesResult result = balancer.fewestMoves(problem);

    assertThat(result.limitVerdict()).isEqualTo(LimitVerdict.NOT_ASSESSED);
    assertThat(result.steps()).extracting(MovesStep::largestAmps).containsExactly(18.0, 9.0);
  }

  @Test
  void missingPositionLimitsAreStatedInTheMessage() {
    BalanceProblem problem = OptimalBalanceTests.unplaced(4, 4, 4);

    assertThat(balancer.optimise(problem).message()).contains("Positions on L1 not given");
  }

  @Test
  void nullProblemIsNotAssessed() {
    assertThat(balancer.optimise(null).outcome()).isEqualTo(BalanceOutcome.NOT_ASSESSED);
  }
}
