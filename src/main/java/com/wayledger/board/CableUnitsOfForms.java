package com.wayledger.board;

import com.wayledger.engine.rules.CableUnits;
import com.wayledger.system.RuleViolation;

/**
 * The edge between what people type or read (a site's units: mm² and metres, or AWG/kcmil and feet)
 * and what is stored (always mm² and metres). Pages and the API pass every circuit and board form
 * through here, both ways; the services below see stored units only.
 *
 * <p>On an AWG-and-feet site a size is one of the NEC sizes by its label ("12 AWG", "250 kcmil")
 * and a length is in feet; a metric value sent there is refused, naming the field and the field to
 * use instead, and the reverse on a metric site, so no number is ever read in the wrong unit.
 */
public final class CableUnitsOfForms {

  private CableUnitsOfForms() {}

  /** A circuit form as a person reads it on a site in these units. */
  public static CircuitForm shown(CircuitForm form, CableUnits units) {
    if (!units.awgAndFeet()) {
      return form;
    }
    return form.withCableUnits(
        null,
        null,
        null,
        form.cableLineCsa() != null ? sizeLabel(form.cableLineCsa()) : form.cableLineSize(),
        form.cableCpcCsa() != null ? sizeLabel(form.cableCpcCsa()) : form.cableCpcSize(),
        form.cableLengthMetres() != null
            ? units.lengthInUnit(form.cableLengthMetres())
            : form.cableLengthFeet());
  }

  /**
   * A circuit form as typed on a site in these units, in stored units.
   *
   * @throws RuleViolation naming the field when a value is in the other units or no NEC size
   */
  public static CircuitForm stored(CircuitForm form, CableUnits units) {
    if (!units.awgAndFeet()) {
      refuseUnitFields(
          form.cableLineSize(),
          form.cableCpcSize(),
          form.cableLengthFeet(),
          "cable",
          "cableLineCsa");
      return form;
    }
    refuseMetric(form.cableLineCsa(), "cableLineCsa", "cableLineSize");
    refuseMetric(form.cableCpcCsa(), "cableCpcCsa", "cableCpcSize");
    refuseMetric(form.cableLengthMetres(), "cableLengthMetres", "cableLengthFeet");
    return form.withCableUnits(
        area(form.cableLineSize(), "cableLineSize"),
        area(form.cableCpcSize(), "cableCpcSize"),
        units.metresOf(form.cableLengthFeet()),
        null,
        null,
        null);
  }

  /** A board form as a person reads it on a site in these units. */
  public static BoardForm shown(BoardForm form, CableUnits units) {
    if (!units.awgAndFeet()) {
      return form;
    }
    return form.withSubmainUnits(
        null,
        null,
        null,
        form.submainLineCsa() != null ? sizeLabel(form.submainLineCsa()) : form.submainLineSize(),
        form.submainCpcCsa() != null ? sizeLabel(form.submainCpcCsa()) : form.submainCpcSize(),
        form.submainLengthMetres() != null
            ? units.lengthInUnit(form.submainLengthMetres())
            : form.submainLengthFeet());
  }

  /**
   * A board form as typed on a site in these units, in stored units.
   *
   * @throws RuleViolation naming the field when a value is in the other units or no NEC size
   */
  public static BoardForm stored(BoardForm form, CableUnits units) {
    if (!units.awgAndFeet()) {
      refuseUnitFields(
          form.submainLineSize(),
          form.submainCpcSize(),
          form.submainLengthFeet(),
          "submain",
          "submainLineCsa");
      return form;
    }
    refuseMetric(form.submainLineCsa(), "submainLineCsa", "submainLineSize");
    refuseMetric(form.submainCpcCsa(), "submainCpcCsa", "submainCpcSize");
    refuseMetric(form.submainLengthMetres(), "submainLengthMetres", "submainLengthFeet");
    return form.withSubmainUnits(
        area(form.submainLineSize(), "submainLineSize"),
        area(form.submainCpcSize(), "submainCpcSize"),
        units.metresOf(form.submainLengthFeet()),
        null,
        null,
        null);
  }

  /**
   * The names of inputs the checks still need, as the fields are named on a page in these units
   * ("cableLineCsa" is the "cableLineSize" select on an AWG-and-feet site).
   */
  public static java.util.List<String> fieldNames(java.util.List<String> names, CableUnits units) {
    if (!units.awgAndFeet()) {
      return names;
    }
    return names.stream()
        .map(
            name ->
                switch (name) {
                  case "cableLineCsa" -> "cableLineSize";
                  case "cableCpcCsa" -> "cableCpcSize";
                  case "cableLengthMetres" -> "cableLengthFeet";
                  default -> name;
                })
        .toList();
  }

  /**
   * The label of a stored area: its NEC size, or for an area that is none (recorded before, or
   * imported) the area in mm², which {@link #stored} then refuses until an NEC size is chosen.
   */
  private static String sizeLabel(Double squareMillimetres) {
    if (squareMillimetres == null) {
      return null;
    }
    return CableUnits.awgLabel(squareMillimetres)
        .orElseGet(() -> CableUnits.METRIC.sizeText(squareMillimetres));
  }

  private static Double area(String label, String field) {
    if (label == null || label.isBlank()) {
      return null;
    }
    return CableUnits.squareMillimetresOfAwg(label)
        .orElseThrow(() -> new RuleViolation(field, "units.size.notNec", label.strip()));
  }

  private static void refuseMetric(Double value, String field, String instead) {
    if (value != null) {
      throw new RuleViolation(field, "units.metricOnAwgSite", instead);
    }
  }

  private static void refuseUnitFields(
      String lineSize, String cpcSize, Double lengthFeet, String prefix, String instead) {
    if (lineSize != null && !lineSize.isBlank()) {
      throw new RuleViolation(prefix + "LineSize", "units.awgOnMetricSite", instead);
    }
    if (cpcSize != null && !cpcSize.isBlank()) {
      throw new RuleViolation(prefix + "CpcSize", "units.awgOnMetricSite", prefix + "CpcCsa");
    }
    if (lengthFeet != null) {
      throw new RuleViolation(
          prefix + "LengthFeet", "units.awgOnMetricSite", prefix + "LengthMetres");
    }
  }
}
