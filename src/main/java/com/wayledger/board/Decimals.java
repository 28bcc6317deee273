package com.wayledger.board;

import java.util.Locale;

/**
 * Figures as the board page prints them, for its templates ({@code ${decimals.one(amps)}}): the
 * same text as Thymeleaf's {@code #numbers.formatDecimal(value, 1, decimals)}, written with a kept
 * formatter ({@link ScheduleFigures#decimal}) instead of a new {@code DecimalFormat} and symbols
 * per call — the demand panel and phase chart print about forty figures.
 *
 * @param locale the page's locale (its decimal sign)
 */
public record Decimals(Locale locale) {

  /** No decimals ("100"); null for null. */
  public String whole(Number value) {
    return format(value, 0);
  }

  /** One decimal ("8.7"); null for null. */
  public String one(Number value) {
    return format(value, 1);
  }

  /** Two decimals ("11.50"); null for null. */
  public String two(Number value) {
    return format(value, 2);
  }

  private String format(Number value, int decimals) {
    return value == null ? null : ScheduleFigures.decimal(value.doubleValue(), decimals, locale);
  }
}
