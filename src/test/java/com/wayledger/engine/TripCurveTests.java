package com.wayledger.engine;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class TripCurveTests {

  // IEC 60898-1 Table 7 (instantaneous tripping ranges), as summarised in BS 7671 Appendix 3 (from
  // memory):
  // type B above 3 In up to and including 5 In; C above 5 up to 10 In; D above 10 up to 20 In.
  @ParameterizedTest(name = "type {0}: instantaneous band {1}–{2} × In")
  @CsvSource({"B, 3, 5", "C, 5, 10", "D, 10, 20"})
  void instantaneousBandsFollowIec60898(TripCurve curve, double lowest, double highest) {
    assertThat(curve.lowestInstantMultiple()).as("lower edge of the band").isEqualTo(lowest);
    assertThat(curve.highestInstantMultiple()).as("upper edge of the band").isEqualTo(highest);
  }
}
