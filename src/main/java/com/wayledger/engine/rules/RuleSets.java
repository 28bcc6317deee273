package com.wayledger.engine.rules;

import java.util.List;
import java.util.Optional;

/** The rule sets the application knows, by key; {@link #IEC} is every existing site's. */
public final class RuleSets {

  public static final RuleSet IEC = new IecRuleSet();
  public static final RuleSet NEC = new NecRuleSet();

  private static final List<RuleSet> ALL = List.of(IEC, NEC);

  private RuleSets() {}

  /** Every rule set, the default first. */
  public static List<RuleSet> all() {
    return ALL;
  }

  /** The rule set with this key, if any. */
  public static Optional<RuleSet> find(String key) {
    return ALL.stream().filter(r -> r.key().equals(key)).findFirst();
  }

  /** The rule set with this key; the IEC set for null (a site from before rule sets). */
  public static RuleSet of(String key) {
    if (key == null) {
      return IEC;
    }
    return find(key).orElseThrow(() -> new IllegalArgumentException("unknown rule set " + key));
  }
}
