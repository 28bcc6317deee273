package com.wayledger.diagram;

import com.wayledger.diagram.SiteDiagram.BoardBox;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Places the supply and the boards of a site: one column per depth in the board tree (the supply
 * left, boards fed from the origin next, their sub-boards to the right), each leaf board on a row
 * of its own and each parent centred on the rows of its children. A subtree keeps to its own band
 * of rows, so no two board boxes overlap, however many boards the site has. Sizes are SVG user
 * units (pixels at 100 %).
 */
final class DiagramLayout {

  static final double MARGIN = 24;
  static final double HEADER_HEIGHT = 150;
  static final double SUPPLY_WIDTH = 230;
  static final double SUPPLY_HEIGHT = 150;
  static final double BOARD_WIDTH = 300;
  static final double BOARD_HEIGHT = 196;
  static final double WAY_HEIGHT = 18;
  static final double WAYS_HEADER = 14;
  static final double COLUMN_GAP = 240;
  static final double ROW_GAP = 28;

  /** How far below a box's top its feed line runs. */
  static final double FEED_OFFSET = 34;

  /** How far right of a box its outgoing trunk runs. */
  static final double TRUNK_OFFSET = 26;

  private DiagramLayout() {}

  /** A placed rectangle, in SVG user units from the top left. */
  record Box(double x, double y, double width, double height) {
    double right() {
      return x + width;
    }

    double bottom() {
      return y + height;
    }

    double feedY() {
      return y + FEED_OFFSET;
    }

    double trunkX() {
      return right() + TRUNK_OFFSET;
    }

    boolean overlaps(Box other) {
      return x < other.right() && other.x < right() && y < other.bottom() && other.y < bottom();
    }
  }

  /**
   * Where everything goes.
   *
   * @param supply the supply's box
   * @param boards each board's box by board id, in tree order
   * @param width the drawing's width
   * @param height the drawing's height
   */
  record Placement(Box supply, Map<Long, Box> boards, double width, double height) {}

  static Placement arrange(SiteDiagram diagram) {
    Map<Long, List<BoardBox>> children = new LinkedHashMap<>();
    List<BoardBox> roots = new ArrayList<>();
    Map<Long, BoardBox> byId = new LinkedHashMap<>();
    diagram.boards().forEach(board -> byId.put(board.id(), board));
    for (BoardBox board : diagram.boards()) {
      if (board.parentId() == null || !byId.containsKey(board.parentId())) {
        roots.add(board);
      } else {
        children.computeIfAbsent(board.parentId(), id -> new ArrayList<>()).add(board);
      }
    }
    Map<Long, Box> boxes = new LinkedHashMap<>();
    double top = HEADER_HEIGHT;
    for (BoardBox root : roots) {
      top = place(root, 0, top, children, boxes);
    }
    double treeBottom = roots.isEmpty() ? HEADER_HEIGHT + SUPPLY_HEIGHT : top - ROW_GAP;
    double supplyY;
    if (roots.isEmpty()) {
      supplyY = HEADER_HEIGHT;
    } else {
      double firstFeed = boxes.get(roots.get(0).id()).feedY();
      double lastFeed = boxes.get(roots.get(roots.size() - 1).id()).feedY();
      supplyY = Math.max(HEADER_HEIGHT, (firstFeed + lastFeed) / 2 - FEED_OFFSET);
    }
    Box supply = new Box(MARGIN, supplyY, SUPPLY_WIDTH, SUPPLY_HEIGHT);
    Map<Long, Box> inTreeOrder = new LinkedHashMap<>();
    diagram.boards().forEach(board -> inTreeOrder.put(board.id(), boxes.get(board.id())));
    double right = supply.right();
    for (Box box : boxes.values()) {
      right = Math.max(right, box.right());
    }
    double bottom = Math.max(treeBottom, supply.bottom());
    return new Placement(supply, inTreeOrder, right + MARGIN, bottom + MARGIN);
  }

  /** Places a board and its subtree from row position {@code top}; returns the next free top. */
  private static double place(
      BoardBox board,
      int depth,
      double top,
      Map<Long, List<BoardBox>> children,
      Map<Long, Box> boxes) {
    double height = heightOf(board);
    List<BoardBox> below = children.getOrDefault(board.id(), List.of());
    double x = columnX(depth);
    if (below.isEmpty()) {
      boxes.put(board.id(), new Box(x, top, BOARD_WIDTH, height));
      return top + height + ROW_GAP;
    }
    double next = top;
    for (BoardBox child : below) {
      next = place(child, depth + 1, next, children, boxes);
    }
    double span = next - ROW_GAP - top;
    if (height >= span) {
      boxes.put(board.id(), new Box(x, top, BOARD_WIDTH, height));
      return top + height + ROW_GAP;
    }
    double firstFeed = boxes.get(below.get(0).id()).feedY();
    double lastFeed = boxes.get(below.get(below.size() - 1).id()).feedY();
    double y = (firstFeed + lastFeed) / 2 - FEED_OFFSET;
    // Stay inside the subtree's band of rows, so boxes of neighbouring subtrees never meet.
    y = Math.max(top, Math.min(y, top + span - height));
    boxes.put(board.id(), new Box(x, y, BOARD_WIDTH, height));
    return next;
  }

  static double heightOf(BoardBox board) {
    return board.ways().isEmpty()
        ? BOARD_HEIGHT
        : BOARD_HEIGHT + WAYS_HEADER + WAY_HEIGHT * board.ways().size();
  }

  static double columnX(int depth) {
    return MARGIN + SUPPLY_WIDTH + COLUMN_GAP + depth * (BOARD_WIDTH + COLUMN_GAP);
  }
}
