package com.wayledger.engine.protection;

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
 */
public record DeviceProposal(
    long circuitId, DeviceSpec device, List<Finding> checks, List<String> reasons) {

  public DeviceProposal {
    checks = List.copyOf(checks);
    reasons = List.copyOf(reasons);
  }

  public boolean found() {
    return device != null;
  }
}
