package com.wayledger.support;

import org.junit.jupiter.api.Assumptions;

/**
 * A test that needs a real part the machine may lack (PostgreSQL, Chromium) skips with a message on
 * a laptop and fails in CI, where the part must be present: CI=true turns the skip into a failure.
 */
public final class RealParts {

  private RealParts() {}

  public static boolean inCi() {
    return "true".equalsIgnoreCase(System.getenv("CI"));
  }

  /** Skips (or, in CI, fails) the calling test when the part is missing. */
  public static void require(boolean present, String missing) {
    if (present) {
      return;
    }
    if (inCi()) {
      throw new AssertionError("CI=true but " + missing + "; .ci/run must provide it");
    }
    Assumptions.abort("Skipped: " + missing);
  }
}
