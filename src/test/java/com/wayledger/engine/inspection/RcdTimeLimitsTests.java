package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class RcdTimeLimitsTests {

  @Test
  void generalTypeLimitsAre300And40Milliseconds() {
    // IEC 61008-1 / IEC 61009-1 Table 1: general type 300 ms at IΔn, 40 ms at 5·IΔn
    assertThat(RcdTimeLimits.GENERAL_MAX_AT_RATED_MILLIS).isEqualTo(300.0, within());
    assertThat(RcdTimeLimits.GENERAL_MAX_AT_FIVE_TIMES_MILLIS).isEqualTo(40.0, within());
  }

  @Test
  void generalTypeAtRatedCurrentFailsAbove300Milliseconds() {
    // IEC 61008-1 Table 1: 300 ms at IΔn
    assertThat(RcdTimeLimits.atRated(298.0, false).grade()).isEqualTo(Grade.PASS);
    assertThat(RcdTimeLimits.atRated(312.0, false).grade()).isEqualTo(Grade.FAIL);
  }

  @Test
  void generalTypeAtFiveTimesFailsAbove40Milliseconds() {
    // IEC 61008-1 Table 1: 40 ms at 5·IΔn
    assertThat(RcdTimeLimits.atFiveTimes(38.0, false).grade()).isEqualTo(Grade.PASS);
    assertThat(RcdTimeLimits.atFiveTimes(44.0, false).grade()).isEqualTo(Grade.FAIL);
  }

  @Test
  void delayTypeAtRatedCurrentMustLieBetween130And500Milliseconds() {
    // IEC 61008-1 Table 1, type S (from memory): 130 ms min, 500 ms max at IΔn
    assertThat(RcdTimeLimits.atRated(120.0, true).grade()).isEqualTo(Grade.FAIL);
    assertThat(RcdTimeLimits.atRated(350.0, true).grade()).isEqualTo(Grade.PASS);
    assertThat(RcdTimeLimits.atRated(510.0, true).grade()).isEqualTo(Grade.FAIL);
  }

  @Test
  void delayTypeAtFiveTimesMustLieBetween50And150Milliseconds() {
    // IEC 61008-1 Table 1, type S (from memory): 50 ms min, 150 ms max at 5·IΔn
    assertThat(RcdTimeLimits.atFiveTimes(45.0, true).grade()).isEqualTo(Grade.FAIL);
    assertThat(RcdTimeLimits.atFiveTimes(120.0, true).grade()).isEqualTo(Grade.PASS);
    assertThat(RcdTimeLimits.atFiveTimes(160.0, true).grade()).isEqualTo(Grade.FAIL);
  }

  @Test
  void aTooFastDelayTypeSaysWhyItFails() {
    assertThat(RcdTimeLimits.atRated(90.0, true).message())
        .contains("faster than the type S minimum");
  }

  @Test
  void unmeasuredTimeIsNotAssessed() {
    assertThat(RcdTimeLimits.atRated(null, false).grade()).isEqualTo(Grade.NOT_ASSESSED);
  }

  private static org.assertj.core.data.Offset<Double> within() {
    return org.assertj.core.data.Offset.offset(1e-9);
  }
}
