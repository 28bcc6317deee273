package com.wayledger.engine.protection.fault;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.protection.cable.CableImpedance;
import com.wayledger.engine.protection.check.RingFinalCheck;
import com.wayledger.engine.protection.result.SourcedValue;

/**
 * A circuit's earth fault loop impedance Zs = Ze(board) + (R1+R2) at operating temperature, or its
 * measured value. For a ring final circuit whose recorded length is the whole ring, R1+R2 at the
 * mid-point is a quarter of the end-to-end r1+r2 (common practice; see {@link RingFinalCheck}).
 */
public final class LoopImpedance {

  private LoopImpedance() {}

  /** Zs at the far end of the circuit, Ω; the measured value overrides the calculation. */
  public static SourcedValue of(CircuitSpec circuit, BoardFaultLevel board) {
    if (circuit.measuredLoopImpedanceOhms() != null) {
      return SourcedValue.measured(circuit.measuredLoopImpedanceOhms());
    }
    SourcedValue ze = board.externalLoopImpedanceOhms();
    if (!ze.isKnown()) {
      return ze;
    }
    double share = circuit.ringFinal() ? RingFinalCheck.MID_POINT_FRACTION : 1.0;
    return SourcedValue.calculated(
        CableImpedance.r1PlusR2Ohms(circuit.cable()).map(r -> ze.value() + r * share));
  }
}
