package com.wayledger.board;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.protection.result.CheckKind;
import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springframework.context.MessageSource;

/**
 * "Used: ambient 30 °C (board default); method C clipped direct (site default)" beside a finding
 * whose check took values the circuit does not record, in the page's words.
 *
 * @param lead "Used:"
 * @param parts each value with its source, all but the last followed by a semicolon
 */
public record InheritedNote(String lead, List<String> parts) {

  public InheritedNote {
    parts = List.copyOf(parts);
  }

  /** The note for the values a check used; null when it used none. */
  static InheritedNote of(List<Inheritance.InheritedValue> used, PageWords words) {
    if (used.isEmpty()) {
      return null;
    }
    List<String> parts = new ArrayList<>(used.size());
    for (int i = 0; i < used.size(); i++) {
      Inheritance.InheritedValue value = used.get(i);
      LoadCategory category = value.category();
      String part =
          words.sentence(
              "inherited." + value.field(),
              value.valueKey() != null ? words.word(value.valueKey()) : value.value(),
              words.word("inherited.source." + value.source().name()),
              category != null ? words.word("enum.LoadCategory." + category.name()) : "");
      parts.add(i == used.size() - 1 ? part : part + ";");
    }
    return new InheritedNote(words.word("inherited.lead"), parts);
  }

  /**
   * The notes of one circuit's checks, by check, for a page that lists them: only the checks that
   * used an inherited value have one.
   */
  public static Map<CheckKind, InheritedNote> byCheck(
      Inheritance.Values values,
      Collection<CheckKind> checks,
      MessageSource messages,
      Locale locale) {
    PageWords words = new PageWords(messages, locale);
    Map<CheckKind, InheritedNote> notes = new EnumMap<>(CheckKind.class);
    for (CheckKind check : checks) {
      InheritedNote note = of(values.usedBy(check), words);
      if (note != null) {
        notes.put(check, note);
      }
    }
    return notes;
  }
}
