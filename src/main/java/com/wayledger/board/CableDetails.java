package com.wayledger.board;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;

/** A cable as stored on a circuit or as a board's submain (columns prefixed by the owner). */
@Embeddable
public class CableDetails {

  @Column(name = "line_csa_mm2")
  private Double lineCsaSquareMillimetres;

  @Column(name = "cpc_csa_mm2")
  private Double protectiveCsaSquareMillimetres;

  @Enumerated(EnumType.STRING)
  private ConductorMaterial material;

  @Enumerated(EnumType.STRING)
  private Insulation insulation;

  private Double lengthMetres;

  @Enumerated(EnumType.STRING)
  private InstallationMethod installationMethod;

  private Double ambientCelsius;
  private Integer groupedCircuits;

  @Column(name = "thermal_insulation_mm")
  private Integer thermalInsulationMillimetres;

  protected CableDetails() {}

  public CableDetails(
      Double lineCsaSquareMillimetres,
      Double protectiveCsaSquareMillimetres,
      ConductorMaterial material,
      Insulation insulation,
      Double lengthMetres,
      InstallationMethod installationMethod,
      Double ambientCelsius,
      Integer groupedCircuits,
      Integer thermalInsulationMillimetres) {
    this.lineCsaSquareMillimetres = lineCsaSquareMillimetres;
    this.protectiveCsaSquareMillimetres = protectiveCsaSquareMillimetres;
    this.material = material;
    this.insulation = insulation;
    this.lengthMetres = lengthMetres;
    this.installationMethod = installationMethod;
    this.ambientCelsius = ambientCelsius;
    this.groupedCircuits = groupedCircuits;
    this.thermalInsulationMillimetres = thermalInsulationMillimetres;
  }

  /** A copy of {@code cable} (which may be null) with other line conductors. */
  static CableDetails withConductor(
      CableDetails cable, Double lineCsaSquareMillimetres, ConductorMaterial material) {
    CableDetails c = cable == null ? new CableDetails() : cable;
    return new CableDetails(
        lineCsaSquareMillimetres,
        c.protectiveCsaSquareMillimetres,
        material != null ? material : c.material,
        c.insulation,
        c.lengthMetres,
        c.installationMethod,
        c.ambientCelsius,
        c.groupedCircuits,
        c.thermalInsulationMillimetres);
  }

  /**
   * Whether a cable is recorded at all: a cross-section or a length. A conductor material or
   * insulation alone (a form's preset) is not a cable, so a board fed from the origin with nothing
   * but those is fed from the origin, not through a submain of unknown length.
   */
  public boolean isRecorded() {
    return lineCsaSquareMillimetres != null || lengthMetres != null;
  }

  /**
   * The engine's view of this cable, or null when nothing is recorded. A material or insulation
   * left blank stays blank: the engine either refuses the check or takes the value on the safe side
   * for that check and says so, never a quiet copper 70 °C.
   */
  CableSpec toSpec() {
    if (!isRecorded()) {
      return null;
    }
    return new CableSpec(
        lineCsaSquareMillimetres,
        protectiveCsaSquareMillimetres,
        material,
        insulation,
        lengthMetres,
        installationMethod,
        ambientCelsius,
        groupedCircuits,
        thermalInsulationMillimetres);
  }

  /** Short text such as "2.5/1.5 mm² 18 m". */
  public String label() {
    return label(com.wayledger.engine.rules.CableUnits.METRIC);
  }

  /** Short text in a site's units: "2.5/1.5 mm² 18 m", or "12/12 AWG 50 ft". */
  public String label(com.wayledger.engine.rules.CableUnits units) {
    return describe(lineCsaSquareMillimetres, protectiveCsaSquareMillimetres, lengthMetres, units);
  }

  /** Sizes and length as short text in the given units; empty when none is recorded. */
  static String describe(
      Double lineCsa,
      Double protectiveCsa,
      Double lengthMetres,
      com.wayledger.engine.rules.CableUnits units) {
    StringBuilder text = new StringBuilder();
    if (lineCsa != null) {
      String line = units.sizeText(lineCsa);
      if (protectiveCsa != null) {
        String protective = units.sizeText(protectiveCsa);
        if (units.awgAndFeet()) {
          text.append(line).append(" / ").append(protective); // "1/0/6 AWG" would misread
        } else {
          text.append(sameUnit(line, protective) ? number(line) : line)
              .append('/')
              .append(protective);
        }
      } else {
        text.append(line);
      }
    }
    if (lengthMetres != null) {
      text.append(' ').append(units.lengthText(lengthMetres));
    }
    return text.toString().strip();
  }

  private static boolean sameUnit(String a, String b) {
    return unit(a).equals(unit(b));
  }

  private static String number(String sizeText) {
    return sizeText.substring(0, sizeText.indexOf(' '));
  }

  private static String unit(String sizeText) {
    return sizeText.substring(sizeText.indexOf(' ') + 1);
  }

  public Double getLineCsaSquareMillimetres() {
    return lineCsaSquareMillimetres;
  }

  public Double getProtectiveCsaSquareMillimetres() {
    return protectiveCsaSquareMillimetres;
  }

  public ConductorMaterial getMaterial() {
    return material;
  }

  public Insulation getInsulation() {
    return insulation;
  }

  public Double getLengthMetres() {
    return lengthMetres;
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
}
