package com.wayledger.engine.protection.result;

import java.util.function.Function;

/**
 * A value that is either known or missing for a stated reason, so that a calculation deep in the
 * tree can tell the finding at the top what input it lacked.
 *
 * @param value the value; null when missing
 * @param missing what is missing or why it cannot be had, e.g. "cable length"; null when known
 */
public record Resolved<T>(T value, String missing) {

  public static <T> Resolved<T> of(T value) {
    return new Resolved<>(value, null);
  }

  public static <T> Resolved<T> missing(String what) {
    return new Resolved<>(null, what);
  }

  public boolean isKnown() {
    return missing == null;
  }

  public <U> Resolved<U> map(Function<T, U> f) {
    return isKnown() ? Resolved.of(f.apply(value)) : Resolved.missing(missing);
  }

  public <U> Resolved<U> flatMap(Function<T, Resolved<U>> f) {
    return isKnown() ? f.apply(value) : Resolved.missing(missing);
  }
}
