package com.wayledger.diagram;

import java.util.Locale;

/** Small helpers for writing SVG as text: escaping, numbers, clipping long labels. */
final class SvgText {

  private SvgText() {}

  static String escape(String text) {
    if (text == null) {
      return "";
    }
    StringBuilder out = new StringBuilder(text.length());
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      switch (c) {
        case '&' -> out.append("&amp;");
        case '<' -> out.append("&lt;");
        case '>' -> out.append("&gt;");
        case '"' -> out.append("&quot;");
        case '\'' -> out.append("&#39;");
        default -> {
          // characters XML 1.0 forbids are dropped rather than breaking the document
          if (c >= 0x20 || c == '\t' || c == '\n' || c == '\r') {
            out.append(c);
          }
        }
      }
    }
    return out.toString();
  }

  /** A coordinate: at most one decimal, no trailing ".0". */
  static String n(double value) {
    long rounded = Math.round(value * 10);
    return rounded % 10 == 0
        ? Long.toString(rounded / 10)
        : String.format(Locale.ROOT, "%.1f", rounded / 10.0);
  }

  /** A figure for a person, with the given decimals (UK number format). */
  static String figure(double value, int decimals) {
    return String.format(Locale.UK, "%." + decimals + "f", value);
  }

  /** Cuts a label to at most {@code max} characters, ending in "…" when cut. */
  static String clip(String text, int max) {
    if (text == null) {
      return "";
    }
    return text.length() <= max ? text : text.substring(0, max - 1) + "…";
  }
}
