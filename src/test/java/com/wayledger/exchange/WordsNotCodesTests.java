package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.CircuitForm;
import com.wayledger.board.LoadForm;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.SupplyOwnership;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.system.EnumWords;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Stream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Spreadsheets carry words a person reads ("Copper", "Thermoplastic 70 °C", "TN-C-S"), never the
 * program's codes (COPPER, THERMOPLASTIC_70, TN_C_S), and the importer takes both.
 */
class WordsNotCodesTests {

  /** Every closed vocabulary whose values reach an export. */
  private static final List<Class<? extends Enum<?>>> EXPORTED =
      List.of(
          PhasePosition.class,
          Phase.class,
          WayStatus.class,
          DeviceKind.class,
          TripCurve.class,
          RcdType.class,
          ConductorMaterial.class,
          Insulation.class,
          InstallationMethod.class,
          LoadCategory.class,
          RatingUnit.class,
          Verdict.class,
          CheckKind.class,
          SupplyOwnership.class,
          EarthingSystem.class);

  private static ValidatorFactory factory;
  private static Validator validator;

  @BeforeAll
  static void validator() {
    factory = Validation.buildDefaultValidatorFactory();
    validator = factory.getValidator();
  }

  @AfterAll
  static void close() {
    factory.close();
  }

  /**
   * A constant's name is a code when the export writes it as something else ("COPPER" is written
   * "Copper"); a name that some vocabulary writes as itself is the trade's own word (L1, B, MCB,
   * TT) and may appear.
   */
  static Set<String> codes() {
    EnumWords words = EnumWords.standard();
    Set<String> codes = new TreeSet<>();
    Set<String> tradeWords = new HashSet<>();
    for (Class<? extends Enum<?>> type : EXPORTED) {
      for (Enum<?> constant : type.getEnumConstants()) {
        if (words.shortOf(constant).equals(constant.name())) {
          tradeWords.add(constant.name());
        } else {
          codes.add(constant.name());
        }
      }
    }
    codes.removeAll(tradeWords);
    return codes;
  }

  @Test
  void theCodesNamedInTheIssueAreAmongThoseScannedFor() {
    assertThat(codes())
        .contains(
            "TN_C_S",
            "THREE_POLE",
            "COPPER",
            "THERMOPLASTIC_70",
            "FIXED_APPLIANCE",
            "INCOMER_OVERLOAD",
            "WARNING")
        .doesNotContain("L1", "B", "MCB", "TT", "A");
  }

  @Test
  void noWorkbookCellHoldsACode() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
    new WorkbookWriter(ExchangeFixtures.CAUTION).write(data, true, out);
    List<String> cells = new ArrayList<>();
    try (XSSFWorkbook workbook = new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()))) {
      for (Sheet sheet : workbook) {
        for (Row row : sheet) {
          for (Cell cell : row) {
            if (cell.getCellType() == CellType.STRING) {
              cells.add(cell.getStringCellValue());
            }
          }
        }
      }
    }
    assertThat(cells).as("workbook has text cells").hasSizeGreaterThan(50);
    assertThat(codesIn(cells)).as("codes found in workbook cells").isEmpty();
    assertThat(cells)
        .as("the words are written instead")
        .contains("Copper", "Thermoplastic 70 °C", "C clipped direct", "Lighting", "B");
  }

  @Test
  void noCsvCellHoldsACode() throws IOException {
    ExportData data = ExchangeFixtures.shopExport();
    String csv = new String(ImportReadingTests.csv(data), StandardCharsets.UTF_8);
    List<String> cells = new ArrayList<>();
    for (String line : csv.split("\r?\n")) {
      for (String cell : line.split("\",\"|^\"|\"$")) {
        cells.add(cell);
      }
    }
    assertThat(codesIn(cells)).as("codes found in CSV cells").isEmpty();
    assertThat(csv).contains("\"Copper\"", "\"Thermoplastic 70 °C\"");
  }

  /** Each cell split into words at anything but letters, digits and underscores. */
  private static Set<String> codesIn(List<String> cells) {
    Set<String> codes = codes();
    Set<String> found = new TreeSet<>();
    for (String cell : cells) {
      for (String token : cell.split("[^A-Za-z0-9_]+")) {
        if (codes.contains(token)) {
          found.add(token + " in \"" + cell + "\"");
        }
      }
    }
    return found;
  }

  /** One column of a spreadsheet and how to read its value back from a preview row. */
  record EnumColumn(
      String header, Class<? extends Enum<?>> type, Function<ImportPlan.PreviewRow, Object> read) {
    @Override
    public String toString() {
      return header;
    }
  }

  static Stream<EnumColumn> enumColumns() {
    return Stream.of(
        new EnumColumn("Line", PhasePosition.class, row -> circuit(row).position()),
        new EnumColumn("State", WayStatus.class, row -> circuit(row).status()),
        new EnumColumn("Device", DeviceKind.class, row -> circuit(row).deviceKind()),
        new EnumColumn("Curve", TripCurve.class, row -> circuit(row).deviceCurve()),
        new EnumColumn("RCD type", RcdType.class, row -> circuit(row).deviceRcdType()),
        new EnumColumn("Conductor", ConductorMaterial.class, row -> circuit(row).cableMaterial()),
        new EnumColumn("Insulation", Insulation.class, row -> circuit(row).cableInsulation()),
        new EnumColumn(
            "Installation",
            InstallationMethod.class,
            row -> circuit(row).cableInstallationMethod()),
        new EnumColumn("Category", LoadCategory.class, row -> load(row).category()),
        new EnumColumn("Unit", RatingUnit.class, row -> load(row).ratingUnit()));
  }

  private static CircuitForm circuit(ImportPlan.PreviewRow row) {
    return row.circuit();
  }

  private static LoadForm load(ImportPlan.PreviewRow row) {
    return row.load();
  }

  /** Each spelling the importer must take: the words, their short form, the code in any case. */
  static Stream<Arguments> spellings() {
    EnumWords words = EnumWords.standard();
    List<Arguments> all = new ArrayList<>();
    enumColumns()
        .forEach(
            column -> {
              for (Enum<?> constant : column.type().getEnumConstants()) {
                for (String spelling :
                    new LinkedHashSetOf(
                        words.of(constant),
                        words.shortOf(constant),
                        constant.name(),
                        constant.name().toLowerCase(Locale.ROOT),
                        words.of(constant).toUpperCase(Locale.ROOT))) {
                  all.add(Arguments.of(column, constant, spelling));
                }
              }
            });
    return all.stream();
  }

  /** Distinct spellings in order. */
  static final class LinkedHashSetOf extends java.util.LinkedHashSet<String> {
    LinkedHashSetOf(String... values) {
      super(List.of(values));
    }
  }

  @ParameterizedTest(name = "{0}: \"{2}\" reads as {1}")
  @MethodSource("spellings")
  void importTakesWordsAndCodesInEveryEnumColumn(
      EnumColumn column, Enum<?> expected, String spelling) {
    String header =
        "Way,Line,Circuit,State,Device,Curve,In A,RCD type,IΔn mA,Conductor,Insulation,"
            + "Installation,Line mm²,Length m,Load,Category,Rating,Unit,PF";
    String[] base = {
      "1",
      "L1",
      "Test way",
      "in use",
      "MCB",
      "B",
      "16",
      "",
      "",
      "Copper",
      "Thermoplastic 70 °C",
      "C clipped direct",
      "2.5",
      "10",
      "Heater",
      "Space heating",
      "2000",
      "W",
      "1"
    };
    List<String> headers = List.of(header.split(","));
    String[] cells = base.clone();
    int index = headers.indexOf(column.header());
    cells[index] = spelling;
    if (column.type() == DeviceKind.class) {
      cells[headers.indexOf("Curve")] = "";
    }
    String csv =
        header
            + "\n"
            + String.join(",", Stream.of(cells).map(c -> "\"" + c + "\"").toList())
            + "\n";
    SheetTable table = SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "w.csv", -1);
    ImportPlan plan =
        new RowReader(validator)
            .read(table, ColumnGuesser.guess(table), new RowReader.BoardContext(3, 12, Set.of()));
    ImportPlan.PreviewRow row = plan.rows().get(0);
    assertThat(column.read().apply(row))
        .as("%s column read from \"%s\" (problems %s)", column, spelling, row.problems())
        .isEqualTo(expected);
  }
}
