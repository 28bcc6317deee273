package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class RingContinuityTests {

  @Test
  void endToEndLineAndNeutralWithin5HundredthsAgree() {
    // common practice: r1 and rn agree within 0.05 Ω
    List<GradedValue> values = RingContinuity.grade(0.52, 0.55, 0.86, null, 2.5, 1.5);
    assertThat(values.get(0).grade()).as("r1/rn").isEqualTo(Grade.PASS);
  }

  @Test
  void endToEndLineAndNeutralApartByMoreThan5HundredthsFail() {
    // common practice: r1 and rn agree within 0.05 Ω
    List<GradedValue> values = RingContinuity.grade(0.52, 0.61, 0.86, null, 2.5, 1.5);
    assertThat(values.get(0).grade()).as("r1/rn").isEqualTo(Grade.FAIL);
  }

  @Test
  void protectiveEndToEndIsAbout1Point67TimesLineFor2Point5On1Point5() {
    // common practice: r2 ≈ 1.67 × r1 for 2.5/1.5 mm² (csa ratio 2.5/1.5)
    assertThat(RingContinuity.grade(0.50, 0.50, 0.84, null, 2.5, 1.5).get(1).grade())
        .isEqualTo(Grade.PASS);
    assertThat(RingContinuity.grade(0.50, 0.50, 0.95, null, 2.5, 1.5).get(1).grade())
        .isEqualTo(Grade.FAIL);
  }

  @Test
  void crossConnectedReadingIsAQuarterOfTheEndToEndSum() {
    // common practice: (r1 + r2)/4 = (0.50 + 0.84)/4 = 0.335 Ω
    assertThat(RingContinuity.grade(0.50, 0.50, 0.84, 0.34, 2.5, 1.5).get(2).grade())
        .isEqualTo(Grade.PASS);
    assertThat(RingContinuity.grade(0.50, 0.50, 0.84, 0.45, 2.5, 1.5).get(2).grade())
        .isEqualTo(Grade.FAIL);
  }

  @Test
  void missingEndToEndReadingsAreNotAssessed() {
    List<GradedValue> values = RingContinuity.grade(null, null, null, 0.3, 2.5, 1.5);
    assertThat(values).allMatch(v -> v.grade() == Grade.NOT_ASSESSED);
  }
}
