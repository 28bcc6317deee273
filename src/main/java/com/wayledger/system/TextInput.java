package com.wayledger.system;

import java.text.Normalizer;

/**
 * The one set of rules for text typed by people, applied alike to page forms, the JSON API and
 * imported spreadsheets: text is normalised (Unicode NFC, line breaks as LF) and then refused when
 * it holds a control character (tab and line breaks only in multi-line fields), a text-direction
 * override, embedding or isolate, or half of a surrogate pair; a name must also show at least one
 * visible character. PostgreSQL cannot store U+0000 at all, and the other characters make stored
 * names that look alike but differ, or that read differently on screen than in the data.
 */
public final class TextInput {

  /** What a text field holds. */
  public enum Kind {
    /** A name or reference: one line, at least one visible character. */
    NAME,
    /** Any other one-line text: one line, may be blank. */
    LINE,
    /** Notes, addresses: tab and line breaks allowed. */
    MULTI_LINE
  }

  /**
   * A refused value: the message key and the character at fault as "U+" and four hex digits (U+0000
   * for NUL).
   */
  public record Problem(String messageCode, String character) {}

  private TextInput() {}

  /** NFC, with CR LF and lone CR turned into LF; null stays null. */
  public static String normalise(String raw) {
    if (raw == null) {
      return null;
    }
    String text = raw.indexOf('\r') >= 0 ? raw.replace("\r\n", "\n").replace('\r', '\n') : raw;
    return Normalizer.isNormalized(text, Normalizer.Form.NFC)
        ? text
        : Normalizer.normalize(text, Normalizer.Form.NFC);
  }

  /** The first problem of a value of this kind, or null when it is acceptable (or null/empty). */
  public static Problem problem(String value, Kind kind) {
    if (value == null || value.isEmpty()) {
      return null;
    }
    boolean visible = false;
    for (int i = 0; i < value.length(); ) {
      int cp = value.codePointAt(i);
      i += Character.charCount(cp);
      if (Character.isSurrogate((char) cp) && cp <= 0xFFFF) {
        return new Problem("text.brokenCharacter", hex(cp));
      }
      if (cp == '\t' || cp == '\n' || cp == '\r') {
        if (kind != Kind.MULTI_LINE) {
          return new Problem(cp == '\t' ? "text.tab" : "text.lineBreak", hex(cp));
        }
        continue;
      }
      if (Character.getType(cp) == Character.CONTROL) {
        return new Problem("text.control", hex(cp));
      }
      if (isDirectionControl(cp)) {
        return new Problem("text.direction", hex(cp));
      }
      visible |= isVisible(cp);
    }
    if (kind == Kind.NAME && !visible && !value.isBlank()) { // plain blanks: @NotBlank says so
      return new Problem("text.invisible", "");
    }
    return null;
  }

  /** Whether a value passes {@link #problem}. */
  public static boolean acceptable(String value, Kind kind) {
    return problem(value, kind) == null;
  }

  /** The text as it would be stored, or a {@link RuleViolation} on {@code field}. */
  public static String require(String field, String value, Kind kind) {
    String normalised = normalise(value);
    Problem problem = problem(normalised, kind);
    if (problem != null) {
      throw new RuleViolation(field, problem.messageCode());
    }
    return normalised;
  }

  /** Left-to-right/right-to-left embeddings, overrides and isolates (U+202A–E, U+2066–9). */
  static boolean isDirectionControl(int cp) {
    return (cp >= 0x202A && cp <= 0x202E) || (cp >= 0x2066 && cp <= 0x2069);
  }

  /** A letter, digit, punctuation mark or symbol: something that leaves ink on the screen. */
  static boolean isVisible(int cp) {
    return switch (Character.getType(cp)) {
      case Character.UPPERCASE_LETTER,
          Character.LOWERCASE_LETTER,
          Character.TITLECASE_LETTER,
          Character.MODIFIER_LETTER,
          Character.OTHER_LETTER,
          Character.DECIMAL_DIGIT_NUMBER,
          Character.LETTER_NUMBER,
          Character.OTHER_NUMBER,
          Character.CONNECTOR_PUNCTUATION,
          Character.DASH_PUNCTUATION,
          Character.START_PUNCTUATION,
          Character.END_PUNCTUATION,
          Character.INITIAL_QUOTE_PUNCTUATION,
          Character.FINAL_QUOTE_PUNCTUATION,
          Character.OTHER_PUNCTUATION,
          Character.MATH_SYMBOL,
          Character.CURRENCY_SYMBOL,
          Character.MODIFIER_SYMBOL,
          Character.OTHER_SYMBOL ->
          true;
      default -> false;
    };
  }

  static String hex(int cp) {
    return String.format("U+%04X", cp);
  }
}
