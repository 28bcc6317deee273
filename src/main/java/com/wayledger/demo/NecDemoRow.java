package com.wayledger.demo;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.nec.ConductorSize;
import java.util.ArrayList;
import java.util.List;

/**
 * One row of a {@link NecDemoCircuits} table as the forms the schedule takes: a branch circuit of
 * copper with 90 °C insulation (in the 90 °C column with 60/75 °C terminations) at 30 °C, length in
 * feet stored in metres, AWG stored as its area in mm²; a breaker of 100 A or more is a
 * moulded-case one, the rest miniature breakers of curve C, 10 kA.
 *
 * @param circuit the circuit, its way number still to be given (the panel's first free space)
 * @param load its load, or null for a feeder
 */
record NecDemoRow(CircuitForm circuit, LoadForm load) {

  static final double METRES_PER_FOOT = 0.3048;

  private static final double MOULDED_CASE_FROM_AMPS = 100.0;

  /** Every row of a table, in order. */
  static List<NecDemoRow> of(String table) {
    List<NecDemoRow> rows = new ArrayList<>();
    for (String line : table.strip().split("\n")) {
      if (!line.isBlank()) {
        rows.add(parse(line));
      }
    }
    return rows;
  }

  private static NecDemoRow parse(String line) {
    String[] cell = line.split("\\|");
    if (cell.length != 11) {
      throw new IllegalArgumentException("a demo row has 11 cells: " + line);
    }
    for (int i = 0; i < cell.length; i++) {
      cell[i] = cell[i].strip();
    }
    PhasePosition position = position(cell[0]);
    double amps = Double.parseDouble(cell[2]);
    ConductorSize size =
        ConductorSize.ofLabel(cell[3])
            .orElseThrow(() -> new IllegalArgumentException("no NEC size: " + cell[3]));
    FaultInterrupter function = "-".equals(cell[6]) ? null : FaultInterrupter.valueOf(cell[6]);
    CircuitForm circuit =
        circuit(
            position,
            cell[1],
            amps,
            size,
            Double.parseDouble(cell[4]),
            CircuitLocation.valueOf(cell[5]),
            function);
    LoadForm load = null;
    if (!"-".equals(cell[7])) {
      String[] rating = cell[10].split(" ");
      load =
          new LoadForm(
              cell[7],
              LoadCategory.valueOf(cell[8]),
              Integer.parseInt(cell[9]),
              Double.parseDouble(rating[0]),
              RatingUnit.valueOf(rating[1]),
              1.0,
              null,
              null,
              false);
    }
    return new NecDemoRow(circuit, load);
  }

  private static PhasePosition position(String lines) {
    return switch (lines) {
      case "A" -> PhasePosition.L1;
      case "B" -> PhasePosition.L2;
      case "C" -> PhasePosition.L3;
      case "A-B" -> PhasePosition.L1_L2;
      case "B-C" -> PhasePosition.L2_L3;
      case "C-A" -> PhasePosition.L3_L1;
      default -> throw new IllegalArgumentException("no such lines: " + lines);
    };
  }

  private static CircuitForm circuit(
      PhasePosition position,
      String description,
      double amps,
      ConductorSize size,
      double feet,
      CircuitLocation room,
      FaultInterrupter function) {
    DeviceKind breaker = amps >= MOULDED_CASE_FROM_AMPS ? DeviceKind.MCCB : DeviceKind.MCB;
    // the equipment grounding conductor: the circuit's own size up to 10 AWG, else 10 AWG
    ConductorSize ground =
        size.ordinal() <= ConductorSize.AWG_10.ordinal() ? size : ConductorSize.AWG_10;
    return new CircuitForm(
        1,
        position,
        description,
        WayStatus.IN_USE,
        false,
        breaker,
        breaker == DeviceKind.MCCB ? null : TripCurve.C,
        amps,
        position.poles(),
        10.0,
        null,
        null,
        size.squareMillimetres(),
        ground.squareMillimetres(),
        ConductorMaterial.COPPER,
        Insulation.THERMOSETTING_90,
        feet * METRES_PER_FOOT,
        InstallationMethod.C,
        30.0,
        1,
        0,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        room,
        function);
  }
}
