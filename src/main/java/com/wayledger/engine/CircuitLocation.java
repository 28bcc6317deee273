package com.wayledger.engine;

/**
 * Where a circuit's equipment is, as far as the location rules care. Under the IEC set some
 * locations need 30 mA additional protection on every circuit whatever it feeds (see {@code
 * ResidualCurrentRules}); under the NEC set the locations of 210.8(A) (dwelling units), 210.8(B)
 * (other occupancies) and 210.12 decide GFCI and AFCI protection (see {@code
 * engine.nec.DwellingProtection} and {@code engine.nec.OtherOccupancyGroundFault}). Each rule set
 * accepts only its own locations ({@code RuleSet.circuitLocations()}); indoors and outdoors belong
 * to both. A circuit whose location is not recorded carries none (null). Constant names fit the
 * 20-character column.
 */
public enum CircuitLocation {
  /** Indoors, in no location of the special-location parts of the wiring rules. */
  INDOORS,
  /** Outdoors, or feeding equipment used outdoors. */
  OUTDOORS,
  /** A room containing a bath or shower (IEC set). */
  BATH_OR_SHOWER,
  /** A swimming pool, paddling pool or fountain basin and its surroundings (IEC set). */
  SWIMMING_POOL,
  /** A room with a sauna heater (IEC set). */
  SAUNA,
  /** A farm or horticultural building (stables, barns, greenhouses) (IEC set). */
  AGRICULTURAL,
  /** A dwelling bathroom (NEC set). */
  BATHROOM,
  /** A garage or an accessory building (NEC set). */
  GARAGE,
  /** A crawl space at or below grade (NEC set). */
  CRAWL_SPACE,
  /** A basement (NEC set). */
  BASEMENT,
  /** A dwelling kitchen, countertop receptacles included (NEC set). */
  KITCHEN,
  /** Within 6 ft of the outside edge of a sink (NEC set). */
  NEAR_SINK,
  /** A boathouse (NEC set). */
  BOATHOUSE,
  /** Within 6 ft of the outside edge of a bathtub or shower stall (NEC set). */
  NEAR_TUB_OR_SHOWER,
  /** A laundry area (NEC set). */
  LAUNDRY,
  /**
   * A family, dining or living room, parlor, library, den, sunroom or recreation room (NEC set).
   */
  LIVING_AREA,
  /** A bedroom (NEC set). */
  BEDROOM,
  /** A closet or hallway (NEC set). */
  CLOSET_OR_HALLWAY,
  /** A rooftop (NEC set; 210.8(B)(3)). */
  ROOFTOP,
  /** An indoor damp or wet location (NEC set; 210.8(A)(11), 210.8(B)(6)). */
  DAMP_OR_WET_INDOORS,
  /** A locker room with associated showering facilities (NEC set, other occupancies). */
  LOCKER_ROOM,
  /** A service bay or similar area where vehicles are serviced (NEC set, other occupancies). */
  SERVICE_BAY,
  /**
   * An area other than a kitchen with a sink and permanent provisions for food preparation or
   * cooking, such as a break room (NEC set, other occupancies).
   */
  FOOD_PREPARATION
}
