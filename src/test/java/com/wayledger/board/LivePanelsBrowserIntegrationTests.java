package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.support.Chromium;
import java.io.IOException;
import java.time.Duration;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * A contractor adds a circuit to the demo bakery board in a real browser at desktop, tablet and
 * phone widths: the demand panel, the circuit count and the findings change in the same response,
 * without a reload. Then from the circuit's checks page: Edit, Cancel returns there; Edit, Save
 * returns there with the new rating shown; a second Save with nothing changed says so.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class LivePanelsBrowserIntegrationTests {

  private static final Duration PATIENCE = Duration.ofSeconds(20);
  private static final Pattern COUNT = Pattern.compile("(\\d+) circuits? recorded");

  @LocalServerPort int port;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @ParameterizedTest(name = "{0} px wide")
  @ValueSource(ints = {1400, 768, 390})
  void addedCircuitUpdatesEveryPanelAndItsEditorReturnsToTheChecks(int width) throws IOException {
    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      signIn(browser, wait);
      browser.findElement(By.linkText("Tallow Lane Works")).click();
      wait.until(ExpectedConditions.presenceOfElementLocated(By.linkText("KB1")));
      browser.get(browser.findElement(By.linkText("KB1")).getAttribute("href"));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("schedule")));

      int countBefore = count(browser);
      WebElement free = browser.findElement(By.cssSelector("#schedule tr.free"));
      String freeId = free.getAttribute("id"); // pos-<way>-<line>
      String way = freeId.split("-")[1];
      String line = freeId.split("-")[2];
      double connectedBefore = connectedAmps(browser, line);
      double connectedKilowattsBefore = connectedKilowatts(browser);
      ((JavascriptExecutor) browser).executeScript("window.stillTheSamePage = true;");

      click(browser, free.findElement(By.cssSelector("button.add")));
      WebElement editor =
          wait.until(
              ExpectedConditions.visibilityOfElementLocated(By.id("editor-" + way + "-" + line)));
      String description = "Dough retarder " + width;
      editor.findElement(By.name("description")).sendKeys(description);
      WebElement rating = editor.findElement(By.name("deviceRatingAmps"));
      rating.clear();
      rating.sendKeys("16");
      editor.findElement(By.name("loadDescription")).sendKeys("Retarder compressor");
      WebElement loadRating = editor.findElement(By.name("loadRatingValue"));
      loadRating.sendKeys("2300");
      loadRating.sendKeys(Keys.ENTER);

      wait.until(
          ExpectedConditions.textToBePresentInElementLocated(
              By.id("circuit-count"), (countBefore + 1) + " circuits recorded"));
      assertThat(((JavascriptExecutor) browser).executeScript("return window.stillTheSamePage;"))
          .as("the panels changed without a page load")
          .isEqualTo(Boolean.TRUE);
      // Active power adds arithmetically: the board's connected load grows by 2.30 kW exactly
      // (DESIGN.md, connected load: sum active power).
      assertThat(connectedKilowatts(browser) - connectedKilowattsBefore)
          .as("board's connected kW in the live demand panel grew by the new 2300 W load")
          .isCloseTo(2.30, within(0.0051));
      // The line current is |S| / U0 of the complex sum: adding 10.0 A in phase (2300 W / 230 V) to
      // lagging loads raises it by more than nothing and by at most 10.0 A (triangle inequality).
      assertThat(connectedAmps(browser, line) - connectedBefore)
          .as("connected current on " + line + " in the live demand panel")
          .isGreaterThan(0.0)
          .isLessThanOrEqualTo(10.05);
      assertThat(browser.findElement(By.id("findings")).getText())
          .as("the findings list names the new circuit by board, way, line and name")
          .contains("way " + way + " " + line + " \u201c" + description + "\u201d");

      // the circuit's checks page, its editor, and back
      String checksUrl =
          browser
              .findElement(By.id(freeId))
              .findElement(By.linkText(description))
              .getAttribute("href");
      browser.get(checksUrl);
      click(browser, wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Edit"))));
      click(browser, wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Cancel"))));
      wait.until(ExpectedConditions.urlToBe(checksUrl));

      click(browser, wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Edit"))));
      WebElement editRating =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.name("deviceRatingAmps")));
      editRating.clear();
      editRating.sendKeys("20");
      click(browser, browser.findElement(By.cssSelector("form.circuit-form button[type=submit]")));
      wait.until(ExpectedConditions.urlToBe(checksUrl));
      assertThat(browser.findElement(By.id("saved")).getText())
          .as("notice after the save")
          .contains("Circuit saved");
      assertThat(browser.findElement(By.cssSelector("dl.facts")).getText())
          .as("the checks page shows the new device")
          .contains("MCB B20");

      click(browser, wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Edit"))));
      click(
          browser,
          wait.until(
              ExpectedConditions.elementToBeClickable(
                  By.cssSelector("form.circuit-form button[type=submit]"))));
      wait.until(ExpectedConditions.urlToBe(checksUrl));
      assertThat(browser.findElement(By.id("saved")).getText())
          .as("a save that changed nothing says so")
          .contains("Nothing was changed");
    }
  }

  private void signIn(WebDriver browser, WebDriverWait wait) {
    browser.get("http://localhost:" + port + "/login");
    browser.findElement(By.id("username")).sendKeys("demo");
    browser.findElement(By.id("password")).sendKeys("wayledger-demo");
    browser.findElement(By.cssSelector("form button[type=submit]")).click();
    wait.until(ExpectedConditions.urlContains("/sites"));
  }

  /** Clicks through script so that a narrow layout's scrolling does not hide the target. */
  private static void click(WebDriver browser, WebElement element) {
    ((JavascriptExecutor) browser).executeScript("arguments[0].click();", element);
  }

  private static int count(WebDriver browser) {
    Matcher matcher = COUNT.matcher(browser.findElement(By.id("circuit-count")).getText());
    assertThat(matcher.find()).as("circuit count shown").isTrue();
    return Integer.parseInt(matcher.group(1));
  }

  private static final Pattern CONNECTED_KW = Pattern.compile("connected ([0-9.]+) kW");

  /** The board's connected load from the demand panel's total, kW. */
  private static double connectedKilowatts(WebDriver browser) {
    Matcher matcher =
        CONNECTED_KW.matcher(
            browser.findElement(By.id("demand-panel")).getAttribute("textContent"));
    assertThat(matcher.find()).as("connected kW shown in the demand panel").isTrue();
    return Double.parseDouble(matcher.group(1));
  }

  /** The "connected" figure of one line in the demand panel, A. */
  private static double connectedAmps(WebDriver browser, String line) {
    for (WebElement row : browser.findElements(By.cssSelector("#demand-panel table tbody tr"))) {
      if (row.findElement(By.tagName("th")).getText().trim().equals(line)) {
        return Double.parseDouble(
            row.findElements(By.tagName("td")).get(0).getAttribute("textContent").trim());
      }
    }
    throw new AssertionError("no row for " + line + " in the demand panel");
  }
}
