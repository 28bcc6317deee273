package com.wayledger.engine.demand;

import static com.wayledger.engine.LoadCategory.AIR_CONDITIONING;
import static com.wayledger.engine.LoadCategory.CLOTHES_DRYER;
import static com.wayledger.engine.LoadCategory.COOKING;
import static com.wayledger.engine.LoadCategory.EV_CHARGING;
import static com.wayledger.engine.LoadCategory.FIXED_APPLIANCE;
import static com.wayledger.engine.LoadCategory.IT_SMALL_POWER;
import static com.wayledger.engine.LoadCategory.LIGHTING;
import static com.wayledger.engine.LoadCategory.MOTOR;
import static com.wayledger.engine.LoadCategory.OTHER;
import static com.wayledger.engine.LoadCategory.SOCKET_OUTLETS;
import static com.wayledger.engine.LoadCategory.SPACE_HEATING;
import static com.wayledger.engine.LoadCategory.WATER_HEATING_INSTANTANEOUS;
import static com.wayledger.engine.LoadCategory.WATER_HEATING_STORAGE;
import static com.wayledger.engine.demand.RuleScope.ACROSS_CIRCUITS;
import static com.wayledger.engine.demand.RuleScope.WITHIN_CIRCUIT;

import com.wayledger.engine.demand.DiversityRule.CountThreshold;
import com.wayledger.engine.demand.DiversityRule.FirstAmps;
import com.wayledger.engine.demand.DiversityRule.Flat;
import com.wayledger.engine.demand.DiversityRule.LargestFirst;
import com.wayledger.engine.demand.DiversityRule.LargestMotorPlus;
import com.wayledger.engine.demand.DiversityRule.NecCookingTable;
import com.wayledger.engine.demand.DiversityRule.NecDryerTable;
import com.wayledger.engine.demand.DiversityRule.NonCoincident;
import com.wayledger.engine.demand.DiversityRule.RankBy;
import com.wayledger.engine.demand.DiversityRule.Tier;
import com.wayledger.engine.demand.DiversityRule.Tiered;
import java.util.List;
import java.util.Set;

/**
 * The built-in diversity methods, each with a stable key. Figures and their sources are listed in
 * docs/calculations/demand.md; the UK figures follow the allowances for diversity of the IET
 * On-Site Guide (Appendix A) as reproduced in trade references, the NEC figures follow NFPA 70
 * Article 220.
 */
public final class DiversityMethods {

  public static final String NONE = "none";
  public static final String UK_HOUSEHOLD = "uk-household";
  public static final String UK_SMALL_SHOP = "uk-small-shop";
  public static final String UK_SMALL_HOTEL = "uk-small-hotel";
  public static final String NEC_STANDARD_DWELLING = "nec-220-standard-dwelling";
  public static final String NEC_OPTIONAL_DWELLING = "nec-220-82-optional-dwelling";

  private static final String OSG =
      "IET On-Site Guide, Appendix A, allowances for diversity (also IET Guidance Note 1)";

  private static final DiversityMethodCatalog BUILT_IN =
      new DiversityMethodCatalog(
          List.of(
              none(),
              ukHousehold(),
              ukSmallShop(),
              ukSmallHotel(),
              necStandardDwelling(),
              necOptionalDwelling()));

  private DiversityMethods() {}

  /** Every built-in method. */
  public static DiversityMethodCatalog builtIn() {
    return BUILT_IN;
  }

  /** No diversity: demand equals connected load. */
  public static DiversityMethod none() {
    return new DiversityMethod(NONE, "No diversity", "connected load at 100 %", List.of(), false);
  }

  /** UK households and individual dwellings. */
  public static DiversityMethod ukHousehold() {
    return new DiversityMethod(
        UK_HOUSEHOLD,
        "UK household (On-Site Guide)",
        OSG + ", column for households",
        List.of(
            new CategoryGroup("Lighting", Set.of(LIGHTING), new Flat(0.66), ACROSS_CIRCUITS),
            new CategoryGroup(
                "Heating and power",
                Set.of(
                    SPACE_HEATING,
                    AIR_CONDITIONING,
                    FIXED_APPLIANCE,
                    CLOTHES_DRYER,
                    IT_SMALL_POWER,
                    MOTOR,
                    OTHER),
                new FirstAmps(10.0, 0.5, 0.0),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Cooking appliances",
                Set.of(COOKING),
                new FirstAmps(10.0, 0.3, 5.0),
                WITHIN_CIRCUIT),
            instantaneousWaterHeaters(),
            new CategoryGroup(
                "Thermostatic water heaters",
                Set.of(WATER_HEATING_STORAGE),
                new Flat(1.0),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Standard socket-outlet circuits",
                Set.of(SOCKET_OUTLETS),
                new LargestFirst(1.0, 0.4, 0.4, RankBy.CIRCUIT),
                ACROSS_CIRCUITS),
            electricVehicles()),
        false);
  }

  /** UK small shops, stores, offices and business premises. */
  public static DiversityMethod ukSmallShop() {
    return new DiversityMethod(
        UK_SMALL_SHOP,
        "UK small shop or office (On-Site Guide)",
        OSG + ", column for small shops, stores, offices and business premises",
        List.of(
            new CategoryGroup("Lighting", Set.of(LIGHTING), new Flat(0.9), ACROSS_CIRCUITS),
            new CategoryGroup(
                "Heating and power",
                Set.of(
                    SPACE_HEATING,
                    AIR_CONDITIONING,
                    FIXED_APPLIANCE,
                    CLOTHES_DRYER,
                    IT_SMALL_POWER,
                    OTHER),
                new LargestFirst(1.0, 0.75, 0.75, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Cooking appliances",
                Set.of(COOKING),
                new LargestFirst(1.0, 0.8, 0.6, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Motors (not lifts)",
                Set.of(MOTOR),
                new LargestFirst(1.0, 0.8, 0.6, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            instantaneousWaterHeaters(),
            new CategoryGroup(
                "Thermostatic water heaters",
                Set.of(WATER_HEATING_STORAGE),
                new Flat(1.0),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Standard socket-outlet circuits",
                Set.of(SOCKET_OUTLETS),
                new LargestFirst(1.0, 0.5, 0.5, RankBy.CIRCUIT),
                ACROSS_CIRCUITS),
            electricVehicles()),
        false);
  }

  /** UK small hotels, boarding houses and guest houses. */
  public static DiversityMethod ukSmallHotel() {
    return new DiversityMethod(
        UK_SMALL_HOTEL,
        "UK small hotel or guest house (On-Site Guide)",
        OSG + ", column for small hotels, boarding houses and guest houses",
        List.of(
            new CategoryGroup("Lighting", Set.of(LIGHTING), new Flat(0.75), ACROSS_CIRCUITS),
            new CategoryGroup(
                "Heating and power",
                Set.of(
                    SPACE_HEATING,
                    AIR_CONDITIONING,
                    FIXED_APPLIANCE,
                    CLOTHES_DRYER,
                    IT_SMALL_POWER,
                    OTHER),
                new LargestFirst(1.0, 0.8, 0.6, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Cooking appliances",
                Set.of(COOKING),
                new LargestFirst(1.0, 0.8, 0.6, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Motors (not lifts)",
                Set.of(MOTOR),
                new LargestFirst(1.0, 0.5, 0.5, RankBy.APPLIANCE),
                ACROSS_CIRCUITS),
            instantaneousWaterHeaters(),
            new CategoryGroup(
                "Thermostatic water heaters",
                Set.of(WATER_HEATING_STORAGE),
                new Flat(1.0),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Standard socket-outlet circuits",
                Set.of(SOCKET_OUTLETS),
                new LargestFirst(1.0, 0.5, 0.5, RankBy.CIRCUIT),
                ACROSS_CIRCUITS),
            electricVehicles()),
        false);
  }

  /** NEC Article 220 Part III, standard method, for a dwelling unit. */
  public static DiversityMethod necStandardDwelling() {
    return new DiversityMethod(
        NEC_STANDARD_DWELLING,
        "NEC 220 standard method, dwelling",
        "NFPA 70 (NEC) Article 220 Part III: 220.12, 220.52, Table 220.42, 220.53, 220.54, 220.55, 220.50, 220.60",
        List.of(
            new CategoryGroup(
                "General lighting, small-appliance and laundry circuits",
                Set.of(LIGHTING, SOCKET_OUTLETS),
                new Tiered(
                    List.of(
                        new Tier(3_000.0, 1.0), new Tier(120_000.0, 0.35), new Tier(null, 0.25))),
                ACROSS_CIRCUITS,
                necDwellingBasis()),
            new CategoryGroup(
                "Household cooking appliances",
                Set.of(COOKING),
                new NecCookingTable(),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Household clothes dryers",
                Set.of(CLOTHES_DRYER),
                new NecDryerTable(),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Fastened-in-place appliances",
                Set.of(FIXED_APPLIANCE, WATER_HEATING_INSTANTANEOUS, WATER_HEATING_STORAGE),
                new CountThreshold(4, 0.75),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Heating and air conditioning (non-coincident)",
                Set.of(SPACE_HEATING, AIR_CONDITIONING),
                new NonCoincident(1.0, 1.0, 1.0, 1),
                ACROSS_CIRCUITS),
            new CategoryGroup(
                "Motors", Set.of(MOTOR), new LargestMotorPlus(0.25), ACROSS_CIRCUITS)),
        true);
  }

  /** NEC 220.82 optional method for a single dwelling unit. */
  public static DiversityMethod necOptionalDwelling() {
    return new DiversityMethod(
        NEC_OPTIONAL_DWELLING,
        "NEC 220.82 optional method, one dwelling",
        "NFPA 70 (NEC) 220.82(B) general load and 220.82(C) heating and air-conditioning load",
        List.of(
            new CategoryGroup(
                "General load",
                Set.of(
                    LIGHTING,
                    SOCKET_OUTLETS,
                    COOKING,
                    WATER_HEATING_INSTANTANEOUS,
                    WATER_HEATING_STORAGE,
                    FIXED_APPLIANCE,
                    CLOTHES_DRYER,
                    IT_SMALL_POWER,
                    MOTOR,
                    EV_CHARGING,
                    OTHER),
                new Tiered(List.of(new Tier(10_000.0, 1.0), new Tier(null, 0.4))),
                ACROSS_CIRCUITS,
                necDwellingBasis()),
            new CategoryGroup(
                "Heating and air conditioning (larger of)",
                Set.of(SPACE_HEATING, AIR_CONDITIONING),
                new NonCoincident(1.0, 0.65, 0.4, 4),
                ACROSS_CIRCUITS)),
        true);
  }

  private static DwellingBasis necDwellingBasis() {
    return new DwellingBasis(3.0, 1_500.0, Set.of(LIGHTING, SOCKET_OUTLETS));
  }

  private static CategoryGroup instantaneousWaterHeaters() {
    return new CategoryGroup(
        "Instantaneous water heaters",
        Set.of(WATER_HEATING_INSTANTANEOUS),
        new LargestFirst(1.0, 1.0, 0.25, RankBy.APPLIANCE),
        ACROSS_CIRCUITS);
  }

  // The On-Site Guide allows no diversity for electric vehicle charge points (from memory)
  private static CategoryGroup electricVehicles() {
    return new CategoryGroup(
        "EV charge points", Set.of(EV_CHARGING), new Flat(1.0), ACROSS_CIRCUITS);
  }
}
