package com.wayledger.board;

import com.wayledger.engine.demand.CircuitDemand;
import java.text.DecimalFormat;
import java.text.NumberFormat;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The three figures a schedule row prints for an assessed circuit — connected kW, Ib and its demand
 * current — as text, worked out once per page in Java. In the template each was a parsed expression
 * with arithmetic, a static call and a new number formatter per cell; the text is the same as the
 * template's {@code #numbers.formatDecimal(value, 1, decimals)} gave (see ScheduleFiguresTests).
 *
 * @param connectedKilowatts connected load P in kW, two decimals
 * @param designCurrentAmps Ib in A, one decimal
 * @param demandAmps the current of the circuit's demand after diversity, per line, in A, one
 *     decimal: |S| / U0, divided by three for a circuit spanning three rows
 */
public record ScheduleFigures(
    String connectedKilowatts, String designCurrentAmps, String demandAmps) {

  /**
   * The figures of every assessed circuit shown on the rows, by circuit id; circuits not assessed
   * (or without demand figures) are left out.
   */
  static Map<Long, ScheduleFigures> of(
      List<ScheduleRow> rows,
      Map<Long, CircuitDemand> demands,
      double nominalVoltageVolts,
      Locale locale) {
    Map<Long, ScheduleFigures> figures = new HashMap<>();
    if (demands == null) {
      return figures;
    }
    for (ScheduleRow row : rows) {
      if (row.circuit() == null || row.continuation()) {
        continue;
      }
      CircuitDemand demand = demands.get(row.circuit().getId());
      if (demand == null || !demand.isAssessed()) {
        continue;
      }
      double lines = row.spanRows() == 3 ? 3 : 1;
      figures.put(
          row.circuit().getId(),
          new ScheduleFigures(
              decimal(demand.connectedWatts() / 1000.0, 2, locale),
              decimal(demand.designCurrentAmps(), 1, locale),
              decimal(
                  Math.hypot(demand.demandWatts(), demand.demandVars())
                      / nominalVoltageVolts
                      / lines,
                  1,
                  locale)));
    }
    return figures;
  }

  private static final ThreadLocal<Map<String, DecimalFormat>> FORMATS =
      ThreadLocal.withInitial(HashMap::new);

  /**
   * A number with exactly the given decimals, at least one integer digit, no grouping, in the
   * locale's decimal sign (half-even rounding) — what Thymeleaf's {@code
   * #numbers.formatDecimal(value, 1, decimals)} writes, without a new formatter per call.
   */
  static String decimal(double value, int decimals, Locale locale) {
    DecimalFormat format =
        FORMATS
            .get()
            .computeIfAbsent(
                locale.toLanguageTag() + "/" + decimals,
                key -> {
                  DecimalFormat made = (DecimalFormat) NumberFormat.getNumberInstance(locale);
                  made.setMinimumFractionDigits(decimals);
                  made.setMaximumFractionDigits(decimals);
                  made.setMinimumIntegerDigits(1);
                  made.setDecimalSeparatorAlwaysShown(decimals > 0);
                  made.setGroupingUsed(false);
                  return made;
                });
    return format.format(value);
  }
}
