package com.wayledger.engine.balance;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The ways the two-pole breakers of a three-line panelboard can sit: every combination of "stays"
 * or "moves to one of the two other pairs of lines" for each movable two-pole breaker, each mover
 * given a free pair of vertically adjacent spaces (n, n + 2) of its new pair, no two sharing a
 * space. Each combination becomes a single-pole problem: its two-pole current is fixed load on its
 * lines, the spaces it takes leave the free list and the spaces it leaves join it, so the existing
 * exact searches place the single-pole circuits around it.
 *
 * <p>Two-pole breakers move only into spaces that are free before the plan: spaces freed by
 * single-pole moves, or by another two-pole move, are not offered to them (a stated limit, never an
 * unsafe placement). At most {@link #MOVABLE_LIMIT} two-pole breakers, largest first, are tried;
 * the rest stay, with a note.
 */
final class TwoPoleLayouts {

  /** 3^4 = 81 combinations at most, each a full single-pole search with its share of the budget. */
  static final int MOVABLE_LIMIT = 4;

  private static final List<PhasePosition> PAIRS =
      List.of(PhasePosition.L1_L2, PhasePosition.L2_L3, PhasePosition.L3_L1);

  /**
   * One arrangement of the two-pole breakers.
   *
   * @param moves the two-pole breakers that move, with their new spaces
   * @param problem the single-pole problem around them
   */
  record Layout(List<CircuitMove> moves, BalanceProblem problem) {}

  /**
   * The layouts, the one where nothing moves first; or why there are none.
   *
   * @param notes plain-words notes for the result message
   */
  record Layouts(
      List<Layout> layouts, List<String> notes, BalanceOutcome failure, String message) {}

  private TwoPoleLayouts() {}

  static Layouts of(BalanceProblem problem) {
    List<TwoPoleItem> twoPoles = problem.twoPoles();
    PanelSpaces panel = problem.panel();
    if (panel == null || panel.lines() != 3 || problem.lines() != 3) {
      return failed(
          BalanceOutcome.INVALID_INPUT,
          "Two-pole breakers are balanced on a three-line panelboard only; give its spaces.");
    }
    if (problem.positionsAvailable() != null) {
      return failed(
          BalanceOutcome.INVALID_INPUT,
          "With two-pole breakers the positions come from the free spaces; give free spaces, not"
              + " position counts.");
    }
    Set<Long> ids = new HashSet<>();
    problem.items().forEach(item -> ids.add(item == null ? Long.MIN_VALUE : item.circuitId()));
    List<String> missing = new ArrayList<>();
    for (TwoPoleItem item : twoPoles) {
      if (item == null) {
        return failed(BalanceOutcome.INVALID_INPUT, "The circuit list contains an empty entry.");
      }
      if (!ids.add(item.circuitId())) {
        return failed(BalanceOutcome.INVALID_INPUT, PreparedBoard.duplicateId(item.circuitId()));
      }
      if (panel.fitOf(item.firstSpace(), 2) != PanelSpaces.Fit.FITS) {
        return failed(
            BalanceOutcome.INVALID_INPUT,
            "Two-pole circuit '"
                + item.label()
                + "' at space "
                + item.firstSpace()
                + " does not fit the "
                + panel.spaceCount()
                + "-space panelboard.");
      }
      if (item.lineAmps() == null) {
        missing.add("'" + item.label() + "'");
      } else if (!Double.isFinite(item.lineAmps()) || item.lineAmps() < 0.0) {
        return failed(
            BalanceOutcome.INVALID_INPUT,
            PreparedBoard.impossibleDemand(item.label(), item.lineAmps()));
      }
    }
    if (!missing.isEmpty()) {
      return failed(BalanceOutcome.NOT_ASSESSED, PreparedBoard.demandNotKnown(missing));
    }

    List<TwoPoleItem> movers = new ArrayList<>();
    List<TwoPoleItem> staying = new ArrayList<>();
    for (TwoPoleItem item : twoPoles) {
      (item.movable() ? movers : staying).add(item);
    }
    movers.sort(
        Comparator.comparingLong((TwoPoleItem item) -> PreparedBoard.centiamps(item.lineAmps()))
            .reversed()
            .thenComparingLong(TwoPoleItem::circuitId));
    List<String> notes = new ArrayList<>();
    if (movers.size() > MOVABLE_LIMIT) {
      List<TwoPoleItem> kept = movers.subList(MOVABLE_LIMIT, movers.size());
      notes.add(
          kept.size()
              + " smaller two-pole breaker(s) kept where they are: at most "
              + MOVABLE_LIMIT
              + " are tried.");
      staying.addAll(kept);
      movers = new ArrayList<>(movers.subList(0, MOVABLE_LIMIT));
    }

    // fixed load in whole centiamps, so every layout's line loads are exact sums of the same parts
    long[] base = new long[3];
    if (problem.fixedLoadAmps() != null) {
      for (Map.Entry<Phase, Double> entry : problem.fixedLoadAmps().entrySet()) {
        if (entry.getKey() != null && entry.getValue() != null) {
          if (!Double.isFinite(entry.getValue()) || entry.getValue() < 0.0) {
            return failed(
                BalanceOutcome.INVALID_INPUT,
                "Fixed load on "
                    + entry.getKey()
                    + " of "
                    + entry.getValue()
                    + " A is impossible; it must be zero or more.");
          }
          base[entry.getKey().ordinal()] += PreparedBoard.centiamps(entry.getValue());
        }
      }
    }
    for (TwoPoleItem item : staying) {
      addShare(base, panel.positionOf(item.firstSpace(), 2), item.lineAmps());
    }
    TreeSet<Integer> free = new TreeSet<>();
    if (problem.freeWays() != null) {
      for (Map.Entry<Phase, List<Integer>> entry : problem.freeWays().entrySet()) {
        if (entry.getValue() != null) {
          for (Integer space : entry.getValue()) {
            if (space != null
                && space >= 1
                && space <= panel.spaceCount()
                && panel.lineOf(space) == entry.getKey()) {
              free.add(space);
            }
          }
        }
      }
    }

    List<Layout> layouts = new ArrayList<>();
    int combinations = (int) Math.pow(3, movers.size());
    for (int code = 0; code < combinations; code++) {
      PhasePosition[] target = new PhasePosition[movers.size()];
      int rest = code;
      for (int j = 0; j < movers.size(); j++) {
        PhasePosition now = panel.positionOf(movers.get(j).firstSpace(), 2);
        int choice = rest % 3;
        rest /= 3;
        target[j] = choice == 0 ? now : otherPairs(now).get(choice - 1);
      }
      int[] firstSpaces = new int[movers.size()];
      if (!assign(panel, movers, target, 0, new TreeSet<>(free), firstSpaces)) {
        continue;
      }
      layouts.add(layout(problem, panel, base, free, movers, target, firstSpaces));
    }
    return new Layouts(List.copyOf(layouts), List.copyOf(notes), null, null);
  }

  private static Layout layout(
      BalanceProblem problem,
      PanelSpaces panel,
      long[] base,
      Set<Integer> free,
      List<TwoPoleItem> movers,
      PhasePosition[] target,
      int[] firstSpaces) {
    long[] fixed = base.clone();
    TreeSet<Integer> spaces = new TreeSet<>(free);
    List<CircuitMove> moves = new ArrayList<>();
    for (int j = 0; j < movers.size(); j++) {
      TwoPoleItem item = movers.get(j);
      PhasePosition now = panel.positionOf(item.firstSpace(), 2);
      addShare(fixed, target[j], item.lineAmps());
      if (target[j] == now) {
        continue;
      }
      spaces.removeAll(panel.spacesOf(firstSpaces[j], 2));
      spaces.addAll(panel.spacesOf(item.firstSpace(), 2));
      moves.add(
          new CircuitMove(
              item.circuitId(),
              item.label(),
              PreparedBoard.centiamps(item.lineAmps()) / 100.0,
              now.fromLine(),
              item.firstSpace(),
              target[j].fromLine(),
              firstSpaces[j],
              2));
    }
    Map<Phase, Double> fixedAmps = new EnumMap<>(Phase.class);
    Map<Phase, List<Integer>> freeWays = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      fixedAmps.put(phase, fixed[phase.ordinal()] / 100.0);
      freeWays.put(phase, new ArrayList<>());
    }
    for (int space : spaces) {
      freeWays.get(panel.lineOf(space)).add(space);
    }
    BalanceProblem single =
        new BalanceProblem(
            problem.items(),
            fixedAmps,
            null,
            freeWays,
            problem.unbalanceLimitPercent(),
            problem.threePhase(),
            problem.lineCount(),
            List.of(),
            panel,
            problem.phasorCorrectionAmps());
    return new Layout(List.copyOf(moves), single);
  }

  /**
   * Gives each mover from {@code from} on a pair of free adjacent spaces of its target pair, the
   * lowest first, backtracking when a later mover finds none; movers that stay keep their spaces.
   */
  private static boolean assign(
      PanelSpaces panel,
      List<TwoPoleItem> movers,
      PhasePosition[] target,
      int from,
      TreeSet<Integer> free,
      int[] firstSpaces) {
    if (from == movers.size()) {
      return true;
    }
    TwoPoleItem item = movers.get(from);
    if (target[from] == panel.positionOf(item.firstSpace(), 2)) {
      firstSpaces[from] = item.firstSpace();
      return assign(panel, movers, target, from + 1, free, firstSpaces);
    }
    for (int space : new ArrayList<>(free)) {
      if (panel.fitOf(space, 2) == PanelSpaces.Fit.FITS
          && free.contains(space + 2)
          && panel.positionOf(space, 2) == target[from]) {
        free.remove(space);
        free.remove(space + 2);
        firstSpaces[from] = space;
        if (assign(panel, movers, target, from + 1, free, firstSpaces)) {
          return true;
        }
        free.add(space);
        free.add(space + 2);
      }
    }
    return false;
  }

  private static void addShare(long[] loads, PhasePosition pair, double lineAmps) {
    long share = PreparedBoard.centiamps(lineAmps);
    for (Phase phase : pair.phases()) {
      loads[phase.ordinal()] += share;
    }
  }

  private static List<PhasePosition> otherPairs(PhasePosition pair) {
    return PAIRS.stream().filter(other -> other != pair).toList();
  }

  private static Layouts failed(BalanceOutcome outcome, String message) {
    return new Layouts(List.of(), List.of(), outcome, message);
  }
}
