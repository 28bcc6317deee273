package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import java.util.Set;

/**
 * How one line of the diversity method worked out on a board.
 *
 * @param label the method line's name
 * @param categories the categories it pools
 * @param scope within each circuit or across the board
 * @param rule the rule in plain words
 * @param connectedVoltAmperes |S| of the connected loads in the pool, VA (sum of line magnitudes)
 * @param basisVoltAmperes the amount the rule was applied to: the connected load, or with an NEC
 *     dwelling basis the dwelling unit load in place of the replaced categories, VA
 * @param demandVoltAmperes demand after the rule, VA
 * @param notAssessedReason what is missing when the rule could not be applied (its loads are then
 *     taken at 100 %); null when applied
 */
public record GroupDemand(
    String label,
    Set<LoadCategory> categories,
    RuleScope scope,
    String rule,
    double connectedVoltAmperes,
    double basisVoltAmperes,
    double demandVoltAmperes,
    String notAssessedReason) {

  public GroupDemand {
    categories = Set.copyOf(categories);
  }

  /** Demand ÷ basis; 1 when the basis is 0. */
  public double effectiveFactor() {
    return basisVoltAmperes > 0 ? demandVoltAmperes / basisVoltAmperes : 1.0;
  }
}
