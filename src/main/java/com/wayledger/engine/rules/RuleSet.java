package com.wayledger.engine.rules;

import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import java.util.List;
import java.util.Map;

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
}
