package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The optional columns a file may leave out, and what a matched circuit keeps when it does: an
 * absent column says nothing about its value, so the stored value stays (as for a column the user
 * set to "ignore"); a present empty cell clears it. A sheet of another origin thus never clears a
 * circuit's conduit, GFCI, measured Zs or cable conditions just by not having the column.
 *
 * <p>Each entry names its columns (the value may come from either: a size in mm² or in AWG) and the
 * record components they fill. Copying by component name keeps every component of the form records
 * without a wither per field, so a component added later cannot be dropped by a forgotten argument.
 */
final class AbsentColumns {

  /**
   * Columns that together carry some fields of a circuit or of its load lines.
   *
   * @param columns the file's columns holding the value; kept only when every one is absent
   * @param circuitComponents components of {@link CircuitForm} they fill
   * @param loadComponents components of {@link LoadForm} they fill, line by line
   */
  record Kept(
      Set<ImportField> columns, List<String> circuitComponents, List<String> loadComponents) {

    static Kept circuit(Set<ImportField> columns, String... components) {
      return new Kept(columns, List.of(components), List.of());
    }

    static Kept load(ImportField column, String component) {
      return new Kept(EnumSet.of(column), List.of(), List.of(component));
    }
  }

  static final List<Kept> KEPT =
      List.of(
          Kept.circuit(EnumSet.of(ImportField.LOCATION), "location"),
          Kept.circuit(EnumSet.of(ImportField.FAULT_INTERRUPTER), "deviceFaultInterrupter"),
          Kept.circuit(EnumSet.of(ImportField.CONDUIT), "cableConduit"),
          Kept.circuit(EnumSet.of(ImportField.MEASURED_ZS), "measuredLoopImpedanceOhms"),
          Kept.circuit(EnumSet.of(ImportField.KEEP_LINE), "lockedForBalancing"),
          Kept.circuit(EnumSet.of(ImportField.RING), "ringFinal"),
          Kept.circuit(EnumSet.of(ImportField.INSTALLATION), "cableInstallationMethod"),
          Kept.circuit(EnumSet.of(ImportField.AMBIENT_CELSIUS), "cableAmbientCelsius"),
          Kept.circuit(EnumSet.of(ImportField.GROUPED), "cableGroupedCircuits"),
          Kept.circuit(EnumSet.of(ImportField.THERMAL_INSULATION_MM), "cableThermalInsulationMm"),
          Kept.circuit(EnumSet.of(ImportField.CONDUCTOR), "cableMaterial"),
          Kept.circuit(EnumSet.of(ImportField.INSULATION), "cableInsulation"),
          // a device text ("C32 6kA") may carry the breaking capacity
          Kept.circuit(
              EnumSet.of(ImportField.BREAKING_KILOAMPS, ImportField.DEVICE_SUMMARY),
              "deviceBreakingCapacityKiloAmps"),
          Kept.circuit(
              EnumSet.of(ImportField.LINE_CSA, ImportField.LINE_AWG),
              "cableLineCsa",
              "cableLineSize"),
          Kept.circuit(
              EnumSet.of(ImportField.CPC_CSA, ImportField.CPC_AWG), "cableCpcCsa", "cableCpcSize"),
          Kept.circuit(
              EnumSet.of(ImportField.LENGTH_METRES, ImportField.LENGTH_FEET),
              "cableLengthMetres",
              "cableLengthFeet"),
          Kept.load(ImportField.MOTOR_HP, "motorHorsepower"),
          Kept.load(ImportField.SURGE_MULTIPLE, "startUpSurgeMultiple"),
          Kept.load(ImportField.SURGE_MILLIS, "startUpSurgeMillis"),
          Kept.load(ImportField.CONTINUOUS, "continuous"));

  /** The MCCB settings, kept only while the file's device is the stored kind. */
  static final Kept MCCB_SETTINGS =
      Kept.circuit(
          EnumSet.of(ImportField.OVERLOAD_SETTING_AMPS, ImportField.INSTANTANEOUS_SETTING_AMPS),
          "deviceOverloadSettingAmps",
          "deviceInstantaneousSettingAmps");

  private AbsentColumns() {}

  /** The kept columns the file's mapping does not have. */
  static Set<ImportField> of(List<ImportField> mapping) {
    Set<ImportField> absent = new HashSet<>();
    for (Kept kept : all()) {
      for (ImportField column : kept.columns()) {
        if (!mapping.contains(column)) {
          absent.add(column);
        }
      }
    }
    return absent;
  }

  /** The circuit read, with the stored values of every group whose columns are all absent. */
  static ImportPlan.PlannedCircuit keep(
      ImportPlan.PlannedCircuit read, CircuitEntry stored, Set<ImportField> absent) {
    Set<String> circuitNames = new HashSet<>();
    Set<String> loadNames = new HashSet<>();
    for (Kept kept : all()) {
      if (!absent.containsAll(kept.columns())) {
        continue;
      }
      if (kept == MCCB_SETTINGS && read.circuit().deviceKind() != stored.circuit().deviceKind()) {
        continue;
      }
      circuitNames.addAll(kept.circuitComponents());
      loadNames.addAll(kept.loadComponents());
    }
    CircuitForm circuit = copy(read.circuit(), stored.circuit(), circuitNames, CircuitForm.class);
    List<LoadForm> loads = new ArrayList<>(read.loads().size());
    for (int i = 0; i < read.loads().size(); i++) {
      LoadForm load = read.loads().get(i);
      // load lines are matched line by line, as the import replaces them
      loads.add(
          i < stored.loads().size()
              ? copy(load, stored.loads().get(i), loadNames, LoadForm.class)
              : load);
    }
    return new ImportPlan.PlannedCircuit(
        circuit, loads, read.rowNumbers(), read.key(), read.recordVersion());
  }

  private static List<Kept> all() {
    List<Kept> all = new ArrayList<>(KEPT);
    all.add(MCCB_SETTINGS);
    return all;
  }

  /** {@code read} with the named components taken from {@code stored}. */
  private static <T extends Record> T copy(T read, T stored, Set<String> names, Class<T> type) {
    if (names.isEmpty()) {
      return read;
    }
    RecordComponent[] components = type.getRecordComponents();
    Object[] values = new Object[components.length];
    Class<?>[] types = new Class<?>[components.length];
    try {
      for (int i = 0; i < components.length; i++) {
        RecordComponent component = components[i];
        types[i] = component.getType();
        values[i] =
            component.getAccessor().invoke(names.contains(component.getName()) ? stored : read);
      }
      return type.getDeclaredConstructor(types).newInstance(values);
    } catch (ReflectiveOperationException e) {
      throw new IllegalStateException("cannot copy the components " + names + " of " + type, e);
    }
  }
}
