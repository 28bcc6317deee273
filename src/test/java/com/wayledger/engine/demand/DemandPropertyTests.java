package com.wayledger.engine.demand;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DemandPropertyTests {

  private static final String[] DIVERSIFYING = {
    DiversityMethods.NONE,
    DiversityMethods.UK_HOUSEHOLD,
    DiversityMethods.UK_SMALL_SHOP,
    DiversityMethods.UK_SMALL_HOTEL
  };

  /** A random three-phase board; every load item and position drawn from the seed. */
  static BoardSpec randomBoard(Random random, String methodKey, int circuitCount) {
    List<CircuitSpec> circuits = new ArrayList<>();
    LoadCategory[] categories = LoadCategory.values();
    RatingUnit[] units = RatingUnit.values();
    PhasePosition[] positions = PhasePosition.values();
    for (int c = 0; c < circuitCount; c++) {
      List<LoadSpec> loads = new ArrayList<>();
      int loadCount = 1 + random.nextInt(3);
      for (int l = 0; l < loadCount; l++) {
        RatingUnit unit = units[random.nextInt(units.length)];
        double rating = unit == RatingUnit.A ? 1 + random.nextInt(40) : 50 + random.nextInt(9_000);
        loads.add(
            new LoadSpec(
                "load",
                categories[random.nextInt(categories.length)],
                1 + random.nextInt(4),
                rating,
                unit,
                0.5 + 0.5 * random.nextDouble(),
                null,
                null,
                false));
      }
      circuits.add(
          new CircuitSpec(
              c + 1,
              c + 1,
              positions[random.nextInt(positions.length)],
              "way",
              WayStatus.IN_USE,
              false,
              Fixtures.mcb(32.0),
              null,
              loads,
              null,
              null));
    }
    return new BoardSpec(
        1,
        "DB1",
        3,
        circuitCount,
        400.0,
        Fixtures.mcb(400.0),
        null,
        null,
        10.0,
        1.0,
        methodKey,
        null,
        null,
        circuits);
  }

  @ParameterizedTest
  @ValueSource(longs = {1L, 2L, 3L, 42L, 1234L, 99_991L, 271_828L, 314_159L})
  void demandNeverExceedsConnectedLoad(long seed) {
    Random random = new Random(seed);
    for (String key : DIVERSIFYING) {
      BoardDemand demand = Fixtures.evaluate(randomBoard(random, key, 1 + random.nextInt(40)));

      assertThat(demand.demandVoltAmperes())
          .as("demand ≤ connected, method %s, seed %d", key, seed)
          .isLessThanOrEqualTo(demand.connectedVoltAmperes() * (1 + 1e-12));
    }
  }

  @ParameterizedTest
  @ValueSource(longs = {5L, 6L, 7L, 8L, 2024L, 777_777L})
  void perPhaseDemandsSumToTheBoardTotal(long seed) {
    Random random = new Random(seed);
    for (String key :
        DiversityMethods.builtIn().methods().stream().map(DiversityMethod::key).toList()) {
      BoardDemand demand =
          Fixtures.evaluate(
              randomBoard(random, key, 1 + random.nextInt(40)),
              new DwellingParameters(2_000.0, 2, 1));
      double sumOfCircuitWatts =
          demand.circuits().stream().mapToDouble(CircuitDemand::demandWatts).sum()
              + demand.allowanceVoltAmperes();
      double sumOfPhaseWatts = demand.phases().stream().mapToDouble(PhaseDemand::demandWatts).sum();

      assertThat(sumOfPhaseWatts)
          .as("phase sum = circuit sum, method %s, seed %d", key, seed)
          .isCloseTo(sumOfCircuitWatts, within(1e-6 * Math.max(1, sumOfCircuitWatts)));
    }
  }

  @ParameterizedTest
  @ValueSource(longs = {11L, 12L, 13L, 8_675_309L})
  void balancedThreePhaseLoadGivesNoNeutralCurrent(long seed) {
    Random random = new Random(seed);
    List<CircuitSpec> circuits = new ArrayList<>();
    for (int c = 0; c < 12; c++) {
      double rating = 100 + random.nextInt(5_000);
      double powerFactor = 0.6 + 0.4 * random.nextDouble();
      for (PhasePosition position :
          new PhasePosition[] {PhasePosition.L1, PhasePosition.L2, PhasePosition.L3}) {
        circuits.add(
            Fixtures.circuit(
                circuits.size() + 1,
                circuits.size() + 1,
                position,
                Fixtures.load(LoadCategory.OTHER, 1, rating, RatingUnit.VA, powerFactor)));
      }
      circuits.add(
          Fixtures.circuit(
              circuits.size() + 1,
              circuits.size() + 1,
              PhasePosition.THREE_POLE,
              Fixtures.load(LoadCategory.MOTOR, 1, rating, RatingUnit.VA, powerFactor)));
    }
    BoardDemand demand =
        Fixtures.evaluate(Fixtures.board(1, 3, null, DiversityMethods.NONE, 400.0, circuits));

    assertThat(demand.neutralCurrentAmps())
        .as("neutral current, seed %d", seed)
        .isCloseTo(0.0, within(1e-6));
  }

  @ParameterizedTest
  @ValueSource(longs = {21L, 22L, 23L, 55_555L})
  void resultsDoNotDependOnCircuitOrder(long seed) {
    Random random = new Random(seed);
    for (String key :
        DiversityMethods.builtIn().methods().stream().map(DiversityMethod::key).toList()) {
      BoardSpec board = randomBoard(random, key, 30);
      List<CircuitSpec> shuffled = new ArrayList<>(board.circuits());
      Collections.shuffle(shuffled, random);
      BoardSpec reordered =
          new BoardSpec(
              board.id(),
              board.reference(),
              board.phases(),
              board.wayCount(),
              board.busbarRatingAmps(),
              board.incomer(),
              board.parentBoardId(),
              board.submainCable(),
              board.unbalanceLimitPercent(),
              board.coincidenceFactor(),
              board.diversityMethodKey(),
              null,
              null,
              shuffled);
      DwellingParameters dwelling = new DwellingParameters(1_800.0, 2, 1);

      BoardDemand original = Fixtures.evaluate(board, dwelling);
      BoardDemand shuffledResult = Fixtures.evaluate(reordered, dwelling);

      for (int k = 0; k < original.phases().size(); k++) {
        assertThat(shuffledResult.phases().get(k).currentAmps())
            .as("phase %d current, method %s, seed %d", k + 1, key, seed)
            .isCloseTo(original.phases().get(k).currentAmps(), within(1e-9));
      }
    }
  }
}
