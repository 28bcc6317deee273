package com.wayledger.engine.demand;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SiteSpec;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Figures that must agree with each other: the feeder's Ib and the rating that trips. */
class OneFigureTests {

  private static BoardSpec board(
      long id, Long parent, DeviceSpec incomer, Double ir, List<CircuitSpec> circuits) {
    return new BoardSpec(
        id, "DB" + id, 3, 12, null, incomer, parent, null, 10.0, 1.0, null, null, null, circuits,
        ir);
  }

  // by hand: 23 kW at unity power factor on L1 of the sub-board = 100 A on L1, 0 A on L2 and L3;
  // the three-pole feeder carries 100 A on its L1 line, not the 33.3 A average of the three
  @Test
  void threePoleFeederDesignCurrentIsItsHeaviestLineNotTheAverage() {
    BoardSpec child =
        board(
            2,
            1L,
            null,
            null,
            List.of(
                Fixtures.circuit(
                    21, 1, PhasePosition.L1, Fixtures.watts(LoadCategory.OTHER, 23000))));
    BoardSpec parent =
        board(1, null, null, null, List.of(Fixtures.feeder(11, 1, PhasePosition.THREE_POLE, 2)));
    SiteSpec site = Fixtures.site(parent, child);

    SiteDemand demand = DemandEngine.evaluate(site, DiversityMethods.builtIn());
    CircuitDemand feeder = demand.board(1).circuits().get(0);

    assertThat(feeder.designCurrentAmps()).isCloseTo(100.0, within(0.01));
    assertThat(demand.board(1).onPhase(com.wayledger.engine.Phase.L1).currentAmps())
        .as("the parent's L1 agrees with the feeder's Ib")
        .isCloseTo(feeder.designCurrentAmps(), within(0.01));
  }

  // by hand: 95 A on one line against a 125 A moulded-case incomer set to Ir = 100 A is 95 % of
  // what trips (IEC 60947-2: the overload release acts on Ir), not 76 % of In
  @Test
  void mouldedCaseIncomerIsLoadedAgainstItsIrNotItsIn() {
    DeviceSpec mccb = new DeviceSpec(DeviceKind.MCCB, null, 125.0, 3, 25.0, null, null);
    BoardSpec b =
        board(
            1,
            null,
            mccb,
            100.0,
            List.of(
                Fixtures.circuit(
                    11, 1, PhasePosition.L1, Fixtures.watts(LoadCategory.OTHER, 95 * 230.0))));

    BoardDemand demand =
        DemandEngine.evaluate(Fixtures.site(b), DiversityMethods.builtIn()).board(1);

    assertThat(demand.incomer().ratingAmps()).isEqualTo(100.0);
    assertThat(demand.incomer().loadingPercent()).isCloseTo(95.0, within(0.01));
    assertThat(demand.onPhase(com.wayledger.engine.Phase.L1).headroomAmps())
        .isCloseTo(5.0, within(0.01));
  }
}
