package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * Two-pole, line-to-line breakers on a three-line panelboard move to a free pair of vertically
 * adjacent spaces on another pair of lines. Space numbering (common practice, as in {@link
 * PanelSpaces}): odd left, even right, rows cycling A, B, C, so on a 12-space panel spaces 1, 2 are
 * A, 3, 4 B, 5, 6 C, 7, 8 A, 9, 10 B, 11, 12 C, and a two-pole breaker at space n takes n and n +
 * 2.
 */
class TwoPoleMoveTests {

  private static final PanelSpaces PANEL = new PanelSpaces(12, 3);

  /** The panel's free spaces by line: every space not in {@code taken}. */
  private static Map<Phase, List<Integer>> freeExcept(Set<Integer> taken) {
    Map<Phase, List<Integer>> free = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      free.put(phase, new ArrayList<>());
    }
    for (int space = 1; space <= PANEL.spaceCount(); space++) {
      if (!taken.contains(space)) {
        free.get(PANEL.lineOf(space)).add(space);
      }
    }
    return free;
  }

  private static Map<Phase, List<Integer>> freeOnly(Integer... spaces) {
    Set<Integer> taken = new TreeSet<>();
    for (int space = 1; space <= PANEL.spaceCount(); space++) {
      taken.add(space);
    }
    taken.removeAll(List.of(spaces));
    return freeExcept(taken);
  }

  private static BalanceProblem problem(
      List<BalanceItem> items, List<TwoPoleItem> twoPoles, Map<Phase, List<Integer>> free) {
    return new BalanceProblem(items, Map.of(), null, free, 10.0, true, 3, twoPoles, PANEL, null);
  }

  /**
   * A 20 A-per-line two-pole load on A–B (spaces 1, 3) and a locked 20 A one-pole load on A (space
   * 2): A 40, B 20, C 0 A. On B–C it gives 20, 20, 20 A; on C–A 40, 0, 20 A (by hand). So the only
   * balanced arrangement moves the two-pole breaker to B–C, the lowest free B–C pair being spaces 4
   * and 6.
   */
  private static BalanceProblem onlyTheTwoPoleCanBalance(boolean twoPoleMovable) {
    return problem(
        List.of(new BalanceItem(1, "Locked lights", 20.0, Phase.L1, 2, false)),
        List.of(new TwoPoleItem(2, "Water heater", 20.0, 1, twoPoleMovable)),
        freeExcept(Set.of(1, 2, 3)));
  }

  @Test
  void movingTheTwoPoleLoadFromAbToBcIsTheOnlyWayToBalance() {
    BalanceResult result = new PhaseBalancer().optimise(onlyTheTwoPoleCanBalance(true));

    // by hand: 20 A on each line once the water heater is on B–C
    assertThat(result.after()).isEqualTo(new PhaseCurrents(20.0, 20.0, 20.0));
    assertThat(result.before()).isEqualTo(new PhaseCurrents(40.0, 20.0, 0.0));
    assertThat(result.provedOptimal()).isTrue();
    assertThat(result.moves())
        .containsExactly(new CircuitMove(2, "Water heater", 20.0, Phase.L1, 1, Phase.L2, 4, 2));
    assertThat(result.moves().get(0).inWords())
        .isEqualTo(
            "move two-pole circuit 'Water heater' from spaces 1 and 3 L1–L2 to spaces 4 and 6"
                + " L2–L3");
    // in a 208Y/120 V panelboard's words its lines are A, B and C (common practice)
    assertThat(
            result
                .moves()
                .get(0)
                .inWords(
                    new com.wayledger.engine.PositionWords(
                        true, com.wayledger.engine.SupplySystem.WYE_208Y_120, true)))
        .isEqualTo(
            "move two-pole circuit 'Water heater' from spaces 1 and 3 A–B to spaces 4 and 6 B–C");
  }

  @Test
  void theFewestMovesListFindsTheTwoPoleMoveAsOneMove() {
    FewestMovesResult result = new PhaseBalancer().fewestMoves(onlyTheTwoPoleCanBalance(true));

    assertThat(result.steps()).hasSize(2);
    MovesStep one = result.steps().get(1);
    assertThat(one.moves()).isEqualTo(1);
    assertThat(one.after()).isEqualTo(new PhaseCurrents(20.0, 20.0, 20.0));
    assertThat(one.proved()).isTrue();
    assertThat(result.optimumReached()).isTrue();
    // 0 % unbalance after one move, within the 10 % limit
    assertThat(result.limitVerdict()).isEqualTo(LimitVerdict.REACHED);
    assertThat(result.movesToReachLimit()).isEqualTo(1);
    assertThat(result.limitPlan()).extracting(CircuitMove::toWay).containsExactly(4);
  }

  @Test
  void aLockedTwoPoleBreakerNeverMoves() {
    BalanceResult result = new PhaseBalancer().optimise(onlyTheTwoPoleCanBalance(false));

    assertThat(result.moves()).isEmpty();
    assertThat(result.after()).isEqualTo(new PhaseCurrents(40.0, 20.0, 0.0));
    FewestMovesResult fewest = new PhaseBalancer().fewestMoves(onlyTheTwoPoleCanBalance(false));
    assertThat(fewest.steps()).allSatisfy(step -> assertThat(step.plan()).isEmpty());
  }

  @Test
  void aTwoPoleBreakerIsNeverSplitAcrossSpacesThatAreNotAdjacent() {
    // free: 5 (C), 9 (B), 12 (C). B and C each have a free space, but no two free spaces are n and
    // n + 2, so the breaker has nowhere to go and the board stays as it is
    BalanceProblem problem =
        problem(
            List.of(new BalanceItem(1, "Locked lights", 20.0, Phase.L1, 2, false)),
            List.of(new TwoPoleItem(2, "Water heater", 20.0, 1, true)),
            freeOnly(5, 9, 12));

    BalanceResult result = new PhaseBalancer().optimise(problem);

    assertThat(result.moves()).isEmpty();
    assertThat(result.after()).isEqualTo(new PhaseCurrents(40.0, 20.0, 0.0));
  }

  @Test
  void aTwoPoleBreakerIsNeverPlacedOffTheEndOfThePanel() {
    // free: 11 (C) and 12 (C) only. A C–A pair would need space 13, past the panel's 12 spaces
    BalanceProblem problem =
        problem(
            List.of(new BalanceItem(1, "Locked lights", 20.0, Phase.L2, 4, false)),
            List.of(new TwoPoleItem(2, "Water heater", 20.0, 1, true)),
            freeOnly(11, 12));

    BalanceResult result = new PhaseBalancer().optimise(problem);

    assertThat(result.moves()).isEmpty();
  }

  @Test
  void twoPoleAndOnePoleMovesShareOnePlanWithoutSharingASpace() {
    // A–B two-pole 10 A per line (1, 3); one-pole 10 A on A (2) and 10 A on B (4), both movable;
    // free 5 to 12. Every plan must keep each breaker on its own free spaces
    BalanceProblem problem =
        problem(
            List.of(
                new BalanceItem(1, "Lights A", 10.0, Phase.L1, 2, true),
                new BalanceItem(3, "Lights B", 10.0, Phase.L2, 4, true)),
            List.of(new TwoPoleItem(2, "Dryer", 10.0, 1, true)),
            freeExcept(Set.of(1, 2, 3, 4)));

    BalanceResult result = new PhaseBalancer().optimise(problem);

    // by hand: 40 A in all over three lines puts at least 13.34 A on one, and every line carries
    // whole 10 A parts, so 20 A is the least largest line (e.g. the B one-pole moved to C)
    assertThat(result.after().largestAmps()).isEqualTo(20.0);
    assertThat(result.provedOptimal()).isTrue();
    PlanChecks.assertPlacedSafely(PANEL, problem, result.moves());
  }

  @Test
  void aTwoPoleBreakerWithUnknownDemandMakesTheBalanceNotAssessed() {
    BalanceProblem problem =
        problem(
            List.of(),
            List.of(new TwoPoleItem(2, "Dryer", null, 1, true)),
            freeExcept(Set.of(1, 3)));

    assertThat(new PhaseBalancer().optimise(problem).outcome())
        .isEqualTo(BalanceOutcome.NOT_ASSESSED);
  }

  @Test
  void aPhasorCorrectionKeepsAsItStandsAtTheGivenLineCurrent() {
    // the demand engine's phasor sum on A is 38.64 A where the magnitudes add to 40 A (20 A at 0°
    // plus 20 A at 30°: |20 + 20∠30°| = 40·cos 15° = 38.64 A, textbook phasor sum from memory)
    BalanceProblem problem =
        new BalanceProblem(
            List.of(new BalanceItem(1, "Locked lights", 20.0, Phase.L1, 2, false)),
            Map.of(),
            null,
            freeExcept(Set.of(1, 2, 3)),
            10.0,
            true,
            3,
            List.of(new TwoPoleItem(2, "Water heater", 20.0, 1, true)),
            PANEL,
            Map.of(Phase.L1, -1.36));

    BalanceResult result = new PhaseBalancer().optimise(problem);

    assertThat(result.before()).isEqualTo(new PhaseCurrents(38.64, 20.0, 0.0));
    // the correction stays with line A: 20 − 1.36 = 18.64 A predicted there after the move
    assertThat(result.after()).isEqualTo(new PhaseCurrents(18.64, 20.0, 20.0));
  }
}
