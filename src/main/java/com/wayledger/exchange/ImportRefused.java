package com.wayledger.exchange;

/**
 * A file that cannot be imported at all (not a spreadsheet, too big, protected, empty); carries a
 * message code.
 */
public class ImportRefused extends RuntimeException {

  private final String messageCode;
  private final transient Object[] arguments;

  public ImportRefused(String messageCode, Object... arguments) {
    super(messageCode);
    this.messageCode = messageCode;
    this.arguments = arguments;
  }

  public String messageCode() {
    return messageCode;
  }

  public Object[] arguments() {
    return arguments.clone();
  }
}
