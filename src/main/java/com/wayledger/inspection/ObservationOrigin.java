package com.wayledger.inspection;

/** Where an observation came from. Stored by name in inspection_observation.origin. */
public enum ObservationOrigin {
  /** Proposed by Wayledger and accepted as proposed. */
  PROPOSED,
  /** Proposed by Wayledger, then reworded or reclassed by the inspector. */
  EDITED,
  /** Written by the inspector. */
  INSPECTOR
}
