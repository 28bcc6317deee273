package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.amps;
import static com.wayledger.engine.demand.Fixtures.board;
import static com.wayledger.engine.demand.Fixtures.circuit;
import static com.wayledger.engine.demand.Fixtures.evaluate;
import static com.wayledger.engine.demand.Fixtures.load;
import static com.wayledger.engine.demand.Fixtures.watts;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import org.junit.jupiter.api.Test;

class NecDwellingTests {

  private static final DwellingParameters FIFTEEN_HUNDRED_SQUARE_FEET =
      new DwellingParameters(1_500.0, 2, 1);

  /**
   * NEC Annex D Example D1(a): 1,500 ft², 12 kW range, 5.5 kW dryer (on a fastened-appliance line).
   */
  private static BoardSpec exampleD1a() {
    return board(
        1,
        DiversityMethods.NEC_STANDARD_DWELLING,
        circuit(1, 1, PhasePosition.L1),
        circuit(2, 2, PhasePosition.L1),
        circuit(3, 3, PhasePosition.L1, watts(LoadCategory.COOKING, 12_000.0)),
        circuit(4, 4, PhasePosition.L1, watts(LoadCategory.FIXED_APPLIANCE, 5_500.0)));
  }

  @Test
  void standardMethodOfAnnexExampleD1aIsEighteenThousandSixHundred() {
    // NEC Annex D Example D1(a): 5,100 + range 8,000 + dryer 5,500 = 18,600 VA net calculated load
    BoardDemand demand = evaluate(exampleD1a(), FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.demandVoltAmperes()).isCloseTo(18_600.0, within(1e-6));
  }

  @Test
  void standardMethodWithoutFloorAreaIsNotAssessedAndSaysSo() {
    BoardDemand demand = evaluate(exampleD1a(), new DwellingParameters(null, 2, 1));

    assertThat(demand.notAssessed())
        .anySatisfy(reason -> assertThat(reason).contains("not assessed — missing floor area"));
  }

  @Test
  void dwellingLoadWithNoLightingCircuitLoadsIsSpreadAsAnAllowance() {
    // NEC Annex D Example D1(a): general lighting and appliance circuits 9,000 VA → 5,100 VA after
    // Table 220.42
    BoardDemand demand = evaluate(exampleD1a(), FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.allowanceVoltAmperes()).isCloseTo(5_100.0, within(1e-6));
  }

  @Test
  void dwellingLoadIsCarriedByLightingCircuitsWhenTheyHaveLoads() {
    // NEC Annex D Example D1(a): 5,100 VA lighting and appliance-circuit demand, whatever the
    // circuits' own loads
    BoardSpec board =
        board(
            1,
            DiversityMethods.NEC_STANDARD_DWELLING,
            circuit(1, 1, PhasePosition.L1, watts(LoadCategory.LIGHTING, 600.0)),
            circuit(2, 2, PhasePosition.L1, watts(LoadCategory.SOCKET_OUTLETS, 1_800.0)));

    BoardDemand demand = evaluate(board, FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.circuits().get(0).demandWatts() + demand.circuits().get(1).demandWatts())
        .isCloseTo(5_100.0, within(1e-6));
  }

  @Test
  void optionalMethodOfAnnexExampleD2aIsTwentyOneThousandFourHundredEighty() {
    // NEC Annex D Example D2(a): general load 29,700 VA → 10,000 + 40 % × 19,700 = 17,880 VA;
    // 9 kW heat in five rooms at 40 % = 3,600 VA governs over a 6 A, 230 V air conditioner; total
    // 21,480 VA
    BoardSpec board =
        board(
            1,
            DiversityMethods.NEC_OPTIONAL_DWELLING,
            circuit(1, 1, PhasePosition.L1, watts(LoadCategory.COOKING, 12_000.0)),
            circuit(2, 2, PhasePosition.L1, watts(LoadCategory.WATER_HEATING_STORAGE, 2_500.0)),
            circuit(3, 3, PhasePosition.L1, watts(LoadCategory.FIXED_APPLIANCE, 1_200.0)),
            circuit(4, 4, PhasePosition.L1, watts(LoadCategory.FIXED_APPLIANCE, 5_000.0)),
            circuit(
                5,
                5,
                PhasePosition.L1,
                load(LoadCategory.SPACE_HEATING, 5, 1_800.0, RatingUnit.W, 1.0)),
            circuit(6, 6, PhasePosition.L1, amps(LoadCategory.AIR_CONDITIONING, 6.0)));

    BoardDemand demand = evaluate(board, FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.demandVoltAmperes()).isCloseTo(21_480.0, within(1e-6));
  }

  @Test
  void optionalMethodCountsTheLargerOfHeatingAndCoolingOnly() {
    // NEC Annex D Example D2(a): the 1.38 kVA air conditioner is less than 40 % of 9 kVA heat and
    // is left out
    BoardSpec board =
        board(
            1,
            DiversityMethods.NEC_OPTIONAL_DWELLING,
            circuit(
                5,
                5,
                PhasePosition.L1,
                load(LoadCategory.SPACE_HEATING, 5, 1_800.0, RatingUnit.W, 1.0)),
            circuit(6, 6, PhasePosition.L1, amps(LoadCategory.AIR_CONDITIONING, 6.0)));

    BoardDemand demand = evaluate(board, FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.circuits().get(1).demandVoltAmperes()).isCloseTo(0.0, within(1e-9));
  }

  @Test
  void largestMotorIsAddedAtTwentyFivePercent() {
    // NEC 220.50 / 430.24: 125 % of the largest motor + the others; 2,000 + 1,000 VA → 2,500 +
    // 1,000 = 3,500 VA
    BoardSpec board =
        board(
            1,
            DiversityMethods.NEC_STANDARD_DWELLING,
            circuit(
                1, 1, PhasePosition.L1, load(LoadCategory.MOTOR, 1, 2_000.0, RatingUnit.VA, 0.8)),
            circuit(
                2, 2, PhasePosition.L1, load(LoadCategory.MOTOR, 1, 1_000.0, RatingUnit.VA, 0.8)));

    BoardDemand demand = evaluate(board, FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(
            demand.groups().stream()
                .filter(g -> g.label().equals("Motors"))
                .findFirst()
                .orElseThrow()
                .demandVoltAmperes())
        .isCloseTo(3_500.0, within(1e-6));
  }

  @Test
  void fourFastenedAppliancesTakeSeventyFivePercent() {
    // NEC 220.53: four or more fastened-in-place appliances at 75 %; 4 × 1,000 VA → 3,000 VA
    BoardSpec board =
        board(
            1,
            DiversityMethods.NEC_STANDARD_DWELLING,
            circuit(
                1,
                1,
                PhasePosition.L1,
                load(LoadCategory.FIXED_APPLIANCE, 4, 1_000.0, RatingUnit.VA, 1.0)));

    BoardDemand demand = evaluate(board, FIFTEEN_HUNDRED_SQUARE_FEET);

    assertThat(demand.circuits().get(0).demandVoltAmperes()).isCloseTo(3_000.0, within(1e-6));
  }
}
