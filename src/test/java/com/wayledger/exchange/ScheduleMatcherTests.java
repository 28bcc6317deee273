package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import java.util.List;
import org.junit.jupiter.api.Test;

/** How circuits read from a file are matched to a board's stored circuits (plain, no database). */
class ScheduleMatcherTests {

  static final CircuitForm LIGHTS =
      ExchangeFixtures.circuit(
          1, PhasePosition.L1, "Lights", DeviceKind.MCB, TripCurve.B, 6, null, 1.5, 20.0);
  static final CircuitForm HEATER =
      ExchangeFixtures.circuit(
          2, PhasePosition.L2, "Heater", DeviceKind.MCB, TripCurve.B, 16, null, 2.5, 15.0);
  static final LoadForm LAMPS =
      ExchangeFixtures.load("Lamps", LoadCategory.LIGHTING, 10, 60, RatingUnit.W, 0.9);
  static final LoadForm PANEL =
      ExchangeFixtures.load("Panel", LoadCategory.SPACE_HEATING, 1, 2000, RatingUnit.W, 1.0);

  static final List<CircuitEntry> STORED =
      List.of(
          new CircuitEntry(11L, LIGHTS, List.of(LAMPS), "3-aaaaaa"),
          new CircuitEntry(12L, HEATER, List.of(PANEL), "5-bbbbbb"));

  static ImportPlan.PlannedCircuit read(
      CircuitForm circuit, LoadForm load, Long key, String version) {
    return new ImportPlan.PlannedCircuit(circuit, List.of(load), List.of(5), key, version);
  }

  static List<ImportOutcome.Kind> kinds(ScheduleMatcher.Result result) {
    return result.outcomes().stream().map(ImportOutcome::kind).toList();
  }

  @Test
  void sameCircuitsAreUnchangedAndStoreNothing() {
    var result =
        ScheduleMatcher.match(
            List.of(read(LIGHTS, LAMPS, 11L, "3-aaaaaa"), read(HEATER, PANEL, 12L, "5-bbbbbb")),
            STORED,
            false);
    assertThat(kinds(result))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.UNCHANGED);
    assertThat(result.outcomes()).allSatisfy(o -> assertThat(o.isStored()).isFalse());
  }

  @Test
  void rowWithoutKeyMatchesByWayAndLineAndListsTheFieldChanged() {
    LoadForm brighter =
        ExchangeFixtures.load("Lamps", LoadCategory.LIGHTING, 12, 60, RatingUnit.W, 0.9);
    var result =
        ScheduleMatcher.match(
            List.of(read(LIGHTS, brighter, null, null), read(HEATER, PANEL, null, null)),
            STORED,
            false);
    assertThat(kinds(result))
        .containsExactly(ImportOutcome.Kind.CHANGED, ImportOutcome.Kind.UNCHANGED);
    assertThat(result.outcomes().get(0).changes())
        .containsExactly(new ImportOutcome.Change(ImportField.QUANTITY, 1, "10", "12"));
    assertThat(result.outcomes().get(0).edit().expectedVersion())
        .as("applying checks the edition seen when planning")
        .isEqualTo("3-aaaaaa");
  }

  @Test
  void storedCircuitChangedSinceTheExportIsAConflictNotAnEdit() {
    CircuitForm bigger =
        ExchangeFixtures.circuit(
            2, PhasePosition.L2, "Heater", DeviceKind.MCB, TripCurve.B, 20, null, 2.5, 15.0);
    var result =
        ScheduleMatcher.match(
            List.of(read(LIGHTS, LAMPS, 11L, "3-aaaaaa"), read(bigger, PANEL, 12L, "4-bbbbbb")),
            STORED,
            false);
    assertThat(kinds(result))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.CONFLICT);
    assertThat(result.outcomes().get(1).isStored()).isFalse();
    assertThat(result.outcomes().get(1).changes())
        .containsExactly(new ImportOutcome.Change(ImportField.RATING_AMPS, 0, "16", "20"));
  }

  @Test
  void keyWinsOverPositionSoAMovedCircuitStaysTheSameCircuit() {
    CircuitForm moved =
        ExchangeFixtures.circuit(
            4, PhasePosition.L1, "Lights", DeviceKind.MCB, TripCurve.B, 6, null, 1.5, 20.0);
    var result =
        ScheduleMatcher.match(
            List.of(read(moved, LAMPS, 11L, "3-aaaaaa"), read(HEATER, PANEL, 12L, "5-bbbbbb")),
            STORED,
            false);
    assertThat(kinds(result))
        .containsExactly(ImportOutcome.Kind.CHANGED, ImportOutcome.Kind.UNCHANGED);
    assertThat(result.outcomes().get(0).circuitId()).isEqualTo(11L);
    assertThat(result.outcomes().get(0).changes())
        .containsExactly(new ImportOutcome.Change(ImportField.WAY, 0, "1", "4"));
  }

  @Test
  void circuitLeftOutIsKeptOrRemovedAsAskedAndAKeptOneBlocksItsPosition() {
    CircuitForm onTheHeatersWay =
        ExchangeFixtures.circuit(
            2, PhasePosition.L2, "Towel rail", DeviceKind.MCB, TripCurve.B, 6, null, 1.5, 8.0);
    List<ImportPlan.PlannedCircuit> file =
        List.of(read(LIGHTS, LAMPS, 11L, "3-aaaaaa"), read(onTheHeatersWay, PANEL, 99L, null));

    var keeping = ScheduleMatcher.match(file.subList(0, 1), STORED, false);
    assertThat(kinds(keeping))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.KEPT);

    var removing = ScheduleMatcher.match(file.subList(0, 1), STORED, true);
    assertThat(kinds(removing))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.REMOVED);
    assertThat(removing.outcomes().get(1).edit().isRemoved()).isTrue();

    // a key of another board (99) is no match; the heater, not in the file, is matched by position
    var replacing = ScheduleMatcher.match(file, STORED, false);
    assertThat(kinds(replacing))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.CHANGED);
  }

  @Test
  void rowOnAPositionHeldByAKeptCircuitIsBlockedUnlessThatCircuitGoes() {
    CircuitForm oven =
        ExchangeFixtures.circuit(
            2, PhasePosition.THREE_POLE, "Oven", DeviceKind.MCB, TripCurve.C, 20, null, 4.0, 12.0);
    ImportPlan.PlannedCircuit ovenRow = read(oven, PANEL, null, null);
    List<ImportPlan.PlannedCircuit> file = List.of(read(LIGHTS, LAMPS, 11L, "3-aaaaaa"), ovenRow);

    var keeping = ScheduleMatcher.match(file, STORED, false);
    assertThat(keeping.blocked()).containsOnlyKeys(ovenRow);
    assertThat(kinds(keeping))
        .containsExactly(ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.KEPT);

    var removing = ScheduleMatcher.match(file, STORED, true);
    assertThat(removing.blocked()).isEmpty();
    assertThat(kinds(removing))
        .containsExactly(
            ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.ADDED, ImportOutcome.Kind.REMOVED);
  }

  @Test
  void newCircuitOnAFreePositionIsAdded() {
    CircuitForm fan =
        ExchangeFixtures.circuit(
            3, PhasePosition.L3, "Fan", DeviceKind.MCB, TripCurve.C, 10, null, 1.5, 9.0);
    var result =
        ScheduleMatcher.match(
            List.of(
                read(LIGHTS, LAMPS, 11L, "3-aaaaaa"),
                read(HEATER, PANEL, 12L, "5-bbbbbb"),
                read(fan, PANEL, null, null)),
            STORED,
            false);
    assertThat(kinds(result))
        .containsExactly(
            ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.UNCHANGED, ImportOutcome.Kind.ADDED);
    assertThat(result.outcomes().get(2).edit().isAdded()).isTrue();
    assertThat(result.blocked()).isEmpty();
  }

  @Test
  void onANorthAmericanPanelThePreviewNamesTheLinesAsThePanelDoes() {
    CircuitForm moved =
        ExchangeFixtures.circuit(
            2, PhasePosition.L1, "Heater", DeviceKind.MCB, TripCurve.B, 16, null, 2.5, 15.0);
    var result =
        ScheduleMatcher.match(
            List.of(read(moved, PANEL, 12L, "5-bbbbbb")),
            STORED,
            false,
            com.wayledger.engine.SupplySystem.SPLIT_PHASE_120_240::lineName);

    ImportOutcome heater = result.outcomes().get(0);
    assertThat(heater.position()).as("way and line as the panel names it").isEqualTo("2 A");
    assertThat(heater.changes())
        .as("the line change in letters, not L2 → L1")
        .contains(new ImportOutcome.Change(ImportField.LINE, 0, "B", "A"));
  }
}
