package com.wayledger.engine.rules;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.nec.NecCircuitChecks;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.CircuitLoading;
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
 * not run. The fault level, loop impedance and voltage drop figures are physics and are kept.
 */
final class NecRuleSet implements RuleSet {

  static final String REF_OVERLOAD =
      "NEC 408.36 (panelboard overcurrent protection), 215.3, 230.90: load within the rating";
  static final String REF_UNBALANCE =
      "common practice: no NEC clause limits unbalance (NEMA MG-1 definition applied to currents)";

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
        SupplySystem.SPLIT_PHASE_120_240, SupplySystem.WYE_208Y_120, SupplySystem.WYE_480Y_277);
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
    SiteFindings physics =
        ProtectionEngine.check(site, loadingByCircuit, loadingByBoard, mccbSettings, settings);
    Map<Long, CircuitSpec> circuits = new HashMap<>();
    for (BoardSpec board : site.boards()) {
      board.circuits().forEach(c -> circuits.put(c.id(), c));
    }
    List<BoardFindings> boards = new ArrayList<>();
    for (BoardFindings board : physics.boards()) {
      List<CircuitFindings> circuitFindings = new ArrayList<>();
      for (CircuitFindings iec : board.circuits()) {
        CircuitSpec circuit = circuits.get(iec.circuitId());
        CircuitLoading loading = loadingByCircuit.get(iec.circuitId());
        List<Finding> nec =
            NecCircuitChecks.assess(
                site.supply().system(),
                site.supply().nominalVoltageToEarthVolts(),
                circuit,
                loading == null ? null : loading.designCurrentAmps());
        circuitFindings.add(
            new CircuitFindings(
                    iec.circuitId(),
                    iec.wayNumber(),
                    iec.loopImpedanceOhms(),
                    NecCircuitChecks.ampacityAmps(circuit),
                    iec.voltageDropFromOriginPercent(),
                    iec.startUpSurgeAmps(),
                    nec)
                .placed(iec.boardReference(), iec.position(), iec.description()));
      }
      boards.add(
          new BoardFindings(
              board.boardId(),
              board.reference(),
              board.faultLevel(),
              relabelled(board.findings()),
              circuitFindings));
    }
    return new SiteFindings(settings, relabelled(physics.siteFindings()), boards);
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
