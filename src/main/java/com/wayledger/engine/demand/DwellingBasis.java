package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import java.util.Set;

/**
 * Replaces the connected load of some categories by the NEC dwelling unit load: a load per square
 * foot of floor area plus a fixed load for each small-appliance and laundry circuit (NEC 220.12 /
 * Table 220.12, 220.52(A) and (B)). Needs {@link DwellingParameters}.
 *
 * @param voltAmperesPerSquareFoot general lighting unit load, VA/ft² (3 for dwelling units)
 * @param voltAmperesPerApplianceCircuit load of each small-appliance and laundry circuit, VA
 *     (1,500)
 * @param replacedCategories categories whose connected load the dwelling figure replaces
 */
public record DwellingBasis(
    double voltAmperesPerSquareFoot,
    double voltAmperesPerApplianceCircuit,
    Set<LoadCategory> replacedCategories) {

  public DwellingBasis {
    replacedCategories = Set.copyOf(replacedCategories);
  }
}
