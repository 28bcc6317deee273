package com.wayledger.diversity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.engine.demand.DiversityMethod;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.demand.DiversityRule;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class MethodJsonTests {

  static Stream<DiversityMethod> builtInMethods() {
    return DiversityMethods.builtIn().methods().stream();
  }

  @ParameterizedTest(name = "{0}")
  @MethodSource("builtInMethods")
  void everyBuiltInMethodSurvivesStorageUnchanged(DiversityMethod method) {
    assertThat(MethodJson.read(MethodJson.write(method))).isEqualTo(method);
  }

  @Test
  void tiersAreWrittenAndReadAsText() {
    List<DiversityRule.Tier> tiers = RuleParameters.tiers("3000:1; 120000:0.35; :0.25");
    assertThat(tiers)
        .containsExactly(
            new DiversityRule.Tier(3000.0, 1.0),
            new DiversityRule.Tier(120000.0, 0.35),
            new DiversityRule.Tier(null, 0.25));
    assertThat(RuleParameters.tiersText(new DiversityRule.Tiered(tiers)))
        .isEqualTo("3000:1; 120000:0.35; :0.25");
    assertThatThrownBy(() -> RuleParameters.tiers("3000 at 1"))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void editedFactorsReplaceOnlyTheGroupTheyBelongTo() {
    DiversityMethod shop = DiversityMethods.ukSmallShop();
    Map<String, String> problems = new HashMap<>();
    DiversityMethod edited = MethodLibrary.edit(shop, Map.of("g0.factor", "0.5"), problems);
    assertThat(problems).isEmpty();
    assertThat(edited.groups().get(0).rule()).isEqualTo(new DiversityRule.Flat(0.5));
    assertThat(edited.groups().subList(1, edited.groups().size()))
        .isEqualTo(shop.groups().subList(1, shop.groups().size()));
  }

  @Test
  void aFactorAboveOneAndDescendingTiersAreReportedNotSaved() {
    DiversityMethod nec = DiversityMethods.necStandardDwelling();
    int tiered = -1;
    for (int i = 0; i < nec.groups().size(); i++) {
      if (nec.groups().get(i).rule() instanceof DiversityRule.Tiered) {
        tiered = i;
      }
    }
    assertThat(tiered).as("the NEC method has a tiered lighting rule").isNotNegative();
    Map<String, String> problems = new HashMap<>();
    DiversityMethod edited =
        MethodLibrary.edit(
            nec, Map.of("g" + tiered + ".tiers", "120000:0.35; 3000:1; :0.25"), problems);
    assertThat(edited.groups().get(tiered).problems())
        .anyMatch(problem -> problem.contains("ascend"));
    Map<String, String> unreadable = new HashMap<>();
    MethodLibrary.edit(DiversityMethods.ukSmallShop(), Map.of("g0.factor", "lots"), unreadable);
    assertThat(unreadable).containsKey("g0.factor");
  }
}
