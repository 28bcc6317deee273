package com.wayledger.engine.protection;

import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.SourcedValue;
import java.util.List;

/**
 * The checks of one circuit and the figures behind them.
 *
 * @param circuitId the circuit
 * @param wayNumber its way on the board
 * @param loopImpedanceOhms Zs at the far end, Ω, measured or calculated
 * @param capacityAmps Iz after correction factors, A; null when not known
 * @param voltageDropFromOriginPercent total drop origin-to-end, %; null when not known
 * @param startUpSurgeAmps peak start-up current, A; null when no load records a surge
 * @param findings one finding per applicable check
 */
public record CircuitFindings(
    long circuitId,
    int wayNumber,
    SourcedValue loopImpedanceOhms,
    Double capacityAmps,
    Double voltageDropFromOriginPercent,
    Double startUpSurgeAmps,
    List<Finding> findings) {

  public CircuitFindings {
    findings = List.copyOf(findings);
  }
}
