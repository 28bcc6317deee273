package com.wayledger.diagram;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.board.Circuit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.CircuitRepository;
import com.wayledger.board.ScheduleService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.SiteService;
import com.wayledger.support.QrImages;
import com.wayledger.support.RealParts;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Base64;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.PrintsPage;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.print.PageSize;
import org.openqa.selenium.print.PrintOptions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * An inspector on the demo site opens the single-line diagram, follows a board's link, opens and
 * prints its door chart, and after someone changes the board, opens the chart's code link on the
 * phone and is told the chart is out of date. A 72-position board's chart prints on one A4 page.
 * Headless Chromium; skips without it, fails in CI.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class DiagramBrowserIntegrationTests {

  private static final File DRIVER = new File("/usr/bin/chromedriver");
  private static final File BROWSER = new File("/usr/bin/chromium");

  /** ISO 216 A4 portrait, cm (width 21.0, height 29.7). */
  private static final PageSize A4 = new PageSize(29.7, 21.0);

  @LocalServerPort int port;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired CircuitRepository circuits;

  WebDriver browser;
  Path profile;

  @BeforeEach
  void startBrowser() throws Exception {
    RealParts.require(
        DRIVER.canExecute() && BROWSER.canExecute(),
        "Chromium and its driver (/usr/bin/chromium, /usr/bin/chromedriver): apt-get install chromium chromium-driver");
    profile = Files.createTempDirectory("wayledger-chromium");
    ChromeOptions options = new ChromeOptions();
    options.setBinary(BROWSER);
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
        "--window-size=1400,1100",
        "--user-data-dir=" + profile);
    ChromeDriverService service =
        new ChromeDriverService.Builder().usingDriverExecutable(DRIVER).build();
    browser = new ChromeDriver(service, options);
  }

  @AfterEach
  void stopBrowser() throws Exception {
    if (browser != null) {
      browser.quit();
    }
    if (profile != null) {
      try (var files = Files.walk(profile)) {
        files.sorted(java.util.Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
      }
    }
  }

  @Test
  void diagramToBoardToDoorChartToChangedBanner() throws Exception {
    signIn();
    browser.findElement(By.linkText("Tallow Lane Works")).click();
    browser.findElement(By.linkText("Single-line diagram")).click();
    wait(d -> !d.findElements(By.cssSelector("svg.sld")).isEmpty());

    long siteId = demoSiteId();
    int boardCount = boards.onSite(siteId).size();
    assertThat(browser.findElements(By.cssSelector("svg.sld g.sld-board")))
        .as("one node per board")
        .hasSize(boardCount);
    WebElement zoomOut = browser.findElement(By.cssSelector("button[data-zoom=out]"));
    assertThat(zoomOut.isDisplayed()).as("the pan/zoom script ran").isTrue();
    String widthBefore = browser.findElement(By.cssSelector("svg.sld")).getAttribute("width");
    zoomOut.click();
    assertThat(browser.findElement(By.cssSelector("svg.sld")).getAttribute("width"))
        .as("zoom out makes the drawing narrower")
        .isNotEqualTo(widthBefore);
    shot("site-diagram");

    Board kb1 = demoBoard(siteId, "KB1");
    WebElement link =
        browser.findElement(
            By.cssSelector("g.sld-board[data-board-id='" + kb1.getId() + "'] a.sld-board-link"));
    ((JavascriptExecutor) browser).executeScript("arguments[0].scrollIntoView();", link);
    link.click();
    wait(d -> d.getCurrentUrl().endsWith("/boards/" + kb1.getId()));

    browser.findElement(By.cssSelector("details.more-menu > summary")).click();
    browser.findElement(By.linkText("Door chart")).click();
    wait(d -> !d.findElements(By.id("door-code")).isEmpty());
    String codeLink = browser.findElement(By.id("door-code")).getAttribute("data-link");
    assertThat(codeLink)
        .as("the code links to the live board at this server")
        .startsWith("http://127.0.0.1:" + port + "/boards/" + kb1.getId() + "/live?printed=");
    String codeSvg = browser.findElement(By.cssSelector("svg.door-code")).getAttribute("outerHTML");
    assertThat(QrImages.decodeSvg(codeSvg)).as("the printed code").isEqualTo(codeLink);
    assertThat(browser.findElement(By.id("free-positions")).getText()).startsWith("Free positions");
    byte[] kb1Pdf = printA4();
    keep("door-chart-kb1.pdf", kb1Pdf);
    assertThat(pages(kb1Pdf)).as("KB1's door chart on A4").isEqualTo(1);
    shot("door-chart");

    Circuit spare =
        circuits.findByBoard(kb1.getId()).stream()
            .filter(circuit -> circuit.getStatus() == WayStatus.SPARE_DEVICE)
            .findFirst()
            .orElseThrow();
    schedule.deleteCircuit(spare.getId(), "WO-3141 spare breaker removed");

    browser.get(codeLink);
    WebElement banner = browser.findElement(By.id("live-banner"));
    assertThat(banner.getText())
        .as("banner after a change")
        .contains("Changed since printed")
        .contains("WO-3141 spare breaker removed");
    shot("live-board-changed");
  }

  @Test
  void doorChartOfASeventyTwoPositionBoardFitsOneA4Page() throws Exception {
    long siteId = demoSiteId();
    Board big = boards.create(siteId, seventyTwoPositionBoard(), "door chart test");
    for (int way = 1; way <= 24; way++) {
      for (PhasePosition line : List.of(PhasePosition.L1, PhasePosition.L2, PhasePosition.L3)) {
        if (way == 24 && line == PhasePosition.L3) {
          continue; // one free position, printed under the table
        }
        schedule.addCircuit(
            big.getId(),
            CircuitForm.blankAt(way, line).inUseAs("Office sockets " + way + " " + line, null));
      }
    }
    signIn();
    browser.get("http://127.0.0.1:" + port + "/boards/" + big.getId() + "/door-chart");
    assertThat(browser.findElements(By.cssSelector(".columns table tbody tr")))
        .as("every position printed")
        .hasSize(71);
    assertThat(browser.findElement(By.id("free-positions")).getText()).contains("24 L3");
    assertThat(pages(printA4())).as("pages for a 72-position board's door chart").isEqualTo(1);
    shot("door-chart-72");
  }

  private static BoardForm seventyTwoPositionBoard() {
    return new BoardForm(
        "DB-72",
        "Open-plan office",
        3,
        24,
        250.0,
        DeviceKind.MCCB,
        null,
        160.0,
        3,
        25.0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0,
        1.0,
        null,
        null,
        null,
        null);
  }

  private byte[] printA4() {
    // print only once the page and its style sheet are in: on a busy machine a print taken earlier
    // shows the page unstyled
    wait(
        d ->
            Boolean.TRUE.equals(
                ((JavascriptExecutor) d)
                    .executeScript(
                        "var s = document.querySelector('.sheet');"
                            + " return document.readyState === 'complete' && s !== null"
                            + " && getComputedStyle(s).borderTopStyle === 'solid';")));
    PrintOptions options = new PrintOptions();
    options.setPageSize(A4);
    return Base64.getDecoder().decode(((PrintsPage) browser).print(options).getContent());
  }

  /** Pages in a PDF: its page objects ("/Type /Page", not "/Pages"). */
  static int pages(byte[] pdf) {
    Matcher page =
        Pattern.compile("/Type\\s*/Page(?![a-zA-Z])")
            .matcher(new String(pdf, StandardCharsets.ISO_8859_1));
    int count = 0;
    while (page.find()) {
      count++;
    }
    return count;
  }

  private long demoSiteId() {
    return sites.all().stream()
        .filter(site -> site.getName().equals("Tallow Lane Works"))
        .findFirst()
        .orElseThrow()
        .getId();
  }

  private Board demoBoard(long siteId, String reference) {
    return boards.onSite(siteId).stream()
        .filter(board -> board.getReference().equals(reference))
        .findFirst()
        .orElseThrow();
  }

  private void wait(java.util.function.Function<WebDriver, Boolean> condition) {
    new WebDriverWait(browser, Duration.ofSeconds(20)).until(condition::apply);
  }

  /** Keeps a file under target/screenshots for a person to look at; not an assertion. */
  private static void keep(String name, byte[] content) {
    try {
      Path dir = Files.createDirectories(Path.of("target", "screenshots"));
      Files.write(dir.resolve(name), content);
    } catch (java.io.IOException ignored) {
      // a missing copy must not fail the flow
    }
  }

  /** Keeps a screenshot under target/screenshots for a person to look at; not an assertion. */
  private void shot(String name) {
    try {
      Path dir = Files.createDirectories(Path.of("target", "screenshots"));
      byte[] png =
          ((org.openqa.selenium.TakesScreenshot) browser)
              .getScreenshotAs(org.openqa.selenium.OutputType.BYTES);
      Files.write(dir.resolve(name + ".png"), png);
    } catch (java.io.IOException | RuntimeException ignored) {
      // a missing screenshot must not fail the flow
    }
  }

  private void signIn() {
    browser.get("http://127.0.0.1:" + port + "/login");
    browser.findElement(By.name("username")).sendKeys("demo");
    browser.findElement(By.name("password")).sendKeys("wayledger-demo");
    browser.findElement(By.cssSelector("form button[type=submit]")).click();
    wait(d -> d.getCurrentUrl().contains("/sites"));
  }
}
