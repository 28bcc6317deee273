package com.wayledger.system;

import org.springframework.boot.jackson.autoconfigure.JsonMapperBuilderCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.core.JsonParser;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.cfg.EnumFeature;
import tools.jackson.databind.deser.jdk.StringDeserializer;
import tools.jackson.databind.module.SimpleModule;

/**
 * How the JSON API reads bodies: an enum must be given by its name ({@code "MCB"}), never by its
 * position ({@code 0}, which silently meant whatever came first), and every string is normalised as
 * {@link TextInput} does for forms, so the form records' {@link CleanText} checks see the same text
 * on both paths.
 */
@Configuration
public class JsonInput {

  @Bean
  JsonMapperBuilderCustomizer strictJsonInput() {
    return builder ->
        builder
            .enable(EnumFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
            .addModule(
                new SimpleModule("wayledger-text")
                    .addDeserializer(String.class, new NormalisingStrings()));
  }

  /** Jackson's own string reading, followed by {@link TextInput#normalise}. */
  static final class NormalisingStrings extends StringDeserializer {
    @Override
    public String deserialize(JsonParser parser, DeserializationContext context) {
      return TextInput.normalise(super.deserialize(parser, context));
    }
  }
}
