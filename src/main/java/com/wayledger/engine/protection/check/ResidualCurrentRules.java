package com.wayledger.engine.protection.check;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Load categories whose circuits need additional protection by a residual-current device of IΔn ≤
 * 30 mA, each with the clause it comes from. The clause numbers are quoted from memory of BS 7671
 * (18th edition) and IEC 60364; check them against the edition in force.
 */
public final class ResidualCurrentRules {

  /**
   * One rule.
   *
   * @param words what the circuit feeds, for the finding's sentence
   * @param maxRatedAmps the rule covers circuits rated up to this, A; null for any rating
   * @param reference the clause
   */
  public record Rule(String words, Double maxRatedAmps, String reference) {

    /** Whether a circuit rated {@code ratedAmps} falls under the rule. */
    public boolean covers(double ratedAmps) {
      return maxRatedAmps == null || ratedAmps <= maxRatedAmps + 1e-9;
    }
  }

  private static final Map<LoadCategory, Rule> RULES = new EnumMap<>(LoadCategory.class);

  static {
    // from memory: BS 7671 411.3.3 / IEC 60364-4-41 411.3.3, socket-outlets up to 32 A
    RULES.put(
        LoadCategory.SOCKET_OUTLETS,
        new Rule("socket-outlet circuit", 32.0, SocketRcdCheck.REFERENCE));
    // from memory: BS 7671 722.531.3.101 / IEC 60364-7-722 722.531.3.101, every charging point
    // has its own RCD of IΔn ≤ 30 mA, whatever its rating
    RULES.put(
        LoadCategory.EV_CHARGING,
        new Rule(
            "car-charging circuit",
            null,
            "BS 7671 722.531.3.101 / IEC 60364-7-722 722.531.3.101 (from memory)"));
  }

  private ResidualCurrentRules() {}

  /** The rule for a category; null when the category needs none by itself. */
  public static Rule of(LoadCategory category) {
    return RULES.get(category);
  }

  /** The first rule any of the loads falls under (car charging before sockets); null when none. */
  public static Rule forLoads(List<LoadSpec> loads) {
    Rule found = null;
    for (LoadSpec load : loads) {
      Rule rule = of(load.category());
      if (rule != null && (found == null || rule.maxRatedAmps() == null)) {
        found = rule;
      }
    }
    return found;
  }
}
