package com.wayledger.engine;

/** Cable insulation by its maximum conductor operating temperature. */
public enum Insulation {
  /** Thermoplastic (PVC), 70 °C. */
  THERMOPLASTIC_70(70),
  /** Thermosetting (XLPE, EPR), 90 °C. */
  THERMOSETTING_90(90);

  private final int maxConductorTemperatureCelsius;

  Insulation(int maxConductorTemperatureCelsius) {
    this.maxConductorTemperatureCelsius = maxConductorTemperatureCelsius;
  }

  public int maxConductorTemperatureCelsius() {
    return maxConductorTemperatureCelsius;
  }
}
