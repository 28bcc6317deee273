package com.wayledger.engine.balance;

/**
 * Counts search nodes against a node budget and a wall-clock deadline shared by one balancer call.
 */
final class SearchBudget {

  private static final int CLOCK_CHECK_MASK = 1023;

  private final long nodeLimit;
  private final long deadlineNanos;
  private long nodes;
  private boolean exhausted;

  SearchBudget(BalanceSettings settings) {
    this.nodeLimit = settings.nodeBudget();
    this.deadlineNanos = System.nanoTime() + settings.timeBudgetMillis() * 1_000_000L;
  }

  /** Spends one node; {@code false} once either budget is used up, and from then on. */
  boolean spend() {
    if (exhausted) {
      return false;
    }
    nodes++;
    // Reading the clock costs more than a node, so look at it only every 1024 nodes.
    if (nodes >= nodeLimit
        || ((nodes & CLOCK_CHECK_MASK) == 0 && System.nanoTime() > deadlineNanos)) {
      exhausted = true;
    }
    return !exhausted;
  }

  boolean exhausted() {
    return exhausted;
  }

  long nodes() {
    return nodes;
  }
}
