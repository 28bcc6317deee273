package com.wayledger.exchange;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.DiversityMethods;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Invented boards for the exchange tests and the benchmark, built without a database: the same
 * entries are turned into engine inputs here (in the test) as the board feature's mapper does for
 * stored boards.
 */
public final class ExchangeFixtures {

  public static final String CAUTION = "Figures assist a competent person (test caution).";

  private ExchangeFixtures() {}

  static CircuitForm circuit(
      int way,
      PhasePosition position,
      String description,
      DeviceKind kind,
      TripCurve curve,
      double rating,
      Double residual,
      Double csa,
      Double length) {
    return new CircuitForm(
        way,
        position,
        description,
        WayStatus.IN_USE,
        false,
        kind,
        curve,
        rating,
        null,
        6.0,
        residual,
        residual == null ? null : RcdType.A,
        csa,
        csa == null ? null : 1.5,
        ConductorMaterial.COPPER,
        Insulation.THERMOPLASTIC_70,
        length,
        InstallationMethod.C,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null);
  }

  static LoadForm load(
      String description,
      LoadCategory category,
      int quantity,
      double rating,
      RatingUnit unit,
      double pf) {
    return new LoadForm(description, category, quantity, rating, unit, pf, null, null, false);
  }

  /**
   * A small shop: a three-phase main board with lighting, sockets, a cooker, a motor and a
   * sub-board way.
   */
  static List<BoardEntry> shop() {
    List<CircuitEntry> main = new ArrayList<>();
    long id = 100;
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                1,
                PhasePosition.L1,
                "Shop lights",
                DeviceKind.MCB,
                TripCurve.B,
                10,
                null,
                1.5,
                25.0),
            List.of(
                load("LED panels", LoadCategory.LIGHTING, 12, 36, RatingUnit.W, 0.9),
                load("Window spots", LoadCategory.LIGHTING, 6, 50, RatingUnit.VA, 0.85))));
    // a ring final circuit, so the round trips carry the Ring column
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                    1,
                    PhasePosition.L2,
                    "Counter sockets",
                    DeviceKind.RCBO,
                    TripCurve.B,
                    32,
                    30.0,
                    2.5,
                    30.0)
                .withRingFinal(true),
            List.of(
                load(
                    "Till and scales", LoadCategory.SOCKET_OUTLETS, 1, 1800, RatingUnit.W, 0.95))));
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                1,
                PhasePosition.L3,
                "=HYPERLINK(\"http://example.invalid\",\"x\")",
                DeviceKind.MCB,
                TripCurve.C,
                20,
                null,
                2.5,
                12.0),
            List.of(
                load(
                    "+Water heater",
                    LoadCategory.WATER_HEATING_STORAGE,
                    1,
                    3000,
                    RatingUnit.W,
                    1.0))));
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                2,
                PhasePosition.THREE_POLE,
                "Extract fan",
                DeviceKind.MCB,
                TripCurve.D,
                16,
                null,
                2.5,
                18.0),
            List.of(load("Fan motor", LoadCategory.MOTOR, 1, 6.5, RatingUnit.A, 0.82))));
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                3, PhasePosition.L1, "Cooker", DeviceKind.MCB, TripCurve.B, 32, null, 6.0, 10.0),
            List.of(load("Range", LoadCategory.COOKING, 1, 9000, RatingUnit.W, 1.0))));
    main.add(
        new CircuitEntry(
            id++,
            circuit(
                4,
                PhasePosition.THREE_POLE,
                "Sub-board DB2",
                DeviceKind.MCCB,
                null,
                63,
                null,
                16.0,
                20.0),
            List.of()));
    CircuitForm spare =
        new CircuitForm(
            5,
            PhasePosition.L2,
            "spare",
            WayStatus.SPARE_DEVICE,
            false,
            DeviceKind.MCB,
            TripCurve.B,
            16.0,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null);
    main.add(new CircuitEntry(id++, spare, List.of()));
    List<CircuitEntry> sub = new ArrayList<>();
    sub.add(
        new CircuitEntry(
            200L,
            circuit(
                1,
                PhasePosition.L1,
                "Store heaters",
                DeviceKind.MCB,
                TripCurve.B,
                20,
                null,
                2.5,
                15.0),
            List.of(load("Heater", LoadCategory.SPACE_HEATING, 2, 2000, RatingUnit.W, 1.0))));
    sub.add(
        new CircuitEntry(
            201L,
            circuit(
                1,
                PhasePosition.L2,
                "Store sockets",
                DeviceKind.RCBO,
                TripCurve.B,
                20,
                30.0,
                2.5,
                15.0),
            List.of(load("Sockets", LoadCategory.SOCKET_OUTLETS, 1, 2500, RatingUnit.VA, 0.9))));
    sub.add(
        new CircuitEntry(
            202L,
            circuit(
                2,
                PhasePosition.L3,
                "Store lights",
                DeviceKind.MCB,
                TripCurve.B,
                6,
                null,
                1.5,
                15.0),
            List.of(load("Battens", LoadCategory.LIGHTING, 8, 58, RatingUnit.W, 0.9))));
    return List.of(
        new BoardEntry(1L, "MDB", "Back office", 3, 12, null, "MCCB 100 A", 0, main),
        new BoardEntry(2L, "DB2", "Store", 3, 6, "MDB", "MCCB 63 A", 1, sub));
  }

  /** The engine's view of the entries; the sub-board is fed from MDB way 4. */
  static SiteSpec spec(List<BoardEntry> boards, String methodKey) {
    List<BoardSpec> specs = new ArrayList<>();
    for (BoardEntry board : boards) {
      List<CircuitSpec> circuits = new ArrayList<>();
      for (CircuitEntry entry : board.circuits()) {
        CircuitForm c = entry.circuit();
        Long feeds =
            c.description().startsWith("Sub-board ")
                ? boards.stream()
                    .filter(b -> c.description().endsWith(b.reference()))
                    .map(BoardEntry::id)
                    .findFirst()
                    .orElse(null)
                : null;
        circuits.add(
            new CircuitSpec(
                entry.circuitId(),
                c.wayNumber(),
                c.position(),
                c.description(),
                c.status(),
                Boolean.TRUE.equals(c.lockedForBalancing()),
                c.deviceKind() == null
                    ? null
                    : new DeviceSpec(
                        c.deviceKind(),
                        c.deviceCurve(),
                        c.deviceRatingAmps(),
                        c.devicePoles() == null
                            ? (c.position() == PhasePosition.THREE_POLE ? 3 : 1)
                            : c.devicePoles(),
                        c.deviceBreakingCapacityKiloAmps(),
                        c.deviceResidualMilliAmps(),
                        c.deviceRcdType()),
                c.cableLineCsa() == null
                    ? null
                    : new CableSpec(
                        c.cableLineCsa(),
                        c.cableCpcCsa(),
                        c.cableMaterial(),
                        c.cableInsulation(),
                        c.cableLengthMetres(),
                        c.cableInstallationMethod(),
                        c.cableAmbientCelsius(),
                        c.cableGroupedCircuits(),
                        c.cableThermalInsulationMm()),
                entry.loads().stream()
                    .map(
                        l ->
                            new LoadSpec(
                                l.description(),
                                l.category(),
                                l.quantity(),
                                l.ratingValue(),
                                l.ratingUnit(),
                                l.powerFactor(),
                                l.startUpSurgeMultiple(),
                                l.startUpSurgeMillis(),
                                l.continuous()))
                    .toList(),
                feeds,
                c.measuredLoopImpedanceOhms(),
                Boolean.TRUE.equals(c.ringFinal())));
      }
      Long parent =
          board.parentReference() == null
              ? null
              : boards.stream()
                  .filter(b -> b.reference().equals(board.parentReference()))
                  .map(BoardEntry::id)
                  .findFirst()
                  .orElse(null);
      specs.add(
          new BoardSpec(
              board.id(),
              board.reference(),
              board.phases(),
              board.wayCount(),
              100.0,
              new DeviceSpec(
                  DeviceKind.MCCB, null, parent == null ? 100.0 : 63.0, 3, 16.0, null, null),
              parent,
              null,
              10.0,
              parent == null ? 1.0 : 0.9,
              methodKey,
              null,
              null,
              circuits));
    }
    return new SiteSpec(
        9L,
        "Tallow test shop",
        new SupplySpec(EarthingSystem.TN_C_S, 230.0, 3, 50.0, 0.35, 16.0, 100.0),
        methodKey,
        specs);
  }

  public static ExportData export(List<BoardEntry> boards, String methodKey) {
    SiteAnalysis analysis =
        AnalysisService.analyse(spec(boards, methodKey), DiversityMethods.builtIn());
    return new ExportData(
        9L,
        "Tallow test shop",
        com.wayledger.system.EnumWords.standard().of(com.wayledger.engine.EarthingSystem.TN_C_S),
        boards,
        analysis.demand(),
        analysis.findings(),
        LocalDate.of(2025, 3, 14));
  }

  static ExportData shopExport() {
    return export(shop(), DiversityMethods.UK_SMALL_SHOP);
  }

  /** A generated site of many boards, seeded so every run writes the same workbook. */
  public static List<BoardEntry> generated(int circuits, int perBoard, long seed) {
    Random random = new Random(seed);
    LoadCategory[] categories = {
      LoadCategory.LIGHTING,
      LoadCategory.SOCKET_OUTLETS,
      LoadCategory.SPACE_HEATING,
      LoadCategory.MOTOR,
      LoadCategory.OTHER
    };
    List<BoardEntry> boards = new ArrayList<>();
    long circuitId = 1;
    int boardCount = (circuits + perBoard - 1) / perBoard;
    for (int b = 0; b < boardCount; b++) {
      List<CircuitEntry> entries = new ArrayList<>();
      int ways = (perBoard + 2) / 3;
      for (int i = 0; i < perBoard && (long) b * perBoard + i < circuits; i++) {
        PhasePosition position = PhasePosition.values()[i % 3];
        LoadCategory category = categories[random.nextInt(categories.length)];
        entries.add(
            new CircuitEntry(
                circuitId++,
                circuit(
                    i / 3 + 1,
                    position,
                    "Circuit " + (i + 1),
                    DeviceKind.MCB,
                    TripCurve.B,
                    16,
                    null,
                    2.5,
                    10.0 + random.nextInt(40)),
                List.of(
                    load(
                        "Load " + (i + 1),
                        category,
                        1 + random.nextInt(4),
                        100 + random.nextInt(2000),
                        RatingUnit.W,
                        0.8 + random.nextInt(21) / 100.0))));
      }
      boards.add(
          new BoardEntry(
              b + 1L,
              "DB" + (b + 1),
              "Floor " + (b / 10),
              3,
              ways,
              null,
              "MCCB 100 A",
              0,
              entries));
    }
    return boards;
  }
}
