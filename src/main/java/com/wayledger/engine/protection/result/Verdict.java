package com.wayledger.engine.protection.result;

/**
 * Outcome of one check. Three grades of problem, from {@link #DANGER} to {@link #ADVICE}, a {@link
 * #PASS}, and {@link #NOT_ASSESSED} when an input is missing: a check never passes silently on
 * incomplete data.
 */
public enum Verdict {
  /** Risk of shock, fire or a device that cannot clear a fault: fix before energising. */
  DANGER,
  /**
   * Non-compliance or misbehaviour (nuisance trips, excessive voltage drop, overload): fix soon.
   */
  WARNING,
  /**
   * Works, but could be better or needs a look on site (partial selectivity, protection that cannot
   * be seen).
   */
  ADVICE,
  /** The check ran on complete inputs and found nothing. */
  PASS,
  /** An input the check needs is missing; the finding says which. */
  NOT_ASSESSED;

  /** Whether this verdict asks for action (danger, warning or advice). */
  public boolean isProblem() {
    return this == DANGER || this == WARNING || this == ADVICE;
  }
}
