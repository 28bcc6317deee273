package com.wayledger.engine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/**
 * Panelboard space numbering, common practice of the trade (odd left, even right, bus rows
 * alternating A, B on 120/240 V and A, B, C on three-phase panels); no standard document at hand.
 */
class PanelSpacesTests {

  @Test
  void oddSpacesAreOnTheLeftAndShareARowWithTheNextEven() {
    PanelSpaces panel = new PanelSpaces(42, 2);
    assertThat(panel.isLeft(1)).isTrue();
    assertThat(panel.isLeft(2)).isFalse();
    assertThat(panel.rowOf(1)).isEqualTo(panel.rowOf(2)).isEqualTo(1);
    assertThat(panel.rowOf(41)).isEqualTo(21);
  }

  @Test
  void aSplitPhasePanelAlternatesLinesByRow() {
    PanelSpaces panel = new PanelSpaces(30, 2);
    assertThat(panel.lineOf(1)).isEqualTo(Phase.L1);
    assertThat(panel.lineOf(2)).as("same row as space 1").isEqualTo(Phase.L1);
    assertThat(panel.lineOf(3)).isEqualTo(Phase.L2);
    assertThat(panel.lineOf(5)).isEqualTo(Phase.L1);
  }

  @Test
  void aTwoPoleBreakerTakesTwoAdjacentSpacesAndBothLines() {
    PanelSpaces panel = new PanelSpaces(42, 2);
    assertThat(panel.spacesOf(3, 2)).containsExactly(3, 5);
    assertThat(panel.positionOf(3, 2)).isEqualTo(PhasePosition.L1_L2);
  }

  @Test
  void onAThreePhasePanelTwoPolesTakeTheNextLinesInOrder() {
    PanelSpaces panel = new PanelSpaces(42, 3);
    assertThat(panel.lineOf(1)).isEqualTo(Phase.L1);
    assertThat(panel.lineOf(3)).isEqualTo(Phase.L2);
    assertThat(panel.lineOf(5)).isEqualTo(Phase.L3);
    assertThat(panel.lineOf(7)).isEqualTo(Phase.L1);
    assertThat(panel.positionOf(2, 2)).isEqualTo(PhasePosition.L1_L2);
    assertThat(panel.positionOf(4, 2)).isEqualTo(PhasePosition.L2_L3);
    assertThat(panel.positionOf(6, 2)).as("C then A").isEqualTo(PhasePosition.L3_L1);
    assertThat(panel.spacesOf(1, 3)).containsExactly(1, 3, 5);
    assertThat(panel.positionOf(1, 3)).isEqualTo(PhasePosition.THREE_POLE);
  }

  @Test
  void aBreakerThatRunsOffThePanelOrHasTooManyPolesIsRefused() {
    PanelSpaces panel = new PanelSpaces(24, 2);
    assertThatThrownBy(() -> panel.spacesOf(23, 2)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> panel.spacesOf(1, 3)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new PanelSpaces(25, 2)).isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void aTwoPoleBreakerStartingOnTheLastRowRunsPastTheBottom() {
    PanelSpaces panel = new PanelSpaces(42, 2);
    // spaces 41 and 42 are the last row: a second pole would need space 43 or 44
    assertThat(panel.fitOf(41, 2)).isEqualTo(PanelSpaces.Fit.RUNS_PAST_BOTTOM);
    assertThat(panel.fitOf(42, 2)).isEqualTo(PanelSpaces.Fit.RUNS_PAST_BOTTOM);
    assertThat(panel.fitOf(39, 2)).as("39 and 41").isEqualTo(PanelSpaces.Fit.FITS);
    assertThat(panel.fitOf(41, 1)).isEqualTo(PanelSpaces.Fit.FITS);
  }

  @Test
  void aSpacePastTheCountOrAThirdPoleOnASplitPhasePanelDoesNotFit() {
    PanelSpaces panel = new PanelSpaces(24, 2);
    assertThat(panel.fitOf(25, 1)).isEqualTo(PanelSpaces.Fit.NO_SUCH_SPACE);
    assertThat(panel.fitOf(0, 1)).isEqualTo(PanelSpaces.Fit.NO_SUCH_SPACE);
    assertThat(panel.fitOf(1, 3)).isEqualTo(PanelSpaces.Fit.TOO_MANY_POLES);
    assertThat(new PanelSpaces(24, 3).fitOf(19, 3))
        .as("19, 21, 23")
        .isEqualTo(PanelSpaces.Fit.FITS);
    assertThat(new PanelSpaces(24, 3).fitOf(21, 3)).isEqualTo(PanelSpaces.Fit.RUNS_PAST_BOTTOM);
  }

  @Test
  void breakersOverlapOnlyWhenTheyShareASpaceInTheSameColumn() {
    PanelSpaces panel = new PanelSpaces(42, 2);
    // a 2-pole at 7 takes 7 and 9; a 1-pole at 9 sits on its second pole
    assertThat(panel.sharedSpace(9, 1, 7, 2)).isEqualTo(9);
    assertThat(panel.sharedSpace(5, 2, 7, 2)).as("5/7 against 7/9").isEqualTo(7);
    assertThat(panel.sharedSpace(8, 2, 7, 2)).as("the other column").isZero();
    assertThat(panel.sharedSpace(11, 1, 7, 2)).isZero();
    PanelSpaces threeLine = new PanelSpaces(42, 3);
    assertThat(threeLine.sharedSpace(5, 1, 1, 3)).as("1, 3, 5").isEqualTo(5);
  }

  @Test
  void onlyBoardsOfTwoOrThreeLinesUnderTheNecSetAreLaidOutAsPanelboards() {
    assertThat(PanelSpaces.ofBoard("IEC", 3, 12)).isNull();
    assertThat(PanelSpaces.ofBoard(null, 2, 12)).isNull();
    assertThat(PanelSpaces.ofBoard("NEC", 1, 12)).as("a two-wire board has one line").isNull();
    assertThat(PanelSpaces.ofBoard("NEC", 2, 42)).isEqualTo(new PanelSpaces(42, 2));
    assertThat(PanelSpaces.ofBoard("NEC", 3, 29))
        .as("a count stored odd is shown with one more space")
        .isEqualTo(new PanelSpaces(30, 3));
  }

  @Test
  void everySpaceOfA42SpaceSplitPhasePanelHasTheLineOfItsRow() {
    PanelSpaces panel = new PanelSpaces(42, 2);
    assertThat(panel.rowCount()).isEqualTo(21);
    for (int space = 1; space <= 42; space++) {
      int row = (space + 1) / 2;
      Phase expected = row % 2 == 1 ? Phase.L1 : Phase.L2; // A on odd rows, B on even (practice)
      assertThat(panel.lineOf(space)).as("space %d", space).isEqualTo(expected);
    }
  }
}
