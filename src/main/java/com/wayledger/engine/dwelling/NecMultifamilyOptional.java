package com.wayledger.engine.dwelling;

import static com.wayledger.engine.dwelling.Lines.whole;

import com.wayledger.engine.LoadCategory;
import java.util.ArrayList;
import java.util.List;

/**
 * NEC 220.84, the optional method for a multifamily dwelling of three or more units: the connected
 * load of every unit (220.84(C)) summed and multiplied by the Table 220.84 factor for the number of
 * units, the house load added at nameplate (220.84(B) says calculated by Part III; taken at 100 %
 * here, the safe side, and named). Table 220.84 and the wording of 220.84(A) and (C) are from
 * memory (NFPA 70 2020); see docs/calculations/nec-dwelling.md.
 */
public final class NecMultifamilyOptional {

  /** 220.84(A): the method applies to three or more dwelling units. */
  public static final int MINIMUM_UNITS = 3;

  /**
   * Table 220.84 (from memory): the least number of units of each row and its demand factor; a row
   * holds up to the next row's least number less one.
   */
  private static final int[][] TABLE_220_84 = {
    {3, 45}, {6, 44}, {8, 43}, {11, 42}, {12, 41}, {14, 40}, {16, 39}, {18, 38}, {21, 37},
    {22, 36}, {24, 35}, {26, 34}, {28, 33}, {31, 32}, {32, 31}, {34, 30}, {37, 29}, {39, 28},
    {43, 27}, {46, 26}, {51, 25}, {56, 24}, {62, 23}
  };

  private NecMultifamilyOptional() {}

  /**
   * The Table 220.84 demand factor for a number of units, as a fraction (45 % → 0.45).
   *
   * @throws IllegalArgumentException for fewer than three units (the table starts at 3)
   */
  public static double demandFactor(int units) {
    if (units < MINIMUM_UNITS) {
      throw new IllegalArgumentException("Table 220.84 starts at 3 units, not " + units);
    }
    int percent = TABLE_220_84[0][1];
    for (int[] row : TABLE_220_84) {
      if (units >= row[0]) {
        percent = row[1];
      }
    }
    return percent / 100.0;
  }

  /**
   * The 220.84 worksheet of a board feeding {@code units}; "not assessed" with the reason when
   * there are fewer than three, when a unit lacks an input, or when a unit has no electric cooking
   * or no electric heating or air-conditioning (220.84(A)(2), (3)).
   */
  public static Worksheet worksheet(List<DwellingUnit> units, List<ApplianceLoad> houseLoads) {
    Lines w = new Lines();
    if (units.size() < MINIMUM_UNITS) {
      w.notAssessed.add(
          "not assessed — 220.84 applies to three or more dwelling units; this panelboard feeds "
              + units.size());
      return w.sheet(WorksheetMethod.MULTIFAMILY_OPTIONAL, null);
    }
    List<String> noCooking = new ArrayList<>();
    List<String> noHeatingOrCooling = new ArrayList<>();
    for (DwellingUnit unit : units) {
      List<String> missing = unit.inputs().missingForGeneralLoad();
      if (!missing.isEmpty()) {
        w.notAssessed.add(
            "not assessed — " + unit.reference() + ": missing " + String.join(", ", missing));
      }
      if (!has(unit, LoadCategory.COOKING)) {
        noCooking.add(unit.reference());
      }
      if (!has(unit, LoadCategory.SPACE_HEATING) && !has(unit, LoadCategory.AIR_CONDITIONING)) {
        noHeatingOrCooling.add(unit.reference());
      }
    }
    if (!noCooking.isEmpty()) {
      w.notAssessed.add(
          "not assessed — no electric cooking equipment in "
              + String.join(", ", noCooking)
              + " (220.84(A)(2); its exception is not worked)");
    }
    if (!noHeatingOrCooling.isEmpty()) {
      w.notAssessed.add(
          "not assessed — neither electric space heating nor air-conditioning in "
              + String.join(", ", noHeatingOrCooling)
              + " (220.84(A)(3))");
    }
    if (!w.notAssessed.isEmpty()) {
      return w.sheet(WorksheetMethod.MULTIFAMILY_OPTIONAL, null);
    }
    double connected = 0;
    for (DwellingUnit unit : units) {
      connected += unitConnectedLoad(unit, w);
    }
    w.total(units.size() + " units, connected load", "220.84(C)", connected);
    double factor = demandFactor(units.size());
    double demand =
        w.add(
            "Table 220.84, " + units.size() + " units at " + whole(factor * 100) + " %",
            "Table 220.84",
            connected,
            factor);
    for (ApplianceLoad house : houseLoads) {
      demand += w.add("House load: " + house.description(), "220.84(B)", house.voltAmperes(), 1.0);
      w.assume("House loads are taken at nameplate (100 %), not reduced by Part III.");
    }
    w.total("Calculated load, multifamily optional method", "220.84", demand);
    w.assume(
        "220.84(A)(1): no dwelling unit supplied by more than one feeder is a condition of the"
            + " method, not checked here.");
    w.assume(
        "Table 220.84 factors are from memory (NFPA 70 2020); check them against the current"
            + " edition.");
    return w.sheet(WorksheetMethod.MULTIFAMILY_OPTIONAL, demand);
  }

  /** One unit's 220.84(C) connected load, its lines added to the worksheet. */
  private static double unitConnectedLoad(DwellingUnit unit, Lines w) {
    DwellingInputs in = unit.inputs();
    String who = unit.reference() + ": ";
    double total =
        w.add(
            who + "general lighting, " + whole(in.floorAreaSquareFeet()) + " ft² at 3 VA/ft²",
            "220.84(C)(1)",
            in.floorAreaSquareFeet() * NecDwellingCalculator.LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT,
            1.0);
    int circuits = in.smallApplianceCircuits() + in.laundryCircuits();
    total +=
        w.add(
            who + "small-appliance and laundry circuits, " + circuits + " at 1,500 VA",
            "220.84(C)(2)",
            circuits * NecDwellingCalculator.APPLIANCE_CIRCUIT_VOLT_AMPERES,
            1.0);
    List<ApplianceLoad> heating = new ArrayList<>();
    List<ApplianceLoad> cooling = new ArrayList<>();
    for (ApplianceLoad load : unit.loads()) {
      switch (load.category()) {
        case LIGHTING, SOCKET_OUTLETS -> {
          // covered by the unit loads of (C)(1) and (C)(2)
        }
        case SPACE_HEATING -> heating.add(load);
        case AIR_CONDITIONING -> cooling.add(load);
        case MOTOR ->
            total +=
                w.add(
                    who + load.description() + " at nameplate",
                    "220.84(C)(4)",
                    load.voltAmperes(),
                    1.0);
        default ->
            total +=
                w.add(
                    who + load.description() + " at nameplate",
                    "220.84(C)(3)",
                    load.voltAmperes(),
                    1.0);
      }
    }
    double heat = heating.stream().mapToDouble(ApplianceLoad::voltAmperes).sum();
    double cool = cooling.stream().mapToDouble(ApplianceLoad::voltAmperes).sum();
    boolean heatLarger = heat >= cool;
    total +=
        w.add(
            who + "space heating" + (heatLarger ? "" : ": smaller, omitted"),
            "220.84(C)(5)",
            heat,
            heatLarger ? 1.0 : 0.0);
    total +=
        w.add(
            who + "air-conditioning" + (heatLarger ? ": smaller, omitted" : ""),
            "220.84(C)(5)",
            cool,
            heatLarger ? 0.0 : 1.0);
    return total;
  }

  private static boolean has(DwellingUnit unit, LoadCategory category) {
    return unit.loads().stream().anyMatch(l -> l.category() == category && l.voltAmperes() > 0);
  }
}
