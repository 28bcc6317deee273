package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A board's findings listed as an inspector would: one row per check and grade, ways named. */
class FindingGroupsTests {

  private static Finding breaking(String summary) {
    return new Finding(
        CheckKind.BREAKING_CAPACITY,
        Verdict.ADVICE,
        summary,
        List.of(),
        "BS 7671 434.5.1",
        "check the back-up protection");
  }

  private static CircuitFindings circuit(int way, String name, Finding... findings) {
    return new CircuitFindings(way * 10L, way, null, null, null, null, List.of(findings))
        .placed("DB2", PhasePosition.L1, name);
  }

  private static BoardFindings board(List<CircuitFindings> circuits, Finding... own) {
    return new BoardFindings(7L, "DB2", null, List.of(own), circuits);
  }

  @Test
  void theSameBreakingCapacityRemarkOnManyWaysIsOneRowListingTheWays() {
    String remark = "breaking capacity relies on the incomer's back-up";
    List<CircuitFindings> circuits = new ArrayList<>();
    circuits.add(circuit(9, "Kitchen", breaking(remark)));
    circuits.add(circuit(3, "Lights", breaking(remark)));
    circuits.add(circuit(5, "Sockets", breaking(remark)));

    List<FindingGroups.Group> rows =
        FindingGroups.of(board(circuits), FindingGroups.notPassed(null));

    assertThat(rows).as("one row for the three ways").hasSize(1);
    FindingGroups.Group row = rows.get(0);
    assertThat(row.ways()).isEqualTo("3, 5, 9");
    assertThat(row.summary()).as("the shared sentence").isEqualTo(remark);
    assertThat(row.places())
        .as("each place keeps its way, line, circuit name and link")
        .extracting(
            FindingGroups.Place::circuitId,
            FindingGroups.Place::wayNumber,
            FindingGroups.Place::line,
            FindingGroups.Place::circuitName)
        .containsExactly(
            org.assertj.core.groups.Tuple.tuple(30L, 3, "L1", "Lights"),
            org.assertj.core.groups.Tuple.tuple(50L, 5, "L1", "Sockets"),
            org.assertj.core.groups.Tuple.tuple(90L, 9, "L1", "Kitchen"));
  }

  @Test
  void rowsAreOrderedByGradeDangerFirstAndPassesAreLeftOut() {
    Finding danger =
        new Finding(
            CheckKind.WAY_OVERLOAD, Verdict.DANGER, "Ib 20 A above In 16 A", List.of(), "r", "x");
    Finding pass = Finding.pass(CheckKind.VOLTAGE_DROP, "within the limit", List.of(), "r");
    Finding notAssessed = Finding.notAssessed(CheckKind.LOOP_IMPEDANCE, "cable length", "r");
    List<CircuitFindings> circuits =
        List.of(
            circuit(1, "Lights", breaking("a"), pass, notAssessed),
            circuit(2, "Oven", danger, notAssessed));

    List<FindingGroups.Group> rows =
        FindingGroups.of(board(circuits), FindingGroups.notPassed(null));

    assertThat(rows)
        .extracting(FindingGroups.Group::verdict)
        .containsExactly(Verdict.DANGER, Verdict.ADVICE, Verdict.NOT_ASSESSED);
    assertThat(rows.get(2).ways()).as("not assessed on both ways, one row").isEqualTo("1, 2");
    assertThat(rows.get(0).isGrouped()).as("a finding on one way stays a single row").isFalse();
    assertThat(rows.get(0).single().place()).isEqualTo("way 2 L1 “Oven”");
  }

  @Test
  void differentSentencesOfOneCheckAndGradeShareARowAndKeepTheirOwnSentence() {
    List<CircuitFindings> circuits =
        List.of(
            circuit(1, "Lights", breaking("6 kA below 7.2 kA")),
            circuit(2, "Oven", breaking("4.5 kA below 7.2 kA")));

    FindingGroups.Group row =
        FindingGroups.of(board(circuits), FindingGroups.notPassed(null)).get(0);

    assertThat(row.summary()).as("no shared sentence").isNull();
    assertThat(row.places())
        .extracting(FindingGroups.Place::summary)
        .containsExactly("6 kA below 7.2 kA", "4.5 kA below 7.2 kA");
  }

  @Test
  void longRunsOfWaysAreWrittenAsRanges() {
    assertThat(FindingGroups.wayList(List.of(7, 1, 2, 3, 4, 9, 10))).isEqualTo("1–4, 7, 9, 10");
  }

  @Test
  void aGradeFilterKeepsOnlyThatGrade() {
    Finding danger =
        new Finding(CheckKind.WAY_OVERLOAD, Verdict.DANGER, "overloaded", List.of(), "r", "x");
    List<CircuitFindings> circuits =
        List.of(circuit(1, "Lights", breaking("a")), circuit(2, "Oven", danger));

    assertThat(FindingGroups.of(board(circuits), FindingGroups.notPassed(Verdict.DANGER)))
        .extracting(FindingGroups.Group::verdict)
        .containsExactly(Verdict.DANGER);
  }
}
