package com.wayledger.engine.demand;

/**
 * NEC Table 220.55, demand of household cooking appliances rated over 1¾ kW. Column A (under 3½ kW)
 * and column B (3½ to 8¾ kW) are percentages of the nameplate total; column C (over 8¾ kW, taken as
 * 12 kW ranges) is a maximum demand in kW, raised 5 % for each kW or major fraction of a kW by
 * which the rating (Note 1) or the average rating with ratings under 12 kW counted as 12 kW (Note
 * 2) exceeds 12 kW. Note 3 lets each column be computed separately and the results added.
 * Appliances over 27 kW are outside the table and are taken at nameplate.
 */
public final class NecCookingDemand {

  /** Upper edge of column A, kW (appliances rated less than this). */
  public static final double COLUMN_A_BELOW_KILOWATTS = 3.5;

  /** Upper edge of column B, kW (inclusive). */
  public static final double COLUMN_B_UP_TO_KILOWATTS = 8.75;

  /** Rating on which column C is based, kW. */
  public static final double COLUMN_C_BASE_KILOWATTS = 12.0;

  /** Largest rating the table covers, kW. */
  public static final double TABLE_LIMIT_KILOWATTS = 27.0;

  // percent by number of appliances, index 1..25 (from memory of NFPA 70 Table 220.55)
  private static final int[] COLUMN_A_PERCENT = {
    0, 80, 75, 70, 66, 62, 59, 56, 53, 51, 49, 47, 45, 43, 41, 40, 39, 38, 37, 36, 35, 34, 33, 32,
    31, 30
  };
  private static final int[] COLUMN_B_PERCENT = {
    0, 80, 65, 55, 50, 45, 43, 40, 36, 35, 34, 32, 32, 32, 32, 32, 28, 28, 28, 28, 28, 26, 26, 26,
    26, 26
  };

  private NecCookingDemand() {}

  /** Column A demand factor for a number of appliances rated under 3½ kW. */
  public static double columnAFactor(int count) {
    if (count <= 0) {
      return 0.0;
    }
    return (count <= 25 ? COLUMN_A_PERCENT[count] : 30) / 100.0;
  }

  /** Column B demand factor for a number of appliances rated 3½ to 8¾ kW. */
  public static double columnBFactor(int count) {
    if (count <= 0) {
      return 0.0;
    }
    if (count <= 25) {
      return COLUMN_B_PERCENT[count] / 100.0;
    }
    if (count <= 30) {
      return 0.24;
    }
    if (count <= 40) {
      return 0.22;
    }
    if (count <= 50) {
      return 0.20;
    }
    if (count <= 60) {
      return 0.18;
    }
    return 0.16;
  }

  /** Column C maximum demand for a number of ranges of 12 kW or less, kW. */
  public static double columnCKilowatts(int count) {
    if (count <= 0) {
      return 0.0;
    }
    return switch (count) {
      case 1 -> 8.0;
      case 2 -> 11.0;
      case 3 -> 14.0;
      case 4 -> 17.0;
      case 5 -> 20.0;
      default -> count <= 40 ? 15.0 + count : 25.0 + 0.75 * count;
    };
  }

  /**
   * Column C maximum demand raised by Notes 1 and 2 for ranges of a given (average) rating, kW.
   *
   * @param count number of ranges
   * @param averageRatingKilowatts their rating, or average rating with any under 12 kW counted as
   *     12 kW
   */
  public static double columnCKilowatts(int count, double averageRatingKilowatts) {
    double excess = averageRatingKilowatts - COLUMN_C_BASE_KILOWATTS;
    int steps = 0;
    if (excess > 0) {
      double whole = Math.floor(excess);
      // "each kW or major fraction thereof": a fraction above one half counts as a whole kW
      steps = (int) whole + (excess - whole > 0.5 ? 1 : 0);
    }
    return columnCKilowatts(count) * (1.0 + 0.05 * steps);
  }

  /**
   * Column of Table 220.55 an appliance of a rating falls in: 'A', 'B', 'C', or 'X' above 27 kW.
   */
  public static char columnOf(double ratingKilowatts) {
    if (ratingKilowatts < COLUMN_A_BELOW_KILOWATTS) {
      return 'A';
    }
    if (ratingKilowatts <= COLUMN_B_UP_TO_KILOWATTS) {
      return 'B';
    }
    return ratingKilowatts <= TABLE_LIMIT_KILOWATTS ? 'C' : 'X';
  }
}
