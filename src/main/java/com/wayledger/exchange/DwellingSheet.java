package com.wayledger.exchange;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.DwellingRecord;
import com.wayledger.board.DwellingService;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.dwelling.DwellingSite;
import com.wayledger.engine.dwelling.WorkingLine;
import com.wayledger.engine.dwelling.Worksheet;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;

/**
 * The workbook's "Dwelling load" sheet: for each exported board with NEC Article 220 worksheets
 * (standard method, neutral, optional, addition, recorded maximum demand), every worksheet line by
 * line — description, clause, load, factor, result — from the site's one analysis, the same lines
 * the board page and the API show.
 */
@Component
@Order(5)
public class DwellingSheet implements WorkbookSheet {

  static final String NAME = "Dwelling load";

  static final String[] HEADER = {
    "Board", "Calculation", "Line", "Clause", "Load VA", "Factor", "Result VA"
  };

  private final AnalysisService analysis;
  private final DwellingService dwellings;

  public DwellingSheet(AnalysisService analysis, DwellingService dwellings) {
    this.analysis = analysis;
    this.dwellings = dwellings;
  }

  @Override
  public String name() {
    return NAME;
  }

  @Override
  public boolean appliesTo(ExportData data) {
    SiteAnalysis results = analysis.ofSite(data.siteId());
    return data.boards().stream().anyMatch(b -> !results.dwellingWorksheets(b.id()).isEmpty());
  }

  @Override
  public void write(Sheet sheet, ExportData data, String caution) {
    SiteAnalysis results = analysis.ofSite(data.siteId());
    CellStyle bold = sheet.getWorkbook().createCellStyle();
    Font font = sheet.getWorkbook().createFont();
    font.setBold(true);
    bold.setFont(font);
    CellStyle whole = sheet.getWorkbook().createCellStyle();
    whole.setDataFormat(sheet.getWorkbook().createDataFormat().getFormat("#,##0"));
    CellStyle percent = sheet.getWorkbook().createCellStyle();
    percent.setDataFormat(sheet.getWorkbook().createDataFormat().getFormat("0.0%"));
    int r = 0;
    text(sheet.createRow(r++), 0, "Dwelling load calculations — NEC Article 220", bold);
    text(sheet.createRow(r++), 0, data.siteName(), null);
    text(sheet.createRow(r++), 0, "Caution: " + caution, bold);
    r++;
    Row header = sheet.createRow(r++);
    for (int c = 0; c < HEADER.length; c++) {
      text(header, c, HEADER[c], bold);
    }
    double u0 = results.spec().supply().nominalVoltageToEarthVolts();
    for (BoardEntry board : data.boards()) {
      BoardSpec spec =
          results.spec().boards().stream()
              .filter(b -> b.id() == board.id())
              .findFirst()
              .orElse(null);
      DwellingRecord record = dwellings.find(board.id()).orElse(null);
      if (record != null) {
        r = inputs(sheet, r, board.reference(), record);
      }
      for (Worksheet sheetOf : results.dwellingWorksheets(board.id())) {
        String title =
            sheetOf.method().title()
                + " (NEC "
                + sheetOf.method().clause()
                + ", "
                + sheetOf.edition()
                + ")";
        for (String reason : sheetOf.notAssessed()) {
          Row row = sheet.createRow(r++);
          text(row, 0, board.reference(), null);
          text(row, 1, title, null);
          text(row, 2, reason, bold);
        }
        for (WorkingLine line : sheetOf.lines()) {
          Row row = sheet.createRow(r++);
          text(row, 0, board.reference(), null);
          text(row, 1, title, null);
          text(row, 2, line.description(), line.subtotal() ? bold : null);
          text(row, 3, line.clause(), null);
          number(row, 4, line.voltAmperes(), whole);
          number(row, 5, line.factor(), percent);
          number(row, 6, line.resultVoltAmperes(), whole);
        }
        if (sheetOf.resultVoltAmperes() != null) {
          Row row = sheet.createRow(r++);
          text(row, 0, board.reference(), null);
          text(row, 1, title, null);
          text(row, 2, "Calculated load", bold);
          number(row, 6, sheetOf.resultVoltAmperes(), whole);
          if (spec != null) {
            double volts = DwellingSite.dividingVolts(spec, u0);
            Row amps = sheet.createRow(r++);
            text(amps, 0, board.reference(), null);
            text(amps, 1, title, null);
            text(amps, 2, "Current at " + Math.round(volts) + " V (A)", null);
            number(amps, 6, sheetOf.amperesAt(volts), null);
          }
        }
        for (String assumption : sheetOf.assumptions()) {
          Row row = sheet.createRow(r++);
          text(row, 0, board.reference(), null);
          text(row, 1, title, null);
          text(row, 2, "Assumed: " + assumption, null);
        }
      }
    }
    sheet.setColumnWidth(1, 40 * 256);
    sheet.setColumnWidth(2, 70 * 256);
    sheet.setColumnWidth(3, 18 * 256);
  }

  /** The stored dwelling inputs of a board, one row each, as the page names them. */
  private static int inputs(Sheet sheet, int r, String board, DwellingRecord d) {
    String title = "Dwelling inputs";
    Double feet = d.getFloorAreaSquareFeet();
    Object[][] rows = {
      {"Floor area (ft²)", feet},
      {
        "Floor area (m²)",
        feet == null
            ? null
            : feet / com.wayledger.engine.dwelling.DwellingInputs.SQUARE_FEET_PER_SQUARE_METRE
      },
      {"Small-appliance branch circuits", d.getSmallApplianceCircuits()},
      {"Laundry branch circuits", d.getLaundryCircuits()},
      {"Optional method (220.82)", d.isOptionalMethod() ? "yes" : "no"},
      {"Addition (220.83)", d.getAddition().name()}
    };
    for (Object[] input : rows) {
      Row row = sheet.createRow(r++);
      text(row, 0, board, null);
      text(row, 1, title, null);
      text(row, 2, (String) input[0], null);
      if (input[1] instanceof Number n) {
        number(row, 6, n.doubleValue(), null);
      } else {
        text(row, 6, input[1] == null ? "not recorded" : input[1].toString(), null);
      }
    }
    return r;
  }

  private static void text(Row row, int column, String value, CellStyle style) {
    Cell cell = row.createCell(column);
    cell.setCellValue(value == null ? "" : value);
    if (style != null) {
      cell.setCellStyle(style);
    }
  }

  private static void number(Row row, int column, Double value, CellStyle style) {
    if (value == null) {
      return;
    }
    Cell cell = row.createCell(column);
    cell.setCellValue(value);
    if (style != null) {
      cell.setCellStyle(style);
    }
  }
}
