package com.wayledger.engine.protection.check;

import com.wayledger.engine.PositionWords;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Board-level loading: incomer, busbar and supply fuse against the largest phase current, and phase
 * unbalance.
 */
public final class BoardLoadCheck {

  public static final String REFERENCE_OVERLOAD = "BS 7671 433.1.1 / IEC 60364-4-43 433.1: Ib ≤ In";
  public static final String REFERENCE_BUSBAR =
      "IEC 61439-1 (rated current of the assembly's busbar)";
  public static final String REFERENCE_UNBALANCE =
      "unbalance = largest deviation from the mean phase current / mean (NEMA MG-1 definition applied to currents);"
          + " limit set per board";

  private BoardLoadCheck() {}

  /**
   * A rated element (incomer, busbar, supply fuse) against the largest phase current.
   *
   * @param what "incomer", "busbar" or "supply fuse"
   */
  public static Finding overload(
      CheckKind check, String what, double largestPhaseAmps, double ratedAmps, String reference) {
    return overload(check, what, largestPhaseAmps, ratedAmps, reference, PositionWords.WAYS);
  }

  /**
   * As {@link #overload(CheckKind, String, double, double, String)}, its remedy in the board's own
   * words ("move load to another panelboard" under the NEC rule set).
   */
  public static Finding overload(
      CheckKind check,
      String what,
      double largestPhaseAmps,
      double ratedAmps,
      String reference,
      PositionWords words) {
    List<Quantity> values =
        List.of(
            new Quantity("largest phase current", largestPhaseAmps, "A"),
            new Quantity(what + " rating", ratedAmps, "A"));
    String[] shown = Rounding.comparedAmps(largestPhaseAmps, ratedAmps);
    if (largestPhaseAmps <= ratedAmps) {
      return Finding.pass(
          check, what + ": largest phase " + shown[0] + " ≤ " + shown[1], values, reference);
    }
    return new Finding(
        check,
        Verdict.WARNING,
        what + " overloaded: largest phase " + shown[0] + " > " + shown[1],
        values,
        reference,
        "rebalance the phases, move load to another " + words.board() + ", or uprate the " + what);
  }

  public static Finding unbalance(double unbalancePercent, double limitPercent) {
    return unbalance(unbalancePercent, limitPercent, PositionWords.WAYS, 3);
  }

  /**
   * As {@link #unbalance(double, double)} in the board's own words: on a board under the NEC rule
   * set the finding names the lines it compares ("lines A and B unbalanced" on a 120/240 V
   * panelboard, whose two legs are not phases), and its remedy names them too ("between A and B").
   * The figure is the demand engine's over the board's lines (two or three), the one the balancer
   * and the board page show.
   *
   * @param lines how many lines the board has (2 or 3)
   */
  public static Finding unbalance(
      double unbalancePercent, double limitPercent, PositionWords words, int lines) {
    List<Quantity> values =
        List.of(
            new Quantity("unbalance", unbalancePercent, "%"),
            new Quantity("limit", limitPercent, "%"));
    String compared = Rounding.percent(unbalancePercent);
    String limit = Rounding.percent(limitPercent);
    String named = "lines " + words.linesInWords(lines);
    if (unbalancePercent <= limitPercent) {
      return Finding.pass(
          CheckKind.PHASE_UNBALANCE,
          (words.usTrade() ? named + ": unbalance " : "unbalance ") + compared + " ≤ " + limit,
          values,
          REFERENCE_UNBALANCE);
    }
    return new Finding(
        CheckKind.PHASE_UNBALANCE,
        Verdict.WARNING,
        (words.usTrade() ? named : "phases") + " unbalanced: " + compared + " > " + limit,
        values,
        REFERENCE_UNBALANCE,
        "move single-phase circuits between "
            + words.linesInWords(lines)
            + " (see phase balancing)");
  }

  /** What the unbalance check compares, in the board's words: "phase" or "line unbalance". */
  public static String unbalanceOf(PositionWords words) {
    return words.usTrade() ? "line unbalance" : "phase unbalance";
  }
}
