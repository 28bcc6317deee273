package com.wayledger.diagram;

import static com.wayledger.diagram.SvgText.n;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.protection.result.Verdict;

/**
 * The device and grade marks of the diagram, each drawn centred on a point of a horizontal line.
 * Device marks follow the shapes of the IEC 60617 graphical symbols (our own drawing of them): a
 * switch blade with a cross at its fixed contact for a circuit breaker, a bar across the fixed
 * contact for an isolator (disconnector), a rectangle on the line for a fuse, and a ring round the
 * line linked to the blade for residual-current detection. Each mark is 36 units long.
 */
final class DiagramSymbols {

  static final double HALF_LENGTH = 18;

  static final String INK = "#17202a";
  static final String MUTED = "#4d5a66";
  static final String PAPER = "#ffffff";
  static final String DANGER = "#a1141b";
  static final String WARNING = "#8a4b00";
  static final String ADVICE = "#1d3b53";
  static final String PASS = "#1f6b3a";

  private DiagramSymbols() {}

  /** Which symbol a device kind is drawn with. */
  enum Symbol {
    BREAKER,
    BREAKER_WITH_RESIDUAL,
    ISOLATOR_WITH_RESIDUAL,
    FUSE,
    ISOLATOR,
    NONE;

    static Symbol of(DeviceKind kind) {
      if (kind == null) {
        return NONE;
      }
      return switch (kind) {
        case MCB, MCCB -> BREAKER;
        case RCBO -> BREAKER_WITH_RESIDUAL;
        case RCD -> ISOLATOR_WITH_RESIDUAL;
        case FUSE -> FUSE;
      };
    }
  }

  static void device(StringBuilder svg, Symbol symbol, double cx, double cy) {
    svg.append("<g class=\"sld-symbol sym-")
        .append(symbol.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'))
        .append("\" fill=\"none\" stroke=\"")
        .append(INK)
        .append("\" stroke-width=\"1.6\">");
    // a white ground hides the line the mark sits on
    svg.append("<rect x=\"")
        .append(n(cx - HALF_LENGTH + 6))
        .append("\" y=\"")
        .append(n(cy - 16))
        .append("\" width=\"")
        .append(n(2 * HALF_LENGTH - 12))
        .append("\" height=\"28\" fill=\"")
        .append(PAPER)
        .append("\" stroke=\"none\"/>");
    switch (symbol) {
      case BREAKER -> blade(svg, cx, cy, true);
      case ISOLATOR -> blade(svg, cx, cy, false);
      case BREAKER_WITH_RESIDUAL -> {
        blade(svg, cx, cy, true);
        residual(svg, cx, cy);
      }
      case ISOLATOR_WITH_RESIDUAL -> {
        blade(svg, cx, cy, false);
        residual(svg, cx, cy);
      }
      case FUSE -> {
        line(svg, cx - HALF_LENGTH, cy, cx + HALF_LENGTH, cy);
        svg.append("<rect x=\"")
            .append(n(cx - 11))
            .append("\" y=\"")
            .append(n(cy - 5))
            .append("\" width=\"22\" height=\"10\"/>");
      }
      case NONE -> {
        line(svg, cx - HALF_LENGTH, cy, cx - 8, cy);
        line(svg, cx + 8, cy, cx + HALF_LENGTH, cy);
        svg.append("<circle cx=\"")
            .append(n(cx))
            .append("\" cy=\"")
            .append(n(cy))
            .append("\" r=\"7\" stroke-dasharray=\"2 2\"/>");
        svg.append("<text x=\"")
            .append(n(cx))
            .append("\" y=\"")
            .append(n(cy + 4))
            .append("\" text-anchor=\"middle\" font-size=\"11\" fill=\"")
            .append(INK)
            .append("\" stroke=\"none\">?</text>");
      }
    }
    svg.append("</g>");
  }

  /** Leads, an open blade from the left lead up towards the right, and the fixed contact's mark. */
  private static void blade(StringBuilder svg, double cx, double cy, boolean breaker) {
    line(svg, cx - HALF_LENGTH, cy, cx - 9, cy);
    line(svg, cx - 9, cy, cx + 8, cy - 10);
    line(svg, cx + 9, cy, cx + HALF_LENGTH, cy);
    if (breaker) {
      line(svg, cx + 6, cy - 3, cx + 12, cy + 3);
      line(svg, cx + 6, cy + 3, cx + 12, cy - 3);
    } else {
      line(svg, cx + 9, cy - 5, cx + 9, cy + 5);
    }
  }

  /** A ring round the incoming lead, linked by a dashed line to the blade it trips. */
  private static void residual(StringBuilder svg, double cx, double cy) {
    svg.append("<ellipse cx=\"")
        .append(n(cx - 14))
        .append("\" cy=\"")
        .append(n(cy))
        .append("\" rx=\"3\" ry=\"7\"/>");
    svg.append("<path d=\"M")
        .append(n(cx - 14))
        .append(' ')
        .append(n(cy - 7))
        .append(" V")
        .append(n(cy - 14))
        .append(" H")
        .append(n(cx))
        .append(" V")
        .append(n(cy - 6))
        .append("\" stroke-dasharray=\"2 2\" stroke-width=\"1\"/>");
  }

  static void line(StringBuilder svg, double x1, double y1, double x2, double y2) {
    svg.append("<line x1=\"")
        .append(n(x1))
        .append("\" y1=\"")
        .append(n(y1))
        .append("\" x2=\"")
        .append(n(x2))
        .append("\" y2=\"")
        .append(n(y2))
        .append("\"/>");
  }

  /** The colour of a grade (never the only sign of it: the shape and the word go with it). */
  static String colour(Verdict grade) {
    if (grade == null) {
      return PASS;
    }
    return switch (grade) {
      case DANGER -> DANGER;
      case WARNING -> WARNING;
      case ADVICE -> ADVICE;
      case NOT_ASSESSED -> MUTED;
      case PASS -> PASS;
    };
  }

  /**
   * A grade's shape, about 14 units across: triangle for danger, diamond for warning, disc for
   * advice, dashed square with "?" for not assessed, tick for no problem (null or PASS).
   */
  static void grade(StringBuilder svg, Verdict grade, double cx, double cy) {
    String colour = colour(grade);
    String kind = grade == null ? "none" : grade.name();
    svg.append("<g class=\"sld-grade-mark grade-").append(kind).append("\">");
    if (grade == null || grade == Verdict.PASS) {
      svg.append("<path d=\"M")
          .append(n(cx - 6))
          .append(' ')
          .append(n(cy))
          .append(" L")
          .append(n(cx - 2))
          .append(' ')
          .append(n(cy + 5))
          .append(" L")
          .append(n(cx + 7))
          .append(' ')
          .append(n(cy - 6))
          .append("\" fill=\"none\" stroke=\"")
          .append(colour)
          .append("\" stroke-width=\"2.4\"/>");
    } else {
      switch (grade) {
        case DANGER ->
            svg.append("<polygon points=\"")
                .append(n(cx))
                .append(',')
                .append(n(cy - 8))
                .append(' ')
                .append(n(cx + 8))
                .append(',')
                .append(n(cy + 6))
                .append(' ')
                .append(n(cx - 8))
                .append(',')
                .append(n(cy + 6))
                .append("\" fill=\"")
                .append(colour)
                .append("\"/>");
        case WARNING ->
            svg.append("<polygon points=\"")
                .append(n(cx))
                .append(',')
                .append(n(cy - 8))
                .append(' ')
                .append(n(cx + 8))
                .append(',')
                .append(n(cy))
                .append(' ')
                .append(n(cx))
                .append(',')
                .append(n(cy + 8))
                .append(' ')
                .append(n(cx - 8))
                .append(',')
                .append(n(cy))
                .append("\" fill=\"")
                .append(colour)
                .append("\"/>");
        case ADVICE ->
            svg.append("<circle cx=\"")
                .append(n(cx))
                .append("\" cy=\"")
                .append(n(cy))
                .append("\" r=\"6.5\" fill=\"")
                .append(colour)
                .append("\"/>");
        default -> {
          svg.append("<rect x=\"")
              .append(n(cx - 7))
              .append("\" y=\"")
              .append(n(cy - 7))
              .append("\" width=\"14\" height=\"14\" fill=\"none\" stroke=\"")
              .append(colour)
              .append("\" stroke-width=\"1.5\" stroke-dasharray=\"3 2\"/>");
          svg.append("<text x=\"")
              .append(n(cx))
              .append("\" y=\"")
              .append(n(cy + 4))
              .append("\" text-anchor=\"middle\" font-size=\"11\" font-weight=\"bold\" fill=\"")
              .append(colour)
              .append("\">?</text>");
        }
      }
    }
    svg.append("</g>");
  }
}
