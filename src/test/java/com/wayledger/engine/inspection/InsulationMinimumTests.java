package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.inspection.InsulationMinimum.VoltageBand;
import org.junit.jupiter.api.Test;

class InsulationMinimumTests {

  @Test
  void lowVoltageCircuitsAreTestedAt500VoltsWithOneMegaohmMinimum() {
    // BS 7671 Table 64 / IEC 60364-6 Table 6.1 (from memory): up to 500 V — 500 V DC, ≥ 1.0 MΩ
    assertThat(VoltageBand.ofNominalVolts(400)).isEqualTo(VoltageBand.UP_TO_500_VOLTS);
    assertThat(VoltageBand.UP_TO_500_VOLTS.testVolts()).isEqualTo(500.0);
    assertThat(VoltageBand.UP_TO_500_VOLTS.minimumMegaohms()).isEqualTo(1.0);
  }

  @Test
  void extraLowVoltageBandNeedsHalfAMegaohmAt250Volts() {
    // BS 7671 Table 64 (from memory): SELV and PELV — 250 V DC, ≥ 0.5 MΩ
    assertThat(VoltageBand.ofNominalVolts(24)).isEqualTo(VoltageBand.SELV_PELV);
    assertThat(VoltageBand.SELV_PELV.testVolts()).isEqualTo(250.0);
    assertThat(VoltageBand.SELV_PELV.minimumMegaohms()).isEqualTo(0.5);
  }

  @Test
  void above500VoltsIsTestedAt1000VoltsWithOneMegaohmMinimum() {
    // BS 7671 Table 64 (from memory): above 500 V — 1000 V DC, ≥ 1.0 MΩ
    assertThat(VoltageBand.ofNominalVolts(690)).isEqualTo(VoltageBand.ABOVE_500_VOLTS);
    assertThat(VoltageBand.ABOVE_500_VOLTS.testVolts()).isEqualTo(1000.0);
    assertThat(VoltageBand.ABOVE_500_VOLTS.minimumMegaohms()).isEqualTo(1.0);
  }

  @Test
  void readingBelowTheMinimumFailsAndSaysSo() {
    GradedValue value = InsulationMinimum.grade("IR L–E", 0.8, VoltageBand.UP_TO_500_VOLTS, 500.0);
    assertThat(value.grade()).isEqualTo(Grade.FAIL);
    assertThat(value.message()).contains("0.80 MΩ", "below the minimum", "1.00 MΩ");
  }

  @Test
  void readingAtTheMinimumPasses() {
    assertThat(InsulationMinimum.grade("IR L–E", 1.0, VoltageBand.UP_TO_500_VOLTS, 500.0).grade())
        .isEqualTo(Grade.PASS);
  }

  @Test
  void missingReadingIsNotAssessedNeverPassed() {
    GradedValue value = InsulationMinimum.grade("IR N–E", null, VoltageBand.UP_TO_500_VOLTS, 500.0);
    assertThat(value.grade()).isEqualTo(Grade.NOT_ASSESSED);
    assertThat(value.message()).startsWith("not assessed").contains("not measured");
  }

  @Test
  void reducedTestVoltageIsNamedInTheFinding() {
    GradedValue value = InsulationMinimum.grade("IR L–E", 50.0, VoltageBand.UP_TO_500_VOLTS, 250.0);
    assertThat(value.message()).contains("tested at 250 V");
  }
}
