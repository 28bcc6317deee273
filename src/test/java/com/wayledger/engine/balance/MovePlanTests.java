package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.Phase;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class MovePlanTests {

  private final PhaseBalancer balancer = new PhaseBalancer();

  private static BalanceProblem bakery(List<Integer> freeOnL1) {
    // By hand: L2 carries the locked sheeter and the mixer (40 A), L3 the locked proofer (20 A), L1
    // nothing;
    // moving the mixer to L1 gives 20/20/20 A.
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "Dough sheeter", 20.0, Phase.L2, 1, false),
            new BalanceItem(2, "Bakery mixer", 20.0, Phase.L2, 4, true),
            new BalanceItem(3, "Proofer", 20.0, Phase.L3, 1, false));
    return new BalanceProblem(
        items,
        Map.of(),
        null,
        Map.of(Phase.L1, freeOnL1, Phase.L2, List.of(), Phase.L3, List.of()),
        10.0,
        true);
  }

  @Test
  void movedCircuitTakesAFreeWayOnItsNewLine() {
    BalanceResult result = balancer.optimise(bakery(List.of(7)));

    assertThat(result.moves())
        .extracting(CircuitMove::inWords)
        .containsExactly("move circuit 'Bakery mixer' from way 4 L2 to way 7 L1");
  }

  @Test
  void movedCircuitKeepsItsWayWhenThatPositionIsFreeOnTheNewLine() {
    BalanceResult result = balancer.optimise(bakery(List.of(4, 7)));

    assertThat(result.moves())
        .extracting(CircuitMove::inWords)
        .containsExactly("move circuit 'Bakery mixer' from way 4 L2 to way 4 L1");
  }

  @Test
  void circuitsSwappingLinesReuseEachOthersPositions() {
    // By hand: L1 has 12 A + 12 A (24 A), L2 has 2 A + 2 A (4 A), L3 14 A locked, no free
    // positions. The
    // best with two positions per line swaps one 12 A with one 2 A: 14/14/14 A.
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "Heater A", 12.0, Phase.L1, 1, true),
            new BalanceItem(2, "Heater B", 12.0, Phase.L1, 2, true),
            new BalanceItem(3, "Lights A", 2.0, Phase.L2, 1, true),
            new BalanceItem(4, "Lights B", 2.0, Phase.L2, 2, true),
            new BalanceItem(5, "Chiller", 14.0, Phase.L3, 1, false));
    BalanceProblem problem =
        new BalanceProblem(
            items,
            Map.of(),
            null,
            Map.of(Phase.L1, List.of(), Phase.L2, List.of(), Phase.L3, List.of()),
            10.0,
            true);

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.after()).isEqualTo(new PhaseCurrents(14.0, 14.0, 14.0));
    assertThat(result.moves())
        .extracting(move -> move.toPhase() + " way " + move.toWay())
        .containsExactlyInAnyOrderElementsOf(
            result.moves().stream()
                .map(move -> move.fromPhase() + " way " + move.fromWay())
                .toList());
  }

  @Test
  void newCircuitIsPlacedRatherThanMoved() {
    List<BalanceItem> items = List.of(new BalanceItem(1, "Hand dryer", 8.0, null, null, true));
    BalanceProblem problem =
        new BalanceProblem(
            items,
            Map.of(),
            null,
            Map.of(Phase.L1, List.of(3), Phase.L2, List.of(), Phase.L3, List.of()),
            10.0,
            true);

    BalanceResult result = balancer.optimise(problem);

    assertThat(result.moves())
        .extracting(CircuitMove::inWords)
        .containsExactly("place circuit 'Hand dryer' on way 3 L1");
  }
}
