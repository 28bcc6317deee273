package com.wayledger.engine.protection;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.result.Finding;
import java.util.List;

/**
 * The breaker proposed for a circuit, or why none fits.
 *
 * @param circuitId the circuit
 * @param device the lowest-rated breaker (then lowest curve, then lowest breaking capacity) that
 *     passes every check in {@code checks}; null when none does
 * @param checks the checks the proposed device passes, each a {@code PASS} finding; empty when none
 *     was found
 * @param reasons why candidates were rejected (or which input is missing), in the order they were
 *     tried; empty when a device was found at the first try
 * @param cable the conductor proposed with the device, where the rule set sizes one (NEC: an AWG or
 *     kcmil size); null when the recorded cable is kept
 */
public record DeviceProposal(
    long circuitId,
    DeviceSpec device,
    List<Finding> checks,
    List<String> reasons,
    CableSpec cable) {

  public DeviceProposal {
    checks = List.copyOf(checks);
    reasons = List.copyOf(reasons);
  }

  /** A proposal that keeps the recorded cable. */
  public DeviceProposal(
      long circuitId, DeviceSpec device, List<Finding> checks, List<String> reasons) {
    this(circuitId, device, checks, reasons, null);
  }

  /** The proposed conductor's AWG or kcmil size ("10 AWG"); null when no conductor is proposed. */
  public String conductorLabel() {
    if (cable == null || cable.lineCsaSquareMillimetres() == null) {
      return null;
    }
    return com.wayledger.engine.nec.ConductorSize.ofSquareMillimetres(
            cable.lineCsaSquareMillimetres())
        .map(com.wayledger.engine.nec.ConductorSize::label)
        .orElse(null);
  }

  public boolean found() {
    return device != null;
  }
}
