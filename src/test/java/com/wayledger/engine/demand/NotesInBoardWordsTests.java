package com.wayledger.engine.demand;

import static com.wayledger.engine.demand.Fixtures.load;
import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The demand engine's not-assessed notes and problems name a position as the board's page does:
 * spaces and lines A/B on a North American panelboard, ways and L1–L3 on an IEC board
 * (engine/PositionWords; docs/wording.md). The words are the trade's (common practice).
 */
class NotesInBoardWordsTests {

  private static BoardSpec panel(SupplySpec supply) {
    return Fixtures.board(
        1,
        supply == Fixtures.SUPPLY_230 ? 3 : 1,
        null,
        DiversityMethods.NONE,
        100.0,
        List.of(
            // no position recorded
            Fixtures.circuit(1, 5, null, load(LoadCategory.OTHER, 1, 1200.0, RatingUnit.W, 1.0)),
            // a load without a rating unit
            Fixtures.circuit(2, 6, PhasePosition.L2, load(LoadCategory.OTHER, 1, 500.0, null, 1.0)),
            // feeds a board that is not on the site
            Fixtures.feeder(3, 9, PhasePosition.L1_L2, 99L)));
  }

  private static SiteDemand evaluate(String ruleSet, SupplySpec supply) {
    SiteSpec site =
        new SiteSpec(1, "site", supply, DiversityMethods.NONE, List.of(panel(supply)), ruleSet);
    return DemandEngine.evaluate(site, DiversityMethods.builtIn());
  }

  @Test
  void necPanelboardNotesNameSpacesAndLinesAB() {
    SiteDemand demand = evaluate("NEC", NorthAmericanSupplyTests.SPLIT_PHASE);
    List<String> notAssessed = demand.board(1).notAssessed();

    assertThat(notAssessed)
        .as("a 120/240 V panelboard names spaces and its lines A and B")
        .contains(
            "space 5 (way 5): not assessed — missing position (line A, B or two-pole)",
            "space 6 B (way 6): not assessed — load \"OTHER load\": missing or invalid rating unit")
        .noneMatch(text -> text.startsWith("way "))
        .noneMatch(text -> text.contains("L1") || text.contains("L2"));
    assertThat(demand.problems())
        .as("the feed to a board not on the site, in panelboard words")
        .contains("panelboard DB1 space 9 A–B feeds panelboard #99, which is not on this site");
  }

  @Test
  void iecBoardNotesKeepWaysAndL1ToL3() {
    SiteDemand demand = evaluate("IEC", Fixtures.SUPPLY_230);
    List<String> notAssessed = demand.board(1).notAssessed();

    assertThat(notAssessed)
        .contains(
            "way 5 (way 5): not assessed — missing position (line L1, L2, L3 or three-pole)",
            "way 6 L2 (way 6): not assessed — load \"OTHER load\": missing or invalid rating unit");
    assertThat(demand.problems())
        .contains("board DB1 way 9 L1–L2 feeds board #99, which is not on this site");
  }

  @Test
  void faultLevelReasonsOnAnNecSiteSayPanelboard() {
    BoardSpec orphan =
        Fixtures.board(2, 1, 99L, DiversityMethods.NONE, 100.0, List.of()).withSupplySystem(null);
    SiteSpec nec =
        new SiteSpec(
            1,
            "site",
            NorthAmericanSupplyTests.SPLIT_PHASE,
            DiversityMethods.NONE,
            List.of(orphan),
            "NEC");
    SiteSpec iec =
        new SiteSpec(1, "site", Fixtures.SUPPLY_230, DiversityMethods.NONE, List.of(orphan));

    var necLevel =
        com.wayledger.engine.protection.fault.FaultLevels.of(nec, java.util.Map.of()).get(2L);
    var iecLevel =
        com.wayledger.engine.protection.fault.FaultLevels.of(iec, java.util.Map.of()).get(2L);

    assertThat(necLevel.faultCurrentKiloAmps().missing())
        .isEqualTo("parent panelboard 99 of DB2 (not on the site)");
    assertThat(iecLevel.faultCurrentKiloAmps().missing())
        .isEqualTo("parent board 99 of DB2 (not on the site)");
  }
}
