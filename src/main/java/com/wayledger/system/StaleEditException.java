package com.wayledger.system;

/**
 * Someone else saved the same record after this form was opened; nothing of this edit was stored.
 */
public class StaleEditException extends RuntimeException {

  public StaleEditException(String what) {
    super(what + " was changed by someone else since you opened it");
  }
}
