package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Random three-line panelboards with one- and two-pole breakers, some locked, some spaces free:
 * every plan the balancer gives (the optimal one, each fewest-moves row and the plan to the limit)
 * puts every breaker on free spaces of the panel matching its pole count and lines, and its
 * predicted line currents are the ones recomputed here from the spaces each breaker ends on.
 */
class TwoPolePropertyTests {

  private static final PanelSpaces[] PANELS = {
    new PanelSpaces(12, 3), new PanelSpaces(18, 3), new PanelSpaces(24, 3)
  };

  private record Board(PanelSpaces panel, BalanceProblem problem) {}

  private static Board board(Random random) {
    PanelSpaces panel = PANELS[random.nextInt(PANELS.length)];
    Set<Integer> taken = new HashSet<>();
    List<Integer> order = new ArrayList<>();
    for (int space = 1; space <= panel.spaceCount(); space++) {
      order.add(space);
    }
    Collections.shuffle(order, random);
    List<BalanceItem> items = new ArrayList<>();
    List<TwoPoleItem> twoPoles = new ArrayList<>();
    int breakers = 3 + random.nextInt(6);
    long id = 1;
    for (int space : order) {
      if (items.size() + twoPoles.size() >= breakers || taken.contains(space)) {
        continue;
      }
      boolean movable = random.nextInt(5) != 0;
      double amps = Math.round((0.5 + random.nextDouble() * 24.5) * 100) / 100.0;
      if (random.nextInt(3) == 0
          && panel.fitOf(space, 2) == PanelSpaces.Fit.FITS
          && !taken.contains(space + 2)) {
        taken.add(space);
        taken.add(space + 2);
        twoPoles.add(new TwoPoleItem(id, "two-pole " + id, amps, space, movable));
      } else {
        taken.add(space);
        items.add(new BalanceItem(id, "one-pole " + id, amps, panel.lineOf(space), space, movable));
      }
      id++;
    }
    // some spaces hold breakers the balancer is not told about (three-pole, spare): not free
    Map<Phase, List<Integer>> free = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      free.put(phase, new ArrayList<>());
    }
    for (int space = 1; space <= panel.spaceCount(); space++) {
      if (!taken.contains(space) && random.nextInt(4) != 0) {
        free.get(panel.lineOf(space)).add(space);
      }
    }
    Map<Phase, Double> fixed = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      fixed.put(phase, random.nextBoolean() ? Math.round(random.nextDouble() * 1500) / 100.0 : 0.0);
    }
    Map<Phase, Double> correction =
        random.nextBoolean()
            ? Map.of(Phase.L1, -Math.round(random.nextDouble() * 50) / 100.0)
            : null;
    return new Board(
        panel,
        new BalanceProblem(
            items,
            fixed,
            null,
            free,
            5.0 + random.nextInt(15),
            true,
            3,
            twoPoles,
            panel,
            correction));
  }

  private static void assertPlanMatches(Board board, List<CircuitMove> plan, PhaseCurrents after) {
    Map<Long, List<Integer>> spaces =
        PlanChecks.assertPlacedSafely(board.panel(), board.problem(), plan);
    if (after != null) {
      // recomputed here from the spaces each breaker ends on, not taken from the balancer
      assertThat(PlanChecks.centiamps(after))
          .as("line currents after %s", plan)
          .containsExactly(PlanChecks.loadsAfter(board.panel(), board.problem(), spaces));
    }
  }

  @ParameterizedTest
  @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20})
  void everyPlanPutsEveryBreakerOnFreeMatchingSpacesWithTheCurrentsItPredicts(long seed) {
    Random random = new Random(seed);
    for (int round = 0; round < 5; round++) {
      Board board = board(random);
      String context = "seed " + seed + " round " + round + ": " + board.problem();

      BalanceResult optimal = new PhaseBalancer().optimise(board.problem());
      assertThat(optimal.after()).as(context).isNotNull();
      assertPlanMatches(board, optimal.moves(), optimal.after());
      assertPlanMatches(board, List.of(), optimal.before());

      FewestMovesResult fewest = new PhaseBalancer().fewestMoves(board.problem());
      assertThat(fewest.steps()).as(context).isNotEmpty();
      for (MovesStep step : fewest.steps()) {
        assertThat(step.plan()).as(context).hasSize(step.moves());
        assertPlanMatches(board, step.plan(), step.after());
      }
      assertPlanMatches(board, fewest.limitPlan(), null);
      if (optimal.provedOptimal() && fewest.optimumReached()) {
        MovesStep last = fewest.steps().get(fewest.steps().size() - 1);
        assertThat(last.largestAmps()).as(context).isEqualTo(optimal.after().largestAmps());
      }
    }
  }

  @ParameterizedTest
  @ValueSource(longs = {21, 22, 23, 24, 25, 26, 27, 28, 29, 30})
  void lettingTwoPoleBreakersMoveNeverMakesTheOptimumWorse(long seed) {
    Random random = new Random(seed);
    for (int round = 0; round < 5; round++) {
      Board board = board(random);
      BalanceProblem problem = board.problem();
      List<TwoPoleItem> locked =
          problem.twoPoles().stream()
              .map(
                  t ->
                      new TwoPoleItem(
                          t.circuitId(), t.description(), t.lineAmps(), t.firstSpace(), false))
              .toList();
      BalanceProblem fixedTwoPoles =
          new BalanceProblem(
              problem.items(),
              problem.fixedLoadAmps(),
              null,
              problem.freeWays(),
              problem.unbalanceLimitPercent(),
              true,
              3,
              locked,
              board.panel(),
              problem.phasorCorrectionAmps());

      BalanceResult free = new PhaseBalancer().optimise(problem);
      BalanceResult held = new PhaseBalancer().optimise(fixedTwoPoles);

      if (free.provedOptimal() && held.provedOptimal()) {
        assertThat(free.after().largestAmps())
            .as("seed %d round %d", seed, round)
            .isLessThanOrEqualTo(held.after().largestAmps());
      }
    }
  }
}
