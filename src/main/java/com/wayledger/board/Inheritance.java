package com.wayledger.board;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.site.CableDefaults;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Function;

/**
 * What a circuit uses for an input it does not record: its board's default, else its site's. Used
 * by {@link ScheduleMapper} to build engine inputs and by the pages to say, beside each finding,
 * which values were inherited ("ambient 30 °C, board default").
 */
public final class Inheritance {

  /** Where an inherited value was set. */
  public enum Source {
    BOARD,
    SITE
  }

  /**
   * One value a circuit inherited.
   *
   * @param field the circuit form's field it stands for (e.g. {@code cableAmbientCelsius})
   * @param value the value: a number, or an enum constant
   * @param source the level that set it
   * @param category for a start-up multiple, the load category it applies to; else null
   */
  public record InheritedValue(String field, Object value, Source source, LoadCategory category) {

    /** The message key of an enum value ("enum.Insulation.THERMOPLASTIC_70"), else null. */
    public String valueKey() {
      return value instanceof Enum<?> constant
          ? "enum." + constant.getDeclaringClass().getSimpleName() + "." + constant.name()
          : null;
    }

    /** Whether a check of this kind uses the value. */
    public boolean usedBy(CheckKind check) {
      return switch (check) {
        case CABLE_PROTECTION -> CAPACITY_FIELDS.contains(field);
        case VOLTAGE_DROP, LOOP_IMPEDANCE ->
            field.equals("cableMaterial") || field.equals("cableInsulation");
        case START_UP_SURGE -> field.equals("loadStartUpMultiple");
        case SOCKET_RCD, GROUND_FAULT_PROTECTION, ARC_FAULT_PROTECTION ->
            field.equals(LOCATION_FIELD);
        default -> false;
      };
    }
  }

  /** The circuit form's field for where the circuit's equipment is. */
  static final String LOCATION_FIELD = "location";

  private static final Set<String> CAPACITY_FIELDS =
      Set.of(
          "cableInstallationMethod",
          "cableAmbientCelsius",
          "cableGroupedCircuits",
          "cableThermalInsulationMm",
          "cableMaterial",
          "cableInsulation");

  private Inheritance() {}

  /**
   * The cable as the checks see it: each condition the circuit leaves empty taken from the board's
   * defaults, else the site's; copper and 70 °C thermoplastic when nobody states them. Null when no
   * cable is recorded (a default does not make a cable).
   */
  static CableSpec effectiveCable(CableDetails cable, Board board) {
    if (cable == null || !cable.isRecorded()) {
      return null;
    }
    CableDefaults own = board.getDefaults();
    CableDefaults site = board.getSite().getDefaults();
    ConductorMaterial material = first(cable.getMaterial(), own.getMaterial(), site.getMaterial());
    Insulation insulation = first(cable.getInsulation(), own.getInsulation(), site.getInsulation());
    return new CableSpec(
        cable.getLineCsaSquareMillimetres(),
        cable.getProtectiveCsaSquareMillimetres(),
        material == null ? ConductorMaterial.COPPER : material,
        insulation == null ? Insulation.THERMOPLASTIC_70 : insulation,
        cable.getLengthMetres(),
        first(
            cable.getInstallationMethod(),
            own.getInstallationMethod(),
            site.getInstallationMethod()),
        first(cable.getAmbientCelsius(), own.getAmbientCelsius(), site.getAmbientCelsius()),
        first(cable.getGroupedCircuits(), own.getGroupedCircuits(), site.getGroupedCircuits()),
        first(
            cable.getThermalInsulationMillimetres(),
            own.getThermalInsulationMillimetres(),
            site.getThermalInsulationMillimetres()));
  }

  /**
   * Where a circuit's equipment is, as the checks see it: its own record, else the board's default,
   * else the site's; null (not recorded) when nobody states it.
   */
  static CircuitLocation effectiveLocation(Circuit circuit, Board board) {
    return first(
        circuit.getLocation(),
        board.getDefaults().getLocation(),
        board.getSite().getDefaults().getLocation());
  }

  /** A load's start-up multiple: its own, else the board's for its category, else the site's. */
  static Double startUpMultiple(LoadItem load, Board board) {
    return first(
        load.getStartUpSurgeMultiple(),
        board.getStartUpMultiples().get(load.getCategory()),
        board.getSite().getStartUpMultiples().get(load.getCategory()));
  }

  /** Every value this circuit inherits, in the order of the circuit form. */
  public static List<InheritedValue> of(Circuit circuit) {
    Board board = circuit.getBoard();
    List<InheritedValue> inherited = new ArrayList<>();
    CableDetails cable = circuit.getCable();
    if (cable != null && cable.isRecorded()) {
      CableDefaults own = board.getDefaults();
      CableDefaults site = board.getSite().getDefaults();
      add(
          inherited,
          "cableInstallationMethod",
          cable,
          own,
          site,
          c -> c.getInstallationMethod(),
          CableDefaults::getInstallationMethod);
      add(
          inherited,
          "cableMaterial",
          cable,
          own,
          site,
          CableDetails::getMaterial,
          CableDefaults::getMaterial);
      add(
          inherited,
          "cableInsulation",
          cable,
          own,
          site,
          CableDetails::getInsulation,
          CableDefaults::getInsulation);
      add(
          inherited,
          "cableAmbientCelsius",
          cable,
          own,
          site,
          CableDetails::getAmbientCelsius,
          CableDefaults::getAmbientCelsius);
      add(
          inherited,
          "cableGroupedCircuits",
          cable,
          own,
          site,
          CableDetails::getGroupedCircuits,
          CableDefaults::getGroupedCircuits);
      add(
          inherited,
          "cableThermalInsulationMm",
          cable,
          own,
          site,
          CableDetails::getThermalInsulationMillimetres,
          CableDefaults::getThermalInsulationMillimetres);
    }
    if (circuit.getLocation() == null) {
      InheritedValue location =
          fromBoardOrSite(
              LOCATION_FIELD,
              board.getDefaults().getLocation(),
              board.getSite().getDefaults().getLocation(),
              null);
      if (location != null) {
        inherited.add(location);
      }
    }
    for (LoadItem load : circuit.getLoads()) {
      if (load.getStartUpSurgeMultiple() != null) {
        continue;
      }
      LoadCategory category = load.getCategory();
      InheritedValue value =
          fromBoardOrSite(
              "loadStartUpMultiple",
              board.getStartUpMultiples().get(category),
              board.getSite().getStartUpMultiples().get(category),
              category);
      if (value != null && !inherited.contains(value)) {
        inherited.add(value);
      }
    }
    return inherited;
  }

  /** A circuit's inherited values, for pages that note them beside each finding. */
  public record Values(List<InheritedValue> all) {

    public Values {
      all = all == null ? List.of() : List.copyOf(all);
    }

    /** The inherited values a check of this kind used (for the note beside its finding). */
    public List<InheritedValue> usedBy(CheckKind check) {
      return check == null ? List.of() : all.stream().filter(value -> value.usedBy(check)).toList();
    }
  }

  private static <T> void add(
      List<InheritedValue> inherited,
      String field,
      CableDetails cable,
      CableDefaults own,
      CableDefaults site,
      Function<CableDetails, T> recorded,
      Function<CableDefaults, T> defaulted) {
    if (recorded.apply(cable) != null) {
      return;
    }
    InheritedValue value =
        fromBoardOrSite(field, defaulted.apply(own), defaulted.apply(site), null);
    if (value != null) {
      inherited.add(value);
    }
  }

  /** The board's value if it sets one, else the site's; null when neither does. */
  private static InheritedValue fromBoardOrSite(
      String field, Object onBoard, Object onSite, LoadCategory category) {
    return onBoard != null
        ? new InheritedValue(field, onBoard, Source.BOARD, category)
        : onSite != null ? new InheritedValue(field, onSite, Source.SITE, category) : null;
  }

  @SafeVarargs
  private static <T> T first(T... candidates) {
    for (T candidate : candidates) {
      if (candidate != null) {
        return candidate;
      }
    }
    return null;
  }
}
