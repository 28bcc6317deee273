package com.wayledger.engine.protection.device;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.TripCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DeviceCharacteristicTests {

  // IEC 60898-1 Table 7 d/e: instantaneous bands B 3–5, C 5–10, D 10–20 × In (as in DESIGN.md and
  // the brief)
  @ParameterizedTest(name = "{0}{1}: {2}–{3} A")
  @CsvSource({"B, 16, 48, 80", "C, 16, 80, 160", "D, 16, 160, 320", "B, 32, 96, 160"})
  void instantaneousBandFollowsTheCurveMultiples(
      TripCurve curve, double in, double low, double high) {
    DeviceCharacteristic d = DeviceCharacteristic.miniature(DeviceKind.MCB, curve, in, null);
    assertThat(d.lowestInstantaneousAmps()).as("lower band edge").isCloseTo(low, within(1e-9));
    assertThat(d.highestInstantaneousAmps())
        .as("upper band edge (Ia)")
        .isCloseTo(high, within(1e-9));
  }

  // IEC 60898-1 Table 7 a/b: 1.13·In no trip, 1.45·In trip, within 1 h for In ≤ 63 A
  @Test
  void miniatureBreakerConventionalCurrentsAre113And145TimesIn() {
    DeviceCharacteristic d = DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 20, null);
    assertThat(d.conventionalNonTrippingAmps()).isCloseTo(22.6, within(1e-9));
    assertThat(d.conventionalTrippingAmps()).isCloseTo(29.0, within(1e-9));
    assertThat(d.conventionalTimeHours()).isEqualTo(1.0);
  }

  // IEC 60898-1 Table 7: conventional time 2 h above 63 A
  @Test
  void conventionalTimeIsTwoHoursAbove63Amps() {
    assertThat(McbStandard.conventionalTimeHours(80)).isEqualTo(2.0);
  }

  // IEC 60947-2 Table 6: 1.05·Ir non-tripping, 1.30·Ir tripping; instantaneous Ii ±20 %
  @Test
  void mouldedCaseBreakerUsesItsSettings() {
    DeviceCharacteristic d =
        DeviceCharacteristic.mouldedCase(160, new MccbSettings(125, 1250), false);
    assertThat(d.conventionalNonTrippingAmps()).isCloseTo(131.25, within(1e-9));
    assertThat(d.conventionalTrippingAmps()).isCloseTo(162.5, within(1e-9));
    assertThat(d.lowestInstantaneousAmps()).isCloseTo(1000, within(1e-9));
    assertThat(d.highestInstantaneousAmps()).isCloseTo(1500, within(1e-9));
  }

  @Test
  void mouldedCaseBreakerWithoutSettingsSaysTheyWereAssumed() {
    DeviceSpec spec = new DeviceSpec(DeviceKind.MCCB, null, 250.0, 3, 36.0, null, null);
    DeviceCharacteristic d = DeviceCharacteristic.of(spec, null, 10).value();
    assertThat(d.settingsAssumed()).isTrue();
    assertThat(d.overloadSettingAmps()).isEqualTo(250.0);
  }

  @Test
  void fuseHasNoCharacteristic() {
    DeviceSpec fuse = new DeviceSpec(DeviceKind.FUSE, null, 32.0, 1, 16.5, null, null);
    assertThat(DeviceCharacteristic.of(fuse, null, 10).missing()).contains("fuses");
  }

  @Test
  void breakerWithoutCurveIsMissingTheCurve() {
    DeviceSpec spec = new DeviceSpec(DeviceKind.MCB, null, 32.0, 1, 6.0, null, null);
    assertThat(DeviceCharacteristic.of(spec, null, 10).missing()).contains("trip curve");
  }

  // IEC 60898-1 (Ics/Icn): Ics = Icn up to 6 kA; 0.75·Icn, min 6 kA, to 10 kA; 0.5·Icn, min 7.5 kA
  // above (from memory;
  // the "Ics = Icn up to 6000 A" part agrees with a breaker maker's published FAQ)
  @ParameterizedTest(name = "Icn {0} kA → Ics {1} kA")
  @CsvSource({"3, 3", "6, 6", "10, 7.5", "15, 7.5", "20, 10", "25, 12.5"})
  void serviceCapacityFollowsTheIcnRatio(double icn, double ics) {
    assertThat(McbStandard.serviceBreakingCapacityKiloAmps(icn)).isCloseTo(ics, within(1e-9));
  }

  // (common practice) a fault of 10–100 × In clears on the instantaneous element, whatever the
  // curve
  @ParameterizedTest
  @CsvSource({"B", "C", "D"})
  void faultOfTwentyTimesInClearsOnTheInstantaneousElement(TripCurve curve) {
    DeviceCharacteristic d = DeviceCharacteristic.miniature(DeviceKind.MCB, curve, 32, null);
    assertThat(d.tripsInstantlyAt(20 * 32)).isTrue();
  }

  // (common practice) an overload of 2–5 × In is cleared by the thermal element, not the magnetic
  // one (type C, D)
  @ParameterizedTest
  @CsvSource({"C, 2", "C, 4.9", "D, 5"})
  void overloadOfFewTimesInDoesNotReachTheMagneticBand(TripCurve curve, double multiple) {
    DeviceCharacteristic d = DeviceCharacteristic.miniature(DeviceKind.MCB, curve, 20, null);
    assertThat(d.mayTripInstantlyAt(multiple * 20)).isFalse();
  }
}
