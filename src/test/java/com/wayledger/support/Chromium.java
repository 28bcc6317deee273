package com.wayledger.support;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Map;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * A headless Chromium from the Debian packages (never a downloaded browser or driver) with a fresh
 * profile and a viewport of an exact width, for browser tests at desktop, tablet and phone sizes.
 * Close it after the test.
 */
public final class Chromium implements AutoCloseable {

  public static final Path BINARY = Path.of("/usr/bin/chromium");
  public static final Path DRIVER = Path.of("/usr/bin/chromedriver");

  private final Path profileDir;
  private final ChromeDriver driver;

  private Chromium(Path profileDir, ChromeDriver driver) {
    this.profileDir = profileDir;
    this.driver = driver;
  }

  /** Skips (on a laptop) or fails (CI=true) the calling test when Chromium is not installed. */
  public static void requireInstalled() {
    RealParts.require(
        Files.isExecutable(BINARY) && Files.isExecutable(DRIVER),
        "Chromium for the browser test: "
            + BINARY
            + " and "
            + DRIVER
            + " (apt-get install chromium chromium-driver)");
  }

  /** A browser whose layout viewport is {@code widthPixels} wide (device pixel ratio 1). */
  public static Chromium atWidth(int widthPixels, int heightPixels) throws IOException {
    Path profile = Files.createTempDirectory("wayledger-chromium-");
    ChromeOptions options = new ChromeOptions();
    options.setBinary(BINARY.toFile());
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
        "--window-size=" + widthPixels + "," + heightPixels,
        "--user-data-dir=" + profile);
    ChromeDriverService service =
        new ChromeDriverService.Builder()
            .usingDriverExecutable(new File(DRIVER.toString()))
            .build();
    ChromeDriver driver = new ChromeDriver(service, options);
    // The window size includes no browser chrome in headless mode, but fix the viewport exactly so
    // that a "390 px phone" is 390 CSS pixels wide whatever the platform adds.
    driver.executeCdpCommand(
        "Emulation.setDeviceMetricsOverride",
        Map.of(
            "width", widthPixels, "height", heightPixels, "deviceScaleFactor", 1, "mobile", false));
    return new Chromium(profile, driver);
  }

  public ChromeDriver driver() {
    return driver;
  }

  /** The document's scroll width and the viewport's width, CSS pixels. */
  public long[] scrollAndViewportWidth() {
    Object scroll =
        driver.executeScript(
            "return Math.max(document.documentElement.scrollWidth, document.body.scrollWidth);");
    Object viewport = driver.executeScript("return document.documentElement.clientWidth;");
    return new long[] {((Number) scroll).longValue(), ((Number) viewport).longValue()};
  }

  /**
   * The elements that reach past the right edge of the viewport, deepest first (at most five, as
   * "tag.class#id right px"): what a failed width check names so that it can be fixed.
   */
  public String elementsPastRightEdge() {
    Object found =
        driver.executeScript(
            "const edge = document.documentElement.clientWidth; const out = [];"
                + " for (const el of Array.from(document.querySelectorAll('body *')).reverse()) {"
                + "  const r = el.getBoundingClientRect();"
                + "  if (r.right > edge + 0.5 && r.width > 0) {"
                + "   out.push(el.tagName.toLowerCase() + (el.className && el.className.baseVal === undefined"
                + "    ? '.' + String(el.className).trim().replace(/\\s+/g, '.') : '')"
                + "    + (el.id ? '#' + el.id : '') + ' ' + Math.round(r.right) + ' px');"
                + "   if (out.length === 5) break; } }"
                + " return out.join('; ');");
    return String.valueOf(found);
  }

  @Override
  public void close() throws IOException {
    driver.quit();
    try (var files = Files.walk(profileDir)) {
      files.sorted(Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
    }
  }
}
