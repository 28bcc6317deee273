package com.wayledger.engine.protection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.engine.rules.RuleSets;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The unbalance check on a 120/240 V split-phase panelboard, whose two legs A and B carry the 120 V
 * loads: the figure is the demand engine's over the two lines, the one the balancer takes, and the
 * finding names the legs. Loads are invented; the figures are worked by hand in each test.
 */
class SplitPhaseUnbalanceTests {

  private static final SupplySpec SPLIT_PHASE =
      new SupplySpec(
          EarthingSystem.TN_C_S,
          120.0,
          1,
          60.0,
          null,
          10.0,
          200.0,
          SupplySystem.SPLIT_PHASE_120_240);

  /** A 120 V circuit drawing the given current on one leg, at unity power factor. */
  private static CircuitSpec leg(long id, int space, PhasePosition leg, double amps) {
    return new CircuitSpec(
        id,
        space,
        leg,
        "Invented load " + id,
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.MCB, null, 70.0, 1, 10.0, null, null),
        null,
        List.of(
            new LoadSpec(
                "load " + id,
                LoadCategory.OTHER,
                1,
                amps,
                RatingUnit.A,
                1.0,
                null,
                null,
                false,
                null)),
        null,
        null);
  }

  private static BoardSpec panel(int phases, CircuitSpec... circuits) {
    return new BoardSpec(
        1,
        "LP-1",
        phases,
        42,
        200.0,
        new DeviceSpec(DeviceKind.MCCB, null, 200.0, 2, 10.0, null, null),
        null,
        null,
        10.0,
        1.0,
        DiversityMethods.NONE,
        null,
        null,
        List.of(circuits));
  }

  private static SiteSpec necSite(SupplySpec supply, BoardSpec board) {
    return new SiteSpec(
        1, "Invented cottage", supply, DiversityMethods.NONE, List.of(board), "NEC");
  }

  /** A 120/240 V panelboard on an NEC site, one 120 V circuit on each leg. */
  private static SiteSpec twoLegs(double legAAmps, double legBAmps) {
    return necSite(
        SPLIT_PHASE,
        panel(1, leg(11, 1, PhasePosition.L1, legAAmps), leg(12, 2, PhasePosition.L2, legBAmps)));
  }

  /** The demand engine's figures handed to the checks as the stored path hands them. */
  private static Map<Long, BoardLoading> loadingOf(BoardDemand demand) {
    Map<Phase, Double> currents = new EnumMap<>(Phase.class);
    demand.phases().forEach(p -> currents.put(p.phase(), p.currentAmps()));
    return Map.of(
        demand.boardId(),
        new BoardLoading(
            demand.boardId(), currents, demand.unbalancePercent(), demand.neutralCurrentAmps()));
  }

  private static BoardDemand demandOf(SiteSpec site) {
    return DemandEngine.evaluate(site, DiversityMethods.builtIn()).board(1);
  }

  private static Optional<Finding> unbalance(SiteFindings findings) {
    return findings.boards().get(0).findings().stream()
        .filter(f -> f.check() == CheckKind.PHASE_UNBALANCE)
        .findFirst();
  }

  private static double figure(Finding finding, String name) {
    return finding.values().stream()
        .filter(q -> q.name().equals(name))
        .mapToDouble(Quantity::value)
        .findFirst()
        .orElseThrow();
  }

  @Test
  void legsOfSixtyAndTwentyAmpsAreFiftyPercentUnbalancedAndTheFindingNamesLegsAAndB() {
    SiteSpec site = twoLegs(60.0, 20.0);
    BoardDemand demand = demandOf(site);

    SiteFindings findings =
        ProtectionEngine.check(site, Map.of(), loadingOf(demand), ProtectionSettings.DEFAULTS);

    // by hand (NEMA MG-1 definition applied to two currents, our own extension to two lines): mean
    // of the legs (60 + 20) / 2 = 40 A, largest deviation |60 − 40| = 20 A, 20 / 40 = 50 %
    double mean = (60.0 + 20.0) / 2.0;
    double expected = 100.0 * Math.max(Math.abs(60.0 - mean), Math.abs(20.0 - mean)) / mean;
    assertThat(demand.onPhase(Phase.L1).currentAmps()).as("leg A").isCloseTo(60.0, within(1e-9));
    assertThat(demand.onPhase(Phase.L2).currentAmps()).as("leg B").isCloseTo(20.0, within(1e-9));
    Finding finding = unbalance(findings).orElseThrow();
    assertThat(figure(finding, "unbalance"))
        .as("the check's figure is the two-leg unbalance")
        .isCloseTo(expected, within(1e-9));
    assertThat(figure(finding, "unbalance"))
        .as("the balancer's figure for the same legs")
        .isCloseTo(
            new com.wayledger.engine.balance.PhaseCurrents(60.0, 20.0, 0.0, 2).unbalancePercent(),
            within(1e-9));
    assertThat(figure(finding, "limit")).as("the board's own limit").isEqualTo(10.0);
    assertThat(finding.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(finding.summary()).isEqualTo("lines A and B unbalanced: 50.0 % > 10.0 %");
    assertThat(finding.remedy()).contains("between A and B").doesNotContain("L1");
  }

  @Test
  void theNecRuleSetKeepsTheLegUnbalanceWithCommonPracticeAsItsSource() {
    SiteSpec site = twoLegs(60.0, 20.0);

    SiteFindings findings =
        RuleSets.of("NEC")
            .check(
                site,
                Map.of(),
                loadingOf(demandOf(site)),
                RecordedMccbSettings.NONE,
                ProtectionSettings.DEFAULTS);

    Finding finding = unbalance(findings).orElseThrow();
    assertThat(finding.verdict()).isEqualTo(Verdict.WARNING);
    // no NEC clause limits unbalance: the limit is the board's, the definition NEMA MG-1's
    assertThat(finding.reference()).startsWith("common practice").contains("|IA − IB|");
    assertThat(findings.boards().get(0).titleOf(finding))
        .isEqualTo("Line unbalance within the panelboard's limit");
  }

  @Test
  void legsWithinTheLimitPassAndSayWhichLinesWereCompared() {
    SiteSpec site = twoLegs(45.0, 40.0);

    Finding finding =
        unbalance(
                ProtectionEngine.check(
                    site, Map.of(), loadingOf(demandOf(site)), ProtectionSettings.DEFAULTS))
            .orElseThrow();

    // by hand: mean 42.5 A, deviation 2.5 A, 2.5 / 42.5 = 5.88 % ≤ 10 %
    assertThat(figure(finding, "unbalance")).isCloseTo(100.0 * 2.5 / 42.5, within(1e-9));
    assertThat(finding.verdict()).isEqualTo(Verdict.PASS);
    assertThat(finding.summary()).isEqualTo("lines A and B: unbalance 5.9 % ≤ 10.0 %");
  }

  @Test
  void anOverloadedLegIsCaughtLineByLineByTheIncomerAndBusbarChecks() {
    SiteFindings findings =
        ProtectionEngine.check(
            twoLegs(230.0, 20.0),
            Map.of(),
            loadingOf(demandOf(twoLegs(230.0, 20.0))),
            ProtectionSettings.DEFAULTS);

    // leg A 230 A against the 200 A main and 200 A busbar (NEC 408.36: load within the rating);
    // the mean of the legs (125 A) would hide it, the largest line does not
    for (CheckKind check : List.of(CheckKind.INCOMER_OVERLOAD, CheckKind.BUSBAR_OVERLOAD)) {
      Finding finding =
          findings.boards().get(0).findings().stream()
              .filter(f -> f.check() == check)
              .findFirst()
              .orElseThrow();
      assertThat(finding.verdict()).as(finding.summary()).isEqualTo(Verdict.WARNING);
      assertThat(figure(finding, "largest phase current"))
          .as(check.name())
          .isCloseTo(230.0, within(1e-9));
    }
  }

  @Test
  void aLegPanelWithoutADemandFigureIsNotAssessedNeverPassed() {
    SiteSpec site = necSite(SPLIT_PHASE, panel(1, leg(11, 1, PhasePosition.L1, 60.0)));

    Finding finding =
        unbalance(ProtectionEngine.check(site, Map.of(), Map.of(), ProtectionSettings.DEFAULTS))
            .orElseThrow();

    assertThat(finding.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(finding.summary()).contains("line unbalance of panelboard LP-1");
  }

  @Test
  void aSingleLineBoardHasNoUnbalanceToCheck() {
    SupplySpec wye =
        new SupplySpec(
            EarthingSystem.TN_C_S, 120.0, 3, 60.0, null, 10.0, 200.0, SupplySystem.WYE_208Y_120);
    SiteSpec site = necSite(wye, panel(1, leg(11, 1, PhasePosition.L1, 60.0)));

    SiteFindings findings =
        ProtectionEngine.check(
            site, Map.of(), loadingOf(demandOf(site)), ProtectionSettings.DEFAULTS);

    assertThat(unbalance(findings)).as("one line: nothing to compare").isEmpty();
  }

  @Test
  void anIecThreePhaseBoardKeepsItsWords() {
    Finding finding = com.wayledger.engine.protection.check.BoardLoadCheck.unbalance(25.0, 10.0);

    assertThat(finding.summary()).isEqualTo("phases unbalanced: 25.0 % > 10.0 %");
    assertThat(finding.remedy())
        .isEqualTo("move single-phase circuits between L1, L2 and L3 (see phase balancing)");
  }
}
