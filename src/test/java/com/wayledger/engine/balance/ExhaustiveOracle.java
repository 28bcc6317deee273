package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * Independent reference for the tests: enumerates all 3^n arrangements of the movable circuits,
 * written plainly without any of the engine's bounds. Works in centiamps (each demand rounded to
 * 0.01 A, as the engine documents) and ranks arrangements by (largest phase load, then largest
 * |3·load − total|), which is (largest current, then unbalance) in exact integers.
 */
final class ExhaustiveOracle {

  /**
   * Best (largest, deviation) with at most k moves, per k; the overall optimum; fewest moves to a
   * limit.
   */
  record Answer(
      long[] bestMaxByMoves,
      long[] bestDeviationByMoves,
      long optimumMax,
      long optimumDeviation,
      long total,
      Integer fewestMovesToLimit,
      boolean anyFeasible) {

    double optimumMaxAmps() {
      return optimumMax / 100.0;
    }

    /** Unbalance percent of the optimum: 100 · max|L − mean| / mean = 100 · deviation / total. */
    double optimumUnbalancePercent() {
      return total == 0 ? 0.0 : 100.0 * optimumDeviation / total;
    }
  }

  private ExhaustiveOracle() {}

  static Answer solve(BalanceProblem problem) {
    List<BalanceItem> movable = new ArrayList<>();
    long[] fixed = new long[3];
    if (problem.fixedLoadAmps() != null) {
      for (Map.Entry<Phase, Double> entry : problem.fixedLoadAmps().entrySet()) {
        fixed[entry.getKey().ordinal()] += Math.round(entry.getValue() * 100.0);
      }
    }
    for (BalanceItem item : problem.items()) {
      if (item.movable()) {
        movable.add(item);
      } else {
        fixed[item.currentPhase().ordinal()] += Math.round(item.demandAmps() * 100.0);
      }
    }
    int n = movable.size();
    long[] demand = new long[n];
    int[] current = new int[n];
    long total = fixed[0] + fixed[1] + fixed[2];
    for (int i = 0; i < n; i++) {
      demand[i] = Math.round(movable.get(i).demandAmps() * 100.0);
      current[i] =
          movable.get(i).currentPhase() == null ? -1 : movable.get(i).currentPhase().ordinal();
      total += demand[i];
    }
    int[] capacity = new int[3];
    for (Phase phase : Phase.values()) {
      Integer given =
          problem.positionsAvailable() == null ? null : problem.positionsAvailable().get(phase);
      if (given != null) {
        capacity[phase.ordinal()] = given;
      } else if (problem.freeWays() != null) {
        int now = 0;
        for (int i = 0; i < n; i++) {
          if (current[i] == phase.ordinal()) {
            now++;
          }
        }
        List<Integer> free = problem.freeWays().get(phase);
        capacity[phase.ordinal()] = now + (free == null ? 0 : free.size());
      } else {
        capacity[phase.ordinal()] = n;
      }
    }
    long[] bestMax = new long[n + 1];
    long[] bestDev = new long[n + 1];
    Arrays.fill(bestMax, Long.MAX_VALUE);
    Arrays.fill(bestDev, Long.MAX_VALUE);
    Double limit = problem.unbalanceLimitPercent();
    Integer fewestToLimit = null;
    boolean anyFeasible = false;
    int[] phase = new int[n];
    long combinations = 1;
    for (int i = 0; i < n; i++) {
      combinations *= 3;
    }
    for (long code = 0; code < combinations; code++) {
      long rest = code;
      for (int i = 0; i < n; i++) {
        phase[i] = (int) (rest % 3);
        rest /= 3;
      }
      long[] loads = fixed.clone();
      int[] counts = new int[3];
      int moves = 0;
      for (int i = 0; i < n; i++) {
        loads[phase[i]] += demand[i];
        counts[phase[i]]++;
        if (phase[i] != current[i]) {
          moves++;
        }
      }
      if (counts[0] > capacity[0] || counts[1] > capacity[1] || counts[2] > capacity[2]) {
        continue;
      }
      anyFeasible = true;
      long max = Math.max(loads[0], Math.max(loads[1], loads[2]));
      long dev = 0;
      for (long load : loads) {
        dev = Math.max(dev, Math.abs(3 * load - total));
      }
      if (max < bestMax[moves] || (max == bestMax[moves] && dev < bestDev[moves])) {
        bestMax[moves] = max;
        bestDev[moves] = dev;
      }
      if (limit != null
          && 100.0 * dev <= limit * total + 1e-6
          && (fewestToLimit == null || moves < fewestToLimit)) {
        fewestToLimit = moves;
      }
    }
    // Turn "exactly k moves" into "at most k moves".
    for (int k = 1; k <= n; k++) {
      if (bestMax[k - 1] < bestMax[k]
          || (bestMax[k - 1] == bestMax[k] && bestDev[k - 1] < bestDev[k])) {
        bestMax[k] = bestMax[k - 1];
        bestDev[k] = bestDev[k - 1];
      }
    }
    return new Answer(bestMax, bestDev, bestMax[n], bestDev[n], total, fewestToLimit, anyFeasible);
  }
}
