package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.List;
import java.util.Map;

/**
 * The arrangement the optimal mode recommends.
 *
 * <p>Currents are sums of circuit demands rounded to 0.01 A each (see
 * docs/calculations/balance.md).
 *
 * @param outcome how the request ended
 * @param message plain words for the user, naming any missing input or assumption
 * @param assignment the recommended line of every circuit (locked ones on their own line); empty
 *     when the outcome gives no arrangement
 * @param before the currents as the board is now; {@code null} when some circuit is not placed yet
 * @param after the currents with the recommended arrangement; {@code null} when none is given
 * @param unbalanceBeforePercent unbalance now, percent of the mean; {@code null} with {@code
 *     before}
 * @param unbalanceAfterPercent unbalance with the recommended arrangement; {@code null} with {@code
 *     after}
 * @param lowerBoundAmps no arrangement can make the largest phase current smaller than this,
 *     amperes
 * @param gapAmps the recommended largest phase current minus {@code lowerBoundAmps}, amperes; 0
 *     when proved optimal at the bound, and when positive and proved, the bound itself cannot be
 *     reached
 * @param provedOptimal {@code true} when no arrangement has a smaller largest phase current, or the
 *     same largest current and a smaller unbalance
 * @param nodesExplored search nodes spent
 * @param moves the circuits to move, in plain words via {@link CircuitMove#inWords()}; only
 *     circuits whose line changes
 * @param settings the budget the search ran with
 */
public record BalanceResult(
    BalanceOutcome outcome,
    String message,
    Map<Long, Phase> assignment,
    PhaseCurrents before,
    PhaseCurrents after,
    Double unbalanceBeforePercent,
    Double unbalanceAfterPercent,
    double lowerBoundAmps,
    double gapAmps,
    boolean provedOptimal,
    long nodesExplored,
    List<CircuitMove> moves,
    BalanceSettings settings) {}
