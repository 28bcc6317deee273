package com.wayledger.exchange;

import static java.nio.charset.StandardCharsets.UTF_8;

import com.google.zxing.BarcodeFormat;
import com.google.zxing.EncodeHintType;
import com.google.zxing.WriterException;
import com.google.zxing.common.BitMatrix;
import com.google.zxing.qrcode.QRCodeWriter;
import com.google.zxing.qrcode.decoder.ErrorCorrectionLevel;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Map;

/**
 * The QR code printed on a door chart: a link to the board's live page that carries the date the
 * chart was printed and the board's position in the change log then, so that the live page can say
 * what changed since. Drawn as an SVG path (one square per dark module), crisp when printed.
 *
 * @param link the address the code holds
 * @param printedOn the print date in the link
 * @param position the change-log position in the link (0 when the board has no entry yet)
 * @param svg the code as an SVG element
 */
public record DoorChartCode(String link, LocalDate printedOn, long position, String svg) {

  /** Quiet zone round the code, in modules (ISO/IEC 18004 asks for 4). */
  static final int QUIET_ZONE_MODULES = 4;

  /**
   * The code for a board.
   *
   * @param baseUrl the application's public address, e.g. "https://ledger.example.org/app"
   */
  public static DoorChartCode of(String baseUrl, long boardId, LocalDate printedOn, long position) {
    String link = link(baseUrl, boardId, printedOn, position);
    return new DoorChartCode(link, printedOn, position, svg(matrix(link)));
  }

  static String link(String baseUrl, long boardId, LocalDate printedOn, long position) {
    String base = baseUrl.endsWith("/") ? baseUrl.substring(0, baseUrl.length() - 1) : baseUrl;
    return base + "/boards/" + boardId + "/live?printed=" + printedOn + "&at=" + position;
  }

  static BitMatrix matrix(String link) {
    try {
      return new QRCodeWriter()
          .encode(
              link,
              BarcodeFormat.QR_CODE,
              0,
              0,
              Map.of(
                  EncodeHintType.ERROR_CORRECTION,
                  ErrorCorrectionLevel.M,
                  EncodeHintType.MARGIN,
                  QUIET_ZONE_MODULES,
                  EncodeHintType.CHARACTER_SET,
                  UTF_8.name()));
    } catch (WriterException e) {
      throw new IllegalArgumentException("Link too long for a QR code: " + link, e);
    }
  }

  /** One path of unit squares on a white ground; the viewBox is the matrix size in modules. */
  static String svg(BitMatrix matrix) {
    int width = matrix.getWidth();
    int height = matrix.getHeight();
    StringBuilder path = new StringBuilder();
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        if (matrix.get(x, y)) {
          path.append('M').append(x).append(' ').append(y).append("h1v1h-1z");
        }
      }
    }
    return String.format(
        Locale.ROOT,
        "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"door-code\" viewBox=\"0 0 %d %d\""
            + " width=\"%d\" height=\"%d\" shape-rendering=\"crispEdges\" role=\"img\""
            + " aria-label=\"QR code\"><rect width=\"%d\" height=\"%d\" fill=\"#ffffff\"/>"
            + "<path fill=\"#000000\" d=\"%s\"/></svg>",
        width,
        height,
        width * 4,
        height * 4,
        width,
        height,
        path);
  }
}
