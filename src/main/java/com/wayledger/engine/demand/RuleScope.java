package com.wayledger.engine.demand;

/** Where a diversity rule acts. */
public enum RuleScope {
  /**
   * On the loads of each circuit on its own; shapes the way's own design current (e.g. a cooker).
   */
  WITHIN_CIRCUIT,
  /** On the loads of all circuits of the board together; shapes the incomer demand only. */
  ACROSS_CIRCUITS
}
