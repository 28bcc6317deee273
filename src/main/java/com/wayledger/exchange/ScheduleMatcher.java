package com.wayledger.exchange;

import com.wayledger.board.CircuitEdit;
import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.system.RecordDiff;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Matches the circuits read from a file to a board's stored circuits, so that an edited export can
 * come back: first by the circuit key the export writes, then by way and line. Each match is
 * compared field by field; a match whose stored circuit changed since the export (its edition is no
 * longer the one in the file) is a conflict, never overwritten. Stored circuits the file leaves out
 * are removed only when the user asks.
 */
final class ScheduleMatcher {

  /** Circuit form properties by the column that writes them. */
  private static final Map<String, ImportField> CIRCUIT_FIELDS =
      Map.ofEntries(
          Map.entry("wayNumber", ImportField.WAY),
          Map.entry("position", ImportField.LINE),
          Map.entry("location", ImportField.LOCATION),
          Map.entry("deviceFaultInterrupter", ImportField.FAULT_INTERRUPTER),
          Map.entry("cableConduit", ImportField.CONDUIT),
          Map.entry("description", ImportField.CIRCUIT),
          Map.entry("status", ImportField.STATE),
          Map.entry("lockedForBalancing", ImportField.KEEP_LINE),
          Map.entry("deviceKind", ImportField.DEVICE),
          Map.entry("deviceCurve", ImportField.CURVE),
          Map.entry("deviceRatingAmps", ImportField.RATING_AMPS),
          Map.entry("devicePoles", ImportField.POLES),
          Map.entry("deviceBreakingCapacityKiloAmps", ImportField.BREAKING_KILOAMPS),
          Map.entry("deviceResidualMilliAmps", ImportField.RESIDUAL_MILLIAMPS),
          Map.entry("deviceRcdType", ImportField.RCD_TYPE),
          Map.entry("deviceOverloadSettingAmps", ImportField.OVERLOAD_SETTING_AMPS),
          Map.entry("deviceInstantaneousSettingAmps", ImportField.INSTANTANEOUS_SETTING_AMPS),
          Map.entry("cableLineCsa", ImportField.LINE_CSA),
          Map.entry("cableCpcCsa", ImportField.CPC_CSA),
          Map.entry("cableMaterial", ImportField.CONDUCTOR),
          Map.entry("cableInsulation", ImportField.INSULATION),
          Map.entry("cableLengthMetres", ImportField.LENGTH_METRES),
          Map.entry("ringFinal", ImportField.RING),
          Map.entry("cableInstallationMethod", ImportField.INSTALLATION),
          Map.entry("cableAmbientCelsius", ImportField.AMBIENT_CELSIUS),
          Map.entry("cableGroupedCircuits", ImportField.GROUPED),
          Map.entry("cableThermalInsulationMm", ImportField.THERMAL_INSULATION_MM),
          Map.entry("measuredLoopImpedanceOhms", ImportField.MEASURED_ZS));

  private static final Map<String, ImportField> LOAD_FIELDS =
      Map.of(
          "description", ImportField.LOAD,
          "category", ImportField.CATEGORY,
          "quantity", ImportField.QUANTITY,
          "ratingValue", ImportField.RATING,
          "ratingUnit", ImportField.UNIT,
          "powerFactor", ImportField.POWER_FACTOR,
          "startUpSurgeMultiple", ImportField.SURGE_MULTIPLE,
          "startUpSurgeMillis", ImportField.SURGE_MILLIS,
          "continuous", ImportField.CONTINUOUS,
          "motorHorsepower", ImportField.MOTOR_HP);

  private ScheduleMatcher() {}

  /**
   * What the import does to each circuit.
   *
   * @param outcomes one per circuit read (in the file's order), then one per stored circuit the
   *     file leaves out
   * @param blocked circuits read that cannot be stored because a stored circuit the file leaves out
   *     (and that is kept) holds their position, each with its sheet row problems
   */
  record Result(List<ImportOutcome> outcomes, Map<ImportPlan.PlannedCircuit, Blocked> blocked) {}

  /** Where a circuit read from the file collides with a kept stored circuit. */
  record Blocked(int wayNumber, Phase phase) {}

  static Result match(
      List<ImportPlan.PlannedCircuit> planned, List<CircuitEntry> stored, boolean removeMissing) {
    return match(planned, stored, removeMissing, Phase::name);
  }

  static Result match(
      List<ImportPlan.PlannedCircuit> planned,
      List<CircuitEntry> stored,
      boolean removeMissing,
      java.util.function.Function<Phase, String> lineName) {
    return match(planned, stored, removeMissing, lineName, Set.of());
  }

  /**
   * As {@link #match(List, List, boolean)}, naming lines in the preview as the board does ("3 B",
   * "1 A-B" on a North American panel).
   *
   * @param absent the optional columns the file does not have: a matched circuit keeps its stored
   *     values of them ({@link AbsentColumns}: location, fault interrupter, conduit, measured Zs,
   *     cable conditions, …); a present empty cell clears them
   */
  static Result match(
      List<ImportPlan.PlannedCircuit> planned,
      List<CircuitEntry> stored,
      boolean removeMissing,
      java.util.function.Function<Phase, String> lineName,
      Set<ImportField> absent) {
    Map<Long, CircuitEntry> byId = new HashMap<>();
    Map<String, CircuitEntry> byPosition = new HashMap<>();
    for (CircuitEntry entry : stored) {
      byId.put(entry.circuitId(), entry);
      byPosition.put(position(entry.circuit()), entry);
    }
    Map<ImportPlan.PlannedCircuit, CircuitEntry> matched = new LinkedHashMap<>();
    Set<Long> claimed = new HashSet<>();
    // the key first: a circuit moved to another way in the sheet is still the same circuit
    for (ImportPlan.PlannedCircuit circuit : planned) {
      CircuitEntry entry = circuit.key() == null ? null : byId.get(circuit.key());
      if (entry != null && claimed.add(entry.circuitId())) {
        matched.put(circuit, entry);
      }
    }
    // then way and line, for rows without a key (a sheet of another origin, or a row typed in)
    for (ImportPlan.PlannedCircuit circuit : planned) {
      if (matched.containsKey(circuit)) {
        continue;
      }
      CircuitEntry entry = byPosition.get(position(circuit.circuit()));
      if (entry != null
          && !claimed.contains(entry.circuitId())
          && (circuit.key() == null || !byId.containsKey(circuit.key()))) {
        claimed.add(entry.circuitId());
        matched.put(circuit, entry);
      }
    }
    if (!absent.isEmpty()) {
      Map<ImportPlan.PlannedCircuit, CircuitEntry> kept = new LinkedHashMap<>();
      List<ImportPlan.PlannedCircuit> all = new ArrayList<>(planned.size());
      for (ImportPlan.PlannedCircuit circuit : planned) {
        CircuitEntry entry = matched.get(circuit);
        ImportPlan.PlannedCircuit merged =
            entry == null ? circuit : AbsentColumns.keep(circuit, entry, absent);
        all.add(merged);
        if (entry != null) {
          kept.put(merged, entry);
        }
      }
      planned = all;
      matched = kept;
    }
    List<CircuitEntry> left =
        stored.stream().filter(entry -> !claimed.contains(entry.circuitId())).toList();
    Map<String, CircuitEntry> keptSlots = new HashMap<>();
    if (!removeMissing) {
      for (CircuitEntry entry : left) {
        for (Phase phase : entry.circuit().position().phases()) {
          keptSlots.put(entry.circuit().wayNumber() + ":" + phase, entry);
        }
      }
    }
    List<ImportOutcome> outcomes = new ArrayList<>();
    Map<ImportPlan.PlannedCircuit, Blocked> blocked = new LinkedHashMap<>();
    for (ImportPlan.PlannedCircuit circuit : planned) {
      Blocked collision = collision(circuit.circuit(), keptSlots);
      if (collision != null) {
        blocked.put(circuit, collision);
        continue;
      }
      CircuitEntry entry = matched.get(circuit);
      if (entry == null) {
        outcomes.add(
            outcome(
                ImportOutcome.Kind.ADDED,
                null,
                circuit,
                List.of(),
                CircuitEdit.add(circuit.circuit(), loadsOf(circuit)),
                lineName));
        continue;
      }
      List<ImportOutcome.Change> changes = changes(entry, circuit, lineName);
      if (changes.isEmpty()) {
        outcomes.add(
            outcome(
                ImportOutcome.Kind.UNCHANGED, entry.circuitId(), circuit, changes, null, lineName));
      } else if (circuit.recordVersion() != null
          && !circuit.recordVersion().equals(entry.recordVersion())) {
        outcomes.add(
            outcome(
                ImportOutcome.Kind.CONFLICT, entry.circuitId(), circuit, changes, null, lineName));
      } else {
        outcomes.add(
            outcome(
                ImportOutcome.Kind.CHANGED,
                entry.circuitId(),
                circuit,
                changes,
                CircuitEdit.change(
                    entry.circuitId(), entry.recordVersion(), circuit.circuit(), loadsOf(circuit)),
                lineName));
      }
    }
    for (CircuitEntry entry : left) {
      outcomes.add(
          new ImportOutcome(
              removeMissing ? ImportOutcome.Kind.REMOVED : ImportOutcome.Kind.KEPT,
              entry.circuitId(),
              label(entry.circuit(), lineName),
              entry.circuit().description(),
              List.of(),
              List.of(),
              removeMissing ? CircuitEdit.remove(entry.circuitId(), entry.recordVersion()) : null));
    }
    return new Result(outcomes, blocked);
  }

  private static List<LoadForm> loadsOf(ImportPlan.PlannedCircuit circuit) {
    return circuit.circuit().status() == WayStatus.IN_USE ? circuit.loads() : List.of();
  }

  private static ImportOutcome outcome(
      ImportOutcome.Kind kind,
      Long circuitId,
      ImportPlan.PlannedCircuit circuit,
      List<ImportOutcome.Change> changes,
      CircuitEdit edit,
      java.util.function.Function<Phase, String> lineName) {
    return new ImportOutcome(
        kind,
        circuitId,
        label(circuit.circuit(), lineName),
        circuit.circuit().description(),
        circuit.rowNumbers(),
        changes,
        edit);
  }

  private static Blocked collision(CircuitForm circuit, Map<String, CircuitEntry> keptSlots) {
    for (Phase phase : circuit.position().phases()) {
      if (keptSlots.containsKey(circuit.wayNumber() + ":" + phase)) {
        return new Blocked(circuit.wayNumber(), phase);
      }
    }
    return null;
  }

  /** The fields in which the file's circuit differs from the stored one, old → new. */
  static List<ImportOutcome.Change> changes(
      CircuitEntry stored,
      ImportPlan.PlannedCircuit read,
      java.util.function.Function<Phase, String> lineName) {
    List<ImportOutcome.Change> changes = new ArrayList<>();
    for (RecordDiff.FieldChange change : stored.circuit().changedFields(read.circuit())) {
      changes.add(
          new ImportOutcome.Change(
              CIRCUIT_FIELDS.getOrDefault(change.field(), ImportField.CIRCUIT),
              0,
              text(change.theirs(), lineName),
              text(change.yours(), lineName)));
    }
    List<LoadForm> before = stored.loads();
    List<LoadForm> after = loadsOf(read);
    for (int i = 0; i < Math.max(before.size(), after.size()); i++) {
      int line = i + 1;
      if (i >= after.size()) {
        changes.add(new ImportOutcome.Change(ImportField.LOAD, line, loadText(before.get(i)), ""));
      } else if (i >= before.size()) {
        changes.add(new ImportOutcome.Change(ImportField.LOAD, line, "", loadText(after.get(i))));
      } else {
        for (RecordDiff.FieldChange change :
            RecordDiff.between(after.get(i), before.get(i), Set.of())) {
          changes.add(
              new ImportOutcome.Change(
                  LOAD_FIELDS.getOrDefault(change.field(), ImportField.LOAD),
                  line,
                  text(change.theirs()),
                  text(change.yours())));
        }
      }
    }
    return changes;
  }

  private static String loadText(LoadForm load) {
    return load.description()
        + " ("
        + (load.quantity() != null && load.quantity() > 1 ? load.quantity() + " × " : "")
        + text(load.ratingValue())
        + " "
        + text(load.ratingUnit())
        + ")";
  }

  /** A value as the sheet writes it. */
  static String text(Object value) {
    return text(value, Phase::name);
  }

  /** A value as the preview shows it, a position's lines named as on the board. */
  static String text(Object value, java.util.function.Function<Phase, String> lineName) {
    if (value == null) {
      return "";
    }
    if (value instanceof Number number) {
      return CsvWriter.num(number);
    }
    if (value instanceof Boolean flag) {
      return Codes.yes(flag);
    }
    if (value instanceof PhasePosition position) {
      return Codes.line(position, lineName);
    }
    if (value instanceof WayStatus status) {
      return Codes.state(status);
    }
    if (value instanceof Enum<?> constant) {
      return constant.name();
    }
    return value.toString();
  }

  private static String position(CircuitForm circuit) {
    return circuit.wayNumber() + ":" + circuit.position();
  }

  private static String label(
      CircuitForm circuit, java.util.function.Function<Phase, String> lineName) {
    return circuit.wayNumber() + " " + Codes.line(circuit.position(), lineName);
  }
}
