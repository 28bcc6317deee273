package com.wayledger.engine.demand;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.demand.DiversityRule.FirstAmps;
import com.wayledger.engine.demand.DiversityRule.Flat;
import com.wayledger.engine.demand.DiversityRule.Tier;
import com.wayledger.engine.demand.DiversityRule.Tiered;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class DiversityMethodTests {

  @Test
  void everyBuiltInMethodIsValid() {
    assertThat(DiversityMethods.builtIn().methods())
        .allSatisfy(method -> assertThat(method.problems()).as(method.key()).isEmpty());
  }

  @Test
  void builtInMethodsHaveTheirStableKeys() {
    assertThat(DiversityMethods.builtIn().methods())
        .extracting(DiversityMethod::key)
        .containsExactly(
            "none",
            "uk-household",
            "uk-small-shop",
            "uk-small-hotel",
            "nec-220-standard-dwelling",
            "nec-220-82-optional-dwelling");
  }

  @Test
  void factorAboveOneIsAProblem() {
    DiversityMethod edited =
        DiversityMethods.ukHousehold()
            .copyAs("mine", "Mine")
            .withGroup(
                new CategoryGroup(
                    "Lighting",
                    Set.of(LoadCategory.LIGHTING),
                    new Flat(1.2),
                    RuleScope.ACROSS_CIRCUITS));

    assertThat(edited.problems())
        .anySatisfy(p -> assertThat(p).contains("factor must be between 0 and 1"));
  }

  @Test
  void descendingTiersAreAProblem() {
    Tiered tiered = new Tiered(List.of(new Tier(5_000.0, 1.0), new Tier(3_000.0, 0.5)));

    assertThat(tiered.problems()).anySatisfy(p -> assertThat(p).contains("bands must ascend"));
  }

  @Test
  void negativeAmpsAreAProblem() {
    assertThat(new FirstAmps(-1.0, 0.5, 0.0).problems())
        .anySatisfy(p -> assertThat(p).contains("0 or more"));
  }

  @Test
  void categoryInTwoGroupsIsAProblem() {
    DiversityMethod edited =
        DiversityMethods.ukHousehold()
            .copyAs("mine", "Mine")
            .withGroup(
                new CategoryGroup(
                    "Extra",
                    Set.of(LoadCategory.COOKING),
                    new Flat(0.5),
                    RuleScope.ACROSS_CIRCUITS));

    assertThat(edited.problems()).anySatisfy(p -> assertThat(p).contains("COOKING is in both"));
  }

  @Test
  void copiedMethodKeepsTheOriginalUnchanged() {
    DiversityMethod original = DiversityMethods.ukHousehold();
    original
        .copyAs("mine", "Mine")
        .withGroup(
            new CategoryGroup(
                "Lighting",
                Set.of(LoadCategory.LIGHTING),
                new Flat(0.5),
                RuleScope.ACROSS_CIRCUITS));

    assertThat(original.groupOf(LoadCategory.LIGHTING).rule()).isEqualTo(new Flat(0.66));
  }

  @Test
  void catalogFallsBackFromUnknownBoardKeyToSiteDefault() {
    DiversityMethod resolved =
        DiversityMethods.builtIn()
            .resolve("no-such-method", DiversityMethods.UK_SMALL_SHOP, DiversityMethods.NONE);

    assertThat(resolved.key()).isEqualTo(DiversityMethods.UK_SMALL_SHOP);
  }

  @Test
  void catalogPassesOverUserMethodWithProblems() {
    DiversityMethod broken =
        DiversityMethods.none()
            .copyAs("broken", "Broken")
            .withGroup(
                new CategoryGroup(
                    "Lighting",
                    Set.of(LoadCategory.LIGHTING),
                    new Flat(2.0),
                    RuleScope.ACROSS_CIRCUITS));
    DiversityMethodCatalog catalog = DiversityMethods.builtIn().with(broken);

    assertThat(catalog.resolve("broken", null, DiversityMethods.NONE).key())
        .isEqualTo(DiversityMethods.NONE);
  }

  @Test
  void tiedItemsShareRankedFactorsEvenly() {
    // by hand: three equal items at 100 % / 40 % / 40 % → each (1 + 0.4 + 0.4) / 3 = 0.6
    double[] factors =
        GroupDemandCalculator.rankedFactors(
            new DiversityRule.LargestFirst(1.0, 0.4, 0.4, DiversityRule.RankBy.CIRCUIT),
            new double[] {10.0, 10.0, 10.0},
            new int[] {1, 1, 1},
            3);

    assertThat(factors).containsExactly(0.6, 0.6, 0.6);
  }
}
