package com.wayledger.engine.balance;

/**
 * Makes an arrangement found by the optimal search move fewer circuits without making it worse: it
 * tries the six relabellings of the lines, then undoes single moves and pairs of moves while the
 * key stays as good and the positions suffice. This is a clean-up, not a proof; the fewest-moves
 * mode proves minima.
 */
final class MoveReducer {

  private static final int[][] PERMUTATIONS = {
    {0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}
  };

  private MoveReducer() {}

  static int[] reduce(PreparedBoard board, int[] arrangement) {
    long key = board.keyOf(board.loadsOf(arrangement));
    int[] best = arrangement.clone();
    int bestMoves = moves(board, best);
    for (int[] permutation : PERMUTATIONS) {
      int[] relabelled = new int[arrangement.length];
      for (int i = 0; i < arrangement.length; i++) {
        relabelled[i] = permutation[arrangement[i]];
      }
      int relabelledMoves = moves(board, relabelled);
      if (relabelledMoves < bestMoves && acceptable(board, relabelled, key)) {
        best = relabelled;
        bestMoves = relabelledMoves;
      }
    }
    boolean changed = true;
    while (changed) {
      changed = false;
      for (int i = 0; i < best.length; i++) {
        if (isMoved(board, best, i)) {
          int was = best[i];
          best[i] = board.currentPhase[i];
          if (acceptable(board, best, key)) {
            changed = true;
          } else {
            best[i] = was;
          }
        }
      }
      for (int i = 0; i < best.length; i++) {
        for (int j = i + 1; j < best.length && isMoved(board, best, i); j++) {
          if (isMoved(board, best, j)) {
            int wasI = best[i];
            int wasJ = best[j];
            best[i] = board.currentPhase[i];
            best[j] = board.currentPhase[j];
            if (acceptable(board, best, key)) {
              changed = true;
            } else {
              best[i] = wasI;
              best[j] = wasJ;
            }
          }
        }
      }
    }
    return best;
  }

  static int moves(PreparedBoard board, int[] arrangement) {
    int moves = 0;
    for (int i = 0; i < arrangement.length; i++) {
      if (arrangement[i] != board.currentPhase[i]) {
        moves++;
      }
    }
    return moves;
  }

  private static boolean isMoved(PreparedBoard board, int[] arrangement, int i) {
    return board.currentPhase[i] >= 0 && arrangement[i] != board.currentPhase[i];
  }

  private static boolean acceptable(PreparedBoard board, int[] arrangement, long key) {
    return board.withinCapacity(arrangement) && board.keyOf(board.loadsOf(arrangement)) <= key;
  }
}
