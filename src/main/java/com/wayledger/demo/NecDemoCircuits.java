package com.wayledger.demo;

/**
 * The NEC demo's circuits as small tables, one per panel, one circuit a row (read by {@link
 * NecDemoRow}). Columns: line(s) | circuit | breaker A | conductor | feet | room | breaker function
 * | load | category | quantity | rating. Lines: A, B, C, or A-B, B-C, C-A for a two-pole breaker
 * (on a single-phase three-wire panel A-B is its only pair). "-" is none. Every figure is invented;
 * the rooms are the NEC set's locations, so GFCI and AFCI are assessed.
 */
final class NecDemoCircuits {

  private NecDemoCircuits() {}

  /**
   * The 208Y/120 V house panel: the apartments' 120/208 V panels each on a different pair of lines,
   * the common-area panel, and the building's outdoor circuits. Deliberate: the front walk
   * receptacles have no GFCI (a finding for a dwelling panel; the house panel is not one).
   */
  static final String HOUSE =
      """
      A-B | Feeder to apartment 1 panel | 200 | 3/0 AWG | 60  | INDOORS  | - | - | - | - | -
      B-C | Feeder to apartment 2 panel | 200 | 3/0 AWG | 75  | INDOORS  | - | - | - | - | -
      C-A | Feeder to apartment 3 panel | 200 | 3/0 AWG | 90  | INDOORS  | - | - | - | - | -
      B-C | Feeder to common-area panel | 100 | 3 AWG   | 30  | INDOORS  | - | - | - | - | -
      A   | Front walk receptacles      | 20  | 12 AWG  | 70  | OUTDOORS | - | Front walk receptacles | SOCKET_OUTLETS | 2 | 180 VA
      B   | Parking lot lighting        | 15  | 14 AWG  | 110 | OUTDOORS | - | Pole lights | LIGHTING | 4 | 150 W
      """;

  /** The common-area panel (120/208 V) as built: the 208 V heat across A-B, 120 V loads on A. */
  static final String COMMON =
      """
      A-B | Domestic hot-water heater | 60 | 6 AWG  | 20  | INDOORS | - | Storage water heater | WATER_HEATING_STORAGE | 1 | 11500 W
      A-B | Corridor heat             | 40 | 8 AWG  | 80  | INDOORS | - | Corridor heaters | SPACE_HEATING | 3 | 2400 W
      A   | Corridor lighting         | 15 | 14 AWG | 120 | INDOORS | - | Corridor luminaires | LIGHTING | 20 | 60 W
      B   | Laundry room lighting     | 15 | 14 AWG | 20  | LAUNDRY | - | Laundry luminaires | LIGHTING | 4 | 75 W
      A   | Boiler room receptacles   | 20 | 12 AWG | 25  | INDOORS | GFCI | Pumps and controls | FIXED_APPLIANCE | 1 | 1500 VA
      """;

  /** Deliberate: the shared washers added in 2023, all on line A (the overloaded leg). */
  static final String COMMON_WASHERS =
      """
      A | Shared washers           | 20 | 12 AWG | 15 | LAUNDRY | GFCI | Washers | FIXED_APPLIANCE | 2 | 1000 VA
      A | Laundry room receptacles | 20 | 12 AWG | 15 | LAUNDRY | GFCI | Folding-table receptacles | SOCKET_OUTLETS | 1 | 1440 VA
      """;

  /** Every dwelling panel: lighting, two small-appliance circuits, laundry and bathroom. */
  static final String DWELLING_BASICS =
      """
      A | Lighting, living room and hall     | 15 | 14 AWG | 45 | LIVING_AREA | AFCI | Luminaires | LIGHTING | 8 | 60 W
      B | Lighting and receptacles, bedrooms | 15 | 14 AWG | 55 | BEDROOM | AFCI | Luminaires | LIGHTING | 6 | 60 W
      A | Kitchen small-appliance circuit 1  | 20 | 12 AWG | 30 | KITCHEN | DUAL_FUNCTION | Countertop receptacles | SOCKET_OUTLETS | 1 | 1500 VA
      B | Kitchen small-appliance circuit 2  | 20 | 12 AWG | 30 | KITCHEN | DUAL_FUNCTION | Countertop receptacles | SOCKET_OUTLETS | 1 | 1500 VA
      A | Laundry receptacle                 | 20 | 12 AWG | 20 | LAUNDRY | DUAL_FUNCTION | Washer | SOCKET_OUTLETS | 1 | 1500 VA
      B | Bathroom receptacle                | 20 | 12 AWG | 25 | BATHROOM | GFCI | Bathroom receptacle | SOCKET_OUTLETS | 1 | 1500 VA
      """;

  /** Apartment 1. Deliberate: a 4.5 kW dryer, below the 5 kW NEC 220.54 takes per dryer. */
  static final String APARTMENT_ONE =
      """
      A-B | Range                | 50 | 6 AWG  | 35 | KITCHEN | - | Range | COOKING | 1 | 12000 W
      A-B | Clothes dryer        | 30 | 10 AWG | 40 | LAUNDRY | - | Clothes dryer | CLOTHES_DRYER | 1 | 4500 W
      A-B | Water heater         | 30 | 10 AWG | 30 | CLOSET_OR_HALLWAY | - | Water heater | WATER_HEATING_STORAGE | 1 | 4500 W
      A-B | Baseboard heat       | 40 | 8 AWG  | 60 | LIVING_AREA | - | Baseboard heaters | SPACE_HEATING | 4 | 1500 W
      A   | Dishwasher           | 20 | 12 AWG | 25 | KITCHEN | AFCI | Dishwasher | FIXED_APPLIANCE | 1 | 1200 VA
      B   | Waste disposer       | 20 | 12 AWG | 25 | KITCHEN | AFCI | Waste disposer | FIXED_APPLIANCE | 1 | 900 VA
      A   | Over-range microwave | 20 | 12 AWG | 30 | KITCHEN | AFCI | Microwave | FIXED_APPLIANCE | 1 | 1500 VA
      B   | Balcony receptacle   | 20 | 12 AWG | 35 | OUTDOORS | GFCI | Balcony receptacle | SOCKET_OUTLETS | 1 | 180 VA
      """;

  /** Apartment 2: smaller. */
  static final String APARTMENT_TWO =
      """
      A-B | Range         | 40 | 8 AWG  | 30 | KITCHEN | - | Range | COOKING | 1 | 8000 W
      A-B | Clothes dryer | 30 | 10 AWG | 40 | LAUNDRY | - | Clothes dryer | CLOTHES_DRYER | 1 | 5500 W
      A-B | Water heater  | 30 | 10 AWG | 30 | CLOSET_OR_HALLWAY | - | Water heater | WATER_HEATING_STORAGE | 1 | 4500 W
      A   | Dishwasher    | 20 | 12 AWG | 25 | KITCHEN | AFCI | Dishwasher | FIXED_APPLIANCE | 1 | 1200 VA
      """;

  /** Apartment 3. Deliberate: the balcony receptacle on a plain breaker, no GFCI. */
  static final String APARTMENT_THREE =
      """
      A-B | Range              | 40 | 8 AWG  | 35 | KITCHEN | - | Range | COOKING | 1 | 9600 W
      A-B | Clothes dryer      | 30 | 10 AWG | 40 | LAUNDRY | - | Clothes dryer | CLOTHES_DRYER | 1 | 5000 W
      A-B | Water heater       | 30 | 10 AWG | 30 | CLOSET_OR_HALLWAY | - | Water heater | WATER_HEATING_STORAGE | 1 | 4500 W
      A   | Dishwasher         | 20 | 12 AWG | 25 | KITCHEN | AFCI | Dishwasher | FIXED_APPLIANCE | 1 | 1200 VA
      B   | Waste disposer     | 20 | 12 AWG | 25 | KITCHEN | AFCI | Waste disposer | FIXED_APPLIANCE | 1 | 900 VA
      A   | Balcony receptacle | 20 | 12 AWG | 35 | OUTDOORS | - | Balcony receptacle | SOCKET_OUTLETS | 1 | 180 VA
      """;

  /** Air conditioning added in 2021, one table row per apartment (1, 2, 3). */
  static final String[] COOLING = {
    """
    A-B | Air-conditioning condenser | 30 | 10 AWG | 50 | OUTDOORS | - | Condensing unit | AIR_CONDITIONING | 1 | 5000 VA
    """,
    """
    A-B | Through-wall air conditioner | 20 | 12 AWG | 20 | LIVING_AREA | - | Air conditioner | AIR_CONDITIONING | 1 | 3500 VA
    """,
    """
    A-B | Air-conditioning condenser | 25 | 10 AWG | 50 | OUTDOORS | - | Condensing unit | AIR_CONDITIONING | 1 | 4200 VA
    """
  };

  /** Deliberate: apartment 2's bedroom circuit extended in 2025 on 14 AWG behind a 20 A breaker. */
  static final String BEDROOM_EXTENSION =
      """
      B | Bedroom receptacles | 20 | 14 AWG | 40 | BEDROOM | AFCI | Bedroom receptacles | SOCKET_OUTLETS | 6 | 180 VA
      """;

  /** The caretaker's cottage: a 120/240 V dwelling panel on its own service. */
  static final String COTTAGE =
      """
      A-B | Range              | 40 | 8 AWG  | 30 | KITCHEN | - | Range | COOKING | 1 | 8000 W
      A-B | Clothes dryer      | 30 | 10 AWG | 25 | LAUNDRY | - | Clothes dryer | CLOTHES_DRYER | 1 | 5000 W
      A-B | Water heater       | 30 | 10 AWG | 20 | CLOSET_OR_HALLWAY | - | Water heater | WATER_HEATING_STORAGE | 1 | 4500 W
      A-B | Heat pump          | 30 | 10 AWG | 40 | OUTDOORS | - | Heat pump outdoor unit | AIR_CONDITIONING | 1 | 4800 VA
      A   | Dishwasher         | 20 | 12 AWG | 25 | KITCHEN | AFCI | Dishwasher | FIXED_APPLIANCE | 1 | 1200 VA
      B   | Garage receptacles | 20 | 12 AWG | 45 | GARAGE | GFCI | Garage receptacles | SOCKET_OUTLETS | 4 | 180 VA
      """;
}
