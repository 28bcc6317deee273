package com.wayledger.inspection;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Proposes what each column of a results sheet holds from its header, in the trade's words
 * ("R1+R2", "IR L-E", "RCD ms", "Zs", "r1", "rn", "r2", "polarity") or our grid's headings. Each
 * column gets at most one meaning and each meaning at most one column, best match first. A guess is
 * only a proposal: the inspector sees and may change every column before anything is read.
 */
public final class ResultColumnGuesser {

  /** Below this score a header is left unread rather than guessed. */
  private static final int LEAST = 30;

  /** An upper-case "R2" standing alone: the protective conductor's own continuity. */
  private static final Pattern UPPER_R2 = Pattern.compile("(^|[^+A-Za-z0-9])R2([^+A-Za-z0-9]|$)");

  /** A lower-case "r2" standing alone: the ring's end-to-end protective conductor reading. */
  private static final Pattern LOWER_R2 = Pattern.compile("(^|[^+A-Za-z0-9])r2([^+A-Za-z0-9]|$)");

  private ResultColumnGuesser() {}

  /** One proposed meaning per header. */
  public static List<ResultColumn> guess(List<String> headers) {
    List<int[]> candidates = new ArrayList<>(); // {column, meaning ordinal, score}
    for (int c = 0; c < headers.size(); c++) {
      for (ResultColumn meaning : ResultColumn.values()) {
        if (meaning == ResultColumn.IGNORE) {
          continue;
        }
        int score = score(meaning, headers.get(c));
        if (score >= LEAST) {
          candidates.add(new int[] {c, meaning.ordinal(), score});
        }
      }
    }
    candidates.sort(
        Comparator.comparingInt((int[] a) -> a[2]).reversed().thenComparingInt(a -> a[0]));
    ResultColumn[] chosen = new ResultColumn[headers.size()];
    Arrays.fill(chosen, ResultColumn.IGNORE);
    Set<ResultColumn> used = EnumSet.noneOf(ResultColumn.class);
    for (int[] candidate : candidates) {
      ResultColumn meaning = ResultColumn.values()[candidate[1]];
      if (chosen[candidate[0]] == ResultColumn.IGNORE && used.add(meaning)) {
        chosen[candidate[0]] = meaning;
      }
    }
    return List.of(chosen);
  }

  /** How well a header reads as a meaning: 100 for an exact phrase, less for a phrase inside it. */
  static int score(ResultColumn meaning, String header) {
    if (header == null || header.isBlank()) {
      return 0;
    }
    // The trade writes the ring's end-to-end readings in lower case (r1, rn, r2) and a radial's
    // protective conductor reading in upper case (R2); only the case tells the two r2s apart.
    String bare = header.strip();
    if (meaning == ResultColumn.R2 && UPPER_R2.matcher(bare).find() && !bare.contains("+")) {
      return 100;
    }
    if (meaning == ResultColumn.RING_R2 && LOWER_R2.matcher(bare).find() && !bare.contains("+")) {
      return 100;
    }
    String text = normalise(header);
    List<String> tokens = List.of(text.split(" "));
    int best = 0;
    List<String> words = meaning.words();
    for (int k = 0; k < words.size(); k++) {
      String phrase = words.get(k);
      if (text.equals(phrase)) {
        best = Math.max(best, 100 - k);
      } else {
        List<String> wanted = List.of(phrase.split(" "));
        if ((wanted.size() > 1 || phrase.length() > 1)
            && Collections.indexOfSubList(tokens, wanted) >= 0) {
          best = Math.max(best, 50 - k + 5 * wanted.size());
        }
      }
    }
    return best;
  }

  /**
   * Lower case, units spelled out ("Ω" → ohm, "MΩ" → mohm), IΔn as "idn", "×" as " x ", dashes and
   * brackets as spaces, "+" joined to its neighbours ("R1 + R2" → "r1+r2").
   */
  static String normalise(String header) {
    return header
        .replace("MΩ", " mohm ")
        .replace("Mohm", " mohm ")
        .replace("megohms", " mohm ")
        .replace("megohm", " mohm ")
        .toLowerCase(Locale.ROOT)
        .replace("mω", " mohm ")
        .replace("ω", " ohm ")
        .replace("ohms", "ohm")
        .replace("δ", "d")
        .replace("×", " x ")
        .replace("✓", " ")
        .replaceAll("[()\\[\\]/.,:;_\\-–—'\"]", " ")
        .replaceAll("\\s*\\+\\s*", "+")
        .replaceAll("\\s+", " ")
        .strip();
  }
}
