package com.wayledger.board;

import java.util.List;

/**
 * One line of a board's findings list as it is printed: the verdict word, the place's link, the
 * ways, the "Used: …" note and the remedy worked out in Java ({@link FindingLines}), so that the
 * template prints one property per part instead of resolving a fragment with parameters for every
 * line.
 *
 * @param cssClass the line's classes ("finding v-WARNING", "finding v-ADVICE grouped")
 * @param elementId "findings-c9" for a line that stands for one circuit, the anchor its schedule
 *     badges link to; else null
 * @param verdict the verdict's name, what the list's filter compares with ("WARNING")
 * @param badgeClass the badge's classes ("badge v-WARNING")
 * @param verdictWord the verdict in words ("◆ warning")
 * @param board the board's name
 * @param href the circuit's page, for a line that stands for one circuit; else null
 * @param place that circuit's place ("way 2 L1–L3 “Spiral dough mixer”"); null without a circuit
 * @param ways for a grouped line, its places counted and listed ("24 ways: 1–12"); else null
 * @param summary the sentence shared by the line's places, or the check's title in the board's
 *     words when they differ
 * @param note the inherited values the check used, for a line that stands for one circuit; else
 *     null
 * @param reference the clause
 * @param remedy "→ what to do"; null when there is nothing to say
 * @param places a grouped line's places, each linked; empty for a single line
 */
public record FindingLine(
    String cssClass,
    String elementId,
    String verdict,
    String badgeClass,
    String verdictWord,
    String board,
    String href,
    String place,
    String ways,
    String summary,
    InheritedNote note,
    String reference,
    String remedy,
    List<Place> places) {

  public FindingLine {
    places = List.copyOf(places);
  }

  /** Whether the line is advice (listed apart, folded, below the problems). */
  public boolean isAdvice() {
    return "ADVICE".equals(verdict);
  }

  /**
   * One place of a grouped line.
   *
   * @param elementId "findings-c9-BREAKING_CAPACITY"
   * @param anchorId "findings-c9" on the circuit's first place in the list when no single line
   *     carries that anchor, so that its schedule badge finds it; else null
   * @param href the circuit's page
   * @param place "way 2 L1–L3 “Spiral dough mixer”"
   * @param summary ": this place's own sentence" when the line's places differ; else null
   */
  public record Place(
      String elementId, String anchorId, String href, String place, String summary) {}
}
