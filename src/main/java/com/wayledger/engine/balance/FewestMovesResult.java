package com.wayledger.engine.balance;

import java.util.List;

/**
 * The fewest-moves answer for an existing board: how much each extra circuit move can buy, and how
 * many moves bring the board within its unbalance limit.
 *
 * @param outcome {@link BalanceOutcome#PROVED_OPTIMAL} when every step is proved and the last step
 *     reaches the proved optimum; {@link BalanceOutcome#BEST_WITHIN_BUDGET} when the list stops
 *     early or a step is not proved; otherwise the reason no list is given
 * @param message plain words for the user
 * @param before the currents as the board is now; {@code null} when not assessed
 * @param steps row k is the best with at most k moves, from k = 0 (as it stands) up to the k that
 *     reaches the optimum; a k is listed only when it does strictly better than k − 1
 * @param optimumReached the last step has the optimal mode's best arrangement's figures
 * @param unbalanceLimitPercent the limit used, percent; {@code null} when the board has none
 * @param limitVerdict whether the limit is reached, and how
 * @param movesToReachLimit the smallest number of moves that brings the unbalance within the limit;
 *     {@code null} unless the verdict is ALREADY_WITHIN, REACHED or REACHED_NOT_PROVED_FEWEST
 * @param limitPlan the moves that reach the limit; empty when none
 * @param nodesExplored search nodes spent
 * @param settings the budget the search ran with
 */
public record FewestMovesResult(
    BalanceOutcome outcome,
    String message,
    PhaseCurrents before,
    List<MovesStep> steps,
    boolean optimumReached,
    Double unbalanceLimitPercent,
    LimitVerdict limitVerdict,
    Integer movesToReachLimit,
    List<CircuitMove> limitPlan,
    long nodesExplored,
    BalanceSettings settings) {}
