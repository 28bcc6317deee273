package com.wayledger.diagram;

import java.io.ByteArrayOutputStream;
import java.io.StringReader;
import org.apache.batik.transcoder.TranscoderException;
import org.apache.batik.transcoder.TranscoderInput;
import org.apache.batik.transcoder.TranscoderOutput;
import org.apache.batik.transcoder.image.PNGTranscoder;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Service;

/**
 * The site diagram as a PNG picture, for the site workbook (spreadsheets hold raster pictures).
 * Rendered from the same SVG with Apache Batik, scaled down when the drawing is large so that the
 * picture stays within {@link #MAX_PIXELS}.
 */
@Service
public class DiagramPicture {

  /** Largest picture in pixels (width × height): about 32 MB of memory while rendering. */
  static final double MAX_PIXELS = 8_000_000;

  /** Scale of a small diagram: 1.25 pixels per SVG unit, for sharp text when printed. */
  static final double PREFERRED_SCALE = 1.25;

  private final DiagramReader reader;
  private final MessageSource messages;

  public DiagramPicture(DiagramReader reader, MessageSource messages) {
    this.reader = reader;
    this.messages = messages;
  }

  /** The diagram of a site as PNG bytes. */
  public byte[] png(long siteId) {
    SiteDiagram diagram = reader.read(siteId, null);
    String svg =
        new DiagramSvg(DiagramController.words(messages), "", DiagramController.caution(messages))
            .draw(diagram);
    return png(svg);
  }

  /** Renders an SVG document from {@link DiagramSvg} to PNG. */
  static byte[] png(String svg) {
    double width = attribute(svg, "width");
    double height = attribute(svg, "height");
    double scale = Math.min(PREFERRED_SCALE, Math.sqrt(MAX_PIXELS / (width * height)));
    PNGTranscoder transcoder = new PNGTranscoder();
    transcoder.addTranscodingHint(PNGTranscoder.KEY_WIDTH, (float) Math.floor(width * scale));
    transcoder.addTranscodingHint(PNGTranscoder.KEY_HEIGHT, (float) Math.floor(height * scale));
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      transcoder.transcode(new TranscoderInput(new StringReader(svg)), new TranscoderOutput(out));
    } catch (TranscoderException e) {
      throw new IllegalStateException("Could not render the site diagram to PNG", e);
    }
    return out.toByteArray();
  }

  private static double attribute(String svg, String name) {
    String marker = " " + name + "=\"";
    int start = svg.indexOf(marker) + marker.length();
    return Double.parseDouble(svg.substring(start, svg.indexOf('"', start)));
  }
}
