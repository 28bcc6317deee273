package com.wayledger.engine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SupplySpecTests {

  @Test
  void lineVoltageOfA230VoltSupplyIsNominally400Volts() {
    SupplySpec supply = new SupplySpec(EarthingSystem.TN_C_S, 230.0, 3, 50.0, null, null, null);
    // IEC 60038 Table 1 (from memory): 230/400 V systems; √3 × 230 = 398.4 V, quoted as 400 V.
    assertThat(supply.lineVoltageVolts()).as("UL = √3·U0").isCloseTo(398.37, within(0.01));
  }

  @Test
  void threePolePositionOccupiesAllLinesAndSinglePoleOnlyItsOwn() {
    assertThat(PhasePosition.THREE_POLE.phases()).containsExactly(Phase.L1, Phase.L2, Phase.L3);
    assertThat(PhasePosition.L2.phases()).containsExactly(Phase.L2);
    assertThat(PhasePosition.on(Phase.L3)).isEqualTo(PhasePosition.L3);
  }

  @Test
  void lineAnglesAreTheStandardPositiveSequence() {
    // IEC 60050-141 (from memory): the three lines of a symmetrical system are displaced by 120°.
    assertThat(Phase.L2.angleDegrees() - Phase.L1.angleDegrees()).isEqualTo(-120.0);
    assertThat(Phase.L3.angleDegrees() - Phase.L1.angleDegrees()).isEqualTo(120.0);
  }

  @Test
  void onlyBreakersWithAMagneticElementHaveACurveLetter() {
    assertThat(DeviceKind.MCB.hasCurve()).isTrue();
    assertThat(DeviceKind.RCBO.hasCurve()).isTrue();
    assertThat(DeviceKind.FUSE.hasCurve()).isFalse();
    assertThat(DeviceKind.RCD.protectsAgainstOvercurrent())
        .as("an RCD alone gives no overcurrent protection")
        .isFalse();
  }
}
