package com.wayledger.inspection;

import com.wayledger.engine.inspection.GradedValue;
import com.wayledger.exchange.BoardEntry;
import com.wayledger.exchange.ExportData;
import com.wayledger.exchange.WorkbookSheet;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Transactional;

/**
 * The workbook's "Test results" sheet: for each exported board its latest inspection, every value
 * graded with the limit used and its source, then the observations and the outcome — the same
 * content as the PDF report's results.
 */
@Component
@Order(10)
public class ResultsSheet implements WorkbookSheet {

  static final String NAME = "Test results";

  static final String[] HEADER = {
    "Board",
    "Inspected on",
    "Way",
    "Circuit",
    "Value",
    "Measured",
    "Unit",
    "Limit used",
    "Result",
    "Finding",
    "Source"
  };

  private final InspectionService inspections;

  public ResultsSheet(InspectionService inspections) {
    this.inspections = inspections;
  }

  @Override
  public String name() {
    return NAME;
  }

  @Override
  @Transactional(readOnly = true)
  public boolean appliesTo(ExportData data) {
    return data.boards().stream().anyMatch(b -> !inspections.ofBoard(b.id()).isEmpty());
  }

  @Override
  @Transactional(readOnly = true)
  public void write(Sheet sheet, ExportData data, String caution) {
    CellStyle bold = sheet.getWorkbook().createCellStyle();
    Font font = sheet.getWorkbook().createFont();
    font.setBold(true);
    bold.setFont(font);
    int r = 0;
    text(sheet.createRow(r++), 0, "Test results — latest inspection of each board", bold);
    text(sheet.createRow(r++), 0, data.siteName(), null);
    text(sheet.createRow(r++), 0, "Caution: " + caution, bold);
    r++;
    Row header = sheet.createRow(r++);
    for (int c = 0; c < HEADER.length; c++) {
      text(header, c, HEADER[c], bold);
    }
    List<String> observations = new ArrayList<>();
    for (BoardEntry board : data.boards()) {
      List<InspectionRecord> records = inspections.ofBoard(board.id());
      if (records.isEmpty()) {
        continue;
      }
      InspectionRecord latest = inspections.get(board.id(), records.get(0).id());
      InspectionSheet graded = inspections.graded(latest);
      String date = latest.inspectedOn().toString();
      for (GradedValue v : graded.boardValues()) {
        r = value(sheet, r, board.reference(), date, "", "board", v);
      }
      for (SheetRow row : graded.rows()) {
        for (GradedValue v : row.graded()) {
          r = value(sheet, r, board.reference(), date, row.wayLabel(), row.description(), v);
        }
      }
      for (Observation o : latest.observations()) {
        observations.add(
            board.reference()
                + "\t"
                + date
                + "\t"
                + (o.wayLabel() == null ? "board" : o.wayLabel())
                + "\t"
                + o.urgency().name()
                + "\t"
                + o.text());
      }
      observations.add(board.reference() + "\t" + date + "\t\tOUTCOME\t" + latest.outcome().name());
    }
    r++;
    text(sheet.createRow(r++), 0, "Observations and outcome", bold);
    Row obsHeader = sheet.createRow(r++);
    String[] obsColumns = {"Board", "Inspected on", "Way", "Class", "Observation"};
    for (int c = 0; c < obsColumns.length; c++) {
      text(obsHeader, c, obsColumns[c], bold);
    }
    for (String line : observations) {
      String[] cells = line.split("\t", -1);
      Row row = sheet.createRow(r++);
      for (int c = 0; c < cells.length; c++) {
        text(row, c, cells[c], null);
      }
    }
    sheet.setColumnWidth(3, 30 * 256);
    sheet.setColumnWidth(9, 60 * 256);
    sheet.setColumnWidth(10, 50 * 256);
  }

  private static int value(
      Sheet sheet, int r, String board, String date, String way, String circuit, GradedValue v) {
    Row row = sheet.createRow(r);
    text(row, 0, board, null);
    text(row, 1, date, null);
    text(row, 2, way, null);
    text(row, 3, circuit, null);
    text(row, 4, v.quantity(), null);
    if (v.measured() != null) {
      row.createCell(5).setCellValue(v.measured());
    }
    text(row, 6, v.unit(), null);
    text(row, 7, v.limitText(), null);
    text(row, 8, v.grade().name(), null);
    text(row, 9, v.message(), null);
    text(row, 10, v.source(), null);
    return r + 1;
  }

  private static void text(Row row, int column, String value, CellStyle style) {
    var cell = row.createCell(column);
    cell.setCellValue(value == null ? "" : value);
    if (style != null) {
      cell.setCellStyle(style);
    }
  }
}
