package com.wayledger.engine.protection;

import com.wayledger.engine.Phase;
import java.util.EnumMap;
import java.util.Map;

/**
 * What the demand calculation says about one board, as the protection engine needs it.
 *
 * @param boardId the board
 * @param phaseCurrentsAmps design current on each line at the board's incomer, A (a single-phase
 *     board uses L1)
 * @param unbalancePercent unbalance over the board's lines, %: three phases, or the two lines A and
 *     B of a 120/240 V or 120/208 V board (the demand engine's figure); null for a single-line
 *     board or when not worked out
 * @param neutralCurrentAmps neutral current of a three-phase board from the phasor sum of its line
 *     currents, A; null when not worked out (the submain drop then takes the lines as balanced only
 *     if they are equal, and otherwise bounds the neutral by the largest line)
 */
public record BoardLoading(
    long boardId,
    Map<Phase, Double> phaseCurrentsAmps,
    Double unbalancePercent,
    Double neutralCurrentAmps) {

  /** Loading without a neutral current worked out. */
  public BoardLoading(long boardId, Map<Phase, Double> phaseCurrentsAmps, Double unbalancePercent) {
    this(boardId, phaseCurrentsAmps, unbalancePercent, null);
  }

  public BoardLoading {
    phaseCurrentsAmps =
        phaseCurrentsAmps.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(phaseCurrentsAmps));
  }

  /** The largest line current, A; null when no phase current is given. */
  public Double largestPhaseAmps() {
    return phaseCurrentsAmps.values().stream().max(Double::compare).orElse(null);
  }
}
