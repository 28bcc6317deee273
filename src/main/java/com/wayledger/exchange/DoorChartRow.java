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
