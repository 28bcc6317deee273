package com.wayledger.exchange;

import static com.wayledger.exchange.ImportField.*;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.rules.CableUnits;
import com.wayledger.system.EnumWords;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns the rows of a mapped sheet into the circuits and loads they describe, checking each cell
 * and each schedule rule (ways within the board, one circuit per position, a device where the way
 * is used) so that the preview shows every problem beside its row and column before anything is
 * stored.
 *
 * <p>Rows with the same way and line and the same circuit fields are one circuit with several loads
 * (that is how our export writes a circuit); a row with no way, line or circuit text but a load
 * continues the circuit above.
 */
public final class RowReader {

  /** The board the rows go into. */
  public record BoardContext(
      int phases,
      int wayCount,
      Set<String> occupied,
      List<PhasePosition> positions,
      List<String> lineNames) {

    /** A board whose lines are named L1, L2, L3 in messages. */
    public BoardContext(
        int phases, int wayCount, Set<String> occupied, List<PhasePosition> positions) {
      this(phases, wayCount, occupied, positions, List.of());
    }

    /**
     * A board known by its phases only: L1 on a single-phase board; every single-pole, two-pole and
     * three-pole position on a three-phase one (the schedule refuses what the site's rule set does
     * not allow).
     */
    public BoardContext(int phases, int wayCount, Set<String> occupied) {
      this(phases, wayCount, occupied, PhasePosition.onBoardWith(phases == 3 ? 3 : 1, true));
    }

    public BoardContext {
      positions = List.copyOf(positions);
      lineNames = lineNames == null ? List.of() : List.copyOf(lineNames);
    }

    /** A line as the board names it in messages ("B" on a North American panel, else "L2"). */
    String lineName(Phase line) {
      return line.ordinal() < lineNames.size() ? lineNames.get(line.ordinal()) : line.name();
    }

    boolean isThreePhase() {
      return phases == 3;
    }

    /** Whether the board has one line only (every circuit on L1). */
    boolean hasOneLine() {
      return positions.size() == 1;
    }

    static String slot(int way, Phase phase) {
      return way + ":" + phase.name();
    }
  }

  private static final Pattern DEVICE_TEXT =
      Pattern.compile(
          "(?i)^\\s*(MCB|RCBO|RCD|MCCB|FUSE)?\\s*([BCD])?\\s*(\\d+(?:[.,]\\d+)?)\\s*A?\\s*(?:/?\\s*(\\d+(?:[.,]\\d+)?)\\s*mA)?\\s*(MCB|RCBO|RCD|MCCB|FUSE)?\\s*$");

  private static final Map<String, ImportField> CIRCUIT_PROPERTIES =
      Map.ofEntries(
          Map.entry("wayNumber", WAY),
          Map.entry("position", LINE),
          Map.entry("description", CIRCUIT),
          Map.entry("status", STATE),
          Map.entry("deviceKind", DEVICE),
          Map.entry("deviceCurve", CURVE),
          Map.entry("deviceRatingAmps", RATING_AMPS),
          Map.entry("devicePoles", POLES),
          Map.entry("deviceBreakingCapacityKiloAmps", BREAKING_KILOAMPS),
          Map.entry("deviceResidualMilliAmps", RESIDUAL_MILLIAMPS),
          Map.entry("deviceOverloadSettingAmps", OVERLOAD_SETTING_AMPS),
          Map.entry("deviceInstantaneousSettingAmps", INSTANTANEOUS_SETTING_AMPS),
          Map.entry("cableLineCsa", LINE_CSA),
          Map.entry("cableCpcCsa", CPC_CSA),
          Map.entry("cableLengthMetres", LENGTH_METRES),
          Map.entry("cableAmbientCelsius", AMBIENT_CELSIUS),
          Map.entry("cableGroupedCircuits", GROUPED),
          Map.entry("cableThermalInsulationMm", THERMAL_INSULATION_MM),
          Map.entry("measuredLoopImpedanceOhms", MEASURED_ZS),
          Map.entry("deviceFaultInterrupter", FAULT_INTERRUPTER));

  private static final Map<String, ImportField> LOAD_PROPERTIES =
      Map.of(
          "description",
          LOAD,
          "category",
          CATEGORY,
          "quantity",
          QUANTITY,
          "ratingValue",
          RATING,
          "ratingUnit",
          UNIT,
          "powerFactor",
          POWER_FACTOR,
          "startUpSurgeMultiple",
          SURGE_MULTIPLE,
          "startUpSurgeMillis",
          SURGE_MILLIS,
          "motorHorsepower",
          MOTOR_HP);

  private final Validator validator;

  public RowReader(Validator validator) {
    this.validator = validator;
  }

  public ImportPlan read(SheetTable table, List<ImportField> mapping, BoardContext board) {
    Map<ImportField, Integer> columnOf = new EnumMap<>(ImportField.class);
    for (int c = 0; c < mapping.size(); c++) {
      if (mapping.get(c) != IGNORE) {
        columnOf.putIfAbsent(mapping.get(c), c);
      }
    }
    List<ImportPlan.PreviewRow> rows = new ArrayList<>();
    Map<String, Planned> byKey = new LinkedHashMap<>();
    Map<String, Integer> slotRow = new HashMap<>();
    Planned previous = null;
    for (SheetTable.Row row : table.rows()) {
      Cells cells = new Cells(row, columnOf);
      List<ImportPlan.Problem> problems = new ArrayList<>();
      List<String> notes = new ArrayList<>();
      boolean hasLoad =
          cells.anyFilled(
              LOAD,
              CATEGORY,
              QUANTITY,
              RATING,
              UNIT,
              POWER_FACTOR,
              SURGE_MULTIPLE,
              SURGE_MILLIS,
              LOAD_KILOWATTS,
              LOAD_WATTS,
              LOAD_AMPS);
      boolean continuation =
          cells.blank(WAY)
              && cells.blank(LINE)
              && cells.blank(CIRCUIT)
              && hasLoad
              && previous != null;
      if (continuation) {
        LoadForm load = readLoad(cells, previous.circuit.description(), problems, notes);
        if (!previous.valid) {
          problems.add(
              new ImportPlan.Problem(
                  WAY, "import.cell.circuitInvalid", new Object[] {previous.firstRow}));
        } else if (previous.circuit.status() != WayStatus.IN_USE) {
          problems.add(new ImportPlan.Problem(LOAD, "import.cell.loadOnUnused", new Object[0]));
        }
        if (problems.isEmpty()) {
          previous.loads.add(load);
          previous.rows.add(row.number());
        }
        rows.add(new ImportPlan.PreviewRow(row.number(), null, load, problems, notes));
        continue;
      }
      CircuitForm circuit = readCircuit(cells, board, problems, notes);
      LoadForm load = hasLoad ? readLoad(cells, circuit.description(), problems, notes) : null;
      if (load != null && circuit.status() != null && circuit.status() != WayStatus.IN_USE) {
        problems.add(
            new ImportPlan.Problem(cells.source(LOAD), "import.cell.loadOnUnused", new Object[0]));
      }
      Planned planned = null;
      if (circuit.wayNumber() != null && circuit.position() != null) {
        String key = circuit.wayNumber() + ":" + circuit.position();
        Planned same = byKey.get(key);
        if (same != null && same.circuit.equals(circuit)) {
          planned = same; // another load of a circuit already read
          if (!same.valid) {
            problems.add(
                new ImportPlan.Problem(
                    WAY, "import.cell.circuitInvalid", new Object[] {same.firstRow}));
          }
        } else {
          for (Phase phase : circuit.position().phases()) {
            String slot = BoardContext.slot(circuit.wayNumber(), phase);
            if (slotRow.containsKey(slot)) {
              problems.add(
                  new ImportPlan.Problem(
                      LINE, "import.cell.duplicate", new Object[] {slotRow.get(slot)}));
              break;
            }
            if (board.occupied().contains(slot)) {
              problems.add(
                  new ImportPlan.Problem(
                      LINE,
                      "import.cell.taken",
                      new Object[] {circuit.wayNumber(), board.lineName(phase)}));
              break;
            }
          }
        }
      }
      if (planned == null) {
        Integer keyCell = cells.whole(CIRCUIT_KEY, problems);
        Long key = keyCell == null ? null : keyCell.longValue();
        planned = new Planned(circuit, row.number(), problems.isEmpty());
        planned.key = key;
        planned.version = cells.blank(RECORD_VERSION) ? null : cells.text(RECORD_VERSION);
        if (circuit.wayNumber() != null && circuit.position() != null) {
          byKey.putIfAbsent(circuit.wayNumber() + ":" + circuit.position(), planned);
          // a position claimed by a row with problems is still claimed: two rows for one position
          // are ambiguous
          for (Phase phase : circuit.position().phases()) {
            slotRow.putIfAbsent(BoardContext.slot(circuit.wayNumber(), phase), row.number());
          }
        }
      } else if (problems.isEmpty()) {
        planned.rows.add(row.number());
      }
      if (problems.isEmpty() && load != null) {
        planned.loads.add(load);
      }
      previous = planned;
      rows.add(new ImportPlan.PreviewRow(row.number(), circuit, load, problems, notes));
    }
    List<ImportPlan.PlannedCircuit> circuits = new ArrayList<>();
    for (Planned planned : distinct(byKey, rows)) {
      if (planned.valid) {
        circuits.add(
            new ImportPlan.PlannedCircuit(
                planned.circuit,
                List.copyOf(planned.loads),
                List.copyOf(planned.rows),
                planned.key,
                planned.version));
      }
    }
    return new ImportPlan(rows, circuits);
  }

  private static List<Planned> distinct(
      Map<String, Planned> byKey, List<ImportPlan.PreviewRow> rows) {
    return new ArrayList<>(byKey.values());
  }

  private static final class Planned {
    final CircuitForm circuit;
    final int firstRow;
    final boolean valid;
    final List<LoadForm> loads = new ArrayList<>();
    final List<Integer> rows = new ArrayList<>();
    Long key;
    String version;

    Planned(CircuitForm circuit, int firstRow, boolean valid) {
      this.circuit = circuit;
      this.firstRow = firstRow;
      this.valid = valid;
      rows.add(firstRow);
    }
  }

  // ---------------------------------------------------------------- circuit

  /**
   * The row's position from its Line cell and, when there is one, its Connection cell ("A" with
   * "240 V" is the two-pole position A–B); refused on the cell that is wrong.
   */
  private static PhasePosition readPosition(
      Cells cells, BoardContext board, List<ImportPlan.Problem> problems) {
    Codes.Connection connection = null;
    if (!cells.blank(CONNECTION)) {
      connection = Codes.parseConnection(cells.text(CONNECTION));
      if (connection == null) {
        problems.add(
            new ImportPlan.Problem(
                CONNECTION,
                "import.cell.unknownConnection",
                new Object[] {cells.text(CONNECTION)}));
      }
    }
    PhasePosition position = null;
    if (cells.blank(LINE)) {
      if (connection != null && connection != Codes.Connection.LINE_TO_NEUTRAL) {
        position = Codes.connect(PhasePosition.L1, connection, board.positions());
      } else if (board.isThreePhase()) {
        problems.add(new ImportPlan.Problem(LINE, "import.cell.lineMissing", new Object[0]));
        return null;
      } else {
        position = PhasePosition.L1;
      }
    } else {
      PhasePosition line = Codes.parseLine(cells.text(LINE));
      if (line == null) {
        problems.add(
            new ImportPlan.Problem(
                LINE, "import.cell.unknownLine", new Object[] {cells.text(LINE)}));
        return null;
      }
      position = line;
      if (connection != null) {
        position = Codes.connect(line, connection, board.positions());
        if (position == null) {
          problems.add(
              new ImportPlan.Problem(
                  CONNECTION,
                  "import.cell.connectionContradicts",
                  new Object[] {cells.text(CONNECTION), cells.text(LINE)}));
          return null;
        }
      }
    }
    if (position != null && !board.positions().contains(position)) {
      if (board.hasOneLine()) {
        problems.add(new ImportPlan.Problem(LINE, "import.cell.singlePhaseBoard", new Object[0]));
      } else {
        problems.add(
            new ImportPlan.Problem(
                LINE,
                "import.cell.positionNotOnBoard",
                new Object[] {Codes.line(position, board::lineName)}));
      }
      return null;
    }
    return position;
  }

  private CircuitForm readCircuit(
      Cells cells, BoardContext board, List<ImportPlan.Problem> problems, List<String> notes) {
    Integer way = cells.whole(WAY, problems);
    if (way == null && !cells.hasError(problems, WAY)) {
      problems.add(new ImportPlan.Problem(WAY, "import.cell.wayMissing", new Object[0]));
    }
    PhasePosition position = readPosition(cells, board, problems);
    String description = CellText.fromCsv(cells.text(CIRCUIT));
    WayStatus status;
    if (cells.blank(STATE)) {
      status =
          description.toLowerCase(Locale.ROOT).startsWith("spare")
              ? WayStatus.SPARE_DEVICE
              : WayStatus.IN_USE;
    } else {
      status = Codes.parseState(cells.text(STATE));
      if (status == null) {
        problems.add(
            new ImportPlan.Problem(
                STATE, "import.cell.unknownState", new Object[] {cells.text(STATE)}));
      }
    }
    Boolean locked = cells.yes(KEEP_LINE, problems);
    Boolean ring = cells.ring(problems);

    DeviceKind kind = cells.choice(DEVICE, DeviceKind.class, problems);
    TripCurve curve = cells.choice(CURVE, TripCurve.class, problems);
    Double rating = cells.number(RATING_AMPS, problems);
    Double residual = cells.number(RESIDUAL_MILLIAMPS, problems);
    if (!cells.blank(DEVICE_SUMMARY)) {
      Matcher m = DEVICE_TEXT.matcher(cells.text(DEVICE_SUMMARY));
      if (!m.matches()) {
        problems.add(
            new ImportPlan.Problem(
                DEVICE_SUMMARY,
                "import.cell.unreadableDevice",
                new Object[] {cells.text(DEVICE_SUMMARY)}));
      } else {
        String kindText = m.group(1) != null ? m.group(1) : m.group(5);
        if (kind == null && kindText != null) {
          kind = Codes.parseEnum(DeviceKind.class, kindText);
        }
        if (curve == null && m.group(2) != null) {
          curve = TripCurve.valueOf(m.group(2).toUpperCase(Locale.ROOT));
        }
        if (rating == null) {
          rating = Double.valueOf(m.group(3).replace(',', '.'));
          cells.redirect(RATING_AMPS, DEVICE_SUMMARY);
        }
        if (residual == null && m.group(4) != null) {
          residual = Double.valueOf(m.group(4).replace(',', '.'));
          cells.redirect(RESIDUAL_MILLIAMPS, DEVICE_SUMMARY);
        }
        cells.redirect(DEVICE, DEVICE_SUMMARY);
        cells.redirect(CURVE, DEVICE_SUMMARY);
      }
    }
    if (kind == null && curve != null) {
      kind = residual != null ? DeviceKind.RCBO : DeviceKind.MCB;
      notes.add("import.note.deviceFromCurve");
    }
    if (kind != null && !kind.hasCurve() && curve != null && cells.blank(DEVICE_SUMMARY)) {
      problems.add(
          new ImportPlan.Problem(
              CURVE, "import.cell.curveNotForDevice", new Object[] {Codes.word(kind)}));
    }
    if (status != null
        && status != WayStatus.EMPTY
        && kind == null
        && !cells.hasError(problems, DEVICE)) {
      problems.add(
          new ImportPlan.Problem(
              cells.source(DEVICE), "import.cell.deviceRequired", new Object[0]));
    }
    if (kind == DeviceKind.RCD && residual == null) {
      problems.add(
          new ImportPlan.Problem(
              cells.source(RESIDUAL_MILLIAMPS), "import.cell.residualRequired", new Object[0]));
    }
    if (way != null && way > board.wayCount()) {
      problems.add(
          new ImportPlan.Problem(WAY, "import.cell.beyondBoard", new Object[] {board.wayCount()}));
    }
    Double overload = cells.number(OVERLOAD_SETTING_AMPS, problems);
    Double instantaneous = cells.number(INSTANTANEOUS_SETTING_AMPS, problems);
    if (kind == DeviceKind.MCCB) {
      if (overload != null && rating != null && overload > rating) {
        problems.add(
            new ImportPlan.Problem(
                OVERLOAD_SETTING_AMPS, "import.cell.overloadAboveRating", new Object[] {rating}));
      } else if ((overload == null) != (instantaneous == null)) {
        problems.add(
            new ImportPlan.Problem(
                overload == null ? OVERLOAD_SETTING_AMPS : INSTANTANEOUS_SETTING_AMPS,
                "import.cell.mccbBothSettings",
                new Object[0]));
      }
    }
    CircuitForm form =
        new CircuitForm(
            way,
            position,
            description,
            status,
            locked,
            kind,
            curve,
            rating,
            cells.whole(POLES, problems),
            cells.number(BREAKING_KILOAMPS, problems),
            residual,
            cells.choice(RCD_TYPE, RcdType.class, problems),
            cells.size(LINE_CSA, ImportField.LINE_AWG, problems),
            cells.size(CPC_CSA, ImportField.CPC_AWG, problems),
            cells.choice(CONDUCTOR, ConductorMaterial.class, problems),
            cells.choice(INSULATION, Insulation.class, problems),
            cells.length(problems),
            cells.choice(INSTALLATION, InstallationMethod.class, problems),
            cells.number(AMBIENT_CELSIUS, problems),
            cells.whole(GROUPED, problems),
            cells.whole(THERMAL_INSULATION_MM, problems),
            cells.number(MEASURED_ZS, problems),
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            ring,
            overload,
            instantaneous,
            null,
            cells.choice(LOCATION, CircuitLocation.class, problems),
            cells.choice(FAULT_INTERRUPTER, FaultInterrupter.class, problems));
    form = form.withCableConduit(cells.conduit(problems));
    for (ConstraintViolation<CircuitForm> violation : validator.validate(form)) {
      ImportField field =
          CIRCUIT_PROPERTIES.getOrDefault(violation.getPropertyPath().toString(), CIRCUIT);
      if (!cells.hasError(problems, cells.source(field))) {
        problems.add(
            new ImportPlan.Problem(
                cells.source(field), "import.cell.invalid", new Object[] {violation.getMessage()}));
      }
    }
    return form;
  }

  // ---------------------------------------------------------------- load

  private LoadForm readLoad(
      Cells cells,
      String circuitDescription,
      List<ImportPlan.Problem> problems,
      List<String> notes) {
    String description = CellText.fromCsv(cells.text(LOAD));
    if (description.isBlank()) {
      description = circuitDescription == null ? "" : circuitDescription;
    }
    LoadCategory category;
    if (cells.blank(CATEGORY)) {
      category = categoryFromWords(description);
      notes.add("import.note.categoryGuessed");
    } else {
      category = Codes.parseEnum(LoadCategory.class, cells.text(CATEGORY));
      if (category == null) {
        category = categoryFromWords(cells.text(CATEGORY));
        if (category == LoadCategory.OTHER && !Codes.squash(cells.text(CATEGORY)).equals("OTHER")) {
          problems.add(
              new ImportPlan.Problem(
                  CATEGORY, "import.cell.unknownCategory", new Object[] {cells.text(CATEGORY)}));
        }
      }
    }
    Integer quantity = cells.blank(QUANTITY) ? Integer.valueOf(1) : cells.whole(QUANTITY, problems);
    Double rating = null;
    RatingUnit unit = null;
    if (!cells.blank(RATING)) {
      rating = cells.number(RATING, problems);
      unit = cells.choice(UNIT, RatingUnit.class, problems);
      if (unit == null && cells.blank(UNIT)) {
        problems.add(new ImportPlan.Problem(UNIT, "import.cell.unitMissing", new Object[0]));
      }
    } else if (!cells.blank(LOAD_KILOWATTS)) {
      Double kw = cells.number(LOAD_KILOWATTS, problems);
      rating = kw == null ? null : kw * 1000.0;
      unit = RatingUnit.W;
      cells.redirect(RATING, LOAD_KILOWATTS);
    } else if (!cells.blank(LOAD_WATTS)) {
      rating = cells.number(LOAD_WATTS, problems);
      unit = RatingUnit.W;
      cells.redirect(RATING, LOAD_WATTS);
    } else if (!cells.blank(LOAD_AMPS)) {
      rating = cells.number(LOAD_AMPS, problems);
      unit = RatingUnit.A;
      cells.redirect(RATING, LOAD_AMPS);
    } else {
      problems.add(new ImportPlan.Problem(RATING, "import.cell.ratingMissing", new Object[0]));
    }
    Double powerFactor;
    if (cells.blank(POWER_FACTOR)) {
      powerFactor = 1.0;
      notes.add("import.note.unityPowerFactor");
    } else {
      powerFactor = cells.number(POWER_FACTOR, problems);
    }
    Boolean continuous = cells.yes(CONTINUOUS, problems);
    LoadForm form =
        new LoadForm(
            description,
            category,
            quantity,
            rating,
            unit,
            powerFactor,
            cells.number(SURGE_MULTIPLE, problems),
            cells.number(SURGE_MILLIS, problems),
            Boolean.TRUE.equals(continuous),
            cells.number(MOTOR_HP, problems));
    for (ConstraintViolation<LoadForm> violation : validator.validate(form)) {
      ImportField field =
          LOAD_PROPERTIES.getOrDefault(violation.getPropertyPath().toString(), LOAD);
      if (!cells.hasError(problems, cells.source(field))) {
        problems.add(
            new ImportPlan.Problem(
                cells.source(field), "import.cell.invalid", new Object[] {violation.getMessage()}));
      }
    }
    return form;
  }

  /** A category from the words of a description; OTHER when none fits. */
  static LoadCategory categoryFromWords(String text) {
    String t = text == null ? "" : text.toLowerCase(Locale.ROOT);
    if (t.matches(".*\\b(light|lights|lighting|lamp|lamps|luminaire.*)\\b.*")) {
      return LoadCategory.LIGHTING;
    }
    if (t.matches(".*\\b(socket|sockets|outlet|outlets|receptacle.*|ring)\\b.*")) {
      return LoadCategory.SOCKET_OUTLETS;
    }
    if (t.matches(".*\\b(cooker|cooking|oven|ovens|hob|range)\\b.*")) {
      return LoadCategory.COOKING;
    }
    if (t.matches(".*\\b(clothes dry[ei]r|tumble dry[ei]r|dry[ei]r)\\b.*")
        && !t.matches(".*\\b(hand|hair) dry[ei]r\\b.*")) {
      return LoadCategory.CLOTHES_DRYER;
    }
    if (t.matches(".*\\b(shower|showers|instantaneous)\\b.*")) {
      return LoadCategory.WATER_HEATING_INSTANTANEOUS;
    }
    if (t.matches(".*\\b(immersion|water heater|cylinder|boiler)\\b.*")) {
      return LoadCategory.WATER_HEATING_STORAGE;
    }
    if (t.matches(".*\\b(heater|heaters|heating|radiator.*)\\b.*")) {
      return LoadCategory.SPACE_HEATING;
    }
    if (t.matches(".*\\b(air conditioning|aircon|a/c|hvac|chiller)\\b.*")) {
      return LoadCategory.AIR_CONDITIONING;
    }
    if (t.matches(".*\\b(motor|pump|fan|compressor|lift)\\b.*")) {
      return LoadCategory.MOTOR;
    }
    if (t.matches(".*\\b(ev|charger|charging)\\b.*")) {
      return LoadCategory.EV_CHARGING;
    }
    if (t.matches(".*\\b(it|computer|computers|server|data)\\b.*")) {
      return LoadCategory.IT_SMALL_POWER;
    }
    return LoadCategory.OTHER;
  }

  // ---------------------------------------------------------------- cells

  /**
   * The cells of one row by field, and which column a derived value came from (for placing its
   * problems).
   */
  private static final class Cells {
    private final SheetTable.Row row;
    private final Map<ImportField, Integer> columnOf;
    private final Map<ImportField, ImportField> source = new EnumMap<>(ImportField.class);

    Cells(SheetTable.Row row, Map<ImportField, Integer> columnOf) {
      this.row = row;
      this.columnOf = columnOf;
    }

    String text(ImportField field) {
      Integer column = columnOf.get(field);
      return column == null ? "" : row.cell(column).strip();
    }

    boolean blank(ImportField field) {
      return text(field).isEmpty();
    }

    boolean anyFilled(ImportField... fields) {
      for (ImportField field : fields) {
        if (!blank(field)) {
          return true;
        }
      }
      return false;
    }

    void redirect(ImportField field, ImportField from) {
      source.put(field, from);
    }

    ImportField source(ImportField field) {
      return source.getOrDefault(field, field);
    }

    boolean hasError(List<ImportPlan.Problem> problems, ImportField field) {
      return problems.stream().anyMatch(p -> p.field() == field);
    }

    Double number(ImportField field, List<ImportPlan.Problem> problems) {
      String text = text(field);
      if (text.isEmpty()) {
        return null;
      }
      Double value = Numbers.parse(text);
      if (value == null) {
        problems.add(new ImportPlan.Problem(field, "import.cell.notNumber", new Object[] {text}));
      }
      return value;
    }

    /**
     * A conductor size, mm²: from the mm² column as a number (a value written in AWG or kcmil there
     * is refused, never read as mm²), or from the AWG/kcmil column as one of the NEC sizes, stored
     * as its area ("13 AWG" or "2.5" there is refused).
     */
    Double size(ImportField metric, ImportField awg, List<ImportPlan.Problem> problems) {
      String awgText = text(awg);
      if (!awgText.isEmpty()) {
        if (!blank(metric)) {
          problems.add(new ImportPlan.Problem(awg, "import.cell.sizeTwice", new Object[0]));
          return null;
        }
        redirect(metric, awg);
        Optional<Double> area = CableUnits.squareMillimetresOfAwg(awgText);
        if (area.isEmpty()) {
          problems.add(new ImportPlan.Problem(awg, "import.cell.notAwg", new Object[] {awgText}));
          return null;
        }
        return area.get();
      }
      String metricText = text(metric);
      if (CableUnits.looksLikeAwg(metricText)) {
        problems.add(
            new ImportPlan.Problem(metric, "import.cell.awgInMm2", new Object[] {metricText}));
        return null;
      }
      return number(metric, problems);
    }

    /**
     * A cable length, metres: from the metres column, or from the feet column at 0.3048 m per foot.
     * A value whose own unit contradicts its column ("50 ft" under metres, "15 m" under feet) is
     * refused rather than read in the column's unit.
     */
    Double length(List<ImportPlan.Problem> problems) {
      String feetText = text(ImportField.LENGTH_FEET);
      if (!feetText.isEmpty()) {
        if (!blank(LENGTH_METRES)) {
          problems.add(
              new ImportPlan.Problem(
                  ImportField.LENGTH_FEET, "import.cell.lengthTwice", new Object[0]));
          return null;
        }
        redirect(LENGTH_METRES, ImportField.LENGTH_FEET);
        if (!FEET_MARK.matcher(feetText).find() && METRE_MARK.matcher(feetText).find()) {
          problems.add(
              new ImportPlan.Problem(
                  ImportField.LENGTH_FEET, "import.cell.metresInFeet", new Object[] {feetText}));
          return null;
        }
        Double feet = number(ImportField.LENGTH_FEET, problems);
        return feet == null ? null : CableUnits.metresOfFeet(feet);
      }
      String metresText = text(LENGTH_METRES);
      if (FEET_MARK.matcher(metresText).find()) {
        problems.add(
            new ImportPlan.Problem(
                LENGTH_METRES, "import.cell.feetInMetres", new Object[] {metresText}));
        return null;
      }
      return number(LENGTH_METRES, problems);
    }

    private static final Pattern FEET_MARK =
        Pattern.compile("(?i)(\\d\\s*(ft|feet|foot)\\s*$|['′]\\s*$)");
    private static final Pattern METRE_MARK =
        Pattern.compile("(?i)\\d\\s*(m|metres?|meters?)\\s*$");

    Integer whole(ImportField field, List<ImportPlan.Problem> problems) {
      Double value = number(field, problems);
      if (value == null) {
        return null;
      }
      if (value != Math.rint(value) || Math.abs(value) > 1_000_000_000) {
        problems.add(
            new ImportPlan.Problem(field, "import.cell.notWhole", new Object[] {text(field)}));
        return null;
      }
      return value.intValue();
    }

    <E extends Enum<E>> E choice(
        ImportField field, Class<E> type, List<ImportPlan.Problem> problems) {
      String text = text(field);
      if (text.isEmpty()) {
        return null;
      }
      E value = Codes.parseEnum(type, text);
      if (value == null) {
        problems.add(
            new ImportPlan.Problem(
                field, "import.cell.unknownChoice", new Object[] {text, choices(type)}));
      }
      return value;
    }

    /** The conduit: its words with or without "conduit" ("Steel", "aluminum conduit"). */
    com.wayledger.engine.Conduit conduit(List<ImportPlan.Problem> problems) {
      String text = text(CONDUIT);
      if (text.isEmpty()) {
        return null;
      }
      com.wayledger.engine.Conduit value =
          Codes.parseEnum(
              com.wayledger.engine.Conduit.class,
              text.replaceAll("(?i)\\s*(conduit|raceway)\\s*$", ""));
      if (value == null) {
        value = choice(CONDUIT, com.wayledger.engine.Conduit.class, problems);
      }
      return value;
    }

    Boolean yes(ImportField field, List<ImportPlan.Problem> problems) {
      Boolean value = Codes.parseYes(text(field));
      if (value == null) {
        problems.add(
            new ImportPlan.Problem(field, "import.cell.unknownYes", new Object[] {text(field)}));
      }
      return value;
    }

    Boolean ring(List<ImportPlan.Problem> problems) {
      Boolean value = Codes.parseRing(text(RING));
      if (value == null) {
        problems.add(
            new ImportPlan.Problem(RING, "import.cell.unknownRing", new Object[] {text(RING)}));
      }
      return value;
    }

    private static String choices(Class<? extends Enum<?>> type) {
      return EnumWords.standard().choices(type);
    }
  }

  /** Numbers as people type them in sheets: "16", "16 A", "2,5 mm²", "0.95". */
  static final class Numbers {
    private static final Pattern NUMBER =
        Pattern.compile("^([-+]?\\d+(?:[.,]\\d+)?(?:[eE][-+]?\\d+)?)\\s*[a-zA-Z²Ω°%×µ]*\\s*$");

    private Numbers() {}

    static Double parse(String text) {
      Matcher m = NUMBER.matcher(text.strip());
      if (!m.matches()) {
        return null;
      }
      try {
        double value = Double.parseDouble(m.group(1).replace(',', '.'));
        return Double.isFinite(value) ? value : null;
      } catch (NumberFormatException e) {
        return null;
      }
    }
  }
}
