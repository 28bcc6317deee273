package com.wayledger.engine.protection.result;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityTests {

  @ParameterizedTest(name = "{0} reads as {1}")
  @CsvSource({
    "9.720749381406858, 9.72",
    "7614.213, 7610",
    "0.45097514, 0.451",
    "16.0, 16",
    "2.73125, 2.73"
  })
  void figuresAreShownToThreeSignificantDigits(double value, String shown) {
    assertThat(new Quantity("x", value, "A").toString()).isEqualTo("x = " + shown + " A");
  }
}
