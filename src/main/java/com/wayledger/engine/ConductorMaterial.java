package com.wayledger.engine;

/** Conductor metal of a cable. */
public enum ConductorMaterial {
  COPPER,
  ALUMINIUM
}
