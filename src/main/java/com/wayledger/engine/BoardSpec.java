package com.wayledger.engine;

import java.util.List;

/**
 * A distribution board with its circuits.
 *
 * @param id stable identifier of the stored board
 * @param reference the board's name on site, e.g. "DB-K1"
 * @param phases 1 or 3
 * @param wayCount number of ways
 * @param busbarRatingAmps busbar rating; null when unknown
 * @param incomer incoming device or switch; null when unknown
 * @param parentBoardId board this one is fed from; null when fed from the origin
 * @param submainCable cable from the parent way or origin; null when not recorded
 * @param unbalanceLimitPercent largest acceptable phase unbalance, %
 * @param coincidenceFactor factor applied to this board's demand as seen by its parent, in (0, 1]
 * @param diversityMethodKey the diversity method chosen for this board; null for the site default
 * @param measuredExternalLoopImpedanceOhms Ze measured at the board; null when not measured
 * @param measuredFaultCurrentKiloAmps prospective fault current measured at the board; null when
 *     not measured
 * @param circuits the board's positions that hold a circuit, spare device or empty space record
 * @param incomerOverloadSettingAmps Ir of a moulded-case incomer when recorded; null otherwise (the
 *     incomer then trips on its In)
 * @param supplySystem the board's own supply system (a second service, or a 120/208 V panel fed
 *     from two poles of a 208Y/120 V one); null when it is the site's ({@link
 *     SiteSpec#systemOf(BoardSpec)})
 */
public record BoardSpec(
    long id,
    String reference,
    int phases,
    int wayCount,
    Double busbarRatingAmps,
    DeviceSpec incomer,
    Long parentBoardId,
    CableSpec submainCable,
    double unbalanceLimitPercent,
    double coincidenceFactor,
    String diversityMethodKey,
    Double measuredExternalLoopImpedanceOhms,
    Double measuredFaultCurrentKiloAmps,
    List<CircuitSpec> circuits,
    Double incomerOverloadSettingAmps,
    SupplySystem supplySystem) {

  public BoardSpec {
    circuits = List.copyOf(circuits);
  }

  /** A board on its site's supply system: the argument list from before boards had their own. */
  public BoardSpec(
      long id,
      String reference,
      int phases,
      int wayCount,
      Double busbarRatingAmps,
      DeviceSpec incomer,
      Long parentBoardId,
      CableSpec submainCable,
      double unbalanceLimitPercent,
      double coincidenceFactor,
      String diversityMethodKey,
      Double measuredExternalLoopImpedanceOhms,
      Double measuredFaultCurrentKiloAmps,
      List<CircuitSpec> circuits,
      Double incomerOverloadSettingAmps) {
    this(
        id,
        reference,
        phases,
        wayCount,
        busbarRatingAmps,
        incomer,
        parentBoardId,
        submainCable,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethodKey,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        circuits,
        incomerOverloadSettingAmps,
        null);
  }

  /** A board whose incomer, if any, trips on its In (no MCCB setting recorded). */
  public BoardSpec(
      long id,
      String reference,
      int phases,
      int wayCount,
      Double busbarRatingAmps,
      DeviceSpec incomer,
      Long parentBoardId,
      CableSpec submainCable,
      double unbalanceLimitPercent,
      double coincidenceFactor,
      String diversityMethodKey,
      Double measuredExternalLoopImpedanceOhms,
      Double measuredFaultCurrentKiloAmps,
      List<CircuitSpec> circuits) {
    this(
        id,
        reference,
        phases,
        wayCount,
        busbarRatingAmps,
        incomer,
        parentBoardId,
        submainCable,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethodKey,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        circuits,
        null,
        null);
  }

  /** The same board holding other circuits. */
  public BoardSpec withCircuits(List<CircuitSpec> other) {
    return new BoardSpec(
        id,
        reference,
        phases,
        wayCount,
        busbarRatingAmps,
        incomer,
        parentBoardId,
        submainCable,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethodKey,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        other,
        incomerOverloadSettingAmps,
        supplySystem);
  }

  /** The same board on its own supply system (null: the site's). */
  public BoardSpec withSupplySystem(SupplySystem system) {
    return new BoardSpec(
        id,
        reference,
        phases,
        wayCount,
        busbarRatingAmps,
        incomer,
        parentBoardId,
        submainCable,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethodKey,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        circuits,
        incomerOverloadSettingAmps,
        system);
  }

  /** The supply system this board is on: its own, else {@code siteSystem}. */
  public SupplySystem systemOn(SupplySystem siteSystem) {
    return supplySystem != null ? supplySystem : siteSystem;
  }

  /**
   * The current at which the incomer trips on overload: Ir for a moulded-case breaker with its
   * setting recorded, In otherwise; null when no incomer or no rating is recorded. Every loading of
   * the incomer (demand, headroom, findings, exports) is taken against this one figure.
   */
  public Double incomerTripRatingAmps() {
    if (incomer == null) {
      return null;
    }
    return incomerOverloadSettingAmps != null
        ? incomerOverloadSettingAmps
        : incomer.ratedCurrentAmps();
  }

  public boolean isThreePhase() {
    return phases == 3;
  }
}
