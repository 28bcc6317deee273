package com.wayledger.diagram;

import static com.wayledger.diagram.SvgText.clip;
import static com.wayledger.diagram.SvgText.escape;
import static com.wayledger.diagram.SvgText.figure;
import static com.wayledger.diagram.SvgText.n;

import com.wayledger.diagram.DiagramLayout.Box;
import com.wayledger.diagram.DiagramLayout.Placement;
import com.wayledger.diagram.DiagramSymbols.Symbol;
import com.wayledger.diagram.SiteDiagram.BoardBox;
import com.wayledger.diagram.SiteDiagram.LineBar;
import com.wayledger.diagram.SiteDiagram.Supply;
import com.wayledger.diagram.SiteDiagram.WayLine;
import com.wayledger.engine.protection.result.Verdict;
import java.util.Locale;
import java.util.Map;

/**
 * Draws a {@link SiteDiagram} as one SVG document. Every colour and size is a presentation
 * attribute, so the drawing looks the same inline on a page (where CSS classes may refine it),
 * downloaded as a file and rendered to PNG; no style element, no script. Board boxes carry {@code
 * class="sld-board"} and {@code data-board-id}; each submain is one {@code class="sld-submain"}
 * group with {@code data-from} and {@code data-to}.
 */
public final class DiagramSvg {

  static final double LEGEND_ITEM_WIDTH = 210;
  static final double MIN_WIDTH = 2 * DiagramLayout.MARGIN + 5 * LEGEND_ITEM_WIDTH;
  static final double CAUTION_HEIGHT = 44;

  private static final double BAR_WIDTH = 110;
  private static final String[] LINE_COLOURS = {"#6b3e1f", "#111111", "#6f6f6f"};

  private final Words words;
  private final String base;
  private final String caution;

  /**
   * @param words the diagram's text
   * @param base the application's context path, prefixed to every link ("" at the root)
   * @param caution the caution drawn at the foot of the diagram
   */
  public DiagramSvg(Words words, String base, String caution) {
    this.words = words;
    this.base = base == null ? "" : base;
    this.caution = caution;
  }

  /** The diagram as an SVG element, ready to place in a page or to save as a file. */
  public String draw(SiteDiagram diagram) {
    Placement placement = DiagramLayout.arrange(diagram);
    double width = Math.max(MIN_WIDTH, placement.width());
    double height = placement.height() + CAUTION_HEIGHT;
    StringBuilder svg = new StringBuilder(4096 + diagram.boards().size() * 3000);
    svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\"")
        .append(" xmlns:xlink=\"http://www.w3.org/1999/xlink\" class=\"sld\" role=\"img\"")
        .append(" aria-labelledby=\"sld-title\" viewBox=\"0 0 ")
        .append(n(width))
        .append(' ')
        .append(n(height))
        .append("\" width=\"")
        .append(n(width))
        .append("\" height=\"")
        .append(n(height))
        .append("\" font-family=\"DejaVu Sans, Arial, sans-serif\" font-size=\"12\" fill=\"")
        .append(DiagramSymbols.INK)
        .append("\">");
    svg.append("<title id=\"sld-title\">")
        .append(escape(words.get("diagram.title", diagram.siteName())))
        .append("</title>");
    svg.append("<rect class=\"sld-paper\" x=\"0\" y=\"0\" width=\"")
        .append(n(width))
        .append("\" height=\"")
        .append(n(height))
        .append("\" fill=\"#ffffff\"/>");
    text(svg, DiagramLayout.MARGIN, 30, 18, true, words.get("diagram.title", diagram.siteName()));
    legend(svg);
    supply(svg, diagram.supply(), placement.supply());
    Map<Long, Box> boxes = placement.boards();
    for (BoardBox board : diagram.boards()) {
      Box box = boxes.get(board.id());
      if (board.parentId() == null || !boxes.containsKey(board.parentId())) {
        originFeed(svg, board, placement.supply(), box);
      } else {
        submain(svg, board, boxes.get(board.parentId()), box);
      }
    }
    for (BoardBox board : diagram.boards()) {
      board(svg, diagram, board, boxes.get(board.id()));
    }
    svg.append("<g class=\"sld-caution\">");
    text(svg, DiagramLayout.MARGIN, height - 30, 11, true, words.get("diagram.caution"));
    int perLine = (int) ((width - 2 * DiagramLayout.MARGIN - 70) / 6.2);
    String rest = caution == null ? "" : caution;
    double y = height - 30;
    while (!rest.isEmpty()) {
      int cut = rest.length() <= perLine ? rest.length() : rest.lastIndexOf(' ', perLine);
      cut = cut <= 0 ? Math.min(perLine, rest.length()) : cut;
      text(svg, DiagramLayout.MARGIN + 70, y, 11, false, rest.substring(0, cut).strip());
      rest = rest.substring(cut).strip();
      y += 14;
    }
    svg.append("</g></svg>");
    return svg.toString();
  }

  private void legend(StringBuilder svg) {
    svg.append("<g class=\"sld-legend\">");
    double x0 = DiagramLayout.MARGIN;
    String[][] devices = {
      {"BREAKER", "diagram.legend.breaker"},
      {"BREAKER_WITH_RESIDUAL", "diagram.legend.rcbo"},
      {"ISOLATOR_WITH_RESIDUAL", "diagram.legend.rcd"},
      {"FUSE", "diagram.legend.fuse"},
      {"ISOLATOR", "diagram.legend.isolator"},
    };
    for (int i = 0; i < devices.length; i++) {
      double x = x0 + i * LEGEND_ITEM_WIDTH;
      DiagramSymbols.line(svg, x, 62, x + 36, 62);
      DiagramSymbols.device(svg, Symbol.valueOf(devices[i][0]), x + 18, 62);
      text(svg, x + 42, 66, 11, false, words.get(devices[i][1]));
    }
    DiagramSymbols.device(svg, Symbol.NONE, x0 + 18, 94);
    text(svg, x0 + 42, 98, 11, false, words.get("diagram.legend.none"));
    double barX = x0 + LEGEND_ITEM_WIDTH;
    svg.append("<rect x=\"")
        .append(n(barX))
        .append("\" y=\"89\" width=\"36\" height=\"10\" fill=\"none\" stroke=\"")
        .append(DiagramSymbols.MUTED)
        .append("\"/><rect x=\"")
        .append(n(barX))
        .append("\" y=\"89\" width=\"24\" height=\"10\" fill=\"")
        .append(LINE_COLOURS[0])
        .append("\"/>");
    text(svg, barX + 42, 98, 11, false, words.get("diagram.legend.bar"));
    double lineX = x0 + 3 * LEGEND_ITEM_WIDTH;
    svg.append("<line x1=\"")
        .append(n(lineX))
        .append("\" y1=\"94\" x2=\"")
        .append(n(lineX + 36))
        .append("\" y2=\"94\" stroke=\"")
        .append(DiagramSymbols.INK)
        .append("\" stroke-width=\"2\"/>");
    text(svg, lineX + 42, 98, 11, false, words.get("diagram.legend.submain"));
    Verdict[] grades = {
      Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE, Verdict.NOT_ASSESSED, null
    };
    for (int i = 0; i < grades.length; i++) {
      double x = x0 + i * LEGEND_ITEM_WIDTH;
      DiagramSymbols.grade(svg, grades[i], x + 18, 124);
      text(svg, x + 42, 128, 11, false, gradeWord(grades[i]));
    }
    svg.append("</g>");
  }

  private void supply(StringBuilder svg, Supply supply, Box box) {
    svg.append("<g class=\"sld-supply\">");
    rect(svg, box, DiagramSymbols.INK, 2);
    text(svg, box.x() + 12, box.y() + 22, 15, true, words.get("diagram.supply"));
    text(
        svg,
        box.x() + 12,
        box.y() + 44,
        12,
        false,
        words.get(
            "diagram.supply.system",
            supply.earthing(),
            figure(supply.nominalVoltageVolts(), 0),
            supply.phases()));
    text(
        svg,
        box.x() + 12,
        box.y() + 64,
        12,
        false,
        supply.externalLoopImpedanceOhms() == null
            ? words.get("diagram.supply.ze.none")
            : words.get("diagram.supply.ze", figure(supply.externalLoopImpedanceOhms(), 2)));
    text(
        svg,
        box.x() + 12,
        box.y() + 84,
        12,
        false,
        supply.faultCurrentKiloAmps() == null
            ? words.get("diagram.supply.pfc.none")
            : words.get("diagram.supply.pfc", figure(supply.faultCurrentKiloAmps(), 1)));
    text(
        svg,
        box.x() + 12,
        box.y() + 104,
        12,
        false,
        supply.fuseRatingAmps() == null
            ? words.get("diagram.supply.fuse.none")
            : words.get("diagram.supply.fuse", figure(supply.fuseRatingAmps(), 0)));
    double y = box.feedY();
    line(svg, box.right(), y, supplyTrunkX(box), y, 2);
    DiagramSymbols.device(
        svg,
        supply.fuseRatingAmps() == null ? Symbol.NONE : Symbol.FUSE,
        box.right() + DiagramLayout.TRUNK_OFFSET,
        y);
    svg.append("</g>");
  }

  private static double supplyTrunkX(Box supply) {
    return supply.right() + 2 * DiagramLayout.TRUNK_OFFSET;
  }

  private void originFeed(StringBuilder svg, BoardBox board, Box supply, Box box) {
    double trunkX = supplyTrunkX(supply);
    svg.append("<g class=\"sld-origin-feed\" data-to=\"").append(board.id()).append("\">");
    path(svg, trunkX, supply.feedY(), trunkX, box.feedY(), box.x(), 2);
    if (!board.submainCable().isEmpty()) {
      text(svg, trunkX + 12, box.feedY() + 16, 11, false, board.submainCable());
    }
    incomer(svg, board, box);
    svg.append("</g>");
  }

  private void submain(StringBuilder svg, BoardBox board, Box parent, Box box) {
    double trunkX = parent.trunkX();
    svg.append("<g class=\"sld-submain\" data-from=\"")
        .append(board.parentId())
        .append("\" data-to=\"")
        .append(board.id())
        .append("\">");
    path(svg, parent.right(), parent.feedY(), trunkX, box.feedY(), box.x(), 2);
    double y = box.feedY();
    DiagramSymbols.device(svg, Symbol.of(board.feedDevice().kind()), trunkX + 34, y);
    String label =
        board.feedDevice().isRecorded()
            ? board.feedDevice().label()
            : words.get("diagram.feed.none");
    String settings = "";
    int open = label.indexOf(" (");
    if (open > 0) {
      settings = label.substring(open + 1);
      label = label.substring(0, open);
    }
    if (board.feedCircuitId() != null) {
      link(svg, "/circuits/" + board.feedCircuitId(), "sld-feed-link");
    }
    text(svg, trunkX + 58, y - (settings.isEmpty() ? 8 : 22), 11, true, clip(label, 26));
    if (!settings.isEmpty()) {
      text(svg, trunkX + 58, y - 8, 10, false, clip(settings, 32));
    }
    if (board.feedCircuitId() != null) {
      svg.append("</a>");
    }
    text(
        svg,
        trunkX + 12,
        y + 18,
        11,
        false,
        board.submainCable().isEmpty()
            ? words.get("diagram.cable.none")
            : clip(board.submainCable(), 30));
    text(
        svg,
        trunkX + 12,
        y + 32,
        11,
        false,
        board.voltageDropPercent() == null
            ? words.get("diagram.vd.none")
            : words.get("diagram.vd", figure(board.voltageDropPercent(), 1)));
    incomer(svg, board, box);
    svg.append("</g>");
  }

  private void incomer(StringBuilder svg, BoardBox board, Box box) {
    DiagramSymbols.device(svg, Symbol.of(board.incomer().kind()), box.x() - 22, box.feedY());
  }

  private void board(StringBuilder svg, SiteDiagram diagram, BoardBox board, Box box) {
    String grade = board.worst() == null ? "none" : board.worst().name();
    svg.append("<g class=\"sld-board grade-")
        .append(grade)
        .append("\" id=\"sld-board-")
        .append(board.id())
        .append("\" data-board-id=\"")
        .append(board.id())
        .append("\" data-x=\"")
        .append(n(box.x()))
        .append("\" data-y=\"")
        .append(n(box.y()))
        .append("\" data-width=\"")
        .append(n(box.width()))
        .append("\" data-height=\"")
        .append(n(box.height()))
        .append("\">");
    rect(svg, box, DiagramSymbols.INK, 1.5);
    svg.append("<rect class=\"sld-grade-stripe\" x=\"")
        .append(n(box.x()))
        .append("\" y=\"")
        .append(n(box.y()))
        .append("\" width=\"6\" height=\"")
        .append(n(box.height()))
        .append("\" fill=\"")
        .append(DiagramSymbols.colour(board.worst()))
        .append("\"/>");
    // the busbar: a heavy bar down the outgoing side
    svg.append("<line class=\"sld-busbar\" x1=\"")
        .append(n(box.right()))
        .append("\" y1=\"")
        .append(n(box.y() + 12))
        .append("\" x2=\"")
        .append(n(box.right()))
        .append("\" y2=\"")
        .append(n(box.y() + 60))
        .append("\" stroke=\"")
        .append(DiagramSymbols.INK)
        .append("\" stroke-width=\"5\"/>");
    double x = box.x() + 16;
    double y = box.y();
    link(svg, "/boards/" + board.id(), "sld-board-link");
    text(svg, x, y + 24, 16, true, clip(board.reference(), 26));
    svg.append("</a>");
    text(svg, x, y + 42, 11, false, clip(board.location(), 44));
    text(
        svg,
        x,
        y + 62,
        12,
        false,
        board.incomer().isRecorded()
            ? words.get("diagram.incomer", clip(board.incomer().label(), 34))
            : words.get("diagram.incomer.none"));
    String busbar =
        board.busbarRatingAmps() == null
            ? words.get("diagram.busbar.none")
            : words.get("diagram.busbar", figure(board.busbarRatingAmps(), 0));
    text(
        svg,
        x,
        y + 80,
        12,
        false,
        busbar + " · " + words.get("diagram.demand", figure(board.demandKilowatts(), 1)));
    double barY = y + 98;
    for (int i = 0; i < board.lines().size(); i++) {
      bar(svg, board.lines().get(i), i, x, barY + i * 17);
    }
    double gradeY = y + 156;
    link(svg, "/boards/" + board.id() + "#findings", "sld-grade-link");
    DiagramSymbols.grade(svg, board.worst(), x + 7, gradeY - 4);
    String gradeText =
        board.worst() == null
            ? gradeWord(null)
            : words.get("diagram.grade", gradeWord(board.worst()), board.problemCount());
    text(svg, x + 22, gradeY, 12, true, gradeText);
    svg.append("</a>");
    double waysY = y + 180;
    text(svg, x, waysY, 12, false, words.get("diagram.circuits", board.circuitCount()));
    boolean expanded = !board.ways().isEmpty();
    String toggle =
        "/sites/"
            + diagram.siteId()
            + "/diagram"
            + (expanded ? "" : "?expand=" + board.id())
            + "#sld-board-"
            + board.id();
    link(svg, toggle, "sld-expand-link");
    text(
        svg,
        x + 150,
        waysY,
        12,
        true,
        words.get(expanded ? "diagram.ways.hide" : "diagram.ways.show"));
    svg.append("</a>");
    if (expanded) {
      ways(svg, board, box);
    }
    svg.append("</g>");
  }

  private void bar(StringBuilder svg, LineBar line, int index, double x, double y) {
    svg.append("<g class=\"sld-line-bar line-").append(escape(line.line())).append("\">");
    text(svg, x, y, 11, true, line.line());
    double barX = x + 24;
    Double loading = line.loadingPercent();
    if (loading != null) {
      double filled = BAR_WIDTH * Math.min(100.0, Math.max(0.0, loading)) / 100.0;
      svg.append("<rect x=\"")
          .append(n(barX))
          .append("\" y=\"")
          .append(n(y - 9))
          .append("\" width=\"")
          .append(n(filled))
          .append("\" height=\"10\" fill=\"")
          .append(LINE_COLOURS[index % LINE_COLOURS.length])
          .append("\"/>");
    }
    boolean over = loading != null && loading > 100.0;
    svg.append("<rect x=\"")
        .append(n(barX))
        .append("\" y=\"")
        .append(n(y - 9))
        .append("\" width=\"")
        .append(n(BAR_WIDTH))
        .append("\" height=\"10\" fill=\"none\" stroke=\"")
        .append(over ? DiagramSymbols.DANGER : DiagramSymbols.MUTED)
        .append("\" stroke-width=\"")
        .append(over ? "2" : "1")
        .append("\"/>");
    String figures =
        loading == null
            ? words.get("diagram.line.noRating", figure(line.currentAmps(), 1))
            : words.get(
                over ? "diagram.line.over" : "diagram.line.load",
                figure(line.currentAmps(), 1),
                figure(loading, 0));
    text(svg, barX + BAR_WIDTH + 6, y, 11, over, figures);
    svg.append("</g>");
  }

  private void ways(StringBuilder svg, BoardBox board, Box box) {
    double x = box.x() + 16;
    double y = box.y() + DiagramLayout.BOARD_HEIGHT + 4;
    svg.append("<g class=\"sld-ways\">");
    line(svg, box.x() + 10, y - 8, box.right() - 10, y - 8, 1);
    text(svg, x, y + 6, 10, true, words.get("diagram.ways.header"));
    for (int i = 0; i < board.ways().size(); i++) {
      WayLine way = board.ways().get(i);
      double rowY = y + DiagramLayout.WAYS_HEADER + 6 + i * DiagramLayout.WAY_HEIGHT;
      svg.append("<g class=\"sld-way\" data-circuit-id=\"").append(way.circuitId()).append("\">");
      link(svg, "/circuits/" + way.circuitId(), "sld-way-link");
      text(svg, x, rowY, 11, true, clip(way.position(), 8));
      text(svg, x + 52, rowY, 11, false, clip(way.description(), 20));
      svg.append("</a>");
      text(svg, x + 178, rowY, 10, false, clip(way.device().label(), 12));
      if (way.worst() != null) {
        svg.append("<g transform=\"translate(")
            .append(n(box.right() - 14))
            .append(' ')
            .append(n(rowY - 4))
            .append(") scale(0.7)\">");
        DiagramSymbols.grade(svg, way.worst(), 0, 0);
        svg.append("</g>");
      }
      svg.append("</g>");
    }
    svg.append("</g>");
  }

  private String gradeWord(Verdict grade) {
    return words.get(
        "diagram.grade." + (grade == null ? "none" : grade.name().toLowerCase(Locale.ROOT)));
  }

  private void link(StringBuilder svg, String path, String cssClass) {
    String href = escape(base + path);
    svg.append("<a class=\"")
        .append(cssClass)
        .append("\" href=\"")
        .append(href)
        .append("\" xlink:href=\"")
        .append(href)
        .append("\">");
  }

  private static void rect(StringBuilder svg, Box box, String stroke, double strokeWidth) {
    svg.append("<rect class=\"sld-box\" x=\"")
        .append(n(box.x()))
        .append("\" y=\"")
        .append(n(box.y()))
        .append("\" width=\"")
        .append(n(box.width()))
        .append("\" height=\"")
        .append(n(box.height()))
        .append("\" rx=\"4\" fill=\"#ffffff\" stroke=\"")
        .append(stroke)
        .append("\" stroke-width=\"")
        .append(n(strokeWidth))
        .append("\"/>");
  }

  private static void line(
      StringBuilder svg, double x1, double y1, double x2, double y2, double width) {
    svg.append("<line x1=\"")
        .append(n(x1))
        .append("\" y1=\"")
        .append(n(y1))
        .append("\" x2=\"")
        .append(n(x2))
        .append("\" y2=\"")
        .append(n(y2))
        .append("\" stroke=\"")
        .append(DiagramSymbols.INK)
        .append("\" stroke-width=\"")
        .append(n(width))
        .append("\"/>");
  }

  /** From (x0, y0) right to the trunk, along the trunk to the target row, then right to x1. */
  private static void path(
      StringBuilder svg, double x0, double y0, double trunkX, double y1, double x1, double width) {
    svg.append("<path class=\"sld-wire\" d=\"M")
        .append(n(x0))
        .append(' ')
        .append(n(y0))
        .append(" H")
        .append(n(trunkX))
        .append(" V")
        .append(n(y1))
        .append(" H")
        .append(n(x1))
        .append("\" fill=\"none\" stroke=\"")
        .append(DiagramSymbols.INK)
        .append("\" stroke-width=\"")
        .append(n(width))
        .append("\"/>");
  }

  private static void text(
      StringBuilder svg, double x, double y, int size, boolean bold, String content) {
    svg.append("<text x=\"")
        .append(n(x))
        .append("\" y=\"")
        .append(n(y))
        .append("\" font-size=\"")
        .append(size)
        .append('"');
    if (bold) {
      svg.append(" font-weight=\"bold\"");
    }
    svg.append('>').append(escape(content)).append("</text>");
  }
}
