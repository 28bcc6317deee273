package com.wayledger.engine;

/** The unit a load's nameplate rating is given in. */
public enum RatingUnit {
  /** Active power, watts. */
  W,
  /** Apparent power, volt-amperes. */
  VA,
  /** Current, amperes (per line for three-phase loads). */
  A
}
