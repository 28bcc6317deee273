package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class FewestMovesTests {

  private final PhaseBalancer balancer = new PhaseBalancer();

  static LongStream seeds() {
    return LongStream.rangeClosed(1, 60).map(i -> 104_729L * i + 3);
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void eachStepEqualsTheExhaustiveBestForThatManyMoves(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 1 + random.nextInt(11));
    ExhaustiveOracle.Answer oracle = ExhaustiveOracle.solve(problem);

    FewestMovesResult result = balancer.fewestMoves(problem);

    if (result.steps().isEmpty()) {
      return;
    }
    assertThat(result.optimumReached()).as("seed %d: reaches optimum", seed).isTrue();
    for (MovesStep step : result.steps()) {
      int k = step.moves();
      assertThat(step.proved()).as("seed %d, %d moves: proved", seed, k).isTrue();
      assertThat(step.largestAmps())
          .as("seed %d, %d moves: largest current", seed, k)
          .isCloseTo(oracle.bestMaxByMoves()[k] / 100.0, within(1e-9));
      assertThat(step.unbalancePercent())
          .as("seed %d, %d moves: unbalance", seed, k)
          .isCloseTo(
              oracle.total() == 0 ? 0.0 : 100.0 * oracle.bestDeviationByMoves()[k] / oracle.total(),
              within(1e-9));
      assertThat(step.plan()).as("seed %d, %d moves: plan length", seed, k).hasSize(k);
    }
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void stepsAreListedOnlyWhereAnotherMoveHelps(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 1 + random.nextInt(11));
    ExhaustiveOracle.Answer oracle = ExhaustiveOracle.solve(problem);

    FewestMovesResult result = balancer.fewestMoves(problem);

    if (result.steps().isEmpty()) {
      return;
    }
    List<Integer> listed = result.steps().stream().map(MovesStep::moves).toList();
    for (int k = 1; k < oracle.bestMaxByMoves().length; k++) {
      boolean improves =
          oracle.bestMaxByMoves()[k] < oracle.bestMaxByMoves()[k - 1]
              || (oracle.bestMaxByMoves()[k] == oracle.bestMaxByMoves()[k - 1]
                  && oracle.bestDeviationByMoves()[k] < oracle.bestDeviationByMoves()[k - 1]);
      assertThat(listed.contains(k))
          .as("seed %d: step %d listed iff it improves", seed, k)
          .isEqualTo(improves);
    }
  }

  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void fewestMovesToTheLimitEqualsExhaustiveSearch(long seed) {
    Random random = new Random(seed);
    BalanceProblem problem = RandomBoards.board(random, 1 + random.nextInt(11));
    ExhaustiveOracle.Answer oracle = ExhaustiveOracle.solve(problem);

    FewestMovesResult result = balancer.fewestMoves(problem);

    if (result.steps().isEmpty()) {
      return;
    }
    if (oracle.fewestMovesToLimit() == null) {
      assertThat(result.limitVerdict()).as("seed %d", seed).isEqualTo(LimitVerdict.NOT_REACHABLE);
    } else {
      assertThat(result.movesToReachLimit())
          .as("seed %d: moves to limit", seed)
          .isEqualTo(oracle.fewestMovesToLimit());
      assertThat(result.limitVerdict())
          .as("seed %d", seed)
          .isEqualTo(
              oracle.fewestMovesToLimit() == 0
                  ? LimitVerdict.ALREADY_WITHIN
                  : LimitVerdict.REACHED);
      assertThat(result.limitPlan())
          .as("seed %d: limit plan", seed)
          .hasSize(oracle.fewestMovesToLimit());
    }
  }

  @Test
  void threeEqualCircuitsOnOneLineNeedTwoMovesToBalance() {
    // By hand: 10 A, 10 A, 10 A all on L1 gives 30/0/0 A. One move: 20/10/0 A. Two moves: 10/10/10
    // A,
    // the optimum and within any limit.
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "Oven", 10.0, Phase.L1, 1, true),
            new BalanceItem(2, "Fryer", 10.0, Phase.L1, 2, true),
            new BalanceItem(3, "Grill", 10.0, Phase.L1, 3, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    FewestMovesResult result = balancer.fewestMoves(problem);

    assertThat(result.steps()).extracting(MovesStep::moves).containsExactly(0, 1, 2);
    assertThat(result.steps()).extracting(MovesStep::largestAmps).containsExactly(30.0, 20.0, 10.0);
    assertThat(result.movesToReachLimit()).isEqualTo(2);
    assertThat(result.outcome()).isEqualTo(BalanceOutcome.PROVED_OPTIMAL);
  }

  @Test
  void limitOutOfReachIsSaidPlainly() {
    // By hand: one 10 A circuit alone can never be within 10 % of the mean (3.33 A per line).
    List<BalanceItem> items = List.of(new BalanceItem(1, "Kettle", 10.0, Phase.L1, 1, true));
    BalanceProblem problem = new BalanceProblem(items, Map.of(), null, null, 10.0, true);

    FewestMovesResult result = balancer.fewestMoves(problem);

    assertThat(result.limitVerdict()).isEqualTo(LimitVerdict.NOT_REACHABLE);
  }
}
