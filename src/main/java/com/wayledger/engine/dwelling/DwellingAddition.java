package com.wayledger.engine.dwelling;

/** Whether a dwelling's load is being calculated for an addition to it (NEC 220.83). */
public enum DwellingAddition {
  /** Not an addition: 220.83 is not worked. */
  NONE,
  /** 220.83(A): loads added, but no air-conditioning or electric space-heating equipment. */
  WITHOUT_HEATING_OR_COOLING,
  /** 220.83(B): air-conditioning or electric space-heating equipment is to be installed. */
  WITH_HEATING_OR_COOLING
}
