package com.wayledger.journey;

import static com.wayledger.support.BrowserSteps.choose;
import static com.wayledger.support.BrowserSteps.click;
import static com.wayledger.support.BrowserSteps.fill;
import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.Board;
import com.wayledger.board.BoardForm;
import com.wayledger.board.BoardService;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.support.BrowserSteps;
import com.wayledger.support.Chromium;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The three users' journeys in a real browser at desktop (1400 px), tablet (768 px) and phone (390
 * px) widths, each step's figures on the page compared with the JSON API's figures for the same
 * board (one figure everywhere), never with numbers typed into the test:
 *
 * <ul>
 *   <li>a contractor fills in the site's defaults with common practice and types a 24-circuit
 *       three-phase board from scratch, row after row, and sees every circuit fully assessed;
 *   <li>a facility manager on the demo site asks whether the bakery board can take a van charger,
 *       adds it where the answer says, and sees the board's demand and history move;
 *   <li>an inspector reviews the checks of the demo's overloaded shower circuit.
 * </ul>
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class UserJourneysBrowserIntegrationTests {

  private static final Duration PATIENCE = Duration.ofSeconds(30);
  private static final JsonMapper JSON = JsonMapper.builder().build();
  private static final List<String> LINES = List.of("L1", "L2", "L3");

  @LocalServerPort int port;
  @Autowired SiteService sites;
  @Autowired BoardService boards;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  // ------------------------------------------------------------------ contractor

  @ParameterizedTest(name = "contractor at {0} px")
  @ValueSource(ints = {1400, 768, 390})
  void contractorTypesATwentyFourCircuitBoardAndSeesItFullyAssessed(int width) throws Exception {
    Site site = sites.create(newSite("Contractor job " + width + " " + UUID.randomUUID()));
    Board board = boards.create(site.getId(), threePhaseBoard("DB-NEW"));
    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      signIn(browser, wait);

      // the site's defaults: common practice filled in, the installation method and grouping
      // (which common practice leaves to the site) chosen, then saved
      browser.get(url("/sites/" + site.getId() + "/defaults?commonPractice=true"));
      WebElement defaults =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("main form")));
      choose(defaults, "installationMethod", "C");
      fill(defaults, "groupedCircuits", "1");
      choose(defaults, "location", "INDOORS"); // a kitchen's circuits: indoors, no special location
      click(browser, defaults.findElement(By.cssSelector("button[type=submit].primary")));
      wait.until(ExpectedConditions.urlToBe(url("/sites/" + site.getId())));

      browser.get(url("/boards/" + board.getId()));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("schedule")));
      int typed = 0;
      for (int way = 1; way <= 8; way++) {
        for (String line : LINES) {
          typed++;
          typeCircuit(browser, wait, way, line, "Socket radial " + typed, 1000 + 50 * typed);
          String counted = typed == 1 ? "1 circuit recorded" : typed + " circuits recorded";
          wait.until(
              ExpectedConditions.textToBePresentInElementLocated(By.id("circuit-count"), counted));
        }
      }
      assertThat(browser.findElement(By.id("circuit-count")).getText())
          .contains("24 circuits recorded");
      assertDemandPanelMatchesApi(browser, board.getId());

      JsonNode findings = api("/api/boards/" + board.getId() + "/findings");
      List<String> notAssessed = new ArrayList<>();
      for (JsonNode circuit : findings.path("circuits")) {
        for (JsonNode finding : circuit.path("findings")) {
          if ("NOT_ASSESSED".equals(finding.path("verdict").asText())) {
            notAssessed.add(circuit.path("description").asText() + ": " + finding.path("summary"));
          }
        }
      }
      assertThat(findings.path("circuits").size()).as("circuits checked by the API").isEqualTo(24);
      assertThat(notAssessed).as("checks the API could not assess").isEmpty();
      assertThat(browser.findElement(By.id("findings")).getText().toLowerCase(Locale.ROOT))
          .as(
              "the page's findings list nothing not assessed (a finding reads \"not assessed — …\")")
          .doesNotContain("not assessed —");
    }
  }

  private void typeCircuit(
      WebDriver browser, WebDriverWait wait, int way, String line, String name, int watts) {
    WebElement free =
        wait.until(ExpectedConditions.presenceOfElementLocated(By.id("pos-" + way + "-" + line)));
    click(browser, free.findElement(By.cssSelector("button.add")));
    WebElement editor =
        wait.until(
            ExpectedConditions.visibilityOfElementLocated(By.id("editor-" + way + "-" + line)));
    editor.findElement(By.name("description")).sendKeys(name);
    choose(editor, "deviceKind", "MCB");
    choose(editor, "deviceCurve", "B");
    fill(editor, "deviceRatingAmps", "16");
    fill(editor, "cableLineCsa", "2.5");
    fill(editor, "cableCpcCsa", "1.5");
    fill(editor, "cableLengthMetres", "18");
    editor.findElement(By.name("loadDescription")).sendKeys("Outlets " + name);
    WebElement rating = editor.findElement(By.name("loadRatingValue"));
    rating.sendKeys(Integer.toString(watts));
    rating.sendKeys(Keys.ENTER);
    wait.until(
        ExpectedConditions.invisibilityOfElementLocated(By.id("editor-" + way + "-" + line)));
  }

  // ------------------------------------------------------------------ facility manager

  @ParameterizedTest(name = "facility manager at {0} px")
  @ValueSource(ints = {1400, 768, 390})
  void facilityManagerAddsAChargerWhereTheAnswerSaysAndSeesDemandAndHistoryMove(int width)
      throws Exception {
    long bakery = demoBoard("KB1");
    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      signIn(browser, wait);
      browser.get(url("/boards/" + bakery));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("demand-panel")));
      Map<String, Double> before = assertDemandPanelMatchesApi(browser, bakery);

      // the spare-capacity question, reached from the board page
      WebElement ask =
          browser.findElement(By.cssSelector("a[href*='/boards/" + bakery + "/can-it-take-it']"));
      browser.get(ask.getAttribute("href"));
      WebElement form =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.id("capacity-form")));
      String charger = "Van charger " + width;
      form.findElement(By.id("description")).sendKeys(charger);
      new Select(form.findElement(By.id("category"))).selectByValue("EV_CHARGING");
      WebElement kilowatts = form.findElement(By.id("ratingValue"));
      kilowatts.clear();
      kilowatts.sendKeys("7");
      new Select(form.findElement(By.id("ratingUnit"))).selectByValue("W");
      WebElement threePhase = form.findElement(By.id("threePhase"));
      if (threePhase.isSelected()) {
        click(browser, threePhase);
      }
      click(browser, form.findElement(By.cssSelector("button[type=submit]")));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("capacity-answer")));
      WebElement first = browser.findElements(By.cssSelector("table.candidates tbody tr")).get(0);
      first.findElement(By.name("reason")).sendKeys("WO-" + width + " van charger");
      click(browser, first.findElement(By.cssSelector("form.add-candidate button")));
      wait.until(ExpectedConditions.urlContains("/history"));

      WebElement newest = browser.findElement(By.cssSelector("table.history tbody tr"));
      assertThat(newest.getText()).contains(charger).contains("WO-" + width + " van charger");
      Map<String, Double> after = apiPhaseCurrents(bakery);
      assertThat(after.values().stream().mapToDouble(Double::doubleValue).sum())
          .as("the board's demand grew by the charger")
          .isGreaterThan(before.values().stream().mapToDouble(Double::doubleValue).sum());
      assertThat(browser.findElements(By.cssSelector("polyline.history-line")))
          .as("the demand-over-time chart draws one line per phase")
          .hasSize(3);

      browser.get(url("/boards/" + bakery));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("demand-panel")));
      assertThat(assertDemandPanelMatchesApi(browser, bakery))
          .as("the board page shows the demand after the charger")
          .isEqualTo(rounded(after));
    }
  }

  // ------------------------------------------------------------------ inspector

  @ParameterizedTest(name = "inspector at {0} px")
  @ValueSource(ints = {1400, 768, 390})
  void inspectorReviewsTheOverloadedShowerCircuitsChecks(int width) throws Exception {
    long flat = demoBoard("FLAT-2");
    JsonNode demand = api("/api/boards/" + flat + "/demand");
    JsonNode findings = api("/api/boards/" + flat + "/findings");
    JsonNode shower = null;
    for (JsonNode circuit : demand.path("circuits")) {
      if (circuit.path("description").asText().toLowerCase(Locale.ROOT).contains("shower")) {
        shower = circuit;
      }
    }
    assertThat(shower).as("the demo's flat 2 has a shower circuit").isNotNull();
    long showerId = shower.path("circuitId").asLong();
    List<String> apiVerdicts = new ArrayList<>();
    for (JsonNode circuit : findings.path("circuits")) {
      if (circuit.path("circuitId").asLong() == showerId) {
        circuit.path("findings").forEach(f -> apiVerdicts.add(f.path("verdict").asText()));
      }
    }
    assertThat(apiVerdicts).as("the API finds the shower's way overloaded").contains("WARNING");

    try (Chromium chromium = Chromium.atWidth(width, 1000)) {
      WebDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, PATIENCE);
      signIn(browser, wait);
      browser.get(url("/boards/" + flat));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.id("findings")));
      assertDemandPanelMatchesApi(browser, flat);
      assertThat(browser.findElement(By.id("findings")).getAttribute("textContent"))
          .as("the board's findings name the shower circuit")
          .contains(shower.path("description").asText());

      WebElement link =
          browser.findElement(By.cssSelector("#schedule a[href$='/circuits/" + showerId + "']"));
      browser.get(link.getAttribute("href"));
      wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("dl.facts")));
      assertThat(browser.findElement(By.cssSelector("dl.facts")).getText())
          .as("Ib on the checks page is the API's design current")
          .contains(oneDecimal(shower.path("designCurrentAmps").asDouble()));
      List<String> pageVerdicts = new ArrayList<>();
      for (WebElement row : browser.findElements(By.cssSelector("tr.finding-row"))) {
        for (String cls : row.getAttribute("class").split(" ")) {
          if (cls.startsWith("v-")) {
            pageVerdicts.add(cls.substring(2));
          }
        }
      }
      assertThat(pageVerdicts)
          .as("the checks page grades the shower's checks as the API does")
          .containsExactlyInAnyOrderElementsOf(apiVerdicts);
    }
  }

  // ------------------------------------------------------------------ helpers

  /** The demand panel's per-line demand current equals the API's, to the panel's one decimal. */
  private Map<String, Double> assertDemandPanelMatchesApi(WebDriver browser, long boardId)
      throws Exception {
    Map<String, Double> shown = new LinkedHashMap<>();
    for (WebElement row : browser.findElements(By.cssSelector("#demand-panel table tbody tr"))) {
      String line = row.findElement(By.tagName("th")).getAttribute("textContent").trim();
      shown.put(
          line,
          Double.parseDouble(
              row.findElements(By.tagName("td")).get(1).getAttribute("textContent").trim()));
    }
    assertThat(shown)
        .as("demand current per line on the page and in the API")
        .isEqualTo(rounded(apiPhaseCurrents(boardId)));
    return shown;
  }

  private Map<String, Double> apiPhaseCurrents(long boardId) throws Exception {
    Map<String, Double> currents = new LinkedHashMap<>();
    for (JsonNode phase : api("/api/boards/" + boardId + "/demand").path("phases")) {
      currents.put(phase.path("phase").asText(), phase.path("currentAmps").asDouble());
    }
    return currents;
  }

  private static Map<String, Double> rounded(Map<String, Double> amps) {
    Map<String, Double> out = new LinkedHashMap<>();
    amps.forEach((line, value) -> out.put(line, Double.valueOf(oneDecimal(value))));
    return out;
  }

  private static String oneDecimal(double value) {
    return new java.math.BigDecimal(Double.toString(value))
        .setScale(1, java.math.RoundingMode.HALF_EVEN)
        .toPlainString();
  }

  /** The API's answer for the demo editor, its "result" part. */
  private JsonNode api(String path) throws IOException, InterruptedException {
    String basic =
        Base64.getEncoder().encodeToString("demo:wayledger-demo".getBytes(StandardCharsets.UTF_8));
    HttpResponse<String> answer =
        HttpClient.newHttpClient()
            .send(
                HttpRequest.newBuilder(URI.create(url(path)))
                    .header("Authorization", "Basic " + basic)
                    .timeout(PATIENCE)
                    .build(),
                HttpResponse.BodyHandlers.ofString());
    assertThat(answer.statusCode()).as("API " + path).isEqualTo(200);
    return JSON.readTree(answer.body()).path("result");
  }

  private long demoBoard(String reference) {
    Site demo =
        sites.all().stream()
            .filter(s -> s.getName().equals("Tallow Lane Works"))
            .findFirst()
            .orElseThrow();
    return boards.onSite(demo.getId()).stream()
        .filter(b -> b.getReference().equals(reference))
        .findFirst()
        .orElseThrow()
        .getId();
  }

  private String url(String path) {
    return "http://127.0.0.1:" + port + path;
  }

  private void signIn(WebDriver browser, WebDriverWait wait) {
    BrowserSteps.signInAsDemo(browser, wait, url(""));
  }

  private static SiteForm newSite(String name) {
    return new SiteForm(
        name, null, EarthingSystem.TN_C_S, 230.0, 3, 50.0, 0.35, 6.0, 100.0, null, null, null);
  }

  private static BoardForm threePhaseBoard(String reference) {
    return new BoardForm(
        reference,
        "Plant room",
        3,
        24,
        100.0,
        DeviceKind.MCCB,
        null,
        100.0,
        3,
        10.0,
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
}
