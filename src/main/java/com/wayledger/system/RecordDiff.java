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

  /**
   * The changes in words for a change-log line: "In (A) 16 → 20; Device MCB → RCBO", each field by
   * its form label ({@code <labelPrefix>.<field>} in the bundles), at most {@code limit} fields and
   * then how many more.
   */
  public static String describe(List<FieldChange> changes, String labelPrefix, int limit) {
    EnumWords words = EnumWords.standard();
    StringBuilder text = new StringBuilder();
    int shown = 0;
    for (FieldChange change : changes) {
      if (shown == limit) {
        text.append("; and ").append(changes.size() - limit).append(" more");
        break;
      }
      if (!text.isEmpty()) {
        text.append("; ");
      }
      String label = words.text(labelPrefix + "." + change.field());
      text.append(label != null ? label : change.field())
          .append(' ')
          .append(value(change.yours()))
          .append(" → ")
          .append(value(change.theirs()));
      shown++;
    }
    return text.toString();
  }

  private static String value(Object value) {
    if (value == null || (value instanceof String t && t.isBlank())) {
      return "—";
    }
    if (value instanceof Enum<?> constant) {
      return EnumWords.standard().shortOf(constant);
    }
    if (value instanceof Boolean flag) {
      return flag ? "yes" : "no";
    }
    if (value instanceof Double number) {
      return java.math.BigDecimal.valueOf(number).stripTrailingZeros().toPlainString();
    }
    return value instanceof String t ? "“" + t + "”" : String.valueOf(value);
  }
}
