package com.wayledger.engine.nec;

import java.util.Optional;

/**
 * Full-load currents of NEC Table 430.248 (single-phase AC motors) and Table 430.250 (three-phase
 * AC induction motors, squirrel cage and wound rotor), A, by horsepower and rated motor voltage.
 * 430.6(A)(1): these table values, not the nameplate current, size the conductors (430.22) and the
 * short-circuit and ground-fault protection (430.52). Values of NFPA 70 (2020 edition) from memory;
 * not read in the code book itself.
 *
 * <p>The tables' notes: the listed voltages are rated motor voltages and the currents apply to
 * system voltage ranges of 110 to 120 and 220 to 240 V (Table 430.248) and 110 to 120, 220 to 240,
 * 440 to 480 and 550 to 600 V (Table 430.250); 200 and 208 V systems have their own columns. The
 * tables give no rule for a horsepower between two rows: the next larger row is read (the safe
 * side) and the finding says so.
 */
public final class MotorTables {

  /** Rated motor voltages of Table 430.248, V. */
  static final int[] SINGLE_PHASE_VOLTS = {115, 200, 208, 230};

  /** Rated motor voltages of Table 430.250 (the 2300 V column is not carried), V. */
  static final int[] THREE_PHASE_VOLTS = {115, 200, 208, 230, 460, 575};

  // hp, then 115, 200, 208, 230 V (from memory, NFPA 70-2020 Table 430.248)
  private static final double[][] SINGLE_PHASE = {
    {1.0 / 6, 4.4, 2.5, 2.4, 2.2},
    {0.25, 5.8, 3.3, 3.2, 2.9},
    {1.0 / 3, 7.2, 4.1, 4.0, 3.6},
    {0.5, 9.8, 5.6, 5.4, 4.9},
    {0.75, 13.8, 7.9, 7.6, 6.9},
    {1, 16, 9.2, 8.8, 8.0},
    {1.5, 20, 11.5, 11.0, 10},
    {2, 24, 13.8, 13.2, 12},
    {3, 34, 19.6, 18.7, 17},
    {5, 56, 32.2, 30.8, 28},
    {7.5, 80, 46.0, 44.0, 40},
    {10, 100, 57.5, 55.0, 50},
  };

  // hp, then 115, 200, 208, 230, 460, 575 V; NaN where the table has no entry
  // (from memory, NFPA 70-2020 Table 430.250, induction-type squirrel cage and wound rotor)
  private static final double N = Double.NaN;
  private static final double[][] THREE_PHASE = {
    {0.5, 4.4, 2.5, 2.4, 2.2, 1.1, 0.9},
    {0.75, 6.4, 3.7, 3.5, 3.2, 1.6, 1.3},
    {1, 8.4, 4.8, 4.6, 4.2, 2.1, 1.7},
    {1.5, 12.0, 6.9, 6.6, 6.0, 3.0, 2.4},
    {2, 13.6, 7.8, 7.5, 6.8, 3.4, 2.7},
    {3, N, 11.0, 10.6, 9.6, 4.8, 3.9},
    {5, N, 17.5, 16.7, 15.2, 7.6, 6.1},
    {7.5, N, 25.3, 24.2, 22, 11, 9},
    {10, N, 32.2, 30.8, 28, 14, 11},
    {15, N, 48.3, 46.2, 42, 21, 17},
    {20, N, 62.1, 59.4, 54, 27, 22},
    {25, N, 78.2, 74.8, 68, 34, 27},
    {30, N, 92, 88, 80, 40, 32},
    {40, N, 120, 114, 104, 52, 41},
    {50, N, 150, 143, 130, 65, 52},
    {60, N, 177, 169, 154, 77, 62},
    {75, N, 221, 211, 192, 96, 77},
    {100, N, 285, 273, 248, 124, 99},
    {125, N, 359, 343, 312, 156, 125},
    {150, N, 414, 396, 360, 180, 144},
    {200, N, 552, 528, 480, 240, 192},
    {250, N, N, N, N, 302, 242},
    {300, N, N, N, N, 361, 289},
    {350, N, N, N, N, 414, 336},
    {400, N, N, N, N, 477, 382},
    {450, N, N, N, N, 515, 412},
    {500, N, N, N, N, 590, 472},
  };

  private MotorTables() {}

  /**
   * A table reading.
   *
   * @param fullLoadAmps the table's full-load current, A
   * @param tableHorsepower the row read (the next larger one when the motor's lies between rows)
   * @param columnVolts the rated motor voltage column read, V
   * @param table "Table 430.248" or "Table 430.250"
   */
  public record Reading(
      double fullLoadAmps, double tableHorsepower, int columnVolts, String table) {

    /** Whether a larger row than the motor's own horsepower was read. */
    public boolean roundedUp(double horsepower) {
      return tableHorsepower > horsepower + 1e-9;
    }
  }

  /**
   * The rated-motor-voltage column for a system voltage, per the tables' notes; empty when the
   * voltage falls in no range (a 277 V single-phase motor, for instance).
   */
  public static Optional<Integer> columnFor(double systemVolts, boolean threePhase) {
    if (systemVolts >= 110 - 1e-9 && systemVolts <= 120 + 1e-9) {
      return Optional.of(115);
    }
    if (Math.abs(systemVolts - 200) < 1.0) {
      return Optional.of(200);
    }
    if (Math.abs(systemVolts - 208) < 1.0) {
      return Optional.of(208);
    }
    if (systemVolts >= 220 - 1e-9 && systemVolts <= 240 + 1e-9) {
      return Optional.of(230);
    }
    if (threePhase && systemVolts >= 440 - 1e-9 && systemVolts <= 480 + 1e-9) {
      return Optional.of(460);
    }
    if (threePhase && systemVolts >= 550 - 1e-9 && systemVolts <= 600 + 1e-9) {
      return Optional.of(575);
    }
    return Optional.empty();
  }

  /**
   * The full-load current of a motor: the row of its horsepower, or of the next larger horsepower
   * the column has an entry for; empty when the voltage has no column or the motor is larger than
   * the table.
   */
  public static Optional<Reading> fullLoad(
      double horsepower, double systemVolts, boolean threePhase) {
    Optional<Integer> column = columnFor(systemVolts, threePhase);
    if (column.isEmpty() || !(horsepower > 0)) {
      return Optional.empty();
    }
    int[] volts = threePhase ? THREE_PHASE_VOLTS : SINGLE_PHASE_VOLTS;
    int index = -1;
    for (int i = 0; i < volts.length; i++) {
      if (volts[i] == column.get()) {
        index = i + 1;
      }
    }
    if (index < 0) {
      return Optional.empty();
    }
    for (double[] row : threePhase ? THREE_PHASE : SINGLE_PHASE) {
      if (row[0] >= horsepower - 1e-9 && !Double.isNaN(row[index])) {
        return Optional.of(
            new Reading(
                row[index], row[0], column.get(), threePhase ? "Table 430.250" : "Table 430.248"));
      }
    }
    return Optional.empty();
  }
}
