package com.wayledger.engine.inspection;

/** How one measured value compares with its limit. */
public enum Grade {
  /** Within the limit. */
  PASS,
  /** Outside the limit. */
  FAIL,
  /** Not measured, or an input the comparison needs is missing: the value says which. */
  NOT_ASSESSED
}
