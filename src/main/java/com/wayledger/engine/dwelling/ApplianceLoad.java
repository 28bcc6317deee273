package com.wayledger.engine.dwelling;

import com.wayledger.engine.LoadCategory;

/**
 * One load line of a dwelling as the Article 220 methods see it.
 *
 * @param description what the load is
 * @param category its category; the methods sort loads by it
 * @param quantity number of identical items, at least 1
 * @param voltAmperesEach nameplate rating of one item, VA (kW taken as kVA, as Annex D does)
 * @param lineToLine whether it is connected line to line only (a 240 V load with no neutral); a
 *     load whose connection is not recorded is passed as false, so it counts on the neutral (the
 *     safe side)
 */
public record ApplianceLoad(
    String description,
    LoadCategory category,
    int quantity,
    double voltAmperesEach,
    boolean lineToLine) {

  /** Nameplate load of the whole line, VA. */
  public double voltAmperes() {
    return quantity * voltAmperesEach;
  }
}
