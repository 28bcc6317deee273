package com.wayledger.engine.protection;

import static com.wayledger.engine.protection.Fixtures.amps;
import static com.wayledger.engine.protection.Fixtures.circuit;
import static com.wayledger.engine.protection.Fixtures.mcb;
import static com.wayledger.engine.protection.Fixtures.oneCircuitSite;
import static com.wayledger.engine.protection.Fixtures.twinAndEarth;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.ValueSource;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ProtectionEngineTests {

  private static Finding finding(SiteFindings result, CheckKind kind) {
    return result.allFindings().stream().filter(f -> f.check() == kind).findFirst().orElseThrow();
  }

  private static SiteFindings check(SiteSpec site, double ib) {
    long id = site.boards().get(0).circuits().get(0).id();
    return ProtectionEngine.check(
        site, Map.of(id, new CircuitLoading(id, ib)), Map.of(), ProtectionSettings.DEFAULTS);
  }

  // by hand: Zs = Ze + (R1+R2)·L = 0.35 + 23.412 mΩ/m × 20 m = 0.818 Ω (2.5/1.5 mm² at 70 °C, 7.41
  // + 12.10 mΩ/m × 1.20)
  @Test
  void loopImpedanceIsZePlusHotR1PlusR2() {
    SiteFindings r =
        check(
            oneCircuitSite(
                circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of())),
            10);
    var c = r.boards().get(0).circuits().get(0);
    assertThat(c.loopImpedanceOhms().value()).isCloseTo(0.35 + 0.46824, within(1e-9));
    assertThat(c.loopImpedanceOhms().source()).isEqualTo(ValueSource.CALCULATED);
    assertThat(finding(r, CheckKind.LOOP_IMPEDANCE).verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void missingCableLengthIsNotAssessedNeverPassed() {
    SiteFindings r =
        check(
            oneCircuitSite(
                circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, null), List.of())),
            10);
    Finding zs = finding(r, CheckKind.LOOP_IMPEDANCE);
    assertThat(zs.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(zs.summary()).contains("cable length");
    assertThat(finding(r, CheckKind.VOLTAGE_DROP).summary()).contains("cable length");
  }

  @Test
  void missingZeIsNotAssessed() {
    SiteSpec site =
        Fixtures.site(
            Fixtures.supply(EarthingSystem.TN_S, null, 6.0),
            Fixtures.originBoard(
                10,
                List.of(
                    circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of()))));
    Finding zs = finding(check(site, 10), CheckKind.LOOP_IMPEDANCE);
    assertThat(zs.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(zs.summary()).contains("Ze at the origin");
  }

  @Test
  void unknownInstallationMethodLeavesCableProtectionNotAssessed() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            20.0,
            null,
            30.0,
            1,
            0);
    Finding f =
        finding(
            check(oneCircuitSite(circuit(1, mcb(TripCurve.B, 20), cable, List.of())), 10),
            CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("installation method");
  }

  @Test
  void missingDesignCurrentIsNotAssessed() {
    SiteSpec site =
        oneCircuitSite(circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of()));
    SiteFindings r = ProtectionEngine.check(site, Map.of(), Map.of(), ProtectionSettings.DEFAULTS);
    assertThat(finding(r, CheckKind.WAY_OVERLOAD).verdict()).isEqualTo(Verdict.NOT_ASSESSED);
  }

  @Test
  void designCurrentAboveRatingIsAnOverload() {
    Finding f =
        finding(
            check(
                oneCircuitSite(
                    circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of())),
                24),
            CheckKind.WAY_OVERLOAD);
    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
  }

  // BS 7671 4D5 / IEC B.52.2 method C: 2.5 mm² two-core 27 A, so a 32 A breaker does not protect it
  // (radial, not a ring)
  @Test
  void thirtyTwoAmpBreakerOnTwoPointFiveRadialLeavesTheCableUnprotected() {
    Finding f =
        finding(
            check(
                oneCircuitSite(
                    circuit(1, mcb(TripCurve.B, 32), twinAndEarth(2.5, 1.5, 10.0), List.of())),
                20),
            CheckKind.CABLE_PROTECTION);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
    assertThat(f.value("Iz")).isEqualTo(27.0);
  }

  @Test
  void breakingCapacityBelowTheFaultCurrentIsDanger() {
    DeviceSpec weak = new DeviceSpec(DeviceKind.MCB, TripCurve.B, 20.0, 1, 3.0, null, null);
    Finding f =
        finding(
            check(oneCircuitSite(circuit(1, weak, twinAndEarth(2.5, 1.5, 20.0), List.of())), 10),
            CheckKind.BREAKING_CAPACITY);
    assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
  }

  @Test
  void socketCircuitWithoutRcdIsAWarningThatSaysUpstreamRcdsCannotBeSeen() {
    Finding f =
        finding(
            check(
                oneCircuitSite(
                    circuit(
                        1,
                        mcb(TripCurve.B, 20),
                        twinAndEarth(2.5, 1.5, 20.0),
                        List.of(amps(LoadCategory.SOCKET_OUTLETS, 10)))),
                10),
            CheckKind.SOCKET_RCD);
    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.summary()).contains("cannot be seen");
  }

  @Test
  void socketCircuitBehindA30mARcdIncomerPasses() {
    CircuitSpec c =
        circuit(
            1,
            mcb(TripCurve.B, 20),
            twinAndEarth(2.5, 1.5, 20.0),
            List.of(amps(LoadCategory.SOCKET_OUTLETS, 10)));
    BoardSpec board =
        new BoardSpec(
            10,
            "DB-1",
            1,
            12,
            100.0,
            new DeviceSpec(DeviceKind.RCD, null, 63.0, 2, null, 30.0, null),
            null,
            null,
            10.0,
            1.0,
            null,
            null,
            null,
            List.of(c));
    Finding f =
        finding(
            check(Fixtures.site(Fixtures.supply(EarthingSystem.TN_C_S, 0.35, 6.0), board), 10),
            CheckKind.SOCKET_RCD);
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
  }

  // by hand: the submain 16 mm² (cpc 6 mm²) 30 m at 70 °C adds (1.15 + 3.08) × 1.20 × 30 / 1000 =
  // 0.1523 Ω to Ze 0.35;
  // the fault current falls from 6 kA: Zsource = 230/6000 = 0.03833 Ω, + 2 × 1.15 × 30 / 1000 =
  // 0.069 Ω (cold)
  // → 230 / 0.10733 = 2.143 kA
  @Test
  void subBoardZeAndFaultCurrentFollowTheSubmain() {
    SiteSpec site = twoBoardSite(null, null);
    SiteFindings r = ProtectionEngine.check(site, Map.of(), Map.of(), ProtectionSettings.DEFAULTS);
    var sub = r.boards().get(1).faultLevel();
    assertThat(sub.externalLoopImpedanceOhms().value()).isCloseTo(0.35 + 0.15228, within(1e-9));
    assertThat(sub.faultCurrentKiloAmps().value())
        .isCloseTo(230 / (230 / 6000.0 + 0.069) / 1000, within(1e-9));
  }

  @Test
  void measuredValuesAtTheBoardOverrideTheCalculation() {
    SiteFindings r =
        ProtectionEngine.check(
            twoBoardSite(0.41, 1.9), Map.of(), Map.of(), ProtectionSettings.DEFAULTS);
    var sub = r.boards().get(1).faultLevel();
    assertThat(sub.externalLoopImpedanceOhms().value()).isEqualTo(0.41);
    assertThat(sub.externalLoopImpedanceOhms().source()).isEqualTo(ValueSource.MEASURED);
    assertThat(sub.faultCurrentKiloAmps().source()).isEqualTo(ValueSource.MEASURED);
  }

  // by hand: submain 16 mm² 30 m at 40 A: 2 × 1.15 × 1.2 mV/A/m × 40 × 30 / 1000 = 3.312 V = 1.44
  // %;
  // circuit 2.5 mm² 20 m at 10 A: 17.784 × 10 × 20 / 1000 = 3.557 V = 1.55 %; total 2.99 % < 5 %
  @Test
  void voltageDropAddsTheSubmainDropToTheCircuitDrop() {
    SiteSpec site = twoBoardSite(null, null);
    SiteFindings r =
        ProtectionEngine.check(
            site,
            Map.of(2L, new CircuitLoading(2, 10.0)),
            Map.of(
                10L,
                new BoardLoading(10, Map.of(Phase.L1, 40.0), null),
                20L,
                new BoardLoading(20, Map.of(Phase.L1, 40.0), null)),
            ProtectionSettings.DEFAULTS);
    Finding f =
        r.boards().get(1).circuits().get(0).findings().stream()
            .filter(x -> x.check() == CheckKind.VOLTAGE_DROP)
            .findFirst()
            .orElseThrow();
    assertThat(f.value("drop to board"))
        .isCloseTo(100 * 2 * 1.15 * 1.2 * 40 * 30 / 1000 / 230, within(1e-9));
    assertThat(f.value("total drop"))
        .isCloseTo(100 * (3.312 + 2 * 7.41 * 1.2 * 10 * 20 / 1000) / 230, within(1e-9));
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void subBoardWithoutBoardLoadingHasItsVoltageDropNotAssessed() {
    SiteFindings r =
        ProtectionEngine.check(
            twoBoardSite(null, null),
            Map.of(2L, new CircuitLoading(2, 10.0)),
            Map.of(),
            ProtectionSettings.DEFAULTS);
    Finding f =
        r.boards().get(1).circuits().get(0).findings().stream()
            .filter(x -> x.check() == CheckKind.VOLTAGE_DROP)
            .findFirst()
            .orElseThrow();
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
  }

  // C63 incomer: lowest instantaneous 315 A; B20 outgoing from 60 A; 2.14 kA at the sub-board
  // reaches both bands
  @Test
  void faultCurrentReachingBothInstantaneousBandsGivesPartialSelectivity() {
    SiteFindings r =
        ProtectionEngine.check(
            twoBoardSite(null, null), Map.of(), Map.of(), ProtectionSettings.DEFAULTS);
    Finding f =
        r.boards().get(1).findings().stream()
            .filter(x -> x.check() == CheckKind.SELECTIVITY)
            .findFirst()
            .orElseThrow();
    assertThat(f.verdict()).isEqualTo(Verdict.ADVICE);
    assertThat(f.summary()).contains("partial selectivity");
  }

  @Test
  void incomerAndSupplyFuseOverloadsAreFound() {
    SiteFindings r =
        ProtectionEngine.check(
            twoBoardSite(null, null),
            Map.of(),
            Map.of(
                10L,
                new BoardLoading(10, Map.of(Phase.L1, 110.0), null),
                20L,
                new BoardLoading(20, Map.of(Phase.L1, 70.0), null)),
            ProtectionSettings.DEFAULTS);
    assertThat(r.siteFindings().get(0).verdict())
        .as("100 A supply fuse at 110 A")
        .isEqualTo(Verdict.WARNING);
    Finding incomer =
        r.boards().get(1).findings().stream()
            .filter(x -> x.check() == CheckKind.INCOMER_OVERLOAD)
            .findFirst()
            .orElseThrow();
    assertThat(incomer.verdict()).as("63 A incomer at 70 A").isEqualTo(Verdict.WARNING);
  }

  @Test
  void unbalanceBeyondTheBoardLimitIsAWarning() {
    BoardSpec board =
        new BoardSpec(
            10, "DB-3", 3, 12, 100.0, null, null, null, 10.0, 1.0, null, null, null, List.of());
    SiteSpec site = Fixtures.site(Fixtures.supply(EarthingSystem.TN_S, 0.2, 10.0), board);
    SiteFindings r =
        ProtectionEngine.check(
            site,
            Map.of(),
            Map.of(
                10L,
                new BoardLoading(10, Map.of(Phase.L1, 50.0, Phase.L2, 30.0, Phase.L3, 40.0), 25.0)),
            ProtectionSettings.DEFAULTS);
    assertThat(finding(r, CheckKind.PHASE_UNBALANCE).verdict()).isEqualTo(Verdict.WARNING);
  }

  @Test
  void fuseWaysAreNotAssessedForCheckingThatNeedACharacteristic() {
    DeviceSpec fuse = new DeviceSpec(DeviceKind.FUSE, null, 20.0, 1, 16.5, null, null);
    SiteFindings r =
        check(oneCircuitSite(circuit(1, fuse, twinAndEarth(2.5, 1.5, 20.0), List.of())), 10);
    assertThat(finding(r, CheckKind.CABLE_PROTECTION).summary()).contains("fuses");
    assertThat(finding(r, CheckKind.WAY_OVERLOAD).verdict())
        .as("Ib ≤ In needs only the rating")
        .isEqualTo(Verdict.PASS);
  }

  @Test
  void settingsAreEchoedInTheResult() {
    SiteFindings r =
        check(
            oneCircuitSite(
                circuit(1, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of())),
            10);
    assertThat(r.settings().otherDropLimitPercent())
        .isEqualTo(ProtectionSettings.DEFAULT_PUBLIC_OTHER_DROP_PERCENT);
  }

  /**
   * Origin board 10 (no submain) with a C63 way feeding board 20 over 16/6 mm² 30 m; board 20 has a
   * B20 way.
   */
  static SiteSpec twoBoardSite(Double measuredZe, Double measuredKa) {
    CableSpec submain =
        new CableSpec(
            16.0,
            6.0,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            30.0,
            InstallationMethod.C,
            30.0,
            1,
            0);
    CircuitSpec feed =
        new CircuitSpec(
            1,
            1,
            PhasePosition.L1,
            "to DB-20",
            WayStatus.IN_USE,
            false,
            mcb(TripCurve.C, 63),
            submain,
            List.of(),
            20L,
            null);
    BoardSpec origin = Fixtures.originBoard(10, List.of(feed));
    CircuitSpec way = circuit(2, mcb(TripCurve.B, 20), twinAndEarth(2.5, 1.5, 20.0), List.of());
    BoardSpec sub =
        new BoardSpec(
            20,
            "DB-20",
            1,
            12,
            63.0,
            mcb(TripCurve.C, 63),
            10L,
            null,
            10.0,
            1.0,
            null,
            measuredZe,
            measuredKa,
            List.of(way));
    return Fixtures.site(Fixtures.supply(EarthingSystem.TN_C_S, 0.35, 6.0), origin, sub);
  }
}
