package com.wayledger.engine.demand;

/**
 * Inputs the NEC Article 220 dwelling methods need beyond the board's own circuits. Any field may
 * be null while unknown; a method that needs it then reports "not assessed" and names the missing
 * input.
 *
 * @param floorAreaSquareFeet floor area measured to NEC 220.12 (outside dimensions, without open
 *     porches or unfinished spaces), ft²
 * @param smallApplianceCircuits number of 20 A small-appliance branch circuits (NEC 220.52(A))
 * @param laundryCircuits number of laundry branch circuits (NEC 220.52(B))
 */
public record DwellingParameters(
    Double floorAreaSquareFeet, Integer smallApplianceCircuits, Integer laundryCircuits) {

  /** No dwelling data at all. */
  public static final DwellingParameters UNKNOWN = new DwellingParameters(null, null, null);
}
