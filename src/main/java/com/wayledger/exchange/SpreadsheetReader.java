package com.wayledger.exchange;

import java.io.BufferedInputStream;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.io.StringReader;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.EncryptedDocumentException;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.NotOfficeXmlFileException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.util.ZipSecureFile;
import org.apache.poi.poifs.filesystem.FileMagic;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.ss.util.NumberToTextConverter;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.eventusermodel.XSSFSheetXMLHandler;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFComment;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;

/**
 * Reads an uploaded XLSX or CSV file into a {@link SheetTable}, within limits: a size cap, a row
 * cap, POI's zip-bomb guard, and POI's XML parsers (which refuse document type declarations, so no
 * external entity is ever fetched). XLSX is read with POI's streaming (SAX) reader, so a huge sheet
 * is stopped at the row cap without being held in memory.
 */
public final class SpreadsheetReader {

  /** Largest file accepted, bytes. */
  public static final int MAX_BYTES = 5 * 1024 * 1024;

  /** Most data rows accepted below the header. */
  public static final int MAX_ROWS = 5_000;

  /** Rows kept after our own export's schedule (its totals block, or the CSV's closing lines). */
  static final int MAX_ROWS_BELOW = 64;

  /**
   * Most rows read from a sheet, empty ones included: a workbook padded with hundreds of thousands
   * of formatted but empty rows is refused after reading this many instead of being parsed whole.
   */
  public static final int MAX_ROWS_READ = 20_000;

  /** Most cells read from a sheet, empty ones included. */
  public static final int MAX_CELLS_READ = 200_000;

  /** How many times a file has been parsed into a table (for tests of parse-once). */
  static final java.util.concurrent.atomic.AtomicLong PARSES =
      new java.util.concurrent.atomic.AtomicLong();

  /** Most columns read; cells further right are ignored. */
  public static final int MAX_COLUMNS = 80;

  /** Rows searched for the header. */
  private static final int HEADER_SEARCH_ROWS = 30;

  /**
   * Smallest compressed/uncompressed ratio of a zip entry before POI calls it a zip bomb (POI's
   * default, stated).
   */
  private static final double MIN_INFLATE_RATIO = 0.01;

  /** Largest uncompressed part of an XLSX, bytes. */
  private static final long MAX_ENTRY_BYTES = 200L * 1024 * 1024;

  static {
    ZipSecureFile.setMinInflateRatio(MIN_INFLATE_RATIO);
    ZipSecureFile.setMaxEntrySize(MAX_ENTRY_BYTES);
  }

  private SpreadsheetReader() {}

  /** The kinds of file we read. */
  public enum Kind {
    XLSX,
    CSV
  }

  /**
   * Which kind of file the bytes hold; refuses what is not a spreadsheet we read, with the reason.
   */
  public static Kind detect(byte[] bytes, String fileName) {
    if (bytes.length == 0) {
      throw new ImportRefused("import.refused.emptyFile");
    }
    if (bytes.length > MAX_BYTES) {
      throw new ImportRefused("import.refused.tooBig", MAX_BYTES / (1024 * 1024));
    }
    FileMagic magic;
    try (InputStream in = FileMagic.prepareToCheckMagic(new ByteArrayInputStream(bytes))) {
      magic = FileMagic.valueOf(in);
    } catch (IOException e) {
      throw new ImportRefused("import.refused.notSpreadsheet");
    }
    return switch (magic) {
      case OOXML -> Kind.XLSX;
      case OLE2 ->
          throw new ImportRefused(
              isEncrypted(bytes) ? "import.refused.protected" : "import.refused.oldExcel");
      default -> {
        if (looksLikeText(bytes)) {
          yield Kind.CSV;
        }
        throw new ImportRefused("import.refused.notSpreadsheet");
      }
    };
  }

  private static boolean isEncrypted(byte[] bytes) {
    try (POIFSFileSystem fs = new POIFSFileSystem(new ByteArrayInputStream(bytes))) {
      return fs.getRoot().hasEntry("EncryptionInfo") || fs.getRoot().hasEntry("EncryptedPackage");
    } catch (IOException | RuntimeException e) {
      return false;
    }
  }

  private static boolean looksLikeText(byte[] bytes) {
    int limit = Math.min(bytes.length, 8192);
    for (int i = 0; i < limit; i++) {
      if (bytes[i] == 0) {
        return false;
      }
    }
    try {
      StandardCharsets.UTF_8
          .newDecoder()
          .onMalformedInput(CodingErrorAction.REPORT)
          .onUnmappableCharacter(CodingErrorAction.REPORT)
          .decode(ByteBuffer.wrap(bytes));
      return true;
    } catch (CharacterCodingException e) {
      return false;
    }
  }

  /** The sheet names of a file (CSV: one, named after the file). */
  public static List<String> sheetNames(byte[] bytes, String fileName) {
    Kind kind = detect(bytes, fileName);
    if (kind == Kind.CSV) {
      return List.of(fileName == null || fileName.isBlank() ? "CSV" : fileName);
    }
    List<String> names = new ArrayList<>();
    withPackage(
        bytes,
        pkg -> {
          XSSFReader.SheetIterator sheets =
              (XSSFReader.SheetIterator) new XSSFReader(pkg).getSheetsData();
          while (sheets.hasNext()) {
            try (InputStream ignored = sheets.next()) {
              names.add(sheets.getSheetName());
            }
          }
          return null;
        });
    return names;
  }

  /**
   * The sheet's table: the header is the row among the first ones whose cells name the most known
   * columns.
   *
   * @param sheetIndex the sheet to read; a negative index picks our own board sheet if there is
   *     one, else the first
   */
  public static SheetTable read(byte[] bytes, String fileName, int sheetIndex) {
    Kind kind = detect(bytes, fileName);
    List<String> names = sheetNames(bytes, fileName);
    if (names.isEmpty()) {
      throw new ImportRefused("import.refused.emptySheet");
    }
    int index = sheetIndex;
    if (index < 0 || index >= names.size()) {
      index = 0;
      for (int i = 0; i < names.size() && sheetIndex < 0; i++) {
        if (names.get(i).startsWith("Board ")) {
          index = i;
          break;
        }
      }
    }
    PARSES.incrementAndGet();
    List<SheetTable.Row> raw = kind == Kind.CSV ? readCsv(bytes) : readSheet(bytes, index);
    return tableOf(names, index, raw);
  }

  private static SheetTable tableOf(List<String> names, int index, List<SheetTable.Row> raw) {
    if (raw.isEmpty()) {
      throw new ImportRefused("import.refused.emptySheet");
    }
    int best = 0;
    int bestScore = -1;
    for (int i = 0; i < Math.min(raw.size(), HEADER_SEARCH_ROWS); i++) {
      int score = ColumnGuesser.headerScore(raw.get(i).cells());
      if (score > bestScore) {
        best = i;
        bestScore = score;
      }
    }
    SheetTable.Row header = raw.get(best);
    List<String> headers = new ArrayList<>(header.cells());
    int width = headers.size();
    List<SheetTable.Row> rows = new ArrayList<>();
    boolean own = ownHeaders(headers);
    int previous = header.number();
    List<SheetTable.Row> below = new ArrayList<>();
    for (SheetTable.Row row : raw.subList(best + 1, raw.size())) {
      if (own && (!below.isEmpty() || row.number() != previous + 1)) {
        // our export leaves a blank row between the schedule and its totals block (XLSX) or its
        // rule set, supply system and caution (CSV): kept apart, never read as circuits
        if (below.size() < MAX_ROWS_BELOW) {
          below.add(row);
          continue;
        }
        break;
      }
      previous = row.number();
      width = Math.max(width, row.cells().size());
      rows.add(row);
    }
    while (headers.size() < width) {
      headers.add("");
    }
    if (rows.isEmpty()) {
      throw new ImportRefused("import.refused.noRows");
    }
    if (rows.size() > MAX_ROWS) {
      throw new ImportRefused("import.refused.tooManyRows", MAX_ROWS);
    }
    List<SheetTable.Row> padded = new ArrayList<>(rows.size());
    for (SheetTable.Row row : rows) {
      List<String> cells = new ArrayList<>(row.cells());
      while (cells.size() < width) {
        cells.add("");
      }
      padded.add(new SheetTable.Row(row.number(), cells));
    }
    return new SheetTable(
        names, index, header.number(), headers, padded, raw.subList(0, best), below);
  }

  private static boolean ownHeaders(List<String> headers) {
    return new SheetTable(List.of(), 0, 0, headers, List.of()).isOwnExport();
  }

  // ------------------------------------------------------------------ CSV

  /** Counts rows and cells as they are read, and stops the reading past the bounds. */
  static final class ReadBounds {
    private long rows;
    private long cells;

    void row(int cellsInRow) {
      if (++rows > MAX_ROWS_READ) {
        throw new ImportRefused("import.refused.tooManyRowsRead", MAX_ROWS_READ);
      }
      cell(cellsInRow);
    }

    void cell(int count) {
      cells += count;
      if (cells > MAX_CELLS_READ) {
        throw new ImportRefused("import.refused.tooManyCells", MAX_CELLS_READ);
      }
    }
  }

  private static List<SheetTable.Row> readCsv(byte[] bytes) {
    ReadBounds counted = new ReadBounds();
    String text = new String(bytes, StandardCharsets.UTF_8);
    if (text.startsWith("\uFEFF")) {
      text = text.substring(1);
    }
    char delimiter = guessDelimiter(text);
    List<SheetTable.Row> rows = new ArrayList<>();
    CSVFormat format =
        CSVFormat.RFC4180.builder().setDelimiter(delimiter).setIgnoreEmptyLines(false).get();
    try (Reader reader = new StringReader(text);
        CSVParser parser = CSVParser.parse(reader, format)) {
      for (CSVRecord record : parser) {
        counted.row(record.size());
        List<String> cells = new ArrayList<>();
        for (int i = 0; i < Math.min(record.size(), MAX_COLUMNS); i++) {
          cells.add(CellText.fromCsv(record.get(i).strip()));
        }
        addIfNotBlank(rows, (int) record.getRecordNumber(), cells);
      }
    } catch (IOException | RuntimeException e) {
      if (e instanceof ImportRefused refused) {
        throw refused;
      }
      throw new ImportRefused("import.refused.badCsv");
    }
    return rows;
  }

  private static char guessDelimiter(String text) {
    int end = text.indexOf('\n');
    String firstLines =
        text.substring(
            0, end < 0 ? Math.min(text.length(), 4096) : Math.min(text.length(), end + 1 + 4096));
    long commas = firstLines.chars().filter(c -> c == ',').count();
    long semicolons = firstLines.chars().filter(c -> c == ';').count();
    long tabs = firstLines.chars().filter(c -> c == '\t').count();
    if (tabs > commas && tabs > semicolons) {
      return '\t';
    }
    return semicolons > commas ? ';' : ',';
  }

  private static void addIfNotBlank(List<SheetTable.Row> rows, int number, List<String> cells) {
    while (!cells.isEmpty() && cells.get(cells.size() - 1).isBlank()) {
      cells.remove(cells.size() - 1);
    }
    if (cells.isEmpty()) {
      return;
    }
    if (rows.size() >= MAX_ROWS + HEADER_SEARCH_ROWS) {
      throw new ImportRefused("import.refused.tooManyRows", MAX_ROWS);
    }
    rows.add(new SheetTable.Row(number, cells));
  }

  // ------------------------------------------------------------------ XLSX

  private interface PackageWork<T> {
    T apply(OPCPackage pkg)
        throws IOException, SAXException, org.apache.poi.openxml4j.exceptions.OpenXML4JException;
  }

  private static <T> T withPackage(byte[] bytes, PackageWork<T> work) {
    try (OPCPackage pkg =
        OPCPackage.open(new BufferedInputStream(new ByteArrayInputStream(bytes)))) {
      return work.apply(pkg);
    } catch (ImportRefused refused) {
      throw refused;
    } catch (EncryptedDocumentException e) {
      throw new ImportRefused("import.refused.protected");
    } catch (NotOfficeXmlFileException | InvalidFormatException e) {
      throw new ImportRefused("import.refused.notSpreadsheet");
    } catch (IOException e) {
      if (String.valueOf(e.getMessage()).toLowerCase(Locale.ROOT).contains("zip bomb")) {
        throw new ImportRefused("import.refused.zipBomb");
      }
      throw new ImportRefused("import.refused.damaged");
    } catch (SAXException
        | org.apache.poi.openxml4j.exceptions.OpenXML4JException
        | RuntimeException e) {
      Throwable cause = e;
      while (cause != null) {
        if (cause instanceof ImportRefused refused) {
          throw refused;
        }
        if (String.valueOf(cause.getMessage()).toLowerCase(Locale.ROOT).contains("zip bomb")) {
          throw new ImportRefused("import.refused.zipBomb");
        }
        cause = cause.getCause();
      }
      throw new ImportRefused("import.refused.damaged");
    }
  }

  private static List<SheetTable.Row> readSheet(byte[] bytes, int index) {
    return withPackage(
        bytes,
        pkg -> {
          XSSFReader reader = new XSSFReader(pkg);
          ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
          StylesTable styles = reader.getStylesTable();
          XSSFReader.SheetIterator sheets = (XSSFReader.SheetIterator) reader.getSheetsData();
          int i = 0;
          while (sheets.hasNext()) {
            try (InputStream sheet = sheets.next()) {
              if (i++ != index) {
                continue;
              }
              RowCollector collector = new RowCollector();
              XMLReader parser = XMLHelper.newXMLReader();
              parser.setContentHandler(
                  new XSSFSheetXMLHandler(
                      styles, null, strings, collector, new RawNumbers(), false));
              parser.parse(new InputSource(sheet));
              return collector.rows;
            } catch (javax.xml.parsers.ParserConfigurationException e) {
              throw new IOException(e);
            }
          }
          return List.<SheetTable.Row>of();
        });
  }

  /**
   * Numbers as their full value, never rounded by the cell's display format (so our export reads
   * back exactly).
   */
  private static final class RawNumbers extends DataFormatter {
    RawNumbers() {
      super(Locale.ROOT);
    }

    @Override
    public String formatRawCellContents(double value, int formatIndex, String formatString) {
      return NumberToTextConverter.toText(value);
    }

    @Override
    public String formatRawCellContents(
        double value, int formatIndex, String formatString, boolean use1904Windowing) {
      return NumberToTextConverter.toText(value);
    }
  }

  private static final class RowCollector implements XSSFSheetXMLHandler.SheetContentsHandler {
    final List<SheetTable.Row> rows = new ArrayList<>();
    private final ReadBounds counted = new ReadBounds();
    private List<String> cells;

    @Override
    public void startRow(int rowNum) {
      counted.row(0);
      cells = new ArrayList<>();
    }

    @Override
    public void endRow(int rowNum) {
      addIfNotBlank(rows, rowNum + 1, cells);
    }

    @Override
    public void cell(String reference, String formattedValue, XSSFComment comment) {
      counted.cell(1);
      int column = reference == null ? cells.size() : new CellReference(reference).getCol();
      if (column >= MAX_COLUMNS) {
        return;
      }
      while (cells.size() < column) {
        cells.add("");
      }
      cells.add(formattedValue == null ? "" : formattedValue.strip());
    }
  }
}
