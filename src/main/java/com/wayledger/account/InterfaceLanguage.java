package com.wayledger.account;

import java.util.Locale;

/**
 * The language a user reads the pages in, chosen on the account page independently of any site's
 * rule set. {@link #FOLLOW_SITE} lets each page decide: a site's pages follow its rule set, others
 * the browser.
 */
public enum InterfaceLanguage {
  FOLLOW_SITE(null),
  EN_GB(Locale.UK),
  EN_US(Locale.US);

  private final Locale locale;

  InterfaceLanguage(Locale locale) {
    this.locale = locale;
  }

  /** The locale this choice fixes; null for {@link #FOLLOW_SITE}, which fixes none. */
  public Locale locale() {
    return locale;
  }
}
