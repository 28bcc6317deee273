package com.wayledger.engine.protection.cable;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CurrentCapacityTests {

  // IEC 60364-5-52 Table B.52.4, method B2, PVC, three loaded copper conductors, as quoted in a
  // compressor maker's
  // instruction book ("Cable sizing according IEC", 30 °C column): 4 27, 6 34, 10 46, 16 62, 25 80,
  // 50 118, 120 206 A
  @ParameterizedTest(name = "{0} mm²: {1} A")
  @CsvSource({"4, 27", "6, 34", "10, 46", "16, 62", "25, 80", "50, 118", "120, 206"})
  void methodB2ThreeLoadedMatchesThePublishedTable(double csa, double amps) {
    assertThat(
            CurrentCapacity.tabulatedAmps(
                    Insulation.THERMOPLASTIC_70, InstallationMethod.B2, csa, 3)
                .value())
        .isEqualTo(amps);
  }

  // same instruction book, derated columns: the 30 °C value × Ca (B.52.14: 40 °C 0.87, 45 °C 0.79,
  // 50 °C 0.71,
  // 55 °C 0.61), rounded to the nearest ampere: 4 mm² 23/21/19/16 A, 16 mm² 54/49/44/38 A, 120 mm²
  // 179/163/146/126 A
  @ParameterizedTest(name = "{0} mm² at {1} °C: {2} A")
  @CsvSource({
    "4, 40, 23",
    "4, 45, 21",
    "4, 50, 19",
    "4, 55, 16",
    "16, 40, 54",
    "16, 45, 49",
    "16, 50, 44",
    "16, 55, 38",
    "120, 40, 179",
    "120, 45, 163",
    "120, 50, 146",
    "120, 55, 126"
  })
  void ambientFactorsReproduceThePublishedDeratedTable(double csa, double celsius, double amps) {
    double it =
        CurrentCapacity.tabulatedAmps(Insulation.THERMOPLASTIC_70, InstallationMethod.B2, csa, 3)
            .value();
    double ca = CurrentCapacity.ambientFactor(Insulation.THERMOPLASTIC_70, celsius).value();
    assertThat((double) Math.round(it * ca)).isEqualTo(amps);
  }

  // BS 7671 Table 4D5 / 4D2A method C, two-core 70 °C: 2.5 mm² 27 A (trade references quote 27 A
  // clipped direct)
  @Test
  void twoPointFiveClippedDirectCarries27Amps() {
    assertThat(
            CurrentCapacity.tabulatedAmps(Insulation.THERMOPLASTIC_70, InstallationMethod.C, 2.5, 2)
                .value())
        .isEqualTo(27.0);
  }

  // IEC 60364-5-52 Table B.52.17 item 1 / BS 7671 Table 4C1 (bunched): 2 0.80, 3 0.70, 6 0.57, 8
  // 0.52, 20 0.38
  @ParameterizedTest(name = "{0} circuits: {1}")
  @CsvSource({"1, 1.00", "2, 0.80", "3, 0.70", "6, 0.57", "8, 0.52", "20, 0.38"})
  void groupingFactorsMatchTheBunchedRow(int circuits, double factor) {
    assertThat(CurrentCapacity.groupingFactor(circuits).value()).isEqualTo(factor);
  }

  @Test
  void groupBetweenRowsTakesTheNextLargerGroup() {
    // 10 circuits is not tabulated; 12 (0.45) is the next row and the conservative reading
    assertThat(CurrentCapacity.groupingFactor(10).value()).isEqualTo(0.45);
  }

  // BS 7671 Table 52.2: 50 mm 0.88, 100 mm 0.78, 200 mm 0.63, 400 mm and more 0.51
  @ParameterizedTest(name = "{0} mm: {1}")
  @CsvSource({
    "0, 1.00",
    "50, 0.88",
    "100, 0.78",
    "200, 0.63",
    "400, 0.51",
    "1000, 0.51",
    "75, 0.78"
  })
  void thermalInsulationFactorsMatchTable522(int mm, double factor) {
    assertThat(CurrentCapacity.thermalInsulationFactor(mm)).isEqualTo(factor);
  }

  // IEC 60364-5-52 Table B.52.14: 45 °C PVC 0.79, XLPE 0.87
  @Test
  void ambientFactorsDependOnInsulation() {
    assertThat(CurrentCapacity.ambientFactor(Insulation.THERMOPLASTIC_70, 45).value())
        .isEqualTo(0.79);
    assertThat(CurrentCapacity.ambientFactor(Insulation.THERMOSETTING_90, 45).value())
        .isEqualTo(0.87);
  }

  @Test
  void thermoplasticAbove60DegreesIsNotAssessable() {
    assertThat(CurrentCapacity.ambientFactor(Insulation.THERMOPLASTIC_70, 65).isKnown()).isFalse();
  }

  // by hand: Iz = It · Ca · Cg · Ci = 27 × 0.94 × 0.80 × 0.88 = 17.87 A
  @Test
  void capacityMultipliesAllCorrectionFactors() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            20.0,
            InstallationMethod.C,
            35.0,
            2,
            50);
    assertThat(CurrentCapacity.of(cable, 2).value().capacityAmps())
        .isCloseTo(27 * 0.94 * 0.80 * 0.88, within(1e-9));
  }

  @Test
  void unshippedInstallationMethodIsNotAssessed() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            20.0,
            InstallationMethod.D1,
            20.0,
            1,
            0);
    assertThat(CurrentCapacity.of(cable, 2).missing()).contains("method D1");
  }

  @Test
  void unknownInstallationMethodIsNotAssessed() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            20.0,
            null,
            30.0,
            1,
            0);
    assertThat(CurrentCapacity.of(cable, 2).missing()).isEqualTo("installation method");
  }
}
