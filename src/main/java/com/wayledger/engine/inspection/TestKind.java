package com.wayledger.engine.inspection;

/** The subject of a test, used to propose an observation's urgency when a value fails. */
public enum TestKind {
  CONTINUITY,
  RING_CONTINUITY,
  INSULATION,
  POLARITY,
  LOOP_IMPEDANCE,
  RCD_TIME,
  RCD_BUTTON,
  EXTERNAL_LOOP_IMPEDANCE,
  FAULT_CURRENT,
  EARTH_ELECTRODE,
  MAIN_BONDING,
  RECORD_MISMATCH
}
