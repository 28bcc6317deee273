package com.wayledger.engine;

/** What occupies a position of a board. */
public enum WayStatus {
  /** A device feeding a circuit. */
  IN_USE,
  /** A device fitted but feeding nothing. */
  SPARE_DEVICE,
  /** No device fitted. */
  EMPTY
}
