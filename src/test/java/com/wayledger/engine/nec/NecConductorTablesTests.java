package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.ConductorMaterial;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Spot values of the NEC tables. Source beside each: NFPA 70 (NEC) 2020/2023, recalled from memory
 * and read in a secondary reproduction of the 2023 Table 310.16 and its correction and adjustment
 * tables (wiresizes.com/guides/nec-table-310-16); not read in the code book itself.
 */
class NecConductorTablesTests {

  @ParameterizedTest(name = "{0} {1} {2} °C = {3} A")
  @CsvSource({
    // NEC Table 310.16 (secondary reproduction, see class note)
    "AWG_14, COPPER, 60, 15",
    "AWG_14, COPPER, 75, 20",
    "AWG_14, COPPER, 90, 25",
    "AWG_12, COPPER, 75, 25",
    "AWG_10, COPPER, 90, 40",
    "AWG_8, COPPER, 75, 50",
    "AWG_3, COPPER, 90, 115",
    "AWG_1_0, COPPER, 75, 150",
    "AWG_4_0, COPPER, 60, 195",
    "KCMIL_500, COPPER, 90, 430",
    "KCMIL_1000, COPPER, 75, 545",
    "AWG_12, ALUMINIUM, 75, 20",
    "AWG_2, ALUMINIUM, 75, 90",
    "AWG_4_0, ALUMINIUM, 75, 180",
    "KCMIL_250, ALUMINIUM, 90, 230",
    "KCMIL_750, ALUMINIUM, 60, 320"
  })
  void table310_16SpotValues(
      ConductorSize size, ConductorMaterial material, int column, int expectedAmps) {
    assertThat(AmpacityTable.ampacityAmps(size, material, column))
        .as("Table 310.16 %s %s %d °C", size.label(), material, column)
        .isEqualTo(expectedAmps);
  }

  @Test
  void aluminiumHasNoFourteenAwgEntry() {
    // NEC Table 310.16: the aluminium columns start at 12 AWG
    assertThat(AmpacityTable.ampacityAmps(ConductorSize.AWG_14, ConductorMaterial.ALUMINIUM, 75))
        .isNull();
  }

  @Test
  void ambientFactorsAreTheEquationOf310_15BAtEachBandsUpperEnd() {
    // NEC 310.15(B): F = √((Tc − Ta)/(Tc − 30)); the table lists it at each band's upper end to 2
    // decimals. An independent check of every table entry typed from memory.
    for (int column : AmpacityTable.COLUMNS_CELSIUS) {
      for (int top : AmbientCorrection.BAND_TOP_CELSIUS) {
        Double factor = AmbientCorrection.factor(top, column);
        if (top >= column) {
          assertThat(factor).as("no factor at %d °C for a %d °C conductor", top, column).isNull();
          continue;
        }
        double equation = Math.sqrt((column - top) / (column - 30.0));
        assertThat(factor)
            .as("factor at %d °C for a %d °C conductor", top, column)
            .isCloseTo(equation, within(0.005 + 1e-9));
      }
    }
  }

  @Test
  void ambientFactorSpotValues() {
    // Table 310.15(B)(1): 36–40 °C, 75 °C column 0.88; 41–45 °C, 90 °C column 0.87
    assertThat(AmbientCorrection.factor(40.0, 75)).isEqualTo(0.88);
    assertThat(AmbientCorrection.factor(43.0, 90)).isEqualTo(0.87);
    assertThat(AmbientCorrection.factor(30.0, 60)).isEqualTo(1.00);
  }

  @ParameterizedTest(name = "{0} conductors → {1}")
  @CsvSource({
    "3, 1.0",
    "4, 0.8",
    "6, 0.8",
    "7, 0.7",
    "9, 0.7",
    "10, 0.5",
    "20, 0.5",
    "21, 0.45",
    "31, 0.4",
    "41, 0.35"
  })
  void adjustmentForMoreThanThreeCurrentCarryingConductors(int conductors, double expected) {
    // NEC Table 310.15(C)(1) (secondary reproduction, see class note)
    assertThat(ConductorAdjustment.factor(conductors)).isEqualTo(expected);
  }

  @ParameterizedTest(name = "{0} {1} ≤ {2} A")
  @CsvSource({
    // NEC 240.4(D)(3)–(7), from memory; the same limits are printed in the footnote of an older
    // Table 310-16 reproduction (alanwire.com/resources/allowable-ampacities)
    "AWG_14, COPPER, 15",
    "AWG_12, COPPER, 20",
    "AWG_10, COPPER, 30",
    "AWG_12, ALUMINIUM, 15",
    "AWG_10, ALUMINIUM, 25"
  })
  void smallConductorLimits(ConductorSize size, ConductorMaterial material, int expected) {
    assertThat(OvercurrentLimits.smallConductorLimitAmps(size, material)).isEqualTo(expected);
  }

  @Test
  void eightAwgHasNoSmallConductorLimit() {
    // 240.4(D) covers 18 AWG to 10 AWG only
    assertThat(
            OvercurrentLimits.smallConductorLimitAmps(
                ConductorSize.AWG_8, ConductorMaterial.COPPER))
        .isNull();
  }

  @Test
  void standardRatingsOf240_6A() {
    // NEC 240.6(A), from memory: 15 … 6000 A; 1, 3, 6, 10 and 601 A for fuses only
    assertThat(OvercurrentLimits.isStandardRating(20, false)).isTrue();
    assertThat(OvercurrentLimits.isStandardRating(225, false)).isTrue();
    assertThat(OvercurrentLimits.isStandardRating(32, false)).as("an IEC rating").isFalse();
    assertThat(OvercurrentLimits.isStandardRating(601, false)).isFalse();
    assertThat(OvercurrentLimits.isStandardRating(601, true)).isTrue();
    assertThat(OvercurrentLimits.nextStandardRatingAtOrAbove(21.0)).isEqualTo(25);
  }

  @Test
  void awgAreasFollowTheGaugeDefinition() {
    // 12 AWG = 3.31 mm², 4/0 AWG = 107.2 mm², 250 kcmil = 126.7 mm²: the AWG formula (ASTM B258,
    // from memory) and 1 kcmil = 0.5067 mm²; the same figures appear in NEC Chapter 9 Table 8's
    // circular-mil column (from memory: 12 AWG 6530 cmil)
    assertThat(ConductorSize.AWG_12.squareMillimetres()).isCloseTo(3.31, within(0.01));
    assertThat(ConductorSize.AWG_4_0.squareMillimetres()).isCloseTo(107.2, within(0.1));
    assertThat(ConductorSize.KCMIL_250.squareMillimetres()).isCloseTo(126.7, within(0.1));
    assertThat(ConductorSize.ofSquareMillimetres(2.08)).contains(ConductorSize.AWG_14);
    assertThat(ConductorSize.ofSquareMillimetres(2.5)).as("an IEC size is no AWG size").isEmpty();
  }
}
