package com.wayledger.engine.inspection;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.protection.ProtectionSettings;

/**
 * The conditions of one inspection that every circuit's grading shares.
 *
 * @param earthing the supply's earthing system, null when not recorded
 * @param nominalVoltageToEarthVolts U0
 * @param lineVoltageVolts the highest nominal voltage between conductors (for the insulation band)
 * @param testCelsius the temperature the continuity tests were made at, °C
 * @param insulationTestVolts the DC voltage the insulation tester applied, null when not recorded
 */
public record TestConditions(
    EarthingSystem earthing,
    double nominalVoltageToEarthVolts,
    double lineVoltageVolts,
    double testCelsius,
    Double insulationTestVolts) {

  /** The temperature assumed when the inspector records none, °C (an indoor ambient). */
  public static final double DEFAULT_TEST_CELSIUS = 20.0;

  public double measuredLoopFraction() {
    return ProtectionSettings.DEFAULT_MEASURED_LOOP_IMPEDANCE_FRACTION;
  }

  public double minimumVoltageFactor() {
    return ProtectionSettings.DEFAULT_MINIMUM_VOLTAGE_FACTOR;
  }

  public double touchVoltageLimitVolts() {
    return ProtectionSettings.DEFAULT_TOUCH_VOLTAGE_LIMIT_VOLTS;
  }
}
