package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * Headers on a real server (Tomcat on a loopback port): a strict Content-Security-Policy on pages,
 * Referrer-Policy and Permissions-Policy, framing refused, and the session cookie marked Secure
 * exactly when the request came over TLS through a proxy that says so (X-Forwarded-Proto from a
 * trusted internal address). The templates hold no inline script or style for the policy to block.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles("test")
class SecurityHeadersIntegrationTests {

  @LocalServerPort int port;

  private final HttpClient http = HttpClient.newHttpClient();

  private HttpResponse<String> get(String path, String... headers) throws Exception {
    HttpRequest.Builder request =
        HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path));
    for (int i = 0; i < headers.length; i += 2) {
      request.header(headers[i], headers[i + 1]);
    }
    return http.send(request.build(), HttpResponse.BodyHandlers.ofString());
  }

  @Test
  void pagesCarryAStrictPolicyAndTheOtherHeaders() throws Exception {
    HttpResponse<String> login = get("/login");
    assertThat(login.statusCode()).isEqualTo(200);
    String csp = login.headers().firstValue("Content-Security-Policy").orElseThrow();
    assertThat(csp)
        .contains("script-src 'self'", "style-src 'self';", "frame-ancestors 'none'")
        .doesNotContain("unsafe-inline", "unsafe-eval");
    assertThat(login.headers().firstValue("Referrer-Policy")).hasValue("no-referrer");
    assertThat(login.headers().firstValue("Permissions-Policy").orElseThrow())
        .contains("camera=()", "geolocation=()");
    assertThat(login.headers().firstValue("X-Frame-Options")).hasValue("DENY");
    HttpResponse<String> api = get("/api/sites");
    assertThat(api.headers().firstValue("Content-Security-Policy"))
        .hasValue(SecurityHeaders.PAGE_POLICY);
  }

  @Test
  void sessionCookieIsSecureOnlyBehindATlsProxy() throws Exception {
    String plain = get("/login").headers().allValues("Set-Cookie").toString();
    assertThat(plain).contains("SESSION=").doesNotContainIgnoringCase("Secure");
    String proxied =
        get("/login", "X-Forwarded-Proto", "https", "X-Forwarded-For", "203.0.113.9")
            .headers()
            .allValues("Set-Cookie")
            .toString();
    assertThat(proxied).contains("SESSION=").containsIgnoringCase("Secure").contains("HttpOnly");
  }

  /** No inline script, style element, style attribute or on… handler is left in any template. */
  @Test
  void templatesHaveNoInlineScriptOrStyle() throws IOException {
    Pattern inline =
        Pattern.compile(
            "<script>|<script(?![^>]*\\bsrc=)[^>]*>|<style|\\sstyle=|th:style=|\\son[a-z]+=|onsubmit=|onclick=",
            Pattern.CASE_INSENSITIVE);
    List<String> offending;
    try (Stream<Path> files = Files.walk(Path.of("src/main/resources/templates"))) {
      offending =
          files
              .filter(p -> p.toString().endsWith(".html"))
              // rendered to PDF on the server (inspection/ReportPdf), never served to a browser
              .filter(p -> !p.endsWith(Path.of("inspection", "report.html")))
              .filter(
                  p -> {
                    try {
                      return inline.matcher(Files.readString(p)).find();
                    } catch (IOException e) {
                      throw new java.io.UncheckedIOException(e);
                    }
                  })
              .map(Path::toString)
              .toList();
    }
    assertThat(offending).isEmpty();
  }
}
