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
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Split-phase and wye boards through the demand engine. Expected values are worked by hand from the
 * phasor relations of the single-phase three-wire and wye systems (from memory: W. D. Stevenson,
 * Elements of Power System Analysis, ch. 2): V_A = 120∠0°, V_B = 120∠180° on the split-phase
 * system; V_AB = √3·120∠30° = 208∠30° on the 208Y/120 V system.
 */
class NorthAmericanSupplyTests {

  static final SupplySpec SPLIT_PHASE =
      new SupplySpec(
          EarthingSystem.TN_C_S,
          120.0,
          1,
          60.0,
          null,
          10.0,
          200.0,
          SupplySystem.SPLIT_PHASE_120_240);
  static final SupplySpec WYE_208 =
      new SupplySpec(
          EarthingSystem.TN_C_S, 120.0, 3, 60.0, null, 10.0, 400.0, SupplySystem.WYE_208Y_120);

  static BoardDemand evaluate(BoardSpec board, SupplySpec supply) {
    return DemandEngine.evaluateBoard(board, supply, DiversityMethods.builtIn(), null);
  }

  static CircuitSpec watts(long id, int way, PhasePosition position, double watts, double pf) {
    return Fixtures.circuit(
        id, way, position, load(LoadCategory.OTHER, 1, watts, RatingUnit.W, pf));
  }

  static double amps(BoardDemand demand, Phase line) {
    return demand.phases().get(line.ordinal()).currentAmps();
  }

  @Test
  void twoFortyVoltLoadsPutNoCurrentOnTheSplitPhaseNeutral() {
    // 4.8 kW water heater and 5.76 kW dryer at 240 V: 20 A and 24 A on both A and B
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            200.0,
            List.of(
                watts(1, 1, PhasePosition.L1_L2, 4800.0, 1.0),
                watts(2, 3, PhasePosition.L1_L2, 5760.0, 1.0)));

    BoardDemand demand = evaluate(board, SPLIT_PHASE);

    assertThat(demand.lines()).as("a split-phase board has lines A and B").isEqualTo(2);
    assertThat(amps(demand, Phase.L1)).as("line A: 10560 W / 240 V").isCloseTo(44.0, within(1e-9));
    assertThat(amps(demand, Phase.L2)).as("line B: 10560 W / 240 V").isCloseTo(44.0, within(1e-9));
    assertThat(demand.neutralCurrentAmps())
        .as("240 V loads return on the other line, not the neutral")
        .isCloseTo(0.0, within(1e-9));
    assertThat(demand.circuits().get(0).designCurrentAmps())
        .as("Ib of the 4.8 kW water heater at 240 V")
        .isCloseTo(20.0, within(1e-9));
  }

  @Test
  void connectedCurrentOfATwoFortyVoltLoadIsHalfItsPowerOnEachLine() {
    // hand calculation: 4800 W at 240 V draws 4800/240 = 20 A on A and on B; each line carries
    // 120 V × 20 A = 2400 W, half the load (not 4800 W, which would read 40 A)
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            200.0,
            List.of(watts(1, 1, PhasePosition.L1_L2, 4800.0, 1.0)));

    BoardDemand demand = evaluate(board, SPLIT_PHASE);

    for (Phase line : List.of(Phase.L1, Phase.L2)) {
      assertThat(demand.phases().get(line.ordinal()).connectedCurrentAmps())
          .as("connected current on " + line + ": 4800 W / 240 V")
          .isCloseTo(20.0, within(1e-9));
      assertThat(amps(demand, line))
          .as("demand current on " + line + " equals connected without diversity")
          .isCloseTo(20.0, within(1e-9));
    }
  }

  @Test
  void connectedCurrentOfATwoOhEightVoltLoadIsItsLineToLineCurrentOnBothLines() {
    // hand calculation: 4160 W at 208 V (120·√3) draws 4160/207.85 = 20.01 A on A and on B
    double expectedAmps = 4160.0 / (120.0 * Math.sqrt(3.0));
    BoardSpec board =
        Fixtures.board(
            1,
            3,
            null,
            DiversityMethods.NONE,
            225.0,
            List.of(watts(1, 1, PhasePosition.L1_L2, 4160.0, 0.8)));

    BoardDemand demand = evaluate(board, WYE_208);

    assertThat(demand.phases().get(0).connectedCurrentAmps())
        .as("connected on A: P/(pf·V_LL)")
        .isCloseTo(expectedAmps / 0.8, within(1e-9));
    assertThat(demand.phases().get(1).connectedCurrentAmps())
        .as("connected on B: P/(pf·V_LL)")
        .isCloseTo(expectedAmps / 0.8, within(1e-9));
    assertThat(demand.phases().get(2).connectedCurrentAmps())
        .as("nothing connected on C")
        .isCloseTo(0.0, within(1e-9));
  }

  @Test
  void unbalancedOneTwentyVoltLoadsPutTheDifferenceOnTheNeutral() {
    // 2400 W on A (20 A), 1200 W on B (10 A), and a 240 V 4800 W load (20 A on both lines)
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            200.0,
            List.of(
                watts(1, 1, PhasePosition.L1, 2400.0, 1.0),
                watts(2, 2, PhasePosition.L2, 1200.0, 1.0),
                watts(3, 3, PhasePosition.L1_L2, 4800.0, 1.0)));

    BoardDemand demand = evaluate(board, SPLIT_PHASE);

    assertThat(amps(demand, Phase.L1)).as("A: 20 A + 20 A").isCloseTo(40.0, within(1e-9));
    assertThat(amps(demand, Phase.L2)).as("B: 10 A + 20 A").isCloseTo(30.0, within(1e-9));
    assertThat(demand.neutralCurrentAmps())
        .as("neutral carries the difference of the 120 V loads, 20 A − 10 A")
        .isCloseTo(10.0, within(1e-9));
    assertThat(demand.unbalancePercent())
        .as("|40 − 30| / (40 + 30)")
        .isCloseTo(100.0 * 10.0 / 70.0, within(1e-9));
  }

  @Test
  void lineToLineLoadOnA208VoltWyeDrawsItsCurrentOnBothLinesAtTheRightAngles() {
    // 208 V, 4160 W at unity power factor between A and B: I = 4160/(120·√3) = 20.0 A
    double lineToLineVolts = 120.0 * Math.sqrt(3.0);
    double expectedAmps = 4160.0 / lineToLineVolts;
    BoardSpec board =
        Fixtures.board(
            1,
            3,
            null,
            DiversityMethods.NONE,
            225.0,
            List.of(watts(1, 1, PhasePosition.L1_L2, 4160.0, 1.0)));

    BoardDemand demand = evaluate(board, WYE_208);

    assertThat(amps(demand, Phase.L1)).as("line A").isCloseTo(expectedAmps, within(1e-9));
    assertThat(amps(demand, Phase.L2)).as("line B").isCloseTo(expectedAmps, within(1e-9));
    assertThat(amps(demand, Phase.L3)).as("line C carries nothing").isCloseTo(0.0, within(1e-9));
    assertThat(demand.neutralCurrentAmps()).as("no neutral current").isCloseTo(0.0, within(1e-9));
    PhaseDemand a = demand.phases().get(0);
    PhaseDemand b = demand.phases().get(1);
    // I_A is in phase with V_AB = 208∠30° at unity power factor; I_B = −I_A, at 30° − 180°
    assertThat(LinePhasors.currentAngleDegrees(0.0, a.demandWatts(), a.demandVars()))
        .as("angle of I_A")
        .isCloseTo(30.0, within(1e-9));
    assertThat(LinePhasors.currentAngleDegrees(-120.0, b.demandWatts(), b.demandVars()))
        .as("angle of I_B")
        .isCloseTo(-150.0, within(1e-9));
    assertThat(demand.circuits().get(0).designCurrentAmps())
        .as("Ib = P / V_LL")
        .isCloseTo(expectedAmps, within(1e-9));
  }

  @Test
  void lineToLineLoadRatedInAmpsIsConvertedAtTheLineToLineVoltage() {
    // 30 A at 240 V, unity power factor: 7200 VA, 30 A on both lines
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            200.0,
            List.of(
                Fixtures.circuit(
                    1,
                    1,
                    PhasePosition.L1_L2,
                    load(LoadCategory.FIXED_APPLIANCE, 1, 30.0, RatingUnit.A, 1.0))));

    BoardDemand demand = evaluate(board, SPLIT_PHASE);

    assertThat(demand.demandWatts()).as("30 A × 240 V").isCloseTo(7200.0, within(1e-9));
    assertThat(amps(demand, Phase.L1)).as("line A").isCloseTo(30.0, within(1e-9));
  }

  @Test
  void aThreePolePositionOnASplitPhaseBoardIsNotAssessed() {
    BoardSpec board =
        Fixtures.board(
            1,
            1,
            null,
            DiversityMethods.NONE,
            200.0,
            List.of(watts(1, 1, PhasePosition.THREE_POLE, 3000.0, 1.0)));

    BoardDemand demand = evaluate(board, SPLIT_PHASE);

    assertThat(demand.circuits().get(0).notAssessedReason())
        .as("a split-phase board has no third line")
        .contains("split-phase");
    assertThat(demand.demandWatts()).as("nothing carried").isZero();
  }

  @Test
  void theIecGeometryIsUnchangedForAThreePhaseBoard() {
    // the same board through the old constructor and through an explicit IEC_WYE supply
    BoardSpec board =
        Fixtures.board(
            1,
            3,
            null,
            DiversityMethods.NONE,
            100.0,
            List.of(
                watts(1, 1, PhasePosition.L1, 4600.0, 0.9),
                watts(2, 2, PhasePosition.L2, 2300.0, 0.8),
                watts(3, 3, PhasePosition.THREE_POLE, 9000.0, 0.85)));
    BoardDemand before = Fixtures.evaluate(board);

    assertThat(before.neutralCurrentAmps())
        .as("neutral from the three-line formula kept in PhaseCurrents")
        .isCloseTo(
            PhaseCurrents.neutralCurrentAmps(
                before.phases().stream().mapToDouble(PhaseDemand::demandWatts).toArray(),
                before.phases().stream().mapToDouble(PhaseDemand::demandVars).toArray(),
                230.0),
            within(1e-9));
  }
}
