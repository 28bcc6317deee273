package com.wayledger.engine.nec;

/**
 * NEC Table 310.15(B)(1) (2020/2023 numbering; 310.15(B)(2)(a) in 2017): ambient temperature
 * correction factors for ampacities based on 30 °C, by 5 °C band. Values from memory, checked
 * against a secondary reproduction of the 2023 table (wiresizes.com/guides/nec-table-310-16); each
 * equals the equation of 310.15(B), √((Tc − Ta)/(Tc − 30)), at the band's upper end, rounded to two
 * decimals (the tests check that).
 */
public final class AmbientCorrection {

  /** Upper end of each band, °C ("10 or less" is the first). */
  static final int[] BAND_TOP_CELSIUS = {
    10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75, 80, 85
  };

  // columns 60, 75, 90 °C; NaN where the table has no factor (conductor may not be used)
  private static final double[][] FACTORS = {
    {1.29, 1.20, 1.15},
    {1.22, 1.15, 1.12},
    {1.15, 1.11, 1.08},
    {1.08, 1.05, 1.04},
    {1.00, 1.00, 1.00},
    {0.91, 0.94, 0.96},
    {0.82, 0.88, 0.91},
    {0.71, 0.82, 0.87},
    {0.58, 0.75, 0.82},
    {0.41, 0.67, 0.76},
    {Double.NaN, 0.58, 0.71},
    {Double.NaN, 0.47, 0.65},
    {Double.NaN, 0.33, 0.58},
    {Double.NaN, Double.NaN, 0.50},
    {Double.NaN, Double.NaN, 0.41},
    {Double.NaN, Double.NaN, 0.29},
  };

  private AmbientCorrection() {}

  /**
   * The correction factor for an ambient temperature and a conductor temperature column (60, 75 or
   * 90 °C); null when the table gives none (the ambient is at or above what the conductor may
   * take).
   */
  public static Double factor(double ambientCelsius, int columnCelsius) {
    int column =
        switch (columnCelsius) {
          case 60 -> 0;
          case 75 -> 1;
          case 90 -> 2;
          default -> -1;
        };
    if (column < 0 || Double.isNaN(ambientCelsius)) {
      return null;
    }
    for (int band = 0; band < BAND_TOP_CELSIUS.length; band++) {
      // the table's bands are whole degrees: 31–35 holds everything above 30 up to 35
      if (ambientCelsius <= BAND_TOP_CELSIUS[band]) {
        double f = FACTORS[band][column];
        return Double.isNaN(f) ? null : f;
      }
    }
    return null;
  }
}
