package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;

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

/** The NEC circuit checks on circuits typed from the code's own figures (sources beside each). */
class NecCircuitChecksTests {

  static CableSpec cable(
      ConductorSize size, Insulation insulation, Double ambient, Integer grouped) {
    return new CableSpec(
        size.squareMillimetres(),
        null,
        ConductorMaterial.COPPER,
        insulation,
        15.0,
        null,
        ambient,
        grouped,
        0);
  }

  static CircuitSpec circuit(
      PhasePosition position, int poles, double breakerAmps, CableSpec cable, LoadSpec... loads) {
    return new CircuitSpec(
        1,
        1,
        position,
        "circuit",
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.MCB, null, breakerAmps, poles, 10.0, null, null),
        cable,
        List.of(loads),
        null,
        null);
  }

  static LoadSpec load(double watts, boolean continuous) {
    return new LoadSpec(
        "load", LoadCategory.LIGHTING, 1, watts, RatingUnit.W, 1.0, null, null, continuous);
  }

  static Finding finding(List<Finding> findings, CheckKind kind) {
    return findings.stream().filter(f -> f.check() == kind).findFirst().orElseThrow();
  }

  static List<Finding> assess(CircuitSpec circuit, Double ib) {
    return NecCircuitChecks.assess(SupplySystem.SPLIT_PHASE_120_240, 120.0, circuit, ib);
  }

  @Test
  void twentyAmpBreakerOnFourteenAwgCopperFails240_4D() {
    // NEC 240.4(D)(3): 14 AWG copper not above 15 A
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            20.0,
            cable(ConductorSize.AWG_14, Insulation.THERMOSETTING_90, 30.0, 1),
            load(1200, false));

    Finding f = finding(assess(c, 10.0), CheckKind.SMALL_CONDUCTOR);

    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.reference()).contains("240.4(D)");
    assertThat(f.value("240.4(D) limit")).isEqualTo(15.0);
  }

  @Test
  void fifteenAmpBreakerOnFourteenAwgCopperPasses240_4D() {
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            15.0,
            cable(ConductorSize.AWG_14, Insulation.THERMOSETTING_90, 30.0, 1),
            load(1200, false));

    assertThat(finding(assess(c, 10.0), CheckKind.SMALL_CONDUCTOR).verdict())
        .isEqualTo(Verdict.PASS);
  }

  @Test
  void onePoleBreakerOnATwoPolePositionIsDangerous() {
    CircuitSpec c =
        circuit(
            PhasePosition.L1_L2,
            1,
            30.0,
            cable(ConductorSize.AWG_10, Insulation.THERMOSETTING_90, 30.0, 1),
            load(4800, false));

    Finding f = finding(assess(c, 20.0), CheckKind.POLE_COUNT);

    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.summary()).contains("1-pole device on a 2-pole position");
  }

  @Test
  void ninetyDegreeConductorIsAdjustedForNineCurrentCarryingConductors() {
    // 12 AWG Cu 90 °C: Table 310.16 30 A × 0.70 (7–9 conductors, Table 310.15(C)(1)) = 21 A ≥ 20 A;
    // four 2-wire circuits grouped = 8 current-carrying conductors
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            20.0,
            cable(ConductorSize.AWG_12, Insulation.THERMOSETTING_90, 30.0, 4),
            load(1200, false));

    Finding f = finding(assess(c, 10.0), CheckKind.CONDUCTOR_AMPACITY);

    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
    assertThat(f.value("ampacity")).isEqualTo(30.0 * 0.70);
  }

  @Test
  void hotAmbientAndManyConductorsLeaveTheConductorUnprotected() {
    // 12 AWG Cu 90 °C at 45 °C with 10 conductors: 30 A × 0.87 × 0.50 = 13.05 A < 20 A, and the
    // next standard rating above 13.05 A is 15 A, so 240.4(B) does not save it
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            20.0,
            cable(ConductorSize.AWG_12, Insulation.THERMOSETTING_90, 45.0, 5),
            load(1200, false));

    Finding f = finding(assess(c, 10.0), CheckKind.CONDUCTOR_AMPACITY);

    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.value("ampacity")).isEqualTo(30.0 * 0.87 * 0.50);
  }

  @Test
  void missingAmbientIsNotAssessedNeverPassed() {
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            20.0,
            cable(ConductorSize.AWG_12, Insulation.THERMOSETTING_90, null, 1),
            load(1200, false));

    Finding f = finding(assess(c, 10.0), CheckKind.CONDUCTOR_AMPACITY);

    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("ambient temperature");
  }

  @Test
  void eightAwgOnFiftyAmpsFailsTheSixtyDegreeTerminationLimit() {
    // 8 AWG Cu: 90 °C column 55 A ≥ 50 A, but 110.14(C)(1)(a) limits a ≤ 100 A circuit to the
    // 60 °C column, 40 A (Table 310.16), and the next standard rating above 40 A is 40 A itself
    CircuitSpec c =
        circuit(
            PhasePosition.L1_L2,
            2,
            50.0,
            cable(ConductorSize.AWG_8, Insulation.THERMOSETTING_90, 30.0, 1),
            load(6000, false));

    List<Finding> findings = assess(c, 25.0);

    assertThat(finding(findings, CheckKind.CONDUCTOR_AMPACITY).verdict()).isEqualTo(Verdict.PASS);
    Finding termination = finding(findings, CheckKind.TERMINATION_TEMPERATURE);
    assertThat(termination.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(termination.value("Table 310.16 (60 °C)")).isEqualTo(40.0);
  }

  @Test
  void continuousLoadIsTakenAtOneHundredTwentyFivePercent() {
    // 210.20(A): 17 A continuous × 1.25 = 21.25 A > 20 A breaker; 16 A × 1.25 = 20 A fits
    CableSpec wire = cable(ConductorSize.AWG_12, Insulation.THERMOSETTING_90, 30.0, 1);
    CircuitSpec heavy = circuit(PhasePosition.L1, 1, 20.0, wire, load(17 * 120.0, true));
    CircuitSpec fits = circuit(PhasePosition.L1, 1, 20.0, wire, load(16 * 120.0, true));

    Finding over = finding(assess(heavy, 17.0), CheckKind.CONTINUOUS_LOAD);
    Finding ok = finding(assess(fits, 16.0), CheckKind.CONTINUOUS_LOAD);

    assertThat(over.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(over.value("required")).isEqualTo(21.25);
    assertThat(over.reference()).contains("210.20(A)");
    assertThat(ok.verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void aNonStandardRatingIsAdvice() {
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            1,
            32.0,
            cable(ConductorSize.AWG_8, Insulation.THERMOSETTING_90, 30.0, 1),
            load(1200, false));

    assertThat(finding(assess(c, 10.0), CheckKind.STANDARD_RATING).verdict())
        .isEqualTo(Verdict.ADVICE);
  }

  @Test
  void aMetricCrossSectionIsNotAssessedAsAnAwgSize() {
    CableSpec metric =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            15.0,
            null,
            30.0,
            1,
            0);
    CircuitSpec c = circuit(PhasePosition.L1, 1, 20.0, metric, load(1200, false));

    Finding f = finding(assess(c, 10.0), CheckKind.SMALL_CONDUCTOR);

    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("AWG");
  }
}
