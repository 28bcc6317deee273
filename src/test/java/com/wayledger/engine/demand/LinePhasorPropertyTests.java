package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.load;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * For random split-phase and wye boards, the engine's per-line and neutral currents equal an
 * independent phasor sum of the load currents done here with Apache Commons Math {@link Complex}: I
 * = conj(S/V_a) line to neutral, I_ab = conj(S/(V_a − V_b)) out on a and back on b, conj(S/3 / V_k)
 * on each line of a balanced three-phase load (textbook relations, from memory: W. D. Stevenson,
 * Elements of Power System Analysis, ch. 2).
 */
class LinePhasorPropertyTests {

  private static final PhasePosition[] SPLIT = {
    PhasePosition.L1, PhasePosition.L2, PhasePosition.L1_L2
  };
  private static final PhasePosition[] WYE = {
    PhasePosition.L1,
    PhasePosition.L2,
    PhasePosition.L3,
    PhasePosition.L1_L2,
    PhasePosition.L2_L3,
    PhasePosition.L3_L1,
    PhasePosition.THREE_POLE
  };

  @ParameterizedTest(name = "seed {0}")
  @ValueSource(longs = {1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144, 233, 377, 610, 987, 1597})
  void engineLineCurrentsEqualAnIndependentPhasorSum(long seed) {
    Random random = new Random(seed);
    for (SupplySystem system :
        List.of(
            SupplySystem.SPLIT_PHASE_120_240,
            SupplySystem.WYE_208Y_120,
            SupplySystem.WYE_480Y_277,
            SupplySystem.IEC_WYE,
            SupplySystem.SINGLE_PHASE_120_208)) {
      double u0 = system.lineToNeutralVolts() == null ? 230.0 : system.lineToNeutralVolts();
      boolean twoLines = ANGLES.get(system).length == 2;
      int phases = twoLines ? 1 : 3;
      SupplySpec supply =
          new SupplySpec(EarthingSystem.TN_C_S, u0, phases, 60.0, null, null, null, system);
      PhasePosition[] choices = twoLines ? SPLIT : WYE;
      int count = 1 + random.nextInt(12);
      List<CircuitSpec> circuits = new ArrayList<>();
      Complex[] expected = {Complex.ZERO, Complex.ZERO, Complex.ZERO};
      for (int c = 0; c < count; c++) {
        PhasePosition position = choices[random.nextInt(choices.length)];
        double watts = 100.0 + random.nextDouble() * 9900.0;
        double pf = 0.5 + random.nextDouble() * 0.5;
        circuits.add(
            Fixtures.circuit(
                c + 1, c + 1, position, load(LoadCategory.OTHER, 1, watts, RatingUnit.W, pf)));
        Complex s = new Complex(watts, watts / pf * Math.sqrt(1 - pf * pf));
        addCurrents(expected, system, u0, position, s);
      }
      BoardSpec board = Fixtures.board(1, phases, null, DiversityMethods.NONE, 400.0, circuits);

      BoardDemand demand =
          DemandEngine.evaluateBoard(board, supply, DiversityMethods.builtIn(), null);

      String context = "seed " + seed + ", " + system + ", " + circuits.size() + " circuits";
      for (PhaseDemand line : demand.phases()) {
        assertThat(line.currentAmps())
            .as("current on %s (%s)", line.phase(), context)
            .isCloseTo(expected[line.phase().ordinal()].abs(), within(1e-6));
      }
      assertThat(demand.neutralCurrentAmps())
          .as("neutral current (%s)", context)
          .isCloseTo(expected[0].add(expected[1]).add(expected[2]).abs(), within(1e-6));
    }
  }

  /**
   * A 120/208 V single-phase panel fed from two poles of a random 208Y/120 V way: each parent line
   * carries the currents the panel's loads draw at the parent line's own voltage (the panel's A on
   * the way's first line, B on its second), summed here load by load, not line by line as the
   * engine does.
   */
  @ParameterizedTest(name = "seed {0}")
  @ValueSource(longs = {1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144, 233})
  void aPanelOnTwoPolesOfAWyeLoadsTheLinesItIsConnectedTo(long seed) {
    Random random = new Random(seed);
    double u0 = 120.0;
    SupplySpec supply =
        new SupplySpec(
            EarthingSystem.TN_C_S, u0, 3, 60.0, null, null, null, SupplySystem.WYE_208Y_120);
    PhasePosition feed =
        List.of(PhasePosition.L1_L2, PhasePosition.L2_L3, PhasePosition.L3_L1)
            .get(random.nextInt(3));
    Phase[] mapped = {feed.fromLine(), feed.toLine()};
    Complex[] expected = {Complex.ZERO, Complex.ZERO, Complex.ZERO};
    List<CircuitSpec> panelCircuits = new ArrayList<>();
    int count = 1 + random.nextInt(10);
    for (int c = 0; c < count; c++) {
      PhasePosition position = SPLIT[random.nextInt(SPLIT.length)];
      double watts = 100.0 + random.nextDouble() * 5000.0;
      double pf = 0.6 + random.nextDouble() * 0.4;
      panelCircuits.add(
          Fixtures.circuit(
              c + 1, c + 1, position, load(LoadCategory.OTHER, 1, watts, RatingUnit.W, pf)));
      Complex s = new Complex(watts, watts / pf * Math.sqrt(1 - pf * pf));
      // the same load seen from the wye: between (or on) the parent lines the panel's lines are
      PhasePosition onParent =
          position.isLineToLine() ? feed : PhasePosition.on(mapped[position.ordinal()]);
      addCurrents(expected, SupplySystem.WYE_208Y_120, u0, onParent, s);
    }
    BoardSpec panel =
        Fixtures.board(2, 1, 1L, DiversityMethods.NONE, 125.0, panelCircuits)
            .withSupplySystem(SupplySystem.SINGLE_PHASE_120_208);
    BoardSpec house =
        Fixtures.board(
            1, 3, null, DiversityMethods.NONE, 400.0, List.of(Fixtures.feeder(100, 1, feed, 2)));
    SiteSpec site =
        new SiteSpec(1, "site", supply, DiversityMethods.NONE, List.of(house, panel), "NEC");

    BoardDemand demand = DemandEngine.evaluate(site, DiversityMethods.builtIn()).board(1);

    String context = "seed " + seed + ", panel on " + feed + ", " + count + " circuits";
    for (PhaseDemand line : demand.phases()) {
      assertThat(line.currentAmps())
          .as("parent current on %s (%s)", line.phase(), context)
          .isCloseTo(expected[line.phase().ordinal()].abs(), within(1e-6));
    }
    assertThat(demand.neutralCurrentAmps())
        .as("parent neutral (%s)", context)
        .isCloseTo(expected[0].add(expected[1]).add(expected[2]).abs(), within(1e-6));
  }

  /**
   * Line angles typed from the systems' definitions (not read from the engine): 120/240 V A 0°, B
   * 180°; 120/208 V A 0°, B −120° (two lines of the wye); wye A 0°, B −120°, C +120°.
   */
  private static final java.util.Map<SupplySystem, double[]> ANGLES =
      java.util.Map.of(
          SupplySystem.SPLIT_PHASE_120_240, new double[] {0.0, 180.0},
          SupplySystem.SINGLE_PHASE_120_208, new double[] {0.0, -120.0},
          SupplySystem.WYE_208Y_120, new double[] {0.0, -120.0, 120.0},
          SupplySystem.WYE_480Y_277, new double[] {0.0, -120.0, 120.0},
          SupplySystem.IEC_WYE, new double[] {0.0, -120.0, 120.0});

  private static Complex voltage(SupplySystem system, double u0, Phase line) {
    return ComplexPolar.of(u0, ANGLES.get(system)[line.ordinal()]);
  }

  private static void addCurrents(
      Complex[] lines, SupplySystem system, double u0, PhasePosition position, Complex s) {
    if (position == PhasePosition.THREE_POLE) {
      for (Phase line : Phase.values()) {
        lines[line.ordinal()] =
            lines[line.ordinal()].add(s.divide(3.0).divide(voltage(system, u0, line)).conjugate());
      }
    } else if (position.isLineToLine()) {
      Phase a = position.fromLine();
      Phase b = position.toLine();
      Complex vab = voltage(system, u0, a).subtract(voltage(system, u0, b));
      Complex iab = s.divide(vab).conjugate();
      lines[a.ordinal()] = lines[a.ordinal()].add(iab);
      lines[b.ordinal()] = lines[b.ordinal()].subtract(iab);
    } else {
      Phase a = position.phases().iterator().next();
      lines[a.ordinal()] = lines[a.ordinal()].add(s.divide(voltage(system, u0, a)).conjugate());
    }
  }

  /** Polar form through Commons Math, so the test shares no arithmetic with the engine. */
  private static final class ComplexPolar {
    static Complex of(double magnitude, double degrees) {
      return org.apache.commons.math3.complex.ComplexUtils.polar2Complex(
          magnitude, Math.toRadians(degrees));
    }
  }
}
