package com.wayledger.engine.dwelling;

/** The Article 220 calculations a dwelling board can show. */
public enum WorksheetMethod {
  /** Part III standard method, one dwelling unit or several fed from one board (220.40 ff.). */
  STANDARD("Standard method", "220.40"),
  /** Feeder or service neutral load (220.61). */
  NEUTRAL("Feeder or service neutral", "220.61"),
  /** Optional method for one dwelling unit (220.82). */
  OPTIONAL("Optional method, one dwelling unit", "220.82"),
  /** Optional method for a multifamily dwelling of three or more units (220.84). */
  MULTIFAMILY_OPTIONAL("Optional method, multifamily dwelling", "220.84"),
  /** Additions to an existing dwelling unit (220.83). */
  ADDITION("Addition to an existing dwelling unit", "220.83"),
  /** Existing load from recorded maximum demand (220.87). */
  MEASURED("Existing load from recorded maximum demand", "220.87");

  private final String title;
  private final String clause;

  WorksheetMethod(String title, String clause) {
    this.title = title;
    this.clause = clause;
  }

  public String title() {
    return title;
  }

  public String clause() {
    return clause;
  }
}
