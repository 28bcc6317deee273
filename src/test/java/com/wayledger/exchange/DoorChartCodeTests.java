package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.support.QrImages;
import java.time.LocalDate;
import org.junit.jupiter.api.Test;

/** The door chart's QR code, drawn as SVG, rendered to pixels and read back. */
class DoorChartCodeTests {

  @Test
  void codeDecodesToTheLiveLinkWithPrintDateAndLogPosition() throws Exception {
    DoorChartCode code =
        DoorChartCode.of("https://ledger.example.org/app/", 42, LocalDate.of(2026, 3, 9), 1234);

    assertThat(code.link())
        .as("the link the code should carry")
        .isEqualTo("https://ledger.example.org/app/boards/42/live?printed=2026-03-09&at=1234");
    assertThat(QrImages.decodeSvg(code.svg())).as("what a reader sees").isEqualTo(code.link());
  }

  @Test
  void aDifferentPositionGivesADifferentCode() throws Exception {
    DoorChartCode before =
        DoorChartCode.of("http://localhost:8080", 7, LocalDate.of(2026, 1, 2), 5);
    DoorChartCode after = DoorChartCode.of("http://localhost:8080", 7, LocalDate.of(2026, 1, 2), 6);

    assertThat(QrImages.decodeSvg(after.svg())).endsWith("at=6");
    assertThat(after.svg()).isNotEqualTo(before.svg());
  }

  @Test
  void codeKeepsTheQuietZoneOfFourModules() {
    // ISO/IEC 18004 (from memory): a quiet zone of 4 modules round the symbol
    var matrix = DoorChartCode.matrix("http://localhost/boards/1/live?printed=2026-01-01&at=0");
    for (int i = 0; i < matrix.getWidth(); i++) {
      for (int edge = 0; edge < DoorChartCode.QUIET_ZONE_MODULES; edge++) {
        assertThat(matrix.get(i, edge)).as("module (%d,%d) of the top margin", i, edge).isFalse();
        assertThat(matrix.get(edge, i)).as("module (%d,%d) of the left margin", edge, i).isFalse();
      }
    }
  }
}
