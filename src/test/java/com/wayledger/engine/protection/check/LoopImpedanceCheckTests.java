package com.wayledger.engine.protection.check;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.Verdict;
import org.junit.jupiter.api.Test;

class LoopImpedanceCheckTests {

  private static final LoopImpedanceCheck.Limits LIMITS =
      new LoopImpedanceCheck.Limits(0.95, 0.80, 50.0);
  private static final Resolved<DeviceCharacteristic> B32 =
      Resolved.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 32, null));

  // BS 7671 Table 41.3: B32 1.37 Ω
  @Test
  void calculatedZsJustBelowTheB32LimitPasses() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TN_C_S, 230, SourcedValue.calculated(1.36), B32, null, true, LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
  }

  // measured (cold) values compared with 80 % of the limit: 0.8 × 1.366 = 1.09 Ω (rule of thumb,
  // common practice)
  @Test
  void measuredZsIsComparedWithEightyPercentOfTheLimit() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TN_C_S, 230, SourcedValue.measured(1.20), B32, null, true, LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.value("Zs max (80 %)")).isCloseTo(0.8 * 0.95 * 230 / 160, within(1e-9));
    assertThat(f.summary()).contains("80 %");
  }

  // BS 7671 Table 41.5: 30 mA RCD in TT, Zs up to 50 V / 0.03 A = 1667 Ω
  @Test
  void ttCircuitWithRcdIsJudgedByTouchVoltage() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TT, 230, SourcedValue.calculated(200.0), B32, 30.0, true, LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
    assertThat(f.value("Zs max")).isCloseTo(1666.67, within(0.01));
  }

  @Test
  void ttCircuitWithoutRcdAndHighElectrodeResistanceIsDanger() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TT, 230, SourcedValue.calculated(21.0), B32, null, true, LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
  }

  @Test
  void tnCircuitAboveTheBreakerLimitButWithRcdReliesOnTheRcd() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TN_S, 230, SourcedValue.calculated(3.0), B32, 30.0, true, LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.ADVICE);
  }

  @Test
  void missingZeIsNotAssessed() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TN_S,
            230,
            SourcedValue.missing("Ze at the origin"),
            B32,
            null,
            true,
            LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("Ze at the origin");
  }

  @Test
  void fuseWithoutRcdIsNotAssessed() {
    var f =
        LoopImpedanceCheck.assess(
            EarthingSystem.TN_S,
            230,
            SourcedValue.calculated(0.5),
            Resolved.missing("a characteristic: the engine has none for fuses"),
            null,
            true,
            LIMITS);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("fuses");
  }
}
