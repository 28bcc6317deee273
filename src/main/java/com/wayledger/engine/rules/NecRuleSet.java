package com.wayledger.engine.rules;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.nec.CircuitContext;
import com.wayledger.engine.nec.DwellingProtection;
import com.wayledger.engine.nec.NecCircuitChecks;
import com.wayledger.engine.nec.NecDeviceProposer;
import com.wayledger.engine.nec.VoltageDrop;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.ProtectionEngine;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The NEC (NFPA 70) rule set. Circuits get the NEC checks of {@link NecCircuitChecks} in place of
 * the IEC ones. Of the board's own findings only the loading ones carry over (incomer, busbar and
 * supply overload, unbalance) with the NEC's clause or "common practice" in place of the IEC one;
 * the fault-loop, voltage-drop, selectivity and residual-current checks written for IEC devices are
 * not run. The fault level, loop impedance and voltage drop figures are physics and are kept. The
 * NEC's own voltage drop (Chapter 9 Table 9), interrupting rating (110.9) and dwelling GFCI/AFCI
 * rules run per circuit with a {@link CircuitContext} worked out here for each board.
 */
final class NecRuleSet implements RuleSet {

  static final String REF_OVERLOAD =
      "NEC 408.36 (panelboard overcurrent protection), 215.3, 230.90: load within the rating";
  static final String REF_UNBALANCE =
      "common practice: no NEC clause limits unbalance; largest deviation from the mean line current"
          + " / mean (NEMA MG-1 definition applied to currents; on two lines |IA − IB| / (IA + IB))";

  private static final Set<CheckKind> KEPT_BOARD_CHECKS =
      Set.of(
          CheckKind.INCOMER_OVERLOAD,
          CheckKind.BUSBAR_OVERLOAD,
          CheckKind.SUPPLY_FUSE_OVERLOAD,
          CheckKind.PHASE_UNBALANCE);

  @Override
  public String key() {
    return "NEC";
  }

  @Override
  public String title() {
    return "NEC (NFPA 70)";
  }

  @Override
  public List<SupplySystem> supplySystems() {
    return List.of(
        SupplySystem.SPLIT_PHASE_120_240,
        SupplySystem.WYE_208Y_120,
        SupplySystem.WYE_480Y_277,
        SupplySystem.SINGLE_PHASE_120_208);
  }

  @Override
  public boolean usesAwgAndFeet() {
    return true;
  }

  @Override
  public SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings) {
    return check(site, loadingByCircuit, loadingByBoard, mccbSettings, settings, Set.of());
  }

  @Override
  public SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings,
      Set<Long> dwellingBoardIds) {
    SiteFindings physics =
        ProtectionEngine.check(site, loadingByCircuit, loadingByBoard, mccbSettings, settings);
    Map<Long, CircuitSpec> circuits = new HashMap<>();
    Map<Long, BoardSpec> boardsById = new HashMap<>();
    for (BoardSpec board : site.boards()) {
      boardsById.put(board.id(), board);
      board.circuits().forEach(c -> circuits.put(c.id(), c));
    }
    List<BoardFindings> boards = new ArrayList<>();
    for (BoardFindings board : physics.boards()) {
      BoardSpec spec = boardsById.get(board.boardId());
      CircuitContext context = context(site, spec, loadingByBoard, dwellingBoardIds);
      List<CircuitFindings> circuitFindings = new ArrayList<>();
      for (CircuitFindings iec : board.circuits()) {
        CircuitSpec circuit = circuits.get(iec.circuitId());
        CircuitLoading loading = loadingByCircuit.get(iec.circuitId());
        List<Finding> nec =
            NecCircuitChecks.assess(
                context, circuit, loading == null ? null : loading.designCurrentAmps());
        circuitFindings.add(
            new CircuitFindings(
                    iec.circuitId(),
                    iec.wayNumber(),
                    iec.loopImpedanceOhms(),
                    NecCircuitChecks.ampacityAmps(circuit),
                    iec.voltageDropFromOriginPercent(),
                    iec.startUpSurgeAmps(),
                    nec)
                .placed(iec.boardReference(), iec.position(), iec.description(), iec.words()));
      }
      List<Finding> boardFindings = new ArrayList<>(relabelled(board.findings()));
      if (spec != null && spec.incomer() != null) {
        boardFindings.add(
            com.wayledger.engine.nec.InterruptingRating.incomer(spec.incomer(), context));
      }
      boards.add(
          new BoardFindings(
              board.boardId(),
              board.reference(),
              board.faultLevel(),
              boardFindings,
              circuitFindings,
              board.words()));
    }
    return new SiteFindings(settings, relabelled(physics.siteFindings()), boards);
  }

  @Override
  public Set<CircuitLocation> circuitLocations() {
    return DwellingProtection.locations();
  }

  @Override
  public DeviceProposal propose(
      SiteSpec site,
      long circuitId,
      CircuitLoading loading,
      ProtectionSettings settings,
      Set<Long> dwellingBoardIds) {
    for (BoardSpec board : site.boards()) {
      for (CircuitSpec circuit : board.circuits()) {
        if (circuit.id() == circuitId) {
          Map<Long, BoardLoading> none = Map.of();
          return NecDeviceProposer.propose(
              circuit,
              context(site, board, none, dwellingBoardIds),
              loading == null ? null : loading.designCurrentAmps());
        }
      }
    }
    return new DeviceProposal(
        circuitId, null, List.of(), List.of("circuit " + circuitId + " is not on the site"));
  }

  /**
   * What the checks of a board's circuits need from around them: the dwelling flag, the available
   * fault current (recorded at the board, else the origin's taken unreduced — the safe side) and
   * the feeders' drop from the origin.
   */
  static CircuitContext context(
      SiteSpec site,
      BoardSpec board,
      Map<Long, BoardLoading> loadingByBoard,
      Set<Long> dwellingBoardIds) {
    double u0 = site.supply().nominalVoltageToEarthVolts();
    Double fault = null;
    String basis = "";
    if (board != null && board.measuredFaultCurrentKiloAmps() != null) {
      fault = board.measuredFaultCurrentKiloAmps();
      basis = "recorded at the panelboard";
    } else if (site.supply().prospectiveFaultCurrentKiloAmps() != null) {
      fault = site.supply().prospectiveFaultCurrentKiloAmps();
      basis =
          "the service's available fault current taken at the panelboard unreduced, the safe side";
    }
    Double feeders = 0.0;
    String missing = null;
    List<String> notes = new ArrayList<>();
    Map<Long, BoardSpec> byId = new HashMap<>();
    site.boards().forEach(b -> byId.put(b.id(), b));
    BoardSpec at = board;
    int guard = 0;
    while (at != null && guard++ < 64) {
      BoardLoading loading = loadingByBoard.get(at.id());
      Double amps = loading == null ? null : loading.largestPhaseAmps();
      if (at.submainCable() == null) {
        missing = "feeder conductor of " + at.reference();
        break;
      }
      if (amps == null) {
        missing = "design current of " + at.reference();
        break;
      }
      SupplySystem atSystem = site.systemOf(at);
      boolean threeLines = atSystem.lineCount(at.phases()) == 3;
      // unbalance is not credited: a two-wire drop at the largest line current (the neutral taken
      // to carry it as well), or three balanced lines at it
      VoltageDrop.Run run =
          VoltageDrop.of(
              at.submainCable(),
              amps,
              null,
              threeLines,
              threeLines ? atSystem.lineToLineFactor() * u0 : u0);
      if (!run.isKnown()) {
        missing = run.missing() + " of the feeder to " + at.reference();
        break;
      }
      feeders += run.percent();
      notes.add(at.reference() + " " + NecCircuitChecks.fmt(run.percent()) + " %");
      at = at.parentBoardId() == null ? null : byId.get(at.parentBoardId());
    }
    return new CircuitContext(
        board == null ? site.supply().system() : site.systemOf(board),
        u0,
        board != null && dwellingBoardIds.contains(board.id()),
        fault,
        basis,
        missing == null ? feeders : null,
        missing,
        String.join(", ", notes) + "; largest line current, power factor not known");
  }

  private static List<Finding> relabelled(List<Finding> findings) {
    List<Finding> kept = new ArrayList<>();
    for (Finding f : findings) {
      if (!KEPT_BOARD_CHECKS.contains(f.check())) {
        continue;
      }
      String reference = f.check() == CheckKind.PHASE_UNBALANCE ? REF_UNBALANCE : REF_OVERLOAD;
      kept.add(new Finding(f.check(), f.verdict(), f.summary(), f.values(), reference, f.remedy()));
    }
    return kept;
  }
}
