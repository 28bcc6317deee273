package com.wayledger.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Headers of a results sheet guessed from the trade's words (common practice: the column headings
 * inspectors use on schedules of test results) and from our own grid headings.
 */
class ResultColumnGuesserTests {

  @ParameterizedTest(name = "\"{0}\" reads as {1}")
  @CsvSource(
      delimiter = '|',
      value = {
        "R1+R2|R1R2",
        "R1 + R2 (Ω)|R1R2",
        "r1+r2 ohms|R1R2",
        "R2|R2",
        "R2 Ω|R2",
        "r1|RING_R1",
        "rn|RING_RN",
        "r2|RING_R2",
        "Ring r2 (ohm)|RING_R2",
        "IR L-E|IR_LE",
        "IR L–E MΩ|IR_LE",
        "IR L-L|IR_LL",
        "IR L-N (MΩ)|IR_LL",
        "IR N-E|IR_NE",
        "Insulation N-E|IR_NE",
        "polarity|POLARITY",
        "Pol.|POLARITY",
        "Zs|ZS",
        "Zs (Ω)|ZS",
        "Measured Zs|ZS",
        "RCD ms|RCD_RATED",
        "RCD IΔn ms|RCD_RATED",
        "RCD 5× ms|RCD_FIVE",
        "RCD x5 (ms)|RCD_FIVE",
        "5×IΔn|RCD_FIVE",
        "RCD test button|RCD_BUTTON",
        "Btn|RCD_BUTTON",
        "Way|WAY",
        "Cct no.|WAY",
        "Line|LINE",
        "Phase|LINE",
        "Circuit key|CIRCUIT_KEY",
        "Circuit description|DESCRIPTION",
        "Inspector's remarks|IGNORE"
      })
  void aTradeHeaderAloneIsGuessed(String header, ResultColumn expected) {
    assertThat(ResultColumnGuesser.guess(List.of(header)))
        .as("guess for \"%s\"", header)
        .containsExactly(expected);
  }

  @Test
  void aWholeSheetGetsEachMeaningOnceAndTellsTheTwoR2sApartByCase() {
    List<String> headers =
        List.of(
            "Cct",
            "Circuit",
            "R1+R2",
            "R2",
            "r1",
            "rn",
            "r2",
            "IR L-L",
            "IR L-E",
            "IR N-E",
            "Polarity",
            "Zs",
            "RCD ms",
            "RCD 5x ms",
            "Notes");

    assertThat(ResultColumnGuesser.guess(headers))
        .containsExactly(
            ResultColumn.WAY,
            ResultColumn.DESCRIPTION,
            ResultColumn.R1R2,
            ResultColumn.R2,
            ResultColumn.RING_R1,
            ResultColumn.RING_RN,
            ResultColumn.RING_R2,
            ResultColumn.IR_LL,
            ResultColumn.IR_LE,
            ResultColumn.IR_NE,
            ResultColumn.POLARITY,
            ResultColumn.ZS,
            ResultColumn.RCD_RATED,
            ResultColumn.RCD_FIVE,
            ResultColumn.IGNORE);
  }

  @Test
  void twoColumnsWithTheSameWordsLeaveTheSecondUnread() {
    assertThat(ResultColumnGuesser.guess(List.of("Zs", "Zs")))
        .containsExactly(ResultColumn.ZS, ResultColumn.IGNORE);
  }

  @Test
  void readingsLoseTheUnitTheGridImpliesAndNotApplicableIsBlank() {
    assertThat(ResultImportService.reading("0.45 Ω")).isEqualTo("0.45");
    assertThat(ResultImportService.reading(">200MΩ")).isEqualTo(">200");
    assertThat(ResultImportService.reading("24 ms")).isEqualTo("24");
    assertThat(ResultImportService.reading("N/A")).isEmpty();
    assertThat(ResultImportService.reading("0,3x"))
        .as("a typo is left for the grid to refuse")
        .isEqualTo("0,3x");
    assertThat(ResultImportService.yesNo("✔")).isEqualTo("ok");
    assertThat(ResultImportService.yesNo("Fail")).isEqualTo("wrong");
    assertThat(ResultImportService.delayed("S")).isTrue();
    assertThat(ResultImportService.delayed("")).isFalse();
    assertThat(ResultImportService.delayed("maybe")).isNull();
  }

  @ParameterizedTest(name = "line \"{0}\" is {1}")
  @CsvSource({"L1,L1", "l2,L2", "3,L3", "3P,THREE_POLE", "L1-L3,THREE_POLE", "TP,THREE_POLE"})
  void lineWordsFindThePosition(String text, com.wayledger.engine.PhasePosition expected) {
    assertThat(ResultImportService.line(text)).isEqualTo(expected);
  }

  @Test
  void anUnknownLineIsNotGuessed() {
    assertThat(ResultImportService.line("L4")).isNull();
  }
}
