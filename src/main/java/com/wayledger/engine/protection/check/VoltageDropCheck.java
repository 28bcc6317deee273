package com.wayledger.engine.protection.check;

import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Voltage drop from the origin to the end of the circuit: the board's drop up the tree plus the
 * circuit's own.
 */
public final class VoltageDropCheck {

  public static final String REFERENCE =
      "BS 7671 525 and Appendix 12 Table 12A / IEC 60364-5-52 Annex G: 3 % lighting, 5 % other (public supply);"
          + " 6 % / 8 % (private supply)";

  private VoltageDropCheck() {}

  /**
   * @param boardDropPercent drop from the origin to the board, %
   * @param circuitDropPercent drop along the circuit at Ib, %
   * @param limitPercent the limit for this kind of circuit and supply, %
   * @param lighting whether the lighting limit applied
   */
  public static Finding assess(
      double boardDropPercent, double circuitDropPercent, double limitPercent, boolean lighting) {
    double total = boardDropPercent + circuitDropPercent;
    List<Quantity> values =
        List.of(
            new Quantity("drop to board", boardDropPercent, "%"),
            new Quantity("drop in circuit", circuitDropPercent, "%"),
            new Quantity("total drop", total, "%"),
            new Quantity(lighting ? "limit (lighting)" : "limit (other uses)", limitPercent, "%"));
    String[] shown = Rounding.comparedPercent(total, limitPercent);
    if (total <= limitPercent) {
      return Finding.pass(
          CheckKind.VOLTAGE_DROP,
          "voltage drop from the origin " + shown[0] + " ≤ " + shown[1],
          values,
          REFERENCE);
    }
    return new Finding(
        CheckKind.VOLTAGE_DROP,
        Verdict.WARNING,
        "voltage drop from the origin "
            + shown[0]
            + " above the "
            + shown[1]
            + " limit for "
            + (lighting ? "lighting" : "other uses"),
        values,
        REFERENCE,
        circuitDropPercent >= boardDropPercent
            ? "fit a larger circuit cable or shorten the run"
            : "most of the drop is in the submains: enlarge the submain cable");
  }
}
