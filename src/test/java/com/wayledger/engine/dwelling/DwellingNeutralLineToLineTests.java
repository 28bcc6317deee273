package com.wayledger.engine.dwelling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * NEC 220.61(A) (as published): the feeder neutral load is the maximum unbalance between the
 * neutral and any one ungrounded conductor, so a load connected line to line (a 240 V-only water
 * heater on a 120/240 V panel) adds nothing to it. The unit and its loads are invented; the tests
 * compare a board with and without the load, so no figure is taken from the code under test.
 */
class DwellingNeutralLineToLineTests {

  private static final double VA = 1e-6;
  private static final long BOARD = 7;

  private static LoadSpec load(String name, LoadCategory category, double value, RatingUnit unit) {
    return new LoadSpec(name, category, 1, value, unit, 1.0, null, null, false);
  }

  private static CircuitSpec circuit(int way, PhasePosition position, LoadSpec load) {
    return new CircuitSpec(
        way,
        way,
        position,
        load.description(),
        WayStatus.IN_USE,
        false,
        null,
        null,
        List.of(load),
        null,
        null);
  }

  /** A 120/240 V unit: 1,000 ft², two small-appliance and one laundry circuit, a 12 kW range. */
  private static Map<Long, List<Worksheet>> worksheets(CircuitSpec... extra) {
    List<CircuitSpec> circuits = new ArrayList<>();
    circuits.add(
        circuit(1, PhasePosition.L1_L2, load("Range", LoadCategory.COOKING, 12_000, RatingUnit.W)));
    circuits.addAll(List.of(extra));
    BoardSpec board =
        new BoardSpec(
            BOARD, "UNIT", 1, 20, 200.0, null, null, null, 10.0, 1.0, null, null, null, circuits);
    SiteSpec site =
        new SiteSpec(
            1,
            "Invented",
            new SupplySpec(
                EarthingSystem.TN_C_S,
                120.0,
                1,
                60.0,
                null,
                null,
                null,
                SupplySystem.SPLIT_PHASE_120_240),
            null,
            List.of(board),
            "NEC");
    return DwellingSite.worksheets(
        site,
        Map.of(BOARD, new DwellingInputs(1_000.0, 2, 1, false, DwellingAddition.NONE)),
        Map.of());
  }

  private static Worksheet sheet(Map<Long, List<Worksheet>> sheets, WorksheetMethod method) {
    return sheets.get(BOARD).stream().filter(s -> s.method() == method).findFirst().orElseThrow();
  }

  @Test
  void lineToLineWaterHeaterAddsToTheFeederButNothingToTheNeutral() {
    Map<Long, List<Worksheet>> without = worksheets();
    Map<Long, List<Worksheet>> with =
        worksheets(
            circuit(
                2,
                PhasePosition.L1_L2,
                load("Water heater", LoadCategory.WATER_HEATING_STORAGE, 4_500, RatingUnit.W)));

    // 220.53 (as published): fewer than four fastened-in-place appliances at 100 %
    assertThat(sheet(with, WorksheetMethod.STANDARD).resultVoltAmperes())
        .isCloseTo(
            sheet(without, WorksheetMethod.STANDARD).resultVoltAmperes() + 4_500, within(VA));
    // 220.61(A): no neutral current from a line-to-line load
    assertThat(sheet(with, WorksheetMethod.NEUTRAL).resultVoltAmperes())
        .isCloseTo(sheet(without, WorksheetMethod.NEUTRAL).resultVoltAmperes(), within(VA));
    assertThat(sheet(with, WorksheetMethod.NEUTRAL).lines())
        .anyMatch(line -> line.description().contains("line to line, no neutral current"));
  }

  @Test
  void lineToNeutralApplianceAddsItsWholeLoadToTheNeutral() {
    Map<Long, List<Worksheet>> without = worksheets();
    Map<Long, List<Worksheet>> with =
        worksheets(
            circuit(
                2,
                PhasePosition.L1,
                load("Dishwasher", LoadCategory.FIXED_APPLIANCE, 1_200, RatingUnit.VA)));

    // 220.61(A): a 120 V load is unbalanced load on the neutral at its 220.53 factor (100 % here)
    assertThat(sheet(with, WorksheetMethod.NEUTRAL).resultVoltAmperes())
        .isCloseTo(sheet(without, WorksheetMethod.NEUTRAL).resultVoltAmperes() + 1_200, within(VA));
  }

  @Test
  void ampereRatingIsTakenAtTheVoltageOfItsPosition() {
    // 120/240 V system (NEC 220.5(A) nominal voltages, from memory): 10 A on 120 V = 1,200 VA,
    // 10 A line to line on 240 V = 2,400 VA
    Map<Long, List<Worksheet>> without = worksheets();
    double base = sheet(without, WorksheetMethod.STANDARD).resultVoltAmperes();
    double onOneLine =
        sheet(
                worksheets(
                    circuit(
                        2,
                        PhasePosition.L2,
                        load("Pump", LoadCategory.FIXED_APPLIANCE, 10, RatingUnit.A))),
                WorksheetMethod.STANDARD)
            .resultVoltAmperes();
    double acrossBoth =
        sheet(
                worksheets(
                    circuit(
                        2,
                        PhasePosition.L1_L2,
                        load("Pump", LoadCategory.FIXED_APPLIANCE, 10, RatingUnit.A))),
                WorksheetMethod.STANDARD)
            .resultVoltAmperes();

    assertThat(onOneLine - base).isCloseTo(1_200.0, within(VA));
    assertThat(acrossBoth - base).isCloseTo(2_400.0, within(VA));
  }
}
