package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.engine.nec.ConductorSize;
import com.wayledger.engine.rules.CableUnits;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * units (AWG/feet): size and length columns read in either vocabulary and converted to the stored
 * mm² and metres; a value whose unit contradicts its column is refused on its row; an AWG-and-feet
 * site's own export reads back into the same circuits. Invented circuits.
 */
class ImportUnitsTests {

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

  private static ImportPlan plan(String csv) {
    SheetTable table = SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "t.csv", -1);
    return new RowReader(validator)
        .read(table, ColumnGuesser.guess(table), new RowReader.BoardContext(1, 42, Set.of()));
  }

  private static ImportPlan.PreviewRow row(ImportPlan plan, int number) {
    return plan.rows().stream().filter(r -> r.number() == number).findFirst().orElseThrow();
  }

  @Test
  void wireSizeAndRunFeetColumnsAreGuessedAndConverted() {
    ImportPlan plan =
        plan(
            "Way,Line,Circuit,Device,Curve,In A,Wire size,Run ft\n1,L1,Kitchen,MCB,B,20,12 AWG,50\n");
    ImportPlan.PreviewRow kitchen = row(plan, 2);
    assertThat(kitchen.problems()).as("problems").isEmpty();
    // 12 AWG = 3.31 mm² (ASTM B258, from memory); 50 ft = 15.24 m (1 ft = 0.3048 m exactly)
    assertThat(kitchen.circuit().cableLineCsa()).isCloseTo(3.31, within(0.01));
    assertThat(kitchen.circuit().cableLengthMetres()).isCloseTo(15.24, within(1e-9));
  }

  @Test
  void aGaugeTheNecTableDoesNotListIsRefusedOnItsRow() {
    ImportPlan plan =
        plan(
            "Way,Line,Circuit,Device,Curve,In A,Wire size,Run ft\n"
                + "1,L1,Kitchen,MCB,B,20,12 AWG,50\n"
                + "2,L1,Hall,MCB,B,15,13 AWG,30\n");
    assertThat(row(plan, 2).isValid()).as("row 2 with 12 AWG").isTrue();
    assertThat(row(plan, 3).problems())
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(ImportField.LINE_AWG, "import.cell.notAwg"));
  }

  @Test
  void anAwgSizeInASquareMillimetreColumnIsRefusedNotReadAsTwelveSquareMillimetres() {
    ImportPlan plan =
        plan("Way,Line,Circuit,Device,Curve,In A,Line mm²\n1,L1,Kitchen,MCB,B,20,12 AWG\n");
    assertThat(row(plan, 2).problems())
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(ImportField.LINE_CSA, "import.cell.awgInMm2"));
  }

  @Test
  void feetWrittenInAMetresColumnAreRefused() {
    ImportPlan plan =
        plan("Way,Line,Circuit,Device,Curve,In A,Length m\n1,L1,Kitchen,MCB,B,20,50 ft\n");
    assertThat(row(plan, 2).problems())
        .extracting(ImportPlan.Problem::field, ImportPlan.Problem::code)
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(
                ImportField.LENGTH_METRES, "import.cell.feetInMetres"));
  }

  @Test
  void metresColumnsStillReadAsBefore() {
    ImportPlan plan =
        plan(
            "Way,Line,Circuit,Device,Curve,In A,Line mm²,Length metres\n1,L1,Kitchen,MCB,B,20,2.5,18\n");
    ImportPlan.PreviewRow kitchen = row(plan, 2);
    assertThat(kitchen.problems()).isEmpty();
    assertThat(kitchen.circuit().cableLineCsa()).isEqualTo(2.5);
    assertThat(kitchen.circuit().cableLengthMetres()).isEqualTo(18.0);
  }

  /** Two circuits on AWG sizes with lengths typed in whole feet, as an NEC site stores them. */
  private static ExportData necExport() {
    double twelve = ConductorSize.AWG_12.squareMillimetres();
    double six = ConductorSize.AWG_6.squareMillimetres();
    var kitchen =
        ExchangeFixtures.circuit(
                1,
                PhasePosition.L1,
                "Kitchen counter",
                DeviceKind.MCB,
                TripCurve.B,
                20,
                null,
                null,
                null)
            .withCableUnits(twelve, twelve, CableUnits.metresOfFeet(50), null, null, null);
    var range =
        ExchangeFixtures.circuit(
                3, PhasePosition.L1, "Range", DeviceKind.MCB, TripCurve.C, 50, null, null, null)
            .withCableUnits(
                six,
                ConductorSize.AWG_10.squareMillimetres(),
                CableUnits.metresOfFeet(35),
                null,
                null,
                null);
    BoardEntry board =
        new BoardEntry(
            1L,
            "Unit 2A",
            "Hall closet",
            1,
            42,
            null,
            "",
            0,
            List.of(
                new CircuitEntry(
                    201L,
                    kitchen,
                    List.of(
                        ExchangeFixtures.load(
                            "Toaster", LoadCategory.OTHER, 1, 1200, RatingUnit.W, 1.0))),
                new CircuitEntry(
                    202L,
                    range,
                    List.of(
                        ExchangeFixtures.load(
                            "Range", LoadCategory.COOKING, 1, 8000, RatingUnit.W, 1.0)))));
    ExportData metric = ExchangeFixtures.export(List.of(board), DiversityMethods.UK_SMALL_SHOP);
    return new ExportData(
        metric.siteId(),
        metric.siteName(),
        metric.earthing(),
        metric.boards(),
        metric.demand(),
        metric.findings(),
        metric.exportedOn(),
        "NEC (NFPA 70)",
        "120/240 V single-phase three-wire",
        CableUnits.AWG_AND_FEET);
  }

  @Test
  void anAwgSitesCsvNamesItsUnitsAndReadsBackIntoTheSameCircuits() throws IOException {
    ExportData data = necExport();
    StringWriter out = new StringWriter();
    CsvWriter.write(data, data.boards().get(0), ExchangeFixtures.CAUTION, out);
    String csv = out.toString();
    assertThat(csv.lines().findFirst().orElseThrow())
        .as("header names the units")
        .contains("\"Line AWG/kcmil\"", "\"CPC AWG/kcmil\"", "\"Length ft\"")
        .doesNotContain("mm²", "Length m\"");
    assertThat(csv).as("the kitchen row").contains("\"12 AWG\"", "\"50\"");

    SheetTable table = SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "unit.csv", -1);
    assertThat(table.isOwnExport()).as("recognised as our own export").isTrue();
    ImportPlan plan =
        new RowReader(validator)
            .read(table, ColumnGuesser.guess(table), new RowReader.BoardContext(1, 42, Set.of()));
    assertThat(plan.rows()).allMatch(ImportPlan.PreviewRow::isValid);
    assertThat(ImportReadingTests.imported(plan))
        .isEqualTo(ImportReadingTests.expected(data.boards().get(0)));
  }

  @Test
  void anAwgSitesWorkbookReadsBackIntoTheSameCircuits() throws IOException {
    ExportData data = necExport();
    byte[] xlsx = ImportReadingTests.xlsx(data);
    SheetTable table = SpreadsheetReader.read(xlsx, "unit.xlsx", -1);
    assertThat(table.headers()).contains("Line AWG/kcmil", "CPC AWG/kcmil", "Length ft");
    ImportPlan plan =
        new RowReader(validator)
            .read(table, ColumnGuesser.guess(table), new RowReader.BoardContext(1, 42, Set.of()));
    assertThat(plan.rows()).allMatch(ImportPlan.PreviewRow::isValid);
    assertThat(ImportReadingTests.imported(plan))
        .isEqualTo(ImportReadingTests.expected(data.boards().get(0)));
  }
}
