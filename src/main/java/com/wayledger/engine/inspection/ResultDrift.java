package com.wayledger.engine.inspection;

import java.util.ArrayList;
import java.util.List;

/**
 * How one circuit's results moved between two inspections. Which moves need attention are
 * Wayledger's own thresholds, not published limits: insulation resistance falling to less than half
 * (insulation degrading), R1+R2 rising by more than {@link #CONTINUITY_RISE_OHMS} (a termination
 * loosening: the same 0.05 Ω the ring test treats as agreement), an RCD's time lengthening by more
 * than {@link #RCD_SLOWER_FRACTION} (its mechanism slowing).
 */
public final class ResultDrift {

  public static final double INSULATION_FALL_FRACTION = 0.5;
  public static final double CONTINUITY_RISE_OHMS = 0.05;
  public static final double RCD_SLOWER_FRACTION = 0.2;

  /**
   * One value's move.
   *
   * @param quantity the value's name
   * @param unit its unit
   * @param earlier the earlier reading, null when not measured then
   * @param later the later reading, null when not measured then
   * @param attention whether the move needs attention
   * @param message what moved and why it matters
   */
  public record Move(
      String quantity,
      String unit,
      Double earlier,
      Double later,
      boolean attention,
      String message) {}

  private ResultDrift() {}

  /** Every value measured at both dates, with whether its move needs attention. */
  public static List<Move> between(CircuitResults earlier, CircuitResults later) {
    List<Move> out = new ArrayList<>();
    insulation(
        out, "IR L–L", earlier.insulationLineLineMegaohms(), later.insulationLineLineMegaohms());
    insulation(
        out, "IR L–E", earlier.insulationLineEarthMegaohms(), later.insulationLineEarthMegaohms());
    insulation(
        out,
        "IR N–E",
        earlier.insulationNeutralEarthMegaohms(),
        later.insulationNeutralEarthMegaohms());
    rising(out, "R1+R2", earlier.r1PlusR2Ohms(), later.r1PlusR2Ohms());
    rising(out, "R2", earlier.r2Ohms(), later.r2Ohms());
    rising(out, "Zs", earlier.loopImpedanceOhms(), later.loopImpedanceOhms());
    slower(out, "RCD at IΔn", earlier.rcdRatedMillis(), later.rcdRatedMillis());
    slower(out, "RCD at 5×IΔn", earlier.rcdFiveTimesMillis(), later.rcdFiveTimesMillis());
    return out;
  }

  private static void insulation(List<Move> out, String quantity, Double a, Double b) {
    if (a == null || b == null) {
      return;
    }
    boolean attention = b < a * INSULATION_FALL_FRACTION;
    out.add(
        new Move(
            quantity,
            "MΩ",
            a,
            b,
            attention,
            quantity
                + " "
                + Figures.megaohms(a)
                + " → "
                + Figures.megaohms(b)
                + (attention ? ": fell by more than half — insulation degrading" : "")));
  }

  private static void rising(List<Move> out, String quantity, Double a, Double b) {
    if (a == null || b == null) {
      return;
    }
    boolean attention = b - a > CONTINUITY_RISE_OHMS + 1e-9;
    out.add(
        new Move(
            quantity,
            "Ω",
            a,
            b,
            attention,
            quantity
                + " "
                + Figures.ohms(a)
                + " → "
                + Figures.ohms(b)
                + (attention ? ": rose by more than 0.05 Ω — check terminations" : "")));
  }

  private static void slower(List<Move> out, String quantity, Double a, Double b) {
    if (a == null || b == null) {
      return;
    }
    boolean attention = b > a * (1 + RCD_SLOWER_FRACTION);
    out.add(
        new Move(
            quantity,
            "ms",
            a,
            b,
            attention,
            quantity
                + " "
                + Figures.millis(a)
                + " → "
                + Figures.millis(b)
                + (attention ? ": more than 20 % slower — the device is ageing" : "")));
  }
}
