package com.wayledger.balance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.balance.BalanceItem;
import com.wayledger.engine.balance.BalanceProblem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethods;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A two-pole, line-to-line circuit is fixed load on its pair of lines, never a movable item. */
class TwoPoleBalancingTests {

  private static CircuitSpec circuit(long id, int way, PhasePosition position, double watts) {
    return new CircuitSpec(
        id,
        way,
        position,
        "load " + id,
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.MCB, null, 30.0, position.poles(), 10.0, null, null),
        null,
        List.of(
            new LoadSpec(
                "load", LoadCategory.OTHER, 1, watts, RatingUnit.W, 1.0, null, null, false)),
        null,
        null);
  }

  @Test
  void twoPoleLoadOnA208VoltBoardIsFixedLoadOnBothItsLines() {
    BoardSpec board =
        new BoardSpec(
            1,
            "HP",
            3,
            42,
            null,
            null,
            null,
            null,
            10.0,
            1.0,
            DiversityMethods.NONE,
            null,
            null,
            List.of(
                circuit(1, 1, PhasePosition.L2_L3, 4160.0),
                circuit(2, 2, PhasePosition.L1, 1200.0)));
    SupplySpec supply =
        new SupplySpec(
            EarthingSystem.TN_C_S, 120.0, 3, 60.0, null, null, null, SupplySystem.WYE_208Y_120);
    BoardDemand demand =
        DemandEngine.evaluateBoard(board, supply, DiversityMethods.builtIn(), null);

    BalanceProblem problem = BalanceService.problemOf(board, demand, BalancePlans.Basis.CONNECTED);

    // 4160 W / (√3·120 V) = 20.0 A on B and C (hand-worked, P / V_LL at unity power factor)
    double lineAmps = 4160.0 / (Math.sqrt(3.0) * 120.0);
    assertThat(problem.fixedLoadAmps().get(Phase.L2))
        .as("line B")
        .isCloseTo(lineAmps, within(1e-9));
    assertThat(problem.fixedLoadAmps().get(Phase.L3))
        .as("line C")
        .isCloseTo(lineAmps, within(1e-9));
    assertThat(problem.fixedLoadAmps().get(Phase.L1)).as("line A").isCloseTo(0.0, within(1e-9));
    assertThat(problem.items())
        .as("only the single-pole circuit can move")
        .extracting(BalanceItem::circuitId)
        .containsExactly(2L);
  }
}
