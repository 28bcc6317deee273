package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * Turns a target arrangement into moves between ways. A circuit moving onto a line takes, in this
 * order: the position of its own way on the new line, when that is free or freed; otherwise the
 * lowest-numbered free or freed way on that line. Positions freed by circuits leaving a line are
 * reused like free ones. Circuits whose line does not change are not touched.
 */
final class PositionPlanner {

  private PositionPlanner() {}

  static List<CircuitMove> plan(PreparedBoard board, int[] target) {
    List<TreeSet<Integer>> pool = new ArrayList<>();
    for (Phase phase : PreparedBoard.PHASES) {
      TreeSet<Integer> ways = new TreeSet<>();
      if (board.problem.freeWays() != null && board.problem.freeWays().get(phase) != null) {
        for (Integer way : board.problem.freeWays().get(phase)) {
          if (way != null) {
            ways.add(way);
          }
        }
      }
      pool.add(ways);
    }
    List<Integer> moving = new ArrayList<>();
    for (int i = 0; i < target.length; i++) {
      if (target[i] != board.currentPhase[i]) {
        moving.add(i);
        Integer way = board.movable[i].currentWay();
        if (board.currentPhase[i] >= 0 && way != null) {
          pool.get(board.currentPhase[i]).add(way);
        }
      }
    }
    Integer[] toWay = new Integer[target.length];
    // Staying on the same way, only changing pole, is the smallest disturbance: give those first.
    for (int i : moving) {
      Integer way = board.movable[i].currentWay();
      if (board.currentPhase[i] >= 0 && way != null && pool.get(target[i]).remove(way)) {
        toWay[i] = way;
      }
    }
    List<CircuitMove> moves = new ArrayList<>();
    for (int i : moving) {
      if (toWay[i] == null) {
        toWay[i] = pool.get(target[i]).pollFirst();
      }
      BalanceItem item = board.movable[i];
      moves.add(
          new CircuitMove(
              item.circuitId(),
              item.label(),
              board.demand[i] / 100.0,
              item.currentPhase(),
              item.currentPhase() == null ? null : item.currentWay(),
              PreparedBoard.PHASES[target[i]],
              toWay[i]));
    }
    return List.copyOf(moves);
  }
}
