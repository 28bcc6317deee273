package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.amps;
import static com.wayledger.engine.demand.Fixtures.board;
import static com.wayledger.engine.demand.Fixtures.circuit;
import static com.wayledger.engine.demand.Fixtures.evaluate;
import static com.wayledger.engine.demand.Fixtures.watts;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import org.junit.jupiter.api.Test;

class UkAllowancesTests {

  private static final double U0 = 230.0;

  @Test
  void cookerCircuitTakesTenAmpsPlusThirtyPercentOfTheRemainder() {
    // IET On-Site Guide Appendix A, household cooking appliances: 10 A + 30 % of the remainder;
    // a 30 A cooker → 10 + 0.3 × 20 = 16 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.COOKING, 30.0))));

    assertThat(demand.circuits().get(0).designCurrentAmps()).isCloseTo(16.0, within(1e-9));
  }

  @Test
  void cookerDiversityAddsFiveAmpsForSocketInControlUnit() {
    // IET On-Site Guide Appendix A: + 5 A if a socket-outlet is in the cooker control unit; 16 + 5
    // = 21 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(
                    1,
                    1,
                    PhasePosition.L1,
                    amps(LoadCategory.COOKING, 30.0),
                    amps(LoadCategory.SOCKET_OUTLETS, 13.0))));

    assertThat(demand.circuits().get(0).designCurrentAmps()).isCloseTo(21.0, within(1e-9));
  }

  @Test
  void cookerCircuitBeforeDiversityCarriesItsFullCurrent() {
    // by hand from Ib = S / U0: 30 A cooker + 13 A socket before any diversity = 43 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(
                    1,
                    1,
                    PhasePosition.L1,
                    amps(LoadCategory.COOKING, 30.0),
                    amps(LoadCategory.SOCKET_OUTLETS, 13.0))));

    assertThat(demand.circuits().get(0).connectedCurrentAmps()).isCloseTo(43.0, within(1e-9));
  }

  @Test
  void socketCircuitsTakeTheLargestWholeAndFortyPercentOfEveryOther() {
    // IET On-Site Guide Appendix A, standard circuits: 100 % of the largest + 40 % of every other;
    // 32 A + 32 A + 20 A → 32 + 0.4 × 52 = 52.8 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.SOCKET_OUTLETS, 32.0)),
                circuit(2, 2, PhasePosition.L1, amps(LoadCategory.SOCKET_OUTLETS, 32.0)),
                circuit(3, 3, PhasePosition.L1, amps(LoadCategory.SOCKET_OUTLETS, 20.0))));

    assertThat(demand.onPhase(com.wayledger.engine.Phase.L1).currentAmps())
        .isCloseTo(52.8, within(1e-9));
  }

  @Test
  void instantaneousWaterHeatersTakeTwoWholeAndAQuarterOfTheRest() {
    // IET On-Site Guide Appendix A: instantaneous water heaters 100 % largest, 100 % second, 25 %
    // the rest;
    // 40 A + 40 A + 40 A + 40 A showers → 40 + 40 + 0.25 × 80 = 100 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(
                    1, 1, PhasePosition.L1, amps(LoadCategory.WATER_HEATING_INSTANTANEOUS, 40.0)),
                circuit(
                    2, 2, PhasePosition.L1, amps(LoadCategory.WATER_HEATING_INSTANTANEOUS, 40.0)),
                circuit(
                    3, 3, PhasePosition.L1, amps(LoadCategory.WATER_HEATING_INSTANTANEOUS, 40.0)),
                circuit(
                    4, 4, PhasePosition.L1, amps(LoadCategory.WATER_HEATING_INSTANTANEOUS, 40.0))));

    assertThat(demand.onPhase(com.wayledger.engine.Phase.L1).currentAmps())
        .isCloseTo(100.0, within(1e-9));
  }

  @Test
  void tiedEqualCircuitsShareTheLargestCircuitAllowance() {
    // by hand from 100 % largest + 40 % every other: two equal 32 A circuits → (32 + 12.8) / 2 =
    // 22.4 A each
    BoardDemand demand =
        evaluate(
            board(
                3,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.SOCKET_OUTLETS, 32.0)),
                circuit(2, 2, PhasePosition.L2, amps(LoadCategory.SOCKET_OUTLETS, 32.0))));

    assertThat(demand.onPhase(com.wayledger.engine.Phase.L2).currentAmps())
        .isCloseTo(22.4, within(1e-9));
  }

  @Test
  void householdLightingTakesSixtySixPercent() {
    // IET On-Site Guide Appendix A, households: lighting 66 % of total demand; 1,000 W → 660 W
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(1, 1, PhasePosition.L1, watts(LoadCategory.LIGHTING, 1_000.0))));

    assertThat(demand.demandWatts()).isCloseTo(660.0, within(1e-9));
  }

  @Test
  void householdHeatingAndPowerTakesTenAmpsPlusHalfTheRemainder() {
    // IET On-Site Guide Appendix A, households: heating and power 100 % up to 10 A + 50 % of the
    // balance;
    // 30 A → 10 + 10 = 20 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_HOUSEHOLD,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.FIXED_APPLIANCE, 30.0))));

    assertThat(demand.demandVoltAmperes()).isCloseTo(20.0 * U0, within(1e-9));
  }

  @Test
  void smallShopLightingTakesNinetyPercent() {
    // IET On-Site Guide Appendix A, small shops, stores, offices: lighting 90 % of total demand
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_SMALL_SHOP,
                circuit(1, 1, PhasePosition.L1, watts(LoadCategory.LIGHTING, 1_000.0))));

    assertThat(demand.demandWatts()).isCloseTo(900.0, within(1e-9));
  }

  @Test
  void smallHotelCookingTakesEightyThenSixtyPercent() {
    // IET On-Site Guide Appendix A, small hotels: cooking 100 % largest + 80 % second + 60 % the
    // rest;
    // 20 A + 15 A + 10 A → 20 + 12 + 6 = 38 A
    BoardDemand demand =
        evaluate(
            board(
                1,
                DiversityMethods.UK_SMALL_HOTEL,
                circuit(1, 1, PhasePosition.L1, amps(LoadCategory.COOKING, 10.0)),
                circuit(2, 2, PhasePosition.L1, amps(LoadCategory.COOKING, 20.0)),
                circuit(3, 3, PhasePosition.L1, amps(LoadCategory.COOKING, 15.0))));

    assertThat(demand.onPhase(com.wayledger.engine.Phase.L1).currentAmps())
        .isCloseTo(38.0, within(1e-9));
  }
}
