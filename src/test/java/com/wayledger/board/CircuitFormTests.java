package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import org.junit.jupiter.api.Test;

class CircuitFormTests {

  private final CircuitForm spareMccb =
      CircuitForm.blankAt(3, PhasePosition.THREE_POLE)
          .inUseAs("Spare 100 A", new DeviceSpec(DeviceKind.MCCB, null, 100.0, 3, 25.0, null, null))
          .withMccbSettings(80.0, 500.0)
          .withRingFinal(false);

  @Test
  void puttingASpareInUseWithItsOwnDeviceKeepsTheBreakerSettings() {
    CircuitForm inUse = spareMccb.inUseAs("Kitchen extract", null);
    assertThat(inUse.status()).isEqualTo(WayStatus.IN_USE);
    assertThat(inUse.description()).isEqualTo("Kitchen extract");
    assertThat(inUse.deviceRatingAmps()).isEqualTo(100.0);
    assertThat(inUse.deviceOverloadSettingAmps()).as("Ir kept").isEqualTo(80.0);
    assertThat(inUse.deviceInstantaneousSettingAmps()).as("Ii kept").isEqualTo(500.0);
  }

  @Test
  void aReplacementDeviceDropsTheOldBreakersSettingsAndTheFirstLoad() {
    CircuitForm inUse =
        CircuitForm.blankAt(4, PhasePosition.L2)
            .withMccbSettings(80.0, 500.0)
            .inUseAs(
                "Charger", new DeviceSpec(DeviceKind.MCB, TripCurve.B, 32.0, 1, 6.0, null, null));
    assertThat(inUse.deviceKind()).isEqualTo(DeviceKind.MCB);
    assertThat(inUse.deviceCurve()).isEqualTo(TripCurve.B);
    assertThat(inUse.deviceOverloadSettingAmps()).isNull();
    assertThat(inUse.deviceInstantaneousSettingAmps()).isNull();
    assertThat(inUse.hasFirstLoad()).as("the blank row's first load is not carried").isFalse();
  }

  @Test
  void withersChangeOnlyTheirOwnField() {
    CircuitForm insulated = spareMccb.withThermalInsulationMm(400).withRingFinal(true);
    assertThat(insulated.cableThermalInsulationMm()).isEqualTo(400);
    assertThat(insulated.ringFinal()).isTrue();
    assertThat(insulated.deviceOverloadSettingAmps()).isEqualTo(80.0);
    assertThat(insulated.description()).isEqualTo(spareMccb.description());
  }
}
