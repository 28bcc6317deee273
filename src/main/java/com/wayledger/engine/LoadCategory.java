package com.wayledger.engine;

/** What kind of load an item is; diversity rules are chosen per category. */
public enum LoadCategory {
  LIGHTING,
  SOCKET_OUTLETS,
  COOKING,
  WATER_HEATING_INSTANTANEOUS,
  WATER_HEATING_STORAGE,
  SPACE_HEATING,
  AIR_CONDITIONING,
  MOTOR,
  EV_CHARGING,
  IT_SMALL_POWER,
  FIXED_APPLIANCE,
  /** A household clothes dryer (NEC 220.54); elsewhere treated like a fixed appliance. */
  CLOTHES_DRYER,
  OTHER
}
