package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * An optional column the file does not have leaves the stored value as it is; a present empty cell
 * clears it (location and fault interrupter alike).
 */
class ImportAbsentColumnsTests {

  static final CircuitForm READ =
      ExchangeFixtures.circuit(
          5, PhasePosition.L1, "Bathroom receptacles", DeviceKind.MCB, null, 20, null, null, null);
  static final CircuitForm STORED =
      READ.withLocationAndFaultInterrupter(CircuitLocation.BATHROOM, FaultInterrupter.GFCI);
  static final LoadForm LOAD =
      ExchangeFixtures.load("Receptacles", LoadCategory.SOCKET_OUTLETS, 1, 1500, RatingUnit.W, 1.0);

  static ScheduleMatcher.Result match(Set<ImportField> absent) {
    return ScheduleMatcher.match(
        List.of(new ImportPlan.PlannedCircuit(READ, List.of(LOAD), List.of(5), 31L, "2-abc")),
        List.of(new CircuitEntry(31L, STORED, List.of(LOAD), "2-abc")),
        false,
        Phase::name,
        absent);
  }

  @Test
  void fileWithoutTheColumnsKeepsTheStoredGfciAndLocation() {
    ScheduleMatcher.Result result =
        match(ImportService.absentOptional(List.of(ImportField.WAY, ImportField.CIRCUIT)));

    assertThat(result.outcomes().get(0).kind())
        .as("nothing to change when the file has no Location or Fault interrupter column")
        .isEqualTo(ImportOutcome.Kind.UNCHANGED);
  }

  @Test
  void presentEmptyCellsClearTheStoredGfciAndLocation() {
    ScheduleMatcher.Result result =
        match(
            ImportService.absentOptional(
                List.of(ImportField.WAY, ImportField.LOCATION, ImportField.FAULT_INTERRUPTER)));

    ImportOutcome outcome = result.outcomes().get(0);
    assertThat(outcome.kind())
        .as("empty cells change the circuit")
        .isEqualTo(ImportOutcome.Kind.CHANGED);
    assertThat(outcome.changes().stream().map(ImportOutcome.Change::field).toList())
        .as("the fields cleared")
        .containsExactlyInAnyOrder(ImportField.LOCATION, ImportField.FAULT_INTERRUPTER);
    assertThat(outcome.edit().circuit().deviceFaultInterrupter())
        .as("the stored GFCI is cleared")
        .isNull();
  }

  @Test
  void absentFaultInterrupterColumnKeepsItWhileAPresentLocationColumnChangesIt() {
    CircuitForm outdoors = READ.withLocationAndFaultInterrupter(CircuitLocation.OUTDOORS, null);
    ScheduleMatcher.Result result =
        ScheduleMatcher.match(
            List.of(
                new ImportPlan.PlannedCircuit(outdoors, List.of(LOAD), List.of(5), 31L, "2-abc")),
            List.of(new CircuitEntry(31L, STORED, List.of(LOAD), "2-abc")),
            false,
            Phase::name,
            ImportService.absentOptional(List.of(ImportField.WAY, ImportField.LOCATION)));

    ImportOutcome outcome = result.outcomes().get(0);
    assertThat(outcome.changes().stream().map(ImportOutcome.Change::field).toList())
        .containsExactly(ImportField.LOCATION);
    assertThat(outcome.edit().circuit().deviceFaultInterrupter())
        .as("GFCI kept: its column is not in the file")
        .isEqualTo(FaultInterrupter.GFCI);
    assertThat(outcome.edit().circuit().location()).isEqualTo(CircuitLocation.OUTDOORS);
  }

  @Test
  void fileWithoutTheConduitColumnKeepsTheStoredConduitAndAPresentEmptyCellClearsIt() {
    CircuitForm steel = READ.withCableConduit(com.wayledger.engine.Conduit.STEEL);
    List<CircuitEntry> stored = List.of(new CircuitEntry(31L, steel, List.of(LOAD), "2-abc"));
    List<ImportPlan.PlannedCircuit> read =
        List.of(new ImportPlan.PlannedCircuit(READ, List.of(LOAD), List.of(5), 31L, "2-abc"));

    ImportOutcome withoutColumn =
        ScheduleMatcher.match(
                read,
                stored,
                false,
                Phase::name,
                ImportService.absentOptional(List.of(ImportField.WAY, ImportField.CIRCUIT)))
            .outcomes()
            .get(0);
    ImportOutcome emptyCell =
        ScheduleMatcher.match(
                read,
                stored,
                false,
                Phase::name,
                ImportService.absentOptional(
                    List.of(ImportField.WAY, ImportField.CIRCUIT, ImportField.CONDUIT)))
            .outcomes()
            .get(0);

    assertThat(withoutColumn.kind())
        .as("a file without the Conduit column changes nothing (docs/exchange.md)")
        .isEqualTo(ImportOutcome.Kind.UNCHANGED);
    assertThat(emptyCell.changes().stream().map(ImportOutcome.Change::field).toList())
        .containsExactly(ImportField.CONDUIT);
    assertThat(emptyCell.edit().circuit().cableConduit()).as("empty cell clears it").isNull();
  }

  @Test
  void fileWithoutTheMotorHorsepowerColumnKeepsEachLoadLinesRating() {
    LoadForm motor =
        new LoadForm(
            "Pump", LoadCategory.MOTOR, 1, 1100.0, RatingUnit.W, 0.8, null, null, false, 1.5);
    LoadForm readMotor =
        new LoadForm(
            "Pump", LoadCategory.MOTOR, 1, 1100.0, RatingUnit.W, 0.8, null, null, false, null);

    ImportOutcome outcome =
        ScheduleMatcher.match(
                List.of(
                    new ImportPlan.PlannedCircuit(
                        READ, List.of(readMotor), List.of(5), 31L, "2-abc")),
                List.of(new CircuitEntry(31L, READ, List.of(motor), "2-abc")),
                false,
                Phase::name,
                ImportService.absentOptional(
                    List.of(
                        ImportField.WAY,
                        ImportField.CIRCUIT,
                        ImportField.LOCATION,
                        ImportField.FAULT_INTERRUPTER)))
            .outcomes()
            .get(0);

    assertThat(outcome.kind()).isEqualTo(ImportOutcome.Kind.UNCHANGED);
  }

  @Test
  void everyKeptFieldNamesAComponentOfTheFormRecords() {
    Set<String> circuit = new java.util.HashSet<>();
    for (var c : CircuitForm.class.getRecordComponents()) {
      circuit.add(c.getName());
    }
    Set<String> load = new java.util.HashSet<>();
    for (var c : LoadForm.class.getRecordComponents()) {
      load.add(c.getName());
    }
    List<AbsentColumns.Kept> all = new java.util.ArrayList<>(AbsentColumns.KEPT);
    all.add(AbsentColumns.MCCB_SETTINGS);
    for (AbsentColumns.Kept kept : all) {
      assertThat(circuit).as("columns %s", kept.columns()).containsAll(kept.circuitComponents());
      assertThat(load).as("columns %s", kept.columns()).containsAll(kept.loadComponents());
    }
  }
}
