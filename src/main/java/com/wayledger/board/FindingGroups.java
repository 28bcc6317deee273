package com.wayledger.board;

import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Predicate;

/**
 * A board's findings as an inspector lists them: the same check with the same grade on many ways is
 * one row naming the ways ("ways 3, 5, 9"), rows ordered by grade, danger first. Each row keeps
 * every place it stands for, so the page can still link to each circuit.
 */
public final class FindingGroups {

  private FindingGroups() {}

  /**
   * One place a grouped finding was found.
   *
   * @param circuitId the circuit; null for a finding on the board itself
   * @param wayNumber its way; null for the board
   * @param line its line(s) in words ("L2", "L1–L3"); empty when not recorded
   * @param circuitName what the circuit feeds; empty when not recorded
   * @param place "way 9 L2 “Kitchen sockets”", or the board's name
   * @param summary this place's own sentence (its figures differ from way to way)
   */
  public record Place(
      Long circuitId,
      Integer wayNumber,
      String line,
      String circuitName,
      String place,
      String summary) {}

  /**
   * One row of the list.
   *
   * @param boardId the board
   * @param boardReference its name
   * @param check which check
   * @param title the check's title in the board's words ({@link BoardFindings#titleOf}), shown when
   *     the places' sentences differ
   * @param verdict its grade
   * @param summary the sentence shared by every place, or null when they differ (each place then
   *     carries its own)
   * @param reference the clause, shared by every place
   * @param remedy what to do; the first place's when they differ
   * @param places where it was found, in way order
   * @param finding the first place's finding (for notes that need the check's inputs)
   */
  public record Group(
      long boardId,
      String boardReference,
      CheckKind check,
      String title,
      Verdict verdict,
      String summary,
      String reference,
      String remedy,
      List<Place> places,
      Finding finding) {

    public Group {
      places = List.copyOf(places);
    }

    /** Whether this row stands for more than one place. */
    public boolean isGrouped() {
      return places.size() > 1;
    }

    /** The ways as a reader lists them: "3, 5, 9" or "1–4, 7"; empty for the board's own. */
    public String ways() {
      return wayList(
          places.stream().map(Place::wayNumber).filter(Objects::nonNull).distinct().toList());
    }

    /** The only place's circuit, for a row that stands for one circuit; else null. */
    public Place single() {
      return places.size() == 1 ? places.get(0) : null;
    }
  }

  /** Every finding of the board that the filter keeps, grouped and ordered by grade. */
  public static List<Group> of(BoardFindings board, Predicate<Finding> shown) {
    List<Group> rows = new ArrayList<>();
    if (board == null) {
      return rows;
    }
    for (Finding finding : board.findings()) {
      if (shown.test(finding)) {
        rows.add(
            new Group(
                board.boardId(),
                board.reference(),
                finding.check(),
                board.titleOf(finding),
                finding.verdict(),
                finding.summary(),
                finding.reference(),
                finding.remedy(),
                List.of(new Place(null, null, "", "", board.reference(), finding.summary())),
                finding));
      }
    }
    Map<String, List<Map.Entry<CircuitFindings, Finding>>> byKind = new LinkedHashMap<>();
    board.circuits().stream()
        .sorted(Comparator.comparingInt(CircuitFindings::wayNumber))
        .forEach(
            circuit ->
                circuit.findings().stream()
                    .filter(shown)
                    .forEach(
                        finding ->
                            byKind
                                .computeIfAbsent(
                                    finding.check() + "|" + finding.verdict(),
                                    k -> new ArrayList<>())
                                .add(Map.entry(circuit, finding))));
    for (List<Map.Entry<CircuitFindings, Finding>> same : byKind.values()) {
      Finding first = same.get(0).getValue();
      boolean oneSentence =
          same.stream().allMatch(e -> e.getValue().summary().equals(first.summary()));
      List<Place> places =
          same.stream()
              .map(
                  e ->
                      new Place(
                          e.getKey().circuitId(),
                          e.getKey().wayNumber(),
                          e.getKey().lineLabel(),
                          e.getKey().description() == null ? "" : e.getKey().description(),
                          e.getKey().placeOnBoard(),
                          e.getValue().summary()))
              .toList();
      rows.add(
          new Group(
              board.boardId(),
              board.reference(),
              first.check(),
              board.titleOf(first),
              first.verdict(),
              oneSentence ? first.summary() : null,
              first.reference(),
              first.remedy(),
              places,
              first));
    }
    rows.sort(Comparator.comparing(Group::verdict));
    return rows;
  }

  /** Problems and checks not assessed; passes left out. */
  public static Predicate<Finding> notPassed(Verdict only) {
    return finding ->
        finding.verdict() != Verdict.PASS && (only == null || finding.verdict() == only);
  }

  /** Ways as a list with runs of three or more joined: 1, 2, 3, 5 reads "1–3, 5". */
  static String wayList(List<Integer> ways) {
    List<Integer> sorted = ways.stream().sorted().toList();
    StringBuilder text = new StringBuilder();
    int i = 0;
    while (i < sorted.size()) {
      int j = i;
      while (j + 1 < sorted.size() && sorted.get(j + 1) == sorted.get(j) + 1) {
        j++;
      }
      if (!text.isEmpty()) {
        text.append(", ");
      }
      if (j - i >= 2) {
        text.append(sorted.get(i)).append('–').append(sorted.get(j));
      } else {
        text.append(sorted.get(i));
        for (int k = i + 1; k <= j; k++) {
          text.append(", ").append(sorted.get(k));
        }
      }
      i = j + 1;
    }
    return text.toString();
  }
}
