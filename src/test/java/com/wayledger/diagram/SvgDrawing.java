package com.wayledger.diagram;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * A diagram read back with the JDK's XML parser, for tests: what a program reading the file sees.
 */
final class SvgDrawing {

  static final String SVG = "http://www.w3.org/2000/svg";

  private final Document document;

  private SvgDrawing(Document document) {
    this.document = document;
  }

  static SvgDrawing parse(String svg) {
    try {
      DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
      factory.setNamespaceAware(true);
      factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
      return new SvgDrawing(
          factory
              .newDocumentBuilder()
              .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8))));
    } catch (Exception e) {
      throw new AssertionError("the diagram is not well-formed XML: " + e.getMessage(), e);
    }
  }

  double width() {
    return Double.parseDouble(document.getDocumentElement().getAttribute("width"));
  }

  double height() {
    return Double.parseDouble(document.getDocumentElement().getAttribute("height"));
  }

  private List<Element> groups(String cssClass) {
    List<Element> found = new ArrayList<>();
    NodeList all = document.getElementsByTagNameNS(SVG, "g");
    for (int i = 0; i < all.getLength(); i++) {
      Element element = (Element) all.item(i);
      if (List.of(element.getAttribute("class").split(" ")).contains(cssClass)) {
        found.add(element);
      }
    }
    return found;
  }

  List<Long> boardIds() {
    return groups("sld-board").stream()
        .map(group -> Long.parseLong(group.getAttribute("data-board-id")))
        .toList();
  }

  List<String> submains() {
    return groups("sld-submain").stream()
        .map(group -> group.getAttribute("data-from") + "->" + group.getAttribute("data-to"))
        .toList();
  }

  List<String> circuitLinks() {
    List<String> links = new ArrayList<>();
    NodeList all = document.getElementsByTagNameNS(SVG, "a");
    for (int i = 0; i < all.getLength(); i++) {
      Element a = (Element) all.item(i);
      if (a.getAttribute("class").equals("sld-way-link")) {
        links.add(a.getAttribute("href"));
      }
    }
    return links;
  }

  /** Pairs of board boxes that overlap, as "id/id"; empty when none do. */
  List<String> overlappingBoxes() {
    List<Element> boards = groups("sld-board");
    List<String> overlaps = new ArrayList<>();
    for (int i = 0; i < boards.size(); i++) {
      double[] a = rect(boards.get(i));
      for (int j = i + 1; j < boards.size(); j++) {
        double[] b = rect(boards.get(j));
        if (a[0] < b[0] + b[2] && b[0] < a[0] + a[2] && a[1] < b[1] + b[3] && b[1] < a[1] + a[3]) {
          overlaps.add(
              boards.get(i).getAttribute("data-board-id")
                  + "/"
                  + boards.get(j).getAttribute("data-board-id"));
        }
      }
    }
    return overlaps;
  }

  /** The board's outline as drawn: its first rect (x, y, width, height). */
  private static double[] rect(Element board) {
    Element outline = (Element) board.getElementsByTagNameNS(SVG, "rect").item(0);
    return new double[] {
      Double.parseDouble(outline.getAttribute("x")),
      Double.parseDouble(outline.getAttribute("y")),
      Double.parseDouble(outline.getAttribute("width")),
      Double.parseDouble(outline.getAttribute("height"))
    };
  }

  String boardText(long boardId) {
    return groups("sld-board").stream()
        .filter(group -> group.getAttribute("data-board-id").equals(Long.toString(boardId)))
        .findFirst()
        .map(Element::getTextContent)
        .orElseThrow(() -> new AssertionError("no board node " + boardId));
  }

  /** The element name of the board's grade shape (polygon, circle, rect, path). */
  String gradeShape(long boardId) {
    Element board =
        groups("sld-board").stream()
            .filter(group -> group.getAttribute("data-board-id").equals(Long.toString(boardId)))
            .findFirst()
            .orElseThrow();
    NodeList marks = board.getElementsByTagNameNS(SVG, "g");
    for (int i = 0; i < marks.getLength(); i++) {
      Element mark = (Element) marks.item(i);
      if (mark.getAttribute("class").startsWith("sld-grade-mark")) {
        return ((Element) mark.getElementsByTagNameNS(SVG, "*").item(0)).getLocalName();
      }
    }
    throw new AssertionError("no grade mark on board " + boardId);
  }

  String allText() {
    return document.getDocumentElement().getTextContent();
  }
}
