package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.Chromium;
import java.io.IOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * Every main page of the demo site on a 1400 px desktop, a 768 px tablet and a 390 px phone (the
 * spare-capacity answers included): the page's scroll width does not exceed the viewport (a table
 * may scroll inside its own box or reflow into cards; the page may not), and on the phone the
 * board's own facts start on the first screen, not below a wall of buttons.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@ActiveProfiles({"test", "demo"})
class NarrowScreensBrowserIntegrationTests {

  @LocalServerPort int port;
  @org.springframework.beans.factory.annotation.Autowired com.wayledger.site.SiteService sites;
  @org.springframework.beans.factory.annotation.Autowired BoardService boards;
  @org.springframework.beans.factory.annotation.Autowired ScheduleService schedule;

  @BeforeAll
  static void chromiumIsInstalled() {
    Chromium.requireInstalled();
  }

  @ParameterizedTest(name = "{0} px wide")
  @ValueSource(ints = {1400, 768, 390})
  void noMainPageScrollsSideways(int width) throws IOException {
    try (Chromium chromium = Chromium.atWidth(width, width < 500 ? 844 : 1024)) {
      org.openqa.selenium.chrome.ChromeDriver browser = chromium.driver();
      WebDriverWait wait = new WebDriverWait(browser, Duration.ofSeconds(20));
      browser.get(url("/login"));
      browser.findElement(By.id("username")).sendKeys("demo");
      browser.findElement(By.id("password")).sendKeys("wayledger-demo");
      browser.findElement(By.cssSelector("form button[type=submit]")).click();
      wait.until(ExpectedConditions.urlContains("/sites"));
      String site = browser.findElement(By.linkText("Tallow Lane Works")).getAttribute("href");
      browser.get(site);
      String board =
          wait.until(ExpectedConditions.presenceOfElementLocated(By.linkText("KB1")))
              .getAttribute("href");
      browser.get(board);
      String checks =
          wait.until(
                  ExpectedConditions.presenceOfElementLocated(
                      By.cssSelector("#schedule td a[href*='/circuits/']")))
              .getAttribute("href");

      Map<String, String> pages = new LinkedHashMap<>();
      pages.put("sites", url("/sites"));
      pages.put("site", site);
      pages.put("site findings", site + "/findings");
      pages.put("site defaults", site + "/defaults");
      pages.put("board and schedule", board);
      pages.put("board defaults", board + "/defaults");
      pages.put("circuit checks", checks);
      pages.put("circuit editor", checks + "/edit?back=checks");
      pages.put("balancing", board + "/balance");
      pages.put("room for a new load", board + "/can-it-take-it");
      pages.put("history", board + "/history");
      pages.put("import", board + "/import");
      pages.put("inspections", board + "/inspections");
      pages.put("new inspection", board + "/inspections/new");
      pages.put("door chart", board + "/door-chart");
      pages.put("site room for a new load", site + "/can-it-take-it");
      String question =
          "/can-it-take-it?ask=1&description=Van+charger&category=EV_CHARGING"
              + "&ratingValue=7&ratingUnit=W&powerFactor=1";
      pages.put("room for a new load, answered", board + question);
      pages.put("site room for a new load, answered", site + question);
      pages.put("site change log", site + "/log");
      pages.put("headroom", site + "/headroom");
      pages.put("site edit", site + "/edit");
      pages.put("board edit", board + "/edit");
      // an NEC-set panelboard: odd spaces left, even right, lines A and B
      String panel =
          url(
              "/boards/"
                  + com.wayledger.support.NecPanels.splitPhasePanel(sites, boards, schedule)
                      .getId());
      pages.put("NEC panelboard schedule", panel);
      pages.put("NEC panelboard door chart", panel + "/door-chart");
      pages.put("NEC panelboard balancing", panel + "/balance");
      browser.get(board + "/inspections");
      browser.findElements(By.cssSelector("main a[href*='/inspections/']")).stream()
          .map(link -> link.getAttribute("href"))
          .filter(href -> href.matches(".*/inspections/\\d+$"))
          .findFirst()
          .ifPresent(href -> pages.put("inspection", href));

      List<String> tooWide = new ArrayList<>();
      for (var page : pages.entrySet()) {
        browser.get(page.getValue());
        // the door chart is a print page without the layout's main element
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("body > *")));
        // parts loaded after the page (the site's headroom table) are in place before measuring
        wait.until(
            driver ->
                ((Number)
                            ((org.openqa.selenium.JavascriptExecutor) driver)
                                .executeScript(
                                    "return document.querySelectorAll('[hx-trigger=\"load\"],"
                                        + " .htmx-request').length;"))
                        .intValue()
                    == 0);
        if (page.getKey().endsWith("answered")) {
          assertThat(browser.findElements(By.cssSelector("table.candidates")))
              .as("the %s page shows its table of places", page.getKey())
              .isNotEmpty();
        }
        long[] widths = chromium.scrollAndViewportWidth();
        if (widths[0] > widths[1]) {
          tooWide.add(
              page.getKey()
                  + " "
                  + widths[0]
                  + " px > "
                  + widths[1]
                  + " px ("
                  + chromium.elementsPastRightEdge()
                  + ")");
        }
      }
      assertThat(tooWide)
          .as("pages whose scroll width exceeds the " + width + " px viewport")
          .isEmpty();

      browser.get(board);
      wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("dl.facts")));
      Number factsTop =
          (Number)
              browser.executeScript(
                  "return document.querySelector('dl.facts').getBoundingClientRect().top;");
      Number viewport = (Number) browser.executeScript("return window.innerHeight;");
      assertThat(factsTop.doubleValue())
          .as("the board's facts start on the first screen (%s px high)", viewport)
          .isLessThan(viewport.doubleValue() * 2 / 3);
    }
  }

  private String url(String path) {
    return "http://localhost:" + port + path;
  }
}
