package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.demand.DiversityRule.CountThreshold;
import com.wayledger.engine.demand.DiversityRule.FirstAmps;
import com.wayledger.engine.demand.DiversityRule.Flat;
import com.wayledger.engine.demand.DiversityRule.LargestFirst;
import com.wayledger.engine.demand.DiversityRule.LargestMotorPlus;
import com.wayledger.engine.demand.DiversityRule.NecCookingTable;
import com.wayledger.engine.demand.DiversityRule.NecDryerTable;
import com.wayledger.engine.demand.DiversityRule.NonCoincident;
import com.wayledger.engine.demand.DiversityRule.RankBy;
import com.wayledger.engine.demand.DiversityRule.Tiered;

/**
 * Applies one rule to a set of load lines and writes each line's demand. Rules that act on a total
 * give every line the same effective factor; ranking rules give each item its own.
 */
final class GroupDemandCalculator {

  /**
   * Sizes closer than this (relative) count as equal when ranking, so ties do not depend on order.
   */
  private static final double TIE_TOLERANCE = 1e-9;

  private GroupDemandCalculator() {}

  /**
   * Writes {@code lines.demandVoltAmperes} for each member and returns their total demand, VA.
   *
   * @param voltAmperesPerAmp U0 times the number of lines the rule acts on, to turn amps into VA
   */
  static double apply(
      DiversityRule rule, LoadLines lines, int[] members, int count, double voltAmperesPerAmp) {
    double connected = 0.0;
    for (int m = 0; m < count; m++) {
      connected += lines.apparentVoltAmperes[members[m]];
    }
    if (rule instanceof DiversityRule.NoDiversity) {
      return proportional(lines, members, count, 1.0, connected);
    }
    if (rule instanceof Flat flat) {
      return proportional(lines, members, count, flat.factor(), connected);
    }
    if (rule instanceof FirstAmps firstAmps) {
      double demand = firstAmps.demandAmps(connected / voltAmperesPerAmp) * voltAmperesPerAmp;
      return proportional(
          lines, members, count, connected > 0 ? demand / connected : 1.0, connected);
    }
    if (rule instanceof Tiered tiered) {
      double demand = tiered.demandVoltAmperes(connected);
      return proportional(
          lines, members, count, connected > 0 ? demand / connected : 1.0, connected);
    }
    if (rule instanceof CountThreshold threshold) {
      int items = 0;
      for (int m = 0; m < count; m++) {
        items += lines.quantity[members[m]];
      }
      return proportional(
          lines,
          members,
          count,
          items >= threshold.minimumCount() ? threshold.factor() : 1.0,
          connected);
    }
    if (rule instanceof LargestFirst largest) {
      return largest.rankBy() == RankBy.CIRCUIT
          ? largestCircuitFirst(largest, lines, members, count)
          : largestApplianceFirst(largest, lines, members, count);
    }
    if (rule instanceof NecCookingTable) {
      return necCooking(lines, members, count);
    }
    if (rule instanceof NecDryerTable) {
      return necDryers(lines, members, count);
    }
    if (rule instanceof NonCoincident nonCoincident) {
      return nonCoincident(nonCoincident, lines, members, count);
    }
    if (rule instanceof LargestMotorPlus motors) {
      return largestMotorPlus(motors, lines, members, count);
    }
    throw new IllegalStateException("rule without a calculation: " + rule);
  }

  private static double proportional(
      LoadLines lines, int[] members, int count, double factor, double connected) {
    for (int m = 0; m < count; m++) {
      int i = members[m];
      lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i] * factor;
    }
    return connected * factor;
  }

  private static double largestCircuitFirst(
      LargestFirst rule, LoadLines lines, int[] members, int count) {
    // lines of one circuit are contiguous, so a circuit is a run of members with the same circuit
    // index
    double[] amounts = new double[count];
    int[] runStart = new int[count + 1];
    int items = 0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      boolean sameCircuit =
          m > 0 && lines.circuit[i] >= 0 && lines.circuit[i] == lines.circuit[members[m - 1]];
      if (!sameCircuit) {
        runStart[items++] = m;
      }
      amounts[items - 1] += lines.apparentVoltAmperes[i];
    }
    runStart[items] = count;
    int[] units = new int[items];
    java.util.Arrays.fill(units, 1);
    double[] factors = rankedFactors(rule, amounts, units, items);
    double total = 0.0;
    for (int item = 0; item < items; item++) {
      for (int m = runStart[item]; m < runStart[item + 1]; m++) {
        int i = members[m];
        lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i] * factors[item];
        total += lines.demandVoltAmperes[i];
      }
    }
    return total;
  }

  private static double largestApplianceFirst(
      LargestFirst rule, LoadLines lines, int[] members, int count) {
    double[] amounts = new double[count];
    int[] units = new int[count];
    for (int m = 0; m < count; m++) {
      amounts[m] = lines.unitVoltAmperes[members[m]];
      units[m] = lines.quantity[members[m]];
    }
    double[] factors = rankedFactors(rule, amounts, units, count);
    double total = 0.0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i] * factors[m];
      total += lines.demandVoltAmperes[i];
    }
    return total;
  }

  /**
   * Average factor of each item when items (each {@code units} equal units of {@code amounts}) are
   * ranked largest first: place 1 takes the largest factor, place 2 the second, the rest the third.
   * Items of equal size share the places they tie for.
   */
  static double[] rankedFactors(LargestFirst rule, double[] amounts, int[] units, int items) {
    int[] order = new int[items];
    for (int k = 0; k < items; k++) {
      order[k] = k;
    }
    for (int k = 1; k < items; k++) {
      int moving = order[k];
      int j = k - 1;
      while (j >= 0 && amounts[order[j]] < amounts[moving]) {
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = moving;
    }
    double[] factors = new double[items];
    long place = 0;
    int k = 0;
    while (k < items) {
      int end = k;
      long tiedUnits = 0;
      double size = amounts[order[k]];
      while (end < items
          && Math.abs(amounts[order[end]] - size) <= TIE_TOLERANCE * Math.max(1.0, size)) {
        tiedUnits += units[order[end]];
        end++;
      }
      double factorSum = 0.0;
      for (long p = place; p < Math.min(place + tiedUnits, 2); p++) {
        factorSum += p == 0 ? rule.largestFactor() : rule.secondFactor();
      }
      // every place from the third on takes the rest factor
      factorSum += Math.max(0L, place + tiedUnits - Math.max(place, 2L)) * rule.restFactor();
      double average = tiedUnits > 0 ? factorSum / tiedUnits : rule.restFactor();
      for (int t = k; t < end; t++) {
        factors[order[t]] = average;
      }
      place += tiedUnits;
      k = end;
    }
    return factors;
  }

  private static double necCooking(LoadLines lines, int[] members, int count) {
    int countA = 0;
    int countB = 0;
    int countC = 0;
    double connectedA = 0.0;
    double connectedB = 0.0;
    double connectedC = 0.0;
    double ratingSumC = 0.0;
    double total = 0.0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      double kilowatts = lines.unitVoltAmperes[i] / 1000.0;
      switch (NecCookingDemand.columnOf(kilowatts)) {
        case 'A' -> {
          countA += lines.quantity[i];
          connectedA += lines.apparentVoltAmperes[i];
        }
        case 'B' -> {
          countB += lines.quantity[i];
          connectedB += lines.apparentVoltAmperes[i];
        }
        case 'C' -> {
          countC += lines.quantity[i];
          connectedC += lines.apparentVoltAmperes[i];
          // Note 2: ratings under 12 kW count as 12 kW in the average
          ratingSumC +=
              Math.max(NecCookingDemand.COLUMN_C_BASE_KILOWATTS, kilowatts) * lines.quantity[i];
        }
        default -> {
          lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i];
          total += lines.apparentVoltAmperes[i];
        }
      }
    }
    double factorA = NecCookingDemand.columnAFactor(countA);
    double factorB = NecCookingDemand.columnBFactor(countB);
    double factorC =
        countC == 0
            ? 1.0
            : NecCookingDemand.columnCKilowatts(countC, ratingSumC / countC) * 1000.0 / connectedC;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      char column = NecCookingDemand.columnOf(lines.unitVoltAmperes[i] / 1000.0);
      double factor =
          column == 'A' ? factorA : column == 'B' ? factorB : column == 'C' ? factorC : 1.0;
      lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i] * factor;
    }
    return total
        + connectedA * factorA
        + connectedB * factorB
        + connectedC * (countC == 0 ? 0.0 : factorC);
  }

  private static double necDryers(LoadLines lines, int[] members, int count) {
    int dryers = 0;
    for (int m = 0; m < count; m++) {
      dryers += lines.quantity[members[m]];
    }
    double factor = NecDryerDemand.factor(dryers);
    double total = 0.0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      lines.demandVoltAmperes[i] =
          NecDryerDemand.loadPerDryerVoltAmperes(lines.unitVoltAmperes[i])
              * lines.quantity[i]
              * factor;
      total += lines.demandVoltAmperes[i];
    }
    return total;
  }

  private static double nonCoincident(
      NonCoincident rule, LoadLines lines, int[] members, int count) {
    double cooling = 0.0;
    double heating = 0.0;
    int heatingUnits = 0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      if (lines.category[i] == LoadCategory.AIR_CONDITIONING) {
        cooling += lines.apparentVoltAmperes[i];
      } else {
        heating += lines.apparentVoltAmperes[i];
        heatingUnits += lines.quantity[i];
      }
    }
    double heatingFactor =
        heatingUnits >= rule.manyUnitsFrom() ? rule.heatingFactorManyUnits() : rule.heatingFactor();
    boolean heatingGoverns = heating * heatingFactor >= cooling * rule.coolingFactor();
    double total = 0.0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      boolean isCooling = lines.category[i] == LoadCategory.AIR_CONDITIONING;
      double factor =
          isCooling
              ? (heatingGoverns ? 0.0 : rule.coolingFactor())
              : (heatingGoverns ? heatingFactor : 0.0);
      lines.demandVoltAmperes[i] = lines.apparentVoltAmperes[i] * factor;
      total += lines.demandVoltAmperes[i];
    }
    return total;
  }

  private static double largestMotorPlus(
      LargestMotorPlus rule, LoadLines lines, int[] members, int count) {
    double largest = 0.0;
    for (int m = 0; m < count; m++) {
      largest = Math.max(largest, lines.unitVoltAmperes[members[m]]);
    }
    long tiedUnits = 0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      if (Math.abs(lines.unitVoltAmperes[i] - largest) <= TIE_TOLERANCE * Math.max(1.0, largest)) {
        tiedUnits += lines.quantity[i];
      }
    }
    double total = 0.0;
    for (int m = 0; m < count; m++) {
      int i = members[m];
      double demand = lines.apparentVoltAmperes[i];
      if (largest > 0
          && Math.abs(lines.unitVoltAmperes[i] - largest)
              <= TIE_TOLERANCE * Math.max(1.0, largest)) {
        demand += rule.largestExtraFactor() * largest * lines.quantity[i] / tiedUnits;
      }
      lines.demandVoltAmperes[i] = demand;
      total += demand;
    }
    return total;
  }
}
