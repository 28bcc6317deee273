package com.wayledger.site;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;

/**
 * The cable conditions and the equipment location a site or a board sets for its circuits: what a
 * circuit uses when it records none of its own. Any field may be empty (nothing set at this level).
 */
@Embeddable
public class CableDefaults {

  @Enumerated(EnumType.STRING)
  @Column(name = "default_installation_method")
  private InstallationMethod installationMethod;

  @Column(name = "default_ambient_celsius")
  private Double ambientCelsius;

  @Column(name = "default_grouped_circuits")
  private Integer groupedCircuits;

  @Column(name = "default_thermal_insulation_mm")
  private Integer thermalInsulationMillimetres;

  @Enumerated(EnumType.STRING)
  @Column(name = "default_material")
  private ConductorMaterial material;

  @Enumerated(EnumType.STRING)
  @Column(name = "default_insulation")
  private Insulation insulation;

  @Enumerated(EnumType.STRING)
  @Column(name = "default_location")
  private CircuitLocation location;

  protected CableDefaults() {}

  public CableDefaults(
      InstallationMethod installationMethod,
      Double ambientCelsius,
      Integer groupedCircuits,
      Integer thermalInsulationMillimetres,
      ConductorMaterial material,
      Insulation insulation,
      CircuitLocation location) {
    this.installationMethod = installationMethod;
    this.ambientCelsius = ambientCelsius;
    this.groupedCircuits = groupedCircuits;
    this.thermalInsulationMillimetres = thermalInsulationMillimetres;
    this.material = material;
    this.insulation = insulation;
    this.location = location;
  }

  /** Nothing set: every field inherits from the level above, or is missing. */
  public static CableDefaults none() {
    return new CableDefaults();
  }

  public InstallationMethod getInstallationMethod() {
    return installationMethod;
  }

  public Double getAmbientCelsius() {
    return ambientCelsius;
  }

  public Integer getGroupedCircuits() {
    return groupedCircuits;
  }

  public Integer getThermalInsulationMillimetres() {
    return thermalInsulationMillimetres;
  }

  public ConductorMaterial getMaterial() {
    return material;
  }

  public Insulation getInsulation() {
    return insulation;
  }

  public CircuitLocation getLocation() {
    return location;
  }
}
