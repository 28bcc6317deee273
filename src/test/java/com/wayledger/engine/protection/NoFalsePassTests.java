package com.wayledger.engine.protection;

import static com.wayledger.engine.protection.Fixtures.circuit;
import static com.wayledger.engine.protection.Fixtures.mcb;
import static com.wayledger.engine.protection.Fixtures.oneCircuitSite;
import static com.wayledger.engine.protection.Fixtures.twinAndEarth;
import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Each case where a check used to pass on a missing or guessed input. */
class NoFalsePassTests {

  private static Finding finding(SiteSpec site, double ib, CheckKind kind) {
    long id = site.boards().get(0).circuits().get(0).id();
    return ProtectionEngine.check(
            site, Map.of(id, new CircuitLoading(id, ib)), Map.of(), ProtectionSettings.DEFAULTS)
        .allFindings()
        .stream()
        .filter(f -> f.check() == kind)
        .findFirst()
        .orElseThrow();
  }

  private static CableSpec cable(
      ConductorMaterial material, Insulation insulation, double line, double cpc, double metres) {
    return new CableSpec(line, cpc, material, insulation, metres, InstallationMethod.C, 30.0, 1, 0);
  }

  @Test
  void inUseWayWithNoLoadRecordedIsNotAssessedForOverloadOrDropInsteadOfPassingAtZeroAmps() {
    // the demand engine gives 0 A for a way with nothing on it: unknown, not zero
    SiteSpec site =
        oneCircuitSite(circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of()));

    Finding overload = finding(site, 0.0, CheckKind.WAY_OVERLOAD);
    Finding drop = finding(site, 0.0, CheckKind.VOLTAGE_DROP);
    Finding surge = finding(site, 0.0, CheckKind.START_UP_SURGE);

    assertThat(overload.verdict()).as(overload.summary()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(overload.summary()).contains("no load recorded");
    assertThat(drop.verdict()).as(drop.summary()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(surge.verdict()).as(surge.summary()).isEqualTo(Verdict.NOT_ASSESSED);
  }

  // by hand, B32: Zs max = 0.95 × 230 / (5 × 32) = 1.3656 Ω (BS 7671 Table 41.3 method, Cmin 0.95).
  // 2.5/1.5 mm² 42 m: R1+R2 at 20 °C = 7.41 + 12.10 = 19.51 mΩ/m (IEC 60228 Table 2);
  // 70 °C ×1.20 → Zs = 0.35 + 42 × 0.023412 = 1.333 Ω (passes);
  // 90 °C ×1.28 → Zs = 0.35 + 42 × 0.024973 = 1.399 Ω (fails).
  @Test
  void unrecordedInsulationIsTakenAsNinetyDegreesForZsAndSaysSoInsteadOfPassingAsSeventy() {
    List<LoadSpec> load = List.of(Fixtures.amps(LoadCategory.OTHER, 10));
    Finding recorded70 =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 32),
                    cable(ConductorMaterial.COPPER, Insulation.THERMOPLASTIC_70, 2.5, 1.5, 42.0),
                    load)),
            10,
            CheckKind.LOOP_IMPEDANCE);
    Finding unrecorded =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 32),
                    cable(ConductorMaterial.COPPER, null, 2.5, 1.5, 42.0),
                    load)),
            10,
            CheckKind.LOOP_IMPEDANCE);

    assertThat(recorded70.verdict()).as(recorded70.summary()).isEqualTo(Verdict.PASS);
    assertThat(unrecorded.verdict()).as(unrecorded.summary()).isEqualTo(Verdict.DANGER);
    assertThat(unrecorded.summary()).contains("assumed").contains("90 °C");
  }

  @Test
  void unrecordedConductorMaterialIsNotAssessedNeverTakenAsCopper() {
    SiteSpec site =
        oneCircuitSite(
            circuit(
                1,
                mcb(TripCurve.B, 16),
                cable(null, Insulation.THERMOPLASTIC_70, 2.5, 1.5, 10.0),
                List.of(Fixtures.amps(LoadCategory.OTHER, 10))));

    for (CheckKind kind :
        List.of(CheckKind.CABLE_PROTECTION, CheckKind.LOOP_IMPEDANCE, CheckKind.VOLTAGE_DROP)) {
      Finding f = finding(site, 10, kind);
      assertThat(f.verdict()).as("%s: %s", kind, f.summary()).isEqualTo(Verdict.NOT_ASSESSED);
      assertThat(f.summary()).as("%s", kind).contains("conductor material");
    }
  }

  @Test
  void unrecordedInsulationRatesTheCableAtTheLowerCapacityAndNamesTheAssumption() {
    // IEC 60364-5-52 Table B.52.2 method C, 2.5 mm² two loaded: 27 A at 70 °C, 33 A at 90 °C (from
    // memory); a 32 A breaker passes on the 90 °C figure but not on the 70 °C one
    Finding f =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 32),
                    cable(ConductorMaterial.COPPER, null, 2.5, 1.5, 10.0),
                    List.of(Fixtures.amps(LoadCategory.OTHER, 10)))),
            10,
            CheckKind.CABLE_PROTECTION);

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.DANGER);
    assertThat(f.summary()).contains("assumed");
  }

  @Test
  void motorWithNoStartUpMultipleLeavesTheSurgeCheckNotAssessedInsteadOfPassing() {
    LoadSpec motor =
        new LoadSpec("Pump", LoadCategory.MOTOR, 1, 8, RatingUnit.A, 0.85, null, null, true);
    Finding f =
        finding(
            oneCircuitSite(
                circuit(1, mcb(TripCurve.B, 16), twinAndEarth(2.5, 1.5, 10.0), List.of(motor))),
            8,
            CheckKind.START_UP_SURGE);

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("start-up multiple").contains("Pump");
  }

  // 1.0 mm² is not in the shipped table (it starts at 1.5 mm²); 1.5 mm² method C two loaded
  // carries 19.5 A (IEC 60364-5-52 Table B.52.2, from memory), and capacity grows with size, so a
  // 32 A breaker cannot protect 1.0 mm²
  @Test
  void thirtyTwoAmpsOnOneSquareMillimetreIsProvedUnprotectedByTheNextSizeUp() {
    Finding f =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 32),
                    twinAndEarth(1.0, 1.0, 10.0),
                    List.of(Fixtures.amps(LoadCategory.OTHER, 10)))),
            10,
            CheckKind.CABLE_PROTECTION);

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.DANGER);
    assertThat(f.summary()).contains("1.5 mm²");
    assertThat(f.value("Iz of the next size (upper bound)")).isEqualTo(19.5);
  }

  @Test
  void sixAmpsOnOneSquareMillimetreStaysNotAssessedBecauseTheBoundProvesNothing() {
    Finding f =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 6),
                    twinAndEarth(1.0, 1.0, 10.0),
                    List.of(Fixtures.amps(LoadCategory.OTHER, 3)))),
            3,
            CheckKind.CABLE_PROTECTION);

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.NOT_ASSESSED);
  }

  @Test
  void carChargingCircuitOnAPlainMcbIsFlaggedForMissingThirtyMilliAmpProtection() {
    Finding f =
        finding(
            oneCircuitSite(
                circuit(
                    1,
                    mcb(TripCurve.B, 40),
                    twinAndEarth(6.0, 2.5, 10.0),
                    List.of(Fixtures.amps(LoadCategory.EV_CHARGING, 32)))),
            32,
            CheckKind.SOCKET_RCD);

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.WARNING);
    assertThat(f.reference()).contains("722");
  }

  @Test
  void proposalForACarChargerIsAThirtyMilliAmpRcboNeverAPlainMcb() {
    CircuitSpec charger =
        circuit(
            1,
            mcb(TripCurve.B, 40),
            twinAndEarth(6.0, 2.5, 10.0),
            List.of(Fixtures.amps(LoadCategory.EV_CHARGING, 32)));
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(charger), 1, new CircuitLoading(1, 32.0), ProtectionSettings.DEFAULTS);

    assertThat(p.found()).as("%s", p.reasons()).isTrue();
    assertThat(p.device().kind()).isEqualTo(DeviceKind.RCBO);
    assertThat(p.device().residualCurrentMilliAmps()).isEqualTo(30.0);
  }

  @Test
  void proposalNeverLowersTheBreakingCapacityFittedOnACalculatedFaultLevel() {
    // 6 kA at the origin (calculated, not measured): 6 kA would pass, but 10 kA is fitted
    DeviceSpec fitted = new DeviceSpec(DeviceKind.MCB, TripCurve.B, 20.0, 1, 10.0, null, null);
    CircuitSpec c =
        circuit(
            1,
            fitted,
            twinAndEarth(2.5, 1.5, 10.0),
            List.of(Fixtures.amps(LoadCategory.OTHER, 10)));
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(c), 1, new CircuitLoading(1, 10.0), ProtectionSettings.DEFAULTS);

    assertThat(p.found()).as("%s", p.reasons()).isTrue();
    assertThat(p.device().breakingCapacityKiloAmps()).isGreaterThanOrEqualTo(10.0);
  }

  @Test
  void proposalForAMotorWithoutStartUpMultipleSaysWhatItNeeds() {
    LoadSpec motor =
        new LoadSpec("Fan", LoadCategory.MOTOR, 1, 8, RatingUnit.A, 0.85, null, null, true);
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(
                circuit(1, mcb(TripCurve.B, 16), twinAndEarth(2.5, 1.5, 10.0), List.of(motor))),
            1,
            new CircuitLoading(1, 8.0),
            ProtectionSettings.DEFAULTS);

    assertThat(p.found()).isFalse();
    assertThat(p.reasons()).anySatisfy(r -> assertThat(r).contains("start-up multiple"));
  }

  @Test
  void everyCircuitsFindingsNameTheBoardWayLineAndCircuit() {
    SiteSpec site =
        oneCircuitSite(
            circuit(
                3,
                mcb(TripCurve.B, 16),
                twinAndEarth(2.5, 1.5, 10.0),
                List.of(Fixtures.amps(LoadCategory.OTHER, 10))));

    CircuitFindings c =
        ProtectionEngine.check(
                site,
                Map.of(3L, new CircuitLoading(3, 10.0)),
                Map.of(),
                ProtectionSettings.DEFAULTS)
            .boards()
            .get(0)
            .circuits()
            .get(0);

    assertThat(c.place()).isEqualTo("DB-10 way 3 L1 “circuit 3”");
  }
}
