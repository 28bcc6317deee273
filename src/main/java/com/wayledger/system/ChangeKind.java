package com.wayledger.system;

/** What kind of change a log entry records. Stored by name in change_log.kind. */
public enum ChangeKind {
  SITE_ADDED,
  SITE_EDITED,
  BOARD_ADDED,
  BOARD_EDITED,
  BOARD_REMOVED,
  CIRCUIT_ADDED,
  CIRCUIT_EDITED,
  CIRCUIT_REMOVED,
  LOAD_ADDED,
  LOAD_EDITED,
  LOAD_REMOVED,
  BALANCING_APPLIED,
  IMPORT,
  DEMAND_MEASURED
}
