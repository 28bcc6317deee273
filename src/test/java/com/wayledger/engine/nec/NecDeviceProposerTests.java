package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.ConnectedLoad;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The NEC set's breaker and conductor proposals: never below the checks they must pass. */
class NecDeviceProposerTests {

  static final Set<CheckKind> MUST_PASS =
      Set.of(
          CheckKind.POLE_COUNT,
          CheckKind.STANDARD_RATING,
          CheckKind.SMALL_CONDUCTOR,
          CheckKind.CONDUCTOR_AMPACITY,
          CheckKind.TERMINATION_TEMPERATURE,
          CheckKind.CONTINUOUS_LOAD);

  static CircuitSpec circuit(
      PhasePosition position, CableSpec cable, CircuitLocation where, LoadSpec... loads) {
    return new CircuitSpec(
        11,
        1,
        position,
        "circuit",
        WayStatus.IN_USE,
        false,
        // an IEC-looking device as recorded: the proposal must not keep its curve or its 30 mA
        new DeviceSpec(
            DeviceKind.RCBO,
            com.wayledger.engine.TripCurve.B,
            16.0,
            1,
            6.0,
            30.0,
            com.wayledger.engine.RcdType.A),
        cable,
        List.of(loads),
        null,
        null,
        false,
        where);
  }

  static CableSpec cable(
      ConductorMaterial material, Insulation insulation, double ambient, int grouped, Double m) {
    return new CableSpec(
        ConductorSize.AWG_14.squareMillimetres(),
        null,
        material,
        insulation,
        m,
        null,
        ambient,
        grouped,
        0);
  }

  @Test
  void continuousSixteenAmpLightingGetsTwentyAmpsOnTwelveAwg() {
    // 210.20(A): 125 % × 16 A = 20 A breaker (240.6(A) standard); 240.4(D)(5): 12 AWG Cu ≤ 20 A;
    // 12 AWG Cu 60 °C column 20 A (Table 310.16, from memory) ≥ 20 A (110.14(C)(1)(a))
    CircuitSpec c =
        circuit(
            PhasePosition.L1,
            cable(ConductorMaterial.COPPER, Insulation.THERMOSETTING_90, 30, 1, null),
            null,
            new LoadSpec(
                "Lights", LoadCategory.LIGHTING, 1, 16, RatingUnit.A, 1.0, null, null, true));
    DeviceProposal p =
        NecDeviceProposer.propose(
            c, CircuitContext.of(SupplySystem.SPLIT_PHASE_120_240, 120.0), 16.0);
    assertThat(p.found()).as(String.join("; ", p.reasons())).isTrue();
    assertThat(p.device().ratedCurrentAmps()).isEqualTo(20.0);
    assertThat(p.conductorLabel()).isEqualTo("12 AWG");
    assertThat(p.device().curve()).isNull();
    assertThat(p.device().residualCurrentMilliAmps()).isNull();
  }

  @Test
  void fiveHorsepowerMotorGetsThe430_52MaximumOnEightAwg() {
    // Table 430.248 5 hp 230 V 28 A (from memory): 250 % = 70 A breaker; 125 % = 35 A → 8 AWG Cu
    // at 60 °C, 40 A (Table 310.16, from memory)
    CircuitSpec c =
        circuit(
            PhasePosition.L1_L2,
            cable(ConductorMaterial.COPPER, Insulation.THERMOSETTING_90, 30, 1, 15.0),
            null,
            NecMotorChecksTests.motor(5.0, 24.0));
    DeviceProposal p =
        NecDeviceProposer.propose(
            c, CircuitContext.of(SupplySystem.SPLIT_PHASE_120_240, 120.0), 24.0);
    assertThat(p.found()).as(String.join("; ", p.reasons())).isTrue();
    assertThat(p.device().ratedCurrentAmps()).isEqualTo(70.0);
    assertThat(p.device().poles()).isEqualTo(2);
    assertThat(p.conductorLabel()).isEqualTo("8 AWG");
  }

  @Test
  void motorWithoutHorsepowerGetsNoProposal() {
    CircuitSpec c =
        circuit(
            PhasePosition.L1_L2,
            cable(ConductorMaterial.COPPER, Insulation.THERMOSETTING_90, 30, 1, 15.0),
            null,
            NecMotorChecksTests.motor(null, 24.0));
    DeviceProposal p =
        NecDeviceProposer.propose(
            c, CircuitContext.of(SupplySystem.SPLIT_PHASE_120_240, 120.0), 24.0);
    assertThat(p.found()).isFalse();
    assertThat(p.reasons().get(0)).contains("motor horsepower not recorded");
  }

  @Test
  void proposalsPassEveryNecCheckOverRandomCircuits() {
    Random random = new Random(20261202L);
    List<CircuitLocation> locations = new ArrayList<>(DwellingProtection.locations());
    locations.add(null);
    double[] horsepowers = {0.5, 1, 2, 3, 5, 7.5, 10};
    int found = 0;
    int tried = 250;
    for (int i = 0; i < tried; i++) {
      boolean wye = random.nextInt(3) == 0;
      SupplySystem system = wye ? SupplySystem.WYE_208Y_120 : SupplySystem.SPLIT_PHASE_120_240;
      PhasePosition position =
          wye
              ? (random.nextBoolean() ? PhasePosition.THREE_POLE : PhasePosition.L2)
              : (random.nextBoolean() ? PhasePosition.L1 : PhasePosition.L1_L2);
      List<LoadSpec> loads = new ArrayList<>();
      int count = 1 + random.nextInt(2);
      for (int k = 0; k < count; k++) {
        LoadCategory category =
            List.of(
                    LoadCategory.LIGHTING,
                    LoadCategory.SOCKET_OUTLETS,
                    LoadCategory.SPACE_HEATING,
                    LoadCategory.MOTOR)
                .get(random.nextInt(4));
        Double hp =
            category == LoadCategory.MOTOR ? horsepowers[random.nextInt(horsepowers.length)] : null;
        loads.add(
            new LoadSpec(
                "load " + k,
                category,
                1 + random.nextInt(2),
                200 + random.nextInt(3000),
                RatingUnit.W,
                0.75 + 0.25 * random.nextDouble(),
                null,
                null,
                random.nextBoolean(),
                hp));
      }
      CableSpec cable =
          cable(
              random.nextBoolean() ? ConductorMaterial.COPPER : ConductorMaterial.ALUMINIUM,
              random.nextBoolean() ? Insulation.THERMOPLASTIC_70 : Insulation.THERMOSETTING_90,
              20 + random.nextInt(31),
              1 + random.nextInt(9),
              random.nextBoolean() ? null : 3.0 + random.nextInt(40));
      CircuitSpec c =
          circuit(
              position,
              cable,
              locations.get(random.nextInt(locations.size())),
              loads.toArray(LoadSpec[]::new));
      CircuitContext context =
          new CircuitContext(
              system,
              120.0,
              random.nextBoolean(),
              random.nextBoolean() ? null : 5.0 + random.nextInt(60),
              "test",
              null,
              "feeders",
              "");
      // Ib: the loads' connected current, computed here independently of the proposer
      double perAmp = com.wayledger.engine.LinePhasors.voltAmperesPerAmp(system, position, 120.0);
      double ib = 0.0;
      for (LoadSpec load : loads) {
        ib += ConnectedLoad.ofPerAmp(load, perAmp).apparentVoltAmperes() / perAmp;
      }
      DeviceProposal p = NecDeviceProposer.propose(c, context, ib);
      if (!p.found()) {
        continue;
      }
      found++;
      assertThat(p.device().curve()).as("no IEC curve").isNull();
      assertThat(p.device().residualCurrentMilliAmps()).as("no IEC 30 mA").isNull();
      assertThat(OvercurrentLimits.isStandardRating(p.device().ratedCurrentAmps(), false)).isTrue();
      assertThat(ConductorSize.ofSquareMillimetres(p.cable().lineCsaSquareMillimetres()))
          .isPresent();
      CircuitSpec fitted =
          new CircuitSpec(
              c.id(),
              c.wayNumber(),
              c.position(),
              c.description(),
              c.status(),
              false,
              p.device(),
              p.cable(),
              c.loads(),
              null,
              null,
              false,
              c.location());
      for (Finding f : NecCircuitChecks.assess(context, fitted, ib)) {
        assertThat(f.isProblem()).as("case " + i + " " + f.check() + ": " + f.summary()).isFalse();
        if (MUST_PASS.contains(f.check())) {
          assertThat(f.verdict()).as("case " + i + " " + f.check()).isEqualTo(Verdict.PASS);
        }
      }
    }
    // the property is not vacuous: most random circuits get a proposal
    assertThat(found).isGreaterThan(tried / 2);
  }
}
