package com.wayledger.engine.demand;

import com.wayledger.engine.LoadCategory;
import java.util.Arrays;

/**
 * The load lines of one board in flat arrays, so a board of hundreds of circuits is evaluated
 * without boxing. Lines of one circuit are contiguous. A line with circuit index -1 is a
 * board-level allowance (the NEC dwelling unit load).
 */
final class LoadLines {

  int size;
  int[] circuit = new int[64];
  LoadCategory[] category = new LoadCategory[64];
  double[] unitVoltAmperes = new double[64];
  int[] quantity = new int[64];
  double[] activeWatts = new double[64];
  double[] reactiveVars = new double[64];
  double[] apparentVoltAmperes = new double[64];

  /** Demand of each line after diversity, VA. */
  double[] demandVoltAmperes = new double[64];

  int add(
      int circuitIndex, LoadCategory lineCategory, int lineQuantity, double watts, double vars) {
    if (size == circuit.length) {
      int grown = size * 2;
      circuit = Arrays.copyOf(circuit, grown);
      category = Arrays.copyOf(category, grown);
      unitVoltAmperes = Arrays.copyOf(unitVoltAmperes, grown);
      quantity = Arrays.copyOf(quantity, grown);
      activeWatts = Arrays.copyOf(activeWatts, grown);
      reactiveVars = Arrays.copyOf(reactiveVars, grown);
      apparentVoltAmperes = Arrays.copyOf(apparentVoltAmperes, grown);
      demandVoltAmperes = Arrays.copyOf(demandVoltAmperes, grown);
    }
    int index = size++;
    double apparent = Math.hypot(watts, vars);
    circuit[index] = circuitIndex;
    category[index] = lineCategory;
    quantity[index] = lineQuantity;
    activeWatts[index] = watts;
    reactiveVars[index] = vars;
    apparentVoltAmperes[index] = apparent;
    unitVoltAmperes[index] = apparent / lineQuantity;
    demandVoltAmperes[index] = apparent;
    return index;
  }
}
