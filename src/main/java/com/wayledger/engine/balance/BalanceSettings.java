package com.wayledger.engine.balance;

/**
 * How much search the balancer may spend, echoed in every result so each figure states its
 * assumptions. Whichever budget runs out first stops the search; the best arrangement found is then
 * returned with its proven gap to the lower bound.
 *
 * @param nodeBudget the most search nodes one call may explore (optimal mode and fewest-moves mode
 *     each)
 * @param timeBudgetMillis the most wall-clock time one call may spend, milliseconds
 */
public record BalanceSettings(long nodeBudget, long timeBudgetMillis) {

  /** Enough for every ordinary board to be proved optimal; see docs/performance/balance.md. */
  public static final long DEFAULT_NODE_BUDGET = 5_000_000L;

  /** A balance is interactive: answer within a second, proved or not. */
  public static final long DEFAULT_TIME_BUDGET_MILLIS = 1_000L;

  /**
   * A common working limit for phase unbalance on a distribution board, percent of the mean (common
   * practice; the board's own limit, when set, replaces it).
   */
  public static final double DEFAULT_UNBALANCE_LIMIT_PERCENT = 10.0;

  public static BalanceSettings defaults() {
    return new BalanceSettings(DEFAULT_NODE_BUDGET, DEFAULT_TIME_BUDGET_MILLIS);
  }
}
