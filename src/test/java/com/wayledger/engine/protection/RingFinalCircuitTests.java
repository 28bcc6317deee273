package com.wayledger.engine.protection;

import static com.wayledger.engine.protection.Fixtures.amps;
import static com.wayledger.engine.protection.Fixtures.circuit;
import static com.wayledger.engine.protection.Fixtures.mcb;
import static com.wayledger.engine.protection.Fixtures.oneCircuitSite;
import static com.wayledger.engine.protection.Fixtures.ring;
import static com.wayledger.engine.protection.Fixtures.twinAndEarth;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Ring final circuits. Sources: the ring rule of BS 7671 433.1.204 (from memory: 2.5 mm² copper
 * line, 1.5 mm² cpc, thermoplastic or thermosetting, device In ≤ 32 A, cable Iz ≥ 20 A); the
 * (r1+r2)/4 rule for R1+R2 at the ring's mid-point and the quarter-resistance voltage drop with the
 * load at the mid-point (common practice). Cable figures: It 27 A for 2.5 mm² two-core, method C,
 * 70 °C (BS 7671 Table 4D5 / IEC 60364-5-52 B.52.2, from memory); 7.41 and 12.10 mΩ/m for 2.5 and
 * 1.5 mm² copper at 20 °C (IEC 60228 Table 2); × 1.20 at 70 °C.
 */
class RingFinalCircuitTests {

  private static final long ID = 1;

  /**
   * A 32 A type B MCB on a 60 m ring of 2.5/1.5 mm² twin and earth clipped direct (method C), 30
   * °C.
   */
  private static CircuitSpec standardRing(double lengthMetres) {
    return ring(
        circuit(
            ID,
            mcb(TripCurve.B, 32),
            twinAndEarth(2.5, 1.5, lengthMetres),
            List.of(amps(LoadCategory.SOCKET_OUTLETS, 20))));
  }

  private static SiteFindings check(CircuitSpec circuit, double ib) {
    return ProtectionEngine.check(
        oneCircuitSite(circuit),
        Map.of(ID, new CircuitLoading(ID, ib)),
        Map.of(),
        ProtectionSettings.DEFAULTS);
  }

  private static Finding finding(SiteFindings result, CheckKind kind) {
    return result.allFindings().stream().filter(f -> f.check() == kind).findFirst().orElseThrow();
  }

  // BS 7671 433.1.204 (from memory): 2.5/1.5 mm², In 32 A ≤ 32 A, Iz = It 27 A × 1 × 1 × 1 = 27 A ≥
  // 20 A
  @Test
  void standardThirtyTwoAmpRingIsProtected() {
    Finding f = finding(check(standardRing(60), 20), CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
    assertThat(f.summary()).contains("ring final circuit");
    assertThat(f.reference()).contains("433.1.204");
    assertThat(f.value("Iz")).isCloseTo(27.0, within(1e-9));
  }

  // the same circuit recorded as a radial gets the radial rule 433.1.1: In 32 A > Iz 27 A
  @Test
  void sameCircuitAsARadialStillGetsTheRadialCheck() {
    CircuitSpec radial =
        circuit(
            ID,
            mcb(TripCurve.B, 32),
            twinAndEarth(2.5, 1.5, 60.0),
            List.of(amps(LoadCategory.SOCKET_OUTLETS, 20)));
    SiteFindings r = check(radial, 20);
    Finding f = finding(r, CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.summary()).contains("cable not protected").doesNotContain("ring");
    assertThat(f.reference()).contains("433.1.1");
    // and the whole length counts for Zs: 0.35 + (7.41 + 12.10) × 1.20 × 60 / 1000 = 1.755 Ω
    assertThat(r.boards().get(0).circuits().get(0).loopImpedanceOhms().value())
        .isCloseTo(0.35 + 1.40472, within(1e-6));
  }

  // Ci 0.51 for 400 mm in thermal insulation (BS 7671 Table 52.2, from memory): Iz = 27 × 0.51 =
  // 13.77 A < 20 A
  @Test
  void ringInThermalInsulationIsNotProtected() {
    CableSpec buried =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            60.0,
            InstallationMethod.C,
            30.0,
            1,
            400);
    Finding f =
        finding(
            check(ring(circuit(ID, mcb(TripCurve.B, 32), buried, List.of())), 20),
            CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.summary()).contains("ring final circuit").contains("cable not protected");
    assertThat(f.value("Iz")).isCloseTo(13.77, within(1e-9));
  }

  @Test
  void ringOnALargerDeviceIsNotAssessedNotPassed() {
    CircuitSpec forty =
        ring(circuit(ID, mcb(TripCurve.B, 40), twinAndEarth(2.5, 1.5, 60.0), List.of()));
    Finding f = finding(check(forty, 20), CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary())
        .contains("ring final circuit of this size")
        .contains("check against the standard");
  }

  @Test
  void ringOfAnotherCableIsNotAssessedNotGuessed() {
    CircuitSpec four =
        ring(circuit(ID, mcb(TripCurve.B, 32), twinAndEarth(4.0, 1.5, 60.0), List.of()));
    Finding f = finding(check(four, 20), CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("ring final circuit of this size");
  }

  // by hand (common practice): r1 + r2 = (7.41 + 12.10) mΩ/m × 60 m = 0.4446 + 0.726 = 1.1706 Ω end
  // to end at 20 °C;
  // (r1+r2)/4 = 0.2927 Ω; × 1.20 at 70 °C = 0.3512 Ω; Zs = Ze 0.35 + 0.3512 = 0.7012 Ω
  @Test
  void loopImpedanceUsesAQuarterOfTheRingsEndToEndResistance() {
    SiteFindings r = check(standardRing(60), 20);
    assertThat(r.boards().get(0).circuits().get(0).loopImpedanceOhms().value())
        .isCloseTo(0.35 + 0.2927 * 1.20, within(1e-4));
    Finding zs = finding(r, CheckKind.LOOP_IMPEDANCE);
    assertThat(zs.summary()).contains("ring final circuit");
    assertThat(zs.reference()).contains("(r1+r2)/4");
  }

  // by hand (common practice, load at the mid-point): mV/A/m = 2 × 7.41 × 1.20 = 17.784; drop =
  // 17.784 × 20 A ×
  // 60 m / 4 / 1000 = 5.335 V = 2.320 % of 230 V (the same cable as a radial: 9.279 %)
  @Test
  void voltageDropTakesTheLoadAtTheMidPoint() {
    Finding ring = finding(check(standardRing(60), 20), CheckKind.VOLTAGE_DROP);
    assertThat(ring.value("drop in circuit")).isCloseTo(2.3197, within(1e-3));
    assertThat(ring.summary()).contains("ring final circuit");
    CircuitSpec radial = circuit(ID, mcb(TripCurve.B, 32), twinAndEarth(2.5, 1.5, 60.0), List.of());
    Finding straight = finding(check(radial, 20), CheckKind.VOLTAGE_DROP);
    assertThat(straight.value("drop in circuit")).isCloseTo(9.279, within(1e-3));
    assertThat(straight.summary()).doesNotContain("ring");
  }

  @Test
  void theRadialConstructorRecordsARadial() {
    assertThat(circuit(ID, null, null, List.of()).ringFinal()).isFalse();
  }
}
