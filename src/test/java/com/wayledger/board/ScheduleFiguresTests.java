package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.CircuitDemand;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.springframework.test.util.ReflectionTestUtils;

/** The schedule's figures formatted in Java read exactly as the template used to write them. */
class ScheduleFiguresTests {

  private static final Locale UK = Locale.UK;

  private static Circuit circuitWithId(long id) {
    Circuit circuit = PageFixtures.circuit(PageFixtures.board());
    ReflectionTestUtils.setField(circuit, "id", id);
    return circuit;
  }

  private static CircuitDemand assessed(
      long id, double connectedWatts, double ibAmps, double demandWatts, double demandVars) {
    return new CircuitDemand(
        id,
        1,
        "invented",
        PhasePosition.L1,
        null,
        connectedWatts,
        0,
        ibAmps,
        ibAmps,
        demandWatts,
        demandVars,
        null,
        0);
  }

  @Test
  void singleLineCircuitPrintsKilowattsIbAndDemandCurrentAtU0() {
    Circuit circuit = circuitWithId(41);
    var rows = List.of(new ScheduleRow(2, Phase.L1, circuit, false, 1));

    var figures = ScheduleFigures.of(rows, Map.of(41L, assessed(41, 2300, 10, 2300, 0)), 230, UK);

    // 2300 W = 2.30 kW; 2300 VA / 230 V = 10.0 A (worked by hand)
    assertThat(figures.get(41L)).isEqualTo(new ScheduleFigures("2.30", "10.0", "10.0"));
  }

  @Test
  void threeRowCircuitPrintsItsDemandCurrentPerLine() {
    Circuit circuit = circuitWithId(42);
    var rows =
        List.of(
            new ScheduleRow(1, Phase.L1, circuit, false, 3),
            new ScheduleRow(1, Phase.L2, circuit, true, 3),
            new ScheduleRow(1, Phase.L3, circuit, true, 3));

    var figures =
        ScheduleFigures.of(rows, Map.of(42L, assessed(42, 12000, 21.74, 12000, 9000)), 230, UK);

    // |S| = hypot(12000 W, 9000 var) = 15000 VA; 15000 / 230 / 3 = 21.739 A → 21.7 (by hand)
    assertThat(figures.get(42L)).isEqualTo(new ScheduleFigures("12.00", "21.7", "21.7"));
  }

  @Test
  void circuitNotAssessedHasNoFiguresSoTheRowSaysNotAssessed() {
    Circuit circuit = circuitWithId(43);
    var rows = List.of(new ScheduleRow(3, Phase.L1, circuit, false, 1));
    var notAssessed =
        new CircuitDemand(43, 3, "invented", null, "missing rating", 0, 0, 0, 0, 0, 0, null, 0);

    var figures = ScheduleFigures.of(rows, Map.of(43L, notAssessed), 230, UK);

    assertThat(figures).as("a circuit not assessed prints no figures").doesNotContainKey(43L);
  }

  @Test
  void decimalTextEqualsThymeleafFormatDecimalForManyValuesAndTwoLocales() {
    long seed = 20261202L;
    Random random = new Random(seed);
    double[] edges = {0, -0.0, 0.05, 0.125, 0.135, 2.25, 2.35, 9.995, 1234567.891, -3.45, 1e-9};
    for (Locale locale : List.of(Locale.UK, Locale.GERMANY)) {
      for (int decimals = 0; decimals <= 2; decimals++) {
        for (double value : edges) {
          assertSameAsThymeleaf(value, decimals, locale, seed);
        }
        for (int i = 0; i < 2000; i++) {
          double value = (random.nextDouble() - 0.3) * Math.pow(10, random.nextInt(7));
          assertSameAsThymeleaf(value, decimals, locale, seed);
        }
      }
    }
  }

  private static void assertSameAsThymeleaf(double value, int decimals, Locale locale, long seed) {
    String expected = org.thymeleaf.util.NumberUtils.format(value, 1, decimals, locale);
    assertThat(ScheduleFigures.decimal(value, decimals, locale))
        .as("%s with %d decimals in %s (seed %d)", value, decimals, locale, seed)
        .isEqualTo(expected);
  }
}
