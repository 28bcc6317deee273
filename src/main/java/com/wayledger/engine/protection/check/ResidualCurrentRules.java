package com.wayledger.engine.protection.check;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Load categories and circuit locations whose circuits need additional protection by a
 * residual-current device of IΔn ≤ 30 mA, each with the clause it comes from. The clause numbers
 * are quoted from memory of BS 7671 (18th edition) and IEC 60364; check them against the edition in
 * force.
 */
public final class ResidualCurrentRules {

  /**
   * One rule.
   *
   * @param words what the circuit feeds, for the finding's sentence
   * @param maxRatedAmps the rule covers circuits rated up to this, A; null for any rating
   * @param reference the clause
   * @param remedy what to fit when the rule is not met
   */
  public record Rule(String words, Double maxRatedAmps, String reference, String remedy) {

    public Rule(String words, Double maxRatedAmps, String reference) {
      this(words, maxRatedAmps, reference, "fit a 30 mA RCBO on the way");
    }

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
            "BS 7671 722.531.3.101 / IEC 60364-7-722 722.531.3.101 (from memory)",
            "fit a 30 mA RCBO (type A or as the charger maker requires) on the way"));
  }

  private static final Map<CircuitLocation, Rule> BY_LOCATION =
      new EnumMap<>(CircuitLocation.class);

  static {
    // from memory: BS 7671 411.3.3 (b), mobile equipment up to 32 A for use outdoors; applied
    // here to every outdoor circuit whatever its rating, the safe side of the rule
    BY_LOCATION.put(
        CircuitLocation.OUTDOORS,
        new Rule(
            "outdoor circuit",
            null,
            "BS 7671 411.3.3 (b) / IEC 60364-4-41 411.3.3 (from memory)",
            "fit a 30 mA RCBO on the way, or an upstream 30 mA RCD"));
    // from memory: BS 7671 701.411.3.3, every circuit of a location containing a bath or shower
    BY_LOCATION.put(
        CircuitLocation.BATH_OR_SHOWER,
        new Rule(
            "circuit in a room with a bath or shower",
            null,
            "BS 7671 701.411.3.3 / IEC 60364-7-701 701.411.3.3 (from memory)",
            "fit a 30 mA RCBO on the way, or an upstream 30 mA RCD"));
    // from memory: BS 7671 section 702, equipment and socket-outlets in the zones of a pool
    BY_LOCATION.put(
        CircuitLocation.SWIMMING_POOL,
        new Rule(
            "circuit at a swimming pool or fountain",
            null,
            "BS 7671 section 702 / IEC 60364-7-702 (from memory)",
            "fit a 30 mA RCBO on the way, or supply the equipment by SELV as section 702 allows"));
    // from memory: BS 7671 703.411.3.3, every circuit of a sauna (the heater itself may be
    // exempt where its maker says so; the rule here includes it, the safe side)
    BY_LOCATION.put(
        CircuitLocation.SAUNA,
        new Rule(
            "circuit in a sauna",
            null,
            "BS 7671 703.411.3.3 / IEC 60364-7-703 703.411.3.3 (from memory)",
            "fit a 30 mA RCBO on the way"));
  }

  /**
   * What a proposal assumes for a final circuit whose location is not recorded and whose loads do
   * not ask for 30 mA by themselves: that it needs it (the safe side), named as an assumption.
   */
  public static final Rule LOCATION_NOT_RECORDED =
      new Rule(
          "circuit whose location is not recorded (30 mA assumed, the safe side)",
          null,
          SocketRcdCheck.LOCATION_REFERENCE,
          "record where the circuit's equipment is, or fit a 30 mA RCBO on the way");

  private ResidualCurrentRules() {}

  /** The rule for a category; null when the category needs none by itself. */
  public static Rule of(LoadCategory category) {
    return RULES.get(category);
  }

  /** The rule for a location; null when the location needs none by itself, or is not recorded. */
  public static Rule of(CircuitLocation location) {
    return location == null ? null : BY_LOCATION.get(location);
  }

  /**
   * The rule a final circuit falls under: a load rule covering any rating (car charging, the more
   * specific clause), else its location's (which covers any rating), else its loads' (sockets up to
   * 32 A); null when none asks for 30 mA protection.
   */
  public static Rule forCircuit(List<LoadSpec> loads, CircuitLocation location) {
    Rule byLoads = forLoads(loads);
    if (byLoads != null && byLoads.maxRatedAmps() == null) {
      return byLoads;
    }
    Rule byLocation = of(location);
    return byLocation != null ? byLocation : byLoads;
  }

  /**
   * Whether the verdict hangs on a location that is not recorded: no location, and the loads do not
   * already ask for 30 mA protection at this rating.
   */
  public static boolean needsLocation(
      List<LoadSpec> loads, CircuitLocation location, Double ratedAmps) {
    if (location != null) {
      return false;
    }
    Rule byLoads = forLoads(loads);
    return byLoads == null || ratedAmps == null || !byLoads.covers(ratedAmps);
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
