package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * One line of a diversity method: the categories whose loads are pooled, the rule applied to the
 * pool and where it applies.
 *
 * @param label name of the line in plain words, e.g. "Cooking appliances"
 * @param categories categories pooled under this rule
 * @param rule the rule
 * @param scope within each circuit or across the board's circuits
 * @param dwellingBasis when not null, the NEC dwelling unit load replaces the connected load of
 *     some of the categories (needs {@link DwellingParameters})
 */
public record CategoryGroup(
    String label,
    Set<LoadCategory> categories,
    DiversityRule rule,
    RuleScope scope,
    DwellingBasis dwellingBasis) {

  public CategoryGroup {
    categories = Set.copyOf(categories);
  }

  /** A group without a dwelling basis. */
  public CategoryGroup(
      String label, Set<LoadCategory> categories, DiversityRule rule, RuleScope scope) {
    this(label, categories, rule, scope, null);
  }

  /** This group with another rule. */
  public CategoryGroup withRule(DiversityRule newRule) {
    return new CategoryGroup(label, categories, newRule, scope, dwellingBasis);
  }

  /** What is wrong with this group; empty when it can be used. */
  public List<String> problems() {
    List<String> problems = new ArrayList<>();
    String name = label == null || label.isBlank() ? "unnamed group" : label;
    if (categories.isEmpty()) {
      problems.add(name + ": choose at least one category");
    }
    if (rule == null) {
      problems.add(name + ": choose a rule");
    } else {
      rule.problems().forEach(problem -> problems.add(name + ": " + problem));
    }
    if (scope == null) {
      problems.add(name + ": choose within a circuit or across circuits");
    }
    if (rule instanceof DiversityRule.FirstAmps firstAmps
        && firstAmps.socketAdderAmps() > 0
        && scope == RuleScope.ACROSS_CIRCUITS) {
      problems.add(name + ": a socket-outlet allowance applies within a circuit only");
    }
    if (dwellingBasis != null) {
      if (!(dwellingBasis.voltAmperesPerSquareFoot() >= 0)
          || !(dwellingBasis.voltAmperesPerApplianceCircuit() >= 0)) {
        problems.add(name + ": dwelling unit loads must be 0 or more");
      }
      if (scope != RuleScope.ACROSS_CIRCUITS) {
        problems.add(name + ": a dwelling basis applies across circuits only");
      }
    }
    return problems;
  }
}
