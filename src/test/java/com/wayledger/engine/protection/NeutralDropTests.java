package com.wayledger.engine.protection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Voltage drop on a submain to an unbalanced three-phase board: the neutral carries current too.
 *
 * <p>16 mm² copper: 1.15 Ω/km at 20 °C (IEC 60228 Table 2), ×1.20 at 70 °C = 1.38 mΩ/m per
 * conductor; 50 m. Line-to-neutral drop (IEC 60364-5-52 Annex G, b = 1 per conductor, from memory):
 * ΔU = IL·r·L + IN·r·L.
 */
class NeutralDropTests {

  private static final double R_PER_CONDUCTOR = 1.15 * 1.20; // mΩ/m

  private static Finding drop(Map<Phase, Double> lines, Double neutral) {
    CableSpec submain =
        new CableSpec(
            16.0,
            16.0,
            ConductorMaterial.COPPER,
            Insulation.THERMOPLASTIC_70,
            50.0,
            InstallationMethod.C,
            30.0,
            1,
            0);
    BoardSpec origin =
        new BoardSpec(1, "MDB", 3, 12, 400.0, null, null, null, 10, 1, null, null, null, List.of());
    BoardSpec sub =
        new BoardSpec(
            2,
            "DB2",
            3,
            12,
            100.0,
            null,
            1L,
            submain,
            10,
            1,
            null,
            null,
            null,
            List.of(
                Fixtures.circuit(
                    21,
                    Fixtures.mcb(TripCurve.B, 16),
                    Fixtures.twinAndEarth(2.5, 1.5, 0.0),
                    List.of(Fixtures.amps(LoadCategory.OTHER, 10)))));
    SiteSpec site =
        new SiteSpec(
            1,
            "t",
            new SupplySpec(EarthingSystem.TN_C_S, 230.0, 3, 50.0, 0.35, 6.0, 100.0),
            null,
            List.of(origin, sub));
    return ProtectionEngine.check(
            site,
            Map.of(21L, new CircuitLoading(21, 10.0)),
            Map.of(
                1L, new BoardLoading(1, lines, null, neutral),
                2L, new BoardLoading(2, lines, null, neutral)),
            ProtectionSettings.DEFAULTS)
        .boards()
        .get(1)
        .circuits()
        .get(0)
        .findings()
        .stream()
        .filter(f -> f.check() == CheckKind.VOLTAGE_DROP)
        .findFirst()
        .orElseThrow();
  }

  @Test
  void tenAmpsOnOneLineOfASixteenSquareSubmainDropsOnTheLineAndTheNeutral() {
    Finding f = drop(Map.of(Phase.L1, 10.0, Phase.L2, 0.0, Phase.L3, 0.0), 10.0);

    // (10 + 10) A × 1.38 mΩ/m × 50 m = 1.38 V = 0.600 % of 230 V
    double expected = 100.0 * (10.0 + 10.0) * R_PER_CONDUCTOR * 50.0 / 1000.0 / 230.0;
    assertThat(f.value("drop to board")).isCloseTo(expected, within(1e-6));
    assertThat(f.summary()).contains("IN 10.0 A");
  }

  @Test
  void balancedLinesKeepTheRootThreeFormula() {
    Finding f = drop(Map.of(Phase.L1, 10.0, Phase.L2, 10.0, Phase.L3, 10.0), 0.0);

    // √3 × 1.38 × 10 × 50 / 1000 V of √3 × 230 V: 0.300 %
    double expected =
        100.0 * Math.sqrt(3.0) * R_PER_CONDUCTOR * 10.0 * 50.0 / 1000.0 / (Math.sqrt(3.0) * 230.0);
    assertThat(f.value("drop to board")).isCloseTo(expected, within(1e-6));
  }
}
