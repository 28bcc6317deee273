package com.wayledger.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Apostrophes in the message bundles come out as one apostrophe on screen. A message with arguments
 * goes through MessageFormat, where a lone apostrophe starts a quote and vanishes, so it doubles
 * them; a message without arguments is printed as written, so a doubled one shows twice (the slip
 * "board''s").
 */
class BundleApostropheTests {

  private static final List<String> BUNDLES =
      List.of("messages", "i18n/exchange", "i18n/loadlog", "i18n/inspection");
  private static final Pattern ARGUMENT = Pattern.compile("\\{\\d");
  private static final Pattern LONE_APOSTROPHE = Pattern.compile("(?<!')'(?!')");

  @Test
  void apostrophesAreDoubledExactlyWhereMessageFormatReadsThem() throws IOException {
    List<String> wrong = new ArrayList<>();
    for (String bundle : BUNDLES) {
      Properties properties = new Properties();
      try (InputStream in =
          getClass().getClassLoader().getResourceAsStream(bundle + ".properties")) {
        assertThat(in).as("bundle %s on the class path", bundle).isNotNull();
        properties.load(new InputStreamReader(in, StandardCharsets.UTF_8));
      }
      for (String key : properties.stringPropertyNames()) {
        String text = properties.getProperty(key);
        boolean formatted = ARGUMENT.matcher(text).find();
        if (formatted && LONE_APOSTROPHE.matcher(text).find()) {
          wrong.add(bundle + " " + key + ": a lone ' in a message with arguments vanishes");
        }
        if (!formatted && text.contains("''")) {
          wrong.add(bundle + " " + key + ": '' in a message without arguments shows twice");
        }
      }
    }
    assertThat(wrong).isEmpty();
  }
}
