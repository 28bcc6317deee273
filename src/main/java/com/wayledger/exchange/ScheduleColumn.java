package com.wayledger.exchange;

/**
 * The columns of a board's schedule table, in the order the exports write them. Input columns are
 * read back on import; computed columns are written for the reader and ignored on import.
 */
public enum ScheduleColumn {
  WAY("Way", true),
  LINE("Line", true),
  CIRCUIT("Circuit", true),
  STATE("State", true),
  KEEP_LINE("Keep line", true),
  DEVICE("Device", true),
  CURVE("Curve", true),
  RATING_AMPS("In A", true),
  POLES("Poles", true),
  BREAKING_KILOAMPS("Icn kA", true),
  RESIDUAL_MILLIAMPS("IΔn mA", true),
  RCD_TYPE("RCD type", true),
  OVERLOAD_SETTING_AMPS("Ir A", true),
  INSTANTANEOUS_SETTING_AMPS("Ii A", true),
  LINE_CSA("Line mm²", true),
  CPC_CSA("CPC mm²", true),
  CONDUCTOR("Conductor", true),
  INSULATION("Insulation", true),
  LENGTH_METRES("Length m", true),
  RING("Ring", true),
  INSTALLATION("Installation", true),
  AMBIENT_CELSIUS("Ambient °C", true),
  GROUPED("Grouped", true),
  THERMAL_INSULATION_MM("In insulation mm", true),
  MEASURED_ZS("Measured Zs Ω", true),
  LOCATION("Location", true),
  LOAD("Load", true),
  CATEGORY("Category", true),
  QUANTITY("Qty", true),
  RATING("Rating", true),
  UNIT("Unit", true),
  POWER_FACTOR("PF", true),
  SURGE_MULTIPLE("Surge ×", true),
  SURGE_MILLIS("Surge ms", true),
  CONTINUOUS("Continuous", true),
  CONNECTED_KW("Connected kW", false),
  CONNECTED_KVAR("Connected kvar", false),
  IB_CONNECTED("Ib connected A", false),
  DIVERSITY_P("Diversity P", false),
  DIVERSITY_Q("Diversity Q", false),
  DEMAND_KW("Demand kW", false),
  DEMAND_KVAR("Demand kvar", false),
  IB_DESIGN("Ib design A", false),
  FINDINGS("Findings", false),
  /**
   * The stored circuit a row was exported from (its id): an import into the same board matches the
   * row to that circuit even when its way or line was edited.
   */
  CIRCUIT_KEY("Circuit key", true),
  /**
   * The circuit's edition when exported ({@code Circuit.recordVersion()}): an import refuses to
   * overwrite a circuit changed since.
   */
  RECORD_VERSION("Record version", true),
  /**
   * How the circuit's load is connected: line to neutral, line to line (two-pole, no neutral) or
   * three-phase; the Line column already says it, this column says it in words and lets a sheet
   * that names only one line per row ("A" + "240 V") mark a two-pole circuit.
   */
  CONNECTION("Connection", true),
  /**
   * The breaker's ground-fault or arc-fault function (GFCI, AFCI, …) as the NEC checks read it;
   * blank when none is recorded.
   */
  FAULT_INTERRUPTER("Fault interrupter", true),
  /** A motor load's nameplate horsepower (NEC Tables 430.248/430.250); blank for other loads. */
  MOTOR_HP("Motor hp", true),
  /** The conduit an NEC circuit's conductors run in (Chapter 9 Table 9 voltage drop). */
  CONDUIT("Conduit", true);

  /** How a three-pole position is written in the Line column. */
  public static final String THREE_POLE_CODE = "3P";

  private final String header;
  private final boolean input;

  ScheduleColumn(String header, boolean input) {
    this.header = header;
    this.input = input;
  }

  public String header() {
    return header;
  }

  /**
   * The header as written for a site in these units: the size and length columns name AWG/kcmil and
   * feet on an AWG-and-feet site ("Line AWG/kcmil", "Length ft"); every other header is the same.
   */
  public String header(com.wayledger.engine.rules.CableUnits units) {
    if (!units.awgAndFeet()) {
      return header;
    }
    return switch (this) {
      case LINE_CSA -> "Line AWG/kcmil";
      case CPC_CSA -> "CPC AWG/kcmil";
      case LENGTH_METRES -> "Length ft";
      default -> header;
    };
  }

  /** Whether import reads this column (computed columns are ignored). */
  public boolean isInput() {
    return input;
  }

  /** The column of this header, written exactly as the export writes it; null when none. */
  public static ScheduleColumn byHeader(String text) {
    if (text == null) {
      return null;
    }
    String wanted = text.strip();
    for (ScheduleColumn column : values()) {
      if (column.header.equalsIgnoreCase(wanted)
          || column
              .header(com.wayledger.engine.rules.CableUnits.AWG_AND_FEET)
              .equalsIgnoreCase(wanted)) {
        return column;
      }
    }
    return null;
  }
}
