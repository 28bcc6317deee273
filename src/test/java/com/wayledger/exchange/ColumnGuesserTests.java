package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import jakarta.validation.Validation;
import jakarta.validation.ValidatorFactory;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import java.util.Set;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/**
 * Guesses on hand-made "foreign" sheets, invented for these tests: other column orders, other
 * header words, a title above the header, devices written as one text and loads in kW or amps.
 */
class ColumnGuesserTests {

  static byte[] sheet(String title, Object[][] rows) throws IOException {
    try (XSSFWorkbook workbook = new XSSFWorkbook()) {
      Sheet sheet = workbook.createSheet("Sheet1");
      int r = 0;
      if (title != null) {
        sheet.createRow(r++).createCell(0).setCellValue(title);
        r++;
      }
      for (Object[] values : rows) {
        Row row = sheet.createRow(r++);
        for (int c = 0; c < values.length; c++) {
          if (values[c] instanceof Number n) {
            row.createCell(c).setCellValue(n.doubleValue());
          } else if (values[c] != null) {
            row.createCell(c).setCellValue(values[c].toString());
          }
        }
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      return out.toByteArray();
    }
  }

  @Test
  void contractorStyleSheetWithDeviceTextAndKilowatts() throws IOException {
    byte[] bytes =
        sheet(
            "Unit 4 — distribution board schedule",
            new Object[][] {
              {
                "Cct No.",
                "Phase",
                "Description",
                "Protection",
                "Cable size (mm²)",
                "Length (m)",
                "Load (kW)"
              },
              {1, "L1", "Lighting ground floor", "B6", 1.5, 22, 0.4},
              {2, "L2", "Sockets office", "RCBO B32 30mA", 2.5, 30, 2.0},
              {3, "TP", "Compressor", "C20", 4, 15, 5.5}
            });
    SheetTable table = SpreadsheetReader.read(bytes, "contractor.xlsx", -1);
    assertThat(table.headerRowNumber()).as("header found under the title").isEqualTo(3);
    assertThat(ColumnGuesser.guess(table))
        .containsExactly(
            ImportField.WAY,
            ImportField.LINE,
            ImportField.CIRCUIT,
            ImportField.DEVICE_SUMMARY,
            ImportField.LINE_CSA,
            ImportField.LENGTH_METRES,
            ImportField.LOAD_KILOWATTS);
    ImportPlan plan = plan(table);
    assertThat(plan.isAllValid()).as("rows valid: %s", plan.rows()).isTrue();
    ImportPlan.PlannedCircuit sockets = plan.circuits().get(1);
    assertThat(sockets.circuit().deviceKind()).isEqualTo(DeviceKind.RCBO);
    assertThat(sockets.circuit().deviceCurve()).isEqualTo(TripCurve.B);
    assertThat(sockets.circuit().deviceRatingAmps()).isEqualTo(32.0);
    assertThat(sockets.circuit().deviceResidualMilliAmps()).isEqualTo(30.0);
    assertThat(sockets.loads().get(0).ratingValue()).as("2.0 kW in W").isEqualTo(2000.0);
    assertThat(sockets.loads().get(0).category())
        .as("category from the words")
        .isEqualTo(LoadCategory.SOCKET_OUTLETS);
    assertThat(plan.circuits().get(2).circuit().position()).isEqualTo(PhasePosition.THREE_POLE);
    assertThat(plan.circuits().get(0).circuit().deviceKind())
        .as("kind from a curve letter")
        .isEqualTo(DeviceKind.MCB);
  }

  @Test
  void ringColumnIsGuessedAndReadInWords() throws IOException {
    byte[] bytes =
        sheet(
            null,
            new Object[][] {
              {
                "Way",
                "Phase",
                "Description",
                "Protection",
                "Ring circuit",
                "Cable size (mm²)",
                "Length (m)"
              },
              {1, "L1", "Sockets front rooms", "B32", "ring", 2.5, 64},
              {2, "L2", "Sockets kitchen", "B32", "Y", 2.5, 40},
              {3, "L3", "Immersion heater", "B16", "radial", 2.5, 12},
              {4, "L1", "Lights", "B6", "", 1.5, 20}
            });
    SheetTable table = SpreadsheetReader.read(bytes, "rings.xlsx", -1);
    assertThat(ColumnGuesser.guess(table))
        .containsExactly(
            ImportField.WAY,
            ImportField.LINE,
            ImportField.CIRCUIT,
            ImportField.DEVICE_SUMMARY,
            ImportField.RING,
            ImportField.LINE_CSA,
            ImportField.LENGTH_METRES);
    ImportPlan plan = plan(table);
    assertThat(plan.isAllValid()).as("rows valid: %s", plan.rows()).isTrue();
    assertThat(plan.circuits())
        .extracting(c -> c.circuit().ringFinal())
        .containsExactly(true, true, false, false);
  }

  @Test
  void facilitySheetInAnotherOrderWithSeparateRatingAndCurve() throws IOException {
    byte[] bytes =
        sheet(
            null,
            new Object[][] {
              {
                "Serving",
                "Breaker rating (A)",
                "Curve",
                "Type",
                "Way",
                "L",
                "Ib (A)",
                "Qty",
                "Power factor"
              },
              {"Kitchen extract", 16, "C", "MCB", 4, "L3", 6.2, 1, 0.8},
              {"Hand dryer", 16, "B", "MCB", 5, "L1", 8.7, 2, 1}
            });
    SheetTable table = SpreadsheetReader.read(bytes, "facility.xlsx", -1);
    assertThat(ColumnGuesser.guess(table))
        .containsExactly(
            ImportField.CIRCUIT,
            ImportField.RATING_AMPS,
            ImportField.CURVE,
            ImportField.DEVICE,
            ImportField.WAY,
            ImportField.LINE,
            ImportField.LOAD_AMPS,
            ImportField.QUANTITY,
            ImportField.POWER_FACTOR);
    ImportPlan plan = plan(table);
    assertThat(plan.isAllValid()).as("rows valid: %s", plan.rows()).isTrue();
    assertThat(plan.circuits().get(0).loads().get(0).ratingUnit()).isEqualTo(RatingUnit.A);
    assertThat(plan.circuits().get(1).loads().get(0).quantity()).isEqualTo(2);
  }

  @Test
  void inspectorSheetWithUnknownColumnsLeavesThemOut() throws IOException {
    byte[] bytes =
        sheet(
            null,
            new Object[][] {
              {
                "Ref",
                "Circuit designation",
                "Live mm2",
                "CPC",
                "Measured Zs (Ω)",
                "Remarks",
                "Checked by"
              },
              {"1", "Immersion", 2.5, 1.5, 0.62, "ok", "JP"},
              {"2", "Shower", 10, 4, 0.41, "", "JP"}
            });
    SheetTable table = SpreadsheetReader.read(bytes, "inspector.xlsx", -1);
    List<ImportField> guess = ColumnGuesser.guess(table);
    assertThat(guess.get(1)).isEqualTo(ImportField.CIRCUIT);
    assertThat(guess.get(2)).isEqualTo(ImportField.LINE_CSA);
    assertThat(guess.get(3)).isEqualTo(ImportField.CPC_CSA);
    assertThat(guess.get(4)).isEqualTo(ImportField.MEASURED_ZS);
    assertThat(guess.get(5)).as("remarks").isEqualTo(ImportField.IGNORE);
    assertThat(guess.get(6)).as("checked by").isEqualTo(ImportField.IGNORE);
  }

  private static ImportPlan plan(SheetTable table) {
    try (ValidatorFactory factory = Validation.buildDefaultValidatorFactory()) {
      return new RowReader(factory.getValidator())
          .read(table, ColumnGuesser.guess(table), new RowReader.BoardContext(3, 24, Set.of()));
    }
  }
}
