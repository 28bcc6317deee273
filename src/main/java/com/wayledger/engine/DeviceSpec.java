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
 * @param faultInterrupter GFCI, AFCI or dual-function breaker (NEC set only); null for none
 */
public record DeviceSpec(
    DeviceKind kind,
    TripCurve curve,
    Double ratedCurrentAmps,
    int poles,
    Double breakingCapacityKiloAmps,
    Double residualCurrentMilliAmps,
    RcdType rcdType,
    FaultInterrupter faultInterrupter) {

  /** A device with no GFCI or AFCI function: the argument list from before NEC devices. */
  public DeviceSpec(
      DeviceKind kind,
      TripCurve curve,
      Double ratedCurrentAmps,
      int poles,
      Double breakingCapacityKiloAmps,
      Double residualCurrentMilliAmps,
      RcdType rcdType) {
    this(
        kind,
        curve,
        ratedCurrentAmps,
        poles,
        breakingCapacityKiloAmps,
        residualCurrentMilliAmps,
        rcdType,
        null);
  }

  /** The same device with another GFCI/AFCI function (null: none). */
  public DeviceSpec withFaultInterrupter(FaultInterrupter function) {
    return new DeviceSpec(
        kind,
        curve,
        ratedCurrentAmps,
        poles,
        breakingCapacityKiloAmps,
        residualCurrentMilliAmps,
        rcdType,
        function);
  }
}
