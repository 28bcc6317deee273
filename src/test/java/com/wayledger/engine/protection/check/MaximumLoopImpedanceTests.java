package com.wayledger.engine.protection.check;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * BS 7671:2018 Table 41.3, maximum Zs for 0.4 s (and 5 s) disconnection, circuit-breakers, U0 230
 * V, Cmin 0.95 (from memory; the B32 1.37, C20 1.09, B16 2.73 and D16 0.68 figures are also quoted
 * in the project brief). The table is rounded to 2 decimals, so the computed value must round to
 * it.
 */
class MaximumLoopImpedanceTests {

  @ParameterizedTest(name = "{0}{1}: {2} Ω")
  @CsvSource({
    "B, 6, 7.28",
    "B, 16, 2.73",
    "B, 32, 1.37",
    "B, 40, 1.09",
    "B, 63, 0.69",
    "C, 10, 2.19",
    "C, 20, 1.09",
    "C, 32, 0.68",
    "D, 16, 0.68",
    "D, 32, 0.34"
  })
  void computedLimitMatchesTable413(TripCurve curve, double in, double tableOhms) {
    DeviceCharacteristic d = DeviceCharacteristic.miniature(DeviceKind.MCB, curve, in, null);
    double limit = LoopImpedanceCheck.maxLoopImpedanceOhms(0.95, 230, d.highestInstantaneousAmps());
    assertThat(limit)
        .as("0.95 × 230 / Ia for %s%s", curve, in)
        .isCloseTo(tableOhms, within(0.005 + 1e-9));
  }
}
