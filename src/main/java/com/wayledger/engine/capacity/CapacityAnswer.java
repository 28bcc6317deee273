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

  /**
   * The best candidate, or null when no candidate can take the load without overloading something
   * or adding a danger: an overload is never offered as the best answer.
   */
  public CandidateOutcome best() {
    return outcomes.isEmpty() || !outcomes.get(0).isAcceptable() ? null : outcomes.get(0);
  }

  /**
   * Why nothing on the site can take the load, in one sentence; null when there is a best candidate
   * or no candidate at all.
   */
  public String whyNone() {
    if (outcomes.isEmpty() || best() != null) {
      return null;
    }
    java.util.Set<String> why = new java.util.LinkedHashSet<>();
    outcomes.forEach(o -> why.addAll(o.blockers()));
    return "No candidate can take the load: every one would "
        + String.join("; ", why.stream().limit(6).toList())
        + (why.size() > 6 ? "; …" : "");
  }
}
