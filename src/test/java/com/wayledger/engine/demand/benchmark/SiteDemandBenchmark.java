package com.wayledger.engine.demand.benchmark;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethodCatalog;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.demand.SiteDemand;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Full evaluation of a generated site: 200 boards × 36 positions × 3 load items (7,200 circuits),
 * fed as a tree (each board from a way of board (i − 1)/8), fixed seed, the UK household and
 * small-shop methods alternating by board. Target: at least 1,000,000 circuit evaluations per
 * second on one core, that is at most about 7.2 ms per site.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SiteDemandBenchmark {

  static final long SEED = 20_240_601L;
  static final int BOARDS = 200;
  static final int POSITIONS = 36;
  static final int LOADS_PER_CIRCUIT = 3;

  SiteSpec site;
  DiversityMethodCatalog methods;

  @Setup
  public void generate() {
    site = generateSite(new Random(SEED));
    methods = DiversityMethods.builtIn();
  }

  @Benchmark
  public SiteDemand evaluateSite() {
    return DemandEngine.evaluate(site, methods);
  }

  static SiteSpec generateSite(Random random) {
    LoadCategory[] categories = LoadCategory.values();
    PhasePosition[] positions = {
      PhasePosition.L1, PhasePosition.L2, PhasePosition.L3, PhasePosition.THREE_POLE
    };
    List<BoardSpec> boards = new ArrayList<>(BOARDS);
    List<List<CircuitSpec>> circuitsByBoard = new ArrayList<>(BOARDS);
    long circuitId = 1;
    for (int b = 0; b < BOARDS; b++) {
      List<CircuitSpec> circuits = new ArrayList<>();
      for (int p = 0; p < POSITIONS; p++) {
        List<LoadSpec> loads = new ArrayList<>(LOADS_PER_CIRCUIT);
        for (int l = 0; l < LOADS_PER_CIRCUIT; l++) {
          loads.add(
              new LoadSpec(
                  "load",
                  categories[random.nextInt(categories.length)],
                  1 + random.nextInt(3),
                  100 + random.nextInt(3_000),
                  RatingUnit.W,
                  0.7 + 0.3 * random.nextDouble(),
                  null,
                  null,
                  false));
        }
        circuits.add(
            new CircuitSpec(
                circuitId++,
                p + 1,
                positions[random.nextInt(positions.length)],
                "way",
                WayStatus.IN_USE,
                false,
                device(32.0),
                null,
                loads,
                null,
                null));
      }
      circuitsByBoard.add(circuits);
    }
    for (int b = 1; b < BOARDS; b++) {
      int parent = (b - 1) / 8;
      circuitsByBoard
          .get(parent)
          .add(
              new CircuitSpec(
                  circuitId++,
                  POSITIONS + b,
                  PhasePosition.THREE_POLE,
                  "submain",
                  WayStatus.IN_USE,
                  false,
                  device(125.0),
                  null,
                  List.of(),
                  (long) b,
                  null));
    }
    for (int b = 0; b < BOARDS; b++) {
      boards.add(
          new BoardSpec(
              b,
              "DB" + b,
              3,
              POSITIONS,
              400.0,
              device(400.0),
              b == 0 ? null : (long) ((b - 1) / 8),
              null,
              10.0,
              0.9,
              b % 2 == 0 ? DiversityMethods.UK_HOUSEHOLD : DiversityMethods.UK_SMALL_SHOP,
              null,
              null,
              circuitsByBoard.get(b)));
    }
    SupplySpec supply = new SupplySpec(EarthingSystem.TN_C_S, 230.0, 3, 50.0, 0.35, 16.0, 400.0);
    return new SiteSpec(1, "benchmark site", supply, DiversityMethods.NONE, boards);
  }

  private static DeviceSpec device(double amps) {
    return new DeviceSpec(DeviceKind.MCB, TripCurve.C, amps, 3, 10.0, null, null);
  }
}
