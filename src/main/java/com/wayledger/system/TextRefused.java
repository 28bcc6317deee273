package com.wayledger.system;

/**
 * A request parameter (or an uploaded file's name) refused by {@link TextInput}'s rules before any
 * handler saw it: 400, with the parameter and the character named.
 */
public class TextRefused extends RuntimeException {

  private final String field;
  private final String messageCode;
  private final String character;

  public TextRefused(String field, String messageCode, String character) {
    super(messageCode + " in " + field + " " + character);
    this.field = field;
    this.messageCode = messageCode;
    this.character = character;
  }

  public String field() {
    return field;
  }

  public String messageCode() {
    return messageCode;
  }

  public String character() {
    return character;
  }
}
