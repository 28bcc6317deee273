package com.wayledger.engine;

/**
 * Where a circuit's equipment is, as far as the residual-current rules care: some locations need 30
 * mA additional protection on every circuit whatever it feeds (see {@code ResidualCurrentRules}). A
 * circuit whose location is not recorded carries none (null).
 */
public enum CircuitLocation {
  /** Indoors, in no location of the special-location parts of the wiring rules. */
  INDOORS,
  /** Outdoors, or feeding equipment used outdoors. */
  OUTDOORS,
  /** A room containing a bath or shower. */
  BATH_OR_SHOWER,
  /** A swimming pool, paddling pool or fountain basin and its surroundings. */
  SWIMMING_POOL,
  /** A room with a sauna heater. */
  SAUNA,
  /** A farm or horticultural building (stables, barns, greenhouses). */
  AGRICULTURAL
}
