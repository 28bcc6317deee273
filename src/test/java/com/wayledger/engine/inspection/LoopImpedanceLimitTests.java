package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.Resolved;
import org.junit.jupiter.api.Test;

class LoopImpedanceLimitTests {

  private static final Resolved<DeviceCharacteristic> B32 =
      Resolved.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 32, null));

  @Test
  void measuredZsIsComparedWith80PercentOfTheTabulatedMaximum() {
    // BS 7671 Table 41.3 (Cmin 0.95): B32 max 0.95·230/160 = 1.37 Ω; 80 % rule (common practice)
    // gives 1.09 Ω
    GradedValue value = grade(1.05);
    assertThat(value.limit()).isEqualTo(0.8 * 0.95 * 230 / 160, offset(1e-9));
    assertThat(value.grade()).isEqualTo(Grade.PASS);
  }

  @Test
  void measuredZsAbove80PercentFailsEvenBelowTheTabulatedMaximum() {
    // 1.20 Ω < 1.37 Ω (Table 41.3) but > 1.09 Ω (80 %, common practice)
    assertThat(grade(1.20).grade()).isEqualTo(Grade.FAIL);
  }

  @Test
  void withoutADeviceCharacteristicZsIsNotAssessed() {
    GradedValue value =
        LoopImpedanceLimit.grade(
            0.5,
            EarthingSystem.TN_C_S,
            230,
            Resolved.missing("protective device"),
            null,
            0.8,
            0.95,
            50);
    assertThat(value.grade()).isEqualTo(Grade.NOT_ASSESSED);
    assertThat(value.message()).contains("protective device");
  }

  @Test
  void onTtWithAnRcdTheLimitIs80PercentOf50VoltsOverIdn() {
    // BS 7671 411.5.3: RA·IΔn ≤ 50 V → 1667 Ω at 30 mA; 80 % → 1333 Ω
    GradedValue value =
        LoopImpedanceLimit.grade(120.0, EarthingSystem.TT, 230, B32, 30.0, 0.8, 0.95, 50);
    assertThat(value.limit()).isEqualTo(0.8 * 50 / 0.030, offset(1e-9));
    assertThat(value.grade()).isEqualTo(Grade.PASS);
  }

  private static GradedValue grade(double zs) {
    return LoopImpedanceLimit.grade(zs, EarthingSystem.TN_C_S, 230, B32, null, 0.8, 0.95, 50);
  }
}
