package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import com.wayledger.engine.ConductorMaterial;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ContinuityLimitsTests {

  // IEC 60228 Table 2 (from memory): copper 1.0 mm² 18.1, 1.5 mm² 12.1, 2.5 mm² 7.41, 4 mm² 4.61,
  // 6 mm² 3.08 Ω/km at 20 °C; temperature correction 1 + 0.004·(θ − 20) (α20 of copper, rounded).
  @ParameterizedTest(name = "{0}/{1} mm², {2} m at {3} °C → {4} Ω")
  @CsvSource({
    // 2.5/1.5: (7.41 + 12.1) = 19.51 mΩ/m × 20 m
    "2.5, 1.5, 20, 20, 0.3902",
    // 1.5/1.0: (12.1 + 18.1) = 30.2 mΩ/m × 30 m
    "1.5, 1.0, 30, 20, 0.906",
    // 6/2.5: 10.49 mΩ/m × 15 m × 0.96 at 10 °C
    "6, 2.5, 15, 10, 0.151056",
    // 4/1.5: 16.71 mΩ/m × 25 m × 1.04 at 30 °C
    "4, 1.5, 25, 30, 0.43446"
  })
  void expectedR1PlusR2FollowsIec60228WithTemperatureCorrection(
      double line, double cpc, double metres, double celsius, double expectedOhms) {
    assertThat(
            ContinuityLimits.expectedR1PlusR2Ohms(
                    ConductorMaterial.COPPER, line, cpc, metres, celsius)
                .value())
        .as("expected R1+R2 of %s/%s mm² over %s m at %s °C", line, cpc, metres, celsius)
        .isEqualTo(expectedOhms, offset(1e-6));
  }

  @Test
  void readingFarAboveExpectedFailsAsLooseOrBrokenConductor() {
    var expected =
        ContinuityLimits.expectedR1PlusR2Ohms(ConductorMaterial.COPPER, 2.5, 1.5, 20.0, 20);
    GradedValue value = ContinuityLimits.grade("R1+R2", 0.95, expected, "2.5/1.5 mm²");
    assertThat(value.grade()).isEqualTo(Grade.FAIL);
    assertThat(value.message()).contains("loose or broken");
  }

  @Test
  void readingNearExpectedPasses() {
    var expected =
        ContinuityLimits.expectedR1PlusR2Ohms(ConductorMaterial.COPPER, 2.5, 1.5, 20.0, 20);
    assertThat(ContinuityLimits.grade("R1+R2", 0.42, expected, "2.5/1.5 mm²").grade())
        .isEqualTo(Grade.PASS);
  }

  @Test
  void withoutARecordedLengthTheReadingIsNotAssessedAndSaysWhy() {
    var expected =
        ContinuityLimits.expectedR1PlusR2Ohms(ConductorMaterial.COPPER, 2.5, 1.5, null, 20);
    GradedValue value = ContinuityLimits.grade("R1+R2", 0.4, expected, "");
    assertThat(value.grade()).isEqualTo(Grade.NOT_ASSESSED);
    assertThat(value.message()).contains("cable length");
  }

  @Test
  void readingThatMatches1Point5On1Point0ContradictsA2Point5On1Point5Record() {
    // 1.5/1.0 mm² is 30.2 mΩ/m (IEC 60228 from memory): 20 m reads 0.604 Ω
    var mismatch = ContinuityLimits.recordMismatch(0.604, 20, 20, 2.5, 1.5);
    assertThat(mismatch).hasSize(1);
    assertThat(mismatch.get(0).kind()).isEqualTo(TestKind.RECORD_MISMATCH);
    assertThat(mismatch.get(0).message()).contains("1.5/1 mm²", "2.5/1.5 mm²");
  }

  @Test
  void readingsTooSmallToTellSizesApartRaiseNoMismatch() {
    // 10/4 mm² over 11 m is 0.07 Ω (IEC 60228 from memory); 0.09 Ω would match 4/4 mm², but below
    // 0.25 Ω the leads and terminations weigh too much (Wayledger's own threshold)
    assertThat(ContinuityLimits.recordMismatch(0.09, 11, 20, 10, 4)).isEmpty();
  }

  @Test
  void readingThatMatchesTheRecordRaisesNoMismatch() {
    assertThat(ContinuityLimits.recordMismatch(0.39, 20, 20, 2.5, 1.5)).isEmpty();
  }
}
