package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Way overloaded: the design current Ib is above the device's rating (or MCCB overload setting).
 */
public final class OverloadCheck {

  public static final String REFERENCE = "BS 7671 433.1.1 (i) / IEC 60364-4-43 433.1: Ib ≤ In";

  private OverloadCheck() {}

  /**
   * @param designCurrentAmps Ib after diversity, A
   * @param ratedAmps In, or Ir for an MCCB, A
   */
  public static Finding assess(double designCurrentAmps, double ratedAmps) {
    List<Quantity> values =
        List.of(new Quantity("Ib", designCurrentAmps, "A"), new Quantity("In", ratedAmps, "A"));
    String[] shown = Rounding.comparedAmps(designCurrentAmps, ratedAmps);
    if (designCurrentAmps <= ratedAmps) {
      return Finding.pass(
          CheckKind.WAY_OVERLOAD, "Ib " + shown[0] + " ≤ In " + shown[1], values, REFERENCE);
    }
    return new Finding(
        CheckKind.WAY_OVERLOAD,
        Verdict.WARNING,
        "way overloaded: Ib " + shown[0] + " > In " + shown[1],
        values,
        REFERENCE,
        "split the load over more ways, or fit a larger device if the cable's Iz allows it");
  }
}
