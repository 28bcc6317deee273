package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.result.Verdict;
import org.junit.jupiter.api.Test;

/** NEC 110.9: interrupting rating against the available fault current (common practice). */
class InterruptingRatingTests {

  @Test
  void tenKiloampBreakerOnA22KiloampPanelIsDanger() {
    assertThat(InterruptingRating.assess(10.0, 22.0, "recorded").verdict())
        .isEqualTo(Verdict.DANGER);
    assertThat(InterruptingRating.assess(22.0, 22.0, "recorded").verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void withoutAnAvailableFaultCurrentItIsNotAssessed() {
    DeviceSpec breaker = new DeviceSpec(DeviceKind.MCCB, null, 20.0, 1, 10.0, null, null);
    assertThat(InterruptingRating.assess(breaker, null, "").verdict())
        .isEqualTo(Verdict.NOT_ASSESSED);
    DeviceSpec unrated = new DeviceSpec(DeviceKind.MCCB, null, 20.0, 1, null, null, null);
    assertThat(InterruptingRating.assess(unrated, 10.0, "").summary())
        .contains("interrupting rating");
  }

  @Test
  void proposerPicksTheLowestCommonRatingCovering() {
    // common practice: breakers are listed at 10, 14, 18, 22, 25, 35, 42, 65, 100, 200 kA
    assertThat(InterruptingRating.lowestCovering(10.0)).isEqualTo(10.0);
    assertThat(InterruptingRating.lowestCovering(12.5)).isEqualTo(14.0);
    assertThat(InterruptingRating.lowestCovering(250.0)).isNull();
  }
}
