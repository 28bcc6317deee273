package com.wayledger.engine;

/**
 * A circuit's or submain's cable. Every field but the material and insulation may be null while the
 * schedule is incomplete; the checks that need a missing field say so instead of passing.
 *
 * @param lineCsaSquareMillimetres cross-section of each line conductor, mm²
 * @param protectiveCsaSquareMillimetres cross-section of the protective conductor (cpc), mm²
 * @param material conductor metal
 * @param insulation insulation and so maximum operating temperature
 * @param lengthMetres route length from the board to the farthest point, m
 * @param installationMethod reference installation method
 * @param ambientCelsius ambient temperature along the route, °C
 * @param groupedCircuits number of circuits grouped together, this one included
 * @param thermalInsulationMillimetres length of the cable surrounded by thermal insulation, mm (0 =
 *     none)
 * @param conduit the conduit the conductors run in (NEC Chapter 9 Table 9); null when not recorded
 */
public record CableSpec(
    Double lineCsaSquareMillimetres,
    Double protectiveCsaSquareMillimetres,
    ConductorMaterial material,
    Insulation insulation,
    Double lengthMetres,
    InstallationMethod installationMethod,
    Double ambientCelsius,
    Integer groupedCircuits,
    Integer thermalInsulationMillimetres,
    Conduit conduit) {

  /** A cable whose conduit is not recorded: the argument list from before conduits. */
  public CableSpec(
      Double lineCsaSquareMillimetres,
      Double protectiveCsaSquareMillimetres,
      ConductorMaterial material,
      Insulation insulation,
      Double lengthMetres,
      InstallationMethod installationMethod,
      Double ambientCelsius,
      Integer groupedCircuits,
      Integer thermalInsulationMillimetres) {
    this(
        lineCsaSquareMillimetres,
        protectiveCsaSquareMillimetres,
        material,
        insulation,
        lengthMetres,
        installationMethod,
        ambientCelsius,
        groupedCircuits,
        thermalInsulationMillimetres,
        null);
  }

  /** The same cable in another conduit (null: not recorded). */
  public CableSpec inConduit(Conduit newConduit) {
    return new CableSpec(
        lineCsaSquareMillimetres,
        protectiveCsaSquareMillimetres,
        material,
        insulation,
        lengthMetres,
        installationMethod,
        ambientCelsius,
        groupedCircuits,
        thermalInsulationMillimetres,
        newConduit);
  }
}
