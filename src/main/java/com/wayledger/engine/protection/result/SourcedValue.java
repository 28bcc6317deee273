package com.wayledger.engine.protection.result;

/**
 * A figure with where it came from.
 *
 * @param value the figure in the unit its holder names; null when missing
 * @param source measured, calculated or missing
 * @param missing what input is missing; null unless {@code source} is {@link ValueSource#MISSING}
 */
public record SourcedValue(Double value, ValueSource source, String missing) {

  public static SourcedValue measured(double value) {
    return new SourcedValue(value, ValueSource.MEASURED, null);
  }

  public static SourcedValue calculated(double value) {
    return new SourcedValue(value, ValueSource.CALCULATED, null);
  }

  public static SourcedValue missing(String what) {
    return new SourcedValue(null, ValueSource.MISSING, what);
  }

  public static SourcedValue calculated(Resolved<Double> resolved) {
    return resolved.isKnown() ? calculated(resolved.value()) : missing(resolved.missing());
  }

  public boolean isKnown() {
    return source != ValueSource.MISSING;
  }
}
