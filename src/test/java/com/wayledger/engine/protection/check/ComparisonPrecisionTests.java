package com.wayledger.engine.protection.check;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.protection.result.Verdict;
import org.junit.jupiter.api.Test;

/** A verdict must be visible in the figures printed beside it. */
class ComparisonPrecisionTests {

  @Test
  void zsJustAboveItsLimitIsPrintedWithTheDigitsThatShowIt() {
    String[] shown = Rounding.comparedOhms(0.364, 0.3599);

    assertThat(shown[0]).isEqualTo("0.364 Ω");
    assertThat(shown[1]).isEqualTo("0.360 Ω");
  }

  // BS 7671 Appendix 12: 3 % for lighting on a public supply (the limit compared with)
  @Test
  void voltageDropJustAboveThreePercentDoesNotReadAsThreeAboveThree() {
    var f = VoltageDropCheck.assess(1.0, 2.04, 3.0, true);

    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.summary()).contains("3.04 %").contains("3.00 %");
  }

  @Test
  void passingComparisonsKeepTheTradesFixedDecimals() {
    var f = OverloadCheck.assess(9.72, 16.0);

    assertThat(f.summary()).isEqualTo("Ib 9.7 A ≤ In 16.0 A");
  }
}
