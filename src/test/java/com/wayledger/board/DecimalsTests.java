package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.thymeleaf.util.NumberUtils;

/** The board page's figures printed in Java read as {@code #numbers.formatDecimal} wrote them. */
class DecimalsTests {

  @Test
  void wholeOneAndTwoDecimalsMatchThymeleafForDoublesAndIntegersInTwoLocales() {
    for (Locale locale : new Locale[] {Locale.UK, Locale.GERMANY}) {
      Decimals decimals = new Decimals(locale);
      for (Number value : new Number[] {0.0, 2.25, 2.35, 9.995, -3.45, 1234567.891, 100, 63L}) {
        assertThat(decimals.whole(value))
            .as("%s, no decimals, %s", value, locale)
            .isEqualTo(NumberUtils.format(value, 1, 0, locale));
        assertThat(decimals.one(value))
            .as("%s, one decimal, %s", value, locale)
            .isEqualTo(NumberUtils.format(value, 1, 1, locale));
        assertThat(decimals.two(value))
            .as("%s, two decimals, %s", value, locale)
            .isEqualTo(NumberUtils.format(value, 1, 2, locale));
      }
    }
  }

  @Test
  void nothingRecordedPrintsNothing() {
    assertThat(new Decimals(Locale.UK).one(null)).isNull();
  }
}
