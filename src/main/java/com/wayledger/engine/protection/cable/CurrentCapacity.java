package com.wayledger.engine.protection.cable;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.protection.data.DataTable;
import com.wayledger.engine.protection.result.Resolved;

/**
 * Current-carrying capacity of copper cables from IEC 60364-5-52 Annex B (methods A1, A2, B1, B2,
 * C, E; 2 or 3 loaded conductors) with the ambient (B.52.14), grouping (B.52.17 item 1) and
 * thermal-insulation (BS 7671 Table 52.2) correction factors.
 */
public final class CurrentCapacity {

  private static final DataTable THERMOPLASTIC = DataTable.load("capacity-thermoplastic-70.csv");
  private static final DataTable THERMOSETTING = DataTable.load("capacity-thermosetting-90.csv");
  private static final DataTable AMBIENT = DataTable.load("ambient-air.csv");
  private static final DataTable GROUPING = DataTable.load("grouping.csv");
  private static final DataTable THERMAL_INSULATION = DataTable.load("thermal-insulation.csv");

  private CurrentCapacity() {}

  /** The capacity table for an insulation, for its provenance notes. */
  public static DataTable table(Insulation insulation) {
    return insulation == Insulation.THERMOSETTING_90 ? THERMOSETTING : THERMOPLASTIC;
  }

  /**
   * It, amperes, for copper conductors in reference conditions (30 °C air, one circuit).
   *
   * @param loadedConductors 2 (single-phase) or 3 (three-phase)
   */
  public static Resolved<Double> tabulatedAmps(
      Insulation insulation,
      InstallationMethod method,
      double csaSquareMillimetres,
      int loadedConductors) {
    String column = method + "_" + loadedConductors;
    DataTable table = table(insulation);
    if (!table.hasColumn(column)) {
      return Resolved.missing(
          "capacity table for installation method " + method + " (not shipped)");
    }
    double it = table.exact(csaSquareMillimetres, column);
    return Double.isNaN(it)
        ? Resolved.missing(
            "capacity for " + csaSquareMillimetres + " mm² (outside the shipped table)")
        : Resolved.of(it);
  }

  /** Ca for cables in air at {@code ambientCelsius}; the next hotter row when between rows. */
  public static Resolved<Double> ambientFactor(Insulation insulation, double ambientCelsius) {
    double f = AMBIENT.atOrAbove(ambientCelsius, insulation.name());
    return Double.isNaN(f)
        ? Resolved.missing(
            "ambient factor: " + ambientCelsius + " °C is beyond the insulation's range")
        : Resolved.of(f);
  }

  /** Cg for {@code circuits} bunched circuits; the next larger group when between rows. */
  public static Resolved<Double> groupingFactor(int circuits) {
    if (circuits < 1) {
      return Resolved.missing("number of grouped circuits (at least 1)");
    }
    double f = GROUPING.atOrAbove(circuits, "factor");
    return Double.isNaN(f)
        ? Resolved.missing("grouping factor for " + circuits + " circuits (table ends at 20)")
        : Resolved.of(f);
  }

  /**
   * Ci for a cable surrounded by thermal insulation over {@code lengthMillimetres}; 0 gives 1.0.
   */
  public static double thermalInsulationFactor(int lengthMillimetres) {
    if (lengthMillimetres <= 0) {
      return 1.0;
    }
    double f = THERMAL_INSULATION.atOrAbove(lengthMillimetres, "factor");
    return Double.isNaN(f) ? THERMAL_INSULATION.last("factor") : f;
  }

  /**
   * The rating of a recorded cable. A null ambient, grouping or insulation length is missing, not
   * assumed: Iz depends on them.
   */
  public static Resolved<CableRating> of(CableSpec cable, int loadedConductors) {
    if (cable == null) {
      return Resolved.missing("cable");
    }
    if (cable.material() != ConductorMaterial.COPPER) {
      return Resolved.missing(
          "capacity table for " + cable.material() + " conductors (only copper is shipped)");
    }
    if (cable.insulation() == null) {
      return Resolved.missing("cable insulation");
    }
    if (cable.installationMethod() == null) {
      return Resolved.missing("installation method");
    }
    if (cable.lineCsaSquareMillimetres() == null) {
      return Resolved.missing("conductor cross-section");
    }
    if (cable.ambientCelsius() == null) {
      return Resolved.missing("ambient temperature");
    }
    if (cable.groupedCircuits() == null) {
      return Resolved.missing("number of grouped circuits");
    }
    if (cable.thermalInsulationMillimetres() == null) {
      return Resolved.missing("length in thermal insulation");
    }
    return tabulatedAmps(
            cable.insulation(),
            cable.installationMethod(),
            cable.lineCsaSquareMillimetres(),
            loadedConductors)
        .flatMap(
            it ->
                ambientFactor(cable.insulation(), cable.ambientCelsius())
                    .flatMap(
                        ca ->
                            groupingFactor(cable.groupedCircuits())
                                .map(
                                    cg ->
                                        new CableRating(
                                            it,
                                            ca,
                                            cg,
                                            thermalInsulationFactor(
                                                cable.thermalInsulationMillimetres())))));
  }
}
