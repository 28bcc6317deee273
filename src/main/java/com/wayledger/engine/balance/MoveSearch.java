package com.wayledger.engine.balance;

/**
 * Complete search over sets of at most k circuit moves from the board as it is now. Each node is a
 * set of moves chosen in circuit order (largest demand first), so every set is visited once; each
 * node is itself a candidate arrangement. A subtree is cut when even moving the largest remaining
 * circuits off each line cannot beat the best found (or cannot bring every line into the band), or
 * when a line would still hold more circuits than it has positions after every remaining move out
 * of it.
 */
final class MoveSearch {

  private final PreparedBoard board;
  private final SearchBudget budget;
  private final long[] demand;
  private final int[] current;
  private final int size;

  /** {@code before[p][j]}: how many circuits now on line p have an index below j. */
  private final int[][] before;

  /** {@code prefix[p][t]}: total demand of the t largest circuits now on line p. */
  private final long[][] prefix;

  private final int[] onLine = new int[3];

  private final long[] loads;
  private final int[] counts = new int[3];
  private final int[] target;
  private final long[] least = new long[3];
  private final long[] reducible = new long[3];

  private boolean bandMode;
  private long bandLowest;
  private long bandHighest;
  private long bestKey;
  private long stopKey;
  private int[] bestTarget;
  private boolean finished;

  MoveSearch(PreparedBoard board, SearchBudget budget) {
    this.board = board;
    this.budget = budget;
    this.demand = board.demand;
    this.current = board.currentPhase;
    this.size = demand.length;
    this.before = new int[3][size + 1];
    this.prefix = new long[3][size + 1];
    for (int j = 0; j < size; j++) {
      for (int p = 0; p < 3; p++) {
        before[p][j + 1] = before[p][j];
      }
      int p = current[j];
      prefix[p][onLine[p] + 1] = prefix[p][onLine[p]] + demand[j];
      onLine[p]++;
      before[p][j + 1]++;
    }
    this.loads = board.loadsOf(current);
    for (int p : current) {
      counts[p]++;
    }
    this.target = current.clone();
    this.bestTarget = current.clone();
    this.bestKey = board.withinCapacity(current) ? board.keyOf(loads) : Long.MAX_VALUE;
  }

  long bestKey() {
    return bestKey;
  }

  int[] bestTarget() {
    return bestTarget.clone();
  }

  /**
   * Looks for a strictly better arrangement than the best so far using at most {@code maxMoves}
   * moves, stopping early at {@code stopAtKey}. Returns {@code true} when the search finished (so
   * the best so far is the best with at most {@code maxMoves} moves).
   */
  boolean improveWithin(int maxMoves, long stopAtKey) {
    bandMode = false;
    stopKey = stopAtKey;
    finished = bestKey <= stopKey;
    if (!finished) {
      descend(0, maxMoves);
    }
    return finished || !budget.exhausted();
  }

  /**
   * Looks for at most {@code maxMoves} moves after which every line load is within [lowest,
   * highest] centiamps. Returns the arrangement or {@code null}; {@link #completed()} tells whether
   * {@code null} means "none exists".
   */
  int[] reachBand(int maxMoves, long lowest, long highest) {
    bandMode = true;
    bandLowest = lowest;
    bandHighest = highest;
    finished = false;
    found = null;
    descend(0, maxMoves);
    return found;
  }

  private int[] found;

  boolean completed() {
    return finished || !budget.exhausted();
  }

  private void descend(int from, int movesLeft) {
    if (finished || !budget.spend()) {
      return;
    }
    settleNode();
    if (finished || movesLeft == 0 || from == size || cannotImprove(from, movesLeft)) {
      return;
    }
    for (int index = from; index < size; index++) {
      int origin = current[index];
      for (int destination = 0; destination < 3; destination++) {
        if (destination == origin) {
          continue;
        }
        move(index, origin, destination);
        descend(index + 1, movesLeft - 1);
        move(index, destination, origin);
        if (finished) {
          return;
        }
      }
    }
  }

  private void move(int index, int from, int to) {
    loads[from] -= demand[index];
    loads[to] += demand[index];
    counts[from]--;
    counts[to]++;
    target[index] = to;
  }

  private void settleNode() {
    if (counts[0] > board.capacity[0]
        || counts[1] > board.capacity[1]
        || counts[2] > board.capacity[2]) {
      return;
    }
    if (bandMode) {
      if (PhaseBalancer.within(loads, board.lines, bandLowest, bandHighest)) {
        found = target.clone();
        finished = true;
      }
      return;
    }
    long key = board.keyOf(loads);
    if (key < bestKey) {
      bestKey = key;
      bestTarget = target.clone();
      finished = key <= stopKey;
    }
  }

  private boolean cannotImprove(int from, int movesLeft) {
    for (int p = 0; p < 3; p++) {
      int start = before[p][from];
      int available = onLine[p] - start;
      int take = Math.min(movesLeft, available);
      reducible[p] = prefix[p][start + take] - prefix[p][start];
      least[p] = loads[p] - reducible[p];
      if (counts[p] - take > board.capacity[p]) {
        return true;
      }
    }
    if (bandMode) {
      for (int p = 0; p < board.lines; p++) {
        if (least[p] > bandHighest) {
          return true;
        }
        // What line p can gain is at most the largest circuits the other two lines can give up.
        long gain = reducible[(p + 1) % 3] + reducible[(p + 2) % 3];
        if (loads[p] + gain < bandLowest) {
          return true;
        }
      }
      return false;
    }
    long lbMax = Math.max(least[0], Math.max(least[1], least[2]));
    lbMax = Math.max(lbMax, (board.total + board.lines - 1) / board.lines);
    long mid =
        least[0]
            + least[1]
            + least[2]
            - Math.max(least[0], Math.max(least[1], least[2]))
            - Math.min(least[0], Math.min(least[1], least[2]));
    long lbMid = Math.max(mid, (board.total - lbMax + 1) / 2);
    return board.keyBound(lbMax, lbMid) >= bestKey;
  }
}
