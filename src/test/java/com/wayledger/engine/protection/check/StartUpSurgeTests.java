package com.wayledger.engine.protection.check;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.RatingUnit;
import java.util.List;
import org.junit.jupiter.api.Test;

class StartUpSurgeTests {

  private static LoadSpec item(int quantity, double amps, Double surge) {
    return new LoadSpec(
        "x",
        LoadCategory.MOTOR,
        quantity,
        amps,
        RatingUnit.A,
        1.0,
        surge,
        surge == null ? null : 10.0,
        false);
  }

  // by hand from the rule "largest surge item + running current of the rest": 10 A × 6 + 10 A
  // (second motor) + 2 × 1 A = 72 A
  @Test
  void largestSurgeItemStartsWhileTheRestRun() {
    List<LoadSpec> loads = List.of(item(2, 10, 6.0), item(2, 1, null));
    assertThat(StartUpSurge.peakAmps(loads, 230, false).getAsDouble())
        .isCloseTo(72.0, within(1e-9));
  }

  @Test
  void noSurgeMultipleMeansNoSurge() {
    assertThat(StartUpSurge.peakAmps(List.of(item(1, 10, null)), 230, false)).isEmpty();
  }

  // by hand: 2300 W at cos φ 0.8 on 230 V single-phase = 12.5 A
  @Test
  void wattsAreTurnedIntoAmpsWithThePowerFactor() {
    LoadSpec load =
        new LoadSpec("x", LoadCategory.MOTOR, 1, 2300, RatingUnit.W, 0.8, null, null, false);
    assertThat(StartUpSurge.itemRunningAmps(load, 230, false)).isCloseTo(12.5, within(1e-9));
  }
}
