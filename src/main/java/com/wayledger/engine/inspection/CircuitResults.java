package com.wayledger.engine.inspection;

/**
 * What an inspector measured on one circuit; any field may be null (not measured, or not
 * applicable).
 *
 * @param r1PlusR2Ohms continuity of line plus protective conductor, Ω (for a ring: the highest
 *     cross-connected line–cpc reading)
 * @param r2Ohms continuity of the protective conductor alone (wander lead), Ω
 * @param ringLineOhms ring final circuit end-to-end line reading r1, Ω
 * @param ringNeutralOhms ring end-to-end neutral reading rn, Ω
 * @param ringProtectiveOhms ring end-to-end protective-conductor reading r2, Ω
 * @param insulationLineLineMegaohms insulation resistance between live conductors, MΩ
 * @param insulationLineEarthMegaohms insulation resistance line(s) to earth, MΩ
 * @param insulationNeutralEarthMegaohms insulation resistance neutral to earth, MΩ
 * @param polarityCorrect true correct, false wrong, null not checked
 * @param loopImpedanceOhms measured Zs at the far end, Ω
 * @param rcdRatedMillis RCD operating time at IΔn, ms
 * @param rcdFiveTimesMillis RCD operating time at 5·IΔn, ms
 * @param rcdButtonWorks the RCD's test button trips it: true, false, or null not tried
 * @param rcdDelayed the RCD is a time-delayed (type S) device
 */
public record CircuitResults(
    Double r1PlusR2Ohms,
    Double r2Ohms,
    Double ringLineOhms,
    Double ringNeutralOhms,
    Double ringProtectiveOhms,
    Double insulationLineLineMegaohms,
    Double insulationLineEarthMegaohms,
    Double insulationNeutralEarthMegaohms,
    Boolean polarityCorrect,
    Double loopImpedanceOhms,
    Double rcdRatedMillis,
    Double rcdFiveTimesMillis,
    Boolean rcdButtonWorks,
    boolean rcdDelayed) {

  /** Nothing measured. */
  public static final CircuitResults NONE =
      new CircuitResults(
          null, null, null, null, null, null, null, null, null, null, null, null, null, false);

  /** Whether any value at all was entered. */
  public boolean anyEntered() {
    return !equals(
        new CircuitResults(
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            rcdDelayed));
  }
}
