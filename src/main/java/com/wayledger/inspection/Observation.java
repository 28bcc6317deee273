package com.wayledger.inspection;

import com.wayledger.engine.inspection.Urgency;

/**
 * One observation of an inspection.
 *
 * @param circuitId the circuit it is about, null for the board as a whole
 * @param wayLabel the circuit's position label then ("3 L2"), null for the board
 */
public record Observation(
    Long circuitId, String wayLabel, Urgency urgency, String text, ObservationOrigin origin) {}
