package com.wayledger.engine.protection.result;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PositionWords;
import com.wayledger.engine.SupplySystem;
import org.junit.jupiter.api.Test;

/**
 * Check titles in a board's words: the US trade's words on a board under the NEC rule set only
 * where the meaning truly matches (docs/wording.md), the base words on an IEC board.
 */
class CheckTitleTests {

  private static final PositionWords SPLIT_PHASE_PANEL =
      new PositionWords(true, SupplySystem.SPLIT_PHASE_120_240);
  private static final PositionWords NEC_SINGLE_LINE_BOARD =
      new PositionWords(false, SupplySystem.WYE_208Y_120, true);

  @Test
  void unbalanceOnAnNecPanelIsLineUnbalanceWithinThePanelboardsLimit() {
    // a 120/240 V panel's legs A and B are lines of one phase, not phases (docs/wording.md)
    assertThat(CheckKind.PHASE_UNBALANCE.title(SPLIT_PHASE_PANEL))
        .isEqualTo("Line unbalance within the panelboard's limit");
  }

  @Test
  void aWayIsASpaceOnAPanelboardAndStaysAWayOnABoardLaidOutInWays() {
    assertThat(CheckKind.WAY_OVERLOAD.title(SPLIT_PHASE_PANEL))
        .isEqualTo("Space overloaded (Ib > In)");
    assertThat(CheckKind.WAY_OVERLOAD.title(NEC_SINGLE_LINE_BOARD))
        .isEqualTo("Way overloaded (Ib > In)");
  }

  @Test
  void earthIsGroundUnderTheNecRuleSet() {
    assertThat(CheckKind.LOOP_IMPEDANCE.title(NEC_SINGLE_LINE_BOARD))
        .isEqualTo("Ground fault loop impedance within the disconnection limit");
  }

  @Test
  void anIecBoardReadsEveryTitleInTheBaseWords() {
    for (CheckKind check : CheckKind.values()) {
      assertThat(check.title(PositionWords.WAYS)).as(check.name()).isEqualTo(check.title());
    }
    assertThat(CheckKind.PHASE_UNBALANCE.title(PositionWords.WAYS))
        .isEqualTo("Phase unbalance within the board's limit");
  }

  @Test
  void titlesWithNoPairedWordReadTheSameOnAnNecPanel() {
    // "incomer", "busbar", "residual-current" have no exact US counterpart: they stay
    for (CheckKind check :
        new CheckKind[] {
          CheckKind.INCOMER_OVERLOAD,
          CheckKind.BUSBAR_OVERLOAD,
          CheckKind.SOCKET_RCD,
          CheckKind.CONTINUOUS_LOAD
        }) {
      assertThat(check.title(SPLIT_PHASE_PANEL)).as(check.name()).isEqualTo(check.title());
    }
  }
}
