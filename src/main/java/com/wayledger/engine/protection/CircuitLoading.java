package com.wayledger.engine.protection;

/**
 * What the demand calculation says about one circuit, as the protection engine needs it.
 *
 * @param circuitId the circuit
 * @param designCurrentAmps Ib after diversity (per line for a three-pole circuit), A; null when not
 *     worked out
 */
public record CircuitLoading(long circuitId, Double designCurrentAmps) {}
