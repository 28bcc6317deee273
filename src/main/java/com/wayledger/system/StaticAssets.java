package com.wayledger.system;

import java.time.Duration;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.CacheControl;
import org.springframework.web.servlet.config.annotation.ResourceHandlerRegistry;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;
import org.springframework.web.servlet.resource.ResourceUrlProvider;
import org.springframework.web.servlet.resource.VersionResourceResolver;

/**
 * Serves the stylesheets, scripts, icon and htmx under URLs that change when their content does
 * ({@code /css/wayledger-<md5>.css}, {@code /webjars/htmx.org/<version>/...}), so browsers may keep
 * them for a year without asking again. Only these locations are resource paths (the catch-all
 * {@code /**} mapping is off), and templates take the asset URLs from {@link AssetUrls}: no filter
 * rewrites, or probes the jar for, the ordinary links of a page. ({@code /js/**} holds the pages'
 * own small scripts: the strict Content-Security-Policy allows no inline script.)
 */
@Configuration
class StaticAssets implements WebMvcConfigurer {

  static final CacheControl FOR_A_YEAR =
      CacheControl.maxAge(Duration.ofDays(365)).cachePublic().immutable();

  /** Asset URLs for templates: {@code @{${@assets.url('/css/wayledger.css')}}}. */
  @Bean("assets")
  AssetUrls assets(ObjectProvider<ResourceUrlProvider> mvcResourceUrlProvider) {
    return new AssetUrls(mvcResourceUrlProvider);
  }

  @Override
  public void addResourceHandlers(ResourceHandlerRegistry registry) {
    registry
        .addResourceHandler("/css/**")
        .addResourceLocations("classpath:/static/css/")
        .setCacheControl(FOR_A_YEAR)
        .resourceChain(true)
        .addResolver(new VersionResourceResolver().addContentVersionStrategy("/**"));
    registry
        .addResourceHandler("/js/**")
        .addResourceLocations("classpath:/static/js/")
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
