package com.wayledger.wording;

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
 * Every base message that uses a word of docs/wording.md's vocabulary table (board, way, submain,
 * earth, socket, aluminium, moulded, consumer unit) has its en-US override, so that a key added
 * after the table was written does not show en-GB words on an NEC page. Spreadsheet cell words
 * ({@code enum.*.short}) stay in the base words by design (docs/wording.md, "The workbook").
 */
class VocabularyOverridesTests {

  private static final List<String> BUNDLES =
      List.of("messages", "i18n/exchange", "i18n/loadlog", "i18n/inspection", "i18n/dwelling");

  private static final Pattern TABLE_WORDS =
      Pattern.compile(
          "\\b(boards?|sub-boards?|ways?|submains?|earth\\w*|sockets?|aluminium|moulded"
              + "|consumer units?)\\b",
          Pattern.CASE_INSENSITIVE);

  @Test
  void everyBaseMessageWithATableWordHasItsUsOverride() throws IOException {
    List<String> missing = new ArrayList<>();
    for (String bundle : BUNDLES) {
      Properties base = load(bundle + ".properties");
      Properties us = load(bundle + "_en_US.properties");
      for (String key : base.stringPropertyNames()) {
        if (key.endsWith(".short") || us.containsKey(key)) {
          continue;
        }
        if (TABLE_WORDS.matcher(base.getProperty(key)).find()) {
          missing.add(bundle + ": " + key + " = " + base.getProperty(key));
        }
      }
    }
    assertThat(missing).as("base messages with en-GB table words and no en-US override").isEmpty();
  }

  private static Properties load(String path) throws IOException {
    Properties p = new Properties();
    try (InputStream in =
        VocabularyOverridesTests.class.getClassLoader().getResourceAsStream(path)) {
      assertThat(in).as(path).isNotNull();
      p.load(new InputStreamReader(in, StandardCharsets.UTF_8));
    }
    return p;
  }
}
