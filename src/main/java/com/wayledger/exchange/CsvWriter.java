package com.wayledger.exchange;

import static com.wayledger.exchange.ScheduleColumn.*;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.QuoteMode;

/**
 * Writes one board's schedule as CSV: a header row, then one row per load line with the same
 * columns as the workbook. Computed columns hold the engine's figures for each circuit, on its
 * first row, as plain numbers (CSV holds no formulas). User text that could start a formula is
 * prefixed with a single quote.
 */
public final class CsvWriter {

  private CsvWriter() {}

  /**
   * Writes the schedule, then a blank line and the caution. The importer stops reading our own
   * export at its first blank line, so the caution never becomes a row.
   */
  public static void write(ExportData data, BoardEntry board, String caution, Writer out)
      throws IOException {
    BoardFigures figures = new BoardFigures(board, data.demand(), data.findings());
    List<String> header = new ArrayList<>();
    for (ScheduleColumn column : ScheduleColumn.values()) {
      header.add(column.header(data.cableUnits()));
    }
    // not closed here: the caller owns the writer (a response stream, say)
    CSVPrinter printer =
        new CSVPrinter(
            out,
            CSVFormat.RFC4180
                .builder()
                .setHeader(header.toArray(String[]::new))
                // Every cell in quotes: a program that splits on ";" or a tab (common in locales
                // with a decimal comma) keeps "safe;=1+1" as one text cell instead of running
                // "=1+1" as a formula from the second half.
                .setQuoteMode(QuoteMode.ALL_NON_NULL)
                .get());
    {
      for (CircuitEntry entry : board.circuits()) {
        BoardFigures.CircuitFigures f = figures.circuit(entry.circuitId());
        List<LoadForm> loads =
            entry.loads().isEmpty() ? Collections.singletonList(null) : entry.loads();
        boolean first = true;
        for (LoadForm load : loads) {
          List<String> cells = row(board, entry.circuit(), load, f, first, data.cableUnits());
          cells.set(CIRCUIT_KEY.ordinal(), num(entry.circuitId()));
          cells.set(
              RECORD_VERSION.ordinal(), entry.recordVersion() == null ? "" : entry.recordVersion());
          printer.printRecord(cells);
          first = false;
        }
      }
    }
    printer.println();
    // what the schedule was checked against, as the workbook's facts row says it; the importer
    // reads it back (SystemInFile) and refuses a file of another rule set or supply system
    if (data.ruleSetTitle() != null) {
      printer.printRecord(
          SystemInFile.RULE_SET_LABEL,
          data.ruleSetTitle(),
          SystemInFile.SUPPLY_SYSTEM_LABEL,
          WorkbookWriter.systemWordsOf(
              data.demand() == null ? null : data.demand().board(board.id()), data));
    }
    // the caution stays the last line (the importer keeps the lines after the blank one apart)
    printer.printRecord("Caution: " + caution + " Checked against " + data.ruleSetTitle() + ".");
    printer.flush();
  }

  private static List<String> row(
      BoardEntry board,
      CircuitForm c,
      LoadForm l,
      BoardFigures.CircuitFigures f,
      boolean first,
      com.wayledger.engine.rules.CableUnits units) {
    String[] cells = new String[ScheduleColumn.values().length];
    cells[WAY.ordinal()] = num(c.wayNumber());
    cells[LINE.ordinal()] = Codes.line(c.position(), board::lineName);
    cells[CIRCUIT.ordinal()] = CellText.forCsv(c.description());
    cells[STATE.ordinal()] = Codes.state(c.status());
    cells[KEEP_LINE.ordinal()] = Codes.yes(Boolean.TRUE.equals(c.lockedForBalancing()));
    cells[DEVICE.ordinal()] = name(c.deviceKind());
    cells[CURVE.ordinal()] = name(c.deviceCurve());
    cells[RATING_AMPS.ordinal()] = num(c.deviceRatingAmps());
    cells[POLES.ordinal()] = num(c.devicePoles());
    cells[BREAKING_KILOAMPS.ordinal()] = num(c.deviceBreakingCapacityKiloAmps());
    cells[RESIDUAL_MILLIAMPS.ordinal()] = num(c.deviceResidualMilliAmps());
    cells[RCD_TYPE.ordinal()] = name(c.deviceRcdType());
    cells[OVERLOAD_SETTING_AMPS.ordinal()] = num(c.deviceOverloadSettingAmps());
    cells[INSTANTANEOUS_SETTING_AMPS.ordinal()] = num(c.deviceInstantaneousSettingAmps());
    cells[LINE_CSA.ordinal()] =
        units.awgAndFeet() ? units.sizeText(c.cableLineCsa()) : num(c.cableLineCsa());
    cells[CPC_CSA.ordinal()] =
        units.awgAndFeet() ? units.sizeText(c.cableCpcCsa()) : num(c.cableCpcCsa());
    cells[CONDUCTOR.ordinal()] = name(c.cableMaterial());
    cells[INSULATION.ordinal()] = name(c.cableInsulation());
    cells[LENGTH_METRES.ordinal()] = num(units.lengthInUnit(c.cableLengthMetres()));
    cells[RING.ordinal()] = Codes.yes(Boolean.TRUE.equals(c.ringFinal()));
    cells[INSTALLATION.ordinal()] = name(c.cableInstallationMethod());
    cells[AMBIENT_CELSIUS.ordinal()] = num(c.cableAmbientCelsius());
    cells[GROUPED.ordinal()] = num(c.cableGroupedCircuits());
    cells[THERMAL_INSULATION_MM.ordinal()] = num(c.cableThermalInsulationMm());
    cells[MEASURED_ZS.ordinal()] = num(c.measuredLoopImpedanceOhms());
    cells[LOCATION.ordinal()] = name(c.location());
    cells[CONNECTION.ordinal()] = Codes.connection(c.position());
    cells[FAULT_INTERRUPTER.ordinal()] = name(c.deviceFaultInterrupter());
    cells[CONDUIT.ordinal()] = name(c.cableConduit());
    if (l != null) {
      cells[LOAD.ordinal()] = CellText.forCsv(l.description());
      cells[CATEGORY.ordinal()] = name(l.category());
      cells[QUANTITY.ordinal()] = num(l.quantity());
      cells[RATING.ordinal()] = num(l.ratingValue());
      cells[UNIT.ordinal()] = name(l.ratingUnit());
      cells[POWER_FACTOR.ordinal()] = num(l.powerFactor());
      cells[SURGE_MULTIPLE.ordinal()] = num(l.startUpSurgeMultiple());
      cells[SURGE_MILLIS.ordinal()] = num(l.startUpSurgeMillis());
      cells[CONTINUOUS.ordinal()] = Codes.yes(l.continuous());
    }
    // CSV holds no formulas: the computed columns carry the circuit's own figures, on its first row
    // only
    if (first && f != null) {
      double dp = f.assessed() ? f.diversityActive() : 0.0;
      double dq = f.assessed() ? f.diversityReactive() : 0.0;
      cells[CONNECTED_KW.ordinal()] = fixed(f.ownConnectedWatts() / 1000.0, 3);
      cells[CONNECTED_KVAR.ordinal()] = fixed(f.ownConnectedVars() / 1000.0, 3);
      cells[DIVERSITY_P.ordinal()] = fixed(dp, 3);
      cells[DIVERSITY_Q.ordinal()] = fixed(dq, 3);
      cells[DEMAND_KW.ordinal()] = fixed(f.ownConnectedWatts() * dp / 1000.0, 3);
      cells[DEMAND_KVAR.ordinal()] = fixed(f.ownConnectedVars() * dq / 1000.0, 3);
      cells[IB_CONNECTED.ordinal()] = fixed(f.connectedCurrentAmps(), 1);
      cells[IB_DESIGN.ordinal()] = fixed(f.designCurrentAmps(), 1);
      cells[FINDINGS.ordinal()] = Integer.toString(f.problemFindings());
    }
    List<String> out = new ArrayList<>(cells.length);
    for (String cell : cells) {
      out.add(cell == null ? "" : cell);
    }
    return out;
  }

  private static String fixed(double value, int decimals) {
    return String.format(Locale.ROOT, "%." + decimals + "f", value);
  }

  static String num(Number value) {
    if (value == null) {
      return "";
    }
    double d = value.doubleValue();
    if (d == Math.rint(d) && Math.abs(d) < 1e15) {
      return Long.toString((long) d);
    }
    return Double.toString(d);
  }

  private static String name(Enum<?> value) {
    return value == null ? "" : Codes.word(value);
  }
}
