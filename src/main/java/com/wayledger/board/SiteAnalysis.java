package com.wayledger.board;

import com.wayledger.engine.Phase;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Everything the engines say about one stored site, computed on read (no stored totals): the engine
 * input it was computed from, the demand on every circuit, phase and board, and the protection
 * findings.
 *
 * <p>{@code dwellingBoardIds} are the boards the analysis treated as serving a dwelling unit (those
 * with NEC dwelling inputs), kept with it so that a page of the same data generation need not read
 * them again.
 */
public record SiteAnalysis(
    SiteSpec spec,
    SiteDemand demand,
    SiteFindings findings,
    Map<Long, List<com.wayledger.engine.dwelling.Worksheet>> dwellingWorksheets,
    java.util.Set<Long> dwellingBoardIds) {

  public SiteAnalysis {
    dwellingWorksheets = Map.copyOf(dwellingWorksheets);
    dwellingBoardIds = java.util.Set.copyOf(dwellingBoardIds);
  }

  /** An analysis with no NEC dwelling worksheets (no dwelling inputs or recorded demands). */
  public SiteAnalysis(SiteSpec spec, SiteDemand demand, SiteFindings findings) {
    this(spec, demand, findings, Map.of(), java.util.Set.of());
  }

  /**
   * The NEC Article 220 worksheets of a board (standard method, neutral, optional, addition,
   * recorded maximum demand), in that order; empty when the board has none.
   */
  public List<com.wayledger.engine.dwelling.Worksheet> dwellingWorksheets(long boardId) {
    return dwellingWorksheets.getOrDefault(boardId, List.of());
  }

  public BoardDemand boardDemand(long boardId) {
    return demand.board(boardId);
  }

  public Optional<BoardFindings> boardFindings(long boardId) {
    return findings.boards().stream().filter(board -> board.boardId() == boardId).findFirst();
  }

  /** Demand results of a board's circuits by circuit id. */
  public Map<Long, CircuitDemand> circuitDemands(long boardId) {
    BoardDemand board = boardDemand(boardId);
    return board == null
        ? Map.of()
        : board.circuits().stream()
            .collect(
                java.util.stream.Collectors.toMap(CircuitDemand::circuitId, c -> c, (a, b) -> a));
  }

  /** Findings of a board's circuits by circuit id. */
  public Map<Long, CircuitFindings> circuitFindings(long boardId) {
    return boardFindings(boardId)
        .map(
            board ->
                board.circuits().stream()
                    .collect(
                        java.util.stream.Collectors.toMap(
                            CircuitFindings::circuitId, c -> c, (a, b) -> a)))
        .orElse(Map.of());
  }

  /** Every finding of a board (its own and its circuits') that is a problem, danger first. */
  public List<Finding> problems(long boardId) {
    return boardFindings(boardId)
        .map(
            board ->
                java.util.stream.Stream.concat(
                        board.findings().stream(),
                        board.circuits().stream().flatMap(c -> c.findings().stream()))
                    .filter(SiteAnalysis::isProblem)
                    .sorted(java.util.Comparator.comparing(Finding::verdict))
                    .toList())
        .orElse(List.of());
  }

  /** Counts of problem findings per verdict for a board, in verdict order. */
  public Map<Verdict, Long> problemCounts(long boardId) {
    Map<Verdict, Long> counts = new EnumMap<>(Verdict.class);
    for (Finding finding : problems(boardId)) {
      counts.merge(finding.verdict(), 1L, Long::sum);
    }
    return counts;
  }

  /** Problem counts per verdict for each circuit of a board, by circuit id. */
  public Map<Long, Map<Verdict, Long>> circuitProblemCounts(long boardId) {
    Map<Long, Map<Verdict, Long>> counts = new java.util.HashMap<>();
    boardFindings(boardId)
        .ifPresent(
            board ->
                board
                    .circuits()
                    .forEach(
                        circuit -> {
                          Map<Verdict, Long> perVerdict = new EnumMap<>(Verdict.class);
                          circuit.findings().stream()
                              .filter(SiteAnalysis::isProblem)
                              .forEach(
                                  finding -> perVerdict.merge(finding.verdict(), 1L, Long::sum));
                          counts.put(circuit.circuitId(), perVerdict);
                        }));
    return counts;
  }

  /** The headline figures of every board of the site, by board id. */
  public Map<Long, BoardHeadline> headlines() {
    Map<Long, BoardHeadline> headlines = new java.util.HashMap<>();
    for (BoardDemand board : demand.boards()) {
      headlines.put(
          board.boardId(),
          BoardHeadline.of(board, worstPhase(board.boardId()), problemCounts(board.boardId())));
    }
    return headlines;
  }

  /** The line with the largest demand current on a board; null for a board with no demand. */
  public Phase worstPhase(long boardId) {
    BoardDemand board = boardDemand(boardId);
    if (board == null) {
      return null;
    }
    return board.phases().stream()
        .filter(phase -> phase.currentAmps() > 0)
        .max(java.util.Comparator.comparingDouble(PhaseDemand::currentAmps))
        .map(PhaseDemand::phase)
        .orElse(null);
  }

  static boolean isProblem(Finding finding) {
    return finding.verdict() == Verdict.DANGER
        || finding.verdict() == Verdict.WARNING
        || finding.verdict() == Verdict.ADVICE
        || finding.verdict() == Verdict.NOT_ASSESSED;
  }
}
