package com.wayledger.loadlog;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * The log's snapshots are the engine's own records (CircuitSpec for circuit and load changes,
 * BoardSpec without circuits for board changes) written as JSON, so a replay feeds the engine what
 * it was fed then.
 */
final class Snapshots {

  static final JsonMapper MAPPER =
      JsonMapper.builder()
          .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
          .disable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
          .build();

  private Snapshots() {}

  static CircuitSpec circuit(String json) {
    return json == null ? null : MAPPER.readValue(json, CircuitSpec.class);
  }

  /** Several circuits in one entry (a balancing plan moves many circuits as one change). */
  static java.util.List<CircuitSpec> circuits(String json) {
    return json == null
        ? java.util.List.of()
        : java.util.List.of(MAPPER.readValue(json, CircuitSpec[].class));
  }

  static BoardSpec board(String json) {
    return json == null ? null : MAPPER.readValue(json, BoardSpec.class);
  }
}
