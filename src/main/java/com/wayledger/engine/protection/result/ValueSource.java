package com.wayledger.engine.protection.result;

/** Where a figure such as Ze, Zs or a fault current came from. */
public enum ValueSource {
  /** Measured on site and recorded on the schedule; overrides the calculation. */
  MEASURED,
  /** Calculated by the engine from the supply, cables and tables. */
  CALCULATED,
  /** Neither measured nor calculable: an input is missing. */
  MISSING
}
