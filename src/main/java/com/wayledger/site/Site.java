package com.wayledger.site;

import com.wayledger.engine.EarthingSystem;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.PrePersist;
import jakarta.persistence.PreUpdate;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

/** One installation with one supply origin. */
@Entity
@Table(name = "site")
public class Site {

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  private String name;
  private String address;

  @Enumerated(EnumType.STRING)
  private EarthingSystem earthingSystem;

  private double nominalVoltageVolts;
  private int phases;
  private double frequencyHertz;
  private Double externalLoopImpedanceOhms;

  @Column(name = "prospective_fault_current_kiloamps")
  private Double prospectiveFaultCurrentKiloAmps;

  private Double supplyFuseRatingAmps;
  private String defaultDiversityMethod;
  private String notes;

  /** Key of the rule set the site is checked against (engine.rules.RuleSets); fixed at creation. */
  private String ruleSet = com.wayledger.engine.SiteSpec.DEFAULT_RULE_SET_KEY;

  @Enumerated(EnumType.STRING)
  private com.wayledger.engine.SupplySystem supplySystem =
      com.wayledger.engine.SupplySystem.IEC_WYE;

  private double loadingThresholdPercent = SiteForm.DEFAULT_LOADING_THRESHOLD_PERCENT;

  /** Cable conditions this site's circuits inherit unless they record their own. */
  @jakarta.persistence.Embedded private com.wayledger.site.CableDefaults defaults;

  /** Start-up multiple per load category, for loads that record none. */
  @jakarta.persistence.ElementCollection(fetch = jakarta.persistence.FetchType.EAGER)
  @jakarta.persistence.CollectionTable(
      name = "site_start_up_multiple",
      joinColumns = @jakarta.persistence.JoinColumn(name = "site_id"))
  @jakarta.persistence.MapKeyEnumerated(jakarta.persistence.EnumType.STRING)
  @jakarta.persistence.MapKeyColumn(name = "category")
  @jakarta.persistence.Column(name = "multiple")
  private java.util.Map<com.wayledger.engine.LoadCategory, Double> startUpMultiples =
      new java.util.EnumMap<>(com.wayledger.engine.LoadCategory.class);

  /** The cable defaults set here (never null; empty when nothing is set). */
  public com.wayledger.site.CableDefaults getDefaults() {
    return defaults == null ? com.wayledger.site.CableDefaults.none() : defaults;
  }

  /** Start-up multiples set here, by load category. */
  public java.util.Map<com.wayledger.engine.LoadCategory, Double> getStartUpMultiples() {
    return java.util.Collections.unmodifiableMap(startUpMultiples);
  }

  /** Replaces the defaults set here. */
  public void applyDefaults(com.wayledger.site.DefaultsForm form) {
    defaults = form.cable();
    startUpMultiples.clear();
    startUpMultiples.putAll(form.startUpMultiples());
  }

  @Version private long version;

  private Instant createdAt;
  private Instant updatedAt;

  protected Site() {}

  public Site(String name) {
    this.name = name;
  }

  @PrePersist
  @PreUpdate
  void touch() {
    updatedAt = Instant.now();
    if (createdAt == null) {
      createdAt = updatedAt;
    }
  }

  /** Copies every editable field from a validated form. */
  void apply(SiteForm form) {
    if (id == null && form.ruleSet() != null) {
      // chosen when the site is created and kept: every record and finding of the site is read in
      // one rule set's terms
      ruleSet = form.ruleSet();
    }
    if (form.supplySystem() != null) {
      supplySystem = form.supplySystem();
    }
    name = form.name().strip();
    address = blankToNull(form.address());
    earthingSystem = form.earthingSystem();
    nominalVoltageVolts = form.nominalVoltageVolts();
    phases = form.phases();
    frequencyHertz = form.frequencyHertz();
    externalLoopImpedanceOhms = form.externalLoopImpedanceOhms();
    prospectiveFaultCurrentKiloAmps = form.prospectiveFaultCurrentKiloAmps();
    supplyFuseRatingAmps = form.supplyFuseRatingAmps();
    defaultDiversityMethod = blankToNull(form.defaultDiversityMethod());
    notes = blankToNull(form.notes());
    if (form.loadingThresholdPercent() != null) {
      loadingThresholdPercent = form.loadingThresholdPercent();
    }
  }

  private static String blankToNull(String text) {
    return text == null || text.isBlank() ? null : text.strip();
  }

  public Long getId() {
    return id;
  }

  public String getName() {
    return name;
  }

  public String getAddress() {
    return address;
  }

  public EarthingSystem getEarthingSystem() {
    return earthingSystem;
  }

  public double getNominalVoltageVolts() {
    return nominalVoltageVolts;
  }

  public int getPhases() {
    return phases;
  }

  public double getFrequencyHertz() {
    return frequencyHertz;
  }

  public Double getExternalLoopImpedanceOhms() {
    return externalLoopImpedanceOhms;
  }

  public Double getProspectiveFaultCurrentKiloAmps() {
    return prospectiveFaultCurrentKiloAmps;
  }

  public Double getSupplyFuseRatingAmps() {
    return supplyFuseRatingAmps;
  }

  public String getDefaultDiversityMethod() {
    return defaultDiversityMethod;
  }

  /** Key of the site's rule set ("IEC", "NEC"). */
  public String getRuleSet() {
    return ruleSet;
  }

  /** The units sizes and lengths are read and typed in on this site (mm²/m or AWG/ft). */
  public com.wayledger.engine.rules.CableUnits cableUnits() {
    return com.wayledger.engine.rules.CableUnits.ofRuleSet(ruleSet);
  }

  public com.wayledger.engine.SupplySystem getSupplySystem() {
    return supplySystem;
  }

  public String getNotes() {
    return notes;
  }

  /** Loading of a board's incomer above which the site overview highlights it, %. */
  public double getLoadingThresholdPercent() {
    return loadingThresholdPercent;
  }

  public long getVersion() {
    return version;
  }

  public Instant getUpdatedAt() {
    return updatedAt;
  }
}
