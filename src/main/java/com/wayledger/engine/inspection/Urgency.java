package com.wayledger.engine.inspection;

/**
 * How urgently an observation must be acted on, in the meanings the trade gives its classes; the
 * names are Wayledger's own. Declared worst first.
 */
public enum Urgency {
  /** Danger is present now: make safe before leaving the installation. */
  DANGER_NOW,
  /** Potentially dangerous: put right as a matter of urgency. */
  URGENT,
  /** Further investigation is needed without delay before the state can be judged. */
  INVESTIGATE,
  /** Not dangerous; improvement recommended. */
  ADVISORY;

  /** Whether an observation of this class makes the inspection's outcome unsatisfactory. */
  public boolean makesUnsatisfactory() {
    return this != ADVISORY;
  }

  /** The worse of two classes. */
  public Urgency worse(Urgency other) {
    return other == null || ordinal() <= other.ordinal() ? this : other;
  }

  /** The class proposed for a failing value of this kind of test. */
  public static Urgency proposedFor(TestKind kind) {
    return switch (kind) {
      case POLARITY -> DANGER_NOW;
      case INSULATION,
          LOOP_IMPEDANCE,
          RCD_TIME,
          RCD_BUTTON,
          FAULT_CURRENT,
          EARTH_ELECTRODE,
          MAIN_BONDING ->
          URGENT;
      case CONTINUITY, RING_CONTINUITY, EXTERNAL_LOOP_IMPEDANCE, RECORD_MISMATCH -> INVESTIGATE;
    };
  }
}
