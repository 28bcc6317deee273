package com.wayledger.engine;

import java.util.EnumSet;
import java.util.Set;

/**
 * Where a circuit sits on a board: a single-pole position on one line, or a three-pole device
 * across all three. On a single-phase board every circuit sits on {@link #L1}.
 */
public enum PhasePosition {
  L1,
  L2,
  L3,
  THREE_POLE;

  /** The lines this position occupies. */
  public Set<Phase> phases() {
    return switch (this) {
      case L1 -> EnumSet.of(Phase.L1);
      case L2 -> EnumSet.of(Phase.L2);
      case L3 -> EnumSet.of(Phase.L3);
      case THREE_POLE -> EnumSet.allOf(Phase.class);
    };
  }

  public boolean isSinglePole() {
    return this != THREE_POLE;
  }

  /** The single-pole position on the given line. */
  public static PhasePosition on(Phase phase) {
    return valueOf(phase.name());
  }
}
