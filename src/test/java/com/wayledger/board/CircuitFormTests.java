package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Conduit;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.Insulation;
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

  @Test
  void everyWitherKeepsTheNorthAmericanFieldsOfTheRow() {
    // a breaker on an NEC panel: room, GFCI breaker, 12 AWG typed in site units, PVC conduit
    CircuitForm nec =
        CircuitForm.blankAt(5, PhasePosition.L1)
            .inUseAs(
                "Kitchen counter", new DeviceSpec(DeviceKind.MCB, null, 20.0, 1, 10.0, null, null))
            .at(CircuitLocation.OUTDOORS)
            .withLocationAndFaultInterrupter(CircuitLocation.OUTDOORS, FaultInterrupter.GFCI)
            .withCableUnits(3.31, 3.31, 12.19, "12 AWG", "12 AWG", 40.0)
            .withCableConduit(Conduit.PVC);
    for (CircuitForm copy :
        java.util.List.of(
            nec.withConductor(ConductorMaterial.COPPER, Insulation.THERMOPLASTIC_70),
            nec.withThermalInsulationMm(100),
            nec.withRingFinal(false),
            nec.withMccbSettings(null, null),
            nec.inUseAs("Kitchen counter east", null))) {
      assertThat(copy.location()).isEqualTo(CircuitLocation.OUTDOORS);
      assertThat(copy.deviceFaultInterrupter()).isEqualTo(FaultInterrupter.GFCI);
      assertThat(copy.cableLineSize()).isEqualTo("12 AWG");
      assertThat(copy.cableCpcSize()).isEqualTo("12 AWG");
      assertThat(copy.cableLengthFeet()).isEqualTo(40.0);
      assertThat(copy.cableConduit()).isEqualTo(Conduit.PVC);
    }
  }
}
