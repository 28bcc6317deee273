package com.wayledger.system;

import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * The fields in which two values of one form record differ: what an edit conflict shows a user
 * (their value beside the one saved meanwhile), so that nothing they typed is lost.
 */
public final class RecordDiff {

  /** One differing field. */
  public record FieldChange(String field, Object yours, Object theirs) {}

  private RecordDiff() {}

  /**
   * Fields of {@code yours} and {@code theirs} (same record type) that differ, in declaration
   * order.
   */
  public static <R extends Record> List<FieldChange> between(
      R yours, R theirs, Set<String> ignored) {
    List<FieldChange> changes = new ArrayList<>();
    for (RecordComponent component : yours.getClass().getRecordComponents()) {
      if (ignored.contains(component.getName())) {
        continue;
      }
      try {
        Object mine = component.getAccessor().invoke(yours);
        Object saved = component.getAccessor().invoke(theirs);
        if (!Objects.equals(blankToNull(mine), blankToNull(saved))) {
          changes.add(new FieldChange(component.getName(), mine, saved));
        }
      } catch (ReflectiveOperationException e) {
        throw new IllegalStateException("cannot read " + component.getName(), e);
      }
    }
    return changes;
  }

  private static Object blankToNull(Object value) {
    return value instanceof String text && text.isBlank() ? null : value;
  }
}
