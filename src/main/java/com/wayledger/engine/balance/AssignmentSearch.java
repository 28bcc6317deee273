package com.wayledger.engine.balance;

import java.util.Arrays;

/**
 * Complete branch-and-bound over the movable circuits, largest first, each placed on one of the
 * three lines. Finds the arrangement with the smallest key (largest phase load, then middle load;
 * see {@link PreparedBoard#keyOf}) or, in the feasibility form, any arrangement with every line
 * inside a band.
 *
 * <p>Pruning: a node is cut when a lower bound on any completion's key is no better than the best
 * found. The bound on the largest load is the largest of: the largest load so far; the lightest
 * open line plus the next circuit (it must go somewhere); the water level of the remaining demand
 * over the open lines, in steps of the demands' greatest common divisor; and, per line, its load
 * plus the smallest circuits it must still take when positions are tight. Two symmetry rules keep
 * one of each set of equivalent subtrees: lines with equal load and equal free positions are
 * interchangeable, and runs of equal circuits take lines in non-decreasing index order.
 */
final class AssignmentSearch {

  private final PreparedBoard board;
  private final SearchBudget budget;
  private final long[] demand;
  private final int size;
  private final long[] suffixSum;
  private final boolean[] sameAsPrevious;
  private final long gcd;
  private final long keyBase;

  private final long[] loads;
  private final int[] counts = new int[3];
  private final int[] phaseOf;
  private final int[][] orderAt;
  private final long[] openLoads = new long[3];
  private final long[] leastLoads = new long[3];

  private int[] bestPhaseOf;
  private long bestKey = Long.MAX_VALUE;
  private long stopKey;
  private boolean finished;

  private boolean feasibility;
  private long bandLowest;
  private long bandHighest;

  AssignmentSearch(PreparedBoard board, SearchBudget budget) {
    this.board = board;
    this.budget = budget;
    this.demand = board.demand;
    this.size = demand.length;
    this.suffixSum = new long[size + 1];
    for (int i = size - 1; i >= 0; i--) {
      suffixSum[i] = suffixSum[i + 1] + demand[i];
    }
    this.sameAsPrevious = new boolean[size];
    long divisor = 0;
    for (int i = 0; i < size; i++) {
      sameAsPrevious[i] = i > 0 && demand[i] == demand[i - 1];
      divisor = gcd(divisor, demand[i]);
    }
    this.gcd = Math.max(1, divisor);
    this.keyBase = board.keyBase();
    this.loads = board.fixed.clone();
    this.phaseOf = new int[size];
    this.orderAt = new int[size][3];
  }

  /** Offers a known arrangement (greedy, the board as it is) as the incumbent to beat. */
  void offer(int[] arrangement) {
    if (arrangement == null || !board.withinCapacity(arrangement)) {
      return;
    }
    long key = board.keyOf(board.loadsOf(arrangement));
    if (key < bestKey) {
      bestKey = key;
      bestPhaseOf = arrangement.clone();
    }
  }

  /** The key no arrangement can beat, from the bounds at the root. */
  long rootBoundKey() {
    return lowerBoundKey(0);
  }

  /**
   * Searches for the smallest key. Returns {@code true} when the search is complete (the best found
   * is optimal), {@code false} when the budget ran out first.
   */
  boolean minimise() {
    feasibility = false;
    stopKey = rootBoundKey();
    finished = bestKey <= stopKey;
    if (!finished) {
      descend(0);
    }
    return finished || !budget.exhausted();
  }

  /**
   * Looks for an arrangement with every line load within [lowest, highest] centiamps. Returns the
   * arrangement, or {@code null}; {@link #completed()} tells whether {@code null} means "none
   * exists".
   */
  int[] findWithin(long lowest, long highest) {
    feasibility = true;
    bandLowest = lowest;
    bandHighest = highest;
    bestPhaseOf = null;
    finished = false;
    descend(0);
    return bestPhaseOf;
  }

  boolean completed() {
    return finished || !budget.exhausted();
  }

  int[] best() {
    return bestPhaseOf;
  }

  long bestKey() {
    return bestKey;
  }

  private void descend(int index) {
    if (finished || !budget.spend()) {
      return;
    }
    if (index == size) {
      settleLeaf();
      return;
    }
    if (feasibility ? outsideBand(index) : lowerBoundKey(index) >= bestKey) {
      return;
    }
    int[] order = orderAt[index];
    phasesByLoad(order);
    int lowestAllowed = sameAsPrevious[index] ? phaseOf[index - 1] : 0;
    long bestMax = bestKey == Long.MAX_VALUE ? Long.MAX_VALUE : bestKey / keyBase;
    int tried = -1;
    for (int phase : order) {
      if (phase < lowestAllowed || counts[phase] >= board.capacity[phase]) {
        continue;
      }
      // Lines with equal load and equal free positions lead to mirror-image subtrees: try the first
      // only.
      if (tried >= 0
          && loads[tried] == loads[phase]
          && board.capacity[tried] - counts[tried] == board.capacity[phase] - counts[phase]) {
        continue;
      }
      long newLoad = loads[phase] + demand[index];
      if (feasibility ? newLoad > bandHighest : newLoad > bestMax) {
        continue;
      }
      tried = phase;
      loads[phase] = newLoad;
      counts[phase]++;
      phaseOf[index] = phase;
      descend(index + 1);
      loads[phase] -= demand[index];
      counts[phase]--;
      if (finished) {
        return;
      }
    }
  }

  private void settleLeaf() {
    if (feasibility) {
      if (PhaseBalancer.within(loads, board.lines, bandLowest, bandHighest)) {
        bestPhaseOf = phaseOf.clone();
        finished = true;
      }
      return;
    }
    long key = board.keyOf(loads);
    if (key < bestKey) {
      bestKey = key;
      bestPhaseOf = phaseOf.clone();
      finished = key <= stopKey;
    }
  }

  private void phasesByLoad(int[] order) {
    int a = 0;
    int b = 1;
    int c = 2;
    if (loads[b] < loads[a]) {
      int t = a;
      a = b;
      b = t;
    }
    if (loads[c] < loads[b]) {
      int t = b;
      b = c;
      c = t;
      if (loads[b] < loads[a]) {
        t = a;
        a = b;
        b = t;
      }
    }
    // Ties keep index order, which the symmetry rule for equal lines relies on.
    if (loads[a] == loads[b] && a > b) {
      int t = a;
      a = b;
      b = t;
    }
    if (loads[b] == loads[c] && b > c) {
      int t = b;
      b = c;
      c = t;
    }
    if (loads[a] == loads[b] && a > b) {
      int t = a;
      a = b;
      b = t;
    }
    order[0] = a;
    order[1] = b;
    order[2] = c;
  }

  /**
   * Lower bound on the final load of each line, from the circuits it must still take (tight
   * positions).
   */
  private void mandatoryLoads(int index, long[] into) {
    int remaining = size - index;
    int free = 0;
    for (int p = 0; p < 3; p++) {
      free += board.capacity[p] - counts[p];
    }
    int slack = free - remaining;
    for (int p = 0; p < 3; p++) {
      int need = Math.max(0, board.capacity[p] - counts[p] - slack);
      into[p] = loads[p] + (need > 0 ? suffixSum[size - need] : 0);
    }
  }

  private long lowerBoundKey(int index) {
    long[] least = leastLoads;
    mandatoryLoads(index, least);
    long lbMax = Math.max(least[0], Math.max(least[1], least[2]));
    long remainingDemand = suffixSum[index];
    if (index < size) {
      long lightestOpen = Long.MAX_VALUE;
      for (int p = 0; p < 3; p++) {
        if (counts[p] < board.capacity[p]) {
          lightestOpen = Math.min(lightestOpen, loads[p]);
        }
      }
      lbMax = Math.max(lbMax, lightestOpen + demand[index]);
      lbMax = Math.max(lbMax, waterLevel(remainingDemand));
    }
    long secondLeast =
        least[0]
            + least[1]
            + least[2]
            - Math.max(least[0], Math.max(least[1], least[2]))
            - Math.min(least[0], Math.min(least[1], least[2]));
    long total = board.total;
    long lbMid = Math.max(secondLeast, (total - lbMax + 1) / 2);
    return board.keyBound(lbMax, lbMid);
  }

  /**
   * The smallest level M such that the open lines can absorb the remaining demand without exceeding
   * M, each line taking a multiple of the demands' greatest common divisor.
   */
  private long waterLevel(long remainingDemand) {
    if (remainingDemand == 0) {
      return 0;
    }
    int open = 0;
    for (int p = 0; p < 3; p++) {
      if (counts[p] < board.capacity[p]) {
        openLoads[open++] = loads[p];
      }
    }
    Arrays.sort(openLoads, 0, open);
    // Fill the lightest k lines to a common level; the first k whose level does not reach line k+1
    // wins.
    long level = 0;
    long filled = 0;
    for (int k = 1; k <= open; k++) {
      filled += openLoads[k - 1];
      level = ceilDiv(filled + remainingDemand, k);
      if (k == open || level <= openLoads[k]) {
        break;
      }
    }
    while (absorbable(level) < remainingDemand) {
      long next = Long.MAX_VALUE;
      for (int p = 0; p < 3; p++) {
        if (counts[p] < board.capacity[p]) {
          long steps = level >= loads[p] ? (level - loads[p]) / gcd + 1 : 0;
          next = Math.min(next, loads[p] + steps * gcd);
        }
      }
      level = next;
    }
    return level;
  }

  private long absorbable(long level) {
    long sum = 0;
    for (int p = 0; p < 3; p++) {
      if (counts[p] < board.capacity[p] && level > loads[p]) {
        sum += (level - loads[p]) / gcd * gcd;
      }
    }
    return sum;
  }

  private boolean outsideBand(int index) {
    long[] least = leastLoads;
    mandatoryLoads(index, least);
    long shortfall = 0;
    for (int p = 0; p < board.lines; p++) {
      if (least[p] > bandHighest) {
        return true;
      }
      long below = bandLowest - loads[p];
      if (below > 0) {
        if (counts[p] >= board.capacity[p]) {
          return true;
        }
        shortfall += below;
      }
    }
    return shortfall > suffixSum[index];
  }

  private static long ceilDiv(long a, long b) {
    return -Math.floorDiv(-a, b);
  }

  private static long gcd(long a, long b) {
    while (b != 0) {
      long t = a % b;
      a = b;
      b = t;
    }
    return a;
  }
}
