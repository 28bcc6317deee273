package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PositionWords;
import com.wayledger.engine.SupplySystem;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The balancer's messages name the board and its lines in the board's words: "panelboard" and A/B
 * on a 120/240 V panel, "board" and L1–L3 on a board of ways (common practice of each trade).
 */
class BalanceWordsTests {

  private static final PositionWords SPLIT =
      new PositionWords(true, SupplySystem.SPLIT_PHASE_120_240);

  @Test
  void tooManyCircuitsOnAPanelboardNamesLinesAAndB() {
    List<BalanceItem> items =
        List.of(
            new BalanceItem(1, "a", 10.0, Phase.L1, 1, true),
            new BalanceItem(2, "b", 10.0, Phase.L1, 3, true),
            new BalanceItem(3, "c", 10.0, Phase.L2, 2, true));
    BalanceProblem problem =
        new BalanceProblem(items, Map.of(), Map.of(Phase.L1, 1, Phase.L2, 1), null, 10.0, true, 2);

    String panel = new PhaseBalancer(null, SPLIT).optimise(problem).message();
    String ways = new PhaseBalancer().optimise(problem).message();

    assertThat(panel).contains("positions for them (A 1, B 1,").doesNotContain("L1 1");
    assertThat(ways).as("a board of ways keeps L1, L2").contains("(L1 1, L2 1,");
  }

  @Test
  void nothingToBalanceOnAPanelboardSaysPanelboard() {
    BalanceProblem problem =
        new BalanceProblem(List.of(), Map.of(Phase.L1, 10.0), null, null, 10.0, true, 2);

    assertThat(new PhaseBalancer(null, SPLIT).optimise(problem).message())
        .contains("The panelboard has no single-phase circuits to balance.");
    assertThat(new PhaseBalancer().optimise(problem).message())
        .contains("The board has no single-phase circuits to balance.");
  }
}
