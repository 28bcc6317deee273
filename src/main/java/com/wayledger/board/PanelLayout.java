package com.wayledger.board;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A panelboard's schedule as the trade draws it: one row per pair of spaces, odd on the left, even
 * on the right, the row's line between them; a multi-pole breaker is drawn once, on its top space,
 * spanning the rows of the spaces it takes; a space nothing takes is free.
 *
 * @param rows the rows from the top
 * @param spaceCount the panel's space count
 */
public record PanelLayout(List<Row> rows, int spaceCount) {

  /**
   * One row of the panel.
   *
   * @param number row number from 1 at the top
   * @param line the line its two spaces are fed from
   * @param lineName the line's name for people (A, B, C)
   * @param left the odd space
   * @param right the even space
   */
  public record Row(int number, Phase line, String lineName, Cell left, Cell right) {}

  /**
   * One space.
   *
   * @param space its number
   * @param line its line
   * @param circuit the breaker that takes it; null when free
   * @param top whether this is the breaker's top space (where it is drawn)
   * @param span rows the breaker's cell spans (its poles), 1 for a free space
   */
  public record Cell(int space, Phase line, Breaker circuit, boolean top, int span) {

    public boolean isFree() {
      return circuit == null;
    }

    /** Taken by a breaker drawn on a space above (its cell spans this one). */
    public boolean isCovered() {
      return circuit != null && !top;
    }

    /** Element id, stable across reloads: "space-7". */
    public String elementId() {
      return "space-" + space;
    }
  }

  /**
   * The circuit a breaker serves, as its cell prints it: plain values read from the stored circuit
   * (the layout is kept with the board page's view, after the transaction that read them).
   *
   * @param id the circuit's id (links)
   * @param wayNumber its first space
   * @param description its description
   * @param status its status
   * @param spacesLabel the spaces it takes ("1/3")
   * @param linesLabel the lines it takes ("A–B")
   * @param poles its poles
   * @param deviceLabel its device's label; null when none is recorded
   * @param cableLabel its conductor in the site's units; null when none is recorded
   * @param material its conductor material; null when not recorded
   * @param lockedForBalancing whether balancing leaves it where it is
   */
  public record Breaker(
      long id,
      int wayNumber,
      String description,
      WayStatus status,
      String spacesLabel,
      String linesLabel,
      int poles,
      String deviceLabel,
      String cableLabel,
      com.wayledger.engine.ConductorMaterial material,
      boolean lockedForBalancing) {

    static Breaker of(Circuit circuit, com.wayledger.engine.rules.CableUnits units) {
      CableDetails cable = circuit.getCable();
      boolean recorded = cable != null && cable.isRecorded();
      return new Breaker(
          circuit.getId(),
          circuit.getWayNumber(),
          circuit.getDescription(),
          circuit.getStatus(),
          circuit.spacesLabel(),
          circuit.linesLabel(),
          circuit.getPosition().poles(),
          circuit.getDevice() == null ? null : circuit.getDevice().label(),
          recorded ? cable.label(units) : null,
          cable == null ? null : cable.getMaterial(),
          circuit.isLockedForBalancing());
    }
  }

  /** The board's layout; null when the board is not a panelboard. */
  static PanelLayout of(Board board, List<Circuit> circuits) {
    PanelSpaces panel = board.panelSpaces();
    if (panel == null) {
      return null;
    }
    Map<Integer, Breaker> holder = new HashMap<>();
    Map<Integer, Integer> spanOf = new HashMap<>();
    for (Circuit stored : circuits) {
      Breaker circuit = Breaker.of(stored, board.cableUnits());
      int first = circuit.wayNumber();
      int poles = circuit.poles();
      if (panel.fitOf(first, poles) != PanelSpaces.Fit.FITS) {
        // stored before spaces were checked: drawn on its first space alone
        if (first >= 1 && first <= panel.spaceCount()) {
          holder.putIfAbsent(first, circuit);
          spanOf.put(first, 1);
        }
        continue;
      }
      List<Integer> spaces = panel.spacesOf(first, poles);
      spaces.forEach(space -> holder.putIfAbsent(space, circuit));
      spanOf.put(first, poles);
    }
    List<Row> rows = new ArrayList<>();
    for (int row = 1; row <= panel.rowCount(); row++) {
      int odd = 2 * row - 1;
      Phase line = panel.lineOf(odd);
      rows.add(
          new Row(
              row,
              line,
              board.lineName(line),
              cell(panel, odd, holder, spanOf),
              cell(panel, odd + 1, holder, spanOf)));
    }
    return new PanelLayout(List.copyOf(rows), panel.spaceCount());
  }

  private static Cell cell(
      PanelSpaces panel, int space, Map<Integer, Breaker> holder, Map<Integer, Integer> spanOf) {
    Breaker circuit = holder.get(space);
    boolean top = circuit != null && circuit.wayNumber() == space;
    int span = top ? spanOf.getOrDefault(space, 1) : 1;
    return new Cell(space, panel.lineOf(space), circuit, top, span);
  }
}
