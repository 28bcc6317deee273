package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.load;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import org.junit.jupiter.api.Test;

class ConnectedLoadTests {

  private static final double U0 = 230.0;

  @Test
  void ratingInWattsAtLaggingPowerFactorGivesApparentPowerPOverCosPhi() {
    // by hand from S = P / cos φ, Q = S·sin φ: 2 × 1,000 W at 0.8 → S = 2,500 VA, Q = 1,500 var
    ConnectedLoad connected =
        ConnectedLoad.of(load(LoadCategory.MOTOR, 2, 1_000.0, RatingUnit.W, 0.8), U0, false);

    assertThat(connected.activeWatts()).isCloseTo(2_000.0, within(1e-9));
    assertThat(connected.reactiveVars()).isCloseTo(1_500.0, within(1e-9));
    assertThat(connected.apparentVoltAmperes()).isCloseTo(2_500.0, within(1e-9));
  }

  @Test
  void ratingInVoltAmperesIsApparentPower() {
    // by hand from P = S·cos φ: 1,000 VA at 0.6 → 600 W, 800 var
    ConnectedLoad connected =
        ConnectedLoad.of(
            load(LoadCategory.IT_SMALL_POWER, 1, 1_000.0, RatingUnit.VA, 0.6), U0, false);

    assertThat(connected.activeWatts()).isCloseTo(600.0, within(1e-9));
    assertThat(connected.reactiveVars()).isCloseTo(800.0, within(1e-9));
  }

  @Test
  void ratingInAmpsOnOneLineIsU0TimesCurrent() {
    // by hand from S = U0·I: 10 A at 230 V → 2,300 VA
    ConnectedLoad connected =
        ConnectedLoad.of(load(LoadCategory.OTHER, 1, 10.0, RatingUnit.A, 1.0), U0, false);

    assertThat(connected.apparentVoltAmperes()).isCloseTo(2_300.0, within(1e-9));
  }

  @Test
  void ratingInAmpsOnThreePolesIsRootThreeTimesLineVoltageTimesCurrent() {
    // by hand from S = √3·UL·I: 10 A per line at UL = √3 × 230 V → 3 × 230 × 10 = 6,900 VA
    ConnectedLoad connected =
        ConnectedLoad.of(load(LoadCategory.MOTOR, 1, 10.0, RatingUnit.A, 0.85), U0, true);

    assertThat(connected.apparentVoltAmperes())
        .isCloseTo(Math.sqrt(3) * Math.sqrt(3) * U0 * 10.0, within(1e-9));
  }

  @Test
  void singlePhaseDesignCurrentIsApparentPowerOverU0() {
    // by hand from Ib = S / U0: 3,000 VA / 230 V = 13.04 A
    assertThat(ConnectedLoad.designCurrentAmps(3_000.0, U0, false)).isCloseTo(13.043, within(1e-3));
  }

  @Test
  void threePoleDesignCurrentIsApparentPowerOverRootThreeLineVoltage() {
    // by hand from Ib = S / (√3·UL): 10,000 VA / (√3 × 398.4 V) = 14.49 A
    double lineVolts = Math.sqrt(3) * U0;
    assertThat(ConnectedLoad.designCurrentAmps(10_000.0, U0, true))
        .isCloseTo(10_000.0 / (Math.sqrt(3) * lineVolts), within(1e-9));
  }

  @Test
  void zeroPowerFactorIsNotAssessedAndNamesThePowerFactor() {
    ConnectedLoad connected =
        ConnectedLoad.of(load(LoadCategory.MOTOR, 1, 1_000.0, RatingUnit.W, 0.0), U0, false);

    assertThat(connected.isAssessed()).isFalse();
    assertThat(connected.missingInput()).contains("power factor");
  }

  @Test
  void zeroQuantityIsNotAssessed() {
    ConnectedLoad connected =
        ConnectedLoad.of(load(LoadCategory.MOTOR, 0, 1_000.0, RatingUnit.W, 1.0), U0, false);

    assertThat(connected.missingInput()).contains("quantity");
  }
}
