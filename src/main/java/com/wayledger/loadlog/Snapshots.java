package com.wayledger.loadlog;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.demand.DwellingParameters;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
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

  /**
   * Whether an entry's snapshots are a board's NEC dwelling inputs ({@code {"dwelling": …}}, see
   * {@code board.DwellingService}) and not its header.
   */
  static boolean isDwelling(String before, String after) {
    return hasDwellingKey(before) || hasDwellingKey(after);
  }

  private static boolean hasDwellingKey(String json) {
    return json != null && MAPPER.readTree(json).has(com.wayledger.board.DwellingService.LOG_KEY);
  }

  /** The dwelling inputs in a dwelling entry's snapshot; {@code UNKNOWN} for none (removed). */
  static DwellingParameters dwelling(String json) {
    if (json == null) {
      return DwellingParameters.UNKNOWN;
    }
    JsonNode inputs = MAPPER.readTree(json).get(com.wayledger.board.DwellingService.LOG_KEY);
    if (inputs == null || inputs.isNull()) {
      return DwellingParameters.UNKNOWN;
    }
    return new DwellingParameters(
        number(inputs, "floorAreaSquareFeet") == null
            ? null
            : number(inputs, "floorAreaSquareFeet").doubleValue(),
        number(inputs, "smallApplianceCircuits") == null
            ? null
            : number(inputs, "smallApplianceCircuits").intValue(),
        number(inputs, "laundryCircuits") == null
            ? null
            : number(inputs, "laundryCircuits").intValue());
  }

  private static Number number(JsonNode node, String field) {
    JsonNode value = node.get(field);
    return value == null || value.isNull() ? null : value.numberValue();
  }

  static BoardSpec board(String json) {
    return json == null ? null : MAPPER.readValue(json, BoardSpec.class);
  }
}
