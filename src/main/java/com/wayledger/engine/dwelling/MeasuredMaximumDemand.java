package com.wayledger.engine.dwelling;

import java.time.LocalDate;

/**
 * A maximum demand recorded by a facility manager over a period (NEC 220.87).
 *
 * @param periodStart first day of the recording period
 * @param periodEnd last day of the recording period
 * @param peakOn the day the maximum was reached; null when not known
 * @param value the maximum demand, kVA or kW as {@code kilovoltAmperes} says
 * @param kilovoltAmperes true when recorded in kVA; false for kW (then taken as kVA, named as an
 *     assumption)
 * @param intervalMinutes the demand interval of the meter (15 for the 220.87 exception); null when
 *     not known
 */
public record MeasuredMaximumDemand(
    LocalDate periodStart,
    LocalDate periodEnd,
    LocalDate peakOn,
    double value,
    boolean kilovoltAmperes,
    Integer intervalMinutes) {

  /** Days covered, both ends counted. */
  public long days() {
    return java.time.temporal.ChronoUnit.DAYS.between(periodStart, periodEnd) + 1;
  }
}
