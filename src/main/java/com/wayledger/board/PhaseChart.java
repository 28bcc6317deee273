package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Geometry of the server-drawn phase chart: for each line, a bar of connected current (before
 * diversity) and a bar of demand current (after), against a dashed line at the incomer rating.
 * Coordinates are in the SVG's own units (width {@link #WIDTH}, height {@link #HEIGHT}).
 *
 * @param bars one pair of bars per line
 * @param ratingAmps incomer rating, or null when unknown
 * @param ratingY y of the rating line, or null
 * @param scaleMaxAmps current at the top of the plot area
 * @param ticks axis ticks
 */
public record PhaseChart(
    List<Bar> bars, Double ratingAmps, Double ratingY, double scaleMaxAmps, List<Tick> ticks) {

  public static final int WIDTH = 420;
  public static final int HEIGHT = 240;
  static final int TOP = 16;
  static final int BOTTOM = 200;
  static final int LEFT = 48;

  /** Bars of one line: connected and demand current with their rectangles. */
  public record Bar(
      Phase phase,
      double connectedAmps,
      double demandAmps,
      double x,
      double connectedY,
      double connectedHeight,
      double demandY,
      double demandHeight,
      boolean overRating) {}

  public record Tick(double amps, double y) {}

  /**
   * Connected current per line from the circuits' connected power (a three-pole circuit shares it
   * equally).
   */
  static Map<Phase, Double> connectedAmps(BoardDemand demand) {
    Map<Phase, double[]> power = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      power.put(phase, new double[2]);
    }
    for (CircuitDemand circuit : demand.circuits()) {
      if (!circuit.isAssessed() || circuit.position() == null) {
        continue;
      }
      double[] watts = new double[3];
      double[] vars = new double[3];
      com.wayledger.engine.LinePhasors.add(
          demand.system(),
          circuit.position(),
          circuit.connectedWatts(),
          circuit.connectedVars(),
          watts,
          vars);
      for (Phase phase : circuit.position().phases()) {
        power.get(phase)[0] += watts[phase.ordinal()];
        power.get(phase)[1] += vars[phase.ordinal()];
      }
    }
    Map<Phase, Double> amps = new EnumMap<>(Phase.class);
    power.forEach(
        (phase, pq) -> amps.put(phase, Math.hypot(pq[0], pq[1]) / demand.nominalVoltageVolts()));
    return amps;
  }

  static PhaseChart of(BoardDemand demand, Double incomerRatingAmps) {
    Map<Phase, Double> connected = connectedAmps(demand);
    List<Phase> lines = List.of(Phase.values()).subList(0, Math.max(1, demand.lines()));
    double largest = incomerRatingAmps == null ? 0.0 : incomerRatingAmps;
    for (Phase phase : lines) {
      largest = Math.max(largest, Math.max(connected.get(phase), demandOf(demand, phase)));
    }
    double scaleMax = niceCeiling(Math.max(largest * 1.1, 1.0));
    double plotHeight = BOTTOM - TOP;
    double slot = (WIDTH - LEFT - 10.0) / lines.size();
    List<Bar> bars = new ArrayList<>();
    for (int i = 0; i < lines.size(); i++) {
      Phase phase = lines.get(i);
      double connectedAmps = connected.get(phase);
      double demandAmps = demandOf(demand, phase);
      double connectedHeight = plotHeight * connectedAmps / scaleMax;
      double demandHeight = plotHeight * demandAmps / scaleMax;
      bars.add(
          new Bar(
              phase,
              connectedAmps,
              demandAmps,
              LEFT + i * slot + slot * 0.15,
              BOTTOM - connectedHeight,
              connectedHeight,
              BOTTOM - demandHeight,
              demandHeight,
              incomerRatingAmps != null && demandAmps > incomerRatingAmps));
    }
    List<Tick> ticks = new ArrayList<>();
    for (int i = 0; i <= 4; i++) {
      double amps = scaleMax * i / 4;
      ticks.add(new Tick(amps, BOTTOM - plotHeight * i / 4));
    }
    Double ratingY =
        incomerRatingAmps == null ? null : BOTTOM - plotHeight * incomerRatingAmps / scaleMax;
    return new PhaseChart(bars, incomerRatingAmps, ratingY, scaleMax, ticks);
  }

  /** Width of one bar. */
  public double barWidth() {
    return (WIDTH - LEFT - 10.0) / bars.size() * 0.33;
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

  public int bottom() {
    return BOTTOM;
  }

  private static double demandOf(BoardDemand demand, Phase phase) {
    PhaseDemand onPhase = demand.onPhase(phase);
    return onPhase == null ? 0.0 : onPhase.currentAmps();
  }

  /** 1, 2 or 5 times a power of ten, at least the value: round axis ends. */
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
