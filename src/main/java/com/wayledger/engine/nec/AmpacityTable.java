package com.wayledger.engine.nec;

import com.wayledger.engine.ConductorMaterial;

/**
 * NEC Table 310.16: allowable ampacities of insulated conductors rated up to 2000 V, not more than
 * three current-carrying conductors in raceway, cable or earth, 30 °C ambient, A. Values of NFPA 70
 * (2020/2023 editions; 14 AWG to 1000 kcmil), from memory, checked against a secondary reproduction
 * of the 2023 table (wiresizes.com/guides/nec-table-310-16); not read in the code book itself.
 * Aluminium and copper-clad aluminium have no 14 AWG entry.
 */
public final class AmpacityTable {

  /** The temperature columns of the table, °C. */
  public static final int[] COLUMNS_CELSIUS = {60, 75, 90};

  // rows in ConductorSize order; columns 60, 75, 90 °C
  private static final int[][] COPPER = {
    {15, 20, 25}, // 14
    {20, 25, 30}, // 12
    {30, 35, 40}, // 10
    {40, 50, 55}, // 8
    {55, 65, 75}, // 6
    {70, 85, 95}, // 4
    {85, 100, 115}, // 3
    {95, 115, 130}, // 2
    {110, 130, 145}, // 1
    {125, 150, 170}, // 1/0
    {145, 175, 195}, // 2/0
    {165, 200, 225}, // 3/0
    {195, 230, 260}, // 4/0
    {215, 255, 290}, // 250
    {240, 285, 320}, // 300
    {260, 310, 350}, // 350
    {280, 335, 380}, // 400
    {320, 380, 430}, // 500
    {350, 420, 475}, // 600
    {400, 475, 535}, // 750
    {455, 545, 615}, // 1000
  };

  private static final int[][] ALUMINIUM = {
    null, // 14: no entry
    {15, 20, 25}, // 12
    {25, 30, 35}, // 10
    {35, 40, 45}, // 8
    {40, 50, 55}, // 6
    {55, 65, 75}, // 4
    {65, 75, 85}, // 3
    {75, 90, 100}, // 2
    {85, 100, 115}, // 1
    {100, 120, 135}, // 1/0
    {115, 135, 150}, // 2/0
    {130, 155, 175}, // 3/0
    {150, 180, 205}, // 4/0
    {170, 205, 230}, // 250
    {195, 230, 260}, // 300
    {210, 250, 280}, // 350
    {225, 270, 305}, // 400
    {260, 310, 350}, // 500
    {285, 340, 385}, // 600
    {320, 385, 435}, // 750
    {375, 445, 500}, // 1000
  };

  private AmpacityTable() {}

  /**
   * The table's ampacity, A; null when the table has no entry (aluminium 14 AWG) or the column is
   * not 60, 75 or 90 °C.
   */
  public static Integer ampacityAmps(
      ConductorSize size, ConductorMaterial material, int columnCelsius) {
    int column =
        switch (columnCelsius) {
          case 60 -> 0;
          case 75 -> 1;
          case 90 -> 2;
          default -> -1;
        };
    if (column < 0 || size == null || material == null) {
      return null;
    }
    int[] row = (material == ConductorMaterial.COPPER ? COPPER : ALUMINIUM)[size.ordinal()];
    return row == null ? null : row[column];
  }
}
