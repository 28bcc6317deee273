package com.wayledger.site;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The defaults of a site or a board as typed: cable conditions, where the circuits' equipment is,
 * and the start-up multiple of the load categories that usually have one. Every field is optional.
 */
public record DefaultsForm(
    InstallationMethod installationMethod,
    @DecimalMin("-30") @DecimalMax("90") Double ambientCelsius,
    @Min(1) @Max(100) Integer groupedCircuits,
    @Min(0) @Max(100000) Integer thermalInsulationMm,
    ConductorMaterial material,
    Insulation insulation,
    CircuitLocation location,
    @DecimalMin("1") @DecimalMax("50") Double motorStartUpMultiple,
    @DecimalMin("1") @DecimalMax("50") Double airConditioningStartUpMultiple,
    @DecimalMin("1") @DecimalMax("50") Double lightingStartUpMultiple) {

  /** The load categories that usually draw a start-up surge, in the form's order. */
  public static final List<LoadCategory> START_UP_CATEGORIES =
      List.of(LoadCategory.MOTOR, LoadCategory.AIR_CONDITIONING, LoadCategory.LIGHTING);

  /**
   * Common practice, not a standard's figure: reference ambient 30 °C (the air temperature the
   * usual capacity tables are drawn for), no thermal insulation, copper with 70 °C thermoplastic
   * insulation, a direct-on-line motor starting at 8 times its running current and an
   * air-conditioning compressor at 6 times (the upper end of the usual range, the safe side for a
   * nuisance-trip check). Installation method and grouping depend on the route, and where the
   * equipment is depends on the building: no common value, so none is filled in.
   */
  public static DefaultsForm commonPractice() {
    return new DefaultsForm(
        null,
        30.0,
        null,
        0,
        ConductorMaterial.COPPER,
        Insulation.THERMOPLASTIC_70,
        null,
        8.0,
        6.0,
        null);
  }

  public static DefaultsForm empty() {
    return new DefaultsForm(null, null, null, null, null, null, null, null, null, null);
  }

  public static DefaultsForm of(CableDefaults cable, Map<LoadCategory, Double> startUp) {
    CableDefaults c = cable == null ? CableDefaults.none() : cable;
    return new DefaultsForm(
        c.getInstallationMethod(),
        c.getAmbientCelsius(),
        c.getGroupedCircuits(),
        c.getThermalInsulationMillimetres(),
        c.getMaterial(),
        c.getInsulation(),
        c.getLocation(),
        startUp.get(LoadCategory.MOTOR),
        startUp.get(LoadCategory.AIR_CONDITIONING),
        startUp.get(LoadCategory.LIGHTING));
  }

  public CableDefaults cable() {
    return new CableDefaults(
        installationMethod,
        ambientCelsius,
        groupedCircuits,
        thermalInsulationMm,
        material,
        insulation,
        location);
  }

  /** The start-up multiples set, by category; categories left empty are absent. */
  public Map<LoadCategory, Double> startUpMultiples() {
    Map<LoadCategory, Double> multiples = new EnumMap<>(LoadCategory.class);
    put(multiples, LoadCategory.MOTOR, motorStartUpMultiple);
    put(multiples, LoadCategory.AIR_CONDITIONING, airConditioningStartUpMultiple);
    put(multiples, LoadCategory.LIGHTING, lightingStartUpMultiple);
    return multiples;
  }

  /** The fields set, by name, for a page that shows what a board would inherit from its site. */
  public Map<String, Object> setFields() {
    Map<String, Object> fields = new java.util.LinkedHashMap<>();
    fields.put("installationMethod", installationMethod);
    fields.put("ambientCelsius", ambientCelsius);
    fields.put("groupedCircuits", groupedCircuits);
    fields.put("thermalInsulationMm", thermalInsulationMm);
    fields.put("material", material);
    fields.put("insulation", insulation);
    fields.put("location", location);
    fields.put("motorStartUpMultiple", motorStartUpMultiple);
    fields.put("airConditioningStartUpMultiple", airConditioningStartUpMultiple);
    fields.put("lightingStartUpMultiple", lightingStartUpMultiple);
    fields.values().removeIf(java.util.Objects::isNull);
    return fields;
  }

  private static void put(Map<LoadCategory, Double> map, LoadCategory category, Double value) {
    if (value != null) {
      map.put(category, value);
    }
  }
}
