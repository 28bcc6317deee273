package com.wayledger.engine.protection.check;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.device.MccbSettings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.Verdict;
import org.junit.jupiter.api.Test;

/**
 * The Zs check on a 125 A moulded-case breaker, worked by hand: Zs max = Cmin·U0/Ia with Ia =
 * 1.2·Ii (the upper end of the ±20 % instantaneous tolerance of IEC 60947-2 8.3.3.1.2, from
 * memory), Cmin = 0.95, U0 = 230 V.
 *
 * <ul>
 *   <li>Assumed Ii = 10·In = 1250 A: Ia = 1500 A, Zs max = 0.95·230/1500 = 218.5/1500 = 0.14567 Ω.
 *   <li>Recorded Ii = 5·In = 625 A: Ia = 750 A, Zs max = 218.5/750 = 0.29133 Ω.
 * </ul>
 *
 * A calculated Zs of 0.20 Ω therefore fails with the assumption and passes with the recorded
 * setting.
 */
class MccbLoopImpedanceTests {

  private static final DeviceSpec MCCB_125 =
      new DeviceSpec(DeviceKind.MCCB, null, 125.0, 3, 25.0, null, null);
  private static final LoopImpedanceCheck.Limits LIMITS =
      new LoopImpedanceCheck.Limits(0.95, 0.8, 50.0);

  private static Finding check(MccbSettings recorded) {
    return LoopImpedanceCheck.assess(
        EarthingSystem.TN_C_S,
        230.0,
        SourcedValue.calculated(0.20),
        DeviceCharacteristic.of(
            MCCB_125, recorded, ProtectionSettings.DEFAULT_MCCB_INSTANTANEOUS_MULTIPLE),
        null,
        false,
        LIMITS);
  }

  private static double value(Finding finding, String name) {
    return finding.values().stream()
        .filter(q -> q.name().equals(name))
        .mapToDouble(Quantity::value)
        .findFirst()
        .orElseThrow();
  }

  @Test
  void assumedSettingsGiveTheTenTimesLimitAndSaySo() {
    Finding finding = check(null);

    assertThat(value(finding, "Ia")).isCloseTo(1500.0, within(1e-9));
    assertThat(value(finding, "Zs max")).isCloseTo(0.14567, within(0.00001));
    assertThat(finding.verdict().isProblem()).isTrue();
    assertThat(finding.summary()).contains("MCCB 125 A (Ir 125 A, Ii 1250 A, assumed)");
  }

  @Test
  void recordedFiveTimesSettingDoublesTheLimitAndSaysItWasRecorded() {
    Finding finding = check(new MccbSettings(125.0, 625.0));

    assertThat(value(finding, "Ia")).isCloseTo(750.0, within(1e-9));
    assertThat(value(finding, "Zs max")).isCloseTo(0.29133, within(0.00001));
    assertThat(finding.verdict()).isEqualTo(Verdict.PASS);
    assertThat(finding.summary())
        .contains("MCCB 125 A (Ir 125 A, Ii 625 A, recorded)")
        .doesNotContain("assumed");
  }
}
