package com.wayledger.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.RealParts;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
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
 * A real browser (headless Chromium, 768 px wide like a tablet) enters a whole board's results from
 * the keyboard, grades them, confirms the outcome, records the inspection and downloads the PDF,
 * which must be a PDF naming the board. Uses the Debian chromium and chromedriver packages; never
 * lets Selenium fetch a driver or a browser.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class InspectionBrowserIntegrationTests {

  private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
  private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
  private static final Duration PATIENCE = Duration.ofSeconds(20);

  /** Typed per column; a column a row does not have is skipped by Tab. */
  private static final Map<String, String> TYPED =
      Map.ofEntries(
          Map.entry("r1r2", "0.31"),
          Map.entry("r2", ""),
          Map.entry("ringR1", "0.47"),
          Map.entry("ringRn", "0.48"),
          Map.entry("ringR2", "0.78"),
          Map.entry("irLl", ">299"),
          Map.entry("irLe", "200"),
          Map.entry("irNe", "180"),
          Map.entry("zs", "0.62"),
          Map.entry("rcd1", "24"),
          Map.entry("rcd5", "11"));

  @LocalServerPort int port;

  private Path profileDir;
  private Path downloads;
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
    downloads = Files.createTempDirectory("wayledger-downloads-");
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
        "--window-size=768,1400",
        "--user-data-dir=" + profileDir);
    Map<String, Object> prefs = new HashMap<>();
    prefs.put("download.default_directory", downloads.toString());
    prefs.put("download.prompt_for_download", false);
    prefs.put("plugins.always_open_pdf_externally", true);
    options.setExperimentalOption("prefs", prefs);
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
    for (Path dir : new Path[] {profileDir, downloads}) {
      if (dir != null) {
        try (var files = Files.walk(dir)) {
          files.sorted(java.util.Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
        }
      }
    }
  }

  @Test
  void inspectorEntersFlat2FromTheKeyboardRecordsItAndDownloadsThePdf() throws Exception {
    signIn("demo", "wayledger-demo");
    browser.findElement(By.linkText("Tallow Lane Works")).click();
    wait.until(ExpectedConditions.elementToBeClickable(By.linkText("FLAT-2"))).click();
    // the board's less frequent actions are folded behind "More…"
    wait.until(
            ExpectedConditions.elementToBeClickable(By.cssSelector("details.more-menu > summary")))
        .click();
    wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Inspections"))).click();
    wait.until(ExpectedConditions.elementToBeClickable(By.id("new-inspection"))).click();
    WebElement grid = wait.until(ExpectedConditions.presenceOfElementLocated(By.id("results")));

    Long scrollWidth =
        (Long)
            ((org.openqa.selenium.JavascriptExecutor) browser)
                .executeScript("return document.documentElement.scrollWidth;");
    Long clientWidth =
        (Long)
            ((org.openqa.selenium.JavascriptExecutor) browser)
                .executeScript("return document.documentElement.clientWidth;");
    assertThat(scrollWidth).as("no sideways scrolling at 768 px").isLessThanOrEqualTo(clientWidth);

    List<WebElement> rows = grid.findElements(By.cssSelector("tbody tr"));
    assertThat(rows).as("FLAT-2 has circuits in use").hasSizeGreaterThan(5);

    // Enter moves down the column
    WebElement first = rows.get(0).findElement(By.cssSelector("[data-col=r1r2]"));
    first.click();
    first.sendKeys(Keys.ENTER);
    assertThat(browser.switchTo().activeElement())
        .as("Enter moved to the next row's R1+R2")
        .isEqualTo(rows.get(1).findElement(By.cssSelector("[data-col=r1r2]")));

    // checked as typed: a typo is marked at once, and cleared when corrected
    first.click();
    first.sendKeys("0,3x");
    assertThat(first.getAttribute("aria-invalid"))
        .as("'0,3x' marked while typing")
        .isEqualTo("true");
    first.sendKeys(Keys.BACK_SPACE);
    assertThat(first.getAttribute("aria-invalid")).as("'0,3' accepted").isEqualTo("false");
    first.clear();

    // the whole board typed from the keyboard: values and Tab, row after row
    first.click();
    for (WebElement row : rows) {
      for (WebElement cell : row.findElements(By.cssSelector("[data-col]"))) {
        assertThat(browser.switchTo().activeElement())
            .as("Tab reaches %s of way %s", cell.getAttribute("data-col"), row.getText())
            .isEqualTo(cell);
        String column = cell.getAttribute("data-col");
        if (cell.getTagName().equals("select")) {
          cell.sendKeys(Keys.ARROW_DOWN); // the option after "blank": ✓
          cell.sendKeys(Keys.TAB);
        } else if ("checkbox".equals(cell.getAttribute("type"))) {
          cell.sendKeys(Keys.TAB);
        } else {
          cell.sendKeys(TYPED.getOrDefault(column, ""), Keys.TAB);
        }
      }
    }
    assertThat(browser.switchTo().activeElement().getAttribute("id"))
        .as("after the last cell Tab reaches the grade button")
        .isEqualTo("grade");
    browser.switchTo().activeElement().sendKeys(Keys.ENTER);

    WebElement outcome =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.id("derived-outcome")));
    assertThat(outcome.getText()).contains("lead to");
    WebElement ring = browser.findElement(By.xpath("//tr[contains(., 'Sockets ring')]"));
    assertThat(ring.findElement(By.cssSelector("[data-col=ringR2]")).getAttribute("value"))
        .isEqualTo("0.78");
    screenshot("inspection-graded.png");

    WebElement confirm = browser.findElement(By.id("confirmedOutcome"));
    confirm.sendKeys(Keys.SPACE);
    assertThat(confirm.isSelected()).isTrue();
    browser.findElement(By.id("record")).sendKeys(Keys.ENTER);

    WebElement pdfLink = wait.until(ExpectedConditions.elementToBeClickable(By.id("pdf")));
    assertThat(browser.getPageSource()).contains("Inspection and test report", "FLAT-2");
    screenshot("inspection-record.png");
    pdfLink.sendKeys(Keys.ENTER);

    Path pdf = waitForDownload();
    byte[] bytes = Files.readAllBytes(pdf);
    assertThat(new String(bytes, 0, 5, java.nio.charset.StandardCharsets.US_ASCII))
        .isEqualTo("%PDF-");
    try (PDDocument document = Loader.loadPDF(bytes)) {
      assertThat(new PDFTextStripper().getText(document)).contains("FLAT-2", "Caution");
    }
  }

  /**
   * A block copied from a spreadsheet (tab between cells, a line per row) pasted into the first
   * cell of two rows fills both rows cell by cell; grading and recording then keep and grade what
   * was pasted. The paste is dispatched as a ClipboardEvent carrying the text, because headless
   * Chromium has no system clipboard to paste from; the page's own handler does the rest.
   */
  @Test
  void aBlockPastedFromASpreadsheetFillsTwoRowsAndIsGradedWhenRecorded() throws Exception {
    signIn("demo", "wayledger-demo");
    browser.findElement(By.linkText("Tallow Lane Works")).click();
    wait.until(ExpectedConditions.elementToBeClickable(By.linkText("FLAT-2"))).click();
    // the board's less frequent actions are folded behind "More…"
    wait.until(
            ExpectedConditions.elementToBeClickable(By.cssSelector("details.more-menu > summary")))
        .click();
    wait.until(ExpectedConditions.elementToBeClickable(By.linkText("Inspections"))).click();
    wait.until(ExpectedConditions.elementToBeClickable(By.id("new-inspection"))).click();
    WebElement grid = wait.until(ExpectedConditions.presenceOfElementLocated(By.id("results")));

    // two neighbouring rows with the same cells, as a spreadsheet's columns would line up
    List<WebElement> rows = grid.findElements(By.cssSelector("tbody tr"));
    int start = -1;
    for (int i = 0; i + 1 < rows.size() && start < 0; i++) {
      if (columnsOf(rows.get(i)).equals(columnsOf(rows.get(i + 1)))) {
        start = i;
      }
    }
    assertThat(start).as("FLAT-2 has two neighbouring rows with the same cells").isNotNegative();
    List<String> columns = columnsOf(rows.get(start));
    assertThat(columns).contains("irLe", "irNe", "zs");
    String firstWay = rows.get(start).findElement(By.cssSelector(".way-label")).getText();
    String secondWay = rows.get(start + 1).findElement(By.cssSelector(".way-label")).getText();

    Map<String, String> firstRow = new HashMap<>(PASTED);
    firstRow.put("irNe", "0,5"); // below the 1 MΩ minimum at 500 V: must fail
    Map<String, String> secondRow = new HashMap<>(PASTED);
    secondRow.put("zs", "0.55");
    String block =
        line(columns, firstRow) + "\r\n" + line(columns, secondRow) + "\r\n"; // as Excel copies
    WebElement target = rows.get(start).findElement(By.cssSelector("[data-col]"));
    ((org.openqa.selenium.JavascriptExecutor) browser)
        .executeScript(
            "var data = new DataTransfer(); data.setData('text/plain', arguments[1]);"
                + "arguments[0].focus();"
                + "arguments[0].dispatchEvent(new ClipboardEvent('paste',"
                + " {clipboardData: data, bubbles: true, cancelable: true}));",
            target,
            block);

    for (String column : columns) {
      if (!column.equals("rcdDelayed")) {
        assertThat(cellValue(rows.get(start), column))
            .as("pasted %s of way %s", column, firstWay)
            .isEqualTo(shownAs(column, firstRow.get(column)));
        assertThat(cellValue(rows.get(start + 1), column))
            .as("pasted %s of way %s", column, secondWay)
            .isEqualTo(shownAs(column, secondRow.get(column)));
      }
    }
    if (start + 2 < rows.size()) {
      for (WebElement cell : rows.get(start + 2).findElements(By.cssSelector("input[type=text]"))) {
        assertThat(cell.getAttribute("value")).as("the row below the block stays blank").isEmpty();
      }
    }

    browser.findElement(By.id("grade")).click();
    wait.until(ExpectedConditions.presenceOfElementLocated(By.id("derived-outcome")));
    WebElement first = browser.findElement(By.cssSelector("tr[data-row='" + start + "']"));
    assertThat(cellValue(first, "irNe")).isEqualTo("0,5");
    // IEC 60364-6 Table 6A / BS 7671 Table 64: at least 1 MΩ at 500 V DC for circuits up to 500 V
    assertThat(cellClass(first, "irNe")).as("0.5 MΩ N–E graded").contains("fail");
    assertThat(cellClass(first, "irLe")).as("200 MΩ L–E graded").contains("pass");
    assertThat(cellValue(first, "zs")).isEqualTo("0.62");

    WebElement confirm = browser.findElement(By.id("confirmedOutcome"));
    confirm.sendKeys(Keys.SPACE);
    browser.findElement(By.id("record")).sendKeys(Keys.ENTER);
    wait.until(ExpectedConditions.elementToBeClickable(By.id("pdf")));

    List<String> recordedFirst = reportRow(firstWay);
    List<String> recordedSecond = reportRow(secondWay);
    int irNe = InspectionController.COLUMNS.indexOf("irNe");
    int irLe = InspectionController.COLUMNS.indexOf("irLe");
    int zs = InspectionController.COLUMNS.indexOf("zs");
    assertThat(recordedFirst.get(irNe)).as("stored N–E of way %s", firstWay).isEqualTo("0.5 ✗");
    assertThat(recordedFirst.get(irLe)).as("stored L–E of way %s", firstWay).isEqualTo("200 ✓");
    assertThat(recordedSecond.get(irNe)).as("stored N–E of way %s", secondWay).isEqualTo("180 ✓");
    assertThat(recordedSecond.get(zs)).as("stored Zs of way %s", secondWay).startsWith("0.55");
  }

  /** What is pasted per column (the polarity and test-button cells take a tick). */
  private static final Map<String, String> PASTED =
      Map.ofEntries(
          Map.entry("r1r2", "0.31"),
          Map.entry("r2", "0.19"),
          Map.entry("ringR1", "0.47"),
          Map.entry("ringRn", "0.48"),
          Map.entry("ringR2", "0.78"),
          Map.entry("irLl", ">299"),
          Map.entry("irLe", "200"),
          Map.entry("irNe", "180"),
          Map.entry("polarity", "✓"),
          Map.entry("zs", "0.62"),
          Map.entry("rcd1", "24"),
          Map.entry("rcd5", "11"),
          Map.entry("rcdButton", "✓"),
          Map.entry("rcdDelayed", ""));

  private static List<String> columnsOf(WebElement row) {
    return row.findElements(By.cssSelector("[data-col]")).stream()
        .map(c -> c.getAttribute("data-col"))
        .toList();
  }

  private static String line(List<String> columns, Map<String, String> values) {
    return String.join("\t", columns.stream().map(c -> values.getOrDefault(c, "")).toList());
  }

  /** A tick pasted into a select becomes its "ok" option. */
  private static String shownAs(String column, String pasted) {
    return column.equals("polarity") || column.equals("rcdButton")
        ? (pasted.isEmpty() ? "" : "ok")
        : pasted;
  }

  private static String cellValue(WebElement row, String column) {
    return row.findElement(By.cssSelector("[data-col='" + column + "']")).getAttribute("value");
  }

  private static String cellClass(WebElement row, String column) {
    return row.findElement(By.xpath(".//td[.//*[@data-col='" + column + "']]"))
        .getAttribute("class");
  }

  /** The value cells of a way's row in the recorded report's schedule of test results. */
  private List<String> reportRow(String way) {
    WebElement row =
        browser.findElement(
            By.xpath(
                "//h2[normalize-space()='Schedule of test results']/following-sibling::table[1]"
                    + "//tr[td[1][normalize-space()='"
                    + way
                    + "']]"));
    List<WebElement> cells = row.findElements(By.tagName("td"));
    return cells.subList(1, cells.size()).stream().map(c -> c.getText().strip()).toList();
  }

  private Path waitForDownload() throws Exception {
    long deadline = System.nanoTime() + PATIENCE.toNanos();
    while (System.nanoTime() < deadline) {
      try (var files = Files.list(downloads)) {
        var done = files.filter(p -> p.toString().endsWith(".pdf")).findFirst().orElse(null);
        if (done != null && Files.size(done) > 0) {
          return done;
        }
      }
      Thread.sleep(200);
    }
    throw new AssertionError("no PDF downloaded into " + downloads);
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
