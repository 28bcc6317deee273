package com.wayledger.system;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;

/**
 * The one place that turns a closed vocabulary's constant into the words a person reads ("Copper",
 * "Thermoplastic 70 °C", "TN-C-S") and back. The words are the message bundles' {@code
 * enum.<Type>.<CONSTANT>} keys, the same ones the pages use through {@code #{enum...}}; a {@code
 * .short} key, where present, is the form a spreadsheet cell takes ("B" for the curve whose page
 * label also names its trip band).
 */
public final class EnumWords {

  /** The bundles that hold enum words; the same files {@code spring.messages.basename} names. */
  private static final List<String> BUNDLES =
      List.of("messages", "i18n/exchange", "i18n/loadlog", "i18n/inspection");

  private static final EnumWords STANDARD = load();

  private final Map<String, String> words;

  private EnumWords(Map<String, String> words) {
    this.words = Map.copyOf(words);
  }

  /** The words from the application's bundles. */
  public static EnumWords standard() {
    return STANDARD;
  }

  /** The bundle key of a constant: {@code enum.Insulation.THERMOPLASTIC_70}. */
  public static String key(Enum<?> constant) {
    return "enum." + constant.getDeclaringClass().getSimpleName() + "." + constant.name();
  }

  /** The words for a constant; null for null. A constant with no words reads in lower case. */
  public String of(Enum<?> constant) {
    if (constant == null) {
      return null;
    }
    String word = words.get(key(constant));
    return word != null ? word : fallback(constant);
  }

  /** The short form for a spreadsheet cell, else {@link #of}; null for null. */
  public String shortOf(Enum<?> constant) {
    if (constant == null) {
      return null;
    }
    String word = words.get(key(constant) + ".short");
    return word != null ? word : of(constant);
  }

  /**
   * A message without arguments, read outside a request (a change-log line, a spreadsheet cell);
   * null when the bundles lack it.
   */
  public String text(String key) {
    return words.get(key);
  }

  /** Whether the bundles hold words for this constant. */
  public boolean has(Enum<?> constant) {
    return words.containsKey(key(constant));
  }

  /**
   * The constant these words or this code name, ignoring case, spaces and punctuation: the words
   * ("Thermoplastic 70 °C"), their short form ("B") and the constant's own name
   * ("THERMOPLASTIC_70") all match. Null when none does.
   */
  public <E extends Enum<E>> E parse(Class<E> type, String text) {
    String wanted = squash(text);
    if (wanted.isEmpty()) {
      return null;
    }
    for (E constant : type.getEnumConstants()) {
      if (squash(constant.name()).equals(wanted)) {
        return constant;
      }
    }
    for (E constant : type.getEnumConstants()) {
      String word = words.get(key(constant));
      String shortWord = words.get(key(constant) + ".short");
      if ((word != null && squash(word).equals(wanted))
          || (shortWord != null && squash(shortWord).equals(wanted))) {
        return constant;
      }
    }
    return null;
  }

  /** The choices for a message: each constant's words, comma-separated. */
  public String choices(Class<? extends Enum<?>> type) {
    StringBuilder text = new StringBuilder();
    for (Enum<?> constant : type.getEnumConstants()) {
      if (!text.isEmpty()) {
        text.append(", ");
      }
      text.append(shortOf(constant));
    }
    return text.toString();
  }

  /**
   * Lower case without spaces or punctuation, so "Thermoplastic 70 °C" and "thermoplastic70°c"
   * meet.
   */
  static String squash(String text) {
    if (text == null) {
      return "";
    }
    return text.strip().toLowerCase(Locale.ROOT).replaceAll("[\\s\\p{Punct}–—·×]", "");
  }

  private static String fallback(Enum<?> constant) {
    return constant.name().toLowerCase(Locale.ROOT).replace('_', ' ');
  }

  private static EnumWords load() {
    Map<String, String> words = new HashMap<>();
    ClassLoader loader = EnumWords.class.getClassLoader();
    for (String bundle : BUNDLES) {
      try (InputStream in = loader.getResourceAsStream(bundle + ".properties")) {
        if (in == null) {
          continue;
        }
        Properties properties = new Properties();
        properties.load(new InputStreamReader(in, StandardCharsets.UTF_8));
        for (String name : properties.stringPropertyNames()) {
          words.putIfAbsent(name, properties.getProperty(name));
        }
      } catch (IOException e) {
        throw new UncheckedIOException("cannot read the message bundle " + bundle, e);
      }
    }
    return new EnumWords(words);
  }
}
