package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.context.support.StaticMessageSource;
import org.springframework.ui.ExtendedModelMap;

/**
 * A kept board page view is shared by every reader: the keyboard focus after a save goes on a copy
 * of one line in that request's model, never on the kept lines.
 */
class BoardPageTests {

  private static BoardPage pageOf(List<ScheduleLine> lines) {
    return new BoardPage(
        null, null, null, null, lines, 0, null, Map.of(), null, Map.of(), Map.of(), null, List.of(),
        Map.of(), null, null, null, List.of(), null, null, null);
  }

  @SuppressWarnings("unchecked")
  private static List<ScheduleLine> linesIn(ExtendedModelMap model) {
    return (List<ScheduleLine>) model.getAttribute("lines");
  }

  @Test
  void theFirstFreePositionFromTheGivenWayTakesTheFocusInThisRequestOnly() {
    Board board = PageFixtures.board();
    List<ScheduleLine> kept =
        ScheduleLines.of(
            board,
            ScheduleRows.of(board, List.of()),
            "",
            Map.of(),
            Map.of(),
            Map.of(),
            Map.of(),
            null,
            new PageWords(new StaticMessageSource(), Locale.UK));
    BoardPage page = pageOf(kept);

    ExtendedModelMap afterSave = new ExtendedModelMap();
    page.addTo(afterSave, 2);
    ExtendedModelMap plainRead = new ExtendedModelMap();
    page.addTo(plainRead, null);

    List<ScheduleLine> focused =
        linesIn(afterSave).stream().filter(ScheduleLine::autofocus).toList();
    assertThat(focused).hasSize(1);
    // a three-line board: way 2's first position is L1, the first free one at or after way 2
    assertThat(focused.get(0).elementId()).isEqualTo("pos-2-L1");
    assertThat(kept).noneMatch(ScheduleLine::autofocus);
    assertThat(linesIn(plainRead)).isSameAs(kept);
  }
}
