package com.wayledger.engine.rules;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Reading and writing conductor sizes and cable lengths in a site's units. */
class CableUnitsTests {

  @Test
  void oneFootIsExactlyPointThreeZeroFourEightMetres() {
    // International yard and pound agreement (1959): 1 yd = 0.9144 m, so 1 ft = 0.3048 m exactly
    assertThat(CableUnits.metresOfFeet(1.0)).as("1 ft in m").isEqualTo(0.3048);
    // 100 ft = 30.48 m by the same definition
    assertThat(CableUnits.metresOfFeet(100.0)).as("100 ft in m").isCloseTo(30.48, within(1e-12));
  }

  @ParameterizedTest
  @ValueSource(doubles = {1, 12.5, 50, 75, 99.99, 250, 1234.56, 16404})
  void aLengthTypedInFeetReadsBackAsTheSameFeet(double feet) {
    Double metres = CableUnits.AWG_AND_FEET.metresOf(feet);
    assertThat(CableUnits.AWG_AND_FEET.lengthInUnit(metres))
        .as("%s ft stored as %s m and read back", feet, metres)
        .isEqualTo(feet);
  }

  @Test
  void fiftyFeetIsStoredAsFifteenPointTwoFourMetresAndShownAsFiftyFeet() {
    // 50 × 0.3048 = 15.24 (foot definition)
    assertThat(CableUnits.AWG_AND_FEET.metresOf(50.0)).isCloseTo(15.24, within(1e-12));
    assertThat(CableUnits.AWG_AND_FEET.lengthText(15.24)).isEqualTo("50 ft");
  }

  @Test
  void metricSitesKeepMetresAndSquareMillimetres() {
    assertThat(CableUnits.METRIC.lengthText(18.0)).isEqualTo("18 m");
    assertThat(CableUnits.METRIC.metresOf(18.0)).isEqualTo(18.0);
    assertThat(CableUnits.METRIC.sizeText(2.5)).isEqualTo("2.5 mm²");
  }

  @ParameterizedTest
  @CsvSource({
    // ASTM B258 areas (from memory): 14 AWG 2.08 mm², 12 AWG 3.31, 10 AWG 5.26, 6 AWG 13.3,
    // 1/0 AWG 53.5, 4/0 AWG 107; 1 kcmil = 0.5067 mm² (circular mil definition), 250 kcmil 127
    "14 AWG, 2.08",
    "12 AWG, 3.31",
    "10 AWG, 5.26",
    "6 AWG, 13.3",
    "1/0 AWG, 53.5",
    "4/0 AWG, 107.2",
    "250 kcmil, 126.7",
    "500 kcmil, 253.4",
    "1000 kcmil, 506.7"
  })
  void anNecSizeIsStoredAsItsAreaAndShownByItsLabelAgain(String label, double areaMm2) {
    double stored = CableUnits.squareMillimetresOfAwg(label).orElseThrow();
    assertThat(stored).as("%s area, mm²", label).isCloseTo(areaMm2, within(areaMm2 * 0.005));
    assertThat(CableUnits.AWG_AND_FEET.sizeText(stored)).as("%s read back", label).isEqualTo(label);
  }

  @ParameterizedTest
  @CsvSource({"#12, 12 AWG", "12, 12 AWG", "12 awg, 12 AWG", "3/0, 3/0 AWG", "350 MCM, 350 kcmil"})
  void theTradesOtherSpellingsOfASizeAreRead(String written, String label) {
    double stored = CableUnits.squareMillimetresOfAwg(written).orElseThrow();
    assertThat(CableUnits.AWG_AND_FEET.sizeText(stored)).isEqualTo(label);
  }

  @ParameterizedTest
  @ValueSource(strings = {"13 AWG", "16 AWG", "5/0", "275 kcmil", "2.5 mm²", "twelve", ""})
  void aSizeTheNecTableDoesNotListIsNotRead(String written) {
    assertThat(CableUnits.squareMillimetresOfAwg(written)).as(written).isEmpty();
  }

  @Test
  void aStoredAreaThatIsNoNecSizeIsShownInSquareMillimetresNotRoundedToAGauge() {
    // 2.5 mm² lies between 14 AWG (2.08) and 12 AWG (3.31): it is neither
    assertThat(CableUnits.AWG_AND_FEET.sizeText(2.5)).isEqualTo("2.5 mm²");
  }

  @Test
  void awgTextIsToldFromAPlainNumber() {
    assertThat(CableUnits.looksLikeAwg("12 AWG")).isTrue();
    assertThat(CableUnits.looksLikeAwg("#10")).isTrue();
    assertThat(CableUnits.looksLikeAwg("4/0")).isTrue();
    assertThat(CableUnits.looksLikeAwg("250 kcmil")).isTrue();
    assertThat(CableUnits.looksLikeAwg("2.5")).isFalse();
    assertThat(CableUnits.looksLikeAwg("16 mm²")).isFalse();
  }

  @Test
  void theNecRuleSetUsesAwgAndFeetAndTheIecOneMetric() {
    assertThat(CableUnits.of(RuleSets.NEC)).isEqualTo(CableUnits.AWG_AND_FEET);
    assertThat(CableUnits.of(RuleSets.IEC)).isEqualTo(CableUnits.METRIC);
    assertThat(CableUnits.ofRuleSet("NEC").lengthSymbol()).isEqualTo("ft");
  }
}
