package com.wayledger.exchange;

import org.apache.poi.ss.usermodel.Sheet;

/**
 * A sheet another feature adds to the workbook export (the inspection results sheet), so that the
 * exchange feature need not know that feature. Beans of this type are appended after the built-in
 * sheets, in bean order.
 */
public interface WorkbookSheet {

  /** The sheet's wanted name (made unique and safe by the writer). */
  String name();

  /** Whether there is anything to write for these boards; no sheet is added otherwise. */
  boolean appliesTo(ExportData data);

  /**
   * Writes the sheet; the first rows must carry the caution.
   *
   * @param caution the caution text every sheet carries
   */
  void write(Sheet sheet, ExportData data, String caution);
}
