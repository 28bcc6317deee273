package com.wayledger.exchange;

/**
 * Text from users written into a spreadsheet so that no spreadsheet program runs it as a formula
 * (OWASP's "CSV injection" advice: a leading =, +, -, @, tab or carriage return starts a formula in
 * common programs).
 */
final class CellText {

  private CellText() {}

  /** Whether a spreadsheet program could read this text as the start of a formula. */
  static boolean looksLikeFormula(String text) {
    if (text == null || text.isEmpty()) {
      return false;
    }
    char first = text.charAt(0);
    return first == '='
        || first == '+'
        || first == '-'
        || first == '@'
        || first == '\t'
        || first == '\r';
  }

  /** For CSV: a single quote in front of text that could start a formula. */
  static String forCsv(String text) {
    if (text == null) {
      return "";
    }
    return looksLikeFormula(text) ? "'" + text : text;
  }

  /**
   * Undoes {@link #forCsv}: drops the single quote that an export put in front of formula-like
   * text.
   */
  static String fromCsv(String text) {
    if (text != null
        && text.length() > 1
        && text.charAt(0) == '\''
        && looksLikeFormula(text.substring(1))) {
      return text.substring(1);
    }
    return text;
  }
}
