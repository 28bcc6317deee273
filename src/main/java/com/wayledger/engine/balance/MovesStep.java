package com.wayledger.engine.balance;

import java.util.List;

/**
 * One row of the fewest-moves list: the best the board can get with at most {@code moves} circuit
 * moves.
 *
 * @param moves the number of circuits that change line
 * @param after the currents after those moves
 * @param largestAmps the largest phase current after the moves, amperes
 * @param unbalancePercent the unbalance after the moves, percent of the mean
 * @param proved {@code true} when the search over every set of at most {@code moves} moves
 *     finished, so no such set does better (smaller largest current, then smaller unbalance)
 * @param plan the moves, in plain words via {@link CircuitMove#inWords()}
 */
public record MovesStep(
    int moves,
    PhaseCurrents after,
    double largestAmps,
    double unbalancePercent,
    boolean proved,
    List<CircuitMove> plan) {}
