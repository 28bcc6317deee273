package com.wayledger.engine.balance;

/** Whether, and with how many moves, a board can be brought within its unbalance limit. */
public enum LimitVerdict {
  /** The board is within its limit as it stands. */
  ALREADY_WITHIN,
  /** The limit is reached with the stated, proved smallest number of moves. */
  REACHED,
  /**
   * The stated number of moves reaches the limit; the budget ran out before fewer could be ruled
   * out.
   */
  REACHED_NOT_PROVED_FEWEST,
  /** No arrangement within the position limits reaches the limit (proved by a complete search). */
  NOT_REACHABLE,
  /** The budget ran out before an answer was found. */
  NOT_DETERMINED,
  /** The board has no unbalance limit set, or the problem itself could not be assessed. */
  NOT_ASSESSED
}
