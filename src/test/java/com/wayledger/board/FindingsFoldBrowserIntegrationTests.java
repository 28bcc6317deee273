package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.BrowserSteps;
import com.wayledger.support.Chromium;
import java.io.IOException;
import java.time.Duration;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * The board page leaves its advice lines out and fetches them when the fold is opened. In a real
 * browser at desktop, tablet and phone widths: a schedule badge whose circuit has advice only opens
 * the fold and lands on the circuit's line; the lines are there and the caution stays.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class FindingsFoldBrowserIntegrationTests {

  private static final Duration PATIENCE = Duration.ofSeconds(20);

  @LocalServerPort int port;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @ParameterizedTest(name = "{0} px wide")
  @ValueSource(ints = {1400, 768, 390})
  void aBadgeOfAnAdviceOnlyCircuitOpensTheFoldAndLandsOnItsLine(int width) throws IOException {
    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      JavascriptExecutor script = (JavascriptExecutor) browser;
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      BrowserSteps.signInAsDemo(browser, wait, "http://localhost:" + port);
      browser.findElement(By.linkText("Tallow Lane Works")).click();
      wait.until(ExpectedConditions.presenceOfElementLocated(By.linkText("KB1")));
      browser.get(browser.findElement(By.linkText("KB1")).getAttribute("href"));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("findings")));

      WebElement fold = browser.findElement(By.cssSelector("details.advice-rows"));
      assertThat(fold.getAttribute("open")).as("the advice is folded").isNull();
      assertThat(browser.findElements(By.cssSelector("#findings li.finding.v-ADVICE")))
          .as("and its lines are not on the page")
          .isEmpty();
      WebElement badge =
          (WebElement)
              script.executeScript(
                  "return Array.from(document.querySelectorAll('#schedule a.badge'))"
                      + ".find(a => !document.getElementById(a.hash.slice(1)));");
      assertThat(badge).as("a badge whose circuit has only advice").isNotNull();
      String target = badge.getAttribute("href").replaceAll(".*#", "");

      BrowserSteps.click(browser, badge);

      wait.until(ExpectedConditions.presenceOfElementLocated(By.id(target)));
      wait.until(
          driver -> ("#" + target).equals(script.executeScript("return window.location.hash;")));
      assertThat(fold.getAttribute("open")).as("the fold opened").isNotNull();
      assertThat(browser.findElement(By.id(target)).isDisplayed())
          .as("the circuit's line is shown")
          .isTrue();
      assertThat(browser.findElements(By.cssSelector("#findings li.finding.v-ADVICE")))
          .as("the advice lines arrived")
          .isNotEmpty();
      assertThat(browser.findElements(By.cssSelector("#findings .advice-lines > a")))
          .as("the fallback link was replaced by the lines")
          .isEmpty();
      assertThat(browser.findElement(By.cssSelector("footer.caution")).getText())
          .as("the short caution stays on the page")
          .contains("competent person");
      long[] widths = chromium.scrollAndViewportWidth();
      assertThat(widths[0])
          .as(
              "the opened findings do not widen the page at %d px: %s",
              width, chromium.elementsPastRightEdge())
          .isLessThanOrEqualTo(widths[1]);
    }
  }
}
