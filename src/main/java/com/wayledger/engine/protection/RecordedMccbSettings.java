package com.wayledger.engine.protection;

import com.wayledger.engine.protection.device.MccbSettings;
import java.util.Map;

/**
 * MCCB settings recorded outside the shared schedule records: per circuit (the way's device) and
 * per board (the incomer). An MCCB with no entry is assessed with Ir = In and the default
 * instantaneous multiple, and says so.
 */
public record RecordedMccbSettings(
    Map<Long, MccbSettings> byCircuitId, Map<Long, MccbSettings> incomerByBoardId) {

  public static final RecordedMccbSettings NONE = new RecordedMccbSettings(Map.of(), Map.of());

  public RecordedMccbSettings {
    byCircuitId = Map.copyOf(byCircuitId);
    incomerByBoardId = Map.copyOf(incomerByBoardId);
  }
}
