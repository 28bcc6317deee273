package com.wayledger.exchange;

import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.usermodel.Workbook;

/**
 * The cell styles of an export, made once per workbook and used by name (a workbook holds at most
 * 64,000 styles, so a style per cell is never made). Number formats follow the screens: A to 1
 * decimal, kW and factors to 3, Ω to 2.
 */
final class WorkbookStyles {

  final CellStyle title;
  final CellStyle label;
  final CellStyle text;
  final CellStyle header;
  final CellStyle integer;
  final CellStyle number;
  final CellStyle amps;
  final CellStyle kilowatts;
  final CellStyle factor;
  final CellStyle ohms;
  final CellStyle caution;
  final CellStyle totalLabel;
  final CellStyle totalKilowatts;
  final CellStyle totalAmps;
  final CellStyle percent;

  WorkbookStyles(Workbook workbook) {
    Font bold = workbook.createFont();
    bold.setBold(true);
    Font big = workbook.createFont();
    big.setBold(true);
    big.setFontHeightInPoints((short) 14);
    Font italic = workbook.createFont();
    italic.setItalic(true);

    title = workbook.createCellStyle();
    title.setFont(big);
    label = workbook.createCellStyle();
    label.setFont(bold);
    text = workbook.createCellStyle();
    text.setVerticalAlignment(VerticalAlignment.TOP);
    header = workbook.createCellStyle();
    header.setFont(bold);
    header.setFillForegroundColor(IndexedColors.GREY_25_PERCENT.getIndex());
    header.setFillPattern(FillPatternType.SOLID_FOREGROUND);
    header.setBorderBottom(BorderStyle.THIN);
    header.setWrapText(true);
    header.setVerticalAlignment(VerticalAlignment.TOP);
    integer = numeric(workbook, "0", null);
    number = numeric(workbook, "General", null);
    amps = numeric(workbook, "0.0", null);
    kilowatts = numeric(workbook, "0.000", null);
    factor = numeric(workbook, "0.000", null);
    ohms = numeric(workbook, "0.00", null);
    percent = numeric(workbook, "0.0", null);
    totalKilowatts = numeric(workbook, "0.000", bold);
    totalAmps = numeric(workbook, "0.0", bold);
    caution = workbook.createCellStyle();
    caution.setFont(italic);
    totalLabel = workbook.createCellStyle();
    totalLabel.setFont(bold);
    totalLabel.setBorderTop(BorderStyle.THIN);
  }

  private static CellStyle numeric(Workbook workbook, String format, Font font) {
    CellStyle style = workbook.createCellStyle();
    style.setDataFormat(workbook.createDataFormat().getFormat(format));
    style.setAlignment(HorizontalAlignment.RIGHT);
    if (font != null) {
      style.setFont(font);
    }
    return style;
  }
}
