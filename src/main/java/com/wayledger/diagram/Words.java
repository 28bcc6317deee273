package com.wayledger.diagram;

/** The diagram's text, from the message bundles: a key and its arguments to one line of text. */
@FunctionalInterface
public interface Words {
  String get(String key, Object... args);
}
