package com.wayledger.site;

import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.system.CleanText;
import com.wayledger.system.TextInput.Kind;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;

/** What a user may edit on a site; the version guards against overwriting someone else's change. */
public record SiteForm(
    @NotBlank @Size(max = 120) @CleanText(Kind.NAME) String name,
    @Size(max = 500) @CleanText(Kind.LINE) String address,
    @NotNull EarthingSystem earthingSystem,
    @NotNull @DecimalMin(value = "50") @DecimalMax(value = "1000") Double nominalVoltageVolts,
    @NotNull Integer phases,
    @NotNull Double frequencyHertz,
    @Positive @DecimalMax("100") Double externalLoopImpedanceOhms,
    @Positive @DecimalMax("200") Double prospectiveFaultCurrentKiloAmps,
    @Positive @DecimalMax("6300") Double supplyFuseRatingAmps,
    @Size(max = 60) @CleanText(Kind.LINE) String defaultDiversityMethod,
    @Size(max = 2000) @CleanText(Kind.MULTI_LINE) String notes,
    Long version,
    @DecimalMin(value = "1") @DecimalMax(value = "100") Double loadingThresholdPercent,
    @Size(max = 12) String ruleSet,
    SupplySystem supplySystem) {

  /** The form without a rule set or supply system: IEC 60364 / BS 7671 on the IEC wye. */
  public SiteForm(
      String name,
      String address,
      EarthingSystem earthingSystem,
      Double nominalVoltageVolts,
      Integer phases,
      Double frequencyHertz,
      Double externalLoopImpedanceOhms,
      Double prospectiveFaultCurrentKiloAmps,
      Double supplyFuseRatingAmps,
      String defaultDiversityMethod,
      String notes,
      Long version,
      Double loadingThresholdPercent) {
    this(
        name,
        address,
        earthingSystem,
        nominalVoltageVolts,
        phases,
        frequencyHertz,
        externalLoopImpedanceOhms,
        prospectiveFaultCurrentKiloAmps,
        supplyFuseRatingAmps,
        defaultDiversityMethod,
        notes,
        version,
        loadingThresholdPercent,
        null,
        null);
  }

  /** The rule set's key; the IEC set when none is given. */
  public String ruleSetOrDefault() {
    return ruleSet == null || ruleSet.isBlank() ? SiteSpec.DEFAULT_RULE_SET_KEY : ruleSet.strip();
  }

  /**
   * The form as it is stored: the rule set filled in, the supply system defaulted to the rule set's
   * first, and a North American system's fixed voltage to neutral and number of phases (120/240 V:
   * 120 V, one phase three-wire; 208Y/120 V: 120 V, three; 480Y/277 V: 277 V, three) put in place
   * of what was typed.
   */
  public SiteForm normalised() {
    String key = ruleSetOrDefault();
    SupplySystem system = supplySystem;
    if (system == null) {
      system =
          com.wayledger.engine.rules.RuleSets.find(key)
              .map(r -> r.supplySystems().get(0))
              .orElse(SupplySystem.IEC_WYE);
    }
    Double volts =
        system.lineToNeutralVolts() == null ? nominalVoltageVolts : system.lineToNeutralVolts();
    Integer lines = system == SupplySystem.IEC_WYE ? phases : system.hasTwoLines() ? 1 : 3;
    return new SiteForm(
        name,
        address,
        earthingSystem,
        volts,
        lines,
        frequencyHertz,
        externalLoopImpedanceOhms,
        prospectiveFaultCurrentKiloAmps,
        supplyFuseRatingAmps,
        defaultDiversityMethod,
        notes,
        version,
        loadingThresholdPercent,
        key,
        system);
  }

  /**
   * Boards whose largest phase current passes this share of their incomer rating are highlighted on
   * the site overview (loadlog headroom), %. 80 % is common practice for leaving room for growth,
   * not a rule.
   */
  public static final double DEFAULT_LOADING_THRESHOLD_PERCENT = 80.0;

  /** The form without a loading threshold: the site keeps its threshold (80 % for a new site). */
  public SiteForm(
      String name,
      String address,
      EarthingSystem earthingSystem,
      Double nominalVoltageVolts,
      Integer phases,
      Double frequencyHertz,
      Double externalLoopImpedanceOhms,
      Double prospectiveFaultCurrentKiloAmps,
      Double supplyFuseRatingAmps,
      String defaultDiversityMethod,
      String notes,
      Long version) {
    this(
        name,
        address,
        earthingSystem,
        nominalVoltageVolts,
        phases,
        frequencyHertz,
        externalLoopImpedanceOhms,
        prospectiveFaultCurrentKiloAmps,
        supplyFuseRatingAmps,
        defaultDiversityMethod,
        notes,
        version,
        (Double) null);
  }

  /** A new site with the usual defaults filled in (230 V, three-phase, 50 Hz, TN-C-S). */
  public static SiteForm blank() {
    return new SiteForm(
        "",
        "",
        EarthingSystem.TN_C_S,
        230.0,
        3,
        50.0,
        null,
        null,
        null,
        null,
        "",
        null,
        DEFAULT_LOADING_THRESHOLD_PERCENT,
        SiteSpec.DEFAULT_RULE_SET_KEY,
        SupplySystem.IEC_WYE);
  }

  public static SiteForm of(Site site) {
    return new SiteForm(
        site.getName(),
        site.getAddress(),
        site.getEarthingSystem(),
        site.getNominalVoltageVolts(),
        site.getPhases(),
        site.getFrequencyHertz(),
        site.getExternalLoopImpedanceOhms(),
        site.getProspectiveFaultCurrentKiloAmps(),
        site.getSupplyFuseRatingAmps(),
        site.getDefaultDiversityMethod(),
        site.getNotes(),
        site.getVersion(),
        site.getLoadingThresholdPercent(),
        site.getRuleSet(),
        site.getSupplySystem());
  }
}
