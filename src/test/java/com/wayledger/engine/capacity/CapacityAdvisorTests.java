package com.wayledger.engine.capacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Constructed boards where the right place for a new load is worked out by hand. No diversity
 * method is chosen anywhere, so the engine applies none: currents are plain P / (U0·cos φ) with U0
 * = 230 V.
 */
class CapacityAdvisorTests {

  private static final double U0 = 230.0;

  /** 7 kW at unity power factor on one line: 7000 / 230 = 30.43 A. */
  private static final double CHARGER_AMPS = 7000.0 / U0;

  /** 4.6 kW at unity power factor: 20.0 A. */
  private static final double EXISTING_AMPS = 4600.0 / U0;

  private static final NewLoad CHARGER =
      new NewLoad("Van charger", LoadCategory.EV_CHARGING, 7.0, RatingUnit.W, 1.0, false, null);

  /**
   * Three-phase board, two ways: way 1 L1 in use at 20 A (4.6 kW), way 1 L2 a spare 16 A breaker,
   * way 1 L3 a spare 40 A RCBO with 30 mA (so a charger there has the residual-current protection
   * it needs), way 2 free. Incomer and busbar 100 A. No fault-level data, so the checks that need
   * it are not assessed (not problems).
   */
  private static SiteSpec smallBoard() {
    CircuitSpec inUse =
        circuit(
            1,
            1,
            PhasePosition.L1,
            WayStatus.IN_USE,
            mcb(32.0, 1),
            List.of(
                new LoadSpec(
                    "Oven",
                    LoadCategory.FIXED_APPLIANCE,
                    1,
                    4600,
                    RatingUnit.W,
                    1.0,
                    null,
                    null,
                    false)));
    CircuitSpec spare16 =
        circuit(2, 1, PhasePosition.L2, WayStatus.SPARE_DEVICE, mcb(16.0, 1), List.of());
    CircuitSpec spare40 =
        circuit(3, 1, PhasePosition.L3, WayStatus.SPARE_DEVICE, rcbo(40.0), List.of());
    BoardSpec board =
        new BoardSpec(
            10,
            "DB-X",
            3,
            2,
            100.0,
            new DeviceSpec(DeviceKind.MCCB, null, 100.0, 3, null, null, null),
            null,
            null,
            10.0,
            1.0,
            null,
            null,
            null,
            List.of(inUse, spare16, spare40));
    return new SiteSpec(
        1,
        "Test",
        new SupplySpec(EarthingSystem.TN_S, U0, 3, 50.0, null, null, null),
        null,
        List.of(board));
  }

  private static CircuitSpec circuit(
      long id,
      int way,
      PhasePosition position,
      WayStatus status,
      DeviceSpec device,
      List<LoadSpec> loads) {
    return new CircuitSpec(
        id, way, position, "circuit " + id, status, false, device, null, loads, null, null);
  }

  private static DeviceSpec mcb(double amps, int poles) {
    return new DeviceSpec(DeviceKind.MCB, TripCurve.B, amps, poles, null, null, null);
  }

  private static DeviceSpec rcbo(double amps) {
    return new DeviceSpec(
        DeviceKind.RCBO, TripCurve.B, amps, 1, null, 30.0, com.wayledger.engine.RcdType.A);
  }

  private static CapacityAnswer ask(SiteSpec site, NewLoad load) {
    return CapacityAdvisor.ask(
        site, Set.of(), load, DiversityMethods.builtIn(), ProtectionSettings.DEFAULTS);
  }

  @Test
  void spareFortyAmpWayOnTheEmptyLineIsTheBestPlaceForASevenKilowattCharger() {
    CapacityAnswer answer = ask(smallBoard(), CHARGER);

    CandidateOutcome best = answer.best();
    assertThat(best.candidate().kind())
        .as("kind of the best candidate")
        .isEqualTo(CandidateKind.SPARE_WAY);
    assertThat(best.candidate().position())
        .as("line of the best candidate")
        .isEqualTo(PhasePosition.L3);
    assertThat(best.designCurrentAmps())
        .as("Ib of the charger")
        .isCloseTo(CHARGER_AMPS, within(0.01));
    assertThat(best.phaseAfter(Phase.L3)).as("L3 after").isCloseTo(CHARGER_AMPS, within(0.01));
    assertThat(best.phaseAfter(Phase.L1)).as("L1 unchanged").isCloseTo(EXISTING_AMPS, within(0.01));
    assertThat(best.incomerLoadingPercent())
        .as("incomer loading = 30.43 A of 100 A")
        .isCloseTo(30.43, within(0.01));
    assertThat(best.isClean()).as("no new danger or warning").isTrue();
  }

  @Test
  void sixteenAmpSpareRanksLastBecauseTheChargerWouldOverloadIt() {
    List<CandidateOutcome> outcomes = ask(smallBoard(), CHARGER).outcomes();

    CandidateOutcome last = outcomes.get(outcomes.size() - 1);
    assertThat(last.candidate().position())
        .as("line of the last candidate")
        .isEqualTo(PhasePosition.L2);
    assertThat(last.candidate().kind()).isEqualTo(CandidateKind.SPARE_WAY);
    assertThat(last.newFindings())
        .as("new findings of the 16 A spare")
        .anySatisfy(
            f -> {
              assertThat(f.check()).isEqualTo(CheckKind.WAY_OVERLOAD);
              assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
            });
    assertThat(last.wayLoadingPercent())
        .as("30.43 A on 16 A")
        .isCloseTo(100.0 * CHARGER_AMPS / 16.0, within(0.01));
  }

  @Test
  void candidatesAreTheTwoSparesAndTheFirstFreePositionOnEachLine() {
    List<String> labels =
        ask(smallBoard(), CHARGER).outcomes().stream().map(o -> o.candidate().label()).toList();

    // L1 already carries 20 A, so a new circuit there leaves the largest line at 50.43 A: below the
    // two
    // free lines (30.43 A each), above nothing but the overloaded spare.
    assertThat(labels)
        .as("ranked candidates")
        .containsExactly(
            "DB-X way 1 L3", "DB-X way 2 L2", "DB-X way 2 L3", "DB-X way 2 L1", "DB-X way 1 L2");
  }

  @Test
  void newCircuitGetsTheSmallestStandardBreakerAboveIbAndTheCableIsLeftToSize() {
    CandidateOutcome freeL2 =
        ask(smallBoard(), CHARGER).outcomes().stream()
            .filter(
                o ->
                    o.candidate().kind() == CandidateKind.EMPTY_POSITION
                        && o.candidate().position() == PhasePosition.L2)
            .findFirst()
            .orElseThrow();

    // IEC 60898-1 preferred ratings (from memory): ... 25, 32, 40 A; the first not below 30.43 A is
    // 32 A.
    assertThat(freeL2.candidate().device().ratedCurrentAmps()).as("proposed In").isEqualTo(32.0);
    assertThat(freeL2.candidate().device().curve())
        .as("no surge, so type B")
        .isEqualTo(TripCurve.B);
    assertThat(freeL2.candidate().deviceNote())
        .as("note on the cable")
        .contains("cable must be sized");
  }

  @Test
  void motorWithSevenTimesStartingSurgeNeedsTypeDAtThirtyTwoAmps() {
    NewLoad mixer = new NewLoad("Mixer", LoadCategory.MOTOR, 5.5, RatingUnit.W, 0.82, false, 7.0);
    CandidateOutcome freeL2 =
        ask(smallBoard(), mixer).outcomes().stream()
            .filter(
                o ->
                    o.candidate().kind() == CandidateKind.EMPTY_POSITION
                        && o.candidate().position() == PhasePosition.L2)
            .findFirst()
            .orElseThrow();

    // Ib = 5500 / (0.82 · 230) = 29.16 A, so In = 32 A; surge 7 × 29.16 = 204 A. Lowest
    // instantaneous
    // trip (IEC 60898-1): B 3 × 32 = 96 A, C 5 × 32 = 160 A (both reached), D 10 × 32 = 320 A (not
    // reached).
    assertThat(freeL2.designCurrentAmps())
        .as("Ib of the mixer")
        .isCloseTo(5500.0 / (0.82 * U0), within(0.01));
    assertThat(freeL2.candidate().device().ratedCurrentAmps()).isEqualTo(32.0);
    assertThat(freeL2.candidate().device().curve())
        .as("curve clear of the surge")
        .isEqualTo(TripCurve.D);
  }

  @Test
  void threePhaseLoadGoesOnlyToAFreeThreePoleWayOfAThreePhaseBoard() {
    NewLoad oven =
        new NewLoad("Deck oven", LoadCategory.COOKING, 18.0, RatingUnit.W, 1.0, true, null);
    CapacityAnswer answer = ask(smallBoard(), oven);

    assertThat(answer.outcomes())
        .as("only way 2 is wholly free")
        .singleElement()
        .satisfies(
            o -> {
              assertThat(o.candidate().label()).isEqualTo("DB-X way 2 L1–L3");
              // 18 kW balanced: 18000 / (3 · 230) = 26.09 A per line; L1 carries the existing 20 A
              // as well.
              assertThat(o.phaseAfter(Phase.L2)).isCloseTo(18000.0 / (3 * U0), within(0.01));
              assertThat(o.phaseAfter(Phase.L1))
                  .isCloseTo(18000.0 / (3 * U0) + EXISTING_AMPS, within(0.01));
              assertThat(o.candidate().device().poles()).as("three-pole device").isEqualTo(3);
            });
  }

  @Test
  void singlePhaseBoardCannotTakeAThreePhaseLoadAndSaysWhy() {
    BoardSpec single =
        new BoardSpec(
            20, "FLAT", 1, 4, 63.0, null, null, null, 10.0, 1.0, null, null, null, List.of());
    SiteSpec site =
        new SiteSpec(
            2,
            "Flat",
            new SupplySpec(EarthingSystem.TN_S, U0, 1, 50.0, null, null, null),
            null,
            List.of(single));

    CapacityAnswer answer =
        ask(site, new NewLoad("Oven", LoadCategory.COOKING, 9.0, RatingUnit.W, 1.0, true, null));

    assertThat(answer.outcomes()).isEmpty();
    assertThat(answer.notes()).singleElement().asString().contains("single-phase board");
  }

  @Test
  void sharingACircuitOfTheSameCategoryAddsTheLoadToItsWay() {
    NewLoad fryer =
        new NewLoad("Fryer", LoadCategory.FIXED_APPLIANCE, 2.3, RatingUnit.W, 1.0, false, null);
    CandidateOutcome shared =
        ask(smallBoard(), fryer).outcomes().stream()
            .filter(o -> o.candidate().kind() == CandidateKind.SHARED_CIRCUIT)
            .findFirst()
            .orElseThrow();

    // 4.6 kW + 2.3 kW = 6.9 kW on way 1 L1: 30.0 A on the 32 A breaker.
    assertThat(shared.candidate().label()).isEqualTo("DB-X way 1 L1");
    assertThat(shared.designCurrentAmps()).isCloseTo(6900.0 / U0, within(0.01));
  }

  // by hand: the origin board already carries 20 A on L1 behind a 40 A supply fuse; a 7 kW charger
  // (30.43 A) on L1 makes 50.43 A = 126 % of the fuse, and on L2 or L3 30.43 A; with a 25 A supply
  // fuse every placement exceeds it, so nothing may be shown as the best answer
  @Test
  void noCandidateIsOfferedAsBestWhenEveryPlacementOverloadsTheSupplyFuse() {
    SiteSpec roomy = smallBoard();
    SiteSpec site =
        new SiteSpec(
            roomy.id(),
            roomy.name(),
            new SupplySpec(EarthingSystem.TN_S, U0, 3, 50.0, null, null, 25.0),
            null,
            roomy.boards());

    CapacityAnswer answer = ask(site, CHARGER);

    assertThat(answer.outcomes()).as("the candidates are still listed").isNotEmpty();
    assertThat(answer.best()).as("no overload offered as best").isNull();
    assertThat(answer.whyNone()).contains("supply fuse");
    assertThat(answer.outcomes()).allSatisfy(o -> assertThat(o.isAcceptable()).isFalse());
  }

  @Test
  void anAcceptableCandidateAlwaysRanksAboveOneThatOverloads() {
    List<CandidateOutcome> outcomes = ask(smallBoard(), CHARGER).outcomes();

    CandidateOutcome overloadsSpare16 =
        outcomes.stream()
            .filter(o -> o.candidate().position() == PhasePosition.L2)
            .filter(o -> o.candidate().kind() == CandidateKind.SPARE_WAY)
            .findFirst()
            .orElseThrow();
    assertThat(overloadsSpare16.isAcceptable()).as("30.43 A on a 16 A way").isFalse();
    assertThat(outcomes.get(0).isAcceptable()).isTrue();
    assertThat(outcomes.indexOf(overloadsSpare16)).isEqualTo(outcomes.size() - 1);
  }

  @Test
  void newCircuitForACarChargerGetsAThirtyMilliAmpRcbo() {
    CandidateOutcome freeL2 =
        ask(smallBoard(), CHARGER).outcomes().stream()
            .filter(o -> o.candidate().kind() == CandidateKind.EMPTY_POSITION)
            .findFirst()
            .orElseThrow();

    assertThat(freeL2.candidate().device().kind()).isEqualTo(DeviceKind.RCBO);
    assertThat(freeL2.candidate().device().residualCurrentMilliAmps()).isEqualTo(30.0);
  }

  private static CandidateOutcome newCircuitFor(NewLoad load) {
    return ask(smallBoard(), load).outcomes().stream()
        .filter(o -> o.candidate().kind() == CandidateKind.EMPTY_POSITION)
        .findFirst()
        .orElseThrow();
  }

  @Test
  void newCircuitForAnOutdoorFloodlightGetsAThirtyMilliAmpRcbo() {
    // BS 7671 411.3.3 (b), from memory: equipment used outdoors; 30 mA on every outdoor circuit
    NewLoad flood =
        new NewLoad(
            "Floodlight",
            LoadCategory.LIGHTING,
            0.4,
            RatingUnit.W,
            1.0,
            false,
            null,
            com.wayledger.engine.CircuitLocation.OUTDOORS);

    DeviceSpec device = newCircuitFor(flood).candidate().device();

    assertThat(device.kind()).isEqualTo(DeviceKind.RCBO);
    assertThat(device.residualCurrentMilliAmps()).isEqualTo(30.0);
  }

  @Test
  void newCircuitForAnIndoorFryerGetsAPlainMcb() {
    NewLoad fryer =
        new NewLoad(
            "Fryer",
            LoadCategory.FIXED_APPLIANCE,
            2.3,
            RatingUnit.W,
            1.0,
            false,
            null,
            com.wayledger.engine.CircuitLocation.INDOORS);

    assertThat(newCircuitFor(fryer).candidate().device().kind()).isEqualTo(DeviceKind.MCB);
  }

  @Test
  void newCircuitWhoseLocationIsNotGivenGetsThirtyMilliAmpsOnTheSafeSideAndSaysSo() {
    NewLoad fryer =
        new NewLoad("Fryer", LoadCategory.FIXED_APPLIANCE, 2.3, RatingUnit.W, 1.0, false, null);

    CandidateOutcome outcome = newCircuitFor(fryer);

    assertThat(outcome.candidate().device().kind()).isEqualTo(DeviceKind.RCBO);
    assertThat(outcome.candidate().deviceNote()).contains("location is not recorded");
  }
}
