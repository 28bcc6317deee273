package com.wayledger.engine.demand;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Entry points of the demand engine. Stateless: every call takes records and returns records.
 *
 * <p>A site is evaluated children first: the demand of a sub-board, times its coincidence factor,
 * is a load on the way of its parent that feeds it ({@link CircuitSpec#feedsBoardId()}). A cycle in
 * the tree is reported in {@link SiteDemand#problems()} and the demand around it is not carried.
 */
public final class DemandEngine {

  private DemandEngine() {}

  /** Evaluates a site with the default settings and no NEC dwelling data. */
  public static SiteDemand evaluate(SiteSpec site, DiversityMethodCatalog methods) {
    return evaluate(site, methods, DemandSettings.DEFAULTS, Map.of());
  }

  /**
   * Evaluates every board of a site.
   *
   * @param site the site
   * @param methods methods the boards' keys are looked up in
   * @param settings assumptions where the site gives none
   * @param dwellingByBoardId NEC dwelling data per board id; boards without an entry have none
   */
  public static SiteDemand evaluate(
      SiteSpec site,
      DiversityMethodCatalog methods,
      DemandSettings settings,
      Map<Long, DwellingParameters> dwellingByBoardId) {
    double u0 = nominalVoltage(site.supply(), settings);
    List<String> problems = new ArrayList<>();
    Map<Long, BoardSpec> byId = new LinkedHashMap<>();
    for (BoardSpec board : site.boards()) {
      if (byId.putIfAbsent(board.id(), board) != null) {
        problems.add("board #" + board.id() + " appears twice; the second is left out");
      }
    }
    // the first way (in way order) that feeds a board carries its demand; later ones are reported
    Map<Long, Long> fedFrom = new HashMap<>();
    for (BoardSpec board : byId.values()) {
      board.circuits().stream()
          .filter(c -> c.feedsBoardId() != null)
          .sorted(
              java.util.Comparator.comparingInt(CircuitSpec::wayNumber)
                  .thenComparingLong(CircuitSpec::id))
          .forEach(
              c -> {
                Long child = c.feedsBoardId();
                if (!byId.containsKey(child)) {
                  com.wayledger.engine.PositionWords words =
                      com.wayledger.engine.PositionWords.of(site, board);
                  problems.add(
                      words.board()
                          + " "
                          + board.reference()
                          + " "
                          + words.place(c.wayNumber(), c.position())
                          + " feeds "
                          + words.board()
                          + " #"
                          + child
                          + ", which is not on this site");
                } else if (fedFrom.putIfAbsent(child, board.id()) != null
                    && !fedFrom.get(child).equals(board.id())) {
                  problems.add(
                      "board #"
                          + child
                          + " is fed from more than one board; only the way on board #"
                          + fedFrom.get(child)
                          + " carries its demand");
                }
              });
    }
    for (BoardSpec board : byId.values()) {
      Long feeder = fedFrom.get(board.id());
      if (board.parentBoardId() != null && !board.parentBoardId().equals(feeder)) {
        problems.add(
            "board "
                + board.reference()
                + " names board #"
                + board.parentBoardId()
                + " as its parent but no way there feeds it; its demand is not carried up");
      }
    }

    Map<Long, BoardDemand> done = new HashMap<>();
    Map<Long, Boolean> onPath = new HashMap<>();
    List<BoardDemand> ordered = new ArrayList<>(byId.size());
    for (BoardSpec board : byId.values()) {
      visit(
          board,
          byId,
          fedFrom,
          methods,
          site,
          settings,
          dwellingByBoardId,
          u0,
          done,
          onPath,
          ordered,
          problems,
          new ArrayList<>());
    }
    return new SiteDemand(site.id(), site.name(), settings, u0, ordered, problems);
  }

  private static void visit(
      BoardSpec board,
      Map<Long, BoardSpec> byId,
      Map<Long, Long> fedFrom,
      DiversityMethodCatalog methods,
      SiteSpec site,
      DemandSettings settings,
      Map<Long, DwellingParameters> dwellingByBoardId,
      double u0,
      Map<Long, BoardDemand> done,
      Map<Long, Boolean> onPath,
      List<BoardDemand> ordered,
      List<String> problems,
      List<String> path) {
    if (done.containsKey(board.id()) || Boolean.TRUE.equals(onPath.get(board.id()))) {
      return;
    }
    onPath.put(board.id(), true);
    path.add(board.reference());
    Map<Long, BoardDemand> children = new HashMap<>();
    for (CircuitSpec circuit : board.circuits()) {
      Long childId = circuit.feedsBoardId();
      if (childId == null || !byId.containsKey(childId)) {
        continue;
      }
      if (Boolean.TRUE.equals(onPath.get(childId))) {
        BoardSpec child = byId.get(childId);
        int start = path.indexOf(child.reference());
        List<String> loop = new ArrayList<>(path.subList(Math.max(0, start), path.size()));
        loop.add(child.reference());
        problems.add(
            "boards feed each other in a cycle ("
                + String.join(" → ", loop)
                + "); the demand is not carried round it");
        continue;
      }
      visit(
          byId.get(childId),
          byId,
          fedFrom,
          methods,
          site,
          settings,
          dwellingByBoardId,
          u0,
          done,
          onPath,
          ordered,
          problems,
          path);
      BoardDemand child = done.get(childId);
      if (child != null && Long.valueOf(board.id()).equals(fedFrom.get(childId))) {
        children.put(childId, child);
      }
    }
    path.remove(path.size() - 1);
    onPath.put(board.id(), false);
    BoardDemand result =
        evaluateWithChildren(
            board,
            site.supply(),
            methods,
            site.defaultDiversityMethodKey(),
            settings,
            dwellingByBoardId.getOrDefault(board.id(), DwellingParameters.UNKNOWN),
            u0,
            children,
            com.wayledger.engine.PositionWords.of(site, board));
    done.put(board.id(), result);
    ordered.add(result);
  }

  /**
   * Evaluates one board on its own, with the default settings: ways that feed sub-boards carry only
   * their own loads, and say so.
   *
   * @param board the board
   * @param supply the site's supply (for U0 and the supply fuse); null when unknown
   * @param methods methods the board's key is looked up in
   * @param siteDefaultMethodKey the site's default method key; may be null
   */
  public static BoardDemand evaluateBoard(
      BoardSpec board,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey) {
    return evaluateBoard(
        board,
        supply,
        methods,
        siteDefaultMethodKey,
        DemandSettings.DEFAULTS,
        DwellingParameters.UNKNOWN);
  }

  /** Evaluates one board on its own with the given settings and NEC dwelling data. */
  public static BoardDemand evaluateBoard(
      BoardSpec board,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey,
      DemandSettings settings,
      DwellingParameters dwelling) {
    return evaluateWithChildren(
        board,
        supply,
        methods,
        siteDefaultMethodKey,
        settings,
        dwelling,
        nominalVoltage(supply, settings),
        Map.of(),
        com.wayledger.engine.PositionWords.ofSystem(
            board.systemOn(supply == null ? null : supply.system())));
  }

  private static BoardDemand evaluateWithChildren(
      BoardSpec board,
      SupplySpec supply,
      DiversityMethodCatalog methods,
      String siteDefaultMethodKey,
      DemandSettings settings,
      DwellingParameters dwelling,
      double u0,
      Map<Long, BoardDemand> children,
      com.wayledger.engine.PositionWords words) {
    List<String> notes = new ArrayList<>();
    DiversityMethod method =
        methods.resolve(
            board.diversityMethodKey(), siteDefaultMethodKey, settings.fallbackMethodKey());
    noteUnusableKey(board.diversityMethodKey(), "board", methods, notes);
    if (board.diversityMethodKey() == null) {
      noteUnusableKey(siteDefaultMethodKey, "site default", methods, notes);
    }
    if (supply == null || !(supply.nominalVoltageToEarthVolts() > 0)) {
      notes.add("supply voltage unknown; U0 = " + u0 + " V assumed");
    }
    return BoardCalculation.evaluate(
        board,
        new BoardCalculation.Context(
            u0, method, dwelling, settings, supply, children, notes, words));
  }

  private static void noteUnusableKey(
      String key, String whose, DiversityMethodCatalog methods, List<String> notes) {
    if (key == null) {
      return;
    }
    Optional<DiversityMethod> found = methods.find(key);
    if (found.isEmpty()) {
      notes.add(
          "the "
              + whose
              + " diversity method \""
              + key
              + "\" is unknown; the next choice was used");
    } else if (!found.get().problems().isEmpty()) {
      notes.add(
          "the "
              + whose
              + " diversity method \""
              + key
              + "\" has problems ("
              + String.join("; ", found.get().problems())
              + "); the next choice was used");
    }
  }

  private static double nominalVoltage(SupplySpec supply, DemandSettings settings) {
    return supply != null && supply.nominalVoltageToEarthVolts() > 0
        ? supply.nominalVoltageToEarthVolts()
        : settings.nominalVoltageVolts();
  }
}
