package com.wayledger.account;

import com.wayledger.system.RuleViolation;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * What a new account's password must be: at least {@value #MIN_LENGTH} characters, at most 200, not
 * one of the common passwords shipped in {@code account/common-passwords.txt} (ignoring case, and
 * ignoring digits and signs added at the end, so "Password123!" counts as "password"), not the user
 * name (with or without digits and signs after it), and not made of three or fewer different
 * characters.
 */
public final class PasswordPolicy {

  public static final int MIN_LENGTH = 10;
  static final String LIST = "/account/common-passwords.txt";

  private static final Set<String> COMMON = load();

  private PasswordPolicy() {}

  /** Throws a {@link RuleViolation} on "password" when the password is refused. */
  public static void check(String username, String password) {
    if (password == null || password.length() < MIN_LENGTH || password.length() > 200) {
      throw new RuleViolation("password", "user.password.length", MIN_LENGTH);
    }
    String lower = password.toLowerCase(Locale.ROOT);
    if (isCommon(lower)) {
      throw new RuleViolation("password", "user.password.common");
    }
    String stem = lower.replaceAll("[^a-z]+$", "");
    if (username != null
        && (lower.equals(username.strip().toLowerCase(Locale.ROOT))
            || stem.equals(username.strip().toLowerCase(Locale.ROOT)))) {
      throw new RuleViolation("password", "user.password.username");
    }
    if (lower.chars().distinct().count() < 4) {
      throw new RuleViolation("password", "user.password.repetitive");
    }
  }

  /** Whether the password is on the shipped list, also once trailing digits and signs are cut. */
  static boolean isCommon(String lower) {
    if (COMMON.contains(lower)) {
      return true;
    }
    String stem = lower.replaceAll("[^a-z]+$", "");
    return !stem.equals(lower) && COMMON.contains(stem);
  }

  static int listSize() {
    return COMMON.size();
  }

  private static Set<String> load() {
    Set<String> words = new HashSet<>();
    try (InputStream in = PasswordPolicy.class.getResourceAsStream(LIST)) {
      if (in == null) {
        throw new IllegalStateException("Missing resource " + LIST);
      }
      BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
      for (String line; (line = reader.readLine()) != null; ) {
        String word = line.strip();
        if (!word.isEmpty() && !word.startsWith("#")) {
          words.add(word.toLowerCase(Locale.ROOT));
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return Set.copyOf(words);
  }
}
