package com.wayledger.exchange;

import java.util.List;

/**
 * What a column of an uploaded sheet means. Most are our own schedule columns; a few take the forms
 * other spreadsheets use (a device as one text such as "C32", a load in kW, W or A).
 */
public enum ImportField {
  IGNORE(null, List.of()),
  WAY(
      ScheduleColumn.WAY,
      List.of(
          "way",
          "way no",
          "cct",
          "ckt",
          "circuit ref",
          "no",
          "number",
          "nr",
          "cct no",
          "circuit no",
          "circuit number",
          "position",
          "#",
          "space",
          "space no",
          "space number",
          "spaces",
          "ckt no")),
  LINE(
      ScheduleColumn.LINE,
      List.of("line", "phase", "ph", "phases", "pole position", "l", "leg", "phase leg", "bus")),
  CIRCUIT(
      ScheduleColumn.CIRCUIT,
      List.of(
          "circuit",
          "description",
          "circuit description",
          "feeds",
          "serving",
          "designation",
          "name",
          "destination",
          "what it feeds")),
  STATE(ScheduleColumn.STATE, List.of("state", "status", "in use")),
  KEEP_LINE(ScheduleColumn.KEEP_LINE, List.of("keep line", "locked", "fixed phase", "lock")),
  DEVICE(
      ScheduleColumn.DEVICE,
      List.of(
          "device",
          "device kind",
          "device type",
          "breaker type",
          "protective device type",
          "kind")),
  CURVE(ScheduleColumn.CURVE, List.of("curve", "characteristic", "trip curve", "tripping type")),
  RATING_AMPS(
      ScheduleColumn.RATING_AMPS,
      List.of(
          "in a",
          "in",
          "rating a",
          "breaker a",
          "breaker rating",
          "mcb rating",
          "device rating",
          "rated current",
          "current rating",
          "amps",
          "size a",
          "trip a")),
  POLES(ScheduleColumn.POLES, List.of("poles", "pole", "no of poles")),
  BREAKING_KILOAMPS(
      ScheduleColumn.BREAKING_KILOAMPS,
      List.of("icn ka", "icn", "icu", "ka", "breaking capacity", "breaking")),
  RESIDUAL_MILLIAMPS(
      ScheduleColumn.RESIDUAL_MILLIAMPS,
      List.of("iδn ma", "idn", "ma", "residual", "rcd ma", "sensitivity", "trip ma")),
  RCD_TYPE(ScheduleColumn.RCD_TYPE, List.of("rcd type", "rcd class")),
  OVERLOAD_SETTING_AMPS(
      ScheduleColumn.OVERLOAD_SETTING_AMPS,
      List.of(
          "ir a",
          "ir",
          "ir setting",
          "overload setting",
          "long time setting",
          "thermal setting",
          "mccb ir")),
  INSTANTANEOUS_SETTING_AMPS(
      ScheduleColumn.INSTANTANEOUS_SETTING_AMPS,
      List.of(
          "ii a",
          "ii",
          "ii setting",
          "instantaneous setting",
          "magnetic setting",
          "instantaneous",
          "mccb ii")),
  LINE_CSA(
      ScheduleColumn.LINE_CSA,
      List.of(
          "line mm2",
          "mm2",
          "mm",
          "csa",
          "cable size",
          "conductor size",
          "live mm2",
          "cable mm2",
          "size mm2",
          "cable")),
  /**
   * units (AWG/feet): a line conductor size written as the NEC writes it ("12 AWG", "250 kcmil").
   */
  LINE_AWG(
      null,
      List.of(
          "line awg kcmil",
          "awg",
          "awg kcmil",
          "size awg",
          "wire size",
          "wire awg",
          "conductor awg",
          "gauge",
          "wire gauge",
          "kcmil")),
  /** units (AWG/feet): a protective (equipment grounding) conductor size in AWG or kcmil. */
  CPC_AWG(
      null,
      List.of(
          "cpc awg kcmil",
          "egc",
          "egc awg",
          "ground awg",
          "ground size",
          "grounding conductor",
          "equipment grounding conductor",
          "ground wire")),
  /** units (AWG/feet): a cable length in feet (0.3048 m each). */
  LENGTH_FEET(
      null,
      List.of(
          "length ft",
          "length feet",
          "length in feet",
          "run ft",
          "run feet",
          "distance ft",
          "feet",
          "ft")),
  CPC_CSA(
      ScheduleColumn.CPC_CSA,
      List.of("cpc mm2", "cpc", "earth mm2", "earth", "protective conductor")),
  CONDUCTOR(
      ScheduleColumn.CONDUCTOR, List.of("conductor", "material", "conductor material", "cu al")),
  INSULATION(ScheduleColumn.INSULATION, List.of("insulation", "cable type", "insulation type")),
  LENGTH_METRES(
      ScheduleColumn.LENGTH_METRES,
      List.of(
          "length m",
          "length metres",
          "length meters",
          "length",
          "run m",
          "run",
          "distance",
          "route length",
          "metres",
          "meters",
          "m")),
  RING(
      ScheduleColumn.RING,
      List.of("ring", "ring final", "ring circuit", "ring final circuit", "rfc", "ring or radial")),
  INSTALLATION(
      ScheduleColumn.INSTALLATION,
      List.of("installation", "installation method", "reference method", "method", "install")),
  AMBIENT_CELSIUS(
      ScheduleColumn.AMBIENT_CELSIUS, List.of("ambient c", "ambient", "temperature", "temp")),
  GROUPED(ScheduleColumn.GROUPED, List.of("grouped", "grouping", "group")),
  THERMAL_INSULATION_MM(
      ScheduleColumn.THERMAL_INSULATION_MM,
      List.of("in insulation mm", "thermal insulation", "insulation mm")),
  MEASURED_ZS(
      ScheduleColumn.MEASURED_ZS,
      List.of("measured zs", "zs", "zs ohm", "loop impedance", "measured loop")),
  LOCATION(
      ScheduleColumn.LOCATION,
      List.of("location", "circuit location", "where", "room", "special location")),
  LOAD(
      ScheduleColumn.LOAD,
      List.of("load", "load description", "equipment", "item", "appliance", "connected item")),
  CATEGORY(
      ScheduleColumn.CATEGORY,
      List.of("category", "load type", "load category", "use", "type of load")),
  QUANTITY(
      ScheduleColumn.QUANTITY, List.of("qty", "quantity", "count", "number of", "no off", "units")),
  RATING(ScheduleColumn.RATING, List.of("rating", "nameplate", "load rating", "value")),
  UNIT(ScheduleColumn.UNIT, List.of("unit", "units of rating", "rating unit")),
  POWER_FACTOR(
      ScheduleColumn.POWER_FACTOR, List.of("pf", "power factor", "cos phi", "cosphi", "cos")),
  SURGE_MULTIPLE(
      ScheduleColumn.SURGE_MULTIPLE,
      List.of("surge", "surge x", "inrush", "starting multiple", "start multiple")),
  SURGE_MILLIS(ScheduleColumn.SURGE_MILLIS, List.of("surge ms", "inrush ms", "start ms", "ms")),
  CONTINUOUS(ScheduleColumn.CONTINUOUS, List.of("continuous", "cont")),
  CIRCUIT_KEY(ScheduleColumn.CIRCUIT_KEY, List.of("circuit key", "key")),
  RECORD_VERSION(ScheduleColumn.RECORD_VERSION, List.of("record version", "version")),
  CONNECTION(
      ScheduleColumn.CONNECTION,
      List.of(
          "connection",
          "connection type",
          "l l",
          "line to line",
          "l n",
          "voltage",
          "volts",
          "v",
          "load voltage",
          "circuit voltage",
          "240 v",
          "wiring")),
  FAULT_INTERRUPTER(
      ScheduleColumn.FAULT_INTERRUPTER,
      List.of(
          "fault interrupter",
          "gfci afci",
          "afci gfci",
          "gfci",
          "afci",
          "ground fault",
          "arc fault",
          "gfci protection",
          "afci protection")),
  MOTOR_HP(
      ScheduleColumn.MOTOR_HP,
      List.of("motor hp", "hp", "horsepower", "motor horsepower", "motor size hp")),
  CONDUIT(
      ScheduleColumn.CONDUIT,
      List.of("conduit", "conduit type", "raceway", "raceway type", "conduit material")),
  DEVICE_SUMMARY(
      null,
      List.of(
          "protection",
          "breaker",
          "mcb",
          "ocpd",
          "protective device",
          "device rating",
          "fuse",
          "overcurrent device")),
  LOAD_KILOWATTS(
      null,
      List.of(
          "kw",
          "kilowatts",
          "kilowatt",
          "load kw",
          "power kw",
          "demand kw",
          "installed kw",
          "connected kw")),
  LOAD_WATTS(null, List.of("w", "watts", "load w", "power w", "wattage")),
  LOAD_AMPS(
      null,
      List.of(
          "load a",
          "ib",
          "ib a",
          "design current",
          "load current",
          "current a",
          "full load current",
          "flc"));

  private final ScheduleColumn column;
  private final List<String> words;

  ImportField(ScheduleColumn column, List<String> words) {
    this.column = column;
    this.words = words;
  }

  /** Our own column this field reads, or null for the other forms. */
  public ScheduleColumn column() {
    return column;
  }

  /** Header phrases that suggest this field, most telling first. */
  List<String> words() {
    return words;
  }

  /**
   * The header our own export writes for this field: the schedule column's, and for the AWG/kcmil
   * and feet fields the header an AWG-and-feet site's export writes; null for the other forms.
   */
  public String ownHeader() {
    var awg = com.wayledger.engine.rules.CableUnits.AWG_AND_FEET;
    return switch (this) {
      case LINE_AWG -> ScheduleColumn.LINE_CSA.header(awg);
      case CPC_AWG -> ScheduleColumn.CPC_CSA.header(awg);
      case LENGTH_FEET -> ScheduleColumn.LENGTH_METRES.header(awg);
      default -> column == null ? null : column.header();
    };
  }

  /** The field our own export's header names (either units), or IGNORE. */
  static ImportField ofOwnHeader(String header) {
    String wanted = header == null ? "" : header.strip();
    for (ImportField field : values()) {
      if (field.ownHeader() != null && field.ownHeader().equalsIgnoreCase(wanted)) {
        return field;
      }
    }
    return IGNORE;
  }

  /** Key of the field's name in i18n/exchange.properties. */
  public String messageKey() {
    return "import.field." + name();
  }

  /** The field that reads one of our own columns. */
  static ImportField of(ScheduleColumn column) {
    for (ImportField field : values()) {
      if (field.column == column) {
        return field;
      }
    }
    return IGNORE;
  }
}
