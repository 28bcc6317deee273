package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.RealParts;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * A real browser (headless Chromium) types a circuit into the demo bakery board through the inline
 * editor, and the circuit is still there after a reload. Uses the Debian chromium and chromedriver
 * packages; never lets Selenium fetch a driver or a browser.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class ScheduleBrowserIntegrationTests {

  private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
  private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
  private static final Duration PATIENCE = Duration.ofSeconds(15);

  @LocalServerPort int port;

  private Path profileDir;
  private WebDriver browser;
  private WebDriverWait wait;

  @BeforeAll
  static void chromiumIsInstalled() {
    RealParts.require(
        Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER),
        "Chromium for the browser test: "
            + CHROMIUM
            + " and "
            + CHROMEDRIVER
            + " (apt-get install chromium chromium-driver)");
  }

  @BeforeEach
  void startBrowser() throws IOException {
    profileDir = Files.createTempDirectory("wayledger-chromium-");
    ChromeOptions options = new ChromeOptions();
    options.setBinary(CHROMIUM.toFile());
    options.addArguments(
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--disable-dev-shm-usage",
        "--window-size=1400,1800",
        "--user-data-dir=" + profileDir);
    ChromeDriverService service =
        new ChromeDriverService.Builder()
            .usingDriverExecutable(new File(CHROMEDRIVER.toString()))
            .build();
    browser = new ChromeDriver(service, options);
    wait = new WebDriverWait(browser, PATIENCE);
  }

  @AfterEach
  void stopBrowser() throws IOException {
    if (browser != null) {
      browser.quit();
    }
    if (profileDir != null) {
      try (var files = Files.walk(profileDir)) {
        files.sorted(java.util.Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
      }
    }
  }

  @Test
  void circuitTypedInlineOnTheBakeryBoardIsStoredAndSurvivesAReload() throws IOException {
    signIn("demo", "wayledger-demo");

    browser.findElement(By.linkText("Tallow Lane Works")).click();
    wait.until(ExpectedConditions.elementToBeClickable(By.linkText("KB1"))).click();
    wait.until(ExpectedConditions.presenceOfElementLocated(By.id("schedule")));
    screenshot("board-kb1.png");

    WebElement freeRow = browser.findElement(By.id("pos-12-L3"));
    assertThat(freeRow.getText())
        .as("way 12 L3 of KB1 is free in the demo")
        .contains("free position");
    freeRow.findElement(By.cssSelector("button.add")).click();

    WebElement editor =
        wait.until(ExpectedConditions.visibilityOfElementLocated(By.id("editor-12-L3")));
    editor.findElement(By.name("description")).sendKeys("Proofing cabinet lamp");
    WebElement rating = editor.findElement(By.name("deviceRatingAmps"));
    rating.clear();
    rating.sendKeys("6");
    editor.findElement(By.name("loadDescription")).sendKeys("Cabinet lamp");
    WebElement loadRating = editor.findElement(By.name("loadRatingValue"));
    loadRating.sendKeys("60");
    loadRating.sendKeys(Keys.ENTER);

    wait.until(ExpectedConditions.invisibilityOfElementLocated(By.id("editor-12-L3")));
    wait.until(
        ExpectedConditions.textToBePresentInElementLocated(
            By.id("pos-12-L3"), "Proofing cabinet lamp"));

    browser.navigate().refresh();
    String row =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.id("pos-12-L3"))).getText();
    assertThat(row)
        .as("row 12 L3 after a reload")
        .contains("Proofing cabinet lamp", "Cabinet lamp", "60 W");
    // once in the schedule; the findings below name it too, each beside its own finding
    assertThat(
            browser.findElements(
                By.xpath("//*[@id='schedule']//*[contains(text(), 'Proofing cabinet lamp')]")))
        .as("the new circuit appears once in the schedule")
        .hasSize(1);
  }

  private void signIn(String username, String password) {
    browser.get("http://localhost:" + port + "/login");
    browser.findElement(By.id("username")).sendKeys(username);
    browser.findElement(By.id("password")).sendKeys(password);
    browser.findElement(By.cssSelector("form button[type=submit]")).click();
    wait.until(ExpectedConditions.urlContains("/sites"));
  }

  /** For people looking at the build output; not asserted. */
  private void screenshot(String name) throws IOException {
    Path folder = Path.of("target", "screenshots");
    Files.createDirectories(folder);
    File shot = ((TakesScreenshot) browser).getScreenshotAs(OutputType.FILE);
    Files.copy(shot.toPath(), folder.resolve(name), StandardCopyOption.REPLACE_EXISTING);
  }
}
