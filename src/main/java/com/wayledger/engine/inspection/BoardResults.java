package com.wayledger.engine.inspection;

/**
 * Board-level results of an inspection; any may be null (not measured or not applicable).
 *
 * @param externalLoopImpedanceOhms measured Ze at the board's origin, Ω
 * @param prospectiveFaultKiloAmps measured prospective fault current at the board, kA
 * @param earthElectrodeOhms earth electrode resistance RA (TT), Ω
 * @param mainBondingPresent main protective bonding present: true, false, or null not checked
 */
public record BoardResults(
    Double externalLoopImpedanceOhms,
    Double prospectiveFaultKiloAmps,
    Double earthElectrodeOhms,
    Boolean mainBondingPresent) {

  public static final BoardResults NONE = new BoardResults(null, null, null, null);
}
