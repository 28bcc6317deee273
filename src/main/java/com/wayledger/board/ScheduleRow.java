package com.wayledger.board;

import com.wayledger.engine.Phase;

/**
 * One line of a printed schedule: a way on a single-phase board, or one line (L1, L2, L3) of a way
 * on a three-phase board. A three-pole circuit fills three lines; the second and third are
 * continuations.
 *
 * @param wayNumber way number from 1
 * @param phase the line this row stands for (L1 on a single-phase board)
 * @param circuit what sits there; null for a position with nothing recorded
 * @param continuation whether this row continues a three-pole circuit shown on the row above
 * @param spanRows how many rows the circuit's cells span (3 for a three-pole circuit, else 1)
 */
public record ScheduleRow(
    int wayNumber, Phase phase, Circuit circuit, boolean continuation, int spanRows) {

  public boolean isFree() {
    return circuit == null;
  }

  /** Element id of this row, stable across reloads: "pos-4-L2". */
  public String elementId() {
    return "pos-" + wayNumber + "-" + phase.name();
  }
}
