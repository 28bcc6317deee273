package com.wayledger.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * Through the real server: pages link the stylesheet and htmx under content-hashed or versioned
 * URLs, those are cached for a year as immutable, responses are compressed, API answers carry
 * ETags.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles("test")
class AssetDeliveryIntegrationTests {

  @LocalServerPort int port;

  private final HttpClient http = HttpClient.newHttpClient();

  @Test
  void pagesLinkAssetsUnderNamesThatChangeWithTheirContent() throws Exception {
    String login = get("/login", null).body();

    assertThat(login).containsPattern("/css/wayledger-[0-9a-f]{32}\\.css");
    assertThat(login).containsPattern("/favicon-[0-9a-f]{32}\\.svg");
    assertThat(login).contains("/webjars/htmx.org/2.0.8/dist/htmx.min.js");
  }

  @Test
  void hashedAssetsAreCachedForAYearAsImmutableAndCompressed() throws Exception {
    Matcher css =
        Pattern.compile("/css/wayledger-[0-9a-f]{32}\\.css").matcher(get("/login", null).body());
    assertThat(css.find()).isTrue();

    HttpResponse<String> answer = get(css.group(), "gzip");

    assertThat(answer.statusCode()).isEqualTo(200);
    assertThat(answer.headers().firstValue("Cache-Control").orElse(""))
        .contains("max-age=31536000")
        .contains("immutable");
    assertThat(answer.headers().firstValue("Content-Encoding")).hasValue("gzip");
    HttpResponse<String> htmx = get("/webjars/htmx.org/2.0.8/dist/htmx.min.js", "gzip");
    assertThat(htmx.headers().firstValue("Cache-Control").orElse("")).contains("immutable");
    assertThat(htmx.headers().firstValue("Content-Encoding")).hasValue("gzip");
  }

  @Test
  void pagesAreCompressedForABrowserThatAcceptsIt() throws Exception {
    HttpResponse<String> login = get("/login", "gzip");

    assertThat(login.headers().firstValue("Content-Encoding")).hasValue("gzip");
    assertThat(get("/login", null).headers().firstValue("Content-Encoding")).isEmpty();
  }

  @Test
  void apiAnswersCarryAnEtagAndAnUnchangedOneIsNotSentAgain() throws Exception {
    HttpResponse<String> first = get("/api/openapi", null);
    String etag = first.headers().firstValue("ETag").orElseThrow();

    HttpResponse<String> again =
        http.send(
            HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/api/openapi"))
                .header("If-None-Match", etag)
                .build(),
            HttpResponse.BodyHandlers.ofString());

    assertThat(again.statusCode()).isEqualTo(304);
  }

  private HttpResponse<String> get(String path, String encoding) throws Exception {
    HttpRequest.Builder request =
        HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path));
    if (encoding != null) {
      request.header("Accept-Encoding", encoding);
    }
    return http.send(request.build(), HttpResponse.BodyHandlers.ofString());
  }
}
