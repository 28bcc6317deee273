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

  @Test
  void balancingMovesNameSpacesAndLinesOnAPanelboard() {
    var move =
        new com.wayledger.engine.balance.CircuitMove(7, "Dryer", 12.0, Phase.L2, 4, Phase.L1, 7);
    PositionWords split = new PositionWords(true, SupplySystem.SPLIT_PHASE_120_240);

    assertThat(move.inWords(split)).isEqualTo("move circuit 'Dryer' from space 4 B to space 7 A");
    assertThat(move.inWords())
        .as("a board of ways keeps its words")
        .isEqualTo("move circuit 'Dryer' from way 4 L2 to way 7 L1");
  }

  @Test
  void loadingFindingsOfAnNecBoardNameItsLinesAndPanelboard() {
    PositionWords split = new PositionWords(true, SupplySystem.SPLIT_PHASE_120_240);
    var unbalance =
        com.wayledger.engine.protection.check.BoardLoadCheck.unbalance(30.0, 10.0, split, 2);
    var overload =
        com.wayledger.engine.protection.check.BoardLoadCheck.overload(
            com.wayledger.engine.protection.result.CheckKind.BUSBAR_OVERLOAD,
            "busbar",
            120.0,
            100.0,
            "NEC 408.36",
            split);

    assertThat(unbalance.remedy())
        .isEqualTo("move single-phase circuits between A and B (see phase balancing)");
    assertThat(overload.remedy())
        .isEqualTo("rebalance the phases, move load to another panelboard, or uprate the busbar");
    assertThat(com.wayledger.engine.protection.check.BoardLoadCheck.unbalance(30.0, 10.0).remedy())
        .as("IEC words unchanged")
        .isEqualTo("move single-phase circuits between L1, L2 and L3 (see phase balancing)");
  }

  @Test
  void anNecSiteSpeaksOfPanelboardsAndSubpanelsEvenOnASingleLineBoard() {
    PositionWords singleLine = new PositionWords(false, SupplySystem.WYE_208Y_120, true);
    assertThat(singleLine.board()).isEqualTo("panelboard");
    assertThat(singleLine.subBoard()).isEqualTo("subpanel");
    assertThat(singleLine.place(3, PhasePosition.L1)).as("laid out in ways").isEqualTo("way 3 A");
    assertThat(PositionWords.WAYS.board()).isEqualTo("board");
    assertThat(PositionWords.WAYS.subBoard()).isEqualTo("sub-board");
  }
}
