package com.wayledger.engine.dwelling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.LoadCategory;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * NEC 220.84, optional method for multifamily dwellings, against Table 220.84 and Informative Annex
 * D Example D4(b). No copy of the table or of D4(b) was at hand: every figure here is from memory
 * (NFPA 70 2020; D4(b) as in the editions since 2002, from memory) and says so.
 */
class NecMultifamilyOptionalTests {

  private static final double VA = 1e-6;

  private static ApplianceLoad load(
      String name, LoadCategory category, int quantity, double voltAmperesEach) {
    return new ApplianceLoad(name, category, quantity, voltAmperesEach, true);
  }

  /**
   * Annex D Example D4(b) unit (from memory): 840 ft², two small-appliance circuits, no laundry
   * circuit (laundry on the premises), an 8 kW range, four 1.5 kW separately controlled heaters and
   * a 2.5 kW water heater, kW taken as kVA.
   */
  private static DwellingUnit unitOfD4b(int number) {
    return new DwellingUnit(
        number,
        "Unit " + number,
        new DwellingInputs(840.0, 2, 0, false, DwellingAddition.NONE),
        List.of(
            load("Range", LoadCategory.COOKING, 1, 8_000),
            load("Heaters", LoadCategory.SPACE_HEATING, 4, 1_500),
            load("Water heater", LoadCategory.WATER_HEATING_STORAGE, 1, 2_500)));
  }

  private static List<DwellingUnit> unitsOfD4b(int count) {
    List<DwellingUnit> units = new ArrayList<>();
    for (int i = 1; i <= count; i++) {
      units.add(unitOfD4b(i));
    }
    return units;
  }

  @ParameterizedTest(name = "{0} units: {1} %")
  @CsvSource({
    // Table 220.84 (from memory): rows at their edges
    "3, 45", "5, 45", "6, 44", "7, 44", "8, 43", "10, 43", "11, 42", "12, 41", "13, 41",
    "14, 40", "15, 40", "16, 39", "17, 39", "18, 38", "20, 38", "21, 37", "22, 36", "23, 36",
    "24, 35", "25, 35", "26, 34", "27, 34", "28, 33", "30, 33", "31, 32", "32, 31", "33, 31",
    "34, 30", "36, 30", "37, 29", "38, 29", "39, 28", "42, 28", "43, 27", "45, 27", "46, 26",
    "50, 26", "51, 25", "55, 25", "56, 24", "61, 24", "62, 23", "200, 23"
  })
  void tableFactorByNumberOfUnits(int units, int percent) {
    assertThat(NecMultifamilyOptional.demandFactor(units))
        .isCloseTo(percent / 100.0, within(1e-12));
  }

  @Test
  void tableStartsAtThreeUnits() {
    assertThatThrownBy(() -> NecMultifamilyOptional.demandFactor(2))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void eachUnitOfExampleD4bConnectsTwentyTwoThousandAndTwentyVoltAmperes() {
    // D4(b) (from memory): 2,520 + 3,000 + 8,000 + 6,000 + 2,500 = 22,020 VA per unit;
    // 20 units 440,400 VA at 38 % = 167,352 VA
    Worksheet sheet = NecMultifamilyOptional.worksheet(unitsOfD4b(20), List.of());

    assertThat(sheet.line("20 units, connected load").orElseThrow().resultVoltAmperes())
        .isCloseTo(440_400.0, within(VA));
    assertThat(sheet.resultVoltAmperes()).isCloseTo(167_352.0, within(VA));
  }

  @Test
  void fortyUnitsOfExampleD4bAreTakenAtTwentyEightPercent() {
    // D4(b) (from memory): 40 × 22,020 = 880,800 VA at 28 % = 246,624 VA
    Worksheet sheet = NecMultifamilyOptional.worksheet(unitsOfD4b(40), List.of());

    assertThat(sheet.resultVoltAmperes()).isCloseTo(246_624.0, within(VA));
  }

  @Test
  void largerOfHeatingAndCoolingOnlyIsCounted() {
    // 220.84(C)(5) (from memory): the larger of the air-conditioning and space-heating loads
    List<DwellingUnit> units = new ArrayList<>(unitsOfD4b(3));
    DwellingUnit first = units.get(0);
    List<ApplianceLoad> loads = new ArrayList<>(first.loads());
    loads.add(load("Air-conditioning", LoadCategory.AIR_CONDITIONING, 1, 5_000));
    units.set(0, new DwellingUnit(first.boardId(), first.reference(), first.inputs(), loads));

    double withCooling = NecMultifamilyOptional.worksheet(units, List.of()).resultVoltAmperes();
    double without = NecMultifamilyOptional.worksheet(unitsOfD4b(3), List.of()).resultVoltAmperes();

    assertThat(withCooling)
        .as("5 kVA cooling is smaller than 6 kW heat")
        .isCloseTo(without, within(VA));
  }

  @Test
  void houseLoadsAreAddedAtNameplateAfterTheFactor() {
    // 220.84(B) (from memory): house loads calculated separately and added
    double without = NecMultifamilyOptional.worksheet(unitsOfD4b(3), List.of()).resultVoltAmperes();
    double with =
        NecMultifamilyOptional.worksheet(
                unitsOfD4b(3), List.of(load("Corridor lights", LoadCategory.LIGHTING, 10, 100)))
            .resultVoltAmperes();

    assertThat(with - without).isCloseTo(1_000.0, within(VA));
  }

  @Test
  void unitWithoutElectricCookingIsNotAssessedWithTheReason() {
    List<DwellingUnit> units = new ArrayList<>(unitsOfD4b(3));
    DwellingUnit first = units.get(0);
    units.set(
        0,
        new DwellingUnit(
            first.boardId(),
            first.reference(),
            first.inputs(),
            first.loads().stream().filter(l -> l.category() != LoadCategory.COOKING).toList()));

    Worksheet sheet = NecMultifamilyOptional.worksheet(units, List.of());

    assertThat(sheet.resultVoltAmperes()).isNull();
    assertThat(sheet.notAssessed())
        .anyMatch(r -> r.contains("Unit 1") && r.contains("220.84(A)(2)"));
  }

  @Test
  void missingFloorAreaIsNotAssessedNeverAPass() {
    List<DwellingUnit> units = new ArrayList<>(unitsOfD4b(3));
    DwellingUnit first = units.get(0);
    units.set(
        0,
        new DwellingUnit(
            first.boardId(),
            first.reference(),
            new DwellingInputs(null, 2, 0, false, DwellingAddition.NONE),
            first.loads()));

    Worksheet sheet = NecMultifamilyOptional.worksheet(units, List.of());

    assertThat(sheet.isAssessed()).isFalse();
    assertThat(sheet.notAssessed()).anyMatch(r -> r.contains("missing floor area"));
  }

  @Test
  void twoUnitsAreOutsideTheMethod() {
    Worksheet sheet = NecMultifamilyOptional.worksheet(unitsOfD4b(2), List.of());

    assertThat(sheet.isAssessed()).isFalse();
    assertThat(sheet.notAssessed()).anyMatch(r -> r.contains("three or more"));
  }
}
