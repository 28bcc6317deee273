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

class ConductorResistanceTests {

  // IEC 60228 Table 2, class 1/2 plain copper at 20 °C, Ω/km (from memory, as listed in the brief)
  @ParameterizedTest(name = "{0} mm²: {1} Ω/km")
  @CsvSource({
    "1.0, 18.1",
    "1.5, 12.1",
    "2.5, 7.41",
    "4, 4.61",
    "6, 3.08",
    "10, 1.83",
    "16, 1.15",
    "25, 0.727",
    "35, 0.524",
    "50, 0.387",
    "70, 0.268",
    "95, 0.193",
    "120, 0.153"
  })
  void copperResistanceMatchesIec60228(double csa, double ohmsPerKm) {
    assertThat(ConductorResistance.ohmsPerKmAt20Celsius(ConductorMaterial.COPPER, csa).value())
        .isEqualTo(ohmsPerKm);
  }

  // BS 7671 / IET On-Site Guide multipliers for R1+R2 at operating temperature: 1.20 (70 °C), 1.28
  // (90 °C)
  @Test
  void operatingTemperatureMultipliersMatchTheTradeFigures() {
    assertThat(ConductorResistance.operatingTemperatureMultiplier(Insulation.THERMOPLASTIC_70))
        .isCloseTo(1.20, within(1e-12));
    assertThat(ConductorResistance.operatingTemperatureMultiplier(Insulation.THERMOSETTING_90))
        .isCloseTo(1.28, within(1e-12));
  }

  @Test
  void aluminiumIsReportedMissingNotGuessed() {
    assertThat(
            ConductorResistance.ohmsPerKmAt20Celsius(ConductorMaterial.ALUMINIUM, 16.0).isKnown())
        .isFalse();
  }

  // 2.5/1.5 mm² twin and earth: 7.41 + 12.10 = 19.51 mΩ/m at 20 °C (IET On-Site Guide Table I1,
  // from memory);
  // × 1.20 at 70 °C = 23.41 mΩ/m by hand
  @Test
  void r1PlusR2OfTwinAndEarthIs1951MilliOhmsPerMetreColdTimes120Hot() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            20.0,
            InstallationMethod.C,
            30.0,
            1,
            0);
    assertThat(CableImpedance.r1PlusR2MilliOhmsPerMetre(cable).value())
        .isCloseTo(19.51 * 1.20, within(1e-9));
    // 20 m: 23.412 × 20 / 1000 = 0.468 Ω, by hand
    assertThat(CableImpedance.r1PlusR2Ohms(cable).value()).isCloseTo(0.46824, within(1e-9));
  }

  @Test
  void missingLengthIsReportedNotTakenAsZero() {
    CableSpec cable =
        new CableSpec(
            2.5,
            1.5,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            null,
            InstallationMethod.C,
            30.0,
            1,
            0);
    assertThat(CableImpedance.r1PlusR2Ohms(cable).missing()).isEqualTo("cable length");
  }
}
