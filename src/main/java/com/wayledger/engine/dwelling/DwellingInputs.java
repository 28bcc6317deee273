package com.wayledger.engine.dwelling;

/**
 * What a dwelling unit's load calculation needs beyond its loads. A null number is unknown: the
 * methods that need it say "not assessed" and name it.
 *
 * @param floorAreaSquareFeet floor area measured from the outside dimensions, without open porches
 *     and unfinished spaces not adaptable for future use (NEC 220.12), ft²
 * @param smallApplianceCircuits number of 20 A small-appliance branch circuits (220.52(A))
 * @param laundryCircuits number of laundry branch circuits (220.52(B)); 0 where a laundry on the
 *     premises serves every tenant
 * @param optionalMethod whether the optional method of 220.82 is to be worked as well
 * @param addition whether the calculation is for an addition to an existing dwelling (220.83)
 */
public record DwellingInputs(
    Double floorAreaSquareFeet,
    Integer smallApplianceCircuits,
    Integer laundryCircuits,
    boolean optionalMethod,
    DwellingAddition addition) {

  /** Square feet in one square metre: 1 / 0.3048² (the foot is 0.3048 m exactly). */
  public static final double SQUARE_FEET_PER_SQUARE_METRE = 1.0 / (0.3048 * 0.3048);

  public DwellingInputs {
    addition = addition == null ? DwellingAddition.NONE : addition;
  }

  /** The names of the inputs the general lighting load needs and lacks, in order; empty if none. */
  public java.util.List<String> missingForGeneralLoad() {
    java.util.List<String> missing = new java.util.ArrayList<>();
    if (floorAreaSquareFeet == null) {
      missing.add("floor area");
    }
    if (smallApplianceCircuits == null) {
      missing.add("number of small-appliance branch circuits");
    }
    if (laundryCircuits == null) {
      missing.add("number of laundry branch circuits");
    }
    return missing;
  }

  /** Converts a floor area in m² to ft². */
  public static double squareFeetOf(double squareMetres) {
    return squareMetres * SQUARE_FEET_PER_SQUARE_METRE;
  }
}
