package com.wayledger.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Properties;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every message bundle the application configures exists (a configured bundle that does not is
 * probed, and warned about, on every message look-up of every page); every en-US word overrides a
 * key of its base bundle; every key a template names is in a bundle.
 */
class MessageBundlesTests {

  @Test
  void everyConfiguredMessageBundleExists() throws IOException {
    String[] basenames =
        settings("application.properties").getProperty("spring.messages.basename").split(",");

    assertThat(basenames).isNotEmpty();
    assertThat(Arrays.stream(basenames).map(String::strip))
        .allSatisfy(
            name ->
                assertThat(getClass().getClassLoader().getResource(name + ".properties"))
                    .as("bundle %s.properties on the classpath", name)
                    .isNotNull());
  }

  @Test
  void everyEnUsWordOverridesAKeyOfItsBaseBundle() throws IOException {
    int overridden = 0;
    for (String name : basenames()) {
      Properties us = bundle(name + "_en_US");
      if (us == null) {
        continue;
      }
      Properties base = bundle(name);
      overridden += us.size();
      assertThat(us.stringPropertyNames())
          .as("keys of %s_en_US.properties missing from %s.properties", name, name)
          .allSatisfy(key -> assertThat(base.containsKey(key)).as(key).isTrue());
    }
    assertThat(overridden).as("en-US words exist at all").isPositive();
  }

  @Test
  void everyMessageKeyATemplateNamesExists() throws IOException {
    Set<String> keys = new HashSet<>();
    for (String name : basenames()) {
      keys.addAll(bundle(name).stringPropertyNames());
    }
    List<String> missing = new ArrayList<>();
    try (Stream<Path> files = Files.walk(Path.of("src/main/resources/templates"))) {
      for (Path file : files.filter(f -> f.toString().endsWith(".html")).sorted().toList()) {
        Matcher key = STATIC_KEY.matcher(Files.readString(file, StandardCharsets.UTF_8));
        while (key.find()) {
          if (!keys.contains(key.group(1))) {
            missing.add(file.getFileName() + ": #{" + key.group(1) + "}");
          }
        }
      }
    }
    assertThat(missing).as("message keys used in templates but in no configured bundle").isEmpty();
  }

  @Test
  void theServersOwnLocaleNeverPicksTheWords() throws IOException {
    assertThat(
            settings("application.properties")
                .getProperty("spring.messages.fallback-to-system-locale"))
        .isEqualTo("false");
  }

  @Test
  void theTemplateCacheIsOnInTheDemoProfileToo() throws IOException {
    assertThat(settings("application.properties").getProperty("spring.thymeleaf.cache"))
        .isEqualTo("true");
    assertThat(settings("application-demo.properties").getProperty("spring.thymeleaf.cache"))
        .as("the demo profile must not switch the template cache off")
        .isNotEqualTo("false");
  }

  /** A literal key: #{word.word} directly followed by ( or }, not one built from an expression. */
  private static final Pattern STATIC_KEY = Pattern.compile("#\\{([A-Za-z][\\w.\\-]*)[}(]");

  private List<String> basenames() throws IOException {
    return Arrays.stream(
            settings("application.properties").getProperty("spring.messages.basename").split(","))
        .map(String::strip)
        .toList();
  }

  /** A bundle read as UTF-8, as Spring reads it (spring.messages.encoding); null if absent. */
  private Properties bundle(String name) throws IOException {
    try (InputStream in = getClass().getClassLoader().getResourceAsStream(name + ".properties")) {
      if (in == null) {
        return null;
      }
      Properties properties = new Properties();
      properties.load(new InputStreamReader(in, StandardCharsets.UTF_8));
      return properties;
    }
  }

  private Properties settings(String file) throws IOException {
    Properties properties = new Properties();
    try (InputStream in = getClass().getClassLoader().getResourceAsStream(file)) {
      properties.load(in);
    }
    return properties;
  }
}
