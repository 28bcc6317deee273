package com.wayledger.engine;

/**
 * The NEC's personnel and fire protection functions of a breaker: a ground-fault circuit
 * interrupter (NEC 210.8, a Class A device per UL 943 that opens at 4 to 6 mA of ground current —
 * from memory), an arc-fault circuit interrupter (NEC 210.12, UL 1699) or a dual-function breaker
 * that is both. A 30 mA residual-current device of the IEC set is not a GFCI and is never read as
 * one. A circuit whose device records none (null) has neither.
 */
public enum FaultInterrupter {
  /** Ground-fault circuit interrupter, Class A (UL 943). */
  GFCI,
  /** Arc-fault circuit interrupter (UL 1699). */
  AFCI,
  /** A combination breaker that is both a GFCI and an AFCI. */
  DUAL_FUNCTION;

  /** UL 943 Class A: trips at 6 mA of ground current at most (from memory: 4 to 6 mA). */
  public static final double CLASS_A_TRIP_MILLIAMPS = 6.0;

  /** Whether this function includes ground-fault (GFCI) protection. */
  public boolean groundFault() {
    return this == GFCI || this == DUAL_FUNCTION;
  }

  /** Whether this function includes arc-fault (AFCI) protection. */
  public boolean arcFault() {
    return this == AFCI || this == DUAL_FUNCTION;
  }
}
