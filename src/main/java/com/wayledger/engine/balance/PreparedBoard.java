package com.wayledger.engine.balance;

import com.wayledger.engine.Phase;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A checked problem in integer centiamps: the movable circuits sorted by demand, largest first, and
 * the fixed load and position limit of each line. Each demand is rounded to the nearest 0.01 A
 * once, here, so every search compares exact integers.
 */
final class PreparedBoard {

  static final Phase[] PHASES = Phase.values();

  /** Far above any low-voltage board; keeps the integer search keys from overflowing. */
  static final double MAX_TOTAL_AMPS = 10_000_000.0;

  /** The outcome of checking a problem: a board ready to search, or why there is none. */
  record Preparation(PreparedBoard board, BalanceOutcome failure, String message) {}

  final BalanceProblem problem;

  /** Movable circuits, largest demand first, ties by circuit id so results are repeatable. */
  final BalanceItem[] movable;

  /** Demand of {@code movable[i]}, centiamps. */
  final long[] demand;

  /** Current line index of {@code movable[i]}, or -1 when not placed. */
  final int[] currentPhase;

  final List<BalanceItem> locked;

  /** Fixed load per line including locked circuits, centiamps. */
  final long[] fixed;

  /**
   * Positions per line for the movable circuits; an unlimited line holds {@code movable.length}.
   */
  final int[] capacity;

  final long total;

  /** The fixed loads below zero, added up as a positive number (phasor corrections), centiamps. */
  final long negativeFixed;

  final List<String> notes;

  /**
   * The lines balanced over: 3, or 2 on a split-phase board, whose third slot stays empty (no
   * positions, no load) and takes no part in the mean.
   */
  final int lines;

  private PreparedBoard(
      BalanceProblem problem,
      BalanceItem[] movable,
      List<BalanceItem> locked,
      long[] fixed,
      int[] capacity,
      List<String> notes) {
    this.problem = problem;
    this.movable = movable;
    this.locked = locked;
    this.fixed = fixed;
    this.capacity = capacity;
    this.notes = notes;
    this.lines = problem.lines();
    this.demand = new long[movable.length];
    this.currentPhase = new int[movable.length];
    long sum = fixed[0] + fixed[1] + fixed[2];
    this.negativeFixed = Math.max(0, -fixed[0]) + Math.max(0, -fixed[1]) + Math.max(0, -fixed[2]);
    for (int i = 0; i < movable.length; i++) {
      demand[i] = centiamps(movable[i].demandAmps());
      currentPhase[i] =
          movable[i].currentPhase() == null ? -1 : movable[i].currentPhase().ordinal();
      sum += demand[i];
    }
    this.total = sum;
  }

  static long centiamps(double amps) {
    return Math.round(amps * 100.0);
  }

  int size() {
    return movable.length;
  }

  /** The currents of an arrangement's line loads, over the board's lines. */
  PhaseCurrents currentsOf(long[] loads) {
    return PhaseCurrents.ofCentiamps(loads, lines);
  }

  /** Every movable circuit has a current line, so "the board as it is now" exists. */
  boolean allPlaced() {
    for (int phase : currentPhase) {
      if (phase < 0) {
        return false;
      }
    }
    return true;
  }

  long[] loadsOf(int[] phaseOfItem) {
    long[] loads = fixed.clone();
    for (int i = 0; i < demand.length; i++) {
      loads[phaseOfItem[i]] += demand[i];
    }
    return loads;
  }

  boolean withinCapacity(int[] phaseOfItem) {
    int[] counts = new int[3];
    for (int phase : phaseOfItem) {
      counts[phase]++;
    }
    return counts[0] <= capacity[0] && counts[1] <= capacity[1] && counts[2] <= capacity[2];
  }

  /**
   * The objective as one number: the largest phase load first, then the largest deviation from the
   * mean, kept as the exact integer max|3·load − total| (three times the deviation), so comparing
   * keys is comparing (largest current, then unbalance) without rounding.
   */
  long keyOf(long[] loads) {
    return key(loads[0], loads[1], loads[2]);
  }

  long key(long a, long b, long c) {
    if (lines == 2) {
      // two lines: the deviation from the mean is |a − b| / 2, kept as |2a − total| = |a − b|
      long max = Math.max(a, b);
      return max * keyBase() + Math.abs(a - b);
    }
    long max = Math.max(a, Math.max(b, c));
    long min = Math.min(a, Math.min(b, c));
    return max * keyBase() + Math.max(3 * max - total, total - 3 * min);
  }

  /**
   * Lower bound on the key when the largest load is at least {@code max} and the middle one at
   * least {@code mid}.
   */
  long keyBound(long max, long mid) {
    if (lines == 2) {
      // the other line carries the rest: total − max
      return max * keyBase() + Math.max(0, 2 * max - total);
    }
    long smallestUpper = total - max - mid;
    return max * keyBase() + Math.max(3 * max - total, Math.max(0, total - 3 * smallestUpper));
  }

  long keyBase() {
    // the deviation term is below this even when a phasor correction makes a line's fixed load
    // negative: max|3·load − total| ≤ 2·total + 3·(sum of negative fixed loads)
    return 3 * total + 3 * negativeFixed + 1;
  }

  long maxOfKey(long key) {
    return key / keyBase();
  }

  static Preparation prepare(BalanceProblem problem) {
    return prepare(problem, com.wayledger.engine.PositionWords.WAYS);
  }

  /** As {@link #prepare(BalanceProblem)}, its messages in the board's own words. */
  static Preparation prepare(BalanceProblem problem, com.wayledger.engine.PositionWords words) {
    String board = words.board();
    if (problem == null || problem.items() == null) {
      return failed(
          BalanceOutcome.NOT_ASSESSED, "Not assessed: the " + board + " has no circuit list.");
    }
    if (!problem.threePhase()) {
      return failed(
          BalanceOutcome.NOT_THREE_PHASE,
          "This is a single-phase "
              + board
              + ": every circuit is on the one line, so there is nothing to balance.");
    }
    if (problem.lines() != 2 && problem.lines() != 3) {
      return failed(
          BalanceOutcome.INVALID_INPUT,
          "A "
              + board
              + " to balance has 2 lines (120/240 V split-phase) or 3; "
              + problem.lines()
              + " given.");
    }
    List<String> missingDemand = new ArrayList<>();
    List<String> unplacedLocked = new ArrayList<>();
    Set<Long> ids = new HashSet<>();
    for (BalanceItem item : problem.items()) {
      if (item == null) {
        return failed(BalanceOutcome.INVALID_INPUT, "The circuit list contains an empty entry.");
      }
      if (!ids.add(item.circuitId())) {
        return failed(BalanceOutcome.INVALID_INPUT, duplicateId(item.circuitId()));
      }
      if (item.demandAmps() == null) {
        missingDemand.add("'" + item.label() + "'");
      } else if (!Double.isFinite(item.demandAmps()) || item.demandAmps() < 0.0) {
        return failed(
            BalanceOutcome.INVALID_INPUT, impossibleDemand(item.label(), item.demandAmps()));
      }
      if (!item.movable() && item.currentPhase() == null) {
        unplacedLocked.add("'" + item.label() + "'");
      }
      if (problem.lines() == 2 && item.currentPhase() == Phase.L3) {
        return failed(
            BalanceOutcome.INVALID_INPUT,
            "Circuit '"
                + item.label()
                + "' is on "
                + words.line(Phase.L3)
                + ", which a two-line (split-phase) "
                + board
                + " does not have.");
      }
    }
    if (!missingDemand.isEmpty()) {
      return failed(BalanceOutcome.NOT_ASSESSED, demandNotKnown(missingDemand));
    }
    if (!unplacedLocked.isEmpty()) {
      return failed(
          BalanceOutcome.NOT_ASSESSED,
          "Not assessed: locked circuit "
              + String.join(", ", unplacedLocked)
              + " has no phase; a locked circuit must say which line it is locked to.");
    }
    long[] fixed = new long[3];
    Map<Phase, Double> fixedAmps = problem.fixedLoadAmps();
    if (fixedAmps != null) {
      for (Map.Entry<Phase, Double> entry : fixedAmps.entrySet()) {
        Double amps = entry.getValue();
        if (entry.getKey() == null || amps == null) {
          continue;
        }
        if (!Double.isFinite(amps) || amps < 0.0) {
          return failed(
              BalanceOutcome.INVALID_INPUT,
              "Fixed load on "
                  + entry.getKey()
                  + " of "
                  + amps
                  + " A is impossible; it must be zero or more.");
        }
        if (problem.lines() == 2 && entry.getKey() == Phase.L3 && amps > 0.0) {
          return failed(
              BalanceOutcome.INVALID_INPUT,
              "Fixed load of "
                  + amps
                  + " A on "
                  + words.line(Phase.L3)
                  + ", which a two-line (split-phase) "
                  + board
                  + " does not have.");
        }
        fixed[entry.getKey().ordinal()] += centiamps(amps);
      }
    }
    Map<Phase, Double> corrections = problem.phasorCorrectionAmps();
    if (corrections != null) {
      for (Map.Entry<Phase, Double> entry : corrections.entrySet()) {
        Double amps = entry.getValue();
        if (entry.getKey() == null || amps == null) {
          continue;
        }
        if (!Double.isFinite(amps)
            || amps > 0.0
            || (problem.lines() == 2 && entry.getKey() == Phase.L3 && amps < 0.0)) {
          return failed(
              BalanceOutcome.INVALID_INPUT,
              "Phasor correction on "
                  + entry.getKey()
                  + " of "
                  + amps
                  + " A is impossible; a phasor sum is never larger than the magnitudes added.");
        }
        fixed[entry.getKey().ordinal()] += centiamps(amps);
      }
    }
    double totalAmps = (fixed[0] + fixed[1] + fixed[2]) / 100.0;
    for (BalanceItem item : problem.items()) {
      totalAmps += item.demandAmps();
    }
    if (totalAmps > MAX_TOTAL_AMPS) {
      return failed(
          BalanceOutcome.INVALID_INPUT,
          "The "
              + board
              + "'s total demand of "
              + totalAmps
              + " A is beyond any low-voltage "
              + board
              + "; check the units.");
    }
    List<BalanceItem> movableItems = new ArrayList<>();
    List<BalanceItem> locked = new ArrayList<>();
    for (BalanceItem item : problem.items()) {
      if (item.movable()) {
        movableItems.add(item);
      } else {
        locked.add(item);
        fixed[item.currentPhase().ordinal()] += centiamps(item.demandAmps());
      }
    }
    movableItems.sort(
        Comparator.comparingLong((BalanceItem item) -> centiamps(item.demandAmps()))
            .reversed()
            .thenComparingLong(BalanceItem::circuitId));
    BalanceItem[] movable = movableItems.toArray(new BalanceItem[0]);
    long asItStands = fixed[0] + fixed[1] + fixed[2];
    for (BalanceItem item : movable) {
      asItStands += centiamps(item.demandAmps());
    }
    if (asItStands < 0) {
      return failed(
          BalanceOutcome.INVALID_INPUT,
          "The phasor corrections are larger than the board's whole load; check the corrections.");
    }

    List<String> notes = new ArrayList<>();
    int[] capacity = new int[3];
    for (Phase phase : PHASES) {
      if (phase.ordinal() >= problem.lines()) {
        capacity[phase.ordinal()] = 0; // a split-phase board has no third line
        continue;
      }
      Integer given =
          problem.positionsAvailable() == null ? null : problem.positionsAvailable().get(phase);
      if (given != null) {
        if (given < 0) {
          return failed(
              BalanceOutcome.INVALID_INPUT,
              "Positions available on "
                  + words.line(phase)
                  + " is "
                  + given
                  + "; it must be zero or more.");
        }
        capacity[phase.ordinal()] = Math.min(given, movable.length);
      } else if (problem.freeWays() != null) {
        List<Integer> free = problem.freeWays().get(phase);
        long onPhaseNow =
            movableItems.stream().filter(item -> item.currentPhase() == phase).count();
        capacity[phase.ordinal()] =
            (int) Math.min(movable.length, onPhaseNow + (free == null ? 0 : free.size()));
      } else {
        capacity[phase.ordinal()] = movable.length;
        notes.add("Positions on " + words.line(phase) + " not given: not limited.");
      }
    }
    int positions = capacity[0] + capacity[1] + capacity[2];
    if (movable.length > positions) {
      return failed(
          BalanceOutcome.TOO_MANY_CIRCUITS,
          movable.length
              + " movable single-phase circuits but only "
              + positions
              + " positions for them ("
              + words.line(Phase.L1)
              + " "
              + capacity[0]
              + ", "
              + words.line(Phase.L2)
              + " "
              + capacity[1]
              + ", "
              + words.line(Phase.L3)
              + " "
              + capacity[2]
              + "): free positions or lock circuits before balancing.");
    }
    return new Preparation(
        new PreparedBoard(problem, movable, locked, fixed, capacity, notes), null, null);
  }

  static String duplicateId(long circuitId) {
    return "Circuit id " + circuitId + " appears more than once; each circuit may be listed once.";
  }

  static String impossibleDemand(String label, double amps) {
    return "Circuit '"
        + label
        + "' has an impossible demand of "
        + amps
        + " A; demand must be zero or more.";
  }

  static String demandNotKnown(List<String> quotedLabels) {
    return "Not assessed: demand current not known for " + String.join(", ", quotedLabels) + ".";
  }

  /**
   * The band of line loads, centiamps, inside which the unbalance is within {@code limitPercent}:
   * every line within mean·(1 ± limit/100); the tolerance absorbs the decimal limit.
   */
  long[] limitBand(double limitPercent) {
    double mean = total / (double) lines;
    double allowed = mean * limitPercent / 100.0;
    return new long[] {
      (long) Math.ceil(mean - allowed - 1e-9), (long) Math.floor(mean + allowed + 1e-9)
    };
  }

  private static Preparation failed(BalanceOutcome outcome, String message) {
    return new Preparation(null, outcome, message);
  }

  @Override
  public String toString() {
    return "PreparedBoard" + Arrays.toString(demand);
  }
}
