package com.wayledger.board;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;

/**
 * A recorded maximum demand as typed on the page or sent to the API (NEC 220.87).
 *
 * @param periodStart first day of the recording
 * @param periodEnd last day of the recording
 * @param peakOn day of the maximum; optional
 * @param maximumDemand the maximum demand in {@code unit}
 * @param unit KVA or KW
 * @param intervalMinutes the meter's demand interval; optional
 * @param note where and how it was measured; optional
 */
public record MeasuredDemandForm(
    @NotNull LocalDate periodStart,
    @NotNull LocalDate periodEnd,
    LocalDate peakOn,
    @NotNull @Positive @DecimalMax("1000000") Double maximumDemand,
    @NotNull MeasuredDemand.Unit unit,
    @Min(1) @Max(1440) Integer intervalMinutes,
    @Size(max = 200) String note) {

  public static MeasuredDemandForm empty() {
    return new MeasuredDemandForm(null, null, null, null, MeasuredDemand.Unit.KVA, 15, null);
  }
}
