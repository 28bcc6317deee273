package com.wayledger.engine.capacity;

import java.util.List;

/**
 * The answer to "can it take it?".
 *
 * @param load the load asked about
 * @param outcomes every candidate, best first
 * @param notes why some boards offered no candidate (a three-phase load on a single-phase board, no
 *     free position), and the ranking rule
 */
public record CapacityAnswer(NewLoad load, List<CandidateOutcome> outcomes, List<String> notes) {

  public CapacityAnswer {
    outcomes = List.copyOf(outcomes);
    notes = List.copyOf(notes);
  }

  /** The best candidate, or null when there is none. */
  public CandidateOutcome best() {
    return outcomes.isEmpty() ? null : outcomes.get(0);
  }
}
