package com.wayledger.engine.balance.benchmark;

import com.wayledger.engine.balance.BalanceProblem;
import com.wayledger.engine.balance.BalanceResult;
import com.wayledger.engine.balance.FewestMovesResult;
import com.wayledger.engine.balance.LimitVerdict;
import com.wayledger.engine.balance.PhaseBalancer;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Quality report in one run over the 1,000 generated boards: median and 99th-percentile solve time
 * of the optimal mode, how many boards it proves optimal, and mean unbalance of the optimum,
 * largest-first and the random arrangement side by side. Run (see docs/performance/balance.md):
 *
 * <pre>
 * ./mvnw -o -q -B -Pjmh test-compile exec:java -Dexec.mainClass=com.wayledger.engine.balance.benchmark.BalanceQualityReport
 * </pre>
 *
 * Arguments are ignored (the jmh profile passes its own to every exec goal).
 */
public final class BalanceQualityReport {

  private BalanceQualityReport() {}

  public static void main(String[] ignored) {
    List<BalanceProblem> boards = RealisticBoards.generate(1_000);
    PhaseBalancer balancer = new PhaseBalancer();
    // Warm the JIT on the first 200 boards so the timings below are of compiled code.
    for (int round = 0; round < 2; round++) {
      for (int b = 0; b < 200; b++) {
        balancer.optimise(boards.get(b));
      }
    }
    long[] nanos = new long[boards.size()];
    int proved = 0;
    long nodes = 0;
    double optimalUnbalance = 0;
    double optimalLargest = 0;
    double greedyUnbalance = 0;
    double greedyLargest = 0;
    double currentUnbalance = 0;
    double currentLargest = 0;
    int movesTotal = 0;
    for (int b = 0; b < boards.size(); b++) {
      long start = System.nanoTime();
      BalanceResult optimum = balancer.optimise(boards.get(b));
      nanos[b] = System.nanoTime() - start;
      BalanceResult greedy = balancer.largestFirst(boards.get(b));
      proved += optimum.provedOptimal() ? 1 : 0;
      nodes += optimum.nodesExplored();
      optimalUnbalance += optimum.unbalanceAfterPercent();
      optimalLargest += optimum.after().largestAmps();
      greedyUnbalance += greedy.unbalanceAfterPercent();
      greedyLargest += greedy.after().largestAmps();
      currentUnbalance += optimum.unbalanceBeforePercent();
      currentLargest += optimum.before().largestAmps();
      movesTotal += optimum.moves().size();
    }
    int n = boards.size();
    long[] sorted = nanos.clone();
    Arrays.sort(sorted);
    System.out.printf(
        Locale.ROOT,
        "boards: %d x %d circuits, %d positions per line, seed %d%n",
        n,
        RealisticBoards.CIRCUITS,
        RealisticBoards.POSITIONS_PER_LINE,
        RealisticBoards.SEED);
    System.out.printf(
        Locale.ROOT,
        "optimal mode solve time: median %.3f ms, p99 %.3f ms, max %.3f ms%n",
        sorted[n / 2] / 1e6,
        sorted[(int) Math.ceil(0.99 * n) - 1] / 1e6,
        sorted[n - 1] / 1e6);
    System.out.printf(
        Locale.ROOT,
        "proved optimal: %d of %d (%.1f %%), mean nodes %.0f, mean moves %.1f%n",
        proved,
        n,
        100.0 * proved / n,
        (double) nodes / n,
        (double) movesTotal / n);
    System.out.println("| arrangement | mean unbalance % | mean largest phase current A |");
    System.out.println("|---|---:|---:|");
    System.out.printf(
        Locale.ROOT,
        "| optimal (branch and bound) | %.4f | %.3f |%n",
        optimalUnbalance / n,
        optimalLargest / n);
    System.out.printf(
        Locale.ROOT,
        "| largest-first greedy | %.4f | %.3f |%n",
        greedyUnbalance / n,
        greedyLargest / n);
    System.out.printf(
        Locale.ROOT,
        "| current (random) | %.4f | %.3f |%n",
        currentUnbalance / n,
        currentLargest / n);

    // Fewest-moves mode on the first boards: far costlier per board, so a sample is enough to show
    // its reach.
    int sample = 50;
    long[] movesNanos = new long[sample];
    int reachedOptimum = 0;
    int limitProved = 0;
    int limitMovesSum = 0;
    int limitCounted = 0;
    int largestProvedStep = 0;
    for (int b = 0; b < sample; b++) {
      long start = System.nanoTime();
      FewestMovesResult fewest = balancer.fewestMoves(boards.get(b));
      movesNanos[b] = System.nanoTime() - start;
      reachedOptimum += fewest.optimumReached() ? 1 : 0;
      if (fewest.limitVerdict() == LimitVerdict.REACHED
          || fewest.limitVerdict() == LimitVerdict.ALREADY_WITHIN) {
        limitProved++;
      }
      if (fewest.movesToReachLimit() != null) {
        limitMovesSum += fewest.movesToReachLimit();
        limitCounted++;
      }
      for (var step : fewest.steps()) {
        if (step.proved()) {
          largestProvedStep = Math.max(largestProvedStep, step.moves());
        }
      }
    }
    Arrays.sort(movesNanos);
    System.out.printf(
        Locale.ROOT,
        "fewest moves, first %d boards: median %.1f ms, max %.1f ms; optimum reached on %d;"
            + " 10 %% limit with proved fewest moves on %d, mean moves to the limit %.2f (%d boards); largest proved step %d%n",
        sample,
        movesNanos[sample / 2] / 1e6,
        movesNanos[sample - 1] / 1e6,
        reachedOptimum,
        limitProved,
        limitCounted == 0 ? 0.0 : (double) limitMovesSum / limitCounted,
        limitCounted,
        largestProvedStep);
  }
}
