package com.wayledger.system;

/**
 * A rule of the domain that a submitted value breaks (a way beyond the board's size, an occupied
 * position). Controllers show it beside the named form field; the API returns it as a 4xx with the
 * field name.
 */
public class RuleViolation extends RuntimeException {

  private final String field;
  private final String messageCode;
  private final transient Object[] arguments;

  public RuleViolation(String field, String messageCode, Object... arguments) {
    super(messageCode + " on " + field);
    this.field = field;
    this.messageCode = messageCode;
    this.arguments = arguments;
  }

  /** The form field the problem belongs to. */
  public String field() {
    return field;
  }

  /** Key of the message in messages.properties. */
  public String messageCode() {
    return messageCode;
  }

  public Object[] arguments() {
    return arguments.clone();
  }
}
