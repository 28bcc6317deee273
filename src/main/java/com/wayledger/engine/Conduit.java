package com.wayledger.engine;

/**
 * The conduit a circuit's conductors run in, as NEC Chapter 9 Table 9 tells its columns apart: PVC,
 * aluminum or steel (the table's resistance and reactance differ by conduit). Recorded on NEC
 * circuits only; a circuit that records none (null) has its voltage drop worked in the conduit of
 * the highest impedance, and the finding says so.
 */
public enum Conduit {
  PVC,
  ALUMINUM,
  STEEL
}
