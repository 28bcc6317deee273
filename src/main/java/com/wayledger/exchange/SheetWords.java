package com.wayledger.exchange;

import com.wayledger.system.EnumWords;
import java.text.MessageFormat;
import java.util.Locale;
import java.util.function.BiFunction;

/**
 * The words people read on an exported workbook (titles, fact labels, the caution line), in the
 * locale of the request that exported it, so that a workbook reads like the page it came from.
 * Column headers are not among them: the import reads them back (see docs/wording.md).
 */
public final class SheetWords {

  private final BiFunction<String, Object[], String> lookup;

  private SheetWords(BiFunction<String, Object[], String> lookup) {
    this.lookup = lookup;
  }

  /** Words from a message lookup (key, arguments) in the request's locale. */
  public static SheetWords of(BiFunction<String, Object[], String> lookup) {
    return new SheetWords(lookup);
  }

  /** The base (en-GB) words, read outside a request. */
  public static SheetWords base() {
    return new SheetWords(
        (key, args) -> {
          String pattern = EnumWords.standard().text(key);
          if (pattern == null) {
            throw new IllegalStateException("no message " + key);
          }
          return args.length == 0 ? pattern : new MessageFormat(pattern, Locale.UK).format(args);
        });
  }

  /** The message with this key, its arguments filled in. */
  public String of(String key, Object... args) {
    return lookup.apply(key, args);
  }
}
