package com.wayledger.diagram;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.diagram.SiteDiagram.BoardBox;
import com.wayledger.diagram.SiteDiagram.Device;
import com.wayledger.diagram.SiteDiagram.LineBar;
import com.wayledger.diagram.SiteDiagram.Supply;
import com.wayledger.diagram.SiteDiagram.WayLine;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.protection.result.Verdict;
import java.io.ByteArrayInputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The drawing of generated sites, read back with an XML parser: one board node per board, one
 * submain edge per board fed from another board, no two board boxes overlapping.
 */
class DiagramSvgTests {

  @ParameterizedTest(name = "seed {0}")
  @ValueSource(longs = {1, 2, 3})
  void hundredBoardSiteHasOneNodePerBoardOneEdgePerSubmainAndNoOverlap(long seed) {
    SiteDiagram diagram = DiagramFixtures.generated(100, seed, null);
    SvgDrawing drawing = SvgDrawing.parse(DiagramFixtures.svg(diagram));

    assertThat(drawing.boardIds())
        .as("board nodes of the 100-board site (seed %d)", seed)
        .containsExactlyInAnyOrderElementsOf(diagram.boards().stream().map(BoardBox::id).toList());
    assertThat(drawing.submains())
        .as("one submain edge per board fed from another board (seed %d)", seed)
        .containsExactlyInAnyOrderElementsOf(DiagramFixtures.expectedSubmains(diagram));
    assertThat(drawing.overlappingBoxes()).as("overlapping board boxes").isEmpty();
    keepForAPerson("generated-100-boards-seed-" + seed + ".svg", DiagramFixtures.svg(diagram));
  }

  /** Keeps a drawing under target/diagrams for a person to look at; not an assertion. */
  private static void keepForAPerson(String name, String svg) {
    try {
      java.nio.file.Path dir =
          java.nio.file.Files.createDirectories(java.nio.file.Path.of("target", "diagrams"));
      java.nio.file.Files.writeString(dir.resolve(name), svg);
    } catch (java.io.IOException ignored) {
      // a missing copy must not fail the test
    }
  }

  @Test
  void expandedBoardListsEachWayAndPushesItsNeighboursDown() {
    SiteDiagram collapsed = DiagramFixtures.generated(30, 7, null);
    long expandedId = collapsed.boards().get(3).id();
    SiteDiagram expanded = DiagramFixtures.generated(30, 7, expandedId);
    SvgDrawing drawing = SvgDrawing.parse(DiagramFixtures.svg(expanded));

    int ways = expanded.boards().get(3).ways().size();
    assertThat(ways).as("the fixture gives the expanded board ways").isPositive();
    assertThat(drawing.circuitLinks()).as("circuit links of the expanded board").hasSize(ways);
    assertThat(drawing.overlappingBoxes()).as("overlapping boxes once expanded").isEmpty();
    assertThat(SvgDrawing.parse(DiagramFixtures.svg(collapsed)).circuitLinks())
        .as("no way listed while collapsed")
        .isEmpty();
  }

  @Test
  void worstGradeIsShownByWordAndShapeNotOnlyColour() {
    SiteDiagram diagram = DiagramFixtures.generated(5, 11, null);
    String svg = DiagramFixtures.svg(diagram);
    SvgDrawing drawing = SvgDrawing.parse(svg);
    BoardBox danger =
        diagram.boards().stream()
            .filter(board -> board.worst() == Verdict.DANGER)
            .findFirst()
            .orElseThrow();
    String text = drawing.boardText(danger.id());
    assertThat(text).as("the board's grade word").contains("danger: " + danger.problemCount());
    assertThat(drawing.gradeShape(danger.id())).as("the danger shape").isEqualTo("polygon");
  }

  @Test
  void namesAndLabelsAreEscaped() {
    SiteDiagram diagram = DiagramFixtures.generated(2, 5, null);
    BoardBox first = diagram.boards().get(0);
    BoardBox nasty =
        new BoardBox(
            first.id(),
            "<DB&1>",
            "\"Plant\" room",
            null,
            0,
            first.incomer(),
            first.busbarRatingAmps(),
            first.demandKilowatts(),
            first.lines(),
            first.worst(),
            first.problemCount(),
            first.circuitCount(),
            first.feedDevice(),
            null,
            "",
            null,
            "no submain",
            List.of());
    SiteDiagram changed =
        new SiteDiagram(
            diagram.siteId(),
            "Site <&>",
            diagram.supply(),
            List.of(nasty, diagram.boards().get(1)),
            null);
    SvgDrawing drawing = SvgDrawing.parse(DiagramFixtures.svg(changed));
    assertThat(drawing.boardText(first.id())).contains("<DB&1>").contains("\"Plant\" room");
  }

  @Test
  void pictureIsAPngOfTheDrawingsProportions() throws Exception {
    SiteDiagram diagram = DiagramFixtures.generated(4, 3, null);
    String svg = DiagramFixtures.svg(diagram);
    byte[] png = DiagramPicture.png(svg);
    var image = ImageIO.read(new ByteArrayInputStream(png));
    assertThat(image).as("a PNG ImageIO can read").isNotNull();
    SvgDrawing drawing = SvgDrawing.parse(svg);
    double ratio = drawing.width() / drawing.height();
    assertThat((double) image.getWidth() / image.getHeight())
        .as("picture keeps the drawing's proportions")
        .isCloseTo(ratio, org.assertj.core.data.Offset.offset(0.02));
    assertThat((double) image.getWidth() * image.getHeight())
        .as("picture within the pixel budget")
        .isLessThanOrEqualTo(DiagramPicture.MAX_PIXELS);
  }

  @Test
  void siteWithoutBoardsStillDrawsTheSupplyAndLegend() {
    SiteDiagram empty =
        new SiteDiagram(9, "Empty", new Supply("TT", 230, 1, null, null, null), List.of(), null);
    SvgDrawing drawing = SvgDrawing.parse(DiagramFixtures.svg(empty));
    assertThat(drawing.boardIds()).isEmpty();
    assertThat(drawing.allText()).contains("Ze not recorded").contains("Supply fuse not recorded");
  }

  /** Generated sites for diagram tests: invented figures only. */
  static final class DiagramFixtures {

    static String svg(SiteDiagram diagram) {
      var messages = new org.springframework.context.support.ResourceBundleMessageSource();
      messages.setBasenames("messages");
      messages.setDefaultEncoding("UTF-8");
      messages.setFallbackToSystemLocale(false);
      Words words = (key, args) -> messages.getMessage(key, args, java.util.Locale.UK);
      return new DiagramSvg(words, "", "Caution text for tests.").draw(diagram);
    }

    static List<String> expectedSubmains(SiteDiagram diagram) {
      return diagram.boards().stream()
          .filter(board -> board.parentId() != null)
          .map(board -> board.parentId() + "->" + board.id())
          .toList();
    }

    /**
     * A random tree of {@code count} boards: one to three boards at the origin, each further board
     * fed from a random earlier board, so depth and fan-out vary with the seed.
     */
    static SiteDiagram generated(int count, long seed, Long expandedId) {
      Random random = new Random(seed);
      List<Long> parents = new ArrayList<>();
      List<Integer> depths = new ArrayList<>();
      int roots = 1 + random.nextInt(3);
      Verdict[] grades = {Verdict.DANGER, Verdict.WARNING, Verdict.ADVICE, Verdict.NOT_ASSESSED};
      for (int i = 0; i < count; i++) {
        if (i < roots) {
          parents.add(null);
          depths.add(0);
        } else {
          int parent = random.nextInt(i);
          parents.add(1000L + parent);
          depths.add(depths.get(parent) + 1);
        }
      }
      List<BoardBox> unordered = new ArrayList<>();
      for (int i = 0; i < count; i++) {
        long id = 1000L + i;
        List<WayLine> ways = new ArrayList<>();
        if (expandedId != null && expandedId == id) {
          for (int w = 1; w <= 6 + random.nextInt(10); w++) {
            ways.add(
                new WayLine(
                    5000L + w,
                    w + " L" + (1 + w % 3),
                    "Sockets " + w,
                    new Device(DeviceKind.RCBO, "RCBO B16 30 mA"),
                    8.0 + w,
                    w % 4 == 0 ? Verdict.WARNING : null));
          }
        }
        Verdict worst = i == 0 ? Verdict.DANGER : random.nextInt(4) == 0 ? null : grades[i % 4];
        unordered.add(
            new BoardBox(
                id,
                "DB" + i,
                "Floor " + (i % 7) + ", riser " + (i % 3),
                parents.get(i),
                depths.get(i),
                new Device(DeviceKind.values()[i % DeviceKind.values().length], "MCCB 125 A"),
                i % 5 == 0 ? null : 125.0,
                10 + random.nextInt(90),
                List.of(
                    new LineBar("L1", 40 + random.nextInt(100), 30.0 + random.nextInt(90)),
                    new LineBar("L2", 40, null),
                    new LineBar("L3", 12.5, 10.0)),
                worst,
                worst == null ? 0 : 1 + random.nextInt(5),
                12 + random.nextInt(60),
                parents.get(i) == null
                    ? Device.NONE
                    : new Device(DeviceKind.MCCB, "MCCB 160 A (Ir 125 A, Ii 1250 A)"),
                parents.get(i) == null ? null : 7000L + i,
                i % 4 == 0 ? "" : "25/16 mm² " + (10 + i) + " m",
                i % 6 == 0 ? null : 0.3 * (1 + depths.get(i)),
                i % 6 == 0 ? "missing submain length" : null,
                ways));
      }
      // tree order: each parent before its children
      List<BoardBox> ordered = new ArrayList<>();
      for (BoardBox board : unordered) {
        if (board.parentId() == null) {
          walk(board, unordered, ordered);
        }
      }
      return new SiteDiagram(
          77,
          "Generated site " + seed,
          new Supply("TN-C-S", 230, 3, 0.35, 16.0, 400.0),
          ordered,
          expandedId);
    }

    private static void walk(BoardBox board, List<BoardBox> all, List<BoardBox> ordered) {
      ordered.add(board);
      for (BoardBox child : all) {
        if (child.parentId() != null && child.parentId() == board.id()) {
          walk(child, all, ordered);
        }
      }
    }
  }
}
