package com.wayledger.engine;

/**
 * How a circuit's complex power S = P + jQ lands on the lines of a board, as the complex power each
 * line carries referred to the neutral (S_k = V_k·conj(I_k)); plain numbers in, plain numbers out.
 * With every line at the same voltage U0 to neutral, |S_k|/U0 is the line current and the phasor
 * sum of conj(S_k/V_k) is the neutral current.
 *
 * <p>Relations used (any power-systems textbook; from memory, W. D. Stevenson, <i>Elements of Power
 * System Analysis</i>, ch. 2): a load between line a and neutral draws I_a = conj(S/V_a); a load
 * between lines a and b draws I_ab = conj(S/V_ab) with V_ab = V_a − V_b, leaving on line a and
 * returning on line b (I_b = −I_ab), none on the neutral; a balanced three-phase load draws S/3 on
 * each line. Line a then carries S_a = V_a·S/V_ab and line b S_b = −V_b·S/V_ab, which sum to S: on
 * the split-phase system each line carries S/2, on a wye S/√3 shifted by −30° and +30° (the two
 * wattmeter readings).
 */
public final class LinePhasors {

  private LinePhasors() {}

  /**
   * Adds the circuit's complex power to the per-line sums.
   *
   * @param system the supply's line geometry
   * @param position where the circuit sits; nothing is added when null
   * @param activeWatts P of the circuit, W
   * @param reactiveVars Q of the circuit, var
   * @param lineWatts P per line in {@link Phase} order, added to
   * @param lineVars Q per line in {@link Phase} order, added to
   */
  public static void add(
      SupplySystem system,
      PhasePosition position,
      double activeWatts,
      double reactiveVars,
      double[] lineWatts,
      double[] lineVars) {
    if (position == null) {
      return;
    }
    if (position == PhasePosition.THREE_POLE) {
      for (int k = 0; k < 3; k++) {
        lineWatts[k] += activeWatts / 3.0;
        lineVars[k] += reactiveVars / 3.0;
      }
      return;
    }
    if (position.isSinglePole()) {
      int k = position.ordinal();
      lineWatts[k] += activeWatts;
      lineVars[k] += reactiveVars;
      return;
    }
    Phase a = position.fromLine();
    Phase b = position.toLine();
    double ta = Math.toRadians(system.angleDegrees(a));
    double tb = Math.toRadians(system.angleDegrees(b));
    // unit phasors of the two line voltages and of V_ab / U0
    double ar = Math.cos(ta);
    double ai = Math.sin(ta);
    double br = Math.cos(tb);
    double bi = Math.sin(tb);
    double dr = ar - br;
    double di = ai - bi;
    double d2 = dr * dr + di * di;
    // S / V_ab (per U0): (P + jQ)(dr − j di)/|d|²
    double sr = (activeWatts * dr + reactiveVars * di) / d2;
    double si = (reactiveVars * dr - activeWatts * di) / d2;
    // S_a = V_a·S/V_ab, S_b = −V_b·S/V_ab
    lineWatts[a.ordinal()] += ar * sr - ai * si;
    lineVars[a.ordinal()] += ar * si + ai * sr;
    lineWatts[b.ordinal()] += -(br * sr - bi * si);
    lineVars[b.ordinal()] += -(br * si + bi * sr);
  }

  /**
   * Neutral current, A: the magnitude of the phasor sum of the line currents I_k = conj(S_k/V_k)
   * over the first {@code lines} lines, each voltage at its system angle.
   */
  public static double neutralCurrentAmps(
      SupplySystem system,
      int lines,
      double[] lineWatts,
      double[] lineVars,
      double nominalVoltageVolts) {
    double real = 0.0;
    double imaginary = 0.0;
    Phase[] phases = Phase.values();
    for (int k = 0; k < lines; k++) {
      double angle = Math.toRadians(system.angleDegrees(phases[k]));
      double cos = Math.cos(angle);
      double sin = Math.sin(angle);
      // I = conj(S)·e^{jθ}/U0 = (P − jQ)(cos θ + j sin θ)/U0
      real += lineWatts[k] * cos + lineVars[k] * sin;
      imaginary += lineWatts[k] * sin - lineVars[k] * cos;
    }
    return Math.hypot(real, imaginary) / nominalVoltageVolts;
  }

  /**
   * Angle of a line's current, degrees in (−180, 180]: arg(conj(S_k/V_k)) = θ_k − arg(S_k).
   *
   * @param lineAngleDegrees the line voltage's angle
   */
  public static double currentAngleDegrees(
      double lineAngleDegrees, double lineWatts, double lineVars) {
    double angle = lineAngleDegrees - Math.toDegrees(Math.atan2(lineVars, lineWatts));
    angle = Math.IEEEremainder(angle, 360.0);
    return angle <= -180.0 ? angle + 360.0 : angle;
  }

  /**
   * Volt-amperes per ampere of line current for a circuit in this position: U0 line to neutral,
   * √3·U0 (wye) or 2·U0 (split-phase) line to line, 3·U0 for a balanced three-pole circuit.
   */
  public static double voltAmperesPerAmp(
      SupplySystem system, PhasePosition position, double nominalVoltageVolts) {
    if (position == PhasePosition.THREE_POLE) {
      return 3.0 * nominalVoltageVolts;
    }
    if (position != null && position.isLineToLine()) {
      return system.lineToLineFactor() * nominalVoltageVolts;
    }
    return nominalVoltageVolts;
  }

  /**
   * The line angles of a board known only by its number of lines: two lines are the split-phase
   * system (0°, 180°), one or three the wye (0°, −120°, +120°). Only the angles matter to {@link
   * #add}.
   */
  public static SupplySystem geometryOf(int lines) {
    return lines == 2 ? SupplySystem.SPLIT_PHASE_120_240 : SupplySystem.IEC_WYE;
  }
}
