package com.wayledger.system;

/**
 * Someone else saved the same record after this form was opened; nothing of this edit was stored.
 * Carries the values saved meanwhile (a form record), so that an API answer can show them.
 */
public class StaleEditException extends RuntimeException {

  private final transient Object current;

  public StaleEditException(String what) {
    this(what, null);
  }

  public StaleEditException(String what, Object current) {
    super(what + " was changed by someone else since you opened it");
    this.current = current;
  }

  /** The record's values as saved now, or null when not known. */
  public Object current() {
    return current;
  }
}
