package com.wayledger.engine.rules;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A body of rules a site is checked against: its own supply systems and its own checks, every
 * finding naming the rule set's clause. Implementations are registered in {@link RuleSets}.
 */
public interface RuleSet {

  /** Stable key stored on the site ("IEC", "NEC"); at most 12 characters. */
  String key();

  /** Name for people: "IEC 60364 / BS 7671". */
  String title();

  /** The supply systems a site under this rule set may have; the first is the default. */
  List<SupplySystem> supplySystems();

  /** Whether conductor sizes are shown as AWG/kcmil and lengths in feet. */
  boolean usesAwgAndFeet();

  /**
   * Every check of this rule set on every board and circuit of the site. Never throws on incomplete
   * data: a check lacking an input gives a not-assessed finding naming it.
   *
   * @param loadingByCircuit design currents by circuit id (from the demand engine)
   * @param loadingByBoard line currents and unbalance by board id
   */
  SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings);

  /**
   * The same checks knowing which boards serve a dwelling unit (the NEC's dwelling rules read it; a
   * rule set without such rules ignores it).
   *
   * @param dwellingBoardIds ids of the boards recorded as serving a dwelling unit
   */
  default SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings,
      Set<Long> dwellingBoardIds) {
    return check(site, loadingByCircuit, loadingByBoard, mccbSettings, settings);
  }

  /** The circuit locations this rule set's rules know; any other is refused on its sites. */
  Set<CircuitLocation> circuitLocations();

  /**
   * The device (and, where the rule set sizes one, the conductor) proposed for a circuit: the
   * lowest that passes this rule set's checks, or why none does.
   *
   * @param dwellingBoardIds ids of the boards recorded as serving a dwelling unit
   */
  DeviceProposal propose(
      SiteSpec site,
      long circuitId,
      CircuitLoading loading,
      ProtectionSettings settings,
      Set<Long> dwellingBoardIds);
}
