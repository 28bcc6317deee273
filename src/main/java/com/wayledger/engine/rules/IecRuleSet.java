package com.wayledger.engine.rules;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.DeviceProposer;
import com.wayledger.engine.protection.ProtectionEngine;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

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

  /** The locations of the IEC residual-current rules (ResidualCurrentRules), unchanged. */
  private static final Set<CircuitLocation> LOCATIONS =
      java.util.Collections.unmodifiableSet(
          EnumSet.of(
              CircuitLocation.INDOORS,
              CircuitLocation.OUTDOORS,
              CircuitLocation.BATH_OR_SHOWER,
              CircuitLocation.SWIMMING_POOL,
              CircuitLocation.SAUNA,
              CircuitLocation.AGRICULTURAL));

  @Override
  public Set<CircuitLocation> circuitLocations() {
    return LOCATIONS;
  }

  @Override
  public DeviceProposal propose(
      SiteSpec site,
      long circuitId,
      CircuitLoading loading,
      ProtectionSettings settings,
      Set<Long> dwellingBoardIds) {
    return DeviceProposer.propose(site, circuitId, loading, settings);
  }
}
