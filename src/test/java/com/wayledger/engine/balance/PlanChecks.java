package com.wayledger.engine.balance;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Applies a plan to a panelboard problem space by space, independently of the planner, and checks
 * that every breaker ends on free spaces of the panel that match its pole count and lines.
 */
final class PlanChecks {

  private PlanChecks() {}

  /**
   * Checks the plan and returns each circuit's spaces after it: one space for a single-pole
   * circuit, its two spaces (n, n + 2) for a two-pole one.
   */
  static Map<Long, List<Integer>> assertPlacedSafely(
      PanelSpaces panel, BalanceProblem problem, List<CircuitMove> plan) {
    Set<Integer> free = new HashSet<>();
    problem.freeWays().values().forEach(free::addAll);
    Map<Long, List<Integer>> spaces = new HashMap<>();
    for (BalanceItem item : problem.items()) {
      spaces.put(item.circuitId(), List.of(item.currentWay()));
    }
    for (TwoPoleItem item : problem.twoPoles()) {
      spaces.put(item.circuitId(), List.of(item.firstSpace(), item.firstSpace() + 2));
    }
    Set<Long> moved = new HashSet<>();
    for (CircuitMove move : plan) {
      assertThat(moved.add(move.circuitId())).as("circuit moved once: %s", move).isTrue();
      free.addAll(spaces.get(move.circuitId()));
    }
    for (CircuitMove move : plan) {
      assertThat(move.toWay()).as("a space for %s", move).isNotNull();
      int poles =
          problem.twoPoles().stream().anyMatch(t -> t.circuitId() == move.circuitId()) ? 2 : 1;
      assertThat(move.poles()).as("pole count kept by %s", move).isEqualTo(poles);
      assertThat(panel.fitOf(move.toWay(), poles))
          .as("%s fits the panel", move)
          .isEqualTo(PanelSpaces.Fit.FITS);
      List<Integer> taken = panel.spacesOf(move.toWay(), poles);
      for (int space : taken) {
        assertThat(free.remove(space)).as("space %d free for %s", space, move).isTrue();
      }
      PhasePosition position = panel.positionOf(move.toWay(), poles);
      assertThat(position)
          .as("lines of %s", move)
          .isEqualTo(
              poles == 2
                  ? PhasePosition.twoPoleFrom(move.toPhase())
                  : PhasePosition.on(move.toPhase()));
      spaces.put(move.circuitId(), taken);
    }
    return spaces;
  }

  /** The line loads after the plan, centiamps, recomputed from the spaces each circuit ends on. */
  static long[] loadsAfter(
      PanelSpaces panel, BalanceProblem problem, Map<Long, List<Integer>> spaces) {
    long[] loads = new long[3];
    for (Map<Phase, Double> part :
        java.util.Arrays.asList(problem.fixedLoadAmps(), problem.phasorCorrectionAmps())) {
      if (part != null) {
        part.forEach((phase, amps) -> loads[phase.ordinal()] += Math.round(amps * 100));
      }
    }
    for (BalanceItem item : problem.items()) {
      loads[panel.lineOf(spaces.get(item.circuitId()).get(0)).ordinal()] +=
          Math.round(item.demandAmps() * 100);
    }
    for (TwoPoleItem item : problem.twoPoles()) {
      for (int space : spaces.get(item.circuitId())) {
        loads[panel.lineOf(space).ordinal()] += Math.round(item.lineAmps() * 100);
      }
    }
    return loads;
  }

  static long[] centiamps(PhaseCurrents currents) {
    return new long[] {
      Math.round(currents.l1Amps() * 100),
      Math.round(currents.l2Amps() * 100),
      Math.round(currents.l3Amps() * 100)
    };
  }
}
