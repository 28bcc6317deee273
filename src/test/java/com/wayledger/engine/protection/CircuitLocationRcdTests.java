package com.wayledger.engine.protection;

import static com.wayledger.engine.protection.Fixtures.circuit;
import static com.wayledger.engine.protection.Fixtures.mcb;
import static com.wayledger.engine.protection.Fixtures.oneCircuitSite;
import static com.wayledger.engine.protection.Fixtures.rcbo;
import static com.wayledger.engine.protection.Fixtures.twinAndEarth;
import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The residual-current rules by location: every circuit of a room with a bath or shower (BS 7671
 * 701.411.3.3, from memory), of a sauna (703.411.3.3, from memory), at a pool (section 702, from
 * memory) and outdoors (411.3.3 (b), mobile equipment up to 32 A used outdoors, from memory;
 * applied to every outdoor circuit, the safe side) needs additional protection by an RCD of IΔn ≤
 * 30 mA (415.1.1, from memory). A circuit whose location is not recorded is not assessed for the
 * rule unless its loads already demand 30 mA; it never passes.
 */
class CircuitLocationRcdTests {

  private static CircuitSpec lighting(CircuitLocation where, boolean rcbo) {
    return circuit(
            1,
            rcbo ? rcbo(TripCurve.B, 6, 30) : mcb(TripCurve.B, 6),
            twinAndEarth(1.5, 1.0, 12.0),
            List.of(Fixtures.amps(LoadCategory.LIGHTING, 2)))
        .at(where);
  }

  private static Optional<Finding> residual(CircuitSpec circuit) {
    SiteSpec site = oneCircuitSite(circuit);
    return ProtectionEngine.check(
            site,
            Map.of(circuit.id(), new CircuitLoading(circuit.id(), 2.0)),
            Map.of(),
            ProtectionSettings.DEFAULTS)
        .allFindings()
        .stream()
        .filter(f -> f.check() == CheckKind.SOCKET_RCD)
        .findFirst();
  }

  @Test
  void bathroomLightingOnAPlainMcbIsFlaggedUnderSection701() {
    Finding f = residual(lighting(CircuitLocation.BATH_OR_SHOWER, false)).orElseThrow();

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.WARNING);
    assertThat(f.reference()).contains("701.411.3.3");
    assertThat(f.summary()).contains("bath or shower");
  }

  @Test
  void saunaAndPoolCircuitsOnPlainMcbsAreFlaggedWithTheirOwnClauses() {
    assertThat(residual(lighting(CircuitLocation.SAUNA, false)).orElseThrow().reference())
        .contains("703.411.3.3");
    Finding pool = residual(lighting(CircuitLocation.SWIMMING_POOL, false)).orElseThrow();
    assertThat(pool.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(pool.reference()).contains("702");
  }

  @Test
  void outdoorCircuitProtectedByItsOwnThirtyMilliAmpRcboPasses() {
    Finding f = residual(lighting(CircuitLocation.OUTDOORS, true)).orElseThrow();

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.PASS);
    assertThat(f.reference()).contains("411.3.3");
  }

  @Test
  void outdoorCircuitOnAPlainMcbIsFlagged() {
    Finding f = residual(lighting(CircuitLocation.OUTDOORS, false)).orElseThrow();

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.WARNING);
    assertThat(f.summary()).contains("outdoor");
  }

  @Test
  void indoorLightingNeedsNoResidualCurrentDeviceByItsLocation() {
    assertThat(residual(lighting(CircuitLocation.INDOORS, false))).isEmpty();
  }

  @Test
  void lightingWhoseLocationIsNotRecordedIsNotAssessedNeverPassedEvenWithAnRcbo() {
    for (boolean rcbo : new boolean[] {false, true}) {
      Finding f = residual(lighting(null, rcbo)).orElseThrow();

      assertThat(f.verdict()).as("rcbo %s: %s", rcbo, f.summary()).isEqualTo(Verdict.NOT_ASSESSED);
      assertThat(f.summary()).contains("not assessed — location not recorded");
    }
  }

  @Test
  void socketCircuitUpToThirtyTwoAmpsIsJudgedByTheSocketRuleWhateverItsLocation() {
    CircuitSpec sockets =
        circuit(
            1,
            mcb(TripCurve.B, 20),
            twinAndEarth(2.5, 1.5, 12.0),
            List.of(Fixtures.amps(LoadCategory.SOCKET_OUTLETS, 10)));

    Finding f = residual(sockets).orElseThrow();

    assertThat(f.verdict()).as(f.summary()).isEqualTo(Verdict.WARNING);
    assertThat(f.reference()).contains("411.3.3");
  }

  @Test
  void fortyAmpSocketCircuitWithItsLocationNotRecordedIsNotAssessed() {
    // above 32 A the socket rule does not cover it; outdoors it would still need 30 mA
    CircuitSpec sockets =
        circuit(
            1,
            mcb(TripCurve.B, 40),
            twinAndEarth(10.0, 4.0, 12.0),
            List.of(Fixtures.amps(LoadCategory.SOCKET_OUTLETS, 10)));

    assertThat(residual(sockets).orElseThrow().verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(residual(sockets.at(CircuitLocation.OUTDOORS)).orElseThrow().verdict())
        .isEqualTo(Verdict.WARNING);
  }

  @Test
  void proposalForBathroomLightingIsAThirtyMilliAmpRcbo() {
    CircuitSpec c = lighting(CircuitLocation.BATH_OR_SHOWER, false);
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(c), 1, new CircuitLoading(1, 2.0), ProtectionSettings.DEFAULTS);

    assertThat(p.found()).as("%s", p.reasons()).isTrue();
    assertThat(p.device().kind()).isEqualTo(DeviceKind.RCBO);
    assertThat(p.device().residualCurrentMilliAmps()).isEqualTo(30.0);
  }

  @Test
  void proposalForIndoorLightingIsAPlainMcb() {
    CircuitSpec c = lighting(CircuitLocation.INDOORS, false);
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(c), 1, new CircuitLoading(1, 2.0), ProtectionSettings.DEFAULTS);

    assertThat(p.found()).as("%s", p.reasons()).isTrue();
    assertThat(p.device().kind()).isEqualTo(DeviceKind.MCB);
  }

  @Test
  void proposalWhereTheLocationIsNotRecordedIncludesThirtyMilliAmpsAndSaysItAssumedIt() {
    CircuitSpec c = lighting(null, false);
    DeviceProposal p =
        DeviceProposer.propose(
            oneCircuitSite(c), 1, new CircuitLoading(1, 2.0), ProtectionSettings.DEFAULTS);

    assertThat(p.found()).as("%s", p.reasons()).isTrue();
    assertThat(p.device().kind()).isEqualTo(DeviceKind.RCBO);
    // the proposal claims no pass for the rule: the engine keeps it not assessed
    assertThat(p.checks()).noneMatch(f -> f.check() == CheckKind.SOCKET_RCD);
    assertThat(p.reasons()).anyMatch(r -> r.contains("location is not recorded"));
  }

  @Test
  void outdoorCarChargerKeepsTheCarChargingClause() {
    CircuitSpec charger =
        circuit(
                1,
                mcb(TripCurve.B, 40),
                twinAndEarth(6.0, 2.5, 10.0),
                List.of(Fixtures.amps(LoadCategory.EV_CHARGING, 32)))
            .at(CircuitLocation.OUTDOORS);

    Finding f = residual(charger).orElseThrow();

    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.reference()).contains("722");
  }
}
