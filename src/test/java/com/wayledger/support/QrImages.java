package com.wayledger.support;

import com.google.zxing.BinaryBitmap;
import com.google.zxing.DecodeHintType;
import com.google.zxing.RGBLuminanceSource;
import com.google.zxing.common.HybridBinarizer;
import com.google.zxing.qrcode.QRCodeReader;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.StringReader;
import java.util.Map;
import javax.imageio.ImageIO;
import org.apache.batik.transcoder.TranscoderInput;
import org.apache.batik.transcoder.TranscoderOutput;
import org.apache.batik.transcoder.image.PNGTranscoder;

/**
 * Reads a QR code back the way a phone would: the SVG the page serves is rendered to pixels (Apache
 * Batik) and the pixels are decoded (ZXing's reader), so a test compares what a camera would see.
 */
public final class QrImages {

  private QrImages() {}

  public static String decodeSvg(String svg) throws Exception {
    PNGTranscoder transcoder = new PNGTranscoder();
    transcoder.addTranscodingHint(PNGTranscoder.KEY_WIDTH, 400f);
    ByteArrayOutputStream png = new ByteArrayOutputStream();
    transcoder.transcode(new TranscoderInput(new StringReader(svg)), new TranscoderOutput(png));
    return decode(ImageIO.read(new ByteArrayInputStream(png.toByteArray())));
  }

  public static String decode(BufferedImage image) throws Exception {
    int[] pixels =
        image.getRGB(0, 0, image.getWidth(), image.getHeight(), null, 0, image.getWidth());
    BinaryBitmap bitmap =
        new BinaryBitmap(
            new HybridBinarizer(
                new RGBLuminanceSource(image.getWidth(), image.getHeight(), pixels)));
    return new QRCodeReader()
        .decode(bitmap, Map.of(DecodeHintType.PURE_BARCODE, Boolean.FALSE))
        .getText();
  }
}
