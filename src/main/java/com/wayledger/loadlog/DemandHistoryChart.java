package com.wayledger.loadlog;

import com.wayledger.engine.Phase;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Geometry of the server-drawn demand-history chart: one step line per phase (the demand holds
 * until the next change), time along the x axis, against a dashed line at the incomer rating.
 * Changes within one second are drawn as one step (the last state counts). Coordinates are SVG
 * units.
 *
 * @param lines one polyline per phase
 * @param ticks y axis ticks
 * @param dates x axis labels
 * @param ratingAmps incomer rating, or null
 * @param ratingY y of the rating line, or null
 * @param steps the states drawn, oldest first
 */
public record DemandHistoryChart(
    List<Line> lines,
    List<Tick> ticks,
    List<DateLabel> dates,
    Double ratingAmps,
    Double ratingY,
    List<Step> steps) {

  public static final int WIDTH = 640;
  public static final int HEIGHT = 260;
  static final int LEFT = 52;
  static final int RIGHT = 620;
  static final int TOP = 14;
  static final int BOTTOM = 210;
  private static final DateTimeFormatter DAY =
      DateTimeFormatter.ofPattern("d MMM yyyy HH:mm").withZone(ZoneOffset.UTC);

  public record Line(Phase phase, String points) {}

  public record Tick(double amps, double y) {}

  public record DateLabel(String text, double x) {}

  /** One drawn state: when, and the phase currents from then on. */
  public record Step(Instant at, Map<Phase, Double> phaseCurrentsAmps) {}

  static DemandHistoryChart of(List<HistoryPoint> points, Double incomerRatingAmps, Instant now) {
    Map<Instant, Map<Phase, Double>> byInstant = new LinkedHashMap<>();
    for (HistoryPoint point : points) {
      byInstant.put(
          point.at().truncatedTo(ChronoUnit.SECONDS),
          point.removed() ? Map.of() : point.phaseCurrentsAmps());
    }
    List<Step> steps =
        byInstant.entrySet().stream().map(e -> new Step(e.getKey(), e.getValue())).toList();
    double largest = incomerRatingAmps == null ? 0 : incomerRatingAmps;
    for (Step step : steps) {
      for (double amps : step.phaseCurrentsAmps().values()) {
        largest = Math.max(largest, amps);
      }
    }
    double scaleMax = niceCeiling(Math.max(largest * 1.1, 1.0));
    double plot = BOTTOM - TOP;
    List<Tick> ticks = new ArrayList<>();
    for (int i = 0; i <= 4; i++) {
      ticks.add(new Tick(scaleMax * i / 4, BOTTOM - plot * i / 4));
    }
    if (steps.isEmpty()) {
      return new DemandHistoryChart(
          List.of(),
          ticks,
          List.of(),
          incomerRatingAmps,
          ratingY(incomerRatingAmps, scaleMax),
          steps);
    }
    Instant start = steps.get(0).at();
    Instant end =
        now.isAfter(steps.get(steps.size() - 1).at()) ? now : steps.get(steps.size() - 1).at();
    double span = Math.max(1, end.getEpochSecond() - start.getEpochSecond());
    List<Double> xs =
        steps.stream()
            .map(
                s ->
                    LEFT
                        + (RIGHT - LEFT)
                            * (s.at().getEpochSecond() - start.getEpochSecond())
                            / span)
            .toList();
    List<Line> lines = new ArrayList<>();
    for (Phase phase : Phase.values()) {
      if (steps.stream().noneMatch(s -> s.phaseCurrentsAmps().containsKey(phase))) {
        continue;
      }
      StringBuilder path = new StringBuilder();
      for (int i = 0; i < steps.size(); i++) {
        double y =
            BOTTOM - plot * steps.get(i).phaseCurrentsAmps().getOrDefault(phase, 0.0) / scaleMax;
        double xEnd = i + 1 < steps.size() ? xs.get(i + 1) : RIGHT;
        path.append(fmt(xs.get(i)))
            .append(',')
            .append(fmt(y))
            .append(' ')
            .append(fmt(xEnd))
            .append(',')
            .append(fmt(y))
            .append(' ');
      }
      lines.add(new Line(phase, path.toString().strip()));
    }
    List<DateLabel> dates = new ArrayList<>();
    dates.add(new DateLabel(DAY.format(start), LEFT));
    if (span > 1) {
      dates.add(new DateLabel(DAY.format(end), RIGHT));
    }
    return new DemandHistoryChart(
        lines, ticks, dates, incomerRatingAmps, ratingY(incomerRatingAmps, scaleMax), steps);
  }

  private static Double ratingY(Double rating, double scaleMax) {
    return rating == null ? null : BOTTOM - (BOTTOM - TOP) * rating / scaleMax;
  }

  public int width() {
    return WIDTH;
  }

  public int height() {
    return HEIGHT;
  }

  public int left() {
    return LEFT;
  }

  public int right() {
    return RIGHT;
  }

  public int bottom() {
    return BOTTOM;
  }

  private static String fmt(double v) {
    return String.format(java.util.Locale.ROOT, "%.1f", v);
  }

  static double niceCeiling(double value) {
    double power = Math.pow(10, Math.floor(Math.log10(value)));
    for (double step : new double[] {1, 2, 5, 10}) {
      if (step * power >= value) {
        return step * power;
      }
    }
    return 10 * power;
  }
}
