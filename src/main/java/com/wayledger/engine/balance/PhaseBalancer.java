package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Balances the single-phase circuits of a three-phase board. Entry points:
 *
 * <ul>
 *   <li>{@link #optimise} — the arrangement with the smallest largest phase current, then the
 *       smallest unbalance, proved optimal unless the budget runs out (then the best found and its
 *       gap);
 *   <li>{@link #fewestMoves} — for an existing board, what k circuit moves can achieve, k = 0, 1,
 *       2, … up to the optimum, and the fewest moves that bring it within its unbalance limit;
 *   <li>{@link #largestFirst} — the greedy largest-first arrangement, a quick baseline.
 * </ul>
 *
 * <p>Never throws for bad input: every problem it cannot solve comes back as an outcome with a
 * message. Demands are rounded to 0.01 A each before searching; see docs/calculations/balance.md.
 */
public final class PhaseBalancer {

  private final BalanceSettings settings;
  private final com.wayledger.engine.PositionWords words;

  public PhaseBalancer(BalanceSettings settings) {
    this(settings, com.wayledger.engine.PositionWords.WAYS);
  }

  /**
   * A balancer whose messages name the board and its lines in the board's own words ("the
   * panelboard", "B") on a North American panel.
   */
  public PhaseBalancer(BalanceSettings settings, com.wayledger.engine.PositionWords words) {
    this.settings = settings == null ? BalanceSettings.defaults() : settings;
    this.words = words == null ? com.wayledger.engine.PositionWords.WAYS : words;
  }

  public PhaseBalancer() {
    this(BalanceSettings.defaults());
  }

  /** The optimal arrangement within the budget. */
  public BalanceResult optimise(BalanceProblem problem) {
    if (hasTwoPoles(problem)) {
      return TwoPoleSearch.optimise(this, problem);
    }
    PreparedBoard.Preparation preparation = PreparedBoard.prepare(problem, words);
    if (preparation.board() == null) {
      return refused(preparation.failure(), preparation.message());
    }
    PreparedBoard board = preparation.board();
    if (board.size() == 0) {
      return nothingToMove(board);
    }
    SearchBudget budget = new SearchBudget(settings);
    AssignmentSearch search = new AssignmentSearch(board, budget);
    search.offer(largestFirstArrangement(board));
    if (board.allPlaced()) {
      search.offer(board.currentPhase);
    }
    boolean proved = search.minimise();
    int[] arrangement = MoveReducer.reduce(board, search.best());
    long lowerBound =
        proved ? board.maxOfKey(search.bestKey()) : board.maxOfKey(search.rootBoundKey());
    return arranged(
        board, arrangement, proved, lowerBound, budget.nodes(), proved ? "Proved optimal" : null);
  }

  /**
   * The greedy baseline: largest circuit first, each onto the lightest line with a free position.
   */
  public BalanceResult largestFirst(BalanceProblem problem) {
    if (hasTwoPoles(problem)) {
      return TwoPoleSearch.largestFirst(this, problem);
    }
    PreparedBoard.Preparation preparation = PreparedBoard.prepare(problem, words);
    if (preparation.board() == null) {
      return refused(preparation.failure(), preparation.message());
    }
    PreparedBoard board = preparation.board();
    if (board.size() == 0) {
      return nothingToMove(board);
    }
    long rootBound =
        board.maxOfKey(new AssignmentSearch(board, new SearchBudget(settings)).rootBoundKey());
    return arranged(
        board, largestFirstArrangement(board), false, rootBound, 0, "Largest-first (not proved)");
  }

  /**
   * What each number of moves can achieve on an existing board, and the fewest that reach its
   * limit.
   */
  public FewestMovesResult fewestMoves(BalanceProblem problem) {
    if (hasTwoPoles(problem)) {
      return TwoPoleSearch.fewestMoves(this, problem);
    }
    PreparedBoard.Preparation preparation = PreparedBoard.prepare(problem, words);
    if (preparation.board() == null) {
      return movesRefused(preparation.failure(), preparation.message(), null);
    }
    PreparedBoard board = preparation.board();
    if (!board.allPlaced()) {
      return movesRefused(
          BalanceOutcome.NOT_ASSESSED,
          "Not assessed: counting moves needs the current phase of every movable circuit.",
          null);
    }
    PhaseCurrents before = board.currentsOf(board.loadsOf(board.currentPhase));
    if (!board.withinCapacity(board.currentPhase)) {
      return movesRefused(
          BalanceOutcome.INVALID_INPUT,
          "The "
              + words.board()
              + " as recorded has more circuits on a line than the positions given for it; check the"
              + " positions before counting moves.",
          before);
    }
    if (board.size() == 0) {
      return movesRefused(
          BalanceOutcome.NOTHING_TO_MOVE, "Every circuit is locked: nothing can move.", before);
    }

    SearchBudget optimumBudget = new SearchBudget(settings);
    AssignmentSearch optimum = new AssignmentSearch(board, optimumBudget);
    optimum.offer(largestFirstArrangement(board));
    optimum.offer(board.currentPhase);
    boolean optimumProved = optimum.minimise();
    long optimumKey = optimum.bestKey();

    SearchBudget stepBudget = new SearchBudget(settings);
    MoveSearch steps = new MoveSearch(board, stepBudget);
    List<MovesStep> rows = new ArrayList<>();
    rows.add(step(board, 0, board.currentPhase, true));
    boolean allProved = true;
    for (int k = 1; k <= board.size() && steps.bestKey() > optimumKey; k++) {
      long previous = steps.bestKey();
      boolean complete = steps.improveWithin(k, optimumKey);
      allProved &= complete;
      if (steps.bestKey() < previous) {
        rows.add(step(board, k, steps.bestTarget(), complete));
      }
      if (!complete) {
        break;
      }
    }
    boolean optimumReached = steps.bestKey() <= optimumKey;

    Double limit = board.problem.unbalanceLimitPercent();
    LimitVerdict verdict;
    Integer movesToLimit = null;
    List<CircuitMove> limitPlan = List.of();
    long limitNodes = 0;
    if (limit == null || !Double.isFinite(limit) || limit < 0) {
      verdict = LimitVerdict.NOT_ASSESSED;
    } else {
      SearchBudget limitBudget = new SearchBudget(settings);
      LimitAnswer answer = fewestMovesToLimit(board, limit, rows, limitBudget);
      limitNodes = limitBudget.nodes();
      verdict = answer.verdict;
      movesToLimit = answer.moves;
      limitPlan =
          answer.arrangement == null ? List.of() : PositionPlanner.plan(board, answer.arrangement);
    }

    boolean complete = allProved && optimumReached && optimumProved;
    String message =
        movesMessage(
            complete,
            before,
            rows.get(rows.size() - 1),
            optimumReached,
            optimumProved,
            verdict,
            movesToLimit,
            limit,
            board.notes,
            words);
    return new FewestMovesResult(
        complete ? BalanceOutcome.PROVED_OPTIMAL : BalanceOutcome.BEST_WITHIN_BUDGET,
        message,
        before,
        List.copyOf(rows),
        optimumReached,
        limit,
        verdict,
        movesToLimit,
        limitPlan,
        optimumBudget.nodes() + stepBudget.nodes() + limitNodes,
        settings);
  }

  /** The fewest-moves answer in plain words. */
  static String movesMessage(
      boolean complete,
      PhaseCurrents before,
      MovesStep last,
      boolean optimumReached,
      boolean optimumProved,
      LimitVerdict verdict,
      Integer movesToLimit,
      Double limit,
      List<String> notes,
      com.wayledger.engine.PositionWords words) {
    StringBuilder message = new StringBuilder();
    message.append(complete ? "Proved: " : "Within the search budget: ");
    message.append(
        String.format(
            Locale.ROOT,
            "%d move(s) bring the largest phase current from %.2f A to %.2f A and the unbalance from %.1f %% to"
                + " %.1f %%",
            last.moves(),
            before.largestAmps(),
            last.largestAmps(),
            before.unbalancePercent(),
            last.unbalancePercent()));
    message.append(
        optimumReached
            ? (optimumProved ? ", the optimum." : ", the best arrangement found.")
            : ".");
    message.append(limitSentence(verdict, movesToLimit, limit, words));
    for (String note : notes) {
      message.append(' ').append(note);
    }
    return message.toString();
  }

  private record LimitAnswer(LimitVerdict verdict, Integer moves, int[] arrangement) {}

  private static LimitAnswer fewestMovesToLimit(
      PreparedBoard board, double limitPercent, List<MovesStep> rows, SearchBudget budget) {
    long[] band = board.limitBand(limitPercent);
    long lowest = band[0];
    long highest = band[1];
    long[] now = board.loadsOf(board.currentPhase);
    if (within(now, board.lines, lowest, highest)) {
      return new LimitAnswer(LimitVerdict.ALREADY_WITHIN, 0, board.currentPhase.clone());
    }
    int[] known = null;
    int knownMoves = Integer.MAX_VALUE;
    for (MovesStep row : rows) {
      if (row.unbalancePercent() <= limitPercent + 1e-9 && row.moves() < knownMoves) {
        known = arrangementOf(board, row);
        knownMoves = row.moves();
      }
    }
    if (known == null) {
      AssignmentSearch any = new AssignmentSearch(board, budget);
      int[] inBand = any.findWithin(lowest, highest);
      if (inBand == null) {
        return new LimitAnswer(
            any.completed() ? LimitVerdict.NOT_REACHABLE : LimitVerdict.NOT_DETERMINED, null, null);
      }
      known = MoveReducer.reduce(board, inBand);
      knownMoves = MoveReducer.moves(board, known);
    }
    MoveSearch search = new MoveSearch(board, budget);
    boolean provedSoFar = true;
    for (int k = 1; k < knownMoves; k++) {
      int[] found = search.reachBand(k, lowest, highest);
      if (found != null) {
        return new LimitAnswer(
            provedSoFar ? LimitVerdict.REACHED : LimitVerdict.REACHED_NOT_PROVED_FEWEST, k, found);
      }
      provedSoFar &= search.completed();
    }
    return new LimitAnswer(
        provedSoFar ? LimitVerdict.REACHED : LimitVerdict.REACHED_NOT_PROVED_FEWEST,
        knownMoves,
        known);
  }

  private static int[] arrangementOf(PreparedBoard board, MovesStep row) {
    int[] arrangement = board.currentPhase.clone();
    Map<Long, Integer> index = new LinkedHashMap<>();
    for (int i = 0; i < board.size(); i++) {
      index.put(board.movable[i].circuitId(), i);
    }
    for (CircuitMove move : row.plan()) {
      arrangement[index.get(move.circuitId())] = move.toPhase().ordinal();
    }
    return arrangement;
  }

  /** Whether each of the board's lines (the first {@code lines} loads) lies in the band. */
  static boolean within(long[] loads, int lines, long lowest, long highest) {
    for (int p = 0; p < lines; p++) {
      if (loads[p] < lowest || loads[p] > highest) {
        return false;
      }
    }
    return true;
  }

  static String limitSentence(
      LimitVerdict verdict, Integer moves, Double limit, com.wayledger.engine.PositionWords words) {
    return switch (verdict) {
      case ALREADY_WITHIN ->
          " The "
              + words.board()
              + " is within its unbalance limit of "
              + percent(limit)
              + " as it stands.";
      case REACHED ->
          " The fewest moves that bring it within its unbalance limit of "
              + percent(limit)
              + ": "
              + moves
              + ".";
      case REACHED_NOT_PROVED_FEWEST ->
          " "
              + moves
              + " move(s) bring it within its unbalance limit of "
              + percent(limit)
              + "; the budget ran out before fewer could be ruled out.";
      case NOT_REACHABLE ->
          " No arrangement within the positions reaches its unbalance limit of "
              + percent(limit)
              + ".";
      case NOT_DETERMINED ->
          " Whether its unbalance limit of "
              + percent(limit)
              + " can be reached was not determined within the search budget.";
      case NOT_ASSESSED ->
          " Unbalance limit not assessed: the " + words.board() + " has no limit set.";
    };
  }

  private static String percent(Double value) {
    return String.format(Locale.ROOT, "%.1f %%", value);
  }

  private MovesStep step(PreparedBoard board, int moves, int[] arrangement, boolean proved) {
    PhaseCurrents after = board.currentsOf(board.loadsOf(arrangement));
    return new MovesStep(
        MoveReducer.moves(board, arrangement),
        after,
        after.largestAmps(),
        after.unbalancePercent(),
        proved,
        PositionPlanner.plan(board, arrangement));
  }

  static int[] largestFirstArrangement(PreparedBoard board) {
    long[] loads = board.fixed.clone();
    int[] counts = new int[3];
    int[] arrangement = new int[board.size()];
    for (int i = 0; i < board.size(); i++) {
      int chosen = -1;
      for (int p = 0; p < 3; p++) {
        if (counts[p] < board.capacity[p] && (chosen < 0 || loads[p] < loads[chosen])) {
          chosen = p;
        }
      }
      arrangement[i] = chosen;
      loads[chosen] += board.demand[i];
      counts[chosen]++;
    }
    return arrangement;
  }

  private BalanceResult arranged(
      PreparedBoard board,
      int[] arrangement,
      boolean proved,
      long lowerBound,
      long nodes,
      String heading) {
    PhaseCurrents before =
        board.allPlaced() ? board.currentsOf(board.loadsOf(board.currentPhase)) : null;
    PhaseCurrents after = board.currentsOf(board.loadsOf(arrangement));
    List<CircuitMove> moves = PositionPlanner.plan(board, arrangement);
    double gapAmps = Math.max(0, PreparedBoard.centiamps(after.largestAmps()) - lowerBound) / 100.0;
    String message =
        arrangedMessage(
            heading, after, proved, gapAmps, lowerBound / 100.0, moves.size(), board.notes);
    return new BalanceResult(
        proved ? BalanceOutcome.PROVED_OPTIMAL : BalanceOutcome.BEST_WITHIN_BUDGET,
        message,
        assignmentMap(board, arrangement),
        before,
        after,
        before == null ? null : before.unbalancePercent(),
        after.unbalancePercent(),
        lowerBound / 100.0,
        proved ? 0.0 : gapAmps,
        proved,
        nodes,
        moves,
        settings);
  }

  /** The optimal (or greedy) arrangement in plain words. */
  static String arrangedMessage(
      String heading,
      PhaseCurrents after,
      boolean proved,
      double gapAmps,
      double lowerBoundAmps,
      int moveCount,
      List<String> notes) {
    StringBuilder message = new StringBuilder();
    if (heading != null) {
      message.append(heading).append(": largest phase current ");
    } else {
      message.append("Best found within the search budget: largest phase current ");
    }
    message.append(String.format(Locale.ROOT, "%.2f A", after.largestAmps()));
    if (!proved) {
      message.append(
          String.format(
              Locale.ROOT,
              ", at most %.2f A above the lower bound of %.2f A",
              gapAmps,
              lowerBoundAmps));
    }
    message.append(String.format(Locale.ROOT, "; unbalance %.1f %%", after.unbalancePercent()));
    message.append(String.format(Locale.ROOT, "; %d circuit(s) to move.", moveCount));
    for (String note : notes) {
      message.append(' ').append(note);
    }
    return message.toString();
  }

  private static boolean hasTwoPoles(BalanceProblem problem) {
    return problem != null
        && problem.items() != null
        && problem.threePhase()
        && !problem.twoPoles().isEmpty();
  }

  /** The words its messages name the board and its lines in. */
  com.wayledger.engine.PositionWords words() {
    return words;
  }

  BalanceSettings settings() {
    return settings;
  }

  private static Map<Long, Phase> assignmentMap(PreparedBoard board, int[] arrangement) {
    Map<Long, Phase> byId = new LinkedHashMap<>();
    for (int i = 0; i < board.size(); i++) {
      byId.put(board.movable[i].circuitId(), PreparedBoard.PHASES[arrangement[i]]);
    }
    Map<Long, Phase> inListOrder = new LinkedHashMap<>();
    for (BalanceItem item : board.problem.items()) {
      inListOrder.put(
          item.circuitId(), item.movable() ? byId.get(item.circuitId()) : item.currentPhase());
    }
    return inListOrder;
  }

  private BalanceResult nothingToMove(PreparedBoard board) {
    PhaseCurrents now = board.currentsOf(board.fixed);
    return new BalanceResult(
        BalanceOutcome.NOTHING_TO_MOVE,
        board.problem.items().isEmpty()
            ? "The " + words.board() + " has no single-phase circuits to balance."
            : "Every circuit is locked: nothing can move. The currents are shown as they are.",
        assignmentMap(board, new int[0]),
        now,
        now,
        now.unbalancePercent(),
        now.unbalancePercent(),
        now.largestAmps(),
        0.0,
        true,
        0,
        List.of(),
        settings);
  }

  BalanceResult refused(BalanceOutcome outcome, String message) {
    return new BalanceResult(
        outcome, message, Map.of(), null, null, null, null, 0.0, 0.0, false, 0, List.of(),
        settings);
  }

  FewestMovesResult movesRefused(BalanceOutcome outcome, String message, PhaseCurrents before) {
    return new FewestMovesResult(
        outcome,
        message,
        before,
        List.of(),
        false,
        null,
        LimitVerdict.NOT_ASSESSED,
        null,
        List.of(),
        0,
        settings);
  }
}
