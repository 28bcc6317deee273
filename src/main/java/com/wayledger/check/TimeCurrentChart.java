package com.wayledger.check;

import com.wayledger.engine.protection.device.TimeCurrentBand;
import com.wayledger.engine.protection.device.TimeCurrentPoint;
import java.util.ArrayList;
import java.util.List;

/**
 * Geometry of a log–log time–current chart drawn on the server as SVG: the device's band as a
 * filled polygon and vertical markers for the circuit's design current, its start-up surge and the
 * earth fault current.
 *
 * @param bandPath SVG path data of the band ("M x y L x y … Z"); empty when the device has no band
 * @param markers currents to mark, with their x position
 * @param currentTicks decades of current along the x axis
 * @param timeTicks decades of time along the y axis
 * @param surgePoint the surge as a point (current, duration); null when none
 */
public record TimeCurrentChart(
    String bandPath,
    List<Marker> markers,
    List<Tick> currentTicks,
    List<Tick> timeTicks,
    Point surgePoint) {

  public static final int WIDTH = 560;
  public static final int HEIGHT = 420;
  static final int LEFT = 60;
  static final int RIGHT = WIDTH - 20;
  static final int TOP = 16;
  static final int BOTTOM = HEIGHT - 44;
  static final double MIN_SECONDS = 0.005;
  static final double MAX_SECONDS = 10_000;

  /** A vertical line at a current, labelled. */
  public record Marker(String kind, String label, double amps, double x) {

    /**
     * "Ib 0.5 A", "Ib 16.0 A", "fault 1200 A": amps to one decimal below 100 A so that a small
     * current never reads as "0 A".
     */
    public String text() {
      return label + " " + amount();
    }

    /** "0.5 A", "1200 A": the current as the page's words for this marker kind carry it. */
    public String amount() {
      return (amps < 100
              ? String.format(java.util.Locale.ROOT, "%.1f", amps)
              : String.format(java.util.Locale.ROOT, "%.0f", amps))
          + " A";
    }

    /** Whether the label sits left of its line, so it is not cut off at the chart's right edge. */
    public boolean labelOnLeft() {
      return x > RIGHT - 90;
    }
  }

  public record Tick(String label, double position) {}

  /** The surge's point: "73 A for 150 ms" as {@link #label}, its figures for the page's words. */
  public record Point(double x, double y, String amps, String millis) {

    public String label() {
      return amps + " A for " + millis + " ms";
    }
  }

  /**
   * Lays out the chart.
   *
   * @param band the device's band; null when the device has none (a fuse, an RCD)
   * @param ratedAmps In, to set the current range (at least 0.5·In to 100·In)
   * @param designCurrentAmps Ib; null when unknown
   * @param surgeAmps start-up surge current; null when none
   * @param surgeSeconds surge duration, s; null when unknown
   * @param faultAmps earth fault current at the circuit's far end; null when unknown
   */
  public static TimeCurrentChart of(
      TimeCurrentBand band,
      double ratedAmps,
      Double designCurrentAmps,
      Double surgeAmps,
      Double surgeSeconds,
      Double faultAmps) {
    double lowAmps = ratedAmps * 0.5;
    double highAmps = ratedAmps * 100;
    for (Double amps : new Double[] {designCurrentAmps, surgeAmps, faultAmps}) {
      if (amps != null && amps > 0) {
        lowAmps = Math.min(lowAmps, amps * 0.8);
        highAmps = Math.max(highAmps, amps * 1.25);
      }
    }
    Scale x =
        new Scale(Math.floor(Math.log10(lowAmps)), Math.ceil(Math.log10(highAmps)), LEFT, RIGHT);
    Scale y = new Scale(Math.log10(MIN_SECONDS), Math.log10(MAX_SECONDS), BOTTOM, TOP);

    String path = band == null ? "" : bandPath(band, x, y);
    List<Marker> markers = new ArrayList<>();
    addMarker(markers, "design", "Ib", designCurrentAmps, x);
    addMarker(markers, "surge", "surge", surgeAmps, x);
    addMarker(markers, "fault", "earth fault", faultAmps, x);
    Point surge = null;
    if (surgeAmps != null && surgeAmps > 0 && surgeSeconds != null && surgeSeconds > 0) {
      surge =
          new Point(
              x.at(Math.log10(surgeAmps)),
              y.at(Math.log10(clampSeconds(surgeSeconds))),
              String.format(java.util.Locale.ROOT, "%.0f", surgeAmps),
              String.format(java.util.Locale.ROOT, "%.0f", surgeSeconds * 1000));
    }
    List<Tick> currentTicks = new ArrayList<>();
    for (double decade = x.low; decade <= x.high; decade++) {
      currentTicks.add(new Tick(amps(Math.pow(10, decade)), x.at(decade)));
    }
    List<Tick> timeTicks = new ArrayList<>();
    for (double decade = -2; decade <= 4; decade++) {
      timeTicks.add(new Tick(seconds(Math.pow(10, decade)), y.at(decade)));
    }
    return new TimeCurrentChart(path, markers, currentTicks, timeTicks, surge);
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

  public int top() {
    return TOP;
  }

  public int bottom() {
    return BOTTOM;
  }

  private static String bandPath(TimeCurrentBand band, Scale x, Scale y) {
    List<TimeCurrentPoint> points = band.points();
    StringBuilder upper = new StringBuilder();
    StringBuilder lower = new StringBuilder();
    List<String> lowerParts = new ArrayList<>();
    for (TimeCurrentPoint point : points) {
      if (point.currentAmps() <= 0) {
        continue;
      }
      double px = x.at(Math.log10(point.currentAmps()));
      if (point.maxSeconds() != null) {
        upper
            .append(upper.isEmpty() ? "M " : " L ")
            .append(fmt(px))
            .append(' ')
            .append(fmt(y.at(Math.log10(clampSeconds(point.maxSeconds())))));
      }
      if (point.minSeconds() != null) {
        lowerParts.add(fmt(px) + " " + fmt(y.at(Math.log10(clampSeconds(point.minSeconds())))));
      }
    }
    for (int i = lowerParts.size() - 1; i >= 0; i--) {
      lower.append(" L ").append(lowerParts.get(i));
    }
    return upper.isEmpty() ? "" : upper + lower.toString() + " Z";
  }

  private static void addMarker(
      List<Marker> markers, String kind, String label, Double amps, Scale x) {
    if (amps != null && amps > 0) {
      markers.add(new Marker(kind, label, amps, x.at(Math.log10(amps))));
    }
  }

  private static double clampSeconds(double seconds) {
    return Math.max(MIN_SECONDS, Math.min(MAX_SECONDS, seconds));
  }

  private static String fmt(double value) {
    return String.format(java.util.Locale.ROOT, "%.1f", value);
  }

  private static String amps(double value) {
    return value >= 1000
        ? String.format(java.util.Locale.ROOT, "%.0f kA", value / 1000)
        : String.format(
            java.util.Locale.ROOT,
            "%s A",
            value < 1
                ? String.valueOf(value)
                : String.format(java.util.Locale.ROOT, "%.0f", value));
  }

  private static String seconds(double value) {
    return value < 1
        ? String.format(java.util.Locale.ROOT, "%.0f ms", value * 1000)
        : String.format(java.util.Locale.ROOT, "%.0f s", value);
  }

  /** A linear map from a log10 range to pixels. */
  private record Scale(double low, double high, double fromPixel, double toPixel) {
    double at(double log) {
      return fromPixel + (log - low) / (high - low) * (toPixel - fromPixel);
    }
  }
}
