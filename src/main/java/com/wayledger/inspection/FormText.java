package com.wayledger.inspection;

import com.wayledger.engine.inspection.CircuitResults;
import com.wayledger.inspection.InspectionForm.ResultEntry;
import java.math.BigDecimal;

/** Between typed grid text and results: parsing one way, plain numbers the other. */
final class FormText {

  private FormText() {}

  static CircuitResults results(Readings readings, String prefix, ResultEntry e) {
    return new CircuitResults(
        readings.number(prefix + "r1r2", e.r1r2()),
        readings.number(prefix + "r2", e.r2()),
        readings.number(prefix + "ringR1", e.ringR1()),
        readings.number(prefix + "ringRn", e.ringRn()),
        readings.number(prefix + "ringR2", e.ringR2()),
        readings.number(prefix + "irLl", e.irLl()),
        readings.number(prefix + "irLe", e.irLe()),
        readings.number(prefix + "irNe", e.irNe()),
        readings.yesNo(prefix + "polarity", e.polarity()),
        readings.number(prefix + "zs", e.zs()),
        readings.number(prefix + "rcd1", e.rcd1()),
        readings.number(prefix + "rcd5", e.rcd5()),
        readings.yesNo(prefix + "rcdButton", e.rcdButton()),
        Boolean.TRUE.equals(e.rcdDelayed()));
  }

  static ResultEntry entry(long circuitId, CircuitResults r) {
    return new ResultEntry(
        circuitId,
        number(r.r1PlusR2Ohms()),
        number(r.r2Ohms()),
        number(r.ringLineOhms()),
        number(r.ringNeutralOhms()),
        number(r.ringProtectiveOhms()),
        number(r.insulationLineLineMegaohms()),
        number(r.insulationLineEarthMegaohms()),
        number(r.insulationNeutralEarthMegaohms()),
        yesNo(r.polarityCorrect()),
        number(r.loopImpedanceOhms()),
        number(r.rcdRatedMillis()),
        number(r.rcdFiveTimesMillis()),
        yesNo(r.rcdButtonWorks()),
        r.rcdDelayed());
  }

  static String number(Double v) {
    return v == null ? "" : BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
  }

  static String yesNo(Boolean b) {
    return b == null ? "" : b ? "ok" : "wrong";
  }
}
