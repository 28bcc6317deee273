package com.wayledger.check;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.Chromium;
import java.time.Duration;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * The findings of every site on a phone (390 px) and a tablet (768 px): the page never scrolls
 * sideways, the grade filter works from the form, and a line's circuit link opens that circuit.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class EstateFindingsBrowserIntegrationTests {

  @LocalServerPort int port;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @ParameterizedTest(name = "{0} px wide")
  @ValueSource(ints = {390, 768})
  void theFindingsOfEverySiteFitTheScreenAndLeadToTheCircuit(int width) throws Exception {
    try (Chromium chromium = Chromium.atWidth(width, 900)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, Duration.ofSeconds(20));
      browser.get(url("/login"));
      browser.findElement(By.id("username")).sendKeys("demo");
      browser.findElement(By.id("password")).sendKeys("wayledger-demo");
      browser.findElement(By.cssSelector("form button[type=submit]")).click();
      wait.until(ExpectedConditions.urlContains("/sites"));

      wait.until(ExpectedConditions.elementToBeClickable(By.id("estate-findings-link"))).click();
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("estate-findings")));
      long[] widths = chromium.scrollAndViewportWidth();
      assertThat(widths[0]).as("page scroll width at %d px", width).isLessThanOrEqualTo(widths[1]);

      new Select(browser.findElement(By.id("grade"))).selectByValue("DANGER");
      browser.findElement(By.cssSelector("#estate-filter button[type=submit]")).click();
      wait.until(ExpectedConditions.urlContains("grade=DANGER"));
      assertThat(browser.findElements(By.cssSelector("#estate-findings .badge")))
          .as("danger lines in the demo")
          .isNotEmpty()
          .allMatch(badge -> badge.getText().contains("danger"));
      widths = chromium.scrollAndViewportWidth();
      assertThat(widths[0])
          .as("filtered page scroll width at %d px", width)
          .isLessThanOrEqualTo(widths[1]);

      browser.get(url("/findings"));
      wait.until(
              ExpectedConditions.elementToBeClickable(
                  By.cssSelector("#estate-findings a.estate-circuit")))
          .click();
      wait.until(ExpectedConditions.urlMatches(".*/circuits/\\d+$"));
    }
  }

  private String url(String path) {
    return "http://127.0.0.1:" + port + path;
  }
}
