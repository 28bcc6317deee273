package com.wayledger.engine.protection.device;

/**
 * Adjustable settings of a moulded-case breaker (IEC 60947-2), which the shared {@code DeviceSpec}
 * does not hold.
 *
 * @param longTimeSettingAmps Ir, the overload (thermal or long-time) setting, A; at most In
 * @param instantaneousSettingAmps Ii, the instantaneous (magnetic) pick-up setting, A; tripping is
 *     within ±20 % of it (IEC 60947-2 8.3.3.1.2)
 */
public record MccbSettings(double longTimeSettingAmps, double instantaneousSettingAmps) {}
