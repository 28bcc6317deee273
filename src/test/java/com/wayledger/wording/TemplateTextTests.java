package com.wayledger.wording;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.TextNode;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;

/**
 * No template carries words for people outside {@code #{...}}: every label, heading, hint and
 * accessible name comes from the message bundles, so that each page reads in the en-GB or en-US
 * words chosen for it. Text inside an element whose body Thymeleaf replaces (th:text, th:utext,
 * th:errors, th:replace, th:insert, th:remove) is the designer's placeholder and never shown.
 */
class TemplateTextTests {

  private static final Path TEMPLATES = Path.of("src/main/resources/templates");

  /**
   * Tokens that are the same in every English: the product's name, the trade's symbols (Ib, In, Iz,
   * Zs, Ze; IEC 60050 and BS 7671 notation, common practice) and SI or trade unit symbols.
   */
  private static final Set<String> SAME_IN_EVERY_ENGLISH =
      Set.of(
          "Wayledger",
          "Ib",
          "In",
          "Iz",
          "Zs",
          "Ze",
          "kW",
          "kVA",
          "kvar",
          "kA",
          "VA",
          "mA",
          "DC",
          "min",
          "ft",
          "mm");

  /** Attributes whose text people read or hear (tooltips, placeholders, accessible names). */
  private static final Set<String> READ_ATTRIBUTES =
      Set.of("title", "placeholder", "aria-label", "alt", "label");

  /** Thymeleaf attributes that replace (or drop) the element's body. */
  private static final Set<String> BODY_REPLACING =
      Set.of("th:text", "th:utext", "th:errors", "th:replace", "th:insert");

  /** Thymeleaf attributes whose expression becomes text people read. */
  private static final Set<String> TEXT_EXPRESSIONS =
      Set.of("th:text", "th:utext", "th:title", "th:placeholder", "th:aria-label", "th:alt");

  private static final Pattern WORD = Pattern.compile("\\p{L}{2,}");
  private static final Pattern QUOTED = Pattern.compile("'([^']*)'");

  @Test
  void noTemplateCarriesLiteralWordsForPeople() throws IOException {
    List<String> found = new ArrayList<>();
    try (Stream<Path> files = Files.walk(TEMPLATES)) {
      for (Path file : files.filter(f -> f.toString().endsWith(".html")).sorted().toList()) {
        scan(TEMPLATES.relativize(file).toString(), file, found);
      }
    }
    assertThat(found).as("literal words in templates (move them to a message bundle)").isEmpty();
  }

  @Test
  void theScannerFindsWordsInTextAttributesAndExpressions() {
    List<String> found = new ArrayList<>();
    scan(
        "sample.html",
        """
        <main><h1>Boards</h1><p th:text="#{ok}">placeholder is fine</p>
        <nav aria-label="Breadcrumb"></nav><span th:text="${n} + ' of ' + ${m}">x</span>
        <abbr th:title="#{t}">Ib</abbr> <span th:text="${a} + ' kW'">1 kW</span></main>
        """,
        found);
    assertThat(found)
        .as("the heading, the aria-label and the ' of ' literal; not the placeholder or units")
        .hasSize(3)
        .anyMatch(f -> f.contains("Boards"))
        .anyMatch(f -> f.contains("Breadcrumb"))
        .anyMatch(f -> f.contains(" of "));
  }

  private static void scan(String name, Path file, List<String> found) throws IOException {
    scan(name, Files.readString(file, StandardCharsets.UTF_8), found);
  }

  private static void scan(String name, String html, List<String> found) {
    Document document = Jsoup.parse(html, "", Parser.htmlParser());
    for (Element element : document.getAllElements()) {
      if (hidden(element)) {
        continue;
      }
      boolean bodyShown = !replacesBody(element);
      for (Attribute attribute : element.attributes()) {
        String key = attribute.getKey();
        if (READ_ATTRIBUTES.contains(key) && bodyShown && hasWords(attribute.getValue())) {
          found.add(name + ": " + key + "=\"" + attribute.getValue() + "\"");
        }
        if (TEXT_EXPRESSIONS.contains(key)) {
          Matcher quoted = QUOTED.matcher(attribute.getValue());
          while (quoted.find()) {
            String literal = quoted.group(1);
            // A literal with a space in it is text for people; one without is a key, a code or an
            // id.
            if (literal.contains(" ") && hasWords(literal)) {
              found.add(name + ": " + key + " literal '" + literal + "'");
            }
          }
        }
      }
      if (!bodyShown || ancestorReplacesBody(element)) {
        continue;
      }
      for (TextNode text : element.textNodes()) {
        if (hasWords(text.text())) {
          found.add(name + ": <" + element.tagName() + "> " + text.text().strip());
        }
      }
    }
  }

  private static boolean hasWords(String text) {
    Matcher word = WORD.matcher(text);
    while (word.find()) {
      if (!SAME_IN_EVERY_ENGLISH.contains(word.group())) {
        return true;
      }
    }
    return false;
  }

  private static boolean hidden(Element element) {
    for (Element e = element; e != null; e = e.parent()) {
      if (e.tagName().equals("script") || e.tagName().equals("style")) {
        return true;
      }
    }
    return false;
  }

  /**
   * Whether Thymeleaf replaces this element's body; a page's own html replaced by the layout keeps
   * its main.
   */
  private static boolean replacesBody(Element element) {
    if (element.tagName().equals("html") || element.tagName().equals("#root")) {
      return false;
    }
    String remove = element.attr("th:remove");
    if (!remove.isEmpty() && !remove.equals("tag") && !remove.equals("none")) {
      return true;
    }
    return BODY_REPLACING.stream().anyMatch(element::hasAttr);
  }

  private static boolean ancestorReplacesBody(Element element) {
    for (Element e = element.parent(); e != null; e = e.parent()) {
      if (replacesBody(e)) {
        return true;
      }
    }
    return false;
  }
}
