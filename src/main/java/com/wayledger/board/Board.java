package com.wayledger.board;

import com.wayledger.site.Site;
import jakarta.persistence.AttributeOverride;
import jakarta.persistence.AttributeOverrides;
import jakarta.persistence.Column;
import jakarta.persistence.Embedded;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.PrePersist;
import jakarta.persistence.PreUpdate;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/** A distribution board, fed from the site's origin or from a way of a parent board. */
@Entity
@Table(name = "board")
public class Board {

  @Id
  @GeneratedValue(strategy = GenerationType.IDENTITY)
  private Long id;

  @ManyToOne(optional = false)
  @JoinColumn(name = "site_id")
  private Site site;

  private String reference;
  private String location;
  private int phases;
  private int wayCount;
  private Double busbarRatingAmps;

  @Embedded
  @AttributeOverrides({
    @AttributeOverride(name = "kind", column = @Column(name = "incomer_kind")),
    @AttributeOverride(name = "curve", column = @Column(name = "incomer_curve")),
    @AttributeOverride(name = "ratingAmps", column = @Column(name = "incomer_rating_amps")),
    @AttributeOverride(name = "poles", column = @Column(name = "incomer_poles")),
    @AttributeOverride(
        name = "breakingCapacityKiloAmps",
        column = @Column(name = "incomer_breaking_capacity_kiloamps")),
    @AttributeOverride(
        name = "residualMilliAmps",
        column = @Column(name = "incomer_residual_milliamps")),
    @AttributeOverride(name = "rcdType", column = @Column(name = "incomer_rcd_type")),
    @AttributeOverride(
        name = "overloadSettingAmps",
        column = @Column(name = "incomer_overload_setting_amps")),
    @AttributeOverride(
        name = "instantaneousSettingAmps",
        column = @Column(name = "incomer_instantaneous_setting_amps"))
  })
  private DeviceDetails incomer;

  @ManyToOne
  @JoinColumn(name = "parent_board_id")
  private Board parent;

  private Long fedFromCircuitId;

  @Embedded
  @AttributeOverrides({
    @AttributeOverride(
        name = "lineCsaSquareMillimetres",
        column = @Column(name = "submain_line_csa_mm2")),
    @AttributeOverride(
        name = "protectiveCsaSquareMillimetres",
        column = @Column(name = "submain_cpc_csa_mm2")),
    @AttributeOverride(name = "material", column = @Column(name = "submain_material")),
    @AttributeOverride(name = "insulation", column = @Column(name = "submain_insulation")),
    @AttributeOverride(name = "lengthMetres", column = @Column(name = "submain_length_metres")),
    @AttributeOverride(
        name = "installationMethod",
        column = @Column(name = "submain_installation_method")),
    @AttributeOverride(name = "ambientCelsius", column = @Column(name = "submain_ambient_celsius")),
    @AttributeOverride(
        name = "groupedCircuits",
        column = @Column(name = "submain_grouped_circuits")),
    @AttributeOverride(
        name = "thermalInsulationMillimetres",
        column = @Column(name = "submain_thermal_insulation_mm"))
  })
  private CableDetails submain;

  /** The board's own supply system; null when it is its site's (V24). */
  @jakarta.persistence.Enumerated(jakarta.persistence.EnumType.STRING)
  private com.wayledger.engine.SupplySystem supplySystem;

  private double unbalanceLimitPercent;
  private double coincidenceFactor;
  private String diversityMethod;

  @Column(name = "measured_ze_ohms")
  private Double measuredExternalLoopImpedanceOhms;

  @Column(name = "measured_fault_current_kiloamps")
  private Double measuredFaultCurrentKiloAmps;

  /** Cable conditions this board's circuits inherit unless they record their own. */
  @jakarta.persistence.Embedded private com.wayledger.site.CableDefaults defaults;

  /** Start-up multiple per load category, for loads that record none. */
  @jakarta.persistence.ElementCollection(fetch = jakarta.persistence.FetchType.EAGER)
  @jakarta.persistence.CollectionTable(
      name = "board_start_up_multiple",
      joinColumns = @jakarta.persistence.JoinColumn(name = "board_id"))
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

  @OneToMany(mappedBy = "board")
  @OrderBy("wayNumber, position")
  private List<Circuit> circuits = new ArrayList<>();

  protected Board() {}

  public Board(Site site) {
    this.site = site;
  }

  @PrePersist
  @PreUpdate
  void touch() {
    updatedAt = Instant.now();
    if (createdAt == null) {
      createdAt = updatedAt;
    }
  }

  /** Copies every editable field from a validated form; the parent is resolved by the service. */
  void apply(BoardForm form, Board parentBoard) {
    reference = form.reference().strip();
    location =
        form.location() == null || form.location().isBlank() ? null : form.location().strip();
    phases = form.phases();
    wayCount = form.wayCount();
    busbarRatingAmps = form.busbarRatingAmps();
    incomer = form.incomerDevice();
    parent = parentBoard;
    fedFromCircuitId = parentBoard == null ? null : form.fedFromCircuitId();
    submain = form.submainCable();
    unbalanceLimitPercent = form.unbalanceLimitPercent();
    coincidenceFactor = form.coincidenceFactor();
    diversityMethod =
        form.diversityMethod() == null || form.diversityMethod().isBlank()
            ? null
            : form.diversityMethod();
    measuredExternalLoopImpedanceOhms = form.measuredExternalLoopImpedanceOhms();
    measuredFaultCurrentKiloAmps = form.measuredFaultCurrentKiloAmps();
    supplySystem = form.supplySystem();
  }

  /**
   * Number of lines of this board on its supply system: 2 on a single-phase three-wire system
   * (120/240 V or 120/208 V), else 1 or 3 as its phases.
   */
  public int lineCount() {
    return system().lineCount(phases);
  }

  /** The supply system this board is on: its own when recorded, else its site's. */
  public com.wayledger.engine.SupplySystem system() {
    return supplySystem != null ? supplySystem : site.getSupplySystem();
  }

  /** The board's own supply system; null when it is its site's. */
  public com.wayledger.engine.SupplySystem getSupplySystem() {
    return supplySystem;
  }

  /** The positions a circuit on this board may take (two-pole ones on NEC sites only). */
  public java.util.List<com.wayledger.engine.PhasePosition> getPositions() {
    return com.wayledger.engine.PhasePosition.onBoardWith(
        lineCount(), !com.wayledger.engine.SiteSpec.DEFAULT_RULE_SET_KEY.equals(site.getRuleSet()));
  }

  /** The circuit locations the site's rule set knows (the editor offers only these). */
  public java.util.Set<com.wayledger.engine.CircuitLocation> getCircuitLocations() {
    return com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).circuitLocations();
  }

  /** Whether the site's rule set records GFCI/AFCI functions (the NEC set). */
  public boolean isFaultInterrupterRecorded() {
    return com.wayledger.engine.rules.RuleSets.of(site.getRuleSet()).usesAwgAndFeet();
  }

  public boolean isThreePhase() {
    return phases == 3;
  }

  /**
   * Whether the board is laid out as a panelboard (spaces odd left, even right, lines by row): a
   * board of two or three lines on a site under the NEC rule set. Its way count is its space count
   * and a circuit's way number is its first space (docs/data-model.md).
   */
  public boolean isPanelboard() {
    return panelSpaces() != null;
  }

  /** The panelboard's spaces, or null when the board is not a panelboard. */
  public com.wayledger.engine.PanelSpaces panelSpaces() {
    return com.wayledger.engine.PanelSpaces.ofBoard(site.getRuleSet(), lineCount(), wayCount);
  }

  /**
   * The positions the circuit editor offers at a space of a panelboard, one per pole count that
   * fits there (1, 2 and on a three-phase panel 3 poles), the lines taken from the space.
   */
  public java.util.List<com.wayledger.engine.PhasePosition> positionsAtSpace(Integer space) {
    com.wayledger.engine.PanelSpaces panel = panelSpaces();
    if (panel == null) {
      return getPositions();
    }
    int first = space == null || space < 1 || space > panel.spaceCount() ? 1 : space;
    java.util.List<com.wayledger.engine.PhasePosition> choices = new java.util.ArrayList<>();
    for (int poles = 1; poles <= panel.lines(); poles++) {
      if (panel.fitOf(first, poles) == com.wayledger.engine.PanelSpaces.Fit.FITS) {
        choices.add(panel.positionOf(first, poles));
      }
    }
    return choices;
  }

  /** A line's name for people on this board: A, B, C on a North American supply, else L1…L3. */
  public String lineName(com.wayledger.engine.Phase line) {
    return system().lineName(line);
  }

  public Long getId() {
    return id;
  }

  public Site getSite() {
    return site;
  }

  /** The units this board's cable sizes and lengths are read and typed in (its site's). */
  public com.wayledger.engine.rules.CableUnits cableUnits() {
    return site.cableUnits();
  }

  public String getReference() {
    return reference;
  }

  public String getLocation() {
    return location;
  }

  public int getPhases() {
    return phases;
  }

  public int getWayCount() {
    return wayCount;
  }

  public Double getBusbarRatingAmps() {
    return busbarRatingAmps;
  }

  public DeviceDetails getIncomer() {
    return incomer;
  }

  public Board getParent() {
    return parent;
  }

  public Long getFedFromCircuitId() {
    return fedFromCircuitId;
  }

  public CableDetails getSubmain() {
    return submain;
  }

  public double getUnbalanceLimitPercent() {
    return unbalanceLimitPercent;
  }

  public double getCoincidenceFactor() {
    return coincidenceFactor;
  }

  public String getDiversityMethod() {
    return diversityMethod;
  }

  public Double getMeasuredExternalLoopImpedanceOhms() {
    return measuredExternalLoopImpedanceOhms;
  }

  public Double getMeasuredFaultCurrentKiloAmps() {
    return measuredFaultCurrentKiloAmps;
  }

  public long getVersion() {
    return version;
  }

  public Instant getUpdatedAt() {
    return updatedAt;
  }

  public List<Circuit> getCircuits() {
    return circuits;
  }
}
