package com.wayledger.support;

import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/** What a person does in the browser, shared by the journeys: sign in, type, choose, press. */
public final class BrowserSteps {

  private BrowserSteps() {}

  /** Signs in as the demo profile's user on the app at {@code baseUrl} and waits for the sites. */
  public static void signInAsDemo(WebDriver browser, WebDriverWait wait, String baseUrl) {
    browser.get(baseUrl + "/login");
    browser.findElement(By.id("username")).sendKeys("demo");
    browser.findElement(By.id("password")).sendKeys("wayledger-demo");
    browser.findElement(By.cssSelector("form button[type=submit]")).click();
    wait.until(ExpectedConditions.urlContains("/sites"));
  }

  /** Presses an element by script, so that a sticky header over it cannot take the click. */
  public static void click(WebDriver browser, WebElement element) {
    ((JavascriptExecutor) browser).executeScript("arguments[0].click();", element);
  }

  /** Replaces what the named field of the form holds with {@code value}. */
  public static void fill(WebElement form, String name, String value) {
    WebElement input = form.findElement(By.name(name));
    input.clear();
    input.sendKeys(value);
  }

  /** Chooses the option with this value in the named drop-down of the form. */
  public static void choose(WebElement form, String name, String value) {
    new Select(form.findElement(By.name(name))).selectByValue(value);
  }
}
