package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.amps;
import static com.wayledger.engine.demand.Fixtures.board;
import static com.wayledger.engine.demand.Fixtures.circuit;
import static com.wayledger.engine.demand.Fixtures.evaluate;
import static com.wayledger.engine.demand.Fixtures.feeder;
import static com.wayledger.engine.demand.Fixtures.load;
import static com.wayledger.engine.demand.Fixtures.site;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class DemandEngineTests {

  private static final double U0 = 230.0;

  @Test
  void boardWithNoCircuitsHasZeroDemand() {
    BoardDemand demand = evaluate(board(3, DiversityMethods.NONE));

    assertThat(demand.demandVoltAmperes()).isEqualTo(0.0);
    assertThat(demand.unbalancePercent()).isEqualTo(0.0);
  }

  @Test
  void circuitWithZeroPowerFactorIsNotAssessedWhileTheRestIsComputed() {
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.NONE,
                circuit(
                    1,
                    1,
                    PhasePosition.L1,
                    load(LoadCategory.MOTOR, 1, 1_000.0, RatingUnit.W, 0.0)),
                circuit(2, 2, PhasePosition.L1, amps(LoadCategory.OTHER, 10.0))));

    assertThat(demand.circuits().get(0).notAssessedReason()).contains("power factor");
    assertThat(demand.onPhase(Phase.L1).currentAmps()).isCloseTo(10.0, within(1e-9));
  }

  @Test
  void circuitWithoutPositionIsNotAssessedAndSaysSo() {
    BoardDemand demand =
        evaluate(
            board(3, DiversityMethods.NONE, circuit(1, 1, null, amps(LoadCategory.OTHER, 10.0))));

    assertThat(demand.notAssessed())
        .anySatisfy(reason -> assertThat(reason).contains("missing position"));
  }

  @Test
  void incomerLoadingIsHighestPhaseCurrentOverRating() {
    // by hand from loading = I / In: 50 A on a 100 A incomer → 50 %
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.NONE,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 50.0))));

    assertThat(demand.incomer().loadingPercent()).isCloseTo(50.0, within(1e-9));
  }

  @Test
  void headroomIsIncomerRatingLessPhaseCurrent() {
    // by hand: 100 A − 30 A = 70 A; 70 A × 230 V = 16.1 kW at unity power factor
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.NONE,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 30.0))));

    assertThat(demand.onPhase(Phase.L1).headroomKilowatts()).isCloseTo(16.1, within(1e-9));
  }

  @Test
  void missingBusbarRatingIsNotAssessed() {
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.NONE,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 30.0))));

    assertThat(demand.busbar().notAssessedReason())
        .isEqualTo("not assessed — missing busbar rating");
  }

  @Test
  void supplyFuseIsAssessedOnOriginBoardOnly() {
    BoardSpec child =
        board(
            2,
            1,
            1L,
            DiversityMethods.NONE,
            63.0,
            List.of(circuit(21, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 20.0))));
    BoardSpec parent =
        board(
            1, 3, null, DiversityMethods.NONE, 100.0, List.of(feeder(11, 1, PhasePosition.L1, 2)));

    SiteDemand demand = DemandEngine.evaluate(site(parent, child), DiversityMethods.builtIn());

    assertThat(demand.board(1).supplyFuse().loadingPercent()).isCloseTo(20.0, within(1e-9));
    assertThat(demand.board(2).supplyFuse().isAssessed()).isFalse();
  }

  @Test
  void subBoardDemandTimesCoincidenceIsALoadOnTheFeedingWay() {
    // by hand: child 40 A on L1 × coincidence 0.5 → 20 A on the parent's L2 way
    BoardSpec child =
        new BoardSpec(
            2,
            "DB2",
            1,
            12,
            null,
            Fixtures.mcb(63.0),
            1L,
            null,
            10.0,
            0.5,
            null,
            null,
            null,
            List.of(circuit(21, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 40.0))));
    BoardSpec parent =
        board(
            1, 3, null, DiversityMethods.NONE, 100.0, List.of(feeder(11, 1, PhasePosition.L2, 2)));

    SiteDemand demand = DemandEngine.evaluate(site(parent, child), DiversityMethods.builtIn());

    assertThat(demand.board(1).onPhase(Phase.L2).currentAmps()).isCloseTo(20.0, within(1e-9));
  }

  @Test
  void threePhaseSubBoardKeepsItsPhaseCurrentsOnAThreePoleFeeder() {
    // by hand: child 10 A on L1 and 30 A on L3, fed by a three-pole way → parent L1 10 A, L3 30 A
    BoardSpec child =
        board(
            2,
            3,
            1L,
            DiversityMethods.NONE,
            63.0,
            List.of(
                circuit(21, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 10.0)),
                circuit(22, 2, PhasePosition.L3, amps(LoadCategory.OTHER, 30.0))));
    BoardSpec parent =
        board(
            1,
            3,
            null,
            DiversityMethods.NONE,
            100.0,
            List.of(feeder(11, 1, PhasePosition.THREE_POLE, 2)));

    SiteDemand demand = DemandEngine.evaluate(site(parent, child), DiversityMethods.builtIn());

    assertThat(demand.board(1).onPhase(Phase.L3).currentAmps()).isCloseTo(30.0, within(1e-9));
  }

  @Test
  void boardsFeedingEachOtherAreReportedAsACycle() {
    BoardSpec first =
        board(1, 1, 2L, DiversityMethods.NONE, 63.0, List.of(feeder(11, 1, PhasePosition.L1, 2)));
    BoardSpec second =
        board(2, 1, 1L, DiversityMethods.NONE, 63.0, List.of(feeder(21, 1, PhasePosition.L1, 1)));

    SiteDemand demand = DemandEngine.evaluate(site(first, second), DiversityMethods.builtIn());

    assertThat(demand.problems()).anySatisfy(problem -> assertThat(problem).contains("cycle"));
    assertThat(demand.boards()).hasSize(2);
  }

  @Test
  void childBoardIsEvaluatedBeforeItsParent() {
    BoardSpec child = board(2, 1, 1L, DiversityMethods.NONE, 63.0, List.of());
    BoardSpec parent =
        board(
            1, 3, null, DiversityMethods.NONE, 100.0, List.of(feeder(11, 1, PhasePosition.L1, 2)));

    SiteDemand demand = DemandEngine.evaluate(site(parent, child), DiversityMethods.builtIn());

    assertThat(demand.boards()).extracting(BoardDemand::boardId).containsExactly(2L, 1L);
  }

  @Test
  void resultEchoesVoltageAndMethodUsed() {
    BoardDemand demand = evaluate(board(1, DiversityMethods.UK_HOUSEHOLD));

    assertThat(demand.nominalVoltageVolts()).isEqualTo(U0);
    assertThat(demand.methodKey()).isEqualTo(DiversityMethods.UK_HOUSEHOLD);
  }

  @Test
  void unknownMethodKeyFallsBackAndIsNoted() {
    BoardDemand demand = evaluate(board(1, "no-such-method"));

    assertThat(demand.methodKey()).isEqualTo(DiversityMethods.NONE);
    assertThat(demand.notes()).anySatisfy(note -> assertThat(note).contains("no-such-method"));
  }

  @Test
  void unbalanceOfPhaseCurrentsFollowsNemaDefinition() {
    // NEMA MG-1 definition applied to currents (from memory): 460, 467, 450 A → 1.96 %
    BoardDemand demand =
        evaluate(
            board(
                3,
                DiversityMethods.NONE,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.OTHER, 460.0)),
                circuit(2, 2, PhasePosition.L2, amps(LoadCategory.OTHER, 467.0)),
                circuit(3, 3, PhasePosition.L3, amps(LoadCategory.OTHER, 450.0))));

    assertThat(demand.unbalancePercent()).isCloseTo(1.96, within(0.005));
  }
}
