package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Conduit;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import org.junit.jupiter.api.Test;

/** Chapter 9 Table 9 and the voltage-drop recommendation (sources beside each value). */
class NecVoltageDropTests {

  @Test
  void table9SpotValues() {
    // NEC Chapter 9 Table 9, Ω/1000 ft (from memory): 12 AWG copper R 2.0 in every conduit,
    // XL 0.054 (PVC, aluminum) and 0.068 (steel); 4/0 copper in steel R 0.063; 500 kcmil aluminum
    // in PVC R 0.043; 1/0 copper in aluminum conduit R 0.13
    assertThat(
            ConductorImpedance.resistanceOhmsPer1000Feet(
                ConductorSize.AWG_12, ConductorMaterial.COPPER, Conduit.PVC))
        .isEqualTo(2.0);
    assertThat(ConductorImpedance.reactanceOhmsPer1000Feet(ConductorSize.AWG_12, Conduit.PVC))
        .isEqualTo(0.054);
    assertThat(ConductorImpedance.reactanceOhmsPer1000Feet(ConductorSize.AWG_12, Conduit.STEEL))
        .isEqualTo(0.068);
    assertThat(
            ConductorImpedance.resistanceOhmsPer1000Feet(
                ConductorSize.AWG_4_0, ConductorMaterial.COPPER, Conduit.STEEL))
        .isEqualTo(0.063);
    assertThat(
            ConductorImpedance.resistanceOhmsPer1000Feet(
                ConductorSize.KCMIL_500, ConductorMaterial.ALUMINIUM, Conduit.PVC))
        .isEqualTo(0.043);
    assertThat(
            ConductorImpedance.resistanceOhmsPer1000Feet(
                ConductorSize.AWG_1_0, ConductorMaterial.COPPER, Conduit.ALUMINUM))
        .isEqualTo(0.13);
  }

  @Test
  void effectiveImpedanceAt085ReproducesTheTablesOwnColumn() {
    // Table 9 effective Z at 0.85 PF (from memory): 12 AWG Cu 1.7; 1/0 Cu steel 0.13;
    // 250 kcmil Cu steel 0.073 — each within the table's rounding of R·0.85 + X·sin(acos 0.85)
    assertThat(
            ConductorImpedance.effectiveOhmsPer1000Feet(
                ConductorSize.AWG_12, ConductorMaterial.COPPER, Conduit.PVC, 0.85))
        .isCloseTo(1.7, within(0.05));
    assertThat(
            ConductorImpedance.effectiveOhmsPer1000Feet(
                ConductorSize.AWG_1_0, ConductorMaterial.COPPER, Conduit.STEEL, 0.85))
        .isCloseTo(0.13, within(0.005));
    assertThat(
            ConductorImpedance.effectiveOhmsPer1000Feet(
                ConductorSize.KCMIL_250, ConductorMaterial.COPPER, Conduit.STEEL, 0.85))
        .isCloseTo(0.073, within(0.0005));
  }

  @Test
  void workedBranchDropIsAdviceAboveThreePercent() {
    // 12 AWG Cu, 100 ft one way, 16 A at unity power factor, 120 V two-wire:
    // VD = 2 × 16 A × 2.0 Ω/1000 ft × 100 ft = 6.4 V (Table 9 R from memory; arithmetic by hand)
    // = 5.33 % of 120 V, above the 3 % of 210.19(A) Informational Note No. 4 (a recommendation)
    CableSpec cable =
        new CableSpec(
            ConductorSize.AWG_12.squareMillimetres(),
            null,
            ConductorMaterial.COPPER,
            null,
            100 * 0.3048,
            null,
            null,
            null,
            null);
    VoltageDrop.Run run = VoltageDrop.of(cable, 16.0, 1.0, false, 120.0);
    assertThat(run.volts()).isCloseTo(6.4, within(1e-6));
    assertThat(run.percent()).isCloseTo(6.4 / 120 * 100, within(1e-6));
    Finding f = VoltageDrop.branch(run, 16.0);
    assertThat(f.check()).isEqualTo(CheckKind.BRANCH_VOLTAGE_DROP);
    assertThat(f.verdict()).isEqualTo(Verdict.ADVICE);
    assertThat(f.remedy()).contains("recommendation, not a requirement");
    assertThat(f.summary()).contains("conduit not recorded");
  }

  @Test
  void unknownPowerFactorTakesTheImpedanceMagnitude() {
    // |Z| = √(R² + X²) is the largest R·cosθ + X·sinθ can be: 12 AWG Cu steel √(2.0² + 0.068²)
    CableSpec cable =
        new CableSpec(
            ConductorSize.AWG_12.squareMillimetres(),
            null,
            ConductorMaterial.COPPER,
            null,
            1000 * 0.3048,
            null,
            null,
            null,
            null);
    VoltageDrop.Run run = VoltageDrop.of(cable, 1.0, null, false, 120.0);
    assertThat(run.volts()).isCloseTo(2 * Math.hypot(2.0, 0.068), within(1e-9));
  }

  @Test
  void totalAddsTheFeedersAndNeedsThemRecorded() {
    VoltageDrop.Run branch = new VoltageDrop.Run(null, 2.0, 2.4, "");
    assertThat(VoltageDrop.total(branch, 3.5, null, "P1").verdict()).isEqualTo(Verdict.ADVICE);
    assertThat(VoltageDrop.total(branch, 2.5, null, "P1").verdict()).isEqualTo(Verdict.PASS);
    Finding missing = VoltageDrop.total(branch, null, "feeder conductor of P1", "");
    assertThat(missing.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(missing.summary()).contains("feeder conductor of P1");
  }

  @Test
  void aRecordedConduitChoosesItsColumnAndTheFindingNamesIt() {
    // Table 9 (from memory): 12 AWG Cu R 2.0 in every conduit, XL 0.054 in PVC, 0.068 in steel;
    // note 2: Ze = R·cosθ + X·sinθ at PF 0.85; VD = 2 × 16 A × Ze × 100 ft / 1000
    double sin = Math.sqrt(1 - 0.85 * 0.85);
    CableSpec cable =
        new CableSpec(
            ConductorSize.AWG_12.squareMillimetres(),
            null,
            ConductorMaterial.COPPER,
            null,
            100 * 0.3048,
            null,
            null,
            null,
            null);
    VoltageDrop.Run inPvc = VoltageDrop.of(cable.inConduit(Conduit.PVC), 16.0, 0.85, false, 120.0);
    assertThat(inPvc.volts()).isCloseTo(2 * 16 * (2.0 * 0.85 + 0.054 * sin) * 0.1, within(1e-9));
    assertThat(VoltageDrop.branch(inPvc, 16.0).summary()).contains("PVC conduit (recorded)");
    // not recorded: the highest impedance, steel (XL 0.068), and the finding says it was taken
    VoltageDrop.Run unknown = VoltageDrop.of(cable, 16.0, 0.85, false, 120.0);
    assertThat(unknown.volts()).isCloseTo(2 * 16 * (2.0 * 0.85 + 0.068 * sin) * 0.1, within(1e-9));
    assertThat(VoltageDrop.branch(unknown, 16.0).summary())
        .contains("conduit not recorded: steel conduit taken");
  }
}
