package com.wayledger.site;

import com.wayledger.engine.EarthingSystem;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;

/** What a user may edit on a site; the version guards against overwriting someone else's change. */
public record SiteForm(
    @NotBlank @Size(max = 120) String name,
    @Size(max = 500) String address,
    @NotNull EarthingSystem earthingSystem,
    @NotNull @DecimalMin(value = "50") @DecimalMax(value = "1000") Double nominalVoltageVolts,
    @NotNull Integer phases,
    @NotNull Double frequencyHertz,
    @Positive @DecimalMax("100") Double externalLoopImpedanceOhms,
    @Positive @DecimalMax("200") Double prospectiveFaultCurrentKiloAmps,
    @Positive @DecimalMax("6300") Double supplyFuseRatingAmps,
    @Size(max = 60) String defaultDiversityMethod,
    @Size(max = 2000) String notes,
    Long version) {

  /** A new site with the usual defaults filled in (230 V, three-phase, 50 Hz, TN-C-S). */
  public static SiteForm blank() {
    return new SiteForm(
        "", "", EarthingSystem.TN_C_S, 230.0, 3, 50.0, null, null, null, null, "", null);
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
        site.getVersion());
  }
}
