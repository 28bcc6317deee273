package com.wayledger.engine;

/**
 * Reference installation methods of IEC 60364-5-52 Table B.52.1 used by the current-carrying
 * capacity tables.
 */
public enum InstallationMethod {
  /** Insulated conductors in conduit in a thermally insulating wall. */
  A1,
  /** Multi-core cable in conduit in a thermally insulating wall. */
  A2,
  /** Insulated conductors in conduit on a wall. */
  B1,
  /** Multi-core cable in conduit on a wall. */
  B2,
  /** Single- or multi-core cable clipped direct on a wall. */
  C,
  /** Multi-core cable in ducts in the ground. */
  D1,
  /** Multi-core cable direct in the ground. */
  D2,
  /** Multi-core cable in free air. */
  E,
  /** Single-core cables touching in free air. */
  F
}
