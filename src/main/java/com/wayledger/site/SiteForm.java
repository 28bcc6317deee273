package com.wayledger.site;

import com.wayledger.engine.EarthingSystem;
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
    @DecimalMin(value = "1") @DecimalMax(value = "100") Double loadingThresholdPercent) {

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
        null);
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
        DEFAULT_LOADING_THRESHOLD_PERCENT);
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
        site.getLoadingThresholdPercent());
  }
}
