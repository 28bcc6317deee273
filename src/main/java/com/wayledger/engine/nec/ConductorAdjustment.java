package com.wayledger.engine.nec;

/**
 * NEC Table 310.15(C)(1) (2020/2023 numbering; 310.15(B)(3)(a) in 2017): adjustment factors for
 * more than three current-carrying conductors in a raceway or cable. Values from memory, checked
 * against a secondary reproduction (wiresizes.com/guides/nec-table-310-16).
 */
public final class ConductorAdjustment {

  private ConductorAdjustment() {}

  /** The factor for this many current-carrying conductors: 1 for three or fewer. */
  public static double factor(int currentCarryingConductors) {
    if (currentCarryingConductors <= 3) {
      return 1.0;
    }
    if (currentCarryingConductors <= 6) {
      return 0.80;
    }
    if (currentCarryingConductors <= 9) {
      return 0.70;
    }
    if (currentCarryingConductors <= 20) {
      return 0.50;
    }
    if (currentCarryingConductors <= 30) {
      return 0.45;
    }
    if (currentCarryingConductors <= 40) {
      return 0.40;
    }
    return 0.35;
  }
}
