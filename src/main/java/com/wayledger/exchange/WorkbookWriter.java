package com.wayledger.exchange;

import static com.wayledger.exchange.ScheduleColumn.*;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.Phase;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.DemandSettings;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.zip.Deflater;
import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.ss.util.WorkbookUtil;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.streaming.SheetDataWriter;

/**
 * Writes schedules as an XLSX workbook with the streaming writer, so a site of thousands of
 * circuits is written in a bounded window of rows. Board sheets hold one row per load line (a
 * circuit without loads takes one row), input columns first and then computed columns whose per-row
 * figures, per-phase and board totals are live formulas; figures the rows cannot express (diversity
 * factors, sub-boards' demand) are written as values from the engine and named "at export".
 */
public final class WorkbookWriter {

  /** Rows kept in memory per sheet before they are flushed to disk. */
  private static final int WINDOW_ROWS = 200;

  static final int HEADER_ROW = 3;
  static final String SUMMARY_SHEET = "Summary";
  static final String FINDINGS_SHEET = "Findings";
  static final String METHODS_SHEET = "Methods";

  private final String caution;
  private final SheetWords words;

  /**
   * @param caution the caution printed on every sheet
   */
  public WorkbookWriter(String caution) {
    this(caution, SheetWords.base());
  }

  /**
   * @param caution the caution printed on every sheet
   * @param words the titles and labels people read, in the export's language
   */
  public WorkbookWriter(String caution, SheetWords words) {
    this.caution = caution;
    this.words = words;
  }

  private byte[] diagramPng;

  /** Adds a sheet with the site's single-line diagram (a PNG); null for none. */
  public WorkbookWriter withDiagram(byte[] png) {
    this.diagramPng = png;
    return this;
  }

  /** Where a board sheet's totals are, so that other sheets can refer to them. */
  record TotalsCells(
      String sheetName,
      String connectedKilowatts,
      String demandKilowatts,
      String highestPhaseAmps,
      double connectedKilowattsValue,
      double demandKilowattsValue,
      double highestPhaseAmpsValue) {}

  /**
   * Writes the workbook.
   *
   * @param data the boards to write and the site's figures
   * @param withSummary whether to add the site tree summary (a site export)
   * @param out where to write; not closed
   */
  public void write(ExportData data, boolean withSummary, OutputStream out) throws IOException {
    write(data, withSummary, List.of(), out);
  }

  /** Writes the workbook with other features' sheets appended (see {@link WorkbookSheet}). */
  public void write(
      ExportData data, boolean withSummary, List<WorkbookSheet> extraSheets, OutputStream out)
      throws IOException {
    SXSSFWorkbook workbook = new FastWorkbook(WINDOW_ROWS);
    try {
      WorkbookStyles styles = new WorkbookStyles(workbook);
      Set<String> names =
          new HashSet<>(
              Set.of(
                  SUMMARY_SHEET.toLowerCase(Locale.ROOT),
                  FINDINGS_SHEET.toLowerCase(Locale.ROOT),
                  METHODS_SHEET.toLowerCase(Locale.ROOT)));
      SXSSFSheet summary = withSummary ? workbook.createSheet(SUMMARY_SHEET) : null;
      Map<Long, TotalsCells> totals = new HashMap<>();
      // every board sheet's name and totals rows first, so a feeder row can refer to its
      // sub-board's sheet before that sheet is written
      Map<Long, SubBoardCells.TotalsLayout> layouts = new HashMap<>();
      for (BoardEntry board : data.boards()) {
        String name = uniqueName("Board " + board.reference(), names);
        layouts.put(
            board.id(),
            SubBoardCells.TotalsLayout.of(
                name, board, linesOf(board, data.demand().board(board.id()))));
      }
      for (BoardEntry board : data.boards()) {
        SXSSFSheet sheet = workbook.createSheet(layouts.get(board.id()).sheetName());
        BoardFigures figures = new BoardFigures(board, data.demand(), data.findings());
        totals.put(board.id(), writeBoard(sheet, board, figures, data, styles, layouts));
      }
      if (summary != null) {
        writeSummary(summary, data, totals, styles);
      }
      if (diagramPng != null) {
        DiagramSheet.write(workbook, uniqueName(DiagramSheet.NAME, names), diagramPng, caution);
      }
      List<FindingRow> findingRows = findingRows(data);
      if (!findingRows.isEmpty()) {
        writeFindings(workbook.createSheet(FINDINGS_SHEET), findingRows, data, styles);
      }
      writeMethods(workbook.createSheet(METHODS_SHEET), data, styles);
      for (WorkbookSheet extra : extraSheets) {
        if (extra.appliesTo(data)) {
          extra.write(workbook.createSheet(uniqueName(extra.name(), names)), data, caution);
        }
      }
      workbook.setForceFormulaRecalculation(true);
      workbook.write(out);
    } finally {
      workbook.close();
    }
  }

  /**
   * The streaming workbook with two speed-ups of the writing, which dominates a large export:
   * zipped at the fastest deflate level (the sheets' XML is highly repetitive, so the file grows by
   * about a quarter while zipping takes a fraction of the time), and text escaped in runs rather
   * than character by character.
   */
  private static final class FastWorkbook extends SXSSFWorkbook {
    FastWorkbook(int window) {
      super(window);
    }

    @Override
    protected SheetDataWriter createSheetDataWriter() throws IOException {
      return new RunEscapingSheetWriter();
    }

    @Override
    protected ZipArchiveOutputStream createArchiveOutputStream(OutputStream out) {
      ZipArchiveOutputStream zip = super.createArchiveOutputStream(out);
      zip.setLevel(Deflater.BEST_SPEED);
      return zip;
    }
  }

  /**
   * POI's sheet writer with its text escaping done in runs of plain characters (same output, see
   * {@link #escape}).
   */
  static final class RunEscapingSheetWriter extends SheetDataWriter {
    RunEscapingSheetWriter() throws IOException {
      super();
    }

    @Override
    protected void outputEscapedString(String text) throws IOException {
      escape(text, _out);
    }
  }

  /**
   * Writes text as POI's streaming writer escapes it (POI 5.5's {@code
   * SheetDataWriter.outputEscapedString}): {@code < > & "} as entities, tab, line feed, carriage
   * return and no-break space as character references, other control characters and U+FFFE/U+FFFF
   * as "?", everything else as it is; but plain runs are written whole instead of one character at
   * a time. {@code WorkbookWriterTests} compares both on awkward text.
   */
  static void escape(String text, Writer out) throws IOException {
    if (text == null) {
      return;
    }
    int length = text.length();
    int run = 0;
    for (int i = 0; i < length; i++) {
      char c = text.charAt(i);
      String replacement;
      switch (c) {
        case '<' -> replacement = "&lt;";
        case '>' -> replacement = "&gt;";
        case '&' -> replacement = "&amp;";
        case '"' -> replacement = "&quot;";
        case '\n' -> replacement = "&#xa;";
        case '\r' -> replacement = "&#xd;";
        case '\t' -> replacement = "&#x9;";
        case '\u00a0' -> replacement = "&#xa0;";
        default -> replacement = c < ' ' || c >= '\ufffe' ? "?" : null;
      }
      if (replacement != null) {
        out.write(text, run, i - run);
        out.write(replacement);
        run = i + 1;
      }
    }
    out.write(text, run, length - run);
  }

  static String uniqueName(String wanted, Set<String> taken) {
    String base = WorkbookUtil.createSafeSheetName(xmlSafe(wanted), '_');
    String name = base;
    for (int n = 2; taken.contains(name.toLowerCase(Locale.ROOT)); n++) {
      String suffix = " (" + n + ")";
      name = base.substring(0, Math.min(base.length(), 31 - suffix.length())) + suffix;
    }
    taken.add(name.toLowerCase(Locale.ROOT));
    return name;
  }

  /**
   * A sheet name goes into workbook.xml as an attribute, outside the cell escaping: characters XML
   * 1.0 cannot hold (control characters, U+FFFE/U+FFFF, half surrogate pairs) become "_", and so do
   * text-direction controls, which would make the tab read differently than the board reference.
   */
  static String xmlSafe(String text) {
    if (text == null) {
      return "";
    }
    StringBuilder out = new StringBuilder(text.length());
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      boolean lonelySurrogate =
          Character.isHighSurrogate(c)
                  && (i + 1 >= text.length() || !Character.isLowSurrogate(text.charAt(i + 1)))
              || Character.isLowSurrogate(c)
                  && (i == 0 || !Character.isHighSurrogate(text.charAt(i - 1)));
      boolean direction = (c >= '\u202a' && c <= '\u202e') || (c >= '\u2066' && c <= '\u2069');
      out.append(
          Character.isISOControl(c) || c >= '\ufffe' || lonelySurrogate || direction ? '_' : c);
    }
    return out.toString();
  }

  // ---------------------------------------------------------------- board sheet

  private TotalsCells writeBoard(
      SXSSFSheet sheet,
      BoardEntry board,
      BoardFigures figures,
      ExportData data,
      WorkbookStyles styles,
      Map<Long, SubBoardCells.TotalsLayout> layouts) {
    Widths widths = new Widths(ScheduleColumn.values().length);
    BoardDemand demand = figures.demand();
    double u0 = demand != null ? demand.nominalVoltageVolts() : data.demand().nominalVoltageVolts();

    Row title = sheet.createRow(0);
    text(
        title,
        0,
        words.of("workbook.title.board", board.reference(), data.siteName()),
        styles.title,
        null);
    Row facts = sheet.createRow(1);
    text(facts, 0, "U0 V", styles.label, null);
    number(facts, 1, u0, styles.number, null);
    text(facts, 2, words.of("workbook.fact.lines"), styles.label, null);
    // lines as the totals count them: 2 on a 120/240 V or 120/208 V panel stored single-phase
    number(facts, 3, linesOf(board, demand), styles.integer, null);
    text(facts, 4, words.of("workbook.fact.ways"), styles.label, null);
    number(facts, 5, board.wayCount(), styles.integer, null);
    text(facts, 6, words.of("workbook.fact.exported"), styles.label, null);
    text(facts, 7, data.exportedOn().toString(), styles.text, null);
    text(facts, 8, words.of("workbook.fact.diversity"), styles.label, null);
    text(
        facts,
        9,
        demand == null ? words.of("workbook.fact.notAssessed") : demand.methodName(),
        styles.text,
        null);
    text(facts, 13, words.of("workbook.fact.ruleSet"), styles.label, null);
    text(facts, 14, data.ruleSetTitle(), styles.text, null);
    text(facts, 15, words.of("workbook.fact.supplySystem"), styles.label, null);
    // the board's own supply system (a second service, a 120/208 V panel) where it has one
    text(facts, 16, systemWordsOf(demand, data), styles.text, null);
    text(facts, 11, words.of("workbook.fact.fedFrom"), styles.label, null);
    text(
        facts,
        12,
        board.parentReference() == null
            ? words.of("workbook.fact.origin")
            : board.parentReference(),
        styles.text,
        null);
    text(sheet.createRow(2), 0, words.of("workbook.caution", caution), styles.caution, null);

    Row header = sheet.createRow(HEADER_ROW);
    for (ScheduleColumn column : ScheduleColumn.values()) {
      text(header, column.ordinal(), column.header(data.cableUnits()), styles.header, widths);
    }

    int firstData = HEADER_ROW + 1;
    int rowIndex = firstData;
    int lastData = firstData + Math.max(1, countRows(board)) - 1;
    String u0Cell = "$B$2";
    int lineCount = linesOf(board, demand);
    com.wayledger.engine.SupplySystem system = systemOf(board, demand);
    CachedResults cache = new CachedResults(u0, system, lineCount);
    // volt-amperes per ampere of a two-pole row: the line-to-line voltage over U0
    double lineToLine = lineCount == 1 ? 1.0 : system.lineToLineFactor();
    List<SubBoardCells> carried = new ArrayList<>();
    for (CircuitEntry entry : board.circuits()) {
      BoardFigures.CircuitFigures circuitFigures = figures.circuit(entry.circuitId());
      List<LoadForm> loads =
          entry.loads().isEmpty() ? java.util.Collections.singletonList(null) : entry.loads();
      com.wayledger.engine.PhasePosition position = entry.circuit().position();
      SubBoardCells subBoard =
          circuitFigures == null || circuitFigures.carriedBoard() == null
              ? null
              : new SubBoardCells(
                  circuitFigures.carriedBoard(),
                  layouts.get(circuitFigures.carriedBoard().boardId()),
                  position,
                  cache);
      double circuitKw = subBoard == null ? 0 : subBoard.connectedKilowattsValue();
      double circuitKvar = subBoard == null ? 0 : subBoard.connectedKilovarsValue();
      for (LoadForm load : loads) {
        CachedResults.RowPower power = cache.rowPower(load, position);
        circuitKw += power.kilowatts();
        circuitKvar += power.kilovars();
      }
      double circuitAmps = cache.circuitCurrentAmps(circuitKw, circuitKvar, position);
      boolean first = true;
      for (LoadForm load : loads) {
        Row row = sheet.createRow(rowIndex);
        writeCircuitCells(row, board, entry.circuit(), data.cableUnits(), styles, widths);
        writeRecordCells(row, entry, styles, widths);
        if (load != null) {
          writeLoadCells(row, load, styles, widths);
        }
        CachedResults.RowPower power = cache.rowPower(load, position);
        SubBoardCells onRow = first ? subBoard : null;
        double[] diversity =
            writeComputedCells(
                row,
                rowIndex + 1,
                first,
                circuitFigures,
                onRow,
                entry.loads().isEmpty(),
                u0Cell,
                lineToLine,
                firstData + 1,
                lastData + 1,
                power,
                circuitAmps,
                styles,
                widths);
        cache.add(power, diversity[0], diversity[1], position);
        if (onRow != null) {
          cache.add(
              onRow.connectedKilowattsValue(),
              onRow.connectedKilovarsValue(),
              onRow.demandKilowattsValue(),
              onRow.demandKilovarsValue(),
              position);
          carried.add(onRow);
        }
        first = false;
        rowIndex++;
      }
    }
    if (rowIndex == firstData) {
      rowIndex++; // an empty board keeps one blank data row so the ranges stay valid
    }
    sheet.setAutoFilter(
        new CellRangeAddress(HEADER_ROW, lastData, 0, ScheduleColumn.values().length - 1));
    TotalsCells cells =
        writeTotals(
            sheet,
            board,
            figures,
            carried,
            lineCount,
            rowIndex + 1,
            firstData + 1,
            lastData + 1,
            cache,
            styles,
            widths);

    widths.apply(sheet);
    sheet.createFreezePane(3, HEADER_ROW + 1);
    printSetup(sheet, data.siteName() + " — board " + board.reference(), data, HEADER_ROW);
    return cells;
  }

  private static int countRows(BoardEntry board) {
    int rows = 0;
    for (CircuitEntry entry : board.circuits()) {
      rows += Math.max(1, entry.loads().size());
    }
    return rows;
  }

  private static void writeCircuitCells(
      Row row,
      BoardEntry board,
      CircuitForm c,
      com.wayledger.engine.rules.CableUnits units,
      WorkbookStyles s,
      Widths w) {
    number(row, WAY.ordinal(), c.wayNumber(), s.integer, w);
    text(row, LINE.ordinal(), Codes.line(c.position(), board::lineName), s.text, w);
    text(row, CIRCUIT.ordinal(), c.description(), s.text, w);
    text(row, STATE.ordinal(), Codes.state(c.status()), s.text, w);
    text(
        row,
        KEEP_LINE.ordinal(),
        Codes.yes(Boolean.TRUE.equals(c.lockedForBalancing())),
        s.text,
        w);
    text(row, DEVICE.ordinal(), name(c.deviceKind()), s.text, w);
    text(row, CURVE.ordinal(), name(c.deviceCurve()), s.text, w);
    number(row, RATING_AMPS.ordinal(), c.deviceRatingAmps(), s.number, w);
    number(row, POLES.ordinal(), c.devicePoles(), s.integer, w);
    number(row, BREAKING_KILOAMPS.ordinal(), c.deviceBreakingCapacityKiloAmps(), s.number, w);
    number(row, RESIDUAL_MILLIAMPS.ordinal(), c.deviceResidualMilliAmps(), s.number, w);
    text(row, RCD_TYPE.ordinal(), name(c.deviceRcdType()), s.text, w);
    number(row, OVERLOAD_SETTING_AMPS.ordinal(), c.deviceOverloadSettingAmps(), s.number, w);
    number(
        row, INSTANTANEOUS_SETTING_AMPS.ordinal(), c.deviceInstantaneousSettingAmps(), s.number, w);
    if (units.awgAndFeet()) { // sizes as the trade writes them: "12 AWG", "250 kcmil"
      text(row, LINE_CSA.ordinal(), units.sizeText(c.cableLineCsa()), s.text, w);
      text(row, CPC_CSA.ordinal(), units.sizeText(c.cableCpcCsa()), s.text, w);
    } else {
      number(row, LINE_CSA.ordinal(), c.cableLineCsa(), s.number, w);
      number(row, CPC_CSA.ordinal(), c.cableCpcCsa(), s.number, w);
    }
    text(row, CONDUCTOR.ordinal(), name(c.cableMaterial()), s.text, w);
    text(row, INSULATION.ordinal(), name(c.cableInsulation()), s.text, w);
    number(row, LENGTH_METRES.ordinal(), units.lengthInUnit(c.cableLengthMetres()), s.number, w);
    text(row, RING.ordinal(), Codes.yes(Boolean.TRUE.equals(c.ringFinal())), s.text, w);
    text(row, INSTALLATION.ordinal(), name(c.cableInstallationMethod()), s.text, w);
    number(row, AMBIENT_CELSIUS.ordinal(), c.cableAmbientCelsius(), s.number, w);
    number(row, GROUPED.ordinal(), c.cableGroupedCircuits(), s.integer, w);
    number(row, THERMAL_INSULATION_MM.ordinal(), c.cableThermalInsulationMm(), s.integer, w);
    number(row, MEASURED_ZS.ordinal(), c.measuredLoopImpedanceOhms(), s.ohms, w);
    text(row, LOCATION.ordinal(), name(c.location()), s.text, w);
    text(row, CONNECTION.ordinal(), Codes.connection(c.position()), s.text, w);
    text(row, FAULT_INTERRUPTER.ordinal(), name(c.deviceFaultInterrupter()), s.text, w);
    text(row, CONDUIT.ordinal(), name(c.cableConduit()), s.text, w);
  }

  /**
   * The circuit's key and edition on each of its rows: an import into the same board matches rows
   * to circuits by them and refuses to overwrite a circuit changed since the export.
   */
  private static void writeRecordCells(Row row, CircuitEntry entry, WorkbookStyles s, Widths w) {
    number(row, CIRCUIT_KEY.ordinal(), entry.circuitId(), s.integer, w);
    if (entry.recordVersion() != null) {
      text(row, RECORD_VERSION.ordinal(), entry.recordVersion(), s.text, w);
    }
  }

  private static void writeLoadCells(Row row, LoadForm l, WorkbookStyles s, Widths w) {
    text(row, LOAD.ordinal(), l.description(), s.text, w);
    text(row, CATEGORY.ordinal(), name(l.category()), s.text, w);
    number(row, QUANTITY.ordinal(), l.quantity(), s.integer, w);
    number(row, RATING.ordinal(), l.ratingValue(), s.number, w);
    text(row, UNIT.ordinal(), name(l.ratingUnit()), s.text, w);
    number(row, POWER_FACTOR.ordinal(), l.powerFactor(), s.number, w);
    number(row, SURGE_MULTIPLE.ordinal(), l.startUpSurgeMultiple(), s.number, w);
    number(row, SURGE_MILLIS.ordinal(), l.startUpSurgeMillis(), s.number, w);
    text(row, CONTINUOUS.ordinal(), Codes.yes(l.continuous()), s.text, w);
    number(row, MOTOR_HP.ordinal(), l.motorHorsepower(), s.number, w);
  }

  /** Writes a row's computed cells; returns the diversity factors written (active, reactive). */
  private static double[] writeComputedCells(
      Row row,
      int r,
      boolean firstOfCircuit,
      BoardFigures.CircuitFigures figures,
      SubBoardCells subBoard,
      boolean noLoadsOfItsOwn,
      String u0,
      double lineToLine,
      int from,
      int to,
      CachedResults.RowPower power,
      double circuitAmps,
      WorkbookStyles s,
      Widths w) {
    String qty = ref(QUANTITY, r);
    String rating = ref(RATING, r);
    String unit = ref(UNIT, r);
    String pf = ref(POWER_FACTOR, r);
    String line = ref(LINE, r);
    // U0 line to neutral, the line-to-line voltage on two poles ("A-B"), 3·U0 on three
    String perLine =
        u0
            + "*IF("
            + line
            + "=\""
            + THREE_POLE_CODE
            + "\",3,IF(ISNUMBER(SEARCH(\"-\","
            + line
            + ")),"
            + SubBoardCells.literal(lineToLine)
            + ",1))";
    String blank = "OR(" + rating + "=\"\"," + qty + "=\"\"," + pf + "=\"\")";
    formula(
        row,
        CONNECTED_KW.ordinal(),
        "IF("
            + blank
            + ",0,"
            + qty
            + "*"
            + rating
            + "*IF("
            + unit
            + "=\"W\",1,IF("
            + unit
            + "=\"VA\","
            + pf
            + ","
            + perLine
            + "*"
            + pf
            + "))/1000)"
            + (subBoard == null ? "" : "+" + subBoard.connectedKilowatts()),
        power.kilowatts() + (subBoard == null ? 0 : subBoard.connectedKilowattsValue()),
        s.kilowatts,
        w);
    formula(
        row,
        CONNECTED_KVAR.ordinal(),
        "IF("
            + blank
            + ",0,"
            + qty
            + "*"
            + rating
            + "*IF("
            + unit
            + "=\"W\",1/"
            + pf
            + ",IF("
            + unit
            + "=\"VA\",1,"
            + perLine
            + "))*SQRT(1-"
            + pf
            + "^2)/1000)"
            + (subBoard == null ? "" : "+" + subBoard.connectedKilovars()),
        power.kilovars() + (subBoard == null ? 0 : subBoard.connectedKilovarsValue()),
        s.kilowatts,
        w);
    double diversityP =
        figures == null ? 1.0 : figures.assessed() ? figures.diversityActive() : 0.0;
    double diversityQ =
        figures == null ? 1.0 : figures.assessed() ? figures.diversityReactive() : 0.0;
    number(row, DIVERSITY_P.ordinal(), diversityP, s.factor, w);
    number(row, DIVERSITY_Q.ordinal(), diversityQ, s.factor, w);
    if (subBoard == null) {
      formula(
          row,
          DEMAND_KW.ordinal(),
          ref(CONNECTED_KW, r) + "*" + ref(DIVERSITY_P, r),
          power.kilowatts() * diversityP,
          s.kilowatts,
          w);
      formula(
          row,
          DEMAND_KVAR.ordinal(),
          ref(CONNECTED_KVAR, r) + "*" + ref(DIVERSITY_Q, r),
          power.kilovars() * diversityQ,
          s.kilowatts,
          w);
    } else {
      // the way's own loads after its factors, plus the sub-board's demand times its coincidence
      formula(
          row,
          DEMAND_KW.ordinal(),
          "("
              + ref(CONNECTED_KW, r)
              + "-"
              + subBoard.connectedKilowatts()
              + ")*"
              + ref(DIVERSITY_P, r)
              + "+"
              + subBoard.demandKilowatts(),
          power.kilowatts() * diversityP + subBoard.demandKilowattsValue(),
          s.kilowatts,
          w);
      formula(
          row,
          DEMAND_KVAR.ordinal(),
          "("
              + ref(CONNECTED_KVAR, r)
              + "-"
              + subBoard.connectedKilovars()
              + ")*"
              + ref(DIVERSITY_Q, r)
              + "+"
              + subBoard.demandKilovars(),
          power.kilovars() * diversityQ + subBoard.demandKilovarsValue(),
          s.kilowatts,
          w);
    }
    double[] diversity = {diversityP, diversityQ};
    if (!firstOfCircuit) {
      return diversity;
    }
    String way = ref(WAY, r);
    String p =
        "SUMIFS("
            + range(CONNECTED_KW, from, to)
            + ","
            + range(WAY, from, to)
            + ","
            + way
            + ","
            + range(LINE, from, to)
            + ","
            + line
            + ")";
    String q =
        "SUMIFS("
            + range(CONNECTED_KVAR, from, to)
            + ","
            + range(WAY, from, to)
            + ","
            + way
            + ","
            + range(LINE, from, to)
            + ","
            + line
            + ")";
    formula(
        row,
        IB_CONNECTED.ordinal(),
        "SQRT(" + p + "^2+" + q + "^2)*1000/(" + perLine + ")",
        circuitAmps,
        s.amps,
        w);
    if (figures != null && subBoard != null && noLoadsOfItsOwn) {
      // a feeder's Ib is the sub-board's heaviest line after coincidence: live from its sheet
      formula(
          row,
          IB_DESIGN.ordinal(),
          subBoard.designCurrentAmps(perLine),
          figures.designCurrentAmps(),
          s.amps,
          w);
    } else if (figures != null) {
      number(row, IB_DESIGN.ordinal(), figures.designCurrentAmps(), s.amps, w);
    }
    if (figures != null) {
      number(row, FINDINGS.ordinal(), figures.problemFindings(), s.integer, w);
    }
    return diversity;
  }

  private TotalsCells writeTotals(
      SXSSFSheet sheet,
      BoardEntry board,
      BoardFigures figures,
      List<SubBoardCells> carried,
      int lineCount,
      int startRow,
      int from,
      int to,
      CachedResults cache,
      WorkbookStyles s,
      Widths w) {
    String[] heads = {
      "Totals",
      "Connected kW",
      "Connected kvar",
      "Connected A",
      "Demand kW",
      "Demand kvar",
      "Demand A",
      "Sub-board line share kW",
      "Sub-board line share kvar",
      "Allowance kW (at export)",
      "Incomer trips at A (at export)",
      "Headroom A",
      "Loading %"
    };
    Row head = sheet.createRow(startRow);
    for (int i = 0; i < heads.length; i++) {
      text(head, i, heads[i], s.header, null);
    }
    List<Phase> lines = List.of(Phase.values()).subList(0, lineCount);
    int first = startRow + 2; // Excel row of the first phase line
    int r = first;
    double sumConnectedKw = 0;
    double sumConnectedKvar = 0;
    double sumDemandKw = 0;
    double sumDemandKvar = 0;
    double highestAmps = 0;
    List<Double> lineAmps = new java.util.ArrayList<>();
    for (Phase phase : lines) {
      Row row = sheet.createRow(r - 1);
      text(row, 0, lineCount > 1 ? board.lineName(phase) : "L–N", s.label, null);
      // feeder rows carry their sub-boards' load (a three-pole way a third on each line); a
      // three-line sub-board on a three-pole way carries its lines as they are, hence the shares
      double connectedKw = cache.connectedKilowatts(phase);
      double connectedKvar = cache.connectedKilovars(phase);
      StringBuilder shareKw = new StringBuilder();
      StringBuilder shareKvar = new StringBuilder();
      double shareKwValue = 0;
      double shareKvarValue = 0;
      for (SubBoardCells sub : carried) {
        if (sub.carriesLinesAsTheyAre() && sub.feeds(phase)) {
          shareKw.append(shareKw.isEmpty() ? "" : "+").append(sub.lineShareKilowatts(phase));
          shareKvar.append(shareKvar.isEmpty() ? "" : "+").append(sub.lineShareKilovars(phase));
          shareKwValue += sub.lineShareKilowattsValue(phase);
          shareKvarValue += sub.lineShareKilovarsValue(phase);
        }
      }
      double demandKw =
          cache.demandKilowatts(phase) + shareKwValue + figures.allowanceWattsPerLine() / 1000.0;
      double demandKvar = cache.demandKilovars(phase) + shareKvarValue;
      double demandAmps = cache.amps(demandKw, demandKvar);
      formula(
          row,
          1,
          lineSum(CONNECTED_KW, CONNECTED_KVAR, false, phase, board, cache, lineCount, from, to),
          connectedKw,
          s.kilowatts,
          null);
      formula(
          row,
          2,
          lineSum(CONNECTED_KW, CONNECTED_KVAR, true, phase, board, cache, lineCount, from, to),
          connectedKvar,
          s.kilowatts,
          null);
      formula(
          row,
          3,
          "SQRT(B" + r + "^2+C" + r + "^2)*1000/$B$2",
          cache.amps(connectedKw, connectedKvar),
          s.amps,
          null);
      if (shareKw.isEmpty()) {
        number(row, 7, 0.0, s.kilowatts, null);
        number(row, 8, 0.0, s.kilowatts, null);
      } else {
        formula(row, 7, shareKw.toString(), shareKwValue, s.kilowatts, null);
        formula(row, 8, shareKvar.toString(), shareKvarValue, s.kilowatts, null);
      }
      number(row, 9, figures.allowanceWattsPerLine() / 1000.0, s.kilowatts, null);
      formula(
          row,
          4,
          lineSum(DEMAND_KW, DEMAND_KVAR, false, phase, board, cache, lineCount, from, to)
              + "+H"
              + r
              + "+J"
              + r,
          demandKw,
          s.kilowatts,
          null);
      formula(
          row,
          5,
          lineSum(DEMAND_KW, DEMAND_KVAR, true, phase, board, cache, lineCount, from, to)
              + "+I"
              + r,
          demandKvar,
          s.kilowatts,
          null);
      formula(row, 6, "SQRT(E" + r + "^2+F" + r + "^2)*1000/$B$2", demandAmps, s.amps, null);
      // headroom and loading against the rating that trips the incomer (Ir, or In), as the page
      Double trips = tripRatingAmps(figures.demand());
      if (trips == null) {
        text(row, 10, "not assessed — missing incomer rating", s.text, null);
      } else {
        number(row, 10, trips, s.amps, null);
        formula(row, 11, "K" + r + "-G" + r, trips - demandAmps, s.amps, null);
        formula(row, 12, "100*G" + r + "/K" + r, 100 * demandAmps / trips, s.percent, null);
      }
      sumConnectedKw += connectedKw;
      sumConnectedKvar += connectedKvar;
      sumDemandKw += demandKw;
      sumDemandKvar += demandKvar;
      highestAmps = Math.max(highestAmps, demandAmps);
      lineAmps.add(demandAmps);
      r++;
    }
    int last = r - 1;
    Row total = sheet.createRow(r - 1);
    text(total, 0, "Board", s.totalLabel, null);
    double totalConnectedKw = sumConnectedKw;
    formula(
        total, 1, "SUM(B" + first + ":B" + last + ")", totalConnectedKw, s.totalKilowatts, null);
    formula(
        total, 2, "SUM(C" + first + ":C" + last + ")", sumConnectedKvar, s.totalKilowatts, null);
    formula(total, 4, "SUM(E" + first + ":E" + last + ")", sumDemandKw, s.totalKilowatts, null);
    formula(total, 5, "SUM(F" + first + ":F" + last + ")", sumDemandKvar, s.totalKilowatts, null);
    formula(total, 6, "MAX(G" + first + ":G" + last + ")", highestAmps, s.totalAmps, null);
    text(total, 7, "← highest phase A", s.text, null);
    int totalRow = r++;
    if (lineCount > 1) {
      Row unbalance = sheet.createRow(r - 1);
      text(unbalance, 0, "Unbalance %", s.label, null);
      String mean = "AVERAGE(G" + first + ":G" + last + ")";
      double meanAmps = lineAmps.stream().mapToDouble(Double::doubleValue).average().orElse(0);
      double deviation = lineAmps.stream().mapToDouble(a -> Math.abs(a - meanAmps)).max().orElse(0);
      StringBuilder deviations = new StringBuilder();
      for (int line = first; line <= last; line++) {
        deviations.append(line == first ? "" : ",").append("ABS(G" + line + "-" + mean + ")");
      }
      formula(
          unbalance,
          6,
          "IF(" + mean + "<=0,0,100*MAX(" + deviations + ")/" + mean + ")",
          meanAmps <= 0 ? 0 : 100 * deviation / meanAmps,
          s.percent,
          null);
      r++;
    }
    Row note = sheet.createRow(r);
    text(
        note,
        0,
        "Demand per row = connected × the circuit's diversity factors as worked out at export; change a load and the totals follow, "
            + "but only a fresh export re-applies the diversity method (see the Methods sheet).",
        s.caution,
        null);
    String quoted = "'" + sheet.getSheetName().replace("'", "''") + "'!";
    return new TotalsCells(
        sheet.getSheetName(),
        quoted + "$B$" + totalRow,
        quoted + "$E$" + totalRow,
        quoted + "$G$" + totalRow,
        totalConnectedKw,
        sumDemandKw,
        highestAmps);
  }

  /** The incomer rating that trips (Ir for a moulded-case breaker, In otherwise); null if none. */
  private static Double tripRatingAmps(BoardDemand demand) {
    if (demand == null || demand.incomer() == null) {
      return null;
    }
    Double rating = demand.incomer().ratingAmps();
    return rating != null && rating > 0 ? rating : null;
  }

  /**
   * A line's P (or Q) total over the rows, landing as the engine lands them: the line's own rows, a
   * third of each three-pole row, and each two-pole row on the line by its phasor shares (S/2 per
   * line on a split-phase board; S/√3 at ∓30° on a wye, which mixes P and Q), see {@link
   * com.wayledger.engine.LinePhasors#add}. A single-line board sums every row.
   */
  private static String lineSum(
      ScheduleColumn active,
      ScheduleColumn reactive,
      boolean wantReactive,
      Phase phase,
      BoardEntry board,
      CachedResults cache,
      int lineCount,
      int from,
      int to) {
    ScheduleColumn own = wantReactive ? reactive : active;
    if (lineCount == 1) {
      return "SUM(" + range(own, from, to) + ")";
    }
    StringBuilder sum = new StringBuilder("(" + sumIf(own, board.lineName(phase), from, to));
    if (lineCount == 3) {
      sum.append("+").append(sumIf(own, THREE_POLE_CODE, from, to)).append("/3");
    }
    for (com.wayledger.engine.PhasePosition pair :
        com.wayledger.engine.PhasePosition.onBoardWith(lineCount, true)) {
      if (!pair.isLineToLine() || !pair.phases().contains(phase)) {
        continue;
      }
      double[] share = cache.lineShares(pair)[phase.ordinal()];
      String code = Codes.line(pair, board::lineName);
      double fromP = wantReactive ? share[2] : share[0];
      double fromQ = wantReactive ? share[3] : share[1];
      for (Object[] term : new Object[][] {{active, fromP}, {reactive, fromQ}}) {
        double factor = (double) term[1];
        if (Math.abs(factor) > 1e-12) {
          sum.append("+")
              .append(SubBoardCells.literal(factor))
              .append("*")
              .append(sumIf((ScheduleColumn) term[0], code, from, to));
        }
      }
    }
    return sum.append(")").toString();
  }

  private static String sumIf(ScheduleColumn column, String line, int from, int to) {
    return "SUMIFS(" + range(column, from, to) + "," + range(LINE, from, to) + ",\"" + line + "\")";
  }

  /**
   * The board's number of lines as the engine counts them (2 on a single-phase three-wire board).
   */
  static int linesOf(BoardEntry board, BoardDemand demand) {
    return demand != null && demand.lines() > 0 ? demand.lines() : board.isThreePhase() ? 3 : 1;
  }

  /**
   * The board's phases as the trade counts them: 1 on a single-phase three-wire panel (120/240 V or
   * 120/208 V, two lines and a neutral), 3 on a three-line board, 1 on a single-line one.
   */
  static int phasesOf(BoardEntry board, BoardDemand demand) {
    if (demand != null && demand.system() != null && demand.system().hasTwoLines()) {
      return 1;
    }
    return linesOf(board, demand) == 3 ? 3 : 1;
  }

  /** The board's own supply system in words where it has one, else the site's ("" when none). */
  static String systemWordsOf(BoardDemand demand, ExportData data) {
    if (demand != null && demand.system() != null) {
      return com.wayledger.system.EnumWords.standard().of(demand.system());
    }
    return data.supplySystemWords() == null ? "" : data.supplySystemWords();
  }

  private static com.wayledger.engine.SupplySystem systemOf(BoardEntry board, BoardDemand demand) {
    return demand != null && demand.system() != null
        ? demand.system()
        : com.wayledger.engine.LinePhasors.geometryOf(linesOf(board, demand));
  }

  // ---------------------------------------------------------------- other sheets

  private void writeSummary(
      SXSSFSheet sheet, ExportData data, Map<Long, TotalsCells> totals, WorkbookStyles s) {
    Widths w = new Widths(12);
    text(sheet.createRow(0), 0, words.of("workbook.title.site", data.siteName()), s.title, null);
    Row facts = sheet.createRow(1);
    text(facts, 0, words.of("workbook.fact.earthing"), s.label, null);
    text(facts, 1, data.earthing(), s.text, null);
    text(facts, 2, words.of("workbook.fact.exported"), s.label, null);
    text(facts, 3, data.exportedOn().toString(), s.text, null);
    text(facts, 4, words.of("workbook.fact.ruleSet"), s.label, null);
    text(facts, 5, data.ruleSetTitle(), s.text, null);
    text(facts, 6, words.of("workbook.fact.supplySystem"), s.label, null);
    text(facts, 7, data.supplySystemWords(), s.text, null);
    text(sheet.createRow(2), 0, words.of("workbook.caution", caution), s.caution, null);
    String[] heads = {
      "Board",
      "Location",
      "Fed from",
      "Phases",
      "Ways",
      "Circuits",
      "Connected kW",
      "Demand kW",
      "Highest phase A",
      "Incomer",
      "Unbalance %",
      "Not assessed",
      "Supply system"
    };
    Row head = sheet.createRow(HEADER_ROW);
    for (int i = 0; i < heads.length; i++) {
      text(head, i, heads[i], s.header, w);
    }
    int r = HEADER_ROW + 1;
    for (BoardEntry board : data.boards()) {
      Row row = sheet.createRow(r++);
      BoardDemand demand = data.demand().board(board.id());
      TotalsCells cells = totals.get(board.id());
      text(row, 0, "  ".repeat(board.depth()) + board.reference(), s.text, w);
      text(row, 1, board.location(), s.text, w);
      text(row, 2, board.parentReference() == null ? "origin" : board.parentReference(), s.text, w);
      number(row, 3, phasesOf(board, demand), s.integer, w);
      number(row, 4, board.wayCount(), s.integer, w);
      number(row, 5, board.circuits().size(), s.integer, w);
      formula(row, 6, cells.connectedKilowatts(), cells.connectedKilowattsValue(), s.kilowatts, w);
      formula(row, 7, cells.demandKilowatts(), cells.demandKilowattsValue(), s.kilowatts, w);
      formula(row, 8, cells.highestPhaseAmps(), cells.highestPhaseAmpsValue(), s.amps, w);
      text(row, 9, board.incomerLabel(), s.text, w);
      if (demand != null && demand.unbalancePercent() != null) {
        number(row, 10, demand.unbalancePercent(), s.percent, w);
      }
      text(
          row,
          11,
          demand == null ? "not assessed" : String.join("; ", demand.notAssessed()),
          s.text,
          w);
      text(row, 12, systemWordsOf(demand, data), s.text, w);
    }
    sheet.setAutoFilter(
        new CellRangeAddress(HEADER_ROW, Math.max(HEADER_ROW + 1, r - 1), 0, heads.length - 1));
    w.apply(sheet);
    sheet.createFreezePane(1, HEADER_ROW + 1);
    printSetup(sheet, data.siteName() + " — boards", data, HEADER_ROW);
  }

  /**
   * One row of the Findings sheet: a finding of the site, a board or one circuit ({@code way} set),
   * or the same "not assessed" finding of several circuits of a board gathered into one row ({@code
   * circuits} > 1, {@code ways} listing their ways); {@code title} is the check's title in the
   * board's words, as the board page names it.
   */
  record FindingRow(
      String board,
      Integer way,
      Finding finding,
      int circuits,
      String ways,
      String line,
      String circuit,
      String title) {

    FindingRow(
        String board, Integer way, Finding finding, int circuits, String ways, String title) {
      this(board, way, finding, circuits, ways, null, null, title);
    }
  }

  /**
   * Every danger, warning and advice in full, in board order; checks not assessed on a board's
   * circuits are gathered per board and reason (check, text, clause, remedy), one row naming how
   * many circuits and which ways, so that a site with thousands of circuits missing the same input
   * does not give thousands of identical rows, and still no "not assessed" is left out.
   */
  static List<FindingRow> findingRows(ExportData data) {
    List<FindingRow> rows = new ArrayList<>();
    if (data.findings() == null) {
      return rows;
    }
    Set<Long> written = new HashSet<>();
    for (BoardEntry board : data.boards()) {
      written.add(board.id());
    }
    for (Finding finding : data.findings().siteFindings()) {
      if (finding.verdict() != Verdict.PASS) {
        rows.add(
            new FindingRow(
                "origin",
                null,
                finding,
                0,
                null,
                finding.check().title(data.findings().originWords())));
      }
    }
    for (BoardFindings board : data.findings().boards()) {
      if (!written.contains(board.boardId())) {
        continue;
      }
      for (Finding finding : board.findings()) {
        if (finding.verdict() != Verdict.PASS) {
          rows.add(
              new FindingRow(board.reference(), null, finding, 0, null, board.titleOf(finding)));
        }
      }
      Map<Finding, List<Integer>> notAssessed = new LinkedHashMap<>();
      Map<Finding, CircuitFindings> firstOf = new HashMap<>();
      for (CircuitFindings circuit : board.circuits()) {
        for (Finding finding : circuit.findings()) {
          if (finding.verdict() == Verdict.NOT_ASSESSED) {
            notAssessed.computeIfAbsent(finding, f -> new ArrayList<>()).add(circuit.wayNumber());
            firstOf.putIfAbsent(finding, circuit);
          } else if (finding.verdict() != Verdict.PASS) {
            rows.add(
                new FindingRow(
                    board.reference(),
                    circuit.wayNumber(),
                    finding,
                    1,
                    null,
                    circuit.lineLabel(),
                    circuit.description(),
                    board.titleOf(finding)));
          }
        }
      }
      for (Map.Entry<Finding, List<Integer>> gathered : notAssessed.entrySet()) {
        List<Integer> ways = gathered.getValue();
        if (ways.size() == 1) {
          CircuitFindings circuit = firstOf.get(gathered.getKey());
          rows.add(
              new FindingRow(
                  board.reference(),
                  ways.get(0),
                  gathered.getKey(),
                  1,
                  null,
                  circuit.lineLabel(),
                  circuit.description(),
                  board.titleOf(gathered.getKey())));
        } else {
          // "ways 1–4, 7" on a board of ways, "spaces 1–4, 7" on a panelboard, as its page says
          String noun = firstOf.get(gathered.getKey()).words().position() + "s ";
          rows.add(
              new FindingRow(
                  board.reference(),
                  null,
                  gathered.getKey(),
                  ways.size(),
                  noun + wayRanges(ways),
                  board.titleOf(gathered.getKey())));
        }
      }
    }
    return rows;
  }

  /** Way numbers as ascending ranges: 1–4, 7, 9–12. */
  static String wayRanges(List<Integer> ways) {
    int[] sorted =
        ways.stream()
            .filter(w -> w != null)
            .mapToInt(Integer::intValue)
            .sorted()
            .distinct()
            .toArray();
    StringBuilder text = new StringBuilder();
    for (int i = 0; i < sorted.length; i++) {
      int from = sorted[i];
      while (i + 1 < sorted.length && sorted[i + 1] == sorted[i] + 1) {
        i++;
      }
      if (!text.isEmpty()) {
        text.append(", ");
      }
      text.append(from);
      if (sorted[i] != from) {
        text.append('–').append(sorted[i]);
      }
    }
    return text.toString();
  }

  private void writeFindings(
      SXSSFSheet sheet, List<FindingRow> rows, ExportData data, WorkbookStyles s) {
    Widths w = new Widths(10);
    text(sheet.createRow(0), 0, "Findings — " + data.siteName(), s.title, null);
    text(
        sheet.createRow(1),
        0,
        "Every check that did not pass: each danger, warning and advice in full; checks not assessed for want "
            + "of an input gathered per board and reason, with the number of circuits and their ways.",
        s.text,
        null);
    text(sheet.createRow(2), 0, "Caution: " + caution, s.caution, null);
    String[] heads = {
      "Board", "Way", "Check", "Verdict", "Finding", "Figures", "Clause", "Remedy", "Line",
      "Circuit"
    };
    Row head = sheet.createRow(HEADER_ROW);
    for (int i = 0; i < heads.length; i++) {
      text(head, i, heads[i], s.header, w);
    }
    int r = HEADER_ROW + 1;
    for (FindingRow item : rows) {
      Finding finding = item.finding();
      Row row = sheet.createRow(r++);
      text(row, 0, item.board(), s.text, w);
      if (item.way() != null) {
        number(row, 1, item.way(), s.integer, w);
      }
      text(row, 2, item.title(), s.text, w);
      text(row, 3, Codes.word(finding.verdict()), s.text, w);
      text(row, 4, finding.summary(), s.text, w);
      String figures =
          item.ways() != null
              ? item.circuits() + " circuits, " + item.ways()
              : joinQuantities(finding.values());
      text(row, 5, figures, s.text, w);
      text(row, 6, finding.reference(), s.text, w);
      text(row, 7, finding.remedy(), s.text, w);
      text(row, 8, item.line(), s.text, w);
      text(row, 9, item.circuit(), s.text, w);
    }
    sheet.setAutoFilter(
        new CellRangeAddress(HEADER_ROW, Math.max(HEADER_ROW + 1, r - 1), 0, heads.length - 1));
    w.apply(sheet);
    sheet.createFreezePane(0, HEADER_ROW + 1);
    printSetup(sheet, data.siteName() + " — findings", data, HEADER_ROW);
  }

  private static String joinQuantities(List<Quantity> values) {
    if (values.isEmpty()) {
      return null;
    }
    StringBuilder text = new StringBuilder();
    for (Quantity q : values) {
      if (!text.isEmpty()) {
        text.append("; ");
      }
      text.append(quantity(q));
    }
    return text.toString();
  }

  private static String quantity(Quantity q) {
    return q.toString();
  }

  private void writeMethods(SXSSFSheet sheet, ExportData data, WorkbookStyles s) {
    List<String[]> lines = new ArrayList<>();
    lines.add(new String[] {"Caution", caution});
    lines.add(new String[] {"Site", data.siteName()});
    lines.add(new String[] {"Exported", data.exportedOn().toString()});
    lines.add(new String[] {"U0 used, V", plain(data.demand().nominalVoltageVolts())});
    DemandSettings settings = data.demand().settings();
    lines.add(
        new String[] {"U0 when the site states none, V", plain(settings.nominalVoltageVolts())});
    lines.add(
        new String[] {
          "Unbalance limit when a board states none, %", plain(settings.unbalanceLimitPercent())
        });
    lines.add(new String[] {"Diversity when none is chosen", settings.fallbackMethodKey()});
    lines.add(
        new String[] {
          "Coincidence factor when none is stated", plain(settings.coincidenceFactor())
        });
    lines.add(
        new String[] {
          "Connected load",
          "P and Q summed per load line: W is active power, VA apparent, A current per line "
              + "(S = U0·I, or 3·U0·I for a three-pole circuit); Ib connected = |S| / U0 (per line for three poles)."
        });
    lines.add(
        new String[] {
          "Demand",
          "The board's diversity method applied by the demand engine; each circuit's demand / connected "
              + "ratio (Diversity P, Diversity Q) is written as a value, and the sheet's demand columns and totals are formulas "
              + "over it. Per-phase current = √(P² + Q²) / U0; a three-pole circuit adds a third to each line."
        });
    lines.add(
        new String[] {
          "Unbalance",
          "Largest deviation of a phase current from the mean of the three, over the mean (NEMA MG-1 "
              + "definition applied to currents)."
        });
    lines.add(
        new String[] {
          "Findings",
          "Count of checks graded danger, warning or advice per circuit; every check that did not pass "
              + "is on the Findings sheet with its clause: each problem on its own row, checks not assessed gathered per board "
              + "and reason with the number of circuits and their ways."
        });
    if (data.findings() != null) {
      ProtectionSettings p = data.findings().settings();
      lines.add(new String[] {"Supply ownership", Codes.word(p.supplyOwnership())});
      lines.add(
          new String[] {"Voltage drop limit, lighting %", plain(p.lightingDropLimitPercent())});
      lines.add(new String[] {"Voltage drop limit, other %", plain(p.otherDropLimitPercent())});
      lines.add(new String[] {"Cmin (minimum voltage factor)", plain(p.minimumVoltageFactor())});
      lines.add(
          new String[] {
            "Measured Zs fraction of the maximum", plain(p.measuredLoopImpedanceFraction())
          });
    }
    for (BoardEntry board : data.boards()) {
      BoardDemand demand = data.demand().board(board.id());
      if (demand == null) {
        lines.add(new String[] {"Board " + board.reference(), "not assessed"});
        continue;
      }
      lines.add(
          new String[] {
            "Board " + board.reference() + " method",
            demand.methodName() + " — " + demand.methodSource()
          });
      for (String missing : demand.notAssessed()) {
        lines.add(new String[] {"Board " + board.reference() + " not assessed", missing});
      }
      for (String note : demand.notes()) {
        lines.add(new String[] {"Board " + board.reference() + " note", note});
      }
    }
    for (String problem : data.demand().problems()) {
      lines.add(new String[] {"Board tree", problem});
    }
    text(sheet.createRow(0), 0, "Settings and methods", s.title, null);
    int r = 2;
    for (String[] line : lines) {
      Row row = sheet.createRow(r++);
      text(row, 0, line[0], s.label, null);
      text(row, 1, line[1], s.text, null);
    }
    sheet.setColumnWidth(0, 45 * 256);
    sheet.setColumnWidth(1, 120 * 256);
    printSetup(sheet, data.siteName() + " — methods", data, -1);
  }

  private static String plain(double value) {
    return value == Math.rint(value) ? Long.toString((long) value) : Double.toString(value);
  }

  // ---------------------------------------------------------------- cells

  private static void printSetup(Sheet sheet, String what, ExportData data, int headerRow) {
    PrintSetup print = sheet.getPrintSetup();
    print.setPaperSize(PrintSetup.A4_PAPERSIZE);
    print.setLandscape(true);
    sheet.setFitToPage(true);
    print.setFitWidth((short) 1);
    print.setFitHeight((short) 0);
    if (headerRow >= 0) {
      sheet.setRepeatingRows(new CellRangeAddress(headerRow, headerRow, -1, -1));
    }
    sheet.getFooter().setLeft(what.replace("&", "&&"));
    sheet.getFooter().setCenter("Exported " + data.exportedOn());
    sheet.getFooter().setRight("Page &P of &N");
  }

  /**
   * Each schedule column's letters, worked out once rather than for every reference in every row.
   */
  private static final String[] LETTERS = new String[ScheduleColumn.values().length];

  static {
    for (ScheduleColumn column : ScheduleColumn.values()) {
      LETTERS[column.ordinal()] = CellReference.convertNumToColString(column.ordinal());
    }
  }

  static String ref(ScheduleColumn column, int excelRow) {
    return LETTERS[column.ordinal()] + excelRow;
  }

  static String range(ScheduleColumn column, int fromRow, int toRow) {
    String letters = LETTERS[column.ordinal()];
    return "$" + letters + "$" + fromRow + ":$" + letters + "$" + toRow;
  }

  private static String name(Enum<?> value) {
    return Codes.word(value);
  }

  /** Text always goes in as a string cell, never as a formula, whatever it starts with. */
  private static void text(Row row, int column, String value, CellStyle style, Widths widths) {
    if (value == null || value.isEmpty()) {
      return;
    }
    Cell cell = row.createCell(column);
    cell.setCellValue(value);
    cell.setCellStyle(style);
    if (widths != null) {
      widths.see(column, value.length());
    }
  }

  private static void number(Row row, int column, Number value, CellStyle style, Widths widths) {
    if (value == null) {
      return;
    }
    Cell cell = row.createCell(column);
    cell.setCellValue(value.doubleValue());
    cell.setCellStyle(style);
    if (widths != null) {
      widths.see(column, Math.min(10, value.toString().length()));
    }
  }

  /**
   * A formula cell with its result stored beside it, so that a program showing stored results
   * without recalculating still shows the right figure.
   */
  private static void formula(
      Row row, int column, String formula, double result, CellStyle style, Widths widths) {
    Cell cell = row.createCell(column);
    cell.setCellFormula(formula);
    if (Double.isFinite(result)) {
      cell.setCellValue(result);
    }
    cell.setCellStyle(style);
    if (widths != null) {
      widths.see(column, 9);
    }
  }

  /**
   * Column widths that fit the longest text seen, within bounds (the streaming writer cannot
   * autosize cheaply).
   */
  private static final class Widths {
    private final int[] chars;

    Widths(int columns) {
      chars = new int[columns];
    }

    void see(int column, int length) {
      if (column < chars.length) {
        chars[column] = Math.max(chars[column], length);
      }
    }

    void apply(Sheet sheet) {
      for (int i = 0; i < chars.length; i++) {
        int width = Math.max(6, Math.min(50, chars[i] + 2));
        sheet.setColumnWidth(i, width * 256);
      }
    }
  }
}
