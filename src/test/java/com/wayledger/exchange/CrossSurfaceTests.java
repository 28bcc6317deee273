package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DiversityMethods;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The board page and the API render the demand engine's figures for a board (the page's per-line
 * connected current shares a three-pole way's connected load evenly, as here); the exported
 * workbook, recalculated by POI's formula evaluator, must give the same per-line connected and
 * demand currents to 0.01 A, on generated sites and on the shop with its sub-board on a three-pole
 * feeder.
 */
class CrossSurfaceTests {

  private static double pageConnectedAmps(BoardDemand board, Phase phase) {
    double p = 0;
    double q = 0;
    for (CircuitDemand c : board.circuits()) {
      if (!c.isAssessed() || c.position() == null || !c.position().phases().contains(phase)) {
        continue;
      }
      int lines = c.position() == PhasePosition.THREE_POLE ? 3 : 1;
      p += c.connectedWatts() / lines;
      q += c.connectedVars() / lines;
    }
    return Math.hypot(p, q) / board.nominalVoltageVolts();
  }

  @ParameterizedTest
  @ValueSource(longs = {0, 1, 2, 3, 4})
  void workbookLinesAgreeWithThePageAndApiFigures(long seed) throws IOException {
    ExportData data =
        seed == 0
            ? ExchangeFixtures.shopExport()
            : ExchangeFixtures.export(
                ExchangeFixtures.generated(60, 9, seed), DiversityMethods.UK_SMALL_SHOP);
    List<String> compared = new ArrayList<>();
    try (XSSFWorkbook workbook = WorkbookWriterTests.written(data, true)) {
      FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
      for (BoardEntry entry : data.boards()) {
        BoardDemand board = data.demand().board(entry.id());
        var totals =
            WorkbookWriterTests.Totals.find(
                workbook.getSheet("Board " + entry.reference()), evaluator);
        for (Phase phase : entry.isThreePhase() ? List.of(Phase.values()) : List.of(Phase.L1)) {
          String label = entry.isThreePhase() ? phase.name() : "L–N";
          assertThat(totals.value(label, 3))
              .as("seed %d, %s %s connected A", seed, entry.reference(), phase)
              .isCloseTo(pageConnectedAmps(board, phase), within(0.01));
          assertThat(totals.value(label, 6))
              .as("seed %d, %s %s demand A", seed, entry.reference(), phase)
              .isCloseTo(board.onPhase(phase).currentAmps(), within(0.01));
          compared.add(entry.reference() + phase);
        }
      }
    }
    assertThat(compared).as("lines compared").hasSizeGreaterThanOrEqualTo(3);
  }
}
