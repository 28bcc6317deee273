package com.wayledger.engine.capacity;

/** Where a new load could go. */
public enum CandidateKind {
  /** A way with a device fitted that feeds nothing yet. */
  SPARE_WAY,
  /** A position with no device: a new circuit, with a proposed device. */
  EMPTY_POSITION,
  /** An in-use circuit that already feeds loads of the same category. */
  SHARED_CIRCUIT
}
