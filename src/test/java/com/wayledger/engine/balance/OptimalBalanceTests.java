package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class OptimalBalanceTests {

  private final PhaseBalancer balancer = new PhaseBalancer();

  static LongStream seeds() {
    return LongStream.rangeClosed(1, 60).map(i -> 7_919L * i + 17);
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void optimumEqualsExhaustiveSearchOnSmallRandomBoards(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 1 + random.nextInt(12));
    ExhaustiveOracle.Answer oracle = ExhaustiveOracle.solve(problem);

    BalanceResult result = balancer.optimise(problem);

    if (!oracle.anyFeasible() || problem.items().stream().noneMatch(BalanceItem::movable)) {
      assertThat(result.outcome())
          .as("seed %d: outcome", seed)
          .isNotEqualTo(BalanceOutcome.PROVED_OPTIMAL);
      return;
    }
    assertThat(result.provedOptimal()).as("seed %d: proved", seed).isTrue();
    assertThat(result.after().largestAmps())
        .as("seed %d: largest phase current", seed)
        .isCloseTo(oracle.optimumMaxAmps(), within(1e-9));
    assertThat(result.unbalanceAfterPercent())
        .as("seed %d: unbalance", seed)
        .isCloseTo(oracle.optimumUnbalancePercent(), within(1e-9));
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void positionLimitsAndLockedCircuitsAreRespected(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 5 + random.nextInt(30));

    BalanceResult result = balancer.optimise(problem);

    if (result.after() == null) {
      return;
    }
    Map<Phase, Integer> movableOn = new EnumMap<>(Phase.class);
    for (BalanceItem item : problem.items()) {
      Phase assigned = result.assignment().get(item.circuitId());
      if (!item.movable()) {
        assertThat(assigned)
            .as("seed %d: locked circuit %d stays", seed, item.circuitId())
            .isEqualTo(item.currentPhase());
      } else {
        movableOn.merge(assigned, 1, Integer::sum);
      }
    }
    if (problem.freeWays() != null) {
      for (Phase phase : Phase.values()) {
        long now =
            problem.items().stream().filter(i -> i.movable() && i.currentPhase() == phase).count();
        long positions = now + problem.freeWays().get(phase).size();
        assertThat(movableOn.getOrDefault(phase, 0).longValue())
            .as("seed %d: circuits on %s within %d positions", seed, phase, positions)
            .isLessThanOrEqualTo(positions);
      }
    }
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void optimumIsNeverWorseThanTheBoardAsItIsOrLargestFirst(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 10 + random.nextInt(40));

    BalanceResult optimum = balancer.optimise(problem);
    BalanceResult greedy = balancer.largestFirst(problem);

    if (optimum.after() == null) {
      return;
    }
    assertThat(optimum.after().largestAmps())
        .as("seed %d: no worse than largest-first", seed)
        .isLessThanOrEqualTo(greedy.after().largestAmps());
    assertThat(optimum.after().largestAmps())
        .as("seed %d: no worse than the board as it is", seed)
        .isLessThanOrEqualTo(optimum.before().largestAmps());
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void totalDemandIsUnchangedByBalancing(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 10 + random.nextInt(40));

    BalanceResult result = balancer.optimise(problem);

    if (result.after() == null) {
      return;
    }
    assertThat(result.after().totalAmps())
        .as("seed %d: total", seed)
        .isCloseTo(result.before().totalAmps(), within(1e-6));
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void movePlanListsExactlyTheCircuitsWhoseLineChanged(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 10 + random.nextInt(40));

    BalanceResult result = balancer.optimise(problem);

    if (result.after() == null) {
      return;
    }
    List<Long> changed = new ArrayList<>();
    for (BalanceItem item : problem.items()) {
      if (result.assignment().get(item.circuitId()) != item.currentPhase()) {
        changed.add(item.circuitId());
      }
    }
    assertThat(result.moves())
        .extracting(CircuitMove::circuitId)
        .as("seed %d", seed)
        .containsExactlyInAnyOrderElementsOf(changed);
  }

  @Test
  void largestFirstMissesTheOptimumOnGrahamsExampleButTheSearchDoesNot() {
    // By hand: {5,5,4,4,3,3,3} A into three lines. Largest-first puts 5, 5, 4 on L1, L2, L3, then 4
    // on L3
    // (8), 3 on L1 (8), 3 on L2 (8) and the last 3 on a line at 8 A: 11 A. The optimum is {5,4}
    // {5,4}
    // {3,3,3} = 9/9/9 A. (The tight example for largest-first on three machines, Graham 1969, from
    // memory.)
    BalanceProblem problem = unplaced(5, 5, 4, 4, 3, 3, 3);

    BalanceResult greedy = balancer.largestFirst(problem);
    BalanceResult optimum = balancer.optimise(problem);

    assertThat(greedy.after().largestAmps()).isEqualTo(11.0);
    assertThat(optimum.after()).isEqualTo(new PhaseCurrents(9.0, 9.0, 9.0));
    assertThat(optimum.provedOptimal()).isTrue();
  }

  @Test
  void eightSevenSixFiveFourCannotReachTenOnEveryLine() {
    // By hand: {8,7,6,5,4} A, total 30 A, so 10 A per line would be perfect, but 8 A cannot share a
    // line
    // without exceeding 10 A (smallest partner 4 A gives 12 A); alone it leaves 22 A for two lines,
    // so the
    // largest line is at least 11 A, reached by {8} {7,4} {6,5} = 8/11/11 A.
    BalanceProblem problem = unplaced(8, 7, 6, 5, 4);

    BalanceResult optimum = balancer.optimise(problem);

    assertThat(optimum.after().largestAmps()).isEqualTo(11.0);
    assertThat(optimum.provedOptimal()).isTrue();
  }

  @Test
  void tightPositionsForceASmallCircuitOntoEachHeavyLine() {
    // By hand: {6,6,1,1,1,1} A with two positions per line. Without the limit {6} {6} {1,1,1,1}
    // gives 6 A;
    // with two circuits per line each 6 A circuit needs a partner, so the best is {6,1} {6,1}
    // {1,1}: 7 A.
    List<BalanceItem> items = new ArrayList<>();
    double[] amps = {6, 6, 1, 1, 1, 1};
    for (int i = 0; i < amps.length; i++) {
      items.add(new BalanceItem(i, "c" + i, amps[i], null, null, true));
    }
    Map<Phase, Integer> positions = Map.of(Phase.L1, 2, Phase.L2, 2, Phase.L3, 2);
    BalanceProblem problem = new BalanceProblem(items, Map.of(), positions, null, 10.0, true);

    BalanceResult optimum = balancer.optimise(problem);

    assertThat(optimum.after().largestAmps()).isEqualTo(7.0);
    assertThat(optimum.provedOptimal()).isTrue();
  }

  @Test
  void fixedThreePoleLoadIsCountedOnEveryLine() {
    // By hand: 10 A three-pole load on every line plus 12 A locked on L1; movable 12 A and 12 A go
    // to L2
    // and L3, giving 22/22/22 A.
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "Locked heater", 12.0, Phase.L1, 1, false),
            new BalanceItem(2, "Heater A", 12.0, Phase.L1, 2, true),
            new BalanceItem(3, "Heater B", 12.0, Phase.L1, 3, true));
    Map<Phase, Double> fixed = Map.of(Phase.L1, 10.0, Phase.L2, 10.0, Phase.L3, 10.0);
    BalanceProblem problem = new BalanceProblem(items, fixed, null, null, 10.0, true);

    BalanceResult optimum = balancer.optimise(problem);

    assertThat(optimum.after()).isEqualTo(new PhaseCurrents(22.0, 22.0, 22.0));
  }

  @Test
  void exhaustedBudgetReturnsBestFoundWithItsGapToTheLowerBound() {
    Random random = new Random(4242);
    BalanceProblem problem = RandomBoards.board(random, 40);
    PhaseBalancer hurried = new PhaseBalancer(new BalanceSettings(3, 1_000));

    BalanceResult result = hurried.optimise(problem);

    assertThat(result.provedOptimal()).isFalse();
    assertThat(result.outcome()).isEqualTo(BalanceOutcome.BEST_WITHIN_BUDGET);
    assertThat(result.after().largestAmps() - result.gapAmps())
        .isCloseTo(result.lowerBoundAmps(), within(1e-9));
  }

  static BalanceProblem unplaced(double... amps) {
    List<BalanceItem> items = new ArrayList<>();
    for (int i = 0; i < amps.length; i++) {
      items.add(new BalanceItem(i + 1, "Circuit " + (i + 1), amps[i], null, null, true));
    }
    return new BalanceProblem(items, Map.of(), null, null, 10.0, true);
  }
}
