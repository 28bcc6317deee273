package com.wayledger.engine.rules;

import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.ProtectionEngine;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import java.util.List;
import java.util.Map;

/** IEC 60364 / BS 7671: the protection and cable checks of {@link ProtectionEngine}, unchanged. */
final class IecRuleSet implements RuleSet {

  @Override
  public String key() {
    return "IEC";
  }

  @Override
  public String title() {
    return "IEC 60364 / BS 7671";
  }

  @Override
  public List<SupplySystem> supplySystems() {
    return List.of(SupplySystem.IEC_WYE);
  }

  @Override
  public boolean usesAwgAndFeet() {
    return false;
  }

  @Override
  public SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings) {
    return ProtectionEngine.check(site, loadingByCircuit, loadingByBoard, mccbSettings, settings);
  }
}
