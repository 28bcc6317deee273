package com.wayledger.journey;

import static com.wayledger.support.BrowserSteps.choose;
import static com.wayledger.support.BrowserSteps.click;
import static com.wayledger.support.BrowserSteps.fill;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.support.BrowserSteps;
import com.wayledger.support.Chromium;
import java.io.ByteArrayInputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.UUID;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * A US electrician in a real browser at desktop (1400 px), tablet (768 px) and phone (390 px)
 * widths: creates an NEC site on a 120/240 V single-phase three-wire supply and a 42-space
 * panelboard, enters 120 V one-pole and 240 V two-pole breakers space by space, reads the line and
 * neutral currents after each step, balances, and exports the workbook; then a 208Y/120 V panel
 * with a 208 V line-to-line load. Every expected figure is a hand calculation written beside it,
 * never a number produced by the code under test. Sites, boards and loads are invented.
 *
 * <p>Relations used (from memory, any power-systems textbook, e.g. W. D. Stevenson, Elements of
 * Power System Analysis): on a single-phase three-wire system lines A and B are 180° apart, so a
 * 120 V load draws I = P / 120 V on its line, a 240 V load draws I = P / 240 V on both lines and
 * nothing on the neutral, and the neutral carries the difference of the line-to-neutral currents
 * (at unity power factor). On a 208Y/120 V wye a 208 V line-to-line load draws I = P / 208 V on
 * both of its lines and nothing on the neutral or the third line.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class PanelboardJourneyBrowserIntegrationTests {

  private static final Duration PATIENCE = Duration.ofSeconds(30);

  @LocalServerPort int port;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @ParameterizedTest(name = "120/240 V and 208Y/120 V panelboards at {0} px")
  @ValueSource(ints = {1400, 768, 390})
  void anElectricianDraftsBalancesAndExportsA42SpacePanel(int width) throws Exception {
    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      signIn(browser, wait);

      long siteId = createNecSite(browser, wait, "Invented duplex " + width, "SPLIT_PHASE_120_240");
      long boardId = createPanel(browser, wait, siteId, "LP-1", "42");
      assertThat(browser.findElement(By.id("schedule")).getText())
          .as("the board page draws the 42-space panel")
          .contains("Panelboard with 42 spaces");
      assertThat(browser.findElements(By.cssSelector("#schedule td.breaker.free")))
          .as("42 free spaces")
          .hasSize(42);
      assertFitsWidth(chromium, "the empty panelboard");

      // 1. a 120 V breaker at space 1 (row 1, line A): 1,200 W / 120 V = 10.0 A on A;
      //    the neutral carries A − B = 10.0 A (hand calculation)
      addBreaker(browser, wait, boardId, 1, 1, "Kitchen receptacles", "1200");
      assertCurrents(browser, Map.of("A", "10.0", "B", "0.0"), "10.0");

      // 2. a 120 V breaker at space 3 (row 2, line B): 600 W / 120 V = 5.0 A on B;
      //    neutral 10.0 − 5.0 = 5.0 A
      addBreaker(browser, wait, boardId, 3, 1, "Bedroom lights", "600");
      assertCurrents(browser, Map.of("A", "10.0", "B", "5.0"), "5.0");

      // 3. a 240 V water heater, two poles at spaces 5 and 7 (lines A and B):
      //    4,500 W / 240 V = 18.75 A on each line, nothing on the neutral;
      //    A = 10 + 18.75 = 28.75 → 28.8, B = 5 + 18.75 = 23.75 → 23.8, neutral still 5.0 A
      addBreaker(browser, wait, boardId, 5, 2, "Water heater", "4500");
      assertCurrents(browser, Map.of("A", "28.8", "B", "23.8"), "5.0");
      WebElement heater = browser.findElement(By.id("space-5"));
      assertThat(heater.getAttribute("rowspan"))
          .as("the two-pole breaker spans two rows")
          .isEqualTo("2");
      assertThat(heater.getText()).contains("spaces 5/7 · lines A–B");
      assertThat(browser.findElements(By.id("space-7")))
          .as("space 7 is under the heater")
          .isEmpty();

      // 4. a 120 V breaker at space 2 (row 1, line A): 960 W / 120 V = 8.0 A;
      //    A = 36.75 → 36.8, B = 23.75 → 23.8, neutral 18 − 5 = 13.0 A
      addBreaker(browser, wait, boardId, 2, 1, "Garage receptacles", "960");
      assertCurrents(browser, Map.of("A", "36.8", "B", "23.8"), "13.0");
      assertFitsWidth(chromium, "the panelboard with four breakers");

      // 5. balancing: moving the 8 A breaker to a free B space gives A 28.75, B 31.75 (largest
      //    31.75 A); moving the 10 A one gives 26.75 / 33.75, any other plan is worse: one move
      browser.get(url("/boards/" + boardId + "/balance"));
      WebElement moves =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("ol.moves")));
      assertThat(moves.getText())
          .as("a move from one space to another")
          .containsPattern("“Garage receptacles”: space 2 \\(A\\) → space \\d+ \\(B\\), 8\\.0 A");
      assertThat(browser.findElements(By.cssSelector("ol.moves li"))).hasSize(1);
      assertFitsWidth(chromium, "the panelboard's balancing page");
      click(
          browser,
          browser.findElement(By.cssSelector("form[action$='/balance/apply'] button.primary")));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("balance-applied")));
      browser.get(url("/boards/" + boardId));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("demand-panel")));
      // A = 10 + 18.75 = 28.75 → 28.8, B = 5 + 8 + 18.75 = 31.75 → 31.8, neutral |10 − 13| = 3.0
      assertCurrents(browser, Map.of("A", "28.8", "B", "31.8"), "3.0");

      // 6. the door chart: odd spaces left, even right
      browser.get(url("/boards/" + boardId + "/door-chart"));
      WebElement chart =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.id("panel-chart")));
      assertThat(chart.findElements(By.tagName("table"))).as("two columns").hasSize(2);
      assertThat(chart.getText()).contains("Water heater").contains("↑ breaker at space 5");
      assertFitsWidth(chromium, "the panelboard's door chart");

      // 7. the workbook: the panel as laid out, and the line currents of the one analysis
      try (Workbook book = new XSSFWorkbook(new ByteArrayInputStream(workbook(browser, boardId)))) {
        Sheet sheet = book.getSheet("Panel layout");
        assertThat(sheet).as("the workbook has a panel layout sheet").isNotNull();
        Row first = rowStartingWith(sheet, 1);
        assertThat(first.getCell(1).getStringCellValue()).isEqualTo("Kitchen receptacles");
        assertThat(first.getCell(4).getStringCellValue()).as("row 1 is line A").isEqualTo("A");
        assertThat(first.getCell(5).getStringCellValue())
            .as("space 2 was emptied by balancing")
            .isEqualTo("free space");
        Row third = rowStartingWith(sheet, 5);
        assertThat(third.getCell(1).getStringCellValue()).isEqualTo("Water heater");
        assertThat(third.getCell(2).getNumericCellValue()).as("poles").isEqualTo(2.0);
        assertThat(sheet.getMergedRegions())
            .as("the heater's cell runs down rows 3 and 4")
            .contains(new CellRangeAddress(third.getRowNum(), third.getRowNum() + 1, 1, 1));
        assertThat(rowStartingWith(sheet, 7).getCell(4).getStringCellValue())
            .as("row 4 is line B")
            .isEqualTo("B");
        Map<String, Double> currents = currentsIn(sheet);
        assertThat(currents.get("Line A")).isCloseTo(28.75, within(0.005));
        assertThat(currents.get("Line B")).isCloseTo(31.75, within(0.005));
        assertThat(currents.get("Neutral")).isCloseTo(3.0, within(0.005));
        // the schedule sheet speaks the site's units: AWG sizes and feet, as typed
        var format = new org.apache.poi.ss.usermodel.DataFormatter();
        StringBuilder cells = new StringBuilder();
        book.forEach(
            each ->
                each.forEach(
                    row ->
                        row.forEach(
                            cell -> cells.append(format.formatCellValue(cell)).append('|'))));
        assertThat(cells.toString())
            .as("the workbook's schedule columns in AWG and feet, with the typed size")
            .contains("|Line AWG/kcmil|")
            .contains("|Length ft|")
            .contains("|12 AWG|");
      }

      // 8. a 208Y/120 V panel: a 208 V unit on two poles at spaces 1 and 3 (lines A and B):
      //    4,160 W / 208 V = 20.0 A on A and B (√3 × 120 V = 207.8 V gives 20.02 A: 20.0 to one
      //    decimal either way), nothing on C or the neutral
      long wyeSite = createNecSite(browser, wait, "Invented tenant floor " + width, "WYE_208Y_120");
      long wyePanel = createPanel(browser, wait, wyeSite, "HP-1", "30");
      addBreaker(browser, wait, wyePanel, 1, 2, "Rooftop unit", "4160");
      assertThat(browser.findElement(By.id("space-1")).getText())
          .contains("spaces 1/3 · lines A–B");
      assertCurrents(browser, Map.of("A", "20.0", "B", "20.0", "C", "0.0"), "0.0");
      assertFitsWidth(chromium, "the 208Y/120 V panelboard");
    }
  }

  // ------------------------------------------------------------------ steps

  private long createNecSite(WebDriver browser, WebDriverWait wait, String name, String system) {
    browser.get(url("/sites/new"));
    WebElement form =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("main form")));
    fill(form, "name", name + " " + UUID.randomUUID());
    choose(form, "ruleSet", "NEC");
    choose(form, "supplySystem", system);
    choose(form, "earthingSystem", "TN_C_S");
    fill(form, "nominalVoltageVolts", "120");
    fill(form, "phases", system.startsWith("SPLIT") ? "1" : "3");
    fill(form, "frequencyHertz", "60");
    fill(form, "prospectiveFaultCurrentKiloAmps", "10");
    choose(form, "defaultDiversityMethod", ""); // no diversity: the figures are connected load
    click(browser, form.findElement(By.cssSelector("button[type=submit]")));
    wait.until(ExpectedConditions.urlMatches(".*/sites/\\d+$"));
    String current = browser.getCurrentUrl();
    return Long.parseLong(current.substring(current.lastIndexOf('/') + 1));
  }

  private long createPanel(
      WebDriver browser, WebDriverWait wait, long siteId, String reference, String spaces) {
    browser.get(url("/sites/" + siteId));
    WebElement add =
        wait.until(
            ExpectedConditions.presenceOfElementLocated(
                By.cssSelector("a[href$='/sites/" + siteId + "/boards/new']")));
    browser.get(add.getAttribute("href"));
    WebElement form =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("main form")));
    fill(form, "reference", reference);
    fill(form, "wayCount", spaces);
    choose(form, "incomerKind", "MCCB");
    fill(form, "incomerRatingAmps", "200");
    fill(form, "incomerBreakingCapacityKiloAmps", "22");
    click(browser, form.findElement(By.cssSelector("button[type=submit]")));
    wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.panel-layout")));
    String current = browser.getCurrentUrl();
    return Long.parseLong(current.substring(current.lastIndexOf('/') + 1));
  }

  /** Adds a breaker at a free space through the panel's Add link and the circuit editor. */
  private void addBreaker(
      WebDriver browser,
      WebDriverWait wait,
      long boardId,
      int space,
      int poles,
      String name,
      String watts) {
    browser.get(url("/boards/" + boardId));
    WebElement free =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.id("space-" + space)));
    browser.get(free.findElement(By.cssSelector("a.add")).getAttribute("href"));
    WebElement editor =
        wait.until(
            ExpectedConditions.presenceOfElementLocated(By.cssSelector("form.circuit-form")));
    editor.findElement(By.name("description")).sendKeys(name);
    Select polesChoice = new Select(editor.findElement(By.name("position")));
    polesChoice.getOptions().stream()
        .filter(option -> option.getText().startsWith(poles + " pole"))
        .findFirst()
        .orElseThrow(() -> new AssertionError("no " + poles + "-pole choice at space " + space))
        .click();
    choose(editor, "location", "INDOORS");
    choose(editor, "deviceKind", "MCB");
    fill(editor, "deviceRatingAmps", poles == 1 ? "20" : "30");
    fill(editor, "deviceBreakingCapacityKiloAmps", "10");
    typeCable(editor);
    editor.findElement(By.name("loadDescription")).sendKeys(name);
    choose(editor, "loadCategory", "OTHER");
    fill(editor, "loadRatingValue", watts);
    choose(editor, "loadRatingUnit", "W");
    fill(editor, "loadPowerFactor", "1");
    click(browser, editor.findElement(By.cssSelector("button[type=submit].primary")));
    wait.until(ExpectedConditions.urlToBe(url("/boards/" + boardId)));
    wait.until(ExpectedConditions.presenceOfElementLocated(By.id("demand-panel")));
  }

  /**
   * The cable as an NEC site's circuit form takes it: an AWG size from the list of NEC sizes and a
   * length in feet (stored as 3.31 mm² and 12.192 m; 1 ft = 0.3048 m exactly).
   */
  private static void typeCable(WebElement editor) {
    choose(editor, "cableLineSize", "12 AWG");
    choose(editor, "cableCpcSize", "12 AWG");
    fill(editor, "cableLengthFeet", "40");
  }

  // ------------------------------------------------------------------ checks

  /** The demand panel's connected and demand current per line (A, B, C) and the neutral. */
  private static void assertCurrents(
      WebDriver browser, Map<String, String> expectedLines, String expectedNeutral) {
    Map<String, String> demand = new LinkedHashMap<>();
    for (WebElement row : browser.findElements(By.cssSelector("#demand-panel table tbody tr"))) {
      String line = row.findElement(By.tagName("th")).getAttribute("textContent").trim();
      demand.put(
          line, row.findElements(By.tagName("td")).get(1).getAttribute("textContent").trim());
    }
    assertThat(demand).as("line currents, A, on the board page").isEqualTo(expectedLines);
    assertThat(browser.findElement(By.id("neutral-current")).getAttribute("textContent").trim())
        .as("neutral current on the board page")
        .isEqualTo(expectedNeutral + " A");
  }

  private static void assertFitsWidth(Chromium chromium, String what) {
    long[] widths = chromium.scrollAndViewportWidth();
    assertThat(widths[0])
        .as("%s: page scroll width within the viewport", what)
        .isLessThanOrEqualTo(widths[1]);
  }

  private static Row rowStartingWith(Sheet sheet, int space) {
    for (Row row : sheet) {
      Cell first = row.getCell(0);
      if (first != null
          && first.getCellType() == CellType.NUMERIC
          && first.getNumericCellValue() == space) {
        return row;
      }
    }
    throw new AssertionError("no row for space " + space);
  }

  private static Map<String, Double> currentsIn(Sheet sheet) {
    Map<String, Double> currents = new LinkedHashMap<>();
    for (Row row : sheet) {
      Cell label = row.getCell(0);
      Cell value = row.getCell(1);
      if (label != null
          && label.getCellType() == CellType.STRING
          && (label.getStringCellValue().startsWith("Line ")
              || label.getStringCellValue().equals("Neutral"))
          && value != null
          && value.getCellType() == CellType.NUMERIC) {
        currents.put(label.getStringCellValue(), value.getNumericCellValue());
      }
    }
    return currents;
  }

  /** The board's workbook, downloaded as the signed-in browser would (its session cookie). */
  private byte[] workbook(WebDriver browser, long boardId) throws Exception {
    String cookies =
        browser.manage().getCookies().stream()
            .map(cookie -> cookie.getName() + "=" + cookie.getValue())
            .collect(java.util.stream.Collectors.joining("; "));
    HttpResponse<byte[]> answer =
        HttpClient.newHttpClient()
            .send(
                HttpRequest.newBuilder(URI.create(url("/boards/" + boardId + "/export.xlsx")))
                    .header("Cookie", cookies)
                    .timeout(PATIENCE)
                    .build(),
                HttpResponse.BodyHandlers.ofByteArray());
    assertThat(answer.statusCode()).as("workbook download").isEqualTo(200);
    return answer.body();
  }

  // ------------------------------------------------------------------ browser helpers

  private String url(String path) {
    return "http://127.0.0.1:" + port + path;
  }

  private void signIn(WebDriver browser, WebDriverWait wait) {
    BrowserSteps.signInAsDemo(browser, wait, url(""));
  }
}
