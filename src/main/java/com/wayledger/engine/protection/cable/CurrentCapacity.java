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

  /** How a capacity finding names the insulation it assumed. */
  public static final String ASSUMED_COOL_INSULATION =
      "insulation not recorded: assumed the lower of the 70 °C and 90 °C capacities (safe side)";

  /**
   * The rating of a recorded cable. A null ambient, grouping or insulation length is missing, not
   * assumed: Iz depends on them. An unrecorded insulation is rated both ways and the lower Iz kept,
   * named in {@link CableRating#assumption()}; an unrecorded material is missing (an aluminium
   * conductor carries less than a copper one, so copper would be the unsafe guess).
   */
  public static Resolved<CableRating> of(CableSpec cable, int loadedConductors) {
    Resolved<CableSpec> known = recorded(cable);
    if (!known.isKnown()) {
      return Resolved.missing(known.missing());
    }
    if (cable.insulation() != null) {
      return rated(cable, cable.insulation(), cable.lineCsaSquareMillimetres(), loadedConductors);
    }
    Resolved<CableRating> cool =
        rated(
            cable, Insulation.THERMOPLASTIC_70, cable.lineCsaSquareMillimetres(), loadedConductors);
    Resolved<CableRating> hot =
        rated(
            cable, Insulation.THERMOSETTING_90, cable.lineCsaSquareMillimetres(), loadedConductors);
    if (!cool.isKnown() || !hot.isKnown()) {
      return cool.isKnown() ? Resolved.missing(hot.missing()) : cool;
    }
    CableRating lower =
        cool.value().capacityAmps() <= hot.value().capacityAmps() ? cool.value() : hot.value();
    return Resolved.of(lower.assuming(ASSUMED_COOL_INSULATION));
  }

  /**
   * When the conductor size is not in the shipped table (smaller than its first row, or a size
   * between rows), the rating of the next larger tabulated size with the same corrections: an upper
   * bound on Iz, since capacity grows with cross-section. Empty when the size is in the table, is
   * larger than every row, or another input is missing.
   */
  public static java.util.Optional<Sized> upperBound(CableSpec cable, int loadedConductors) {
    if (!recorded(cable).isKnown()) {
      return java.util.Optional.empty();
    }
    Insulation insulation =
        cable.insulation() == null ? Insulation.THERMOSETTING_90 : cable.insulation();
    DataTable table = table(insulation);
    String column = cable.installationMethod() + "_" + loadedConductors;
    if (!table.hasColumn(column)
        || !Double.isNaN(table.exact(cable.lineCsaSquareMillimetres(), column))) {
      return java.util.Optional.empty();
    }
    for (double size : table.keys()) {
      if (size > cable.lineCsaSquareMillimetres()) {
        // the 90 °C table is the larger capacity: as an upper bound it is the safe reading
        Resolved<CableRating> r = rated(cable, insulation, size, loadedConductors);
        return r.isKnown()
            ? java.util.Optional.of(new Sized(size, r.value()))
            : java.util.Optional.empty();
      }
    }
    return java.util.Optional.empty();
  }

  /** A tabulated size and its rating. */
  public record Sized(double csaSquareMillimetres, CableRating rating) {}

  private static Resolved<CableSpec> recorded(CableSpec cable) {
    if (cable == null) {
      return Resolved.missing("cable");
    }
    if (cable.material() == null) {
      return Resolved.missing("conductor material");
    }
    if (cable.material() != ConductorMaterial.COPPER) {
      return Resolved.missing(
          "capacity table for " + cable.material() + " conductors (only copper is shipped)");
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
    return Resolved.of(cable);
  }

  private static Resolved<CableRating> rated(
      CableSpec cable, Insulation insulation, double csa, int loadedConductors) {
    return tabulatedAmps(insulation, cable.installationMethod(), csa, loadedConductors)
        .flatMap(
            it ->
                ambientFactor(insulation, cable.ambientCelsius())
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
