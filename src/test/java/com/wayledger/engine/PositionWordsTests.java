package com.wayledger.engine;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** How a position is named in finding texts: the board's own words. */
class PositionWordsTests {

  @Test
  void boardOfWaysKeepsWayAndIecLineNames() {
    assertThat(PositionWords.WAYS.place(9, PhasePosition.L2)).isEqualTo("way 9 L2");
    assertThat(PositionWords.WAYS.place(4, PhasePosition.THREE_POLE)).isEqualTo("way 4 L1–L3");
  }

  @Test
  void panelboardNamesSpacesAndLettersAsItsPage() {
    PositionWords split = new PositionWords(true, SupplySystem.SPLIT_PHASE_120_240);
    assertThat(split.place(5, PhasePosition.L1)).isEqualTo("space 5 A");
    assertThat(split.place(3, PhasePosition.L1_L2)).isEqualTo("space 3 A–B");
    PositionWords wye = new PositionWords(true, SupplySystem.WYE_208Y_120);
    assertThat(wye.place(7, PhasePosition.THREE_POLE)).isEqualTo("space 7 A–C");
    assertThat(wye.place(7, null)).as("no position recorded").isEqualTo("space 7");
  }
}
