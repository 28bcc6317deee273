package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.protection.result.Verdict;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.context.support.StaticMessageSource;
import org.springframework.test.util.ReflectionTestUtils;

/**
 * The schedule rows printed in Java carry the words, links and classes the template used to work
 * out cell by cell (the pages' own tests read the resulting HTML).
 */
class ScheduleLinesTests {

  private static final Locale UK = Locale.UK;

  private static PageWords words() {
    StaticMessageSource messages = new StaticMessageSource();
    messages.addMessage("common.none", UK, "—");
    messages.addMessage("action.edit", UK, "Edit");
    messages.addMessage("action.delete", UK, "Delete");
    messages.addMessage("schedule.addHere", UK, "Add a circuit here");
    messages.addMessage("schedule.notAssessed", UK, "not assessed: {0}");
    messages.addMessage(
        "schedule.needed", UK, "Still needed ({0,choice,1#1 input|1<{0,number,integer} inputs}):");
    messages.addMessage("needed.deviceKind", UK, "device");
    messages.addMessage("needed.loads", UK, "a load");
    messages.addMessage("verdict.DANGER", UK, "▲ danger");
    messages.addMessage("enum.WayStatus.IN_USE", UK, "in use");
    return new PageWords(messages, UK);
  }

  private static Circuit circuitWithId(Board board, long id) {
    Circuit circuit = PageFixtures.circuit(board);
    ReflectionTestUtils.setField(circuit, "id", id);
    return circuit;
  }

  private static List<ScheduleLine> lines(
      Board board,
      List<Circuit> circuits,
      Map<Long, List<String>> missing,
      Map<Long, CircuitDemand> demands,
      Map<Long, Map<Verdict, Long>> problems,
      String focus) {
    return ScheduleLines.of(
        board,
        ScheduleRows.of(board, circuits),
        "/app",
        missing,
        demands,
        Map.of(),
        problems,
        focus,
        words());
  }

  @Test
  void freePositionLinksToTheNewCircuitEditorUnderTheContextPath() {
    Board board = PageFixtures.board();

    var lines = lines(board, List.of(), Map.of(), Map.of(), Map.of(), "pos-1-L2");

    ScheduleLine second = lines.get(1);
    assertThat(second.free()).as("nothing recorded at way 1 L2").isTrue();
    assertThat(second.elementId()).isEqualTo("pos-1-L2");
    assertThat(second.phaseClass()).isEqualTo("phase ph-L2");
    assertThat(second.phase()).as("a three-line board prints the line").isEqualTo("L2");
    assertThat(second.addHref()).isEqualTo("/app/boards/5/circuits/new?way=1&position=L2");
    assertThat(second.addLabel()).isEqualTo("Add a circuit here 1 L2");
    assertThat(second.autofocus()).as("the focused row's add button").isTrue();
    assertThat(lines.get(0).autofocus()).as("any other row's").isFalse();
  }

  @Test
  void circuitRowCarriesItsLinksWordsBadgesAndMissingInputs() {
    Board board = PageFixtures.board();
    Circuit circuit = circuitWithId(board, 41);
    Map<Verdict, Long> counts = new EnumMap<>(Verdict.class);
    counts.put(Verdict.DANGER, 2L);
    var notAssessed =
        new CircuitDemand(
            41, 2, "Boiler", PhasePosition.L1, "no rating", 0, 0, 0, 0, 0, 0, null, 0);

    var lines =
        lines(
            board,
            List.of(circuit),
            Map.of(41L, List.of("deviceKind", "loads")),
            Map.of(41L, notAssessed),
            Map.of(41L, counts),
            null);

    ScheduleLine row = lines.stream().filter(ScheduleLine::circuit).findFirst().orElseThrow();
    assertThat(row.elementId()).isEqualTo("pos-2-L1");
    assertThat(row.rowClass()).isEqualTo("status-IN_USE");
    assertThat(row.href()).isEqualTo("/app/circuits/41");
    assertThat(row.editHref()).isEqualTo("/app/circuits/41/edit");
    assertThat(row.editLabel()).isEqualTo("Edit Boiler");
    assertThat(row.deleteHref()).isEqualTo("/app/circuits/41/delete");
    assertThat(row.deleteLabel()).isEqualTo("Delete Boiler");
    assertThat(row.status()).isEqualTo("in use");
    assertThat(row.span()).isEqualTo(1);
    assertThat(row.rowspan()).as("one row: no rowspan printed").isNull();
    assertThat(row.badges())
        .containsExactly(new ScheduleLine.Badge("#findings-c41", "badge v-DANGER", "2 ▲ danger"));
    assertThat(row.needed())
        .isEqualTo(
            new ScheduleLine.Needed(
                "needed-c41", "Still needed (2 inputs):", List.of("device,", "a load")));
    assertThat(row.notAssessed()).isEqualTo("not assessed: no rating");
    assertThat(row.noDemand()).as("there is a demand entry, though not assessed").isFalse();
    assertThat(row.figures()).as("no figures for a circuit not assessed").isNull();
  }

  @Test
  void circuitWithoutDemandFiguresPrintsEmptyCellsAndNoNeededLine() {
    Board board = PageFixtures.board();
    Circuit circuit = circuitWithId(board, 42);

    var lines = lines(board, List.of(circuit), Map.of(42L, List.of()), Map.of(), null, null);

    ScheduleLine row = lines.stream().filter(ScheduleLine::circuit).findFirst().orElseThrow();
    assertThat(row.noDemand()).isTrue();
    assertThat(row.notAssessed()).isNull();
    assertThat(row.needed()).as("nothing missing prints no line").isNull();
    assertThat(row.badges()).isEmpty();
  }

  @Test
  void missingWordPrintsAsThymeleafWouldInsteadOfFailing() {
    assertThat(words().word("no.such.key")).isEqualTo("??no.such.key_en_GB??");
  }
}
