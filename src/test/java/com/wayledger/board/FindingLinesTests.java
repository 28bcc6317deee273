package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.context.support.ResourceBundleMessageSource;

/**
 * The findings list printed in Java carries the words, links, notes and classes the template used
 * to work out line by line, in the page's language (the real message bundles, en-GB and en-US).
 */
class FindingLinesTests {

  private static final String REFERENCE = "BS 7671 434.5.1";

  private static PageWords words(Locale locale) {
    ResourceBundleMessageSource messages = new ResourceBundleMessageSource();
    messages.setBasenames("messages");
    messages.setDefaultEncoding("UTF-8");
    messages.setFallbackToSystemLocale(false);
    return new PageWords(messages, locale);
  }

  private static Finding finding(CheckKind check, Verdict verdict, String summary, String remedy) {
    return new Finding(check, verdict, summary, List.of(), REFERENCE, remedy);
  }

  private static CircuitFindings circuit(long id, int way, String name, Finding... findings) {
    return new CircuitFindings(id, way, null, null, null, null, List.of(findings))
        .placed("DB2", PhasePosition.L1, name);
  }

  private static BoardFindings board(
      String reference, List<Finding> own, List<CircuitFindings> circuits) {
    return new BoardFindings(7L, reference, null, own, circuits);
  }

  private static FindingList list(
      BoardFindings board, Map<Long, Inheritance.Values> inherited, Locale locale) {
    return FindingLines.of(
        board.boardId(),
        FindingGroups.of(board, FindingGroups.notPassed(null)),
        inherited,
        "/app",
        words(locale));
  }

  private static final Inheritance.Values AMBIENT_AND_METHOD =
      new Inheritance.Values(
          List.of(
              new Inheritance.InheritedValue(
                  "cableAmbientCelsius", 40.0, Inheritance.Source.BOARD, null),
              new Inheritance.InheritedValue(
                  "cableInstallationMethod", InstallationMethod.C, Inheritance.Source.SITE, null),
              new Inheritance.InheritedValue(
                  "location", CircuitLocation.OUTDOORS, Inheritance.Source.BOARD, null)));

  @Test
  void aCircuitsOwnLineLinksToItUnderTheContextPathWithItsVerdictWordAndAnchor() {
    BoardFindings board =
        board(
            "DB2",
            List.of(),
            List.of(
                circuit(
                    41,
                    3,
                    "Kitchen",
                    finding(
                        CheckKind.WAY_OVERLOAD, Verdict.DANGER, "Ib 20 A > In 16 A", "uprate"))));

    FindingLine line = list(board, Map.of(), Locale.UK).problems().get(0);

    assertThat(line.verdictWord()).as("the verdict in words and shape").isEqualTo("▲ danger");
    assertThat(line.cssClass()).isEqualTo("finding v-DANGER");
    assertThat(line.badgeClass()).isEqualTo("badge v-DANGER");
    assertThat(line.elementId()).as("the schedule badge's anchor").isEqualTo("findings-c41");
    assertThat(line.href()).isEqualTo("/app/circuits/41");
    assertThat(line.place()).isEqualTo("way 3 L1 “Kitchen”");
    assertThat(line.ways()).as("a single line names no ways").isNull();
    assertThat(line.remedy()).isEqualTo("→ uprate");
    assertThat(line.note()).as("nothing inherited, no note").isNull();
  }

  @Test
  void theBoardsOwnFindingHasNoLinkAndABlankRemedyPrintsNothing() {
    BoardFindings board =
        board(
            "DB2",
            List.of(finding(CheckKind.PHASE_UNBALANCE, Verdict.WARNING, "phases unbalanced", " ")),
            List.of());

    FindingLine line = list(board, Map.of(), Locale.UK).problems().get(0);

    assertThat(line.board()).isEqualTo("DB2");
    assertThat(line.href()).as("no circuit to link to").isNull();
    assertThat(line.elementId()).isNull();
    assertThat(line.summary()).isEqualTo("phases unbalanced");
    assertThat(line.remedy()).as("a blank remedy").isNull();
  }

  @Test
  void aLineWhosePlacesDifferIsTitledInThePanelboardsWordsAndInTheBaseWordsOnABoardOfWays() {
    List<CircuitFindings> overloads =
        List.of(
            circuit(
                30, 3, "Lights", finding(CheckKind.WAY_OVERLOAD, Verdict.WARNING, "Ib 21 A", "")),
            circuit(
                50, 5, "Range", finding(CheckKind.WAY_OVERLOAD, Verdict.WARNING, "Ib 44 A", "")));
    BoardFindings panel =
        new BoardFindings(
            7L,
            "LP-1",
            null,
            List.of(),
            overloads,
            new com.wayledger.engine.PositionWords(
                true, com.wayledger.engine.SupplySystem.SPLIT_PHASE_120_240));

    // the title follows the board's rule set (as its findings' sentences do), whatever the page
    assertThat(list(panel, Map.of(), Locale.US).problems().get(0).summary())
        .isEqualTo("Space overloaded (Ib > In)");
    assertThat(list(panel, Map.of(), Locale.UK).problems().get(0).summary())
        .isEqualTo("Space overloaded (Ib > In)");
    assertThat(
            list(board("DB2", List.of(), overloads), Map.of(), Locale.UK)
                .problems()
                .get(0)
                .summary())
        .as("en-GB title unchanged on a board of ways")
        .isEqualTo("Way overloaded (Ib > In)");
  }

  @Test
  void theInheritedValuesTheCheckUsedAreNotedInTheFormsOrderWithTheirSource() {
    BoardFindings board =
        board(
            "DB2",
            List.of(),
            List.of(
                circuit(
                    41,
                    3,
                    "Kitchen",
                    finding(
                        CheckKind.CABLE_PROTECTION,
                        Verdict.WARNING,
                        "In 32 A > Iz 27 A",
                        "smaller device"))));

    FindingLine line = list(board, Map.of(41L, AMBIENT_AND_METHOD), Locale.UK).problems().get(0);

    assertThat(line.note().lead()).isEqualTo("Used:");
    assertThat(line.note().parts())
        .as("the cable check uses ambient and method, not the location; all but the last end in ;")
        .containsExactly(
            "ambient 40 °C (board default);", "method C clipped direct (site default)");
  }

  @Test
  void aStartUpMultipleNamesItsLoadCategory() {
    Inheritance.Values motor =
        new Inheritance.Values(
            List.of(
                new Inheritance.InheritedValue(
                    "loadStartUpMultiple", 8.0, Inheritance.Source.SITE, LoadCategory.MOTOR)));
    BoardFindings board =
        board(
            "DB2",
            List.of(),
            List.of(
                circuit(
                    41,
                    3,
                    "Mixer",
                    finding(CheckKind.START_UP_SURGE, Verdict.WARNING, "trips", "curve C"))));

    FindingLine line = list(board, Map.of(41L, motor), Locale.UK).problems().get(0);

    assertThat(line.note().parts()).containsExactly("start-up 8 × for Motor (site default)");
  }

  @Test
  void aGroupedLineListsItsWaysAndLinksEachPlaceAnchoringEachCircuitOnce() {
    Finding same = finding(CheckKind.BREAKING_CAPACITY, Verdict.WARNING, "Ics below PFC", "");
    BoardFindings board =
        board(
            "DB2",
            List.of(),
            List.of(
                circuit(30, 3, "Lights", same),
                circuit(50, 5, "Sockets", same),
                circuit(
                    90,
                    9,
                    "Kitchen",
                    same,
                    finding(CheckKind.WAY_OVERLOAD, Verdict.DANGER, "Ib > In", "uprate"))));

    FindingList list = list(board, Map.of(30L, AMBIENT_AND_METHOD), Locale.UK);

    assertThat(list.problems()).as("danger first, then the grouped warning").hasSize(2);
    FindingLine grouped = list.problems().get(1);
    assertThat(grouped.cssClass()).isEqualTo("finding v-WARNING grouped");
    assertThat(grouped.ways()).isEqualTo("3 ways: 3, 5, 9");
    assertThat(grouped.href()).as("a grouped line links each place instead").isNull();
    assertThat(grouped.note()).as("notes belong to a single circuit's line").isNull();
    assertThat(grouped.places())
        .extracting(
            FindingLine.Place::elementId,
            FindingLine.Place::anchorId,
            FindingLine.Place::href,
            FindingLine.Place::place,
            FindingLine.Place::summary)
        .as("way 9 has its own danger line, which carries its anchor")
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(
                "findings-c30-BREAKING_CAPACITY",
                "findings-c30",
                "/app/circuits/30",
                "way 3 L1 “Lights”",
                null),
            org.assertj.core.groups.Tuple.tuple(
                "findings-c50-BREAKING_CAPACITY",
                "findings-c50",
                "/app/circuits/50",
                "way 5 L1 “Sockets”",
                null),
            org.assertj.core.groups.Tuple.tuple(
                "findings-c90-BREAKING_CAPACITY",
                null,
                "/app/circuits/90",
                "way 9 L1 “Kitchen”",
                null));
  }

  @Test
  void placesWhoseSentencesDifferEachPrintTheirOwnAndTheLineTheChecksTitle() {
    BoardFindings board =
        board(
            "DB2",
            List.of(),
            List.of(
                circuit(
                    30, 3, "Lights", finding(CheckKind.VOLTAGE_DROP, Verdict.WARNING, "4.1 %", "")),
                circuit(
                    50,
                    5,
                    "Sockets",
                    finding(CheckKind.VOLTAGE_DROP, Verdict.WARNING, "5.6 %", ""))));

    FindingLine line = list(board, Map.of(), Locale.UK).problems().get(0);

    assertThat(line.summary()).isEqualTo(CheckKind.VOLTAGE_DROP.title());
    assertThat(line.places())
        .extracting(FindingLine.Place::summary)
        .containsExactly(": 4.1 %", ": 5.6 %");
  }

  @Test
  void adviceIsListedApartFromTheProblemsAndTheFilterKeepsOneVerdict() {
    BoardFindings board =
        board(
            "DB2",
            List.of(finding(CheckKind.SELECTIVITY, Verdict.ADVICE, "partial selectivity", "")),
            List.of(
                circuit(
                    30,
                    3,
                    "Lights",
                    finding(CheckKind.WAY_OVERLOAD, Verdict.DANGER, "Ib > In", ""),
                    finding(CheckKind.LOOP_IMPEDANCE, Verdict.NOT_ASSESSED, "no Ze", ""))));

    FindingList list = list(board, Map.of(), Locale.UK);

    assertThat(list.advice()).extracting(FindingLine::verdictWord).containsExactly("● advice");
    assertThat(list.problems())
        .extracting(FindingLine::verdict)
        .containsExactly("DANGER", "NOT_ASSESSED");
    assertThat(list.problemsOf("NOT_ASSESSED"))
        .extracting(FindingLine::verdictWord)
        .containsExactly("? not assessed");
    assertThat(list.problemsOf(null)).as("no filter").hasSize(2);
  }

  @Test
  void anNecSitesPageSaysSpacesAndPanelboardWhereABritishOneSaysWaysAndBoard() {
    Finding same = finding(CheckKind.CABLE_PROTECTION, Verdict.WARNING, "In > Iz", "");
    BoardFindings board =
        board(
            "LP1",
            List.of(),
            List.of(
                circuit(30, 3, "Lights", same),
                circuit(50, 5, "Sockets", same),
                circuit(
                    41,
                    7,
                    "Kitchen",
                    finding(CheckKind.CABLE_PROTECTION, Verdict.DANGER, "In ≫ Iz", ""))));

    FindingList british = list(board, Map.of(41L, AMBIENT_AND_METHOD), Locale.UK);
    FindingList american = list(board, Map.of(41L, AMBIENT_AND_METHOD), Locale.US);

    assertThat(british.problems().get(1).ways()).isEqualTo("2 ways: 3, 5");
    assertThat(american.problems().get(1).ways()).isEqualTo("2 spaces: 3, 5");
    assertThat(british.problems().get(0).note().parts().get(0))
        .isEqualTo("ambient 40 °C (board default);");
    assertThat(american.problems().get(0).note().parts().get(0))
        .isEqualTo("ambient 40 °C (panelboard default);");
  }

  @Test
  void theCircuitPageNotesOnlyTheChecksThatUsedAnInheritedValue() {
    ResourceBundleMessageSource messages = new ResourceBundleMessageSource();
    messages.setBasenames("messages");
    messages.setDefaultEncoding("UTF-8");

    Map<CheckKind, InheritedNote> notes =
        InheritedNote.byCheck(
            AMBIENT_AND_METHOD,
            List.of(CheckKind.WAY_OVERLOAD, CheckKind.SOCKET_RCD),
            messages,
            Locale.UK);

    assertThat(notes).as("overload uses no inherited value").containsOnlyKeys(CheckKind.SOCKET_RCD);
    assertThat(notes.get(CheckKind.SOCKET_RCD).parts())
        .containsExactly("Outdoors, or equipment used outdoors (board default)");
  }
}
