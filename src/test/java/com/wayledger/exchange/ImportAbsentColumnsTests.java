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
}
