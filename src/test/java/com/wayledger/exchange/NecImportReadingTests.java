package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.board.CircuitForm;
import com.wayledger.engine.PhasePosition;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Sheets written in the North American vocabulary ("space", "leg", "breaker", "240 V") and in ours
 * ("way", "line", "connection") are read into the same positions of a 120/240 V panel: a single
 * line with a line-to-line connection is a two-pole circuit. The sheets and their figures are
 * invented.
 */
class NecImportReadingTests {

  private static ValidatorFactory factory;
  private static Validator validator;

  /** A 120/240 V panel: lines A and B and the two-pole A–B position. */
  private static final RowReader.BoardContext SPLIT_PHASE_PANEL =
      new RowReader.BoardContext(1, 21, Set.of(), PhasePosition.onBoardWith(2, true));

  @BeforeAll
  static void validator() {
    factory = Validation.buildDefaultValidatorFactory();
    validator = factory.getValidator();
  }

  @AfterAll
  static void close() {
    factory.close();
  }

  private static ImportPlan read(String csv, RowReader.BoardContext board) {
    SheetTable table =
        SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "panel.csv", -1);
    return new RowReader(validator).read(table, ColumnGuesser.guess(table), board);
  }

  private static List<PhasePosition> positions(ImportPlan plan) {
    return plan.circuits().stream().map(c -> c.circuit()).map(CircuitForm::position).toList();
  }

  @Test
  void usEnglishHeadersAreGuessedAndTwoHundredFortyVoltIsTwoPole() {
    String csv =
        """
        Space,Leg,Description,Device,Breaker A,Poles,Volts
        1,A,Kitchen countertop,MCB,20,1,120 V
        1,B,Bath receptacle,MCB,20,1,120 V
        2,A,Water heater,MCB,30,2,240 V
        """;

    SheetTable table =
        SpreadsheetReader.read(csv.getBytes(StandardCharsets.UTF_8), "panel.csv", -1);
    assertThat(ColumnGuesser.guess(table))
        .startsWith(ImportField.WAY, ImportField.LINE, ImportField.CIRCUIT)
        .endsWith(ImportField.CONNECTION);
    ImportPlan plan = read(csv, SPLIT_PHASE_PANEL);

    assertThat(plan.isAllValid()).as("problems: %s", plan.rows()).isTrue();
    assertThat(positions(plan))
        .containsExactly(PhasePosition.L1, PhasePosition.L2, PhasePosition.L1_L2);
  }

  @Test
  void ukEnglishHeadersWithAConnectionColumnReadTheSame() {
    String csv =
        """
        Way,Line,Circuit,Device,In A,Connection
        1,L1,Kitchen countertop,MCB,20,L-N
        1,L2,Bath receptacle,MCB,20,line to neutral
        2,L1,Water heater,MCB,30,line to line
        """;

    ImportPlan plan = read(csv, SPLIT_PHASE_PANEL);

    assertThat(plan.isAllValid()).as("problems: %s", plan.rows()).isTrue();
    assertThat(positions(plan))
        .containsExactly(PhasePosition.L1, PhasePosition.L2, PhasePosition.L1_L2);
  }

  @Test
  void lineBWithLineToLineOnASplitPhasePanelIsTheOneTwoPolePosition() {
    // a 120/240 V panel has one line-to-line position, A–B (the two halves of one winding)
    ImportPlan plan =
        read(
            """
            Space,Leg,Description,Device,Breaker A,Connection
            3,B,Dryer,MCB,30,L-L
            """,
            SPLIT_PHASE_PANEL);

    assertThat(positions(plan)).containsExactly(PhasePosition.L1_L2);
  }

  @Test
  void badConnectionIsRefusedOnItsOwnCell() {
    ImportPlan plan =
        read(
            """
            Way,Line,Circuit,In A,Connection
            1,L1,Heater,20,sideways
            """,
            SPLIT_PHASE_PANEL);

    assertThat(plan.isAllValid()).isFalse();
    assertThat(plan.rows().get(0).hasProblem(ImportField.CONNECTION)).isTrue();
    assertThat(plan.rows().get(0).hasProblem(ImportField.LINE)).isFalse();
  }

  @Test
  void threePhaseConnectionOnASplitPhasePanelIsRefused() {
    ImportPlan plan =
        read(
            """
            Way,Line,Circuit,In A,Connection
            1,L1,Pump,20,3-phase
            """,
            SPLIT_PHASE_PANEL);

    assertThat(plan.isAllValid()).isFalse();
    assertThat(plan.rows().get(0).hasProblem(ImportField.LINE)).isTrue();
  }

  @Test
  void lineBOnASingleLineBoardIsStillRefused() {
    ImportPlan plan =
        read(
            """
            Way,Line,Circuit,In A
            1,L2,Lights,10
            """,
            new RowReader.BoardContext(1, 12, Set.of()));

    assertThat(plan.isAllValid()).isFalse();
    assertThat(plan.rows().get(0).hasProblem(ImportField.LINE)).isTrue();
  }

  @Test
  void connectionCodesOfBothVocabularies() {
    assertThat(Codes.parseConnection("L-L")).isEqualTo(Codes.Connection.LINE_TO_LINE);
    assertThat(Codes.parseConnection("240 V")).isEqualTo(Codes.Connection.LINE_TO_LINE);
    assertThat(Codes.parseConnection("208V")).isEqualTo(Codes.Connection.LINE_TO_LINE);
    assertThat(Codes.parseConnection("2-pole")).isEqualTo(Codes.Connection.LINE_TO_LINE);
    assertThat(Codes.parseConnection("line to neutral"))
        .isEqualTo(Codes.Connection.LINE_TO_NEUTRAL);
    assertThat(Codes.parseConnection("277 V")).isEqualTo(Codes.Connection.LINE_TO_NEUTRAL);
    assertThat(Codes.parseConnection("three-phase")).isEqualTo(Codes.Connection.THREE_PHASE);
    assertThat(Codes.parseConnection("sideways")).isNull();
    assertThat(Codes.connection(PhasePosition.L1_L2)).isEqualTo("L-L");
    assertThat(Codes.connection(PhasePosition.L2)).isEqualTo("L-N");
    assertThat(Codes.connection(PhasePosition.THREE_POLE)).isEqualTo("3-phase");
  }

  @Test
  void lineCellsNameTheLinesAsTheBoardDoesAndReadBackInEitherSpelling() {
    java.util.function.Function<com.wayledger.engine.Phase, String> letters =
        com.wayledger.engine.SupplySystem.WYE_208Y_120::lineName;
    java.util.function.Function<com.wayledger.engine.Phase, String> iec =
        com.wayledger.engine.SupplySystem.IEC_WYE::lineName;

    assertThat(Codes.line(PhasePosition.L2, letters)).isEqualTo("B");
    assertThat(Codes.line(PhasePosition.L3_L1, letters)).isEqualTo("C-A");
    assertThat(Codes.line(PhasePosition.THREE_POLE, letters)).isEqualTo("3P");
    assertThat(Codes.line(PhasePosition.L2, iec)).isEqualTo("L2");
    assertThat(Codes.line(PhasePosition.L1_L2, iec)).isEqualTo("L1-L2");
    for (PhasePosition position : PhasePosition.values()) {
      assertThat(Codes.parseLine(Codes.line(position, letters)))
          .as("%s written as letters reads back", position)
          .isEqualTo(position);
      assertThat(Codes.parseLine(Codes.line(position, iec)))
          .as("%s written as L1/L2/L3 reads back", position)
          .isEqualTo(position);
    }
  }
}
