package com.wayledger.exchange;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import javax.imageio.ImageIO;
import org.apache.poi.ss.usermodel.ClientAnchor;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.streaming.SXSSFDrawing;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * The "Diagram" sheet of a site workbook: the caution, then the site's single-line diagram as a
 * picture, placed second (after the summary).
 */
final class DiagramSheet {

  static final String NAME = "Diagram";

  /** Pixels of the picture per pixel shown (the picture is rendered at 1.25 × for print). */
  private static final double SHRINK = 1.25;

  /** Default column width and row height in pixels at 100 % zoom. */
  private static final double COLUMN_PIXELS = 64;

  private static final double ROW_PIXELS = 20;

  private DiagramSheet() {}

  static void write(SXSSFWorkbook workbook, String name, byte[] png, String caution)
      throws IOException {
    SXSSFSheet sheet = workbook.createSheet(name);
    sheet.createRow(0).createCell(0).setCellValue(caution);
    BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
    if (image == null) {
      throw new IOException("The diagram picture is not a readable PNG");
    }
    int picture = workbook.addPicture(png, Workbook.PICTURE_TYPE_PNG);
    SXSSFDrawing drawing = sheet.createDrawingPatriarch();
    ClientAnchor anchor = workbook.getCreationHelper().createClientAnchor();
    anchor.setCol1(0);
    anchor.setRow1(2);
    anchor.setCol2((int) Math.ceil(image.getWidth() / SHRINK / COLUMN_PIXELS));
    anchor.setRow2(2 + (int) Math.ceil(image.getHeight() / SHRINK / ROW_PIXELS));
    anchor.setAnchorType(ClientAnchor.AnchorType.MOVE_DONT_RESIZE);
    drawing.createPicture(anchor, picture);
    if (workbook.getNumberOfSheets() > 2) {
      workbook.setSheetOrder(name, 1);
    }
  }
}
