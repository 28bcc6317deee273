package com.wayledger.engine;

/** Residual-current type by the waveforms it detects (IEC 60755 / IEC 61008-1 letters). */
public enum RcdType {
  AC,
  A,
  F,
  B
}
