package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Malformed and hostile uploads are refused with a message, or read without harm. */
class HostileFileTests {

  private static String refusal(byte[] bytes, String name) {
    try {
      SpreadsheetReader.read(bytes, name, -1);
    } catch (ImportRefused refused) {
      return refused.messageCode();
    }
    throw new AssertionError("file " + name + " was not refused");
  }

  static byte[] smallWorkbook() throws IOException {
    try (XSSFWorkbook workbook = new XSSFWorkbook()) {
      Sheet sheet = workbook.createSheet("Schedule");
      Row header = sheet.createRow(0);
      header.createCell(0).setCellValue("Way");
      header.createCell(1).setCellValue("Circuit");
      Row row = sheet.createRow(1);
      row.createCell(0).setCellValue(1);
      row.createCell(1).setCellValue("Lights");
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      return out.toByteArray();
    }
  }

  /** Copies a workbook, replacing one part's content. */
  static byte[] withPart(byte[] xlsx, String partName, byte[] content) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(xlsx));
        ZipOutputStream zip = new ZipOutputStream(out)) {
      ZipEntry entry;
      while ((entry = in.getNextEntry()) != null) {
        zip.putNextEntry(new ZipEntry(entry.getName()));
        zip.write(entry.getName().equals(partName) ? content : in.readAllBytes());
        zip.closeEntry();
      }
    }
    return out.toByteArray();
  }

  @Test
  void zipBombIsRefused() throws IOException {
    // a sheet part of 60 MB of spaces inside a file of well under 1 MB: compression ratio far below
    // POI's 1 %
    String sheet =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?><worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData>"
            + " ".repeat(60 * 1024 * 1024)
            + "</sheetData></worksheet>";
    byte[] bomb =
        withPart(
            smallWorkbook(), "xl/worksheets/sheet1.xml", sheet.getBytes(StandardCharsets.UTF_8));
    assertThat(bomb.length).as("bomb file size").isLessThan(SpreadsheetReader.MAX_BYTES);
    assertThat(refusal(bomb, "bomb.xlsx")).isEqualTo("import.refused.zipBomb");
  }

  @Test
  void externalEntityIsNeverResolved(@TempDir Path temp) throws IOException {
    Path secret = temp.resolve("secret.txt");
    Files.writeString(secret, "TOP-SECRET-CONTENT");
    String strings =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
            + "<!DOCTYPE sst [<!ENTITY xxe SYSTEM \""
            + secret.toUri()
            + "\">]>"
            + "<sst xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\" count=\"2\" uniqueCount=\"2\">"
            + "<si><t>Way</t></si><si><t>&xxe;</t></si></sst>";
    String sheet =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
            + "<!DOCTYPE worksheet [<!ENTITY xxe SYSTEM \""
            + secret.toUri()
            + "\">]>"
            + "<worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData>"
            + "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>Circuit</t></is></c></row>"
            + "<row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>&xxe;</t></is></c></row></sheetData></worksheet>";
    byte[] hostile =
        withPart(
            smallWorkbook(), "xl/worksheets/sheet1.xml", sheet.getBytes(StandardCharsets.UTF_8));
    try {
      SheetTable table = SpreadsheetReader.read(hostile, "xxe.xlsx", -1);
      assertThat(table.rows().toString())
          .as("entity not expanded")
          .doesNotContain("TOP-SECRET-CONTENT");
    } catch (ImportRefused refused) {
      assertThat(refused.messageCode()).isEqualTo("import.refused.damaged");
    }
  }

  @Test
  void aMillionRowsAreRefusedAtTheRowCap() throws IOException {
    StringBuilder csv = new StringBuilder("Way,Circuit\n");
    for (int i = 1; i <= 1_000_000; i++) {
      csv.append(i % 96 + 1).append(",c\n");
    }
    byte[] bytes = csv.toString().getBytes(StandardCharsets.UTF_8);
    String code = refusal(bytes, "million.csv");
    assertThat(code)
        .as("refused for size or rows")
        .isIn("import.refused.tooManyRows", "import.refused.tooBig");
    byte[] xlsx;
    try (SXSSFWorkbook workbook = new SXSSFWorkbook(100)) {
      workbook.setCompressTempFiles(true);
      Sheet sheet = workbook.createSheet("Big");
      for (int i = 0; i < 1_000_000; i++) {
        sheet.createRow(i).createCell(0).setCellValue(1);
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      xlsx = out.toByteArray();
    }
    assertThat(refusal(xlsx, "million.xlsx"))
        .isIn("import.refused.tooManyRows", "import.refused.tooBig");
  }

  @Test
  void rowsJustOverTheCapAreRefusedWithTheRowMessage() {
    StringBuilder csv = new StringBuilder("Way,Circuit\n");
    for (int i = 0; i <= SpreadsheetReader.MAX_ROWS; i++) {
      csv.append("1,c\n");
    }
    assertThat(refusal(csv.toString().getBytes(StandardCharsets.UTF_8), "big.csv"))
        .isEqualTo("import.refused.tooManyRows");
  }

  @Test
  void fileOverTheSizeCapIsRefused() {
    byte[] bytes = new byte[SpreadsheetReader.MAX_BYTES + 1];
    java.util.Arrays.fill(bytes, (byte) 'a');
    assertThat(refusal(bytes, "big.csv")).isEqualTo("import.refused.tooBig");
  }

  @Test
  void notASpreadsheetIsRefused() {
    byte[] png = {
      (byte) 0x89, 'P', 'N', 'G', 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 'I', 'H', 'D', 'R'
    };
    assertThat(refusal(png, "picture.xlsx")).isEqualTo("import.refused.notSpreadsheet");
    byte[] zip = zipWith("readme.txt", "hello");
    assertThat(refusal(zip, "archive.xlsx"))
        .isIn("import.refused.notSpreadsheet", "import.refused.damaged");
    assertThat(refusal(new byte[0], "nothing.csv")).isEqualTo("import.refused.emptyFile");
  }

  @Test
  void passwordProtectedWorkbookIsRefused() throws Exception {
    byte[] plain = smallWorkbook();
    try (POIFSFileSystem fs = new POIFSFileSystem()) {
      EncryptionInfo info = new EncryptionInfo(EncryptionMode.agile);
      Encryptor encryptor = info.getEncryptor();
      encryptor.confirmPassword("secret");
      try (OutputStream os = encryptor.getDataStream(fs)) {
        os.write(plain);
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      fs.writeFilesystem(out);
      assertThat(refusal(out.toByteArray(), "locked.xlsx")).isEqualTo("import.refused.protected");
    }
  }

  @Test
  void formulaInAForeignSheetIsReadAsItsValueNeverRun() throws IOException {
    try (XSSFWorkbook workbook = new XSSFWorkbook()) {
      Sheet sheet = workbook.createSheet("S");
      Row header = sheet.createRow(0);
      header.createCell(0).setCellValue("Way");
      header.createCell(1).setCellValue("Circuit");
      Row row = sheet.createRow(1);
      row.createCell(0).setCellValue(1);
      row.createCell(1).setCellFormula("\"cmd\"&\"|calc\"");
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      workbook.write(out);
      SheetTable table = SpreadsheetReader.read(out.toByteArray(), "f.xlsx", -1);
      assertThat(table.rows().get(0).cell(1))
          .as("no cached value: read as blank, formula text never taken")
          .doesNotContain("\"cmd\"");
    }
  }

  private static byte[] zipWith(String name, String text) {
    try {
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      try (ZipOutputStream zip = new ZipOutputStream(out)) {
        zip.putNextEntry(new ZipEntry(name));
        zip.write(text.getBytes(StandardCharsets.UTF_8));
        zip.closeEntry();
      }
      return out.toByteArray();
    } catch (IOException e) {
      throw new AssertionError(e);
    }
  }
}
