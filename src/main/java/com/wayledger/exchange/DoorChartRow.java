package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * One line of a door chart: a way's position, what it feeds and its device, in plain words.
 *
 * @param way the way number
 * @param line L1, L2, L3, 3P, or empty on a single-phase board
 * @param description what it feeds (or "spare" / "empty space")
 * @param device device with rating, e.g. "MCB B16"; empty for an empty space
 * @param residual residual rating text, e.g. "30 mA"; empty when none
 * @param loads the loads in short words
 */
public record DoorChartRow(
    int way, String line, String description, String device, String residual, String loads) {

  static List<DoorChartRow> of(BoardEntry board) {
    List<DoorChartRow> rows = new ArrayList<>();
    for (CircuitEntry entry : board.circuits()) {
      CircuitForm c = entry.circuit();
      String line = board.isThreePhase() ? c.position().label() : "";
      String description =
          switch (c.status()) {
            case IN_USE -> c.description();
            case SPARE_DEVICE -> c.description().isBlank() ? "spare" : c.description() + " (spare)";
            case EMPTY -> "empty space";
          };
      StringBuilder device = new StringBuilder();
      if (c.status() != WayStatus.EMPTY && c.deviceKind() != null) {
        device.append(Codes.word(c.deviceKind())).append(' ');
        if (c.deviceCurve() != null) {
          device.append(c.deviceCurve().name());
        }
        if (c.deviceRatingAmps() != null) {
          device
              .append(CsvWriter.num(c.deviceRatingAmps()))
              .append(c.deviceCurve() == null ? " A" : "");
        }
      }
      String residual =
          c.deviceResidualMilliAmps() == null
              ? ""
              : CsvWriter.num(c.deviceResidualMilliAmps()) + " mA";
      String loads =
          entry.loads().stream().map(DoorChartRow::load).collect(Collectors.joining("; "));
      rows.add(
          new DoorChartRow(
              c.wayNumber(), line, description, device.toString().strip(), residual, loads));
    }
    return rows;
  }

  /**
   * A panelboard's door chart as the panel is laid out: the odd spaces (left column) and the even
   * spaces (right column), one row per space with its line (A, B, C); a multi-pole breaker is
   * written on its top space with all its spaces and lines, the spaces under it say so, and a space
   * nothing takes is written as free.
   *
   * @return two lists of equal length: left column, right column
   */
  static List<List<DoorChartRow>> ofPanel(
      BoardEntry board,
      com.wayledger.engine.PanelSpaces panel,
      java.util.function.Function<com.wayledger.engine.Phase, String> lineName) {
    java.util.Map<Integer, DoorChartRow> byTop = new java.util.HashMap<>();
    java.util.Map<Integer, Integer> under = new java.util.HashMap<>();
    for (DoorChartRow row : of(board)) {
      CircuitEntry entry =
          board.circuits().stream()
              .filter(e -> e.circuit().wayNumber() == row.way())
              .findFirst()
              .orElse(null);
      int poles = entry == null ? 1 : entry.circuit().position().poles();
      int first = row.way();
      if (panel.fitOf(first, poles) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
        poles = 1;
        if (panel.fitOf(first, 1) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
          continue;
        }
      }
      List<Integer> spaces = panel.spacesOf(first, poles);
      String lines =
          spaces.stream()
              .map(s -> lineName.apply(panel.lineOf(s)))
              .collect(Collectors.joining("–"));
      byTop.put(
          first,
          new DoorChartRow(
              first, lines, row.description(), row.device(), row.residual(), row.loads()));
      spaces.stream().skip(1).forEach(space -> under.put(space, first));
    }
    List<DoorChartRow> left = new ArrayList<>();
    List<DoorChartRow> right = new ArrayList<>();
    for (int space = 1; space <= panel.spaceCount(); space++) {
      DoorChartRow row = byTop.get(space);
      if (row == null) {
        String line = lineName.apply(panel.lineOf(space));
        row =
            under.containsKey(space)
                ? new DoorChartRow(
                    space, line, "↑ breaker at space " + under.get(space), "", "", "")
                : new DoorChartRow(space, line, "free space", "", "", "");
      }
      (space % 2 == 1 ? left : right).add(row);
    }
    return List.of(left, right);
  }

  private static String load(LoadForm load) {
    String unit = load.ratingUnit() == null ? "" : " " + load.ratingUnit().name();
    String quantity = load.quantity() != null && load.quantity() > 1 ? load.quantity() + " × " : "";
    return load.description()
        + " "
        + quantity
        + (load.ratingValue() == null ? "" : CsvWriter.num(load.ratingValue()))
        + unit;
  }
}
