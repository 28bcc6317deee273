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
}
