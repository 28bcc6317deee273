package com.wayledger.engine;

/** Earthing arrangement of the supply (IEC 60364-1 system types). */
public enum EarthingSystem {
  TN_S,
  TN_C_S,
  TT
}
