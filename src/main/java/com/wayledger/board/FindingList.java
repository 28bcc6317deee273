package com.wayledger.board;

import java.util.List;

/**
 * A board's findings list as it is printed: the problems and not-assessed checks, listed open, and
 * the advice, folded below them.
 *
 * @param boardId the board (its folded advice is fetched from the board's address)
 * @param problems danger, warning and not-assessed lines, danger first
 * @param advice the advice lines
 */
public record FindingList(long boardId, List<FindingLine> problems, List<FindingLine> advice) {

  public FindingList {
    problems = List.copyOf(problems);
    advice = List.copyOf(advice);
  }

  /**
   * The problem lines the list's filter keeps: all of them without a filter, else one verdict's.
   */
  public List<FindingLine> problemsOf(String verdict) {
    return verdict == null
        ? problems
        : problems.stream().filter(line -> line.verdict().equals(verdict)).toList();
  }
}
