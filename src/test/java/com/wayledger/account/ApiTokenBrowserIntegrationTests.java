package com.wayledger.account;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.Chromium;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;

/**
 * API tokens end to end: a person creates a token on the account page in a real browser, copies the
 * secret the page shows once, a separate HTTP client (loopback) calls the API with it as a bearer
 * token, the person revokes it in the browser, and the same call is refused.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class ApiTokenBrowserIntegrationTests {

  @LocalServerPort int port;
  @Autowired JdbcClient jdbc;

  private final HttpClient http =
      HttpClient.newBuilder()
          .connectTimeout(Duration.ofSeconds(10))
          .followRedirects(HttpClient.Redirect.NEVER)
          .build();

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @Test
  void aTokenCreatedInTheBrowserOpensTheApiUntilItIsRevokedThere() throws Exception {
    long boardId =
        jdbc.sql("SELECT id FROM board WHERE reference = 'KB1' ORDER BY id")
            .query(Long.class)
            .list()
            .get(0);
    try (Chromium chromium = Chromium.atWidth(768, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, Duration.ofSeconds(20));
      browser.get(url("/login"));
      browser.findElement(By.id("username")).sendKeys("demo");
      browser.findElement(By.id("password")).sendKeys("wayledger-demo");
      browser.findElement(By.cssSelector("form button[type=submit]")).click();
      wait.until(ExpectedConditions.urlContains("/sites"));

      browser.get(url("/account"));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("name")))
          .sendKeys("browser check");
      new Select(browser.findElement(By.id("scope"))).selectByValue("READ");
      browser.findElement(By.cssSelector("form.form-grid button[type=submit]")).click();
      WebElement shown =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.id("token-value")));
      String token = shown.getAttribute("value");
      assertThat(token).as("the secret shown once on the page").matches("wlt_[A-Za-z0-9_-]{43}");

      assertThat(demand(boardId, token))
          .as("GET /api/boards/%d/demand with the new token", boardId)
          .isEqualTo(200);
      assertThat(demand(boardId, "wlt_" + "B".repeat(43)))
          .as("a token nobody was given")
          .isEqualTo(401);

      browser.get(url("/account"));
      assertThat(browser.getPageSource())
          .as("the account page lists the token by name but never shows its secret again")
          .contains("browser check")
          .doesNotContain(token);
      WebElement row =
          wait.until(
              ExpectedConditions.presenceOfElementLocated(
                  By.xpath("//table[@id='tokens']//tr[td[normalize-space()='browser check']]")));
      row.findElement(By.cssSelector("button[type=submit]")).click();
      wait.until(ExpectedConditions.urlContains("revoked"));

      assertThat(demand(boardId, token)).as("the same call after revoking").isEqualTo(401);
    }
  }

  private int demand(long boardId, String token) throws Exception {
    HttpRequest request =
        HttpRequest.newBuilder(URI.create(url("/api/boards/" + boardId + "/demand")))
            .header("Authorization", "Bearer " + token)
            .header("Accept", "application/json")
            .timeout(Duration.ofSeconds(20))
            .GET()
            .build();
    return http.send(request, HttpResponse.BodyHandlers.discarding()).statusCode();
  }

  private String url(String path) {
    return "http://127.0.0.1:" + port + path;
  }
}
