package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.account.AccountService;
import com.wayledger.account.Role;
import com.wayledger.account.UserForm;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.support.RealParts;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.UUID;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * A person imports a foreign CSV in headless Chromium: upload, check the column guesses, preview,
 * import.
 */
@SpringBootTest(
    webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT,
    properties = "server.address=127.0.0.1")
@ActiveProfiles("test")
class ImportBrowserIntegrationTests {

  private static final File CHROMIUM = new File("/usr/bin/chromium");
  private static final File DRIVER = new File("/usr/bin/chromedriver");

  @LocalServerPort int port;
  @Autowired AccountService accounts;
  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ExportReader reader;

  @TempDir Path temp;
  WebDriver browser;
  Board board;
  String username;

  @BeforeEach
  void start() {
    RealParts.require(
        CHROMIUM.canExecute() && DRIVER.canExecute(),
        "Chromium and chromedriver are not installed at /usr/bin");
    username = "importer" + UUID.randomUUID().toString().substring(0, 8);
    accounts.create(new UserForm(username, "Importer", "import-pass-1234", Role.EDITOR));
    Site site =
        sites.create(
            new SiteForm(
                "Browser import " + UUID.randomUUID(),
                null,
                EarthingSystem.TN_S,
                230.0,
                3,
                50.0,
                0.3,
                6.0,
                80.0,
                null,
                null,
                null));
    board = boards.create(site.getId(), ExchangeIntegrationTests.board("DB-X"));
    ChromeOptions options = new ChromeOptions();
    options.setBinary(CHROMIUM);
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
        "--user-data-dir=" + temp.resolve("profile"));
    ChromeDriverService service =
        new ChromeDriverService.Builder().usingDriverExecutable(DRIVER).build();
    browser = new ChromeDriver(service, options);
  }

  @AfterEach
  void stop() {
    if (browser != null) {
      browser.quit();
    }
  }

  @Test
  void uploadMapPreviewAndImportAForeignCsv() throws Exception {
    Path file = temp.resolve("foreign.csv");
    Files.writeString(
        file,
        "Cct,Phase,Serving,Breaker,Kilowatts\n1,L1,Corridor lights,B6,0.3\n2,L2,Office sockets,C16,1.8\n",
        StandardCharsets.UTF_8);
    String base = "http://127.0.0.1:" + port;
    WebDriverWait wait = new WebDriverWait(browser, Duration.ofSeconds(20));
    browser.get(base + "/login");
    browser.findElement(By.id("username")).sendKeys(username);
    browser.findElement(By.id("password")).sendKeys("import-pass-1234");
    browser.findElement(By.cssSelector("button[type=submit].primary")).click();
    wait.until(ExpectedConditions.urlContains("/sites"));

    browser.get(base + "/boards/" + board.getId() + "/import");
    browser.findElement(By.id("file")).sendKeys(file.toString());
    browser.findElement(By.id("upload-button")).click();
    wait.until(ExpectedConditions.urlContains("/mapping"));

    Select kilowatts = new Select(browser.findElement(By.id("column4")));
    assertThat(kilowatts.getFirstSelectedOption().getAttribute("value"))
        .as("guess for Kilowatts")
        .isEqualTo("LOAD_KILOWATTS");
    Select breaker = new Select(browser.findElement(By.id("column3")));
    breaker.selectByValue("DEVICE_SUMMARY"); // the user confirms (or corrects) the guess
    browser.findElement(By.id("mapping-submit")).click();
    wait.until(ExpectedConditions.urlContains("/preview"));
    assertThat(browser.findElement(By.id("preview-summary")).getText())
        .contains("2 valid")
        .contains("0 with problems");

    browser.findElement(By.id("import-all")).click();
    wait.until(ExpectedConditions.presenceOfElementLocated(By.id("imported")));
    assertThat(browser.findElement(By.id("imported")).getText()).contains("2 circuits");
    assertThat(reader.board(board.getId()).boards().get(0).circuits())
        .extracting(e -> e.circuit().description())
        .containsExactly("Corridor lights", "Office sockets");
  }
}
