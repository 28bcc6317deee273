package com.wayledger.wording;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/** The two pure rules of the page's language: rule set to words, and the browser's choice. */
class PageLocalesTests {

  @Test
  void anNecSiteReadsInUsWordsAndAnIecSiteInUkWords() {
    // NEC (NFPA 70) is the US code, IEC 60364 / BS 7671 the UK's: common practice
    assertThat(PageLocales.forRuleSet("NEC")).isEqualTo(Locale.US);
    assertThat(PageLocales.forRuleSet("IEC")).isEqualTo(Locale.UK);
    assertThat(PageLocales.forRuleSet(null))
        .as("a site from before rule sets")
        .isEqualTo(Locale.UK);
  }

  @Test
  void theBrowsersFirstNamedOfTheTwoWins() {
    // RFC 4647 lookup over Accept-Language (RFC 9110 section 12.5.4): weights order the ranges
    assertThat(PageLocales.fromBrowser("en-US,en;q=0.9")).isEqualTo(Locale.US);
    assertThat(PageLocales.fromBrowser("de-DE,en-GB;q=0.8,en-US;q=0.5")).isEqualTo(Locale.UK);
    assertThat(PageLocales.fromBrowser("en-GB;q=0.3,en-US;q=0.7")).isEqualTo(Locale.US);
  }

  @Test
  void noneOfTheTwoNamedOrAnUnreadableHeaderGivesTheBaseWords() {
    assertThat(PageLocales.fromBrowser(null)).isEqualTo(Locale.UK);
    assertThat(PageLocales.fromBrowser("")).isEqualTo(Locale.UK);
    assertThat(PageLocales.fromBrowser("fr-FR,fr;q=0.9")).isEqualTo(Locale.UK);
    assertThat(PageLocales.fromBrowser("en"))
        .as("plain English: the base words")
        .isEqualTo(Locale.UK);
    assertThat(PageLocales.fromBrowser(";;q=x")).isEqualTo(Locale.UK);
  }
}
