package com.wayledger.engine.balance;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import java.util.List;
import java.util.Map;

/**
 * A board to balance.
 *
 * @param items the single-phase circuits, movable and locked
 * @param fixedLoadAmps current on each line from loads that never move (multi-pole circuits, a
 *     sub-board's three-phase incomer, anything not listed in {@code items}), amperes; a missing
 *     map or phase means none
 * @param positionsAvailable how many single-pole positions on each line the movable circuits may
 *     occupy (the ones they occupy now plus the free ones; positions of locked and multi-pole
 *     circuits excluded). A missing map or phase is derived from {@code freeWays} plus the movable
 *     circuits now on that line; when that is missing too, the line is unlimited and the result
 *     says so
 * @param freeWays the way numbers whose position on each line is free now, used to give each moved
 *     circuit a way; a missing map or phase means none recorded
 * @param unbalanceLimitPercent the board's unbalance limit, percent of the mean phase current;
 *     {@code null} leaves the "reach the limit" answer not assessed
 * @param threePhase {@code false} for a single-phase board, which has nothing to balance
 * @param lineCount the lines the board has: 3 (L1, L2, L3), or 2 for a 120/240 V split-phase board
 *     (lines A and B as L1 and L2, nothing on L3): the mean, the unbalance and the limit are taken
 *     over these lines only; {@code null} means 3
 * @param twoPoleItems the two-pole, line-to-line breakers of a three-line panelboard, movable and
 *     locked; their current is not in {@code fixedLoadAmps}. They need {@code panel}, and then the
 *     positions come from {@code freeWays} (free spaces by line), not {@code positionsAvailable}; a
 *     missing list means none
 * @param panel the panelboard's spaces, telling which free spaces are vertically adjacent and on
 *     which pair of lines; {@code null} for a board that is not a panelboard
 * @param phasorCorrectionAmps per line, zero or less: the line current the demand engine reports (a
 *     phasor sum) minus the magnitudes the balancer adds up for it (fixed load and every listed
 *     circuit on it as it stands), so that "as it stands" equals the board page. It stays with the
 *     line whatever moves; a missing map or phase means none
 */
public record BalanceProblem(
    List<BalanceItem> items,
    Map<Phase, Double> fixedLoadAmps,
    Map<Phase, Integer> positionsAvailable,
    Map<Phase, List<Integer>> freeWays,
    Double unbalanceLimitPercent,
    boolean threePhase,
    Integer lineCount,
    List<TwoPoleItem> twoPoleItems,
    PanelSpaces panel,
    Map<Phase, Double> phasorCorrectionAmps) {

  /** A board with no movable two-pole breakers (two-pole load, if any, is in the fixed load). */
  public BalanceProblem(
      List<BalanceItem> items,
      Map<Phase, Double> fixedLoadAmps,
      Map<Phase, Integer> positionsAvailable,
      Map<Phase, List<Integer>> freeWays,
      Double unbalanceLimitPercent,
      boolean threePhase,
      Integer lineCount) {
    this(
        items,
        fixedLoadAmps,
        positionsAvailable,
        freeWays,
        unbalanceLimitPercent,
        threePhase,
        lineCount,
        List.of(),
        null,
        null);
  }

  /** A three-line board (or a single-phase one, with {@code threePhase} false). */
  public BalanceProblem(
      List<BalanceItem> items,
      Map<Phase, Double> fixedLoadAmps,
      Map<Phase, Integer> positionsAvailable,
      Map<Phase, List<Integer>> freeWays,
      Double unbalanceLimitPercent,
      boolean threePhase) {
    this(
        items,
        fixedLoadAmps,
        positionsAvailable,
        freeWays,
        unbalanceLimitPercent,
        threePhase,
        null);
  }

  /** The two-pole breakers; empty when none are listed. */
  public List<TwoPoleItem> twoPoles() {
    return twoPoleItems == null ? List.of() : twoPoleItems;
  }

  /** The lines balanced over: {@link #lineCount()}, 3 when not given. */
  public int lines() {
    return lineCount == null ? 3 : lineCount;
  }
}
