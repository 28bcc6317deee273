package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A 120/240 V split-phase board has two lines, A (L1) and B (L2): the balancer's mean, unbalance,
 * target and moves are over those two, never over three with an empty third.
 */
class SplitPhaseBalanceTests {

  private final PhaseBalancer balancer = new PhaseBalancer();

  private static BalanceItem on(long id, double amps, Phase line, int space) {
    return new BalanceItem(id, "circuit " + id, amps, line, space, true);
  }

  /**
   * Line A: 20 + 15 + 10 A, line B: 5 A, and a 240 V load of 30 A on both lines (fixed). Hand
   * calculation: A = 30 + 45 = 75 A, B = 30 + 5 = 35 A; mean over two lines 55 A; unbalance = |75 −
   * 35| / (75 + 35) = 36.4 %. Moving the 20 A circuit to B gives 55 A and 55 A: unbalance 0 %, one
   * move.
   */
  private static BalanceProblem houseOfFourCircuits() {
    return new BalanceProblem(
        List.of(
            on(1, 20.0, Phase.L1, 1),
            on(2, 15.0, Phase.L1, 5),
            on(3, 10.0, Phase.L1, 9),
            on(4, 5.0, Phase.L2, 3)),
        Map.of(Phase.L1, 30.0, Phase.L2, 30.0),
        null,
        Map.of(Phase.L1, List.of(13, 17), Phase.L2, List.of(7, 11, 15)),
        10.0,
        true,
        2);
  }

  @Test
  void unbalanceAsItStandsIsTakenOverTwoLines() {
    FewestMovesResult result = balancer.fewestMoves(houseOfFourCircuits());

    // hand calculation above: |75 − 35| / 110 = 36.36 %
    assertThat(result.before().l1Amps()).as("line A now").isCloseTo(75.0, within(1e-9));
    assertThat(result.before().l2Amps()).as("line B now").isCloseTo(35.0, within(1e-9));
    assertThat(result.before().unbalancePercent())
        .as("unbalance over two lines")
        .isCloseTo(100.0 * 40.0 / 110.0, within(1e-9));
  }

  @Test
  void oneMoveBringsBothLinesToTheirMeanAndWithinTheLimit() {
    FewestMovesResult result = balancer.fewestMoves(houseOfFourCircuits());

    MovesStep last = result.steps().get(result.steps().size() - 1);
    assertThat(last.moves()).as("moves to the optimum").isEqualTo(1);
    assertThat(last.largestAmps()).as("largest line after").isCloseTo(55.0, within(1e-9));
    assertThat(last.unbalancePercent()).as("unbalance after").isCloseTo(0.0, within(1e-9));
    assertThat(last.plan())
        .singleElement()
        .satisfies(
            move -> {
              assertThat(move.circuitId()).as("the 20 A circuit moves").isEqualTo(1L);
              assertThat(move.toPhase()).as("to line B").isEqualTo(Phase.L2);
              assertThat(move.toWay()).as("to B's first free space").isEqualTo(7);
            });
    assertThat(result.limitVerdict())
        .as("a 10 % limit over two lines is reachable")
        .isEqualTo(LimitVerdict.REACHED);
    assertThat(result.movesToReachLimit()).as("moves to the limit").isEqualTo(1);
  }

  @Test
  void theOptimalPlanNeverUsesAThirdLine() {
    BalanceResult result = balancer.optimise(houseOfFourCircuits());

    assertThat(result.after().l3Amps()).as("nothing on a third line").isZero();
    assertThat(result.after().largestAmps()).as("largest line").isCloseTo(55.0, within(1e-9));
    assertThat(result.unbalanceAfterPercent()).as("unbalance after").isCloseTo(0.0, within(1e-9));
    assertThat(result.assignment().values()).as("lines used").doesNotContain(Phase.L3);
  }

  @Test
  void aBoardWithinItsLimitOnTwoLinesIsAlreadyWithin() {
    // A 52 A, B 48 A: |52 − 48| / 100 = 4 % (hand calculation), within 10 %
    BalanceProblem problem =
        new BalanceProblem(
            List.of(on(1, 52.0, Phase.L1, 1), on(2, 48.0, Phase.L2, 3)),
            Map.of(),
            null,
            Map.of(Phase.L1, List.of(5), Phase.L2, List.of(7)),
            10.0,
            true,
            2);

    FewestMovesResult result = balancer.fewestMoves(problem);

    assertThat(result.limitVerdict()).isEqualTo(LimitVerdict.ALREADY_WITHIN);
    assertThat(result.before().unbalancePercent()).isCloseTo(4.0, within(1e-9));
  }

  @Test
  void aCircuitOnLineCOfATwoLineBoardIsRefused() {
    BalanceProblem problem =
        new BalanceProblem(
            List.of(on(1, 10.0, Phase.L3, 1)), Map.of(), null, Map.of(), 10.0, true, 2);

    assertThat(balancer.optimise(problem).outcome()).isEqualTo(BalanceOutcome.INVALID_INPUT);
  }

  static LongStream seeds() {
    return LongStream.rangeClosed(1, 40).map(i -> 7_919L * i + 11);
  }

  /**
   * For random two-line boards the optimum equals the best of every assignment of the movable
   * circuits to A or B within the free spaces (an independent exhaustive search in the test).
   */
  @ParameterizedTest(name = "seed {0}")
  @MethodSource("seeds")
  void theOptimumEqualsAnExhaustiveSearchOverTwoLines(long seed) {
    Random random = new Random(seed);
    int n = 1 + random.nextInt(10);
    List<BalanceItem> items = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      items.add(
          on(i + 1, random.nextInt(2_000) / 100.0, random.nextBoolean() ? Phase.L1 : Phase.L2, i));
    }
    int freeA = random.nextInt(4);
    int freeB = random.nextInt(4);
    double fixedA = random.nextInt(3_000) / 100.0;
    double fixedB = random.nextInt(3_000) / 100.0;
    BalanceProblem problem =
        new BalanceProblem(
            items,
            Map.of(Phase.L1, fixedA, Phase.L2, fixedB),
            null,
            Map.of(
                Phase.L1, freeSpaces(100, freeA),
                Phase.L2, freeSpaces(200, freeB)),
            10.0,
            true,
            2);
    long onA = items.stream().filter(item -> item.currentPhase() == Phase.L1).count();
    long capacityA = onA + freeA;
    long capacityB = (n - onA) + freeB;
    long best = Long.MAX_VALUE;
    for (int mask = 0; mask < (1 << n); mask++) {
      long a = Math.round(fixedA * 100);
      long b = Math.round(fixedB * 100);
      int countA = Integer.bitCount(mask);
      if (countA > capacityA || n - countA > capacityB) {
        continue;
      }
      for (int i = 0; i < n; i++) {
        long amps = Math.round(items.get(i).demandAmps() * 100);
        if ((mask & (1 << i)) != 0) {
          a += amps;
        } else {
          b += amps;
        }
      }
      best = Math.min(best, Math.max(a, b));
    }

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.after().largestAmps())
        .as("seed %d: largest line current", seed)
        .isCloseTo(best / 100.0, within(1e-9));
    assertThat(result.unbalanceAfterPercent())
        .as("seed %d: unbalance over two lines", seed)
        .isCloseTo(
            com.wayledger.engine.demand.PhaseCurrents.unbalancePercent(
                result.after().l1Amps(), result.after().l2Amps()),
            within(1e-9));
  }

  private static List<Integer> freeSpaces(int from, int count) {
    List<Integer> spaces = new ArrayList<>();
    for (int k = 0; k < count; k++) {
      spaces.add(from + k);
    }
    return spaces;
  }
}
