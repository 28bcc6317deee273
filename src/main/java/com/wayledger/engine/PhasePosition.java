package com.wayledger.engine;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Where a circuit sits on a board: a single-pole position on one line (connected line to neutral),
 * a two-pole position across two lines (connected line to line, no neutral current), or a
 * three-pole device across all three. On a single-phase two-wire board every circuit sits on {@link
 * #L1}; on a split-phase (120/240 V) board the two lines are L1 (A) and L2 (B).
 */
public enum PhasePosition {
  L1,
  L2,
  L3,
  THREE_POLE,
  /** Two-pole, line to line between L1 and L2 (A–B; the 240 V position of a split-phase board). */
  L1_L2,
  /** Two-pole, line to line between L2 and L3 (B–C). */
  L2_L3,
  /** Two-pole, line to line between L3 and L1 (C–A). */
  L3_L1;

  /** The positions every board stored before line-to-line circuits could be recorded. */
  public static final List<PhasePosition> LINE_TO_NEUTRAL_OR_THREE_POLE =
      List.of(L1, L2, L3, THREE_POLE);

  /** The lines this position occupies. */
  public Set<Phase> phases() {
    return switch (this) {
      case L1 -> EnumSet.of(Phase.L1);
      case L2 -> EnumSet.of(Phase.L2);
      case L3 -> EnumSet.of(Phase.L3);
      case THREE_POLE -> EnumSet.allOf(Phase.class);
      case L1_L2 -> EnumSet.of(Phase.L1, Phase.L2);
      case L2_L3 -> EnumSet.of(Phase.L2, Phase.L3);
      case L3_L1 -> EnumSet.of(Phase.L3, Phase.L1);
    };
  }

  /** The first line of a two-pole position (current flows out on it), else null. */
  public Phase fromLine() {
    return switch (this) {
      case L1_L2 -> Phase.L1;
      case L2_L3 -> Phase.L2;
      case L3_L1 -> Phase.L3;
      default -> null;
    };
  }

  /** The second line of a two-pole position (current returns on it), else null. */
  public Phase toLine() {
    return switch (this) {
      case L1_L2 -> Phase.L2;
      case L2_L3 -> Phase.L3;
      case L3_L1 -> Phase.L1;
      default -> null;
    };
  }

  public boolean isSinglePole() {
    return this == L1 || this == L2 || this == L3;
  }

  /** Whether this is a two-pole, line-to-line position. */
  public boolean isLineToLine() {
    return this == L1_L2 || this == L2_L3 || this == L3_L1;
  }

  /** Number of poles a device in this position has: 1, 2 or 3. */
  public int poles() {
    return isSinglePole() ? 1 : isLineToLine() ? 2 : 3;
  }

  /** "L1", "L1–L3" for three poles, "L1–L2" for two. */
  public String label() {
    return switch (this) {
      case L1, L2, L3 -> name();
      case THREE_POLE -> "L1–L3";
      case L1_L2 -> "L1–L2";
      case L2_L3 -> "L2–L3";
      case L3_L1 -> "L3–L1";
    };
  }

  /**
   * The two-pole position starting at a line, the lines in their fixed order: L1 → L1–L2, L2 →
   * L2–L3, L3 → L3–L1.
   */
  public static PhasePosition twoPoleFrom(Phase first) {
    return switch (first) {
      case L1 -> L1_L2;
      case L2 -> L2_L3;
      case L3 -> L3_L1;
    };
  }

  /**
   * The positions a board with this many lines can hold: one line L1 only; a split-phase board L1
   * (A), L2 (B) and the two-pole L1–L2; a three-line board every single-pole and the three-pole
   * position, with the two-pole ones when {@code twoPole}.
   */
  public static List<PhasePosition> onBoardWith(int lines, boolean twoPole) {
    if (lines <= 1) {
      return List.of(L1);
    }
    if (lines == 2) {
      return List.of(L1, L2, L1_L2);
    }
    return twoPole
        ? List.of(L1, L2, L3, L1_L2, L2_L3, L3_L1, THREE_POLE)
        : LINE_TO_NEUTRAL_OR_THREE_POLE;
  }

  /** The single-pole position on the given line. */
  public static PhasePosition on(Phase phase) {
    return valueOf(phase.name());
  }

  /** The two-pole position between two different lines, in either order. */
  public static PhasePosition between(Phase a, Phase b) {
    Set<Phase> pair = EnumSet.of(a, b);
    for (PhasePosition position : List.of(L1_L2, L2_L3, L3_L1)) {
      if (position.phases().equals(pair)) {
        return position;
      }
    }
    throw new IllegalArgumentException("no two-pole position between " + a + " and " + b);
  }
}
