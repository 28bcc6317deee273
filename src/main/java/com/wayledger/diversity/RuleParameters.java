package com.wayledger.diversity;

import com.wayledger.engine.demand.DiversityRule;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The editable numbers of a diversity rule, read from and written back to its record components, so
 * that every rule type of the engine can be edited on one form without a form class per type. Tiers
 * are edited as text: "3000:1; 120000:0.35; :0.25" (upper end of each band in VA, then its factor;
 * the last band open-ended).
 */
final class RuleParameters {

  /**
   * One editable value: its form name, its label, the text to show and, for a choice, the options.
   */
  record Field(String name, String label, String kind, String value, List<String> options) {}

  private RuleParameters() {}

  static List<Field> fieldsOf(DiversityRule rule, String prefix) {
    List<Field> fields = new ArrayList<>();
    for (RecordComponent component : rule.getClass().getRecordComponents()) {
      Object value = read(rule, component);
      String name = prefix + component.getName();
      Class<?> type = component.getType();
      if (type == double.class
          || type == int.class
          || type == Double.class
          || type == Integer.class) {
        fields.add(
            new Field(
                name,
                words(component.getName()),
                "number",
                value == null ? "" : plain(value),
                List.of()));
      } else if (type.isEnum()) {
        List<String> options =
            Arrays.stream(type.getEnumConstants()).map(Object::toString).toList();
        fields.add(
            new Field(name, words(component.getName()), "choice", String.valueOf(value), options));
      } else if (rule instanceof DiversityRule.Tiered tiered
          && component.getName().equals("tiers")) {
        fields.add(
            new Field(name, "tiers (up to VA : factor; …)", "text", tiersText(tiered), List.of()));
      }
    }
    return fields;
  }

  /**
   * The rule with the submitted values; unreadable values are reported in {@code problems} under
   * their form name and the original value is kept.
   */
  static DiversityRule rebuild(
      DiversityRule rule,
      String prefix,
      Map<String, String> submitted,
      Map<String, String> problems) {
    RecordComponent[] components = rule.getClass().getRecordComponents();
    Object[] values = new Object[components.length];
    Class<?>[] types = new Class<?>[components.length];
    for (int i = 0; i < components.length; i++) {
      RecordComponent component = components[i];
      types[i] = component.getType();
      values[i] = read(rule, component);
      String name = prefix + component.getName();
      String raw = submitted.get(name);
      if (raw == null) {
        continue;
      }
      try {
        values[i] = parse(raw.strip(), component, rule);
      } catch (IllegalArgumentException unreadable) {
        problems.put(name, unreadable.getMessage());
      }
    }
    try {
      return (DiversityRule) rule.getClass().getDeclaredConstructor(types).newInstance(values);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException("Cannot rebuild " + rule.getClass().getSimpleName(), e);
    }
  }

  private static Object parse(String raw, RecordComponent component, DiversityRule rule) {
    Class<?> type = component.getType();
    if (type == double.class || type == Double.class) {
      return number(raw);
    }
    if (type == int.class || type == Integer.class) {
      double value = number(raw);
      if (value != Math.rint(value)) {
        throw new IllegalArgumentException("Please enter a whole number.");
      }
      return (int) value;
    }
    if (type.isEnum()) {
      for (Object constant : type.getEnumConstants()) {
        if (constant.toString().equals(raw)) {
          return constant;
        }
      }
      throw new IllegalArgumentException("Choose one of the listed values.");
    }
    if (rule instanceof DiversityRule.Tiered && component.getName().equals("tiers")) {
      return tiers(raw);
    }
    return read(rule, component);
  }

  static List<DiversityRule.Tier> tiers(String text) {
    List<DiversityRule.Tier> tiers = new ArrayList<>();
    for (String band : text.split(";")) {
      if (band.isBlank()) {
        continue;
      }
      String[] parts = band.split(":");
      if (parts.length != 2) {
        throw new IllegalArgumentException(
            "Write each band as 'up to VA : factor', separated by ';'.");
      }
      Double upTo = parts[0].isBlank() ? null : number(parts[0].strip());
      tiers.add(new DiversityRule.Tier(upTo, number(parts[1].strip())));
    }
    return tiers;
  }

  static String tiersText(DiversityRule.Tiered tiered) {
    List<String> bands = new ArrayList<>();
    for (DiversityRule.Tier tier : tiered.tiers()) {
      bands.add(
          (tier.upToVoltAmperes() == null ? "" : plain(tier.upToVoltAmperes()))
              + ":"
              + plain(tier.factor()));
    }
    return String.join("; ", bands);
  }

  private static double number(String raw) {
    try {
      double value = Double.parseDouble(raw);
      if (Double.isNaN(value) || Double.isInfinite(value)) {
        throw new NumberFormatException();
      }
      return value;
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException("Please enter a number, such as 0.4.");
    }
  }

  private static Object read(DiversityRule rule, RecordComponent component) {
    try {
      return component.getAccessor().invoke(rule);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException(e);
    }
  }

  private static String plain(Object value) {
    if (value instanceof Double number) {
      return java.math.BigDecimal.valueOf(number).stripTrailingZeros().toPlainString();
    }
    return String.valueOf(value);
  }

  /** "largestFactor" → "largest factor". */
  private static String words(String camel) {
    return camel.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
  }
}
