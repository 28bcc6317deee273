package com.wayledger.system;

import java.time.Duration;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.CacheControl;
import org.springframework.web.servlet.config.annotation.ResourceHandlerRegistry;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;
import org.springframework.web.servlet.resource.VersionResourceResolver;

/**
 * Serves the stylesheet, icon and htmx under URLs that change when their content does ({@code
 * /css/wayledger-<md5>.css}, {@code /webjars/htmx.org/<version>/...}), so browsers may keep them
 * for a year without asking again. Only these three locations are resource paths: with the
 * catch-all {@code /**} mapping switched off (application.properties), the link rewriting behind
 * {@code @{...}} in templates matches a page link against three patterns instead of probing the jar
 * for a file on every link of every page.
 */
@Configuration
class StaticAssets implements WebMvcConfigurer {

  static final CacheControl FOR_A_YEAR =
      CacheControl.maxAge(Duration.ofDays(365)).cachePublic().immutable();

  @Override
  public void addResourceHandlers(ResourceHandlerRegistry registry) {
    registry
        .addResourceHandler("/css/**")
        .addResourceLocations("classpath:/static/css/")
        .setCacheControl(FOR_A_YEAR)
        .resourceChain(true)
        .addResolver(new VersionResourceResolver().addContentVersionStrategy("/**"));
    registry
        .addResourceHandler("/favicon*.svg")
        .addResourceLocations("classpath:/static/")
        .setCacheControl(FOR_A_YEAR)
        .resourceChain(true)
        .addResolver(new VersionResourceResolver().addContentVersionStrategy("/**"));
    // The webjar path carries the library's version once the link is rewritten: a new htmx is a
    // new URL. The resource chain adds the webjar resolver itself.
    registry
        .addResourceHandler("/webjars/**")
        .addResourceLocations("classpath:/META-INF/resources/webjars/")
        .setCacheControl(FOR_A_YEAR)
        .resourceChain(true);
  }
}
