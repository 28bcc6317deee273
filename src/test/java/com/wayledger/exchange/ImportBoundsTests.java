package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Imports are bounded by what a file holds, not only by its size: rows read (empty ones count) and
 * cells read stop the reading with a message; and the steps of one import parse the file once.
 */
class ImportBoundsTests {

  private static String refusal(byte[] bytes, String name) {
    ImportRefused refused =
        catchThrowableOfType(ImportRefused.class, () -> SpreadsheetReader.read(bytes, name, -1));
    assertThat(refused).as("refused").isNotNull();
    return refused.messageCode();
  }

  /** A schedule of three rows followed by this many formatted but empty rows. */
  private static byte[] paddedWorkbook(int emptyRows) throws IOException {
    try (SXSSFWorkbook workbook = new SXSSFWorkbook(100)) {
      workbook.setCompressTempFiles(true);
      Sheet sheet = workbook.createSheet("Padded");
      CellStyle bold = workbook.createCellStyle();
      Row header = sheet.createRow(0);
      header.createCell(0).setCellValue("Way");
      header.createCell(1).setCellValue("Circuit");
      for (int i = 1; i <= 3; i++) {
        Row row = sheet.createRow(i);
        row.createCell(0).setCellValue(i);
        row.createCell(1).setCellValue("Lights " + i);
      }
      for (int i = 4; i < 4 + emptyRows; i++) {
        sheet.createRow(i).setRowStyle(bold);
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      return out.toByteArray();
    }
  }

  @Test
  void aWorkbookPaddedWithEmptyRowsStopsAtTheRowsReadBound() throws IOException {
    byte[] padded = paddedWorkbook(SpreadsheetReader.MAX_ROWS_READ + 10);
    assertThat(refusal(padded, "padded.xlsx")).isEqualTo("import.refused.tooManyRowsRead");
    byte[] fits = paddedWorkbook(1_000);
    assertThat(SpreadsheetReader.read(fits, "fits.xlsx", -1).rows()).hasSize(3);
  }

  @Test
  void aWideSheetStopsAtTheCellsBound() {
    int columns = 60;
    int rows = SpreadsheetReader.MAX_CELLS_READ / columns + 10;
    StringBuilder csv = new StringBuilder("Way,Circuit" + ",x".repeat(columns - 2) + "\n");
    String line = "1,c" + ",1".repeat(columns - 2) + "\n";
    for (int i = 0; i < rows && i < SpreadsheetReader.MAX_ROWS - 10; i++) {
      csv.append(line);
    }
    assertThat(rows)
        .as("under the row cap, over the cell bound")
        .isLessThan(SpreadsheetReader.MAX_ROWS);
    assertThat(refusal(csv.toString().getBytes(StandardCharsets.UTF_8), "wide.csv"))
        .isEqualTo("import.refused.tooManyCells");
  }

  @Test
  void theStepsOfOneImportParseTheFileOnce(@TempDir Path directory) {
    UploadStore store = new UploadStore(directory);
    byte[] csv =
        "Cct,Phase,Description\n1,L1,Lights\n2,L2,Sockets\n".getBytes(StandardCharsets.UTF_8);
    long before = SpreadsheetReader.PARSES.get();
    SheetTable first = SpreadsheetReader.read(csv, "s.csv", -1);
    UploadStore.Upload upload = store.save(7, "eddie", "s.csv", csv);
    store.remember(upload, -1, first);
    // mapping page, mapping saved for sheet 0, preview, store: all from the kept table
    for (int step : List.of(-1, 0, 0, 0)) {
      assertThat(store.table(upload, step)).isSameAs(first);
    }
    assertThat(SpreadsheetReader.PARSES.get() - before).isEqualTo(1);
    store.remove(upload);
  }
}
