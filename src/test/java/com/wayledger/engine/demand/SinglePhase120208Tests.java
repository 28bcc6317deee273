package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.load;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The 120/208 V single-phase three-wire panel: two lines of a 208Y/120 V wye with its neutral, V_A
 * = 120∠0°, V_B = 120∠−120°, V_AB = √3·120∠30° ≈ 208 V. Expected values worked by hand from the
 * textbook phasor sum of line currents (from memory: W. D. Stevenson, Elements of Power System
 * Analysis, ch. 2): the neutral carries I_N = I_A + I_B, and two equal currents 120° apart sum to
 * one of the same magnitude (|1∠0° + 1∠−120°| = |1∠−60°| = 1), where on a 120/240 V panel (180°
 * apart) they cancel.
 */
class SinglePhase120208Tests {

  static final SupplySpec WYE_208 =
      new SupplySpec(
          EarthingSystem.TN_C_S, 120.0, 3, 60.0, null, 10.0, 400.0, SupplySystem.WYE_208Y_120);

  static CircuitSpec watts(long id, int way, PhasePosition position, double watts) {
    return Fixtures.circuit(
        id, way, position, load(LoadCategory.OTHER, 1, watts, RatingUnit.W, 1.0));
  }

  /** A 120/208 V panel (own system) on a 208Y/120 V site: phases 1, two lines. */
  static BoardSpec panel(long id, Long parent, List<CircuitSpec> circuits) {
    return Fixtures.board(id, 1, parent, DiversityMethods.NONE, 125.0, circuits)
        .withSupplySystem(SupplySystem.SINGLE_PHASE_120_208);
  }

  static double amps(BoardDemand demand, Phase line) {
    return demand.onPhase(line).currentAmps();
  }

  @Test
  void equalOneTwentyVoltLoadsPutTheirFullCurrentOnTheNeutral() {
    // 1200 W at 120 V: 10 A on A and 10 A on B, 120° apart
    BoardSpec board =
        panel(
            1,
            null,
            List.of(watts(1, 1, PhasePosition.L1, 1200.0), watts(2, 2, PhasePosition.L2, 1200.0)));

    BoardDemand demand =
        DemandEngine.evaluateBoard(board, WYE_208, DiversityMethods.builtIn(), null);

    assertThat(demand.lines()).as("lines A and B").isEqualTo(2);
    assertThat(demand.system()).isEqualTo(SupplySystem.SINGLE_PHASE_120_208);
    assertThat(amps(demand, Phase.L1)).as("A: 1200 W / 120 V").isCloseTo(10.0, within(1e-9));
    assertThat(amps(demand, Phase.L2)).as("B: 1200 W / 120 V").isCloseTo(10.0, within(1e-9));
    assertThat(demand.neutralCurrentAmps())
        .as("|10∠0° + 10∠−120°| = 10 A (0 A on a 120/240 V panel)")
        .isCloseTo(10.0, within(1e-9));
  }

  @Test
  void aTwoHundredEightVoltLoadDrawsPOver208OnBothLinesAndNoneOnTheNeutral() {
    double watts = 4160.0;
    double lineToLineVolts = Math.sqrt(3.0) * 120.0; // 207.8 V, "208 V"
    BoardSpec board = panel(1, null, List.of(watts(1, 1, PhasePosition.L1_L2, watts)));

    BoardDemand demand =
        DemandEngine.evaluateBoard(board, WYE_208, DiversityMethods.builtIn(), null);

    assertThat(amps(demand, Phase.L1))
        .as("A: P / V_AB")
        .isCloseTo(watts / lineToLineVolts, within(1e-9));
    assertThat(amps(demand, Phase.L2))
        .as("B: P / V_AB")
        .isCloseTo(watts / lineToLineVolts, within(1e-9));
    assertThat(demand.neutralCurrentAmps()).as("no neutral current").isCloseTo(0.0, within(1e-9));
    assertThat(demand.circuits().get(0).designCurrentAmps())
        .as("Ib = P / V_AB, not P / 240 V")
        .isCloseTo(watts / lineToLineVolts, within(1e-9));
    PhaseDemand a = demand.onPhase(Phase.L1);
    assertThat(LinePhasors.currentAngleDegrees(0.0, a.demandWatts(), a.demandVars()))
        .as("I_A in phase with V_AB = 208∠30° at unity power factor")
        .isCloseTo(30.0, within(1e-9));
  }

  @Test
  void aPanelOnLinesBAndCOfA208YPanelLoadsBAndCWithItsOwnLineCurrents() {
    // 120/208 V panel: 1200 W on its A (10 A), 2400 W on its B (20 A); fed from B–C of the
    // 208Y/120 V panel, so its A is the parent's B (−120°) and its B the parent's C (+120°)
    BoardSpec apartment =
        panel(
            2,
            1L,
            List.of(watts(1, 1, PhasePosition.L1, 1200.0), watts(2, 2, PhasePosition.L2, 2400.0)));
    BoardSpec house =
        Fixtures.board(
            1,
            3,
            null,
            DiversityMethods.NONE,
            225.0,
            List.of(Fixtures.feeder(10, 2, PhasePosition.L2_L3, 2)));
    SiteSpec site =
        new SiteSpec(1, "site", WYE_208, DiversityMethods.NONE, List.of(house, apartment), "NEC");

    SiteDemand demand = DemandEngine.evaluate(site, DiversityMethods.builtIn());
    BoardDemand parent = demand.boards().stream().filter(b -> b.boardId() == 1).findFirst().get();
    BoardDemand child = demand.boards().stream().filter(b -> b.boardId() == 2).findFirst().get();

    // |10∠−120° + 20∠120°| = √(10² + 20² + 2·10·20·cos 120°) = √300 = 17.32 A
    double expectedNeutral = Math.sqrt(300.0);
    assertThat(child.neutralCurrentAmps())
        .as("child neutral")
        .isCloseTo(expectedNeutral, within(1e-9));
    assertThat(amps(parent, Phase.L1)).as("parent A carries nothing").isCloseTo(0.0, within(1e-9));
    assertThat(amps(parent, Phase.L2)).as("parent B = child A").isCloseTo(10.0, within(1e-9));
    assertThat(amps(parent, Phase.L3)).as("parent C = child B").isCloseTo(20.0, within(1e-9));
    assertThat(parent.neutralCurrentAmps())
        .as("the parent's neutral carries the child's neutral current")
        .isCloseTo(expectedNeutral, within(1e-9));
    assertThat(parent.circuits().get(0).designCurrentAmps())
        .as("the feeder's Ib is its heaviest line, 20 A")
        .isCloseTo(20.0, within(1e-9));
  }

  @Test
  void aBoardWithoutItsOwnSystemTakesTheSites() {
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            100.0,
            List.of(watts(1, 1, PhasePosition.L1, 1200.0)));
    SiteSpec site = new SiteSpec(1, "site", WYE_208, DiversityMethods.NONE, List.of(board), "NEC");

    assertThat(site.systemOf(board)).isEqualTo(SupplySystem.WYE_208Y_120);
    assertThat(site.systemOf(board.withSupplySystem(SupplySystem.SPLIT_PHASE_120_240)))
        .isEqualTo(SupplySystem.SPLIT_PHASE_120_240);
  }

  @Test
  void twoPolesOfA208YPanelSupplyOnlyThe120208System() {
    assertThat(SupplySystem.WYE_208Y_120.suppliesThrough(PhasePosition.L2_L3))
        .containsExactly(SupplySystem.SINGLE_PHASE_120_208);
    assertThat(SupplySystem.WYE_208Y_120.suppliesThrough(PhasePosition.THREE_POLE))
        .containsExactly(SupplySystem.WYE_208Y_120);
    assertThat(SupplySystem.SPLIT_PHASE_120_240.suppliesThrough(PhasePosition.L1_L2))
        .containsExactly(SupplySystem.SPLIT_PHASE_120_240);
    assertThat(SupplySystem.IEC_WYE.suppliesThrough(PhasePosition.L1))
        .containsExactly(SupplySystem.IEC_WYE);
  }
}
