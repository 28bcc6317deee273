package com.wayledger.diversity;

import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;
import com.wayledger.engine.demand.DiversityMethod;
import com.wayledger.engine.demand.DiversityRule;
import tools.jackson.databind.json.JsonMapper;

/**
 * Writes and reads a diversity method as JSON. The engine's rule types carry no annotations (the
 * engine imports nothing but java.*), so their type names are attached here with a mix-in.
 */
final class MethodJson {

  @JsonTypeInfo(use = JsonTypeInfo.Id.NAME, property = "type")
  @JsonSubTypes({
    @JsonSubTypes.Type(value = DiversityRule.NoDiversity.class, name = "none"),
    @JsonSubTypes.Type(value = DiversityRule.Flat.class, name = "flat"),
    @JsonSubTypes.Type(value = DiversityRule.LargestFirst.class, name = "largest-first"),
    @JsonSubTypes.Type(value = DiversityRule.FirstAmps.class, name = "first-amps"),
    @JsonSubTypes.Type(value = DiversityRule.Tiered.class, name = "tiered"),
    @JsonSubTypes.Type(value = DiversityRule.CountThreshold.class, name = "count-threshold"),
    @JsonSubTypes.Type(value = DiversityRule.NecCookingTable.class, name = "nec-cooking-table"),
    @JsonSubTypes.Type(value = DiversityRule.NecDryerTable.class, name = "nec-dryer-table"),
    @JsonSubTypes.Type(value = DiversityRule.NonCoincident.class, name = "non-coincident"),
    @JsonSubTypes.Type(value = DiversityRule.LargestMotorPlus.class, name = "largest-motor-plus")
  })
  private abstract static class RuleTypes {}

  private static final JsonMapper MAPPER =
      JsonMapper.builder().addMixIn(DiversityRule.class, RuleTypes.class).build();

  private MethodJson() {}

  static String write(DiversityMethod method) {
    return MAPPER.writeValueAsString(method);
  }

  static DiversityMethod read(String json) {
    return MAPPER.readValue(json, DiversityMethod.class);
  }
}
