package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

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
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.junit.jupiter.api.Test;

/**
 * Seeded random sites (an origin board, sub-boards on three-pole and single-pole feeders,
 * single-phase and three-pole circuits, missing inputs sprinkled in) run through both engines as
 * the pages run them. Two properties: a check never passes when an input it reads is missing, and
 * taking any one recorded input away never turns a check that did not pass into a pass.
 *
 * <p>Invented data only; the figures are not from any installation.
 */
class MissingInputPropertyTests {

  private static final int SITES = 60;

  private static final List<InstallationMethod> METHODS =
      List.of(InstallationMethod.B1, InstallationMethod.C, InstallationMethod.E);
  private static final double[] SIZES = {1.0, 1.5, 2.5, 4, 6, 10, 16, 25};
  private static final double[] RATINGS = {6, 10, 16, 20, 32, 40, 63};
  private static final LoadCategory[] CATEGORIES = {
    LoadCategory.LIGHTING,
    LoadCategory.SOCKET_OUTLETS,
    LoadCategory.MOTOR,
    LoadCategory.EV_CHARGING,
    LoadCategory.FIXED_APPLIANCE,
    LoadCategory.SPACE_HEATING
  };

  private static <T> T maybe(Random r, T value) {
    return r.nextInt(8) == 0 ? null : value;
  }

  private static CableSpec cable(Random r, boolean threePole) {
    if (r.nextInt(12) == 0) {
      return null;
    }
    double csa = SIZES[r.nextInt(SIZES.length)];
    return new CableSpec(
        maybe(r, csa),
        maybe(r, Math.min(csa, 16.0)),
        maybe(r, ConductorMaterial.COPPER),
        maybe(r, r.nextBoolean() ? Insulation.THERMOPLASTIC_70 : Insulation.THERMOSETTING_90),
        maybe(r, 5.0 + r.nextInt(80)),
        maybe(r, METHODS.get(r.nextInt(METHODS.size()))),
        maybe(r, 25.0 + 5 * r.nextInt(4)),
        maybe(r, 1 + r.nextInt(4)),
        maybe(r, 0));
  }

  private static DeviceSpec device(Random r, int poles) {
    boolean rcbo = r.nextInt(3) == 0;
    return new DeviceSpec(
        rcbo ? DeviceKind.RCBO : DeviceKind.MCB,
        maybe(r, TripCurve.values()[r.nextInt(3)]),
        maybe(r, RATINGS[r.nextInt(RATINGS.length)]),
        poles,
        maybe(r, r.nextBoolean() ? 6.0 : 10.0),
        rcbo ? 30.0 : null,
        rcbo ? com.wayledger.engine.RcdType.A : null);
  }

  private static List<LoadSpec> loads(Random r) {
    int n = r.nextInt(6) == 0 ? 0 : 1 + r.nextInt(3);
    List<LoadSpec> loads = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      LoadCategory category = CATEGORIES[r.nextInt(CATEGORIES.length)];
      boolean surge = category == LoadCategory.MOTOR ? r.nextInt(4) != 0 : r.nextInt(6) == 0;
      loads.add(
          new LoadSpec(
              "load " + i,
              category,
              1 + r.nextInt(3),
              200 + r.nextInt(3000),
              RatingUnit.W,
              0.8 + 0.2 * r.nextDouble(),
              surge ? 2.0 + 6 * r.nextDouble() : null,
              surge ? 100.0 : null,
              false));
    }
    return loads;
  }

  private static CircuitSpec circuit(
      Random r, long id, int way, PhasePosition position, Long feeds) {
    boolean threePole = position == PhasePosition.THREE_POLE;
    return new CircuitSpec(
        id,
        way,
        position,
        "circuit " + id,
        WayStatus.IN_USE,
        false,
        device(r, threePole ? 3 : 1),
        cable(r, threePole),
        feeds == null ? loads(r) : List.of(),
        feeds,
        null);
  }

  private static BoardSpec board(
      long id, Long parent, int phases, List<CircuitSpec> circuits, CableSpec submain) {
    return new BoardSpec(
        id, "DB" + id, phases, 24, 200.0, null, parent, submain, 10.0, 1.0, null, null, null,
        circuits);
  }

  /** An origin board with two sub-boards, 5 to 8 ways each. */
  static SiteSpec site(long seed) {
    Random r = new Random(seed);
    long id = seed * 1000;
    List<BoardSpec> boards = new ArrayList<>();
    long originId = id++;
    List<CircuitSpec> originCircuits = new ArrayList<>();
    int way = 1;
    long[] childIds = {id++, id++};
    PhasePosition[] feeds = {PhasePosition.THREE_POLE, PhasePosition.values()[r.nextInt(3)]};
    for (int k = 0; k < 2; k++) {
      originCircuits.add(circuit(r, id++, way++, feeds[k], childIds[k]));
    }
    int n = 5 + r.nextInt(4);
    for (int i = 0; i < n; i++) {
      PhasePosition p =
          r.nextInt(4) == 0 ? PhasePosition.THREE_POLE : PhasePosition.values()[r.nextInt(3)];
      originCircuits.add(circuit(r, id++, way++, p, null));
    }
    boards.add(board(originId, null, 3, originCircuits, null));
    for (int k = 0; k < 2; k++) {
      int phases = feeds[k] == PhasePosition.THREE_POLE ? 3 : 1;
      List<CircuitSpec> circuits = new ArrayList<>();
      int m = 5 + r.nextInt(4);
      for (int i = 0; i < m; i++) {
        PhasePosition p =
            phases == 3 && r.nextInt(4) == 0
                ? PhasePosition.THREE_POLE
                : phases == 3 ? PhasePosition.values()[r.nextInt(3)] : PhasePosition.L1;
        circuits.add(circuit(r, id++, i + 1, p, null));
      }
      boards.add(board(childIds[k], originId, phases, circuits, null));
    }
    SupplySpec supply =
        new SupplySpec(
            EarthingSystem.TN_C_S, 230.0, 3, 50.0, maybe(r, 0.35), maybe(r, 6.0), maybe(r, 200.0));
    return new SiteSpec(seed, "random " + seed, supply, DiversityMethods.NONE, boards);
  }

  private static Map<String, Finding> findings(SiteSpec site) {
    Map<String, Finding> byPlace = new HashMap<>();
    for (BoardFindings board :
        AnalysisService.analyse(site, DiversityMethods.builtIn()).findings().boards()) {
      for (CircuitFindings circuit : board.circuits()) {
        for (Finding f : circuit.findings()) {
          byPlace.put(circuit.circuitId() + ":" + f.check(), f);
        }
      }
    }
    return byPlace;
  }

  private static CircuitSpec find(SiteSpec site, long id) {
    return site.boards().stream()
        .flatMap(b -> b.circuits().stream())
        .filter(c -> c.id() == id)
        .findFirst()
        .orElseThrow();
  }

  /** The checks of a circuit that must not pass when {@code c} lacks an input they read. */
  private static List<CheckKind> mustNotPass(CircuitSpec c) {
    List<CheckKind> kinds = new ArrayList<>();
    CableSpec cable = c.cable();
    boolean noLoad = c.loads().isEmpty() && c.feedsBoardId() == null;
    boolean cableIncomplete =
        cable == null
            || cable.material() == null
            || cable.lineCsaSquareMillimetres() == null
            || cable.installationMethod() == null
            || cable.ambientCelsius() == null
            || cable.groupedCircuits() == null
            || cable.thermalInsulationMillimetres() == null;
    boolean deviceIncomplete =
        c.device() == null || c.device().ratedCurrentAmps() == null || c.device().curve() == null;
    if (noLoad || deviceIncomplete) {
      kinds.add(CheckKind.WAY_OVERLOAD);
    }
    if (cableIncomplete || deviceIncomplete) {
      kinds.add(CheckKind.CABLE_PROTECTION);
    }
    if (noLoad
        || cable == null
        || cable.lengthMetres() == null
        || cable.material() == null
        || cable.lineCsaSquareMillimetres() == null) {
      kinds.add(CheckKind.VOLTAGE_DROP);
    }
    if (cable == null
        || cable.lengthMetres() == null
        || cable.material() == null
        || cable.protectiveCsaSquareMillimetres() == null
        || deviceIncomplete) {
      kinds.add(CheckKind.LOOP_IMPEDANCE);
    }
    if (noLoad
        || c.loads().stream()
            .anyMatch(
                l -> l.category() == LoadCategory.MOTOR && l.startUpSurgeMultiple() == null)) {
      kinds.add(CheckKind.START_UP_SURGE);
    }
    return kinds;
  }

  @RepeatedTest(SITES)
  void aCheckNeverPassesWhenAnInputItReadsIsMissing(RepetitionInfo info) {
    SiteSpec site = site(info.getCurrentRepetition());
    Map<String, Finding> all = findings(site);
    for (BoardSpec board : site.boards()) {
      for (CircuitSpec c : board.circuits()) {
        for (CheckKind kind : mustNotPass(c)) {
          Finding f = all.get(c.id() + ":" + kind);
          if (f != null) {
            assertThat(f.verdict())
                .as(
                    "seed %d, circuit %d, %s: %s",
                    info.getCurrentRepetition(), c.id(), kind, f.summary())
                .isNotEqualTo(Verdict.PASS);
          }
        }
      }
    }
  }

  /** Ways to take one recorded input away from a circuit. */
  private static List<UnaryOperator<CircuitSpec>> removals(CircuitSpec c) {
    List<UnaryOperator<CircuitSpec>> ways = new ArrayList<>();
    CableSpec k = c.cable();
    if (k != null) {
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      null,
                      k.protectiveCsaSquareMillimetres(),
                      k.material(),
                      k.insulation(),
                      k.lengthMetres(),
                      k.installationMethod(),
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      null,
                      k.material(),
                      k.insulation(),
                      k.lengthMetres(),
                      k.installationMethod(),
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      k.protectiveCsaSquareMillimetres(),
                      null,
                      k.insulation(),
                      k.lengthMetres(),
                      k.installationMethod(),
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      k.protectiveCsaSquareMillimetres(),
                      k.material(),
                      null,
                      k.lengthMetres(),
                      k.installationMethod(),
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      k.protectiveCsaSquareMillimetres(),
                      k.material(),
                      k.insulation(),
                      null,
                      k.installationMethod(),
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      k.protectiveCsaSquareMillimetres(),
                      k.material(),
                      k.insulation(),
                      k.lengthMetres(),
                      null,
                      k.ambientCelsius(),
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(
          x ->
              withCable(
                  x,
                  new CableSpec(
                      k.lineCsaSquareMillimetres(),
                      k.protectiveCsaSquareMillimetres(),
                      k.material(),
                      k.insulation(),
                      k.lengthMetres(),
                      k.installationMethod(),
                      null,
                      k.groupedCircuits(),
                      k.thermalInsulationMillimetres())));
      ways.add(x -> withCable(x, null));
    }
    DeviceSpec d = c.device();
    if (d != null) {
      ways.add(
          x ->
              withDevice(
                  x,
                  new DeviceSpec(
                      d.kind(),
                      d.curve(),
                      null,
                      d.poles(),
                      d.breakingCapacityKiloAmps(),
                      d.residualCurrentMilliAmps(),
                      d.rcdType())));
      ways.add(
          x ->
              withDevice(
                  x,
                  new DeviceSpec(
                      d.kind(),
                      null,
                      d.ratedCurrentAmps(),
                      d.poles(),
                      d.breakingCapacityKiloAmps(),
                      d.residualCurrentMilliAmps(),
                      d.rcdType())));
      ways.add(
          x ->
              withDevice(
                  x,
                  new DeviceSpec(
                      d.kind(),
                      d.curve(),
                      d.ratedCurrentAmps(),
                      d.poles(),
                      null,
                      d.residualCurrentMilliAmps(),
                      d.rcdType())));
    }
    if (!c.loads().isEmpty()) {
      ways.add(x -> withLoads(x, List.of()));
      for (int i = 0; i < c.loads().size(); i++) {
        LoadSpec l = c.loads().get(i);
        // a surge-prone load's multiple; an unrecorded multiple on any other category means "no
        // surge", which is a statement about the load, not a missing input
        if (l.startUpSurgeMultiple() != null && l.category() == LoadCategory.MOTOR) {
          int at = i;
          ways.add(
              x -> {
                List<LoadSpec> loads = new ArrayList<>(x.loads());
                loads.set(
                    at,
                    new LoadSpec(
                        l.description(),
                        l.category(),
                        l.quantity(),
                        l.ratingValue(),
                        l.ratingUnit(),
                        l.powerFactor(),
                        null,
                        null,
                        l.continuous()));
                return withLoads(x, loads);
              });
        }
      }
    }
    return ways;
  }

  private static CircuitSpec withCable(CircuitSpec c, CableSpec cable) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        c.device(),
        cable,
        c.loads(),
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        c.ringFinal());
  }

  private static CircuitSpec withDevice(CircuitSpec c, DeviceSpec device) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        device,
        c.cable(),
        c.loads(),
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        c.ringFinal());
  }

  private static CircuitSpec withLoads(CircuitSpec c, List<LoadSpec> loads) {
    return new CircuitSpec(
        c.id(),
        c.wayNumber(),
        c.position(),
        c.description(),
        c.status(),
        c.lockedForBalancing(),
        c.device(),
        c.cable(),
        loads,
        c.feedsBoardId(),
        c.measuredLoopImpedanceOhms(),
        c.ringFinal());
  }

  private static SiteSpec replaced(SiteSpec site, CircuitSpec changed) {
    return new SiteSpec(
        site.id(),
        site.name(),
        site.supply(),
        site.defaultDiversityMethodKey(),
        site.boards().stream()
            .map(
                b ->
                    b.withCircuits(
                        b.circuits().stream()
                            .map(c -> c.id() == changed.id() ? changed : c)
                            .toList()))
            .toList());
  }

  /**
   * Removing one input of one circuit: none of that circuit's checks goes from "not passed" to
   * "passes". (A removal can change figures elsewhere — a sub-board with no load recorded carries
   * less up the tree — so only the circuit whose input went is compared.)
   */
  @RepeatedTest(SITES)
  void removingAnyOneInputNeverTurnsACheckIntoAPass(RepetitionInfo info) {
    long seed = info.getCurrentRepetition();
    SiteSpec site = site(seed);
    Map<String, Finding> before = findings(site);
    Random pick = new Random(seed * 31);
    List<CircuitSpec> circuits =
        site.boards().stream().flatMap(b -> b.circuits().stream()).toList();
    for (int t = 0; t < 4; t++) {
      CircuitSpec c = circuits.get(pick.nextInt(circuits.size()));
      List<UnaryOperator<CircuitSpec>> ways = removals(c);
      if (ways.isEmpty()) {
        continue;
      }
      int w = pick.nextInt(ways.size());
      Map<String, Finding> after = findings(replaced(site, ways.get(w).apply(find(site, c.id()))));
      for (CheckKind kind : CheckKind.values()) {
        Finding was = before.get(c.id() + ":" + kind);
        Finding now = after.get(c.id() + ":" + kind);
        if (was != null && now != null && was.verdict() != Verdict.PASS) {
          assertThat(now.verdict())
              .as(
                  "seed %d, circuit %d, removal %d, %s: was \"%s\", now \"%s\"",
                  seed, c.id(), w, kind, was.summary(), now.summary())
              .isNotEqualTo(Verdict.PASS);
        }
      }
    }
  }

  /** Keeps the properties from holding vacuously: the sites produce passes and missing inputs. */
  @Test
  void theRandomSitesHoldBothPassesAndMissingInputs() {
    int passes = 0;
    int notAssessed = 0;
    int boards = 0;
    for (long seed = 1; seed <= SITES; seed++) {
      SiteSpec site = site(seed);
      boards += site.boards().size();
      for (Finding f : findings(site).values()) {
        passes += f.verdict() == Verdict.PASS ? 1 : 0;
        notAssessed += f.verdict() == Verdict.NOT_ASSESSED ? 1 : 0;
      }
    }
    assertThat(boards).as("boards generated").isGreaterThanOrEqualTo(150);
    assertThat(passes).as("passing checks").isGreaterThan(200);
    assertThat(notAssessed).as("checks not assessed").isGreaterThan(200);
  }
}
