package com.wayledger.engine.rules;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.nec.ConductorSize;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.ProtectionEngine;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** A site is checked by the rule set it names; the IEC set is the old engine unchanged. */
class RuleSetTests {

  static SiteSpec site(String ruleSet, SupplySpec supply) {
    CircuitSpec kitchen =
        new CircuitSpec(
            7,
            1,
            PhasePosition.L1,
            "Kitchen counter",
            WayStatus.IN_USE,
            false,
            new DeviceSpec(DeviceKind.MCB, null, 20.0, 1, 10.0, null, null),
            new CableSpec(
                ConductorSize.AWG_14.squareMillimetres(),
                ConductorSize.AWG_14.squareMillimetres(),
                ConductorMaterial.COPPER,
                Insulation.THERMOSETTING_90,
                10.0,
                null,
                30.0,
                1,
                0),
            List.of(
                new LoadSpec(
                    "toaster",
                    LoadCategory.FIXED_APPLIANCE,
                    1,
                    1200,
                    RatingUnit.W,
                    1,
                    null,
                    null,
                    false)),
            null,
            null);
    BoardSpec board =
        new BoardSpec(
            3,
            "P1",
            1,
            42,
            200.0,
            null,
            null,
            null,
            10.0,
            1.0,
            DiversityMethods.NONE,
            null,
            null,
            List.of(kitchen));
    return new SiteSpec(
        1, "Invented duplex", supply, DiversityMethods.NONE, List.of(board), ruleSet);
  }

  static SiteFindings check(SiteSpec site) {
    SiteDemand demand = DemandEngine.evaluate(site, DiversityMethods.builtIn());
    Map<Long, CircuitLoading> circuits = new HashMap<>();
    Map<Long, BoardLoading> boards = new HashMap<>();
    for (BoardDemand b : demand.boards()) {
      for (CircuitDemand c : b.circuits()) {
        circuits.put(c.circuitId(), new CircuitLoading(c.circuitId(), c.designCurrentAmps()));
      }
    }
    return RuleSets.of(site.ruleSetKey())
        .check(site, circuits, boards, RecordedMccbSettings.NONE, ProtectionSettings.DEFAULTS);
  }

  static final SupplySpec SPLIT =
      new SupplySpec(
          EarthingSystem.TN_C_S,
          120.0,
          1,
          60.0,
          null,
          10.0,
          200.0,
          SupplySystem.SPLIT_PHASE_120_240);

  @Test
  void aCircuitOnAnNecSiteIsCheckedByTheNecSet() {
    SiteFindings findings = check(site("NEC", SPLIT));

    List<Finding> circuit = findings.boards().get(0).circuits().get(0).findings();
    assertThat(circuit)
        .as("NEC 240.4(D): 20 A breaker on 14 AWG copper")
        .anySatisfy(
            f -> {
              assertThat(f.check()).isEqualTo(CheckKind.SMALL_CONDUCTOR);
              assertThat(f.verdict()).isEqualTo(Verdict.DANGER);
              assertThat(f.reference()).startsWith("NEC 240.4(D)");
            });
    assertThat(circuit)
        .as("no IEC loop-impedance check under the NEC")
        .noneMatch(f -> f.check() == CheckKind.LOOP_IMPEDANCE);
    assertThat(findings.allFindings())
        .as("every finding names an NEC clause or says common practice")
        .allMatch(
            f -> f.reference().startsWith("NEC") || f.reference().startsWith("common practice"));
  }

  @Test
  void theIecSetGivesExactlyTheOldEngineFindings() {
    SiteSpec site =
        site("IEC", new SupplySpec(EarthingSystem.TN_C_S, 230.0, 1, 50.0, 0.35, 6.0, 100.0));
    SiteFindings viaRuleSet = check(site);
    SiteDemand demand = DemandEngine.evaluate(site, DiversityMethods.builtIn());
    Map<Long, CircuitLoading> circuits = new HashMap<>();
    demand
        .boards()
        .forEach(
            b ->
                b.circuits()
                    .forEach(
                        c ->
                            circuits.put(
                                c.circuitId(),
                                new CircuitLoading(c.circuitId(), c.designCurrentAmps()))));

    SiteFindings direct =
        ProtectionEngine.check(
            site, circuits, Map.of(), RecordedMccbSettings.NONE, ProtectionSettings.DEFAULTS);

    assertThat(viaRuleSet).isEqualTo(direct);
    assertThat(viaRuleSet.allFindings()).noneMatch(f -> f.check() == CheckKind.SMALL_CONDUCTOR);
  }

  @Test
  void aSiteFromBeforeRuleSetsIsAnIecSite() {
    SiteSpec old = new SiteSpec(1, "old", SPLIT, DiversityMethods.NONE, List.of());
    assertThat(old.ruleSetKey()).isEqualTo("IEC");
    assertThat(RuleSets.of(null)).isSameAs(RuleSets.IEC);
    assertThatThrownBy(() -> RuleSets.of("XYZ")).isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void everyRuleSetHasADistinctShortKeyAndItsOwnSupplySystems() {
    assertThat(RuleSets.all()).extracting(RuleSet::key).doesNotHaveDuplicates();
    assertThat(RuleSets.all())
        .allMatch(r -> r.key().length() <= 12 && !r.supplySystems().isEmpty());
    assertThat(RuleSets.NEC.supplySystems()).contains(SupplySystem.SPLIT_PHASE_120_240);
    assertThat(RuleSets.IEC.supplySystems()).containsExactly(SupplySystem.IEC_WYE);
  }
}
