package com.wayledger.system;

import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.web.filter.ShallowEtagHeaderFilter;

/**
 * ETags on API answers: a client that sends the ETag it holds back in {@code If-None-Match} gets
 * 304 with no body when nothing changed. Cheap there (a hash of a small JSON body); pages get none,
 * since each embeds a per-request CSRF token and would never match.
 */
@Configuration
class ApiEtags {

  @Bean
  FilterRegistrationBean<ShallowEtagHeaderFilter> apiEtagFilter() {
    FilterRegistrationBean<ShallowEtagHeaderFilter> registration =
        new FilterRegistrationBean<>(new ShallowEtagHeaderFilter());
    registration.addUrlPatterns("/api/*");
    registration.setName("apiEtags");
    return registration;
  }
}
