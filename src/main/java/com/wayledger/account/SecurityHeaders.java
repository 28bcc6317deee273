package com.wayledger.account;

import jakarta.servlet.http.HttpServletRequest;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.config.annotation.web.configurers.HeadersConfigurer;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter.ReferrerPolicy;
import org.springframework.security.web.header.writers.StaticHeadersWriter;

/**
 * Response headers of every page and API answer: a strict Content-Security-Policy (scripts and
 * styles only from the app's own files, never inline; no framing), no Referer leaving the app, and
 * browser features the app never uses switched off. The one exception is the third-party API
 * browser under /api/docs and /api/swagger-ui, whose widgets set inline styles: it gets {@code
 * style-src 'unsafe-inline'} and nothing else more. See docs/security.md.
 */
public final class SecurityHeaders {

  /** The policy of every page of the app. */
  public static final String PAGE_POLICY =
      "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:;"
          + " font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'none';"
          + " form-action 'self'; frame-ancestors 'none'";

  /** The API browser only: the same, with inline styles allowed. */
  public static final String API_BROWSER_POLICY =
      "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self'"
          + " data:; font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'none';"
          + " form-action 'self'; frame-ancestors 'none'";

  public static final String PERMISSIONS_POLICY =
      "camera=(), microphone=(), geolocation=(), payment=(), usb=(), serial=(), bluetooth=(),"
          + " interest-cohort=()";

  private SecurityHeaders() {}

  /** Adds the headers to a filter chain: {@code http.headers(SecurityHeaders::apply)}. */
  public static void apply(HeadersConfigurer<HttpSecurity> headers) {
    headers
        .addHeaderWriter(
            (request, response) ->
                response.setHeader(
                    "Content-Security-Policy",
                    apiBrowser(request) ? API_BROWSER_POLICY : PAGE_POLICY))
        .referrerPolicy(referrer -> referrer.policy(ReferrerPolicy.NO_REFERRER))
        .addHeaderWriter(new StaticHeadersWriter("Permissions-Policy", PERMISSIONS_POLICY))
        .frameOptions(frame -> frame.deny());
  }

  private static boolean apiBrowser(HttpServletRequest request) {
    String path = request.getRequestURI().substring(request.getContextPath().length());
    return path.startsWith("/api/docs") || path.startsWith("/api/swagger-ui");
  }
}
