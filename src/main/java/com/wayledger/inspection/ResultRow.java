package com.wayledger.inspection;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.inspection.CircuitResults;

/**
 * One circuit's results in an inspection, with the circuit as the schedule recorded it then (what
 * the results are graded against).
 */
public record ResultRow(
    long circuitId,
    String wayLabel,
    String description,
    CircuitSpec recorded,
    CircuitResults results) {}
