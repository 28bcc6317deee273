package com.wayledger.board;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.springframework.context.MessageSource;

/**
 * The words of one page in one locale, each looked up in the message bundles once and kept for the
 * rest of the page: a schedule prints "in use", "Edit" or "▲ danger" on many rows, and the template
 * asked the message source again for every row. A missing key prints as Thymeleaf prints it ({@code
 * ??key_locale??}), never an error page.
 */
final class PageWords {

  private final MessageSource messages;
  private final Locale locale;
  private final Map<String, String> kept = new HashMap<>();

  PageWords(MessageSource messages, Locale locale) {
    this.messages = messages;
    this.locale = locale;
  }

  /** The word or sentence of a key without arguments. */
  String word(String code) {
    return kept.computeIfAbsent(code, key -> messages.getMessage(key, null, absent(key), locale));
  }

  /** A sentence with arguments (not kept: its arguments differ from row to row). */
  String sentence(String code, Object... args) {
    return messages.getMessage(code, args, absent(code), locale);
  }

  Locale locale() {
    return locale;
  }

  private String absent(String code) {
    return "??" + code + "_" + locale + "??";
  }
}
