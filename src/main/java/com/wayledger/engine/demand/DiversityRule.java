package com.wayledger.engine.demand;

import java.util.ArrayList;
import java.util.List;

/**
 * One primitive of a diversity method: how the connected load of a group of load categories becomes
 * demand. Rules are plain data so a method can be copied and edited; {@link #problems()} says what
 * is wrong with an edited one. Amounts are apparent power (VA) unless the rule says amps; amps are
 * turned into VA with U0 times the number of lines the rule acts on (one for a single-phase board
 * or circuit, three for a three-phase one).
 */
public sealed interface DiversityRule {

  /** Plain words for schedules and exports. */
  String describe();

  /** What is wrong with the rule's figures; empty when it can be used. */
  List<String> problems();

  /** Every item at 100 % of its connected load. */
  record NoDiversity() implements DiversityRule {
    @Override
    public String describe() {
      return "no diversity (100 %)";
    }

    @Override
    public List<String> problems() {
      return List.of();
    }
  }

  /**
   * One factor on the group's whole connected load.
   *
   * @param factor demand ÷ connected load, in [0, 1]
   */
  record Flat(double factor) implements DiversityRule {
    @Override
    public String describe() {
      return percent(factor) + " of the total";
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      checkFactor(problems, "factor", factor);
      return problems;
    }
  }

  /**
   * The largest item at one factor, the second largest at another, every other item at a third, as
   * in the IET On-Site Guide's "100 % of the largest + 40 % of every other". Items of equal size
   * share the factors of the places they tie for, so the result does not depend on the order of the
   * schedule.
   *
   * @param largestFactor factor on the largest item, in [0, 1]
   * @param secondFactor factor on the second largest item, in [0, 1]
   * @param restFactor factor on every other item, in [0, 1]
   * @param rankBy whether an item is a whole circuit or one appliance
   */
  record LargestFirst(double largestFactor, double secondFactor, double restFactor, RankBy rankBy)
      implements DiversityRule {
    @Override
    public String describe() {
      String item = rankBy == RankBy.CIRCUIT ? "circuit" : "appliance";
      return percent(largestFactor)
          + " of the largest "
          + item
          + ", "
          + percent(secondFactor)
          + " of the second, "
          + percent(restFactor)
          + " of the rest";
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      checkFactor(problems, "largest factor", largestFactor);
      checkFactor(problems, "second factor", secondFactor);
      checkFactor(problems, "rest factor", restFactor);
      if (rankBy == null) {
        problems.add("rank by: choose circuit or appliance");
      }
      return problems;
    }
  }

  /**
   * The first amps at 100 %, the remainder at a factor, as in the On-Site Guide's cooker allowance
   * "10 A + 30 % of the remainder + 5 A for a socket-outlet in the cooker control unit".
   *
   * @param firstAmps current taken at 100 %, A (per line)
   * @param remainderFactor factor on the current above {@code firstAmps}, in [0, 1]
   * @param socketAdderAmps within a circuit only: allowance, A, for a socket-outlet load on the
   *     same circuit (a cooker control unit's socket), taken in place of that socket's own load and
   *     never more than it; 0 for none
   */
  record FirstAmps(double firstAmps, double remainderFactor, double socketAdderAmps)
      implements DiversityRule {
    @Override
    public String describe() {
      String text =
          "first " + number(firstAmps) + " A + " + percent(remainderFactor) + " of the remainder";
      return socketAdderAmps > 0
          ? text + " + " + number(socketAdderAmps) + " A for a socket-outlet"
          : text;
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      if (!(firstAmps >= 0) || Double.isInfinite(firstAmps)) {
        problems.add("first amps must be 0 or more, was " + firstAmps);
      }
      checkFactor(problems, "remainder factor", remainderFactor);
      if (!(socketAdderAmps >= 0) || Double.isInfinite(socketAdderAmps)) {
        problems.add("socket adder amps must be 0 or more, was " + socketAdderAmps);
      }
      return problems;
    }

    /** Demand current from connected current, before any socket adder, A. */
    public double demandAmps(double connectedAmps) {
      return Math.min(connectedAmps, firstAmps)
          + remainderFactor * Math.max(0.0, connectedAmps - firstAmps);
    }
  }

  /**
   * Factors by band of the group's total connected load, ascending, as in NEC Table 220.42.
   *
   * @param tiers bands in ascending order; the last band's upper bound may be null for "and above"
   */
  record Tiered(List<Tier> tiers) implements DiversityRule {
    public Tiered {
      tiers = List.copyOf(tiers);
    }

    @Override
    public String describe() {
      StringBuilder text = new StringBuilder();
      double from = 0.0;
      for (Tier tier : tiers) {
        if (text.length() > 0) {
          text.append(", ");
        }
        text.append(
                tier.upToVoltAmperes() == null
                    ? "above " + number(from)
                    : number(from) + "–" + number(tier.upToVoltAmperes()))
            .append(" VA at ")
            .append(percent(tier.factor()));
        from = tier.upToVoltAmperes() == null ? from : tier.upToVoltAmperes();
      }
      return text.toString();
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      if (tiers.isEmpty()) {
        problems.add("tiers: at least one band is needed");
      }
      double previous = 0.0;
      for (int i = 0; i < tiers.size(); i++) {
        Tier tier = tiers.get(i);
        checkFactor(problems, "tier " + (i + 1) + " factor", tier.factor());
        Double upTo = tier.upToVoltAmperes();
        if (upTo == null) {
          if (i != tiers.size() - 1) {
            problems.add("tier " + (i + 1) + ": only the last band may be open-ended");
          }
        } else if (!(upTo > previous) || Double.isInfinite(upTo)) {
          problems.add(
              "tier " + (i + 1) + ": bands must ascend, " + upTo + " VA after " + previous + " VA");
        } else {
          previous = upTo;
        }
      }
      return problems;
    }

    /** Demand of a total connected load, VA; load above the last closed band is taken at 100 %. */
    public double demandVoltAmperes(double connectedVoltAmperes) {
      double demand = 0.0;
      double from = 0.0;
      for (Tier tier : tiers) {
        double upTo =
            tier.upToVoltAmperes() == null ? Double.POSITIVE_INFINITY : tier.upToVoltAmperes();
        if (connectedVoltAmperes <= from) {
          return demand;
        }
        demand += tier.factor() * (Math.min(connectedVoltAmperes, upTo) - from);
        from = upTo;
      }
      return demand + Math.max(0.0, connectedVoltAmperes - from);
    }
  }

  /**
   * A band of a {@link Tiered} rule.
   *
   * @param upToVoltAmperes upper bound of the band, VA; null for no bound
   * @param factor factor on the part of the load inside the band, in [0, 1]
   */
  record Tier(Double upToVoltAmperes, double factor) {}

  /**
   * One factor when the group holds at least a number of items, 100 % otherwise, as in NEC 220.53
   * (75 % for four or more fastened-in-place appliances).
   *
   * @param minimumCount number of items (quantities summed) from which the factor applies, at least
   *     1
   * @param factor factor from that count on, in [0, 1]
   */
  record CountThreshold(int minimumCount, double factor) implements DiversityRule {
    @Override
    public String describe() {
      return percent(factor) + " when " + minimumCount + " or more items, else 100 %";
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      if (minimumCount < 1) {
        problems.add("minimum count must be 1 or more, was " + minimumCount);
      }
      checkFactor(problems, "factor", factor);
      return problems;
    }
  }

  /** NEC Table 220.55 household cooking appliances, columns A, B and C with Notes 1 to 3. */
  record NecCookingTable() implements DiversityRule {
    @Override
    public String describe() {
      return "NEC Table 220.55 (household cooking appliances)";
    }

    @Override
    public List<String> problems() {
      return List.of();
    }
  }

  /** NEC 220.54 household clothes dryers: at least 5,000 VA each, then Table 220.54 by number. */
  record NecDryerTable() implements DiversityRule {
    @Override
    public String describe() {
      return "NEC 220.54 (dryers, 5,000 VA minimum, Table 220.54)";
    }

    @Override
    public List<String> problems() {
      return List.of();
    }
  }

  /**
   * Non-coincident heating and cooling: only the larger of the two is counted (NEC 220.60,
   * 220.82(C)). Air conditioning in the group is cooling; every other category in the group is
   * heating.
   *
   * @param coolingFactor factor on the cooling load, in [0, 1]
   * @param heatingFactor factor on the heating load with fewer than {@code manyUnitsFrom} units
   * @param heatingFactorManyUnits factor on the heating load with {@code manyUnitsFrom} units or
   *     more
   * @param manyUnitsFrom number of separately controlled heating units from which the second factor
   *     applies, at least 1
   */
  record NonCoincident(
      double coolingFactor, double heatingFactor, double heatingFactorManyUnits, int manyUnitsFrom)
      implements DiversityRule {
    @Override
    public String describe() {
      return "larger of cooling at "
          + percent(coolingFactor)
          + " and heating at "
          + percent(heatingFactor)
          + " ("
          + percent(heatingFactorManyUnits)
          + " with "
          + manyUnitsFrom
          + " or more units)";
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      checkFactor(problems, "cooling factor", coolingFactor);
      checkFactor(problems, "heating factor", heatingFactor);
      checkFactor(problems, "heating factor with many units", heatingFactorManyUnits);
      if (manyUnitsFrom < 1) {
        problems.add("many units from must be 1 or more, was " + manyUnitsFrom);
      }
      return problems;
    }
  }

  /**
   * Every motor at 100 % plus a share of the largest motor's rating, as in NEC 220.50 and 430.24
   * (125 % of the largest). The only rule whose demand exceeds the connected load.
   *
   * @param largestExtraFactor extra share of the largest motor, in [0, 1]
   */
  record LargestMotorPlus(double largestExtraFactor) implements DiversityRule {
    @Override
    public String describe() {
      return "100 % of all + " + percent(largestExtraFactor) + " of the largest motor";
    }

    @Override
    public List<String> problems() {
      List<String> problems = new ArrayList<>();
      checkFactor(problems, "largest extra factor", largestExtraFactor);
      return problems;
    }
  }

  /** What counts as one item when ranking by size. */
  enum RankBy {
    /** A circuit with all its loads of the group's categories. */
    CIRCUIT,
    /** One appliance: one unit of a load line's quantity. */
    APPLIANCE
  }

  private static void checkFactor(List<String> problems, String name, double factor) {
    if (!(factor >= 0.0 && factor <= 1.0)) {
      problems.add(name + " must be between 0 and 1, was " + factor);
    }
  }

  private static String percent(double factor) {
    return number(factor * 100.0) + " %";
  }

  private static String number(double value) {
    return value == Math.rint(value) ? String.valueOf((long) value) : String.valueOf(value);
  }
}
