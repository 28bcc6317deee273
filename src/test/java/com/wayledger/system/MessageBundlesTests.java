package com.wayledger.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;
import java.util.Properties;
import org.junit.jupiter.api.Test;

/**
 * Every message bundle the application configures exists: a configured bundle that does not is
 * probed, and warned about, on every message look-up of every page.
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
  void theTemplateCacheIsOnInTheDemoProfileToo() throws IOException {
    assertThat(settings("application.properties").getProperty("spring.thymeleaf.cache"))
        .isEqualTo("true");
    assertThat(settings("application-demo.properties").getProperty("spring.thymeleaf.cache"))
        .as("the demo profile must not switch the template cache off")
        .isNotEqualTo("false");
  }

  private Properties settings(String file) throws IOException {
    Properties properties = new Properties();
    try (InputStream in = getClass().getClassLoader().getResourceAsStream(file)) {
      properties.load(in);
    }
    return properties;
  }
}
