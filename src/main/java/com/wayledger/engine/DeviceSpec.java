package com.wayledger.engine;

/**
 * A protective device as recorded on a schedule.
 *
 * @param kind kind of device
 * @param curve instantaneous tripping type (B/C/D) for MCBs and RCBOs; null otherwise or when
 *     unknown
 * @param ratedCurrentAmps In; null only for a device whose rating is not yet known
 * @param poles 1 to 4
 * @param breakingCapacityKiloAmps rated short-circuit capacity (Icn for MCBs, Icu for MCCBs); null
 *     when unknown
 * @param residualCurrentMilliAmps IΔn for RCDs and RCBOs; null otherwise
 * @param rcdType residual-current type for RCDs and RCBOs; null otherwise
 */
public record DeviceSpec(
    DeviceKind kind,
    TripCurve curve,
    Double ratedCurrentAmps,
    int poles,
    Double breakingCapacityKiloAmps,
    Double residualCurrentMilliAmps,
    RcdType rcdType) {}
