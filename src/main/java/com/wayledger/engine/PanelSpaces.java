package com.wayledger.engine;

import java.util.ArrayList;
import java.util.List;

/**
 * Panelboard spaces as the trade numbers them (common practice, no standard document at hand): odd
 * numbers down the left column, even down the right, so spaces 1 and 2 share the top row. The bus
 * bars alternate by row: on a 120/240 V panel row 1 is line A, row 2 line B, row 3 A again; on a
 * three-phase panel the rows run A, B, C, A… A one-, two- or three-pole breaker occupies one, two
 * or three vertically adjacent spaces in one column (n, n + 2, n + 4), and so the lines in their
 * fixed order.
 *
 * @param spaceCount number of spaces (even, e.g. 24, 30, 42)
 * @param lines 2 for a split-phase panel, 3 for a three-phase one
 */
public record PanelSpaces(int spaceCount, int lines) {

  public PanelSpaces {
    if (spaceCount < 2 || spaceCount % 2 != 0) {
      throw new IllegalArgumentException(
          "a panelboard has an even number of spaces: " + spaceCount);
    }
    if (lines != 2 && lines != 3) {
      throw new IllegalArgumentException("a panelboard has 2 or 3 lines: " + lines);
    }
  }

  /**
   * The spaces of a board laid out as a panelboard, or null when it is not one: a board with two or
   * three lines on a site under a rule set other than the IEC one (the NEC set). Its way count is
   * its space count; a count stored odd is taken as the next even number.
   *
   * @param ruleSetKey the site's rule set key (null: the IEC set)
   * @param lineCount the board's lines on its supply (1, 2 or 3)
   * @param wayCount the board's stored way count
   */
  public static PanelSpaces ofBoard(String ruleSetKey, int lineCount, int wayCount) {
    if (ruleSetKey == null || SiteSpec.DEFAULT_RULE_SET_KEY.equals(ruleSetKey) || lineCount < 2) {
      return null;
    }
    return new PanelSpaces(Math.max(2, wayCount + wayCount % 2), lineCount);
  }

  /** Row of a space from the top, from 1: spaces 1 and 2 are row 1. */
  public int rowOf(int space) {
    checkSpace(space);
    return (space + 1) / 2;
  }

  /** Whether the space is in the left column (odd numbers). */
  public boolean isLeft(int space) {
    checkSpace(space);
    return space % 2 == 1;
  }

  /** The line a space is fed from (L1 = A, L2 = B, L3 = C). */
  public Phase lineOf(int space) {
    return Phase.values()[(rowOf(space) - 1) % lines];
  }

  /**
   * The spaces a breaker with this many poles takes when its top pole is on {@code firstSpace}:
   * firstSpace, firstSpace + 2, … in one column.
   *
   * @throws IllegalArgumentException when the breaker would run off the panel or has more poles
   *     than the panel has lines
   */
  public List<Integer> spacesOf(int firstSpace, int poles) {
    checkSpace(firstSpace);
    if (poles < 1 || poles > lines) {
      throw new IllegalArgumentException(
          "a " + poles + "-pole breaker does not fit a " + lines + "-line panelboard");
    }
    int last = firstSpace + 2 * (poles - 1);
    if (last > spaceCount) {
      throw new IllegalArgumentException(
          "a " + poles + "-pole breaker at space " + firstSpace + " runs past space " + spaceCount);
    }
    List<Integer> spaces = new ArrayList<>(poles);
    for (int k = 0; k < poles; k++) {
      spaces.add(firstSpace + 2 * k);
    }
    return spaces;
  }

  /**
   * The position (lines) a breaker at {@code firstSpace} with {@code poles} poles occupies: a
   * single line, the two-pole pair in fixed order, or all three.
   */
  public PhasePosition positionOf(int firstSpace, int poles) {
    List<Integer> spaces = spacesOf(firstSpace, poles);
    Phase first = lineOf(spaces.get(0));
    return switch (poles) {
      case 1 -> PhasePosition.on(first);
      case 2 -> PhasePosition.between(first, lineOf(spaces.get(1)));
      default -> PhasePosition.THREE_POLE;
    };
  }

  /** Whether a breaker fits the panel, and if not, why (see {@link #fitOf}). */
  public enum Fit {
    /** It fits: every space it needs is on the panel. */
    FITS,
    /** Its first space is not on the panel (below 1 or past the space count). */
    NO_SUCH_SPACE,
    /** It starts too low: its last pole would run past the bottom of the panel. */
    RUNS_PAST_BOTTOM,
    /** It has more poles than the panel has lines (or fewer than one). */
    TOO_MANY_POLES
  }

  /**
   * Whether a breaker with {@code poles} poles whose top pole is on {@code firstSpace} fits the
   * panel, without throwing: the form and the API refuse a breaker beside the field that caused it.
   */
  public Fit fitOf(int firstSpace, int poles) {
    if (firstSpace < 1 || firstSpace > spaceCount) {
      return Fit.NO_SUCH_SPACE;
    }
    if (poles < 1 || poles > lines) {
      return Fit.TOO_MANY_POLES;
    }
    return firstSpace + 2 * (poles - 1) > spaceCount ? Fit.RUNS_PAST_BOTTOM : Fit.FITS;
  }

  /**
   * The first space two breakers would both take, or 0 when they share none. Each breaker is given
   * by its top space and its poles and must fit the panel.
   */
  public int sharedSpace(int firstSpace, int poles, int otherFirstSpace, int otherPoles) {
    List<Integer> other = spacesOf(otherFirstSpace, otherPoles);
    for (int space : spacesOf(firstSpace, poles)) {
      if (other.contains(space)) {
        return space;
      }
    }
    return 0;
  }

  /** Number of rows: two spaces to a row. */
  public int rowCount() {
    return spaceCount / 2;
  }

  private void checkSpace(int space) {
    if (space < 1 || space > spaceCount) {
      throw new IllegalArgumentException(
          "space " + space + " is not on a " + spaceCount + "-space panelboard");
    }
  }
}
