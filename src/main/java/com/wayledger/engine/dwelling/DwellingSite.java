package com.wayledger.engine.dwelling;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.ConnectedLoad;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Finds the dwelling units of a site and works their Article 220 worksheets, board by board:
 *
 * <ul>
 *   <li>a board with dwelling inputs is one dwelling unit; its loads are its own and those of the
 *       boards below it that are not dwelling units themselves;
 *   <li>a board without dwelling inputs that has dwelling boards below it (a house or meter-bank
 *       panelboard) works the standard method over all of them, with its own loads as house loads;
 *   <li>any board with recorded maximum demands works 220.87.
 * </ul>
 */
public final class DwellingSite {

  /** Line-to-neutral voltages up to this are taken as a North American system (120 V). */
  static final double NORTH_AMERICAN_U0_LIMIT_VOLTS = 150.0;

  private DwellingSite() {}

  /**
   * @param site the site as the engine sees it
   * @param inputs dwelling inputs by board id (boards without an entry are not dwelling units)
   * @param records recorded maximum demands by board id
   * @return worksheets by board id; boards with none are left out
   */
  public static Map<Long, List<Worksheet>> worksheets(
      SiteSpec site,
      Map<Long, DwellingInputs> inputs,
      Map<Long, List<MeasuredMaximumDemand>> records) {
    Map<Long, BoardSpec> byId = new LinkedHashMap<>();
    Map<Long, List<BoardSpec>> children = new HashMap<>();
    for (BoardSpec board : site.boards()) {
      byId.put(board.id(), board);
    }
    for (BoardSpec board : site.boards()) {
      if (board.parentBoardId() != null && byId.containsKey(board.parentBoardId())) {
        children.computeIfAbsent(board.parentBoardId(), k -> new ArrayList<>()).add(board);
      }
    }
    double u0 = site.supply().nominalVoltageToEarthVolts();
    SupplySystem system = site.supply().system();
    Map<Long, List<Worksheet>> out = new LinkedHashMap<>();
    for (BoardSpec board : site.boards()) {
      List<DwellingUnit> units = new ArrayList<>();
      List<ApplianceLoad> houseLoads = new ArrayList<>();
      if (inputs.containsKey(board.id())) {
        units.add(unitOf(board, inputs.get(board.id()), children, inputs, u0, system));
      } else {
        List<ApplianceLoad> below = new ArrayList<>();
        collectUnits(board, children, inputs, u0, system, units, below, 0);
        if (!units.isEmpty()) {
          houseLoads.addAll(loadsOf(board, u0, system));
          houseLoads.addAll(below);
        }
      }
      List<MeasuredMaximumDemand> recorded = records.getOrDefault(board.id(), List.of());
      if (units.isEmpty() && recorded.isEmpty()) {
        continue;
      }
      double volts = dividingVolts(board, u0);
      Double rating = board.incomerTripRatingAmps();
      out.put(
          board.id(),
          NecDwellingCalculator.worksheets(
              units, houseLoads, recorded, rating == null ? null : rating * volts, volts));
    }
    return out;
  }

  /**
   * The voltage that turns a board's VA into line amperes: 240 V for a 120/240 V single-phase
   * three-wire board (2 × U0), √3 × UL = 3 × U0 for a three-phase board; U0 for a single-phase
   * board of a system above 150 V to earth.
   */
  public static double dividingVolts(BoardSpec board, double u0) {
    if (board.isThreePhase()) {
      return 3.0 * u0;
    }
    return u0 <= NORTH_AMERICAN_U0_LIMIT_VOLTS ? 2.0 * u0 : u0;
  }

  /**
   * The dwelling units below a board, and the loads of the boards below it that are not dwelling
   * units nor below one (a common-area panel): house loads of a multifamily calculation.
   */
  private static void collectUnits(
      BoardSpec board,
      Map<Long, List<BoardSpec>> children,
      Map<Long, DwellingInputs> inputs,
      double u0,
      SupplySystem system,
      List<DwellingUnit> units,
      List<ApplianceLoad> houseLoads,
      int depth) {
    if (depth > 64) {
      return; // a cycle; the demand engine reports it
    }
    for (BoardSpec child : children.getOrDefault(board.id(), List.of())) {
      if (inputs.containsKey(child.id())) {
        units.add(unitOf(child, inputs.get(child.id()), children, inputs, u0, system));
      } else {
        houseLoads.addAll(loadsOf(child, u0, system));
        collectUnits(child, children, inputs, u0, system, units, houseLoads, depth + 1);
      }
    }
  }

  private static DwellingUnit unitOf(
      BoardSpec board,
      DwellingInputs unitInputs,
      Map<Long, List<BoardSpec>> children,
      Map<Long, DwellingInputs> inputs,
      double u0,
      SupplySystem system) {
    List<ApplianceLoad> loads = new ArrayList<>(loadsOf(board, u0, system));
    List<BoardSpec> below = new ArrayList<>(children.getOrDefault(board.id(), List.of()));
    for (int i = 0; i < below.size() && i < 10_000; i++) {
      BoardSpec child = below.get(i);
      if (!inputs.containsKey(child.id())) {
        loads.addAll(loadsOf(child, u0, system));
        below.addAll(children.getOrDefault(child.id(), List.of()));
      }
    }
    return new DwellingUnit(board.id(), board.reference(), unitInputs, loads);
  }

  /**
   * The board's own load lines in VA (circuits feeding another board carry none), each marked line
   * to line when its circuit sits in a two-pole position (a 240 V load on a 120/240 V board: no
   * neutral current, NEC 220.61). A rating in A is turned into VA at the voltage of its position:
   * U0 line to neutral, the line-to-line voltage for two poles, 3 × U0 for three. A circuit whose
   * position is not recorded is taken at the line-to-line voltage (the larger VA, the safe side)
   * and counted on the neutral. The board's own supply system, when it records one, gives the
   * line-to-line voltage (208 V on a 120/208 V panel).
   */
  static List<ApplianceLoad> loadsOf(BoardSpec board, double u0, SupplySystem siteSystem) {
    SupplySystem system = board.systemOn(siteSystem);
    List<ApplianceLoad> loads = new ArrayList<>();
    double lineVolts = u0 <= NORTH_AMERICAN_U0_LIMIT_VOLTS ? 2.0 * u0 : u0;
    for (CircuitSpec circuit : board.circuits()) {
      PhasePosition position = circuit.position();
      boolean lineToLine = position != null && position.isLineToLine();
      double perAmp =
          position == null ? lineVolts : LinePhasors.voltAmperesPerAmp(system, position, u0);
      for (LoadSpec load : circuit.loads()) {
        ConnectedLoad connected = ConnectedLoad.ofPerAmp(load, perAmp);
        if (!connected.isAssessed() || load.quantity() < 1) {
          continue;
        }
        double each = connected.apparentVoltAmperes() / load.quantity();
        String name =
            load.description() == null || load.description().isBlank()
                ? circuit.description()
                : load.description();
        if (load.ratingUnit() == RatingUnit.A) {
          name += " (rated in A, taken at " + Lines.figure(perAmp) + " V)";
        }
        loads.add(new ApplianceLoad(name, load.category(), load.quantity(), each, lineToLine));
      }
    }
    return loads;
  }
}
