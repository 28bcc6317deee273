package com.wayledger.balance;

import com.wayledger.board.Placement;
import com.wayledger.engine.PositionWords;
import com.wayledger.engine.balance.BalanceResult;
import com.wayledger.engine.balance.CircuitMove;
import com.wayledger.engine.balance.FewestMovesResult;
import com.wayledger.engine.demand.BoardDemand;
import java.util.List;

/**
 * What the balancing page shows for one board.
 *
 * @param basis whether circuits were weighed by demand after diversity or by connected load
 * @param optimal the proved-optimal (or best within budget) arrangement
 * @param fewestMoves the k-moves table for the existing arrangement
 * @param chosenMoves the moves of the plan being previewed
 * @param chosenLabel which plan is previewed, as the end of a message key: "optimal",
 *     "optimalMoves" (the fewest moves that reach it) or "moves" (a chosen number of moves)
 * @param before the board's demand as it stands
 * @param after the board's demand with the chosen plan applied (computed, not stored)
 * @param placements the chosen plan as placements to apply
 * @param undo the placements that put every moved circuit back
 * @param stepFigures each fewest-moves row worked out by the demand engine, with the board's own
 *     diversity method, so the table agrees with the board page and with "as it stands"
 * @param chosenStepMoves the fewest-moves row previewed; null when the optimal plan is not one of
 *     them
 * @param words how the board names its positions and lines (way 4 L2, space 4 B)
 */
public record BalancePlans(
    Basis basis,
    BalanceResult optimal,
    FewestMovesResult fewestMoves,
    List<CircuitMove> chosenMoves,
    String chosenLabel,
    BoardDemand before,
    BoardDemand after,
    List<Placement> placements,
    List<Placement> undo,
    List<StepFigures> stepFigures,
    Integer chosenStepMoves,
    PositionWords words) {

  /** Each move of {@code moves} in the board's words: "… from space 4 B to space 7 A". */
  public List<String> inWords(List<CircuitMove> moves) {
    return moves == null ? List.of() : moves.stream().map(m -> m.inWords(words)).toList();
  }

  /**
   * A fewest-moves row as the demand engine sees the board after its moves.
   *
   * @param moves how many circuits move
   * @param largestAmps largest line current after, A
   * @param unbalancePercent unbalance after, %; null for a single-phase board
   */
  public record StepFigures(int moves, double largestAmps, Double unbalancePercent) {}

  /** The figures of the row with {@code moves} moves; null when there is none. */
  public StepFigures figuresOf(int moves) {
    return stepFigures.stream().filter(f -> f.moves() == moves).findFirst().orElse(null);
  }

  /** What each circuit is weighed by. */
  public enum Basis {
    DEMAND,
    CONNECTED
  }

  /**
   * Top of the bar charts, A: the largest line current before or after, plus a margin, at least 1
   * A.
   */
  public double chartScaleAmps() {
    double largest = 1.0;
    for (BoardDemand side : new BoardDemand[] {before, after}) {
      if (side != null) {
        for (var phase : side.phases()) {
          largest = Math.max(largest, phase.currentAmps() * 1.15);
        }
      }
    }
    return largest;
  }

  /** Placements as one form value: "12:4:L2 13:5:L1". */
  public String placementTokens() {
    return String.join(" ", placements.stream().map(Placement::token).toList());
  }

  public String undoTokens() {
    return String.join(" ", undo.stream().map(Placement::token).toList());
  }
}
