package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Motor branch circuits under NEC Article 430 (sources beside each value). */
class NecMotorChecksTests {

  static LoadSpec motor(Double horsepower, double ratingAmps) {
    return new LoadSpec(
        "Pump motor",
        LoadCategory.MOTOR,
        1,
        ratingAmps,
        RatingUnit.A,
        0.8,
        null,
        null,
        true,
        horsepower);
  }

  static CircuitSpec circuit(
      PhasePosition position, double breakerAmps, ConductorSize size, LoadSpec... loads) {
    return new CircuitSpec(
        7,
        1,
        position,
        "Pump",
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.MCCB, null, breakerAmps, position.poles(), 10.0, null, null),
        new CableSpec(
            size.squareMillimetres(),
            null,
            ConductorMaterial.COPPER,
            Insulation.THERMOSETTING_90,
            15.0,
            null,
            30.0,
            1,
            0),
        List.of(loads),
        null,
        null);
  }

  static List<Finding> assess(CircuitSpec c, double ib) {
    return NecCircuitChecks.assess(
        CircuitContext.of(SupplySystem.SPLIT_PHASE_120_240, 120.0), c, ib);
  }

  static Finding finding(List<Finding> findings, CheckKind kind) {
    return findings.stream().filter(f -> f.check() == kind).findFirst().orElseThrow();
  }

  @Test
  void table430_248SpotValues() {
    // NEC Table 430.248 (from memory): 5 hp 230 V 28 A; 1 hp 115 V 16 A; 3 hp 208 V 18.7 A;
    // 1/2 hp 200 V 5.6 A; 10 hp 230 V 50 A
    assertThat(MotorTables.fullLoad(5, 240, false).orElseThrow().fullLoadAmps()).isEqualTo(28.0);
    assertThat(MotorTables.fullLoad(1, 120, false).orElseThrow().fullLoadAmps()).isEqualTo(16.0);
    assertThat(MotorTables.fullLoad(3, 208, false).orElseThrow().fullLoadAmps()).isEqualTo(18.7);
    assertThat(MotorTables.fullLoad(0.5, 200, false).orElseThrow().fullLoadAmps()).isEqualTo(5.6);
    assertThat(MotorTables.fullLoad(10, 230, false).orElseThrow().fullLoadAmps()).isEqualTo(50.0);
  }

  @Test
  void table430_250SpotValues() {
    // NEC Table 430.250 (from memory): 10 hp 460 V 14 A; 25 hp 208 V 74.8 A; 100 hp 460 V 124 A;
    // 5 hp 230 V 15.2 A; 1 hp 575 V 1.7 A
    assertThat(MotorTables.fullLoad(10, 480, true).orElseThrow().fullLoadAmps()).isEqualTo(14.0);
    assertThat(MotorTables.fullLoad(25, 208, true).orElseThrow().fullLoadAmps()).isEqualTo(74.8);
    assertThat(MotorTables.fullLoad(100, 460, true).orElseThrow().fullLoadAmps()).isEqualTo(124.0);
    assertThat(MotorTables.fullLoad(5, 230, true).orElseThrow().fullLoadAmps()).isEqualTo(15.2);
    assertThat(MotorTables.fullLoad(1, 600, true).orElseThrow().fullLoadAmps()).isEqualTo(1.7);
  }

  @Test
  void systemVoltageChoosesTheColumnTheNotesName() {
    // Tables 430.248/430.250 notes (from memory): 110–120 V → 115 V, 220–240 V → 230 V,
    // 440–480 V → 460 V, 550–600 V → 575 V; 200 and 208 V have their own columns
    assertThat(MotorTables.columnFor(120, false)).contains(115);
    assertThat(MotorTables.columnFor(240, false)).contains(230);
    assertThat(MotorTables.columnFor(207.8, true)).contains(208);
    assertThat(MotorTables.columnFor(480, true)).contains(460);
    assertThat(MotorTables.columnFor(600, true)).contains(575);
    // no single-phase column for a 277 V motor
    assertThat(MotorTables.fullLoad(1, 277, false)).isEmpty();
    // no three-phase 115 V entry above 2 hp (Table 430.250, from memory)
    assertThat(MotorTables.fullLoad(3, 115, true)).isEmpty();
  }

  @Test
  void horsepowerBetweenRowsReadsTheNextLargerRow() {
    // 4 hp is no row of Table 430.248: the 5 hp row (28 A at 230 V, from memory), the safe side
    MotorTables.Reading r = MotorTables.fullLoad(4, 240, false).orElseThrow();
    assertThat(r.tableHorsepower()).isEqualTo(5.0);
    assertThat(r.fullLoadAmps()).isEqualTo(28.0);
    assertThat(r.roundedUp(4)).isTrue();
  }

  @Test
  void fiveHorsepower230VoltMotorNeeds35AmpConductorAndAtMost70AmpBreaker() {
    // worked example: Table 430.248 5 hp 230 V FLC 28 A (from memory); 430.22: 1.25 × 28 = 35 A;
    // Table 430.52 inverse-time breaker 250 % × 28 = 70 A, a 240.6(A) standard rating
    // 8 AWG Cu, 60 °C column (110.14(C)(1)(a), circuit ≤ 100 A): 40 A (Table 310.16, from memory)
    CircuitSpec c = circuit(PhasePosition.L1_L2, 70, ConductorSize.AWG_8, motor(5.0, 24.0));
    List<Finding> findings = assess(c, 24.0);

    Finding conductor = finding(findings, CheckKind.MOTOR_CONDUCTOR);
    assertThat(conductor.verdict()).as(conductor.summary()).isEqualTo(Verdict.PASS);
    assertThat(conductor.value("table FLC")).isEqualTo(28.0);
    assertThat(conductor.value("required")).isCloseTo(35.0, within(1e-9));
    Finding breaker = finding(findings, CheckKind.MOTOR_BREAKER);
    assertThat(breaker.verdict()).as(breaker.summary()).isEqualTo(Verdict.PASS);
    assertThat(breaker.value("maximum")).isEqualTo(70.0);
    // 240.4(G): the 70 A breaker on 8 AWG is not a 240.4 fault on a motor circuit
    assertThat(finding(findings, CheckKind.CONDUCTOR_AMPACITY).verdict()).isEqualTo(Verdict.PASS);
    assertThat(finding(findings, CheckKind.CONDUCTOR_AMPACITY).reference()).contains("240.4(G)");
  }

  @Test
  void fiveHorsepowerMotorOnTenAwgOrAn80AmpBreakerFails() {
    // 10 AWG Cu 60 °C: 30 A (Table 310.16, from memory) < 35 A; 80 A > the 70 A maximum
    List<Finding> small =
        assess(circuit(PhasePosition.L1_L2, 70, ConductorSize.AWG_10, motor(5.0, 24.0)), 24.0);
    assertThat(finding(small, CheckKind.MOTOR_CONDUCTOR).verdict()).isEqualTo(Verdict.DANGER);
    List<Finding> large =
        assess(circuit(PhasePosition.L1_L2, 80, ConductorSize.AWG_8, motor(5.0, 24.0)), 24.0);
    assertThat(finding(large, CheckKind.MOTOR_BREAKER).verdict()).isEqualTo(Verdict.DANGER);
  }

  @Test
  void nextStandardRatingUpIsAllowedWhere250PercentFallsBetweenTwo() {
    // 430.52(C)(1) Exception No. 1: 2 hp 230 V 12 A (Table 430.248, from memory) × 250 % = 30 A;
    // 3 hp 230 V 17 A × 250 % = 42.5 A → 45 A is the next standard rating (240.6(A))
    assertThat(MotorCircuit.maximumRatingAmps(12.0, DeviceKind.MCCB)).isEqualTo(30);
    assertThat(MotorCircuit.maximumRatingAmps(17.0, DeviceKind.MCCB)).isEqualTo(45);
    // a fuse of unknown type is taken as time-delay, 175 %: 17 × 1.75 = 29.75 → 30 A
    assertThat(MotorCircuit.maximumRatingAmps(17.0, DeviceKind.FUSE)).isEqualTo(30);
  }

  @Test
  void motorWithoutHorsepowerIsNotAssessedNeverPassed() {
    List<Finding> findings =
        assess(circuit(PhasePosition.L1_L2, 70, ConductorSize.AWG_8, motor(null, 24.0)), 24.0);
    Finding conductor = finding(findings, CheckKind.MOTOR_CONDUCTOR);
    assertThat(conductor.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(conductor.summary()).contains("motor horsepower not recorded");
    assertThat(finding(findings, CheckKind.MOTOR_BREAKER).verdict())
        .isEqualTo(Verdict.NOT_ASSESSED);
    // without the table current the ordinary 240.4 check applies: 70 A on 8 AWG fails it
    assertThat(finding(findings, CheckKind.CONDUCTOR_AMPACITY).verdict()).isEqualTo(Verdict.DANGER);
  }

  @Test
  void threePhaseMotorReadsTable430_250AtTheLineVoltage() {
    // 208Y/120: √3 × 120 = 207.8 V → 208 V column; 10 hp 30.8 A (Table 430.250, from memory)
    CircuitSpec c = circuit(PhasePosition.THREE_POLE, 70, ConductorSize.AWG_8, motor(10.0, 30.0));
    MotorCircuit.Duty duty = MotorCircuit.duty(SupplySystem.WYE_208Y_120, 120.0, c);
    assertThat(duty.largestFullLoadAmps()).isEqualTo(30.8);
    assertThat(duty.requiredConductorAmps()).isCloseTo(1.25 * 30.8, within(1e-9));
  }

  static LoadSpec motors(double horsepower, int quantity) {
    return new LoadSpec(
        "Fan motor",
        LoadCategory.MOTOR,
        quantity,
        1.0,
        RatingUnit.A,
        0.8,
        null,
        null,
        false,
        horsepower);
  }

  static List<Finding> assess120(CircuitSpec c) {
    return NecCircuitChecks.assess(
        CircuitContext.of(SupplySystem.SPLIT_PHASE_120_240, 120.0), c, 10.0);
  }

  @Test
  void severalMotorsConductorIs125PercentOfTheLargestPlusTheOthers() {
    // 430.24 (from memory): 1.25 × 28 A (5 hp 230 V) + 12 A (2 hp 230 V) = 47 A; Table 430.248
    // 5 hp 230 V 28 A, 2 hp 230 V 12 A (from memory)
    CircuitSpec c =
        circuit(PhasePosition.L1_L2, 45, ConductorSize.AWG_6, motor(5.0, 24.0), motor(2.0, 10.0));
    MotorCircuit.Duty duty = MotorCircuit.duty(SupplySystem.SPLIT_PHASE_120_240, 120.0, c);
    assertThat(duty.singleMotor()).isFalse();
    assertThat(duty.requiredConductorAmps()).isCloseTo(1.25 * 28 + 12, within(1e-9));
    Finding conductor = finding(assess(c, 34.0), CheckKind.MOTOR_CONDUCTOR);
    assertThat(conductor.summary()).contains("430.24").contains("125 %");
  }

  @Test
  void breakerWithinTheSmallestMotorsMaximumPassesUnder430_53B() {
    // 430.53(B) with Table 430.52 (from memory): smallest motor 2 hp 230 V 12 A × 250 % = 30 A
    Finding breaker =
        finding(
            assess(
                circuit(
                    PhasePosition.L1_L2,
                    30,
                    ConductorSize.AWG_6,
                    motor(5.0, 24.0),
                    motor(2.0, 10.0)),
                34.0),
            CheckKind.MOTOR_BREAKER);
    assertThat(breaker.verdict()).as(breaker.summary()).isEqualTo(Verdict.PASS);
    assertThat(breaker.reference()).contains("430.53(B)");
    assertThat(breaker.value("430.53(B) maximum")).isEqualTo(30.0);
  }

  @Test
  void breakerAboveTheSmallestMotorsMaximumAsksForAGroupInstallation() {
    // 430.53(C)(4) (from memory): the largest motor's 430.52 maximum 70 A (5 hp 230 V, 28 A ×
    // 250 %) + the other motor's 12 A = 82 A; a 60 A breaker is above (B)'s 30 A
    Finding group =
        finding(
            assess(
                circuit(
                    PhasePosition.L1_L2,
                    60,
                    ConductorSize.AWG_6,
                    motor(5.0, 24.0),
                    motor(2.0, 10.0)),
                34.0),
            CheckKind.MOTOR_BREAKER);
    assertThat(group.verdict()).as(group.summary()).isEqualTo(Verdict.WARNING);
    assertThat(group.value("430.53(C) maximum")).isCloseTo(70.0 + 12.0, within(1e-9));
    assertThat(group.remedy()).contains("listed for group installation");
    Finding above =
        finding(
            assess(
                circuit(
                    PhasePosition.L1_L2,
                    90,
                    ConductorSize.AWG_3,
                    motor(5.0, 24.0),
                    motor(2.0, 10.0)),
                34.0),
            CheckKind.MOTOR_BREAKER);
    assertThat(above.verdict()).as(above.summary()).isEqualTo(Verdict.DANGER);
  }

  @Test
  void smallMotorsOnA20Amp120VoltCircuitAreAdviceToCheckOnSite() {
    // 430.53(A) (from memory): motors ≤ 1 hp, each ≤ 6 A, on a nominal 120 V circuit at ≤ 20 A.
    // Table 430.248 1/4 hp 115 V: 5.8 A (from memory); 430.52 for it: 5.8 × 250 % = 14.5 → 15 A
    CircuitSpec c = circuit(PhasePosition.L1, 20, ConductorSize.AWG_12, motors(0.25, 3));
    Finding breaker = finding(assess120(c), CheckKind.MOTOR_BREAKER);
    assertThat(breaker.verdict()).as(breaker.summary()).isEqualTo(Verdict.ADVICE);
    assertThat(breaker.reference()).contains("430.53(A)");
    assertThat(breaker.remedy()).contains("430.32");
    // 1/3 hp at 115 V: 7.2 A > 6 A (Table 430.248, from memory), so (A) does not apply; 430.52:
    // 7.2 × 250 % = 18 → 20 A, the next standard rating (240.6(A)), so (B) allows the 20 A
    Finding larger =
        finding(
            assess120(circuit(PhasePosition.L1, 20, ConductorSize.AWG_12, motors(1.0 / 3, 2))),
            CheckKind.MOTOR_BREAKER);
    assertThat(larger.reference()).doesNotContain("430.53(A)").contains("430.53(B)");
    assertThat(larger.verdict()).as(larger.summary()).isEqualTo(Verdict.PASS);
    assertThat(larger.value("430.53(B) maximum")).isEqualTo(20.0);
  }

  @Test
  void aMotorWithOtherLoadsIsAssessedUnder430_53NotLeftOut() {
    // one 1/2 hp 115 V motor 9.8 A (Table 430.248, from memory) and 5 A of lighting on 15 A:
    // 430.53(B): 9.8 × 250 % = 24.5 → 25 A ≥ 15 A, a pass
    LoadSpec light =
        new LoadSpec("Lights", LoadCategory.LIGHTING, 1, 600, RatingUnit.W, 1.0, null, null, false);
    Finding breaker =
        finding(
            assess120(circuit(PhasePosition.L1, 15, ConductorSize.AWG_14, motors(0.5, 1), light)),
            CheckKind.MOTOR_BREAKER);
    assertThat(breaker.verdict()).as(breaker.summary()).isEqualTo(Verdict.PASS);
    assertThat(breaker.value("430.53(B) maximum")).isEqualTo(25.0);
  }
}
