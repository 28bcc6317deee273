package com.wayledger.support;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;

import org.springframework.test.web.servlet.request.RequestPostProcessor;

/**
 * Signed-in users of each role for MockMvc requests; the role hierarchy of SecurityConfig applies.
 */
public final class Roles {

  private Roles() {}

  public static RequestPostProcessor viewer() {
    return user("vera").roles("VIEWER");
  }

  public static RequestPostProcessor editor() {
    return user("eddie").roles("EDITOR");
  }

  public static RequestPostProcessor admin() {
    return user("ada").roles("ADMIN");
  }
}
