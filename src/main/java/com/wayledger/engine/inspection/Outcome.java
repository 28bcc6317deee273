package com.wayledger.engine.inspection;

import java.util.Collection;

/**
 * The overall outcome of an inspection: unsatisfactory when any observation is of a class that
 * makes it so (danger now, urgent or investigate), satisfactory otherwise (common practice for
 * periodic inspection reports). The inspector confirms it.
 */
public enum Outcome {
  SATISFACTORY,
  UNSATISFACTORY;

  public static Outcome of(Collection<Urgency> classes) {
    return classes.stream().anyMatch(Urgency::makesUnsatisfactory) ? UNSATISFACTORY : SATISFACTORY;
  }

  /** The worst class among these, or null when there are none. */
  public static Urgency worst(Collection<Urgency> classes) {
    Urgency worst = null;
    for (Urgency u : classes) {
      worst = u.worse(worst);
    }
    return worst;
  }
}
