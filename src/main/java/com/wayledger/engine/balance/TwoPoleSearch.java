package com.wayledger.engine.balance;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Balancing a three-line panelboard whose two-pole breakers may move: every layout of the two-pole
 * breakers ({@link TwoPoleLayouts}) is solved as a single-pole problem by the exact searches, each
 * with an equal share of what is left of the budget (a layout whose lower bound cannot beat the
 * best found is skipped in the optimal mode), and the answers are combined. The optimum is the best
 * layout's optimum (ties: fewer moves); row k of the fewest-moves list is the best over layouts
 * whose two-pole moves m leave k − m single-pole moves; the fewest moves to the limit is the
 * smallest m + that layout's count. A combined figure is "proved" only when every layout's search
 * behind it finished.
 */
final class TwoPoleSearch {

  private TwoPoleSearch() {}

  static BalanceResult optimise(PhaseBalancer balancer, BalanceProblem problem) {
    TwoPoleLayouts.Layouts layouts = TwoPoleLayouts.of(problem);
    if (layouts.failure() != null) {
      return balancer.refused(layouts.failure(), layouts.message());
    }
    if (layouts.layouts().size() == 1) {
      return balancer.optimise(layouts.layouts().get(0).problem()); // no two-pole breaker can move
    }
    Budget budget = new Budget(balancer, layouts.layouts().size(), 1);
    BalanceResult first = null;
    BalanceResult best = null;
    TwoPoleLayouts.Layout bestLayout = null;
    PreparedBoard keys = null;
    long bestKey = Long.MAX_VALUE;
    int bestMoves = Integer.MAX_VALUE;
    boolean proved = true;
    double lowerBound = Double.POSITIVE_INFINITY;
    long nodes = 0;
    for (TwoPoleLayouts.Layout layout : layouts.layouts()) {
      PreparedBoard prepared = PreparedBoard.prepare(layout.problem(), balancer.words()).board();
      if (best != null
          && prepared != null
          && new AssignmentSearch(prepared, new SearchBudget(balancer.settings())).rootBoundKey()
              > bestKey) {
        budget
            .skip(); // no arrangement of this layout can beat the best found: a proof, not a guess
        continue;
      }
      BalanceResult result = budget.next().optimise(layout.problem());
      budget.spent(result.nodesExplored());
      first = first == null ? result : first;
      if (result.after() == null) {
        continue; // this layout leaves too few spaces for the single-pole circuits
      }
      keys =
          keys == null ? PreparedBoard.prepare(layout.problem(), balancer.words()).board() : keys;
      nodes += result.nodesExplored();
      proved &= result.provedOptimal();
      lowerBound = Math.min(lowerBound, result.lowerBoundAmps());
      long key = keyOf(keys, result.after());
      int moves = layout.moves().size() + result.moves().size();
      if (key < bestKey || (key == bestKey && moves < bestMoves)) {
        best = result;
        bestLayout = layout;
        bestKey = key;
        bestMoves = moves;
      }
    }
    if (best == null) {
      return first;
    }
    List<CircuitMove> moves = new ArrayList<>(bestLayout.moves());
    moves.addAll(best.moves());
    PhaseCurrents after = best.after();
    double gap = proved ? 0.0 : Math.max(0.0, after.largestAmps() - lowerBound);
    double bound = proved ? after.largestAmps() : lowerBound;
    String message =
        PhaseBalancer.arrangedMessage(
            proved ? "Proved optimal" : null,
            after,
            proved,
            gap,
            bound,
            moves.size(),
            layouts.notes());
    return new BalanceResult(
        proved ? BalanceOutcome.PROVED_OPTIMAL : BalanceOutcome.BEST_WITHIN_BUDGET,
        message,
        assignment(problem, best.assignment(), bestLayout.moves()),
        first.before(),
        after,
        first.before() == null ? null : first.before().unbalancePercent(),
        after.unbalancePercent(),
        bound,
        gap,
        proved,
        nodes,
        List.copyOf(moves),
        balancer.settings());
  }

  /** The greedy baseline leaves every two-pole breaker where it is. */
  static BalanceResult largestFirst(PhaseBalancer balancer, BalanceProblem problem) {
    TwoPoleLayouts.Layouts layouts = TwoPoleLayouts.of(problem);
    if (layouts.failure() != null) {
      return balancer.refused(layouts.failure(), layouts.message());
    }
    return balancer.largestFirst(layouts.layouts().get(0).problem());
  }

  static FewestMovesResult fewestMoves(PhaseBalancer balancer, BalanceProblem problem) {
    TwoPoleLayouts.Layouts layouts = TwoPoleLayouts.of(problem);
    if (layouts.failure() != null) {
      return balancer.movesRefused(layouts.failure(), layouts.message(), null);
    }
    if (layouts.layouts().size() == 1) {
      return balancer.fewestMoves(layouts.layouts().get(0).problem());
    }
    // a fewest-moves call may spend three budgets (docs/calculations/balance.md)
    Budget budget = new Budget(balancer, layouts.layouts().size(), 3);
    List<Answer> answers = new ArrayList<>();
    PreparedBoard keys = null;
    long nodes = 0;
    for (TwoPoleLayouts.Layout layout : layouts.layouts()) {
      FewestMovesResult result = budget.next().fewestMoves(layout.problem());
      budget.spent(result.nodesExplored());
      boolean nothing = result.outcome() == BalanceOutcome.NOTHING_TO_MOVE;
      if (result.steps().isEmpty() && !(nothing && result.before() != null)) {
        if (answers.isEmpty()) {
          return result; // the board as it stands cannot be counted from: say why
        }
        continue;
      }
      keys =
          keys == null ? PreparedBoard.prepare(layout.problem(), balancer.words()).board() : keys;
      nodes += result.nodesExplored();
      answers.add(new Answer(layout, result, nothing, keys));
    }
    if (answers.isEmpty()) {
      return balancer.movesRefused(
          BalanceOutcome.NOT_ASSESSED, "Not assessed: no arrangement to count moves from.", null);
    }
    PhaseCurrents before = answers.get(0).steps.get(0).after();

    int longest = 0;
    for (Answer answer : answers) {
      longest = Math.max(longest, answer.twoPoleMoves() + answer.lastStep().moves());
    }
    List<MovesStep> rows = new ArrayList<>();
    long previous = Long.MAX_VALUE;
    boolean allProved = true;
    for (int k = 0; k <= longest; k++) {
      Answer chosen = null;
      MovesStep chosenStep = null;
      long chosenKey = Long.MAX_VALUE;
      boolean proved = true;
      for (Answer answer : answers) {
        int left = k - answer.twoPoleMoves();
        if (left < 0) {
          continue;
        }
        proved &= answer.provedThrough() >= left;
        MovesStep step = answer.bestWithin(left);
        long key = keyOf(keys, step.after());
        if (key < chosenKey) {
          chosen = answer;
          chosenStep = step;
          chosenKey = key;
        }
      }
      if (chosenKey < previous) {
        List<CircuitMove> plan = new ArrayList<>(chosen.layout.moves());
        plan.addAll(chosenStep.plan());
        rows.add(
            new MovesStep(
                plan.size(),
                chosenStep.after(),
                chosenStep.largestAmps(),
                chosenStep.unbalancePercent(),
                proved,
                List.copyOf(plan)));
        previous = chosenKey;
        allProved &= proved;
      }
    }
    boolean everyComplete = true;
    boolean optimumReached = true;
    for (Answer answer : answers) {
      everyComplete &= answer.complete();
      optimumReached &= answer.nothing || answer.result.optimumReached();
    }

    Double limit = problem.unbalanceLimitPercent();
    Limit reach = limitOf(answers, limit);
    boolean complete = everyComplete && allProved && optimumReached;
    String message =
        PhaseBalancer.movesMessage(
            complete,
            before,
            rows.get(rows.size() - 1),
            optimumReached,
            everyComplete,
            reach.verdict,
            reach.moves,
            limit,
            layouts.notes(),
            balancer.words());
    return new FewestMovesResult(
        complete ? BalanceOutcome.PROVED_OPTIMAL : BalanceOutcome.BEST_WITHIN_BUDGET,
        message,
        before,
        List.copyOf(rows),
        optimumReached,
        limit,
        reach.verdict,
        reach.moves,
        reach.plan,
        nodes,
        balancer.settings());
  }

  private record Limit(LimitVerdict verdict, Integer moves, List<CircuitMove> plan) {}

  /** The fewest moves to the limit over every layout: its two-pole moves plus its own count. */
  private static Limit limitOf(List<Answer> answers, Double limit) {
    if (limit == null || !Double.isFinite(limit) || limit < 0) {
      return new Limit(LimitVerdict.NOT_ASSESSED, null, List.of());
    }
    Integer fewest = null;
    List<CircuitMove> plan = List.of();
    boolean anyUnknown = false;
    for (Answer answer : answers) {
      LimitVerdict verdict = answer.verdict(limit);
      Integer own =
          switch (verdict) {
            case ALREADY_WITHIN -> 0;
            case REACHED, REACHED_NOT_PROVED_FEWEST -> answer.result.movesToReachLimit();
            default -> null;
          };
      if (verdict == LimitVerdict.NOT_DETERMINED) {
        anyUnknown = true;
      }
      if (own != null && (fewest == null || answer.twoPoleMoves() + own < fewest)) {
        fewest = answer.twoPoleMoves() + own;
        plan = new ArrayList<>(answer.layout.moves());
        if (verdict != LimitVerdict.ALREADY_WITHIN) {
          plan.addAll(answer.result.limitPlan());
        }
      }
    }
    if (fewest == null) {
      return new Limit(
          anyUnknown ? LimitVerdict.NOT_DETERMINED : LimitVerdict.NOT_REACHABLE, null, List.of());
    }
    if (fewest == 0) {
      return new Limit(LimitVerdict.ALREADY_WITHIN, 0, List.of());
    }
    boolean provedFewest = true;
    for (Answer answer : answers) {
      LimitVerdict verdict = answer.verdict(limit);
      boolean unsure =
          verdict == LimitVerdict.NOT_DETERMINED
              || verdict == LimitVerdict.REACHED_NOT_PROVED_FEWEST;
      if (unsure && answer.twoPoleMoves() < fewest) {
        provedFewest = false;
      }
    }
    return new Limit(
        provedFewest ? LimitVerdict.REACHED : LimitVerdict.REACHED_NOT_PROVED_FEWEST,
        fewest,
        List.copyOf(plan));
  }

  /** One layout's fewest-moves answer. */
  private static final class Answer {
    final TwoPoleLayouts.Layout layout;
    final FewestMovesResult result;
    final boolean nothing;
    final List<MovesStep> steps;
    final PreparedBoard keys;

    Answer(
        TwoPoleLayouts.Layout layout,
        FewestMovesResult result,
        boolean nothing,
        PreparedBoard keys) {
      this.layout = layout;
      this.result = result;
      this.nothing = nothing;
      this.keys = keys;
      // with no single-pole circuit to move, the layout's only row is the board as it leaves it
      this.steps =
          nothing
              ? List.of(
                  new MovesStep(
                      0,
                      result.before(),
                      result.before().largestAmps(),
                      result.before().unbalancePercent(),
                      true,
                      List.of()))
              : result.steps();
    }

    int twoPoleMoves() {
      return layout.moves().size();
    }

    MovesStep lastStep() {
      return steps.get(steps.size() - 1);
    }

    boolean complete() {
      return nothing || result.outcome() == BalanceOutcome.PROVED_OPTIMAL;
    }

    /** The most single-pole moves up to which this layout's rows are proved. */
    int provedThrough() {
      if (complete()) {
        return Integer.MAX_VALUE;
      }
      int through = -1;
      for (MovesStep step : steps) {
        if (!step.proved()) {
          break;
        }
        through = step.moves();
      }
      return through;
    }

    /** The best row with at most {@code moves} single-pole moves. */
    MovesStep bestWithin(int moves) {
      MovesStep best = steps.get(0);
      for (MovesStep step : steps) {
        if (step.moves() <= moves) {
          best = step;
        }
      }
      return best;
    }

    /** Whether this layout reaches the limit, and how; a layout with nothing to move is checked. */
    LimitVerdict verdict(double limit) {
      if (!nothing) {
        return result.limitVerdict();
      }
      PhaseCurrents now = result.before();
      long[] band = keys.limitBand(limit);
      return PhaseBalancer.within(centiamps(now), keys.lines, band[0], band[1])
          ? LimitVerdict.ALREADY_WITHIN
          : LimitVerdict.NOT_REACHABLE;
    }
  }

  private static long keyOf(PreparedBoard keys, PhaseCurrents currents) {
    return keys.keyOf(centiamps(currents));
  }

  private static long[] centiamps(PhaseCurrents currents) {
    return new long[] {
      PreparedBoard.centiamps(currents.l1Amps()),
      PreparedBoard.centiamps(currents.l2Amps()),
      PreparedBoard.centiamps(currents.l3Amps())
    };
  }

  /**
   * The whole call's node and time budgets shared out over the layouts: each layout gets an equal
   * share of what is left, so what an easy layout does not use goes to the later ones.
   */
  private static final class Budget {
    private final long perCall;
    private final com.wayledger.engine.PositionWords words;
    private long nodesLeft;
    private final long deadlineNanos;
    private int layoutsLeft;

    /**
     * @param callsPerLayout the budgets one layout's call may spend (1 for the optimum, 3 for
     *     fewest moves)
     */
    Budget(PhaseBalancer balancer, int layouts, int callsPerLayout) {
      BalanceSettings whole = balancer.settings();
      this.words = balancer.words();
      this.perCall = callsPerLayout;
      this.nodesLeft = whole.nodeBudget() * callsPerLayout;
      this.deadlineNanos =
          System.nanoTime() + whole.timeBudgetMillis() * callsPerLayout * 1_000_000L;
      this.layoutsLeft = Math.max(1, layouts);
    }

    PhaseBalancer next() {
      long share = Math.max(1, nodesLeft / (perCall * layoutsLeft));
      long millis = Math.max(1, (deadlineNanos - System.nanoTime()) / 1_000_000L);
      layoutsLeft = Math.max(1, layoutsLeft - 1);
      return new PhaseBalancer(
          new BalanceSettings(share, Math.max(1, millis / (perCall * (layoutsLeft + 1)))), words);
    }

    void spent(long nodes) {
      nodesLeft = Math.max(0, nodesLeft - nodes);
    }

    void skip() {
      layoutsLeft = Math.max(1, layoutsLeft - 1);
    }
  }

  /**
   * Every circuit's line: single-pole ones from the layout's search, two-pole ones as the first
   * line of their pair (L1 for L1–L2, L2 for L2–L3, L3 for L3–L1).
   */
  private static Map<Long, Phase> assignment(
      BalanceProblem problem, Map<Long, Phase> singlePole, List<CircuitMove> twoPoleMoves) {
    Map<Long, Phase> byId = new LinkedHashMap<>(singlePole);
    PanelSpaces panel = problem.panel();
    for (TwoPoleItem item : problem.twoPoles()) {
      PhasePosition now = panel.positionOf(item.firstSpace(), 2);
      byId.put(item.circuitId(), now.fromLine());
    }
    for (CircuitMove move : twoPoleMoves) {
      byId.put(move.circuitId(), move.toPhase());
    }
    return byId;
  }
}
