package com.wayledger.board;

import com.wayledger.engine.dwelling.DwellingAddition;
import com.wayledger.engine.dwelling.DwellingInputs;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Positive;

/**
 * The dwelling inputs of a board as typed on the page or sent to the API. The floor area may be
 * given in ft² or m²; it is stored in ft². Every number may be left empty while unknown: the
 * methods that need it then say "not assessed".
 *
 * @param floorArea floor area in {@code areaUnit}
 * @param areaUnit "FT2" (default) or "M2"
 * @param smallApplianceCircuits 20 A small-appliance branch circuits (NEC 220.52(A))
 * @param laundryCircuits laundry branch circuits (220.52(B))
 * @param optionalMethod whether the optional method of 220.82 is worked as well
 * @param addition whether the load is calculated for an addition (220.83)
 * @param version the version the form was opened at; null to skip the check (API without it)
 * @param reason why, for the change log; optional
 */
public record DwellingForm(
    @Positive @DecimalMax("10000000") Double floorArea,
    String areaUnit,
    @Min(0) @Max(1000) Integer smallApplianceCircuits,
    @Min(0) @Max(1000) Integer laundryCircuits,
    Boolean optionalMethod,
    DwellingAddition addition,
    Long version,
    String reason) {

  public static final String SQUARE_FEET = "FT2";
  public static final String SQUARE_METRES = "M2";

  /** Whether the optional method is worked (an unticked box sends nothing: false). */
  public boolean optionalMethodChosen() {
    return Boolean.TRUE.equals(optionalMethod);
  }

  /** The floor area in ft², converted from m² when given in m². */
  public Double floorAreaSquareFeetValue() {
    if (floorArea == null) {
      return null;
    }
    return SQUARE_METRES.equalsIgnoreCase(areaUnit)
        ? DwellingInputs.squareFeetOf(floorArea)
        : floorArea;
  }

  /** The form of a stored record (area in ft²), or an empty form for a board without one. */
  public static DwellingForm of(DwellingRecord record) {
    if (record == null) {
      return new DwellingForm(
          null, SQUARE_FEET, null, null, false, DwellingAddition.NONE, null, null);
    }
    return new DwellingForm(
        record.getFloorAreaSquareFeet(),
        SQUARE_FEET,
        record.getSmallApplianceCircuits(),
        record.getLaundryCircuits(),
        record.isOptionalMethod(),
        record.getAddition(),
        record.getVersion(),
        null);
  }
}
