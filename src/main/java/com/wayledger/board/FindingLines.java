package com.wayledger.board;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Turns a board's grouped findings ({@link FindingGroups}) into its printed list ({@link
 * FindingList}) of lines ({@link FindingLine}): the words come from the page's {@link PageWords}
 * (so the user's language, else the site's rule set, picks them), the links are written out with
 * the application's context path. The list prints what the template printed when it resolved a
 * fragment for every line.
 */
final class FindingLines {

  private FindingLines() {}

  /**
   * The findings list of one board, read from the site's analysis: every finding but the passes,
   * grouped ({@link FindingGroups}), each circuit's line noting the values it inherits.
   *
   * @param onBoard the board's circuits with their loads, read in the caller's transaction
   */
  static FindingList ofBoard(
      long boardId,
      SiteAnalysis results,
      List<Circuit> onBoard,
      String contextPath,
      PageWords words) {
    Map<Long, Inheritance.Values> inherited = new HashMap<>();
    onBoard.forEach(
        circuit -> inherited.put(circuit.getId(), new Inheritance.Values(Inheritance.of(circuit))));
    return of(
        boardId,
        FindingGroups.of(
            results.boardFindings(boardId).orElse(null), FindingGroups.notPassed(null)),
        inherited,
        contextPath,
        words);
  }

  /**
   * @param groups the board's findings, grouped and in the order they are listed
   * @param inherited each circuit's inherited values by circuit id (for the "Used: …" notes)
   * @param contextPath the application's context path ("" at the root), put before every link
   */
  static FindingList of(
      long boardId,
      List<FindingGroups.Group> groups,
      Map<Long, Inheritance.Values> inherited,
      String contextPath,
      PageWords words) {
    // a circuit's badge in the schedule links to "findings-c<id>": a line that stands for that
    // circuit alone carries it, else the circuit's first place in a grouped line
    Set<Long> anchored = new HashSet<>();
    for (FindingGroups.Group group : groups) {
      FindingGroups.Place single = group.single();
      if (single != null && single.circuitId() != null) {
        anchored.add(single.circuitId());
      }
    }
    List<FindingLine> problems = new ArrayList<>(groups.size());
    List<FindingLine> advice = new ArrayList<>();
    for (FindingGroups.Group group : groups) {
      FindingLine line = line(group, inherited, contextPath, words, anchored);
      (line.isAdvice() ? advice : problems).add(line);
    }
    return new FindingList(boardId, problems, advice);
  }

  private static FindingLine line(
      FindingGroups.Group group,
      Map<Long, Inheritance.Values> inherited,
      String contextPath,
      PageWords words,
      Set<Long> anchored) {
    String verdict = group.verdict().name();
    FindingGroups.Place single = group.single();
    Long circuitId = single == null ? null : single.circuitId();
    boolean grouped = group.isGrouped();
    Inheritance.Values values = circuitId == null ? null : inherited.get(circuitId);
    List<FindingLine.Place> places = new ArrayList<>();
    if (grouped) {
      for (FindingGroups.Place place : group.places()) {
        places.add(
            new FindingLine.Place(
                "findings-c" + place.circuitId() + "-" + group.check(),
                place.circuitId() != null && anchored.add(place.circuitId())
                    ? "findings-c" + place.circuitId()
                    : null,
                contextPath + "/circuits/" + place.circuitId(),
                place.place(),
                group.summary() == null ? ": " + place.summary() : null));
      }
    }
    return new FindingLine(
        "finding v-" + verdict + (grouped ? " grouped" : ""),
        circuitId == null ? null : "findings-c" + circuitId,
        verdict,
        "badge v-" + verdict,
        words.word("verdict." + verdict),
        group.boardReference(),
        circuitId == null ? null : contextPath + "/circuits/" + circuitId,
        circuitId == null ? null : single.place(),
        grouped ? words.sentence("findings.group.ways", group.places().size(), group.ways()) : null,
        group.summary() != null ? group.summary() : group.title(),
        values == null ? null : InheritedNote.of(values.usedBy(group.check()), words),
        group.reference(),
        group.remedy() != null && !group.remedy().isBlank() ? "→ " + group.remedy() : null,
        places);
  }
}
