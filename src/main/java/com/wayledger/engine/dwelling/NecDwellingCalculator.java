package com.wayledger.engine.dwelling;

import static com.wayledger.engine.dwelling.Lines.figure;
import static com.wayledger.engine.dwelling.Lines.whole;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.demand.NecCookingDemand;
import com.wayledger.engine.demand.NecDryerDemand;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The Article 220 dwelling calculations, each worked line by line. Section numbers and values
 * follow NFPA 70, 2020 edition (the 2023 edition moved the dwelling unit load to 220.14(J) and
 * 220.41 and Table 220.42 to Table 220.45 — from memory); see docs/calculations/nec-dwelling.md for
 * the provenance of every figure.
 */
public final class NecDwellingCalculator {

  /** The edition whose numbering and values the worksheets follow. */
  public static final String EDITION = "NFPA 70 (NEC) 2020";

  /** General lighting unit load of a dwelling unit, VA/ft² (Table 220.12). */
  public static final double LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT = 3.0;

  /** Load of each small-appliance and laundry branch circuit, VA (220.52(A), (B)). */
  public static final double APPLIANCE_CIRCUIT_VOLT_AMPERES = 1_500.0;

  /** Table 220.42, dwelling units: first band, VA at 100 %. */
  public static final double LIGHTING_FIRST_BAND_VOLT_AMPERES = 3_000.0;

  /** Table 220.42, dwelling units: upper edge of the 35 % band, VA. */
  public static final double LIGHTING_SECOND_BAND_TOP_VOLT_AMPERES = 120_000.0;

  public static final double LIGHTING_SECOND_BAND_FACTOR = 0.35;
  public static final double LIGHTING_REMAINDER_FACTOR = 0.25;

  /** 220.53: four or more fastened-in-place appliances at 75 %. */
  public static final int FASTENED_APPLIANCES_FOR_DEMAND_FACTOR = 4;

  public static final double FASTENED_APPLIANCE_FACTOR = 0.75;

  /** 220.57: each EV supply equipment at 7,200 W or its nameplate, if larger (from memory). */
  public static final double EV_MINIMUM_VOLT_AMPERES = 7_200.0;

  /** 220.61(B)(1): ranges, ovens, cooking units and dryers on the neutral at 70 %. */
  public static final double NEUTRAL_COOKING_AND_DRYER_FACTOR = 0.70;

  /** 220.61(B)(2): neutral current above 200 A at 70 %. */
  public static final double NEUTRAL_FULL_AMPS = 200.0;

  public static final double NEUTRAL_EXCESS_FACTOR = 0.70;

  /** 220.82(B): first 10 kVA of the general load at 100 %, the remainder at 40 %. */
  public static final double OPTIONAL_FIRST_VOLT_AMPERES = 10_000.0;

  public static final double OPTIONAL_REMAINDER_FACTOR = 0.40;

  /** 220.82(C)(5): fewer than four separately controlled heating units at 65 %. */
  public static final double OPTIONAL_FEW_HEATERS_FACTOR = 0.65;

  /** 220.82(C)(6): four or more separately controlled heating units at 40 %. */
  public static final double OPTIONAL_MANY_HEATERS_FACTOR = 0.40;

  /** 220.83: first 8 kVA at 100 %, the remainder at 40 %. */
  public static final double ADDITION_FIRST_VOLT_AMPERES = 8_000.0;

  public static final double ADDITION_REMAINDER_FACTOR = 0.40;

  /** 220.87: recorded maximum demand at 125 %. */
  public static final double MEASURED_DEMAND_FACTOR = 1.25;

  /** 220.87(1): a year of maximum demand data; exception: at least 30 days, 15-minute demand. */
  public static final long MEASURED_YEAR_DAYS = 365;

  public static final long MEASURED_EXCEPTION_DAYS = 30;
  public static final int MEASURED_EXCEPTION_INTERVAL_MINUTES = 15;

  private static final Set<LoadCategory> UNIT_LOAD_CATEGORIES =
      EnumSet.of(LoadCategory.LIGHTING, LoadCategory.SOCKET_OUTLETS);
  private static final Set<LoadCategory> FASTENED =
      EnumSet.of(
          LoadCategory.FIXED_APPLIANCE,
          LoadCategory.WATER_HEATING_INSTANTANEOUS,
          LoadCategory.WATER_HEATING_STORAGE);
  private static final Set<LoadCategory> HEATING_AND_COOLING =
      EnumSet.of(LoadCategory.SPACE_HEATING, LoadCategory.AIR_CONDITIONING);

  private NecDwellingCalculator() {}

  /**
   * Every worksheet that applies to a board: for one dwelling unit on its own board the standard
   * method, its neutral, and the optional method and the addition method when the inputs ask for
   * them; for a board feeding several dwelling units the standard method and neutral over all of
   * them plus the board's own (house) loads; the 220.87 existing load whenever maximum demand is
   * recorded.
   *
   * @param units the dwelling units the board serves (its own, or those of the boards below it)
   * @param houseLoads loads of a board feeding several units that are not in any unit; at nameplate
   * @param records maximum demands recorded for the board
   * @param ratingVoltAmperes the board's incomer rating as apparent power (In × the dividing
   *     voltage); null when no rating is recorded
   * @param dividingVolts the voltage that turns VA into line amperes: 240 V for 120/240 V
   *     single-phase three-wire, 360 V (√3 × 208 V) for 208Y/120 V
   */
  public static List<Worksheet> worksheets(
      List<DwellingUnit> units,
      List<ApplianceLoad> houseLoads,
      List<MeasuredMaximumDemand> records,
      Double ratingVoltAmperes,
      double dividingVolts) {
    List<Worksheet> sheets = new ArrayList<>();
    if (!units.isEmpty()) {
      Standard standard = standard(units, houseLoads);
      sheets.add(standard.sheet);
      sheets.add(neutral(standard, units, houseLoads, dividingVolts));
      if (units.size() >= NecMultifamilyOptional.MINIMUM_UNITS) {
        sheets.add(NecMultifamilyOptional.worksheet(units, houseLoads));
      }
      if (units.size() == 1 && houseLoads.isEmpty()) {
        DwellingUnit unit = units.get(0);
        if (unit.inputs().optionalMethod()) {
          sheets.add(optional(unit));
        }
        if (unit.inputs().addition() != DwellingAddition.NONE) {
          sheets.add(addition(unit));
        }
      }
    }
    if (!records.isEmpty()) {
      sheets.add(measured(records, ratingVoltAmperes));
    }
    return sheets;
  }

  // ---------------------------------------------------------------- standard method

  /** The standard method's worksheet and the parts the neutral calculation reuses. */
  record Standard(
      Worksheet sheet,
      double netGeneralVoltAmperes,
      double cookingVoltAmperes,
      double dryerVoltAmperes,
      double fastenedFactor,
      LoadCategory heatingOrCooling,
      double motorAllowanceVoltAmperes) {}

  /** Part III standard method over one or more dwelling units and any house loads. */
  public static Worksheet standardMethod(List<DwellingUnit> units, List<ApplianceLoad> houseLoads) {
    return standard(units, houseLoads).sheet;
  }

  static Standard standard(List<DwellingUnit> units, List<ApplianceLoad> houseLoads) {
    Lines w = new Lines();
    List<ApplianceLoad> loads = new ArrayList<>();
    units.forEach(unit -> loads.addAll(unit.loads()));
    double net = generalLoad(units, w);
    double total = net;
    double cooking = cooking(of(loads, EnumSet.of(LoadCategory.COOKING)), w);
    total += cooking;
    double dryers = dryers(of(loads, EnumSet.of(LoadCategory.CLOTHES_DRYER)), w);
    total += dryers;
    List<ApplianceLoad> fastened = of(loads, FASTENED);
    double fastenedFactor = fastenedFactor(fastened);
    total += fastened(fastened, fastenedFactor, w);
    LoadCategory larger = heatingOrCooling(loads, w);
    total += largerOfHeatingAndCooling(loads, larger);
    double[] motors = motors(of(loads, EnumSet.of(LoadCategory.MOTOR)), w);
    total += motors[0] + motors[1];
    total += others(loads, w);
    for (ApplianceLoad house : houseLoads) {
      if (!UNIT_LOAD_CATEGORIES.contains(house.category())) {
        total += w.add("House load: " + house.description(), "220.40", house.voltAmperes(), 1.0);
        w.assume("House loads are taken at nameplate (100 %).");
      }
    }
    if (houseLoads.stream().anyMatch(l -> UNIT_LOAD_CATEGORIES.contains(l.category()))) {
      double houseLighting =
          of(houseLoads, UNIT_LOAD_CATEGORIES).stream()
              .mapToDouble(ApplianceLoad::voltAmperes)
              .sum();
      total += w.add("House lighting and receptacle loads", "220.40", houseLighting, 1.0);
    }
    w.total("Net calculated load", "220.40", total);
    return new Standard(
        w.sheet(WorksheetMethod.STANDARD, total),
        net,
        cooking,
        dryers,
        fastenedFactor,
        larger,
        motors[1]);
  }

  /** 220.12, 220.52 and Table 220.42; returns the net general lighting and appliance load. */
  private static double generalLoad(List<DwellingUnit> units, Lines w) {
    double area = 0;
    int smallAppliance = 0;
    int laundry = 0;
    for (DwellingUnit unit : units) {
      List<String> missing = unit.inputs().missingForGeneralLoad();
      if (!missing.isEmpty()) {
        w.notAssessed.add(
            "not assessed — " + unit.reference() + ": missing " + String.join(", ", missing));
        continue;
      }
      area += unit.inputs().floorAreaSquareFeet();
      smallAppliance += unit.inputs().smallApplianceCircuits();
      laundry += unit.inputs().laundryCircuits();
    }
    String units1 = units.size() == 1 ? "" : units.size() + " units, ";
    double lighting =
        w.add(
            "General lighting: "
                + units1
                + whole(area)
                + " ft² at "
                + figure(LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT)
                + " VA/ft²",
            "220.12, Table 220.12",
            area * LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT,
            1.0);
    double appliance =
        w.add(
            "Small-appliance branch circuits: " + smallAppliance + " at 1,500 VA",
            "220.52(A)",
            smallAppliance * APPLIANCE_CIRCUIT_VOLT_AMPERES,
            1.0);
    double laundryLoad =
        w.add(
            "Laundry branch circuits: " + laundry + " at 1,500 VA",
            "220.52(B)",
            laundry * APPLIANCE_CIRCUIT_VOLT_AMPERES,
            1.0);
    double connected = lighting + appliance + laundryLoad;
    w.total("General lighting and appliance circuits", "220.52", connected);
    double net = lightingDemand(connected, w);
    w.total("Net general lighting and appliance-circuit load", "Table 220.42", net);
    return net;
  }

  /** Table 220.42 (dwelling units) applied to a connected load, each band on its own line. */
  static double lightingDemand(double connected, Lines w) {
    double first = Math.min(connected, LIGHTING_FIRST_BAND_VOLT_AMPERES);
    double second =
        Math.max(
            0.0,
            Math.min(connected, LIGHTING_SECOND_BAND_TOP_VOLT_AMPERES)
                - LIGHTING_FIRST_BAND_VOLT_AMPERES);
    double remainder = Math.max(0.0, connected - LIGHTING_SECOND_BAND_TOP_VOLT_AMPERES);
    double net = w.add("First 3,000 VA at 100 %", "Table 220.42", first, 1.0);
    if (second > 0) {
      net +=
          w.add("3,001 to 120,000 VA at 35 %", "Table 220.42", second, LIGHTING_SECOND_BAND_FACTOR);
    }
    if (remainder > 0) {
      net += w.add("Over 120,000 VA at 25 %", "Table 220.42", remainder, LIGHTING_REMAINDER_FACTOR);
    }
    return net;
  }

  /** Table 220.42 for dwelling units as a plain function: demand of a connected load, VA. */
  public static double lightingDemandVoltAmperes(double connectedVoltAmperes) {
    return lightingDemand(connectedVoltAmperes, new Lines());
  }

  /** 220.55 and Table 220.55 with Notes 1–3; returns the cooking demand, VA. */
  private static double cooking(List<ApplianceLoad> cooking, Lines w) {
    if (cooking.isEmpty()) {
      return 0.0;
    }
    int countA = 0;
    int countB = 0;
    int countC = 0;
    double connectedA = 0;
    double connectedB = 0;
    double connectedC = 0;
    double ratingSumC = 0;
    double total = 0;
    for (ApplianceLoad load : cooking) {
      double kilowatts = load.voltAmperesEach() / 1000.0;
      switch (NecCookingDemand.columnOf(kilowatts)) {
        case 'A' -> {
          countA += load.quantity();
          connectedA += load.voltAmperes();
        }
        case 'B' -> {
          countB += load.quantity();
          connectedB += load.voltAmperes();
        }
        case 'C' -> {
          countC += load.quantity();
          connectedC += load.voltAmperes();
          ratingSumC +=
              Math.max(NecCookingDemand.COLUMN_C_BASE_KILOWATTS, kilowatts) * load.quantity();
        }
        default ->
            total +=
                w.add(
                    load.description() + ": over 27 kW, outside Table 220.55, at nameplate",
                    "220.55",
                    load.voltAmperes(),
                    1.0);
      }
    }
    if (countA > 0) {
      total +=
          w.add(
              "Cooking appliances under 3½ kW: " + countA + ", Column A",
              "Table 220.55, Note 3",
              connectedA,
              NecCookingDemand.columnAFactor(countA));
    }
    if (countB > 0) {
      total +=
          w.add(
              "Cooking appliances 3½ to 8¾ kW: " + countB + ", Column B",
              "Table 220.55, Note 3",
              connectedB,
              NecCookingDemand.columnBFactor(countB));
    }
    if (countC > 0) {
      double average = ratingSumC / countC;
      double base = NecCookingDemand.columnCKilowatts(countC) * 1000.0;
      double raised = NecCookingDemand.columnCKilowatts(countC, average) * 1000.0;
      String ranges = countC == 1 ? "1 range" : countC + " ranges";
      w.add(
          "Ranges over 8¾ kW: "
              + ranges
              + ", "
              + whole(connectedC)
              + " VA nameplate; Column C maximum demand",
          "Table 220.55, Column C",
          base,
          1.0);
      if (raised > base) {
        total +=
            w.add(
                "Rating (average, under 12 kW counted as 12 kW) "
                    + figure(average)
                    + " kW: + 5 % per kW or major fraction over 12 kW",
                countC == 1 ? "Table 220.55, Note 1" : "Table 220.55, Note 2",
                base,
                raised / base);
      } else {
        total += base;
      }
    }
    w.total("Cooking appliance demand", "220.55", total);
    return total;
  }

  /** 220.54 and Table 220.54; returns the dryer demand, VA. */
  private static double dryers(List<ApplianceLoad> dryers, Lines w) {
    if (dryers.isEmpty()) {
      return 0.0;
    }
    int count = 0;
    double taken = 0;
    for (ApplianceLoad dryer : dryers) {
      double each = NecDryerDemand.loadPerDryerVoltAmperes(dryer.voltAmperesEach());
      String why =
          each > dryer.voltAmperesEach()
              ? " (nameplate " + whole(dryer.voltAmperesEach()) + " VA, raised to 5,000 VA)"
              : "";
      w.add(
          dryer.description() + ": " + dryer.quantity() + " × " + whole(each) + " VA" + why,
          "220.54",
          each * dryer.quantity(),
          1.0);
      count += dryer.quantity();
      taken += each * dryer.quantity();
    }
    return w.add(
        "Clothes dryers: " + count + ", demand factor",
        "Table 220.54",
        taken,
        NecDryerDemand.factor(count));
  }

  private static double fastenedFactor(List<ApplianceLoad> fastened) {
    int count = fastened.stream().mapToInt(ApplianceLoad::quantity).sum();
    return count >= FASTENED_APPLIANCES_FOR_DEMAND_FACTOR ? FASTENED_APPLIANCE_FACTOR : 1.0;
  }

  /** 220.53; returns the fastened-in-place appliance demand, VA. */
  private static double fastened(List<ApplianceLoad> fastened, double factor, Lines w) {
    if (fastened.isEmpty()) {
      return 0.0;
    }
    int count = fastened.stream().mapToInt(ApplianceLoad::quantity).sum();
    double connected = fastened.stream().mapToDouble(ApplianceLoad::voltAmperes).sum();
    for (ApplianceLoad load : fastened) {
      w.note(load.description() + ": " + whole(load.voltAmperes()) + " VA", "220.53");
    }
    return w.add(
        "Fastened-in-place appliances: "
            + count
            + (factor < 1.0 ? " (four or more)" : " (fewer than four)"),
        "220.53",
        connected,
        factor);
  }

  /** 220.60: which of heating and cooling counts; writes both lines. */
  private static LoadCategory heatingOrCooling(List<ApplianceLoad> loads, Lines w) {
    double heating = sum(loads, LoadCategory.SPACE_HEATING);
    double cooling = sum(loads, LoadCategory.AIR_CONDITIONING);
    if (heating == 0 && cooling == 0) {
      return null;
    }
    LoadCategory larger =
        heating >= cooling ? LoadCategory.SPACE_HEATING : LoadCategory.AIR_CONDITIONING;
    w.add(
        "Fixed electric space heating"
            + (larger == LoadCategory.SPACE_HEATING ? "" : ": smaller, omitted"),
        "220.51, 220.60",
        heating,
        larger == LoadCategory.SPACE_HEATING ? 1.0 : 0.0);
    w.add(
        "Air-conditioning" + (larger == LoadCategory.AIR_CONDITIONING ? "" : ": smaller, omitted"),
        "220.60",
        cooling,
        larger == LoadCategory.AIR_CONDITIONING ? 1.0 : 0.0);
    return larger;
  }

  private static double largerOfHeatingAndCooling(List<ApplianceLoad> loads, LoadCategory larger) {
    return larger == null ? 0.0 : sum(loads, larger);
  }

  /** 220.50 and 430.24: motors at 100 % plus 25 % of the largest; returns {motors, allowance}. */
  private static double[] motors(List<ApplianceLoad> motors, Lines w) {
    if (motors.isEmpty()) {
      return new double[] {0.0, 0.0};
    }
    double connected = motors.stream().mapToDouble(ApplianceLoad::voltAmperes).sum();
    double largest = motors.stream().mapToDouble(ApplianceLoad::voltAmperesEach).max().orElse(0);
    double all = w.add("Motors at nameplate", "220.50", connected, 1.0);
    double allowance = w.add("25 % of the largest motor", "430.24", largest, 0.25);
    return new double[] {all, allowance};
  }

  /** EV supply equipment (220.57), and loads of no Article 220 category at nameplate. */
  private static double others(List<ApplianceLoad> loads, Lines w) {
    double total = 0;
    for (ApplianceLoad load : loads) {
      switch (load.category()) {
        case EV_CHARGING -> {
          double each = Math.max(EV_MINIMUM_VOLT_AMPERES, load.voltAmperesEach());
          total +=
              w.add(
                  load.description() + ": " + load.quantity() + " × " + whole(each) + " VA",
                  "220.57",
                  each * load.quantity(),
                  1.0);
        }
        case IT_SMALL_POWER, OTHER -> {
          total += w.add(load.description() + " at nameplate", "220.40", load.voltAmperes(), 1.0);
          w.assume("Loads of no Article 220 category are taken at nameplate (100 %).");
        }
        case LIGHTING, SOCKET_OUTLETS ->
            w.assume(
                "Lighting and receptacle load lines on the panelboard are covered by the unit load of"
                    + " 220.12 and 220.52 and not added.");
        default -> {}
      }
    }
    return total;
  }

  // ---------------------------------------------------------------- neutral

  /** 220.61: the feeder or service neutral load after the standard method. */
  static Worksheet neutral(
      Standard standard, List<DwellingUnit> units, List<ApplianceLoad> houseLoads, double volts) {
    Lines w = new Lines();
    w.notAssessed.addAll(standard.sheet.notAssessed());
    List<ApplianceLoad> loads = new ArrayList<>();
    units.forEach(unit -> loads.addAll(unit.loads()));
    double total =
        w.add(
            "Net general lighting and appliance-circuit load",
            "220.61(A)",
            standard.netGeneralVoltAmperes,
            1.0);
    if (standard.cookingVoltAmperes > 0) {
      total +=
          w.add(
              "Cooking appliance demand at 70 %",
              "220.61(B)(1)", standard.cookingVoltAmperes, NEUTRAL_COOKING_AND_DRYER_FACTOR);
    }
    if (standard.dryerVoltAmperes > 0) {
      total +=
          w.add(
              "Clothes dryer demand at 70 %",
              "220.61(B)(1)", standard.dryerVoltAmperes, NEUTRAL_COOKING_AND_DRYER_FACTOR);
    }
    for (ApplianceLoad load : loads) {
      LoadCategory category = load.category();
      double factor;
      if (FASTENED.contains(category)) {
        factor = standard.fastenedFactor;
      } else if (HEATING_AND_COOLING.contains(category)) {
        factor = category == standard.heatingOrCooling ? 1.0 : 0.0;
      } else if (category == LoadCategory.MOTOR
          || category == LoadCategory.IT_SMALL_POWER
          || category == LoadCategory.OTHER) {
        factor = 1.0;
      } else if (category == LoadCategory.EV_CHARGING) {
        factor = Math.max(EV_MINIMUM_VOLT_AMPERES, load.voltAmperesEach()) / load.voltAmperesEach();
      } else {
        continue;
      }
      if (factor == 0.0) {
        continue;
      }
      if (load.lineToLine()) {
        w.add(
            load.description() + ": line to line, no neutral current",
            "220.61(A)",
            load.voltAmperes(),
            0.0);
      } else {
        total += w.add(load.description(), "220.61(A)", load.voltAmperes(), factor);
        w.assume(
            "Loads not recorded as line to line (two-pole) are counted on the neutral (the safe"
                + " side where the connection is not recorded).");
      }
    }
    if (standard.motorAllowanceVoltAmperes > 0) {
      total +=
          w.add("25 % of the largest motor", "430.24", standard.motorAllowanceVoltAmperes, 1.0);
    }
    for (ApplianceLoad house : houseLoads) {
      if (house.lineToLine()) {
        w.add(
            "House load: " + house.description() + ": line to line, no neutral current",
            "220.61(A)",
            house.voltAmperes(),
            0.0);
        continue;
      }
      total += w.add("House load: " + house.description(), "220.61(A)", house.voltAmperes(), 1.0);
    }
    w.total("Neutral load", "220.61", total);
    double amps = total / volts;
    w.lines.add(
        new WorkingLine(
            "Neutral current at " + figure(volts) + " V: " + figure(amps) + " A",
            "220.61",
            null,
            null,
            null,
            false));
    double result = total;
    if (amps > NEUTRAL_FULL_AMPS) {
      double reducedAmps = NEUTRAL_FULL_AMPS + NEUTRAL_EXCESS_FACTOR * (amps - NEUTRAL_FULL_AMPS);
      w.add("First 200 A at 100 %", "220.61(B)(2)", NEUTRAL_FULL_AMPS * volts, 1.0);
      w.add(
          "Above 200 A at 70 %",
          "220.61(B)(2)", (amps - NEUTRAL_FULL_AMPS) * volts, NEUTRAL_EXCESS_FACTOR);
      result =
          w.total(
              "Neutral load after 220.61(B)(2): " + figure(reducedAmps) + " A",
              "220.61(B)(2)",
              reducedAmps * volts);
      w.assume("220.61(B)(2) reduction applied; it does not apply to nonlinear loads (220.61(C)).");
    }
    return w.sheet(WorksheetMethod.NEUTRAL, result);
  }

  // ---------------------------------------------------------------- optional method

  /** 220.82: general load 10 kVA at 100 % and the rest at 40 %, plus heating or cooling. */
  public static Worksheet optional(DwellingUnit unit) {
    Lines w = new Lines();
    double general = unitLoads(unit, w, "220.82(B)");
    for (ApplianceLoad load : unit.loads()) {
      if (UNIT_LOAD_CATEGORIES.contains(load.category())
          || HEATING_AND_COOLING.contains(load.category())) {
        continue;
      }
      general += w.add(load.description() + " at nameplate", "220.82(B)", load.voltAmperes(), 1.0);
    }
    w.total("General load", "220.82(B)", general);
    double demand =
        w.add(
            "First 10 kVA at 100 %",
            "220.82(B)", Math.min(general, OPTIONAL_FIRST_VOLT_AMPERES), 1.0);
    demand +=
        w.add(
            "Remainder at 40 %",
            "220.82(B)",
            Math.max(0.0, general - OPTIONAL_FIRST_VOLT_AMPERES),
            OPTIONAL_REMAINDER_FACTOR);
    double cooling = sum(unit.loads(), LoadCategory.AIR_CONDITIONING);
    double heating = sum(unit.loads(), LoadCategory.SPACE_HEATING);
    int heaters =
        unit.loads().stream()
            .filter(l -> l.category() == LoadCategory.SPACE_HEATING)
            .mapToInt(ApplianceLoad::quantity)
            .sum();
    double heatingFactor =
        heaters >= 4 ? OPTIONAL_MANY_HEATERS_FACTOR : OPTIONAL_FEW_HEATERS_FACTOR;
    double cool = cooling;
    double heat = heating * heatingFactor;
    boolean coolingLarger = cool > heat;
    w.add(
        "Air-conditioning at 100 %" + (coolingLarger || cool == 0 ? "" : ": smaller, omitted"),
        "220.82(C)(1)",
        cooling,
        coolingLarger ? 1.0 : 0.0);
    w.add(
        "Space heating, "
            + heaters
            + (heaters >= 4
                ? " separately controlled units (four or more)"
                : " units (fewer than four)")
            + (coolingLarger ? ": smaller, omitted" : ""),
        heaters >= 4 ? "220.82(C)(6)" : "220.82(C)(5)",
        heating,
        coolingLarger ? 0.0 : heatingFactor);
    if (heating > 0) {
      w.assume(
          "Space-heating units are taken as separately controlled; heat pumps and central heating"
              + " (220.82(C)(2)–(4)) are not distinguished.");
    }
    demand += Math.max(cool, heat);
    w.total("Calculated load, optional method", "220.82", demand);
    w.assume(
        "220.82(A): one set of 120/240 V or 208Y/120 V three-wire conductors of 100 A or more"
            + " supplying the whole dwelling is a condition of the method, not checked here.");
    return w.sheet(WorksheetMethod.OPTIONAL, demand);
  }

  // ---------------------------------------------------------------- additions (220.83)

  /** 220.83: an existing dwelling unit with loads added, (A) or (B) as its inputs say. */
  public static Worksheet addition(DwellingUnit unit) {
    Lines w = new Lines();
    boolean withHvac = unit.inputs().addition() == DwellingAddition.WITH_HEATING_OR_COOLING;
    String clause = withHvac ? "220.83(B)" : "220.83(A)";
    double other = unitLoads(unit, w, clause);
    int heaters =
        unit.loads().stream()
            .filter(l -> l.category() == LoadCategory.SPACE_HEATING)
            .mapToInt(ApplianceLoad::quantity)
            .sum();
    double fullHvac = 0;
    for (ApplianceLoad load : unit.loads()) {
      LoadCategory category = load.category();
      if (UNIT_LOAD_CATEGORIES.contains(category)) {
        continue;
      }
      boolean hvacAtFull =
          category == LoadCategory.AIR_CONDITIONING
              || (category == LoadCategory.SPACE_HEATING && (heaters < 4 || !withHvac));
      if (hvacAtFull) {
        fullHvac += load.voltAmperes();
        continue;
      }
      other += w.add(load.description() + " at nameplate", clause, load.voltAmperes(), 1.0);
    }
    w.total("Other loads", clause, other);
    double demand =
        w.add("First 8 kVA at 100 %", clause, Math.min(other, ADDITION_FIRST_VOLT_AMPERES), 1.0);
    demand +=
        w.add(
            "Remainder at 40 %",
            clause, Math.max(0.0, other - ADDITION_FIRST_VOLT_AMPERES), ADDITION_REMAINDER_FACTOR);
    if (fullHvac > 0) {
      demand +=
          w.add(
              withHvac
                  ? "Air-conditioning and space heating at 100 %"
                  : "Existing air-conditioning and space heating at 100 %",
              clause,
              fullHvac,
              1.0);
      if (!withHvac) {
        w.assume(
            "220.83(A) lists no heating or cooling: existing heating and air-conditioning are"
                + " added at 100 % (the safe side).");
      } else {
        w.assume(
            "Heating and air-conditioning are both counted at 100 %; 220.60 is not applied here"
                + " (the safe side).");
      }
    }
    w.total("Calculated load, existing dwelling with addition", "220.83", demand);
    return w.sheet(WorksheetMethod.ADDITION, demand);
  }

  /** General lighting and small-appliance and laundry circuits at their unit loads, summed. */
  private static double unitLoads(DwellingUnit unit, Lines w, String clause) {
    List<String> missing = unit.inputs().missingForGeneralLoad();
    if (!missing.isEmpty()) {
      w.notAssessed.add("not assessed — missing " + String.join(", ", missing));
      return 0.0;
    }
    DwellingInputs in = unit.inputs();
    double total =
        w.add(
            "General lighting: "
                + whole(in.floorAreaSquareFeet())
                + " ft² at "
                + figure(LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT)
                + " VA/ft²",
            clause,
            in.floorAreaSquareFeet() * LIGHTING_VOLT_AMPERES_PER_SQUARE_FOOT,
            1.0);
    total +=
        w.add(
            "Small-appliance and laundry circuits: "
                + (in.smallApplianceCircuits() + in.laundryCircuits())
                + " at 1,500 VA",
            clause,
            (in.smallApplianceCircuits() + in.laundryCircuits()) * APPLIANCE_CIRCUIT_VOLT_AMPERES,
            1.0);
    return total;
  }

  // ---------------------------------------------------------------- 220.87

  /**
   * 220.87: the existing load is the largest maximum demand recorded over a year (or, by its
   * exception, over at least 30 days at a 15-minute demand interval) at 125 %; with the board's
   * rating, what that leaves for new load.
   */
  public static Worksheet measured(List<MeasuredMaximumDemand> records, Double ratingVoltAmperes) {
    Lines w = new Lines();
    MeasuredMaximumDemand year =
        records.stream()
            .filter(r -> r.days() >= MEASURED_YEAR_DAYS)
            .max(java.util.Comparator.comparingDouble(MeasuredMaximumDemand::value))
            .orElse(null);
    MeasuredMaximumDemand chosen = year;
    String clause = "220.87(1)";
    if (chosen == null) {
      chosen =
          records.stream()
              .filter(
                  r ->
                      r.days() >= MEASURED_EXCEPTION_DAYS
                          && r.intervalMinutes() != null
                          && r.intervalMinutes() <= MEASURED_EXCEPTION_INTERVAL_MINUTES)
              .max(java.util.Comparator.comparingDouble(MeasuredMaximumDemand::value))
              .orElse(null);
      clause = "220.87(1), Exception";
    }
    if (chosen == null) {
      w.notAssessed.add(
          "not assessed — no recorded maximum demand covers a year, nor 30 days at a demand"
              + " interval of 15 minutes or less");
      return w.sheet(WorksheetMethod.MEASURED, null);
    }
    if (!chosen.kilovoltAmperes()) {
      w.assume(
          "The maximum demand was recorded in kW and is taken as kVA; it is low by the power"
              + " factor — record kVA where the meter gives it.");
    }
    if (year == null) {
      w.assume(
          "Exception to 220.87(1): the recording must be taken while the building is occupied and"
              + " include the larger of heating or cooling — not checked here.");
    }
    String peak = chosen.peakOn() == null ? "" : ", peak on " + chosen.peakOn();
    double existing =
        w.add(
            "Maximum demand recorded "
                + chosen.periodStart()
                + " to "
                + chosen.periodEnd()
                + " ("
                + chosen.days()
                + " days"
                + peak
                + ") at 125 %",
            clause,
            chosen.value() * 1000.0,
            MEASURED_DEMAND_FACTOR);
    w.total("Existing load", "220.87", existing);
    if (ratingVoltAmperes == null) {
      w.note("Load left for new equipment: not assessed — missing incomer rating", "220.87(2)");
    } else {
      w.add("Rating of the feeder or service", "220.87(2)", ratingVoltAmperes, 1.0);
      w.total("Load left for new equipment", "220.87(2)", ratingVoltAmperes - existing);
    }
    w.assume(
        "220.87(3): overcurrent protection of the feeder (240.4) or service (230.90) is a"
            + " condition of the method, not checked here.");
    return w.sheet(WorksheetMethod.MEASURED, existing);
  }

  // ---------------------------------------------------------------- helpers

  private static List<ApplianceLoad> of(List<ApplianceLoad> loads, Set<LoadCategory> categories) {
    return loads.stream().filter(load -> categories.contains(load.category())).toList();
  }

  private static double sum(List<ApplianceLoad> loads, LoadCategory category) {
    return loads.stream()
        .filter(load -> load.category() == category)
        .mapToDouble(ApplianceLoad::voltAmperes)
        .sum();
  }
}
