package com.wayledger.engine.balance;

/** How a balance request ended; every outcome comes with a plain-words message. */
public enum BalanceOutcome {
  /** The arrangement is proved optimal (or, for fewest moves, every listed step is proved). */
  PROVED_OPTIMAL,
  /**
   * The search budget ran out; the best arrangement found is returned with its gap to the lower
   * bound.
   */
  BEST_WITHIN_BUDGET,
  /** Nothing can move: no circuits, or every circuit locked; the currents are shown as they are. */
  NOTHING_TO_MOVE,
  /** More movable single-phase circuits than positions for them. */
  TOO_MANY_CIRCUITS,
  /** A single-phase board has one line and nothing to balance. */
  NOT_THREE_PHASE,
  /** An input the calculation needs is missing; the message names it. */
  NOT_ASSESSED,
  /** An input is present but impossible (negative demand, duplicate circuit, non-finite number). */
  INVALID_INPUT
}
