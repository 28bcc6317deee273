package com.wayledger.engine.protection.cable;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.protection.result.Resolved;

/**
 * Whole-length resistances of a cable used by the fault-path calculation: R1+R2 (line plus
 * protective conductor) hot for the earth fault loop, and R1 cold for the largest fault current.
 */
public final class CableImpedance {

  private CableImpedance() {}

  /** (R1+R2) per metre at operating temperature, mΩ/m. */
  public static Resolved<Double> r1PlusR2MilliOhmsPerMetre(CableSpec cable) {
    if (cable == null) {
      return Resolved.missing("cable");
    }
    if (cable.protectiveCsaSquareMillimetres() == null) {
      return Resolved.missing("protective conductor (cpc) cross-section");
    }
    return ConductorResistance.milliOhmsPerMetreHot(
            cable.material(), cable.lineCsaSquareMillimetres(), cable.insulation())
        .flatMap(
            r1 ->
                ConductorResistance.milliOhmsPerMetreHot(
                        cable.material(),
                        cable.protectiveCsaSquareMillimetres(),
                        cable.insulation())
                    .map(r2 -> r1 + r2));
  }

  /** (R1+R2) of the whole length at operating temperature, Ω. */
  public static Resolved<Double> r1PlusR2Ohms(CableSpec cable) {
    return length(cable).flatMap(l -> r1PlusR2MilliOhmsPerMetre(cable).map(r -> r * l / 1000.0));
  }

  /**
   * R1 of the whole length at 20 °C, Ω: the cold value gives the largest prospective fault current.
   */
  public static Resolved<Double> lineOhmsCold(CableSpec cable) {
    return length(cable)
        .flatMap(
            l ->
                ConductorResistance.ohmsPerKmAt20Celsius(
                        cable.material(), cable.lineCsaSquareMillimetres())
                    .map(r -> r * l / 1000.0));
  }

  static Resolved<Double> length(CableSpec cable) {
    if (cable == null) {
      return Resolved.missing("cable");
    }
    return cable.lengthMetres() == null
        ? Resolved.missing("cable length")
        : Resolved.of(cable.lengthMetres());
  }
}
