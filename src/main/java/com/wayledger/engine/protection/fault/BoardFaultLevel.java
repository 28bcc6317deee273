package com.wayledger.engine.protection.fault;

import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.result.SourcedValue;

/**
 * Fault-path figures at one board.
 *
 * @param boardId the board
 * @param externalLoopImpedanceOhms Ze at the board, Ω (measured, or origin Ze plus the submains'
 *     R1+R2 hot)
 * @param faultCurrentKiloAmps prospective fault current at the board, kA (measured, or from the
 *     origin value and the submains' line resistance cold)
 * @param voltageDropFromOriginPercent the submains' voltage drop from the origin to the board at
 *     the boards' design currents, % of nominal
 * @param upstreamDevice the device that protects the board: its incomer, else the parent's way that
 *     feeds it; null when neither is recorded
 * @param upstreamResidualMilliAmps smallest IΔn of any residual-current device on this board's
 *     incomer or on the incomers and ways above it; null when none is recorded
 * @param assumptions inputs of the submains up the tree taken on the safe side because they were
 *     not recorded, in words (e.g. an insulation taken as 90 °C for R1+R2); empty when none
 * @param dropNotes how the submains' voltage drop up the tree was worked out where it is not the
 *     plain balanced formula (an unbalanced board's neutral current, with its figures); empty when
 *     none
 */
public record BoardFaultLevel(
    long boardId,
    SourcedValue externalLoopImpedanceOhms,
    SourcedValue faultCurrentKiloAmps,
    SourcedValue voltageDropFromOriginPercent,
    DeviceSpec upstreamDevice,
    Double upstreamResidualMilliAmps,
    java.util.List<String> assumptions,
    java.util.List<String> dropNotes) {

  public BoardFaultLevel {
    assumptions = java.util.List.copyOf(assumptions);
    dropNotes = java.util.List.copyOf(dropNotes);
  }

  /** Figures resting on recorded inputs only. */
  public BoardFaultLevel(
      long boardId,
      SourcedValue externalLoopImpedanceOhms,
      SourcedValue faultCurrentKiloAmps,
      SourcedValue voltageDropFromOriginPercent,
      DeviceSpec upstreamDevice,
      Double upstreamResidualMilliAmps) {
    this(
        boardId,
        externalLoopImpedanceOhms,
        faultCurrentKiloAmps,
        voltageDropFromOriginPercent,
        upstreamDevice,
        upstreamResidualMilliAmps,
        java.util.List.of(),
        java.util.List.of());
  }
}
