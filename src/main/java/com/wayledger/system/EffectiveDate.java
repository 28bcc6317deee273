package com.wayledger.system;

import java.time.LocalDate;
import java.util.function.Supplier;

/**
 * The day the changes made on this thread took effect on site, when that is earlier than the day
 * they are recorded: a back-dated entry (an installation recorded after the fact, the demo's
 * history over several years). The change log stores it beside the time the database stamps, never
 * instead of it, and shows both; entries without one took effect when recorded.
 */
public final class EffectiveDate {

  private static final ThreadLocal<LocalDate> CURRENT = new ThreadLocal<>();

  private EffectiveDate() {}

  /** The effective day of changes made now on this thread, or null when they take effect now. */
  public static LocalDate current() {
    return CURRENT.get();
  }

  /** Runs {@code work} with its changes back-dated to {@code day}; the day before is restored. */
  public static <T> T during(LocalDate day, Supplier<T> work) {
    LocalDate before = CURRENT.get();
    CURRENT.set(day);
    try {
      return work.get();
    } finally {
      if (before == null) {
        CURRENT.remove();
      } else {
        CURRENT.set(before);
      }
    }
  }

  /** Sets the effective day for what follows on this thread (null: changes take effect now). */
  public static void set(LocalDate day) {
    if (day == null) {
      CURRENT.remove();
    } else {
      CURRENT.set(day);
    }
  }
}
