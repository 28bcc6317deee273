package com.wayledger.balance;

import com.wayledger.balance.BalancePlans.Basis;
import com.wayledger.board.AnalysisService;
import com.wayledger.board.Placement;
import com.wayledger.board.ScheduleMapper;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.PanelSpaces;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.balance.BalanceItem;
import com.wayledger.engine.balance.BalanceProblem;
import com.wayledger.engine.balance.BalanceResult;
import com.wayledger.engine.balance.CircuitMove;
import com.wayledger.engine.balance.FewestMovesResult;
import com.wayledger.engine.balance.MovesStep;
import com.wayledger.engine.balance.PhaseBalancer;
import com.wayledger.engine.balance.TwoPoleItem;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.system.NotFoundException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springframework.stereotype.Service;

/**
 * Turns a stored board into a balancing problem and its plans into placements. Single-pole circuits
 * in use and not locked may move, and so may two-pole, line-to-line ones on a three-line
 * panelboard; three-pole and locked circuits are fixed loads; a position is free when no circuit,
 * spare device or empty-space record holds it.
 */
@Service
public class BalanceService {

  private final AnalysisService analysis;

  public BalanceService(AnalysisService analysis) {
    this.analysis = analysis;
  }

  /**
   * The plans for a board.
   *
   * @param movesChoice null for the optimal plan, else the number of moves of the fewest-moves row
   *     to preview
   */
  public BalancePlans plans(long boardId, Basis basis, Integer movesChoice) {
    SiteAnalysis results = analysis.ofBoard(boardId);
    BoardSpec board =
        results.spec().boards().stream()
            .filter(b -> b.id() == boardId)
            .findFirst()
            .orElseThrow(() -> new NotFoundException("Board", boardId));
    BoardDemand before = results.boardDemand(boardId);
    BalanceProblem problem = problemOf(board, before, basis, results.spec().panelSpacesOf(board));
    PhaseBalancer balancer =
        new PhaseBalancer(null, com.wayledger.engine.PositionWords.of(results.spec(), board));
    BalanceResult optimal = balancer.optimise(problem);
    FewestMovesResult fewest = balancer.fewestMoves(problem);
    List<CircuitMove> chosen = optimal.moves() == null ? List.of() : optimal.moves();
    String label = "optimal"; // a message key suffix: balance.after.<label>
    Integer chosenStep = null;
    if (movesChoice == null
        && fewest.optimumReached()
        && fewest.steps() != null
        && !fewest.steps().isEmpty()) {
      // the page recommends the fewest moves that reach the optimum: preview that, not a plan that
      // moves more circuits for the same largest line current
      MovesStep last = fewest.steps().get(fewest.steps().size() - 1);
      chosen = last.plan();
      label = "optimalMoves";
      chosenStep = last.moves();
    }
    if (movesChoice != null && fewest.steps() != null) {
      for (MovesStep step : fewest.steps()) {
        if (step.moves() == movesChoice) {
          chosen = step.plan();
          label = "moves";
          chosenStep = movesChoice;
        }
      }
    }
    List<Placement> placements = placementsOf(chosen);
    List<Placement> undo = undoOf(chosen);
    BoardDemand after =
        placements.isEmpty()
            ? before
            : analysis
                .analyse(ScheduleMapper.withPlacements(results.spec(), placements))
                .boardDemand(boardId);
    List<BalancePlans.StepFigures> figures = new ArrayList<>();
    if (fewest.steps() != null) {
      for (MovesStep step : fewest.steps()) {
        List<Placement> moved = placementsOf(step.plan());
        BoardDemand d =
            moved.isEmpty()
                ? before
                : analysis
                    .analyse(ScheduleMapper.withPlacements(results.spec(), moved))
                    .boardDemand(boardId);
        if (d != null) {
          double largest = d.phases().stream().mapToDouble(p -> p.currentAmps()).max().orElse(0.0);
          figures.add(new BalancePlans.StepFigures(step.moves(), largest, d.unbalancePercent()));
        }
      }
    }
    return new BalancePlans(
        basis,
        optimal,
        fewest,
        chosen,
        label,
        before,
        after,
        placements,
        undo,
        figures,
        chosenStep,
        com.wayledger.engine.PositionWords.of(results.spec(), board));
  }

  /** The balancing problem of a board: public so the API can show what was solved. */
  public static BalanceProblem problemOf(BoardSpec board, BoardDemand demand, Basis basis) {
    return problemOf(board, demand, basis, null);
  }

  /**
   * The balancing problem of a board; on a panelboard ({@code panel} not null) the free positions
   * are its free spaces, each on the line of its row, so a move is from one space to another and a
   * multi-pole breaker keeps its adjacent spaces. A split-phase (120/240 V) panelboard is solved
   * over its two lines A and B: no position on a third, and the mean, the unbalance and the limit
   * taken over two lines.
   */
  public static BalanceProblem problemOf(
      BoardSpec board, BoardDemand demand, Basis basis, PanelSpaces panel) {
    Map<Long, CircuitDemand> byCircuit = new java.util.HashMap<>();
    if (demand != null) {
      demand.circuits().forEach(c -> byCircuit.put(c.circuitId(), c));
    }
    double u0 = demand == null ? 230.0 : demand.nominalVoltageVolts();
    // the board's lines as its panel lays them out (2 on a 120/240 V panel), else its phases
    int lines = panel != null ? panel.lines() : board.isThreePhase() ? 3 : 1;
    List<BalanceItem> items = new ArrayList<>();
    Map<Phase, Double> fixed = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      fixed.put(phase, 0.0);
    }
    Set<String> taken = new HashSet<>();
    // what the listed (single-pole and two-pole) circuits put on each line, added as magnitudes
    Map<Phase, Double> listed = new EnumMap<>(Phase.class);
    List<TwoPoleItem> twoPoles = new ArrayList<>();
    for (CircuitSpec circuit : board.circuits()) {
      if (panel != null) {
        int poles = circuit.position().poles();
        if (panel.fitOf(circuit.wayNumber(), poles) == PanelSpaces.Fit.FITS) {
          for (int space : panel.spacesOf(circuit.wayNumber(), poles)) {
            taken.add(space + ":" + panel.lineOf(space));
          }
        }
      } else {
        for (Phase phase : circuit.position().phases()) {
          taken.add(circuit.wayNumber() + ":" + phase);
        }
      }
      CircuitDemand result = byCircuit.get(circuit.id());
      Double amps = result == null || !result.isAssessed() ? null : amps(result, basis, u0);
      if (circuit.position().isLineToLine()) {
        // a two-pole, line-to-line circuit puts |S|/U_LL on both its lines (U_LL = 2·U0
        // split-phase, √3·U0 on a wye and on 120/208 V). On a three-line panelboard one in use may
        // move to a free pair of adjacent spaces on another pair of lines; elsewhere (120/240 V,
        // where it always spans A–B) it is fixed load on its pair
        double lineToLine = demand != null ? demand.system().lineToLineFactor() : Math.sqrt(3.0);
        Double lineAmps = amps == null ? null : amps / lineToLine;
        if (movesAsPair(panel, circuit)) {
          twoPoles.add(
              new TwoPoleItem(
                  circuit.id(),
                  circuit.description(),
                  lineAmps,
                  circuit.wayNumber(),
                  !circuit.lockedForBalancing()));
          if (lineAmps != null) {
            for (Phase phase : circuit.position().phases()) {
              listed.merge(phase, lineAmps, Double::sum);
            }
          }
        } else if (lineAmps != null) {
          for (Phase phase : circuit.position().phases()) {
            fixed.merge(phase, lineAmps, Double::sum);
          }
        }
        continue;
      }
      if (circuit.position() == PhasePosition.THREE_POLE) {
        if (amps != null) {
          for (Phase phase : Phase.values()) {
            fixed.merge(phase, amps / 3.0, Double::sum);
          }
        }
        continue;
      }
      if (circuit.status() != WayStatus.IN_USE) {
        continue;
      }
      Phase phase = circuit.position().phases().iterator().next();
      if (amps != null) {
        listed.merge(phase, amps, Double::sum);
      }
      items.add(
          new BalanceItem(
              circuit.id(),
              circuit.description(),
              amps,
              phase,
              circuit.wayNumber(),
              !circuit.lockedForBalancing()));
    }
    Map<Phase, Double> correction = new EnumMap<>(Phase.class);
    if (basis == Basis.DEMAND && demand != null && lines >= 2) {
      // the fixed share of each line is what the demand engine puts there beyond the listed
      // circuits: three-pole ways at their own per-line figures (a feeder to an unbalanced
      // sub-board is not spread evenly), allowances carried by no circuit. When the listed
      // circuits, added as magnitudes, come to more than the line's phasor sum, the difference is
      // the line's phasor correction. "As it stands" then equals the board page's line currents.
      for (PhaseDemand line : demand.phases()) {
        double rest = line.currentAmps() - listed.getOrDefault(line.phase(), 0.0);
        fixed.put(line.phase(), Math.max(0.0, rest));
        correction.put(line.phase(), Math.min(0.0, rest));
      }
    }
    Map<Phase, List<Integer>> freeWays = new EnumMap<>(Phase.class);
    for (Phase phase : Phase.values()) {
      List<Integer> ways = new ArrayList<>();
      if (panel != null) {
        for (int space = 1; space <= panel.spaceCount(); space++) {
          if (panel.lineOf(space) == phase && !taken.contains(space + ":" + phase)) {
            ways.add(space);
          }
        }
      } else {
        for (int way = 1; way <= board.wayCount(); way++) {
          if (!taken.contains(way + ":" + phase)) {
            ways.add(way);
          }
        }
      }
      freeWays.put(phase, ways);
    }
    return new BalanceProblem(
        items,
        fixed,
        null,
        freeWays,
        board.unbalanceLimitPercent(),
        lines >= 2,
        lines >= 2 ? lines : null,
        twoPoles,
        panel,
        correction);
  }

  /**
   * Whether a two-pole circuit may move as a pair: in use, on a three-line panelboard, with its two
   * spaces on the panel and on the lines its position says, and feeding no sub-board (a 120/208 V
   * panel fed from two poles draws unequal currents on its two lines, which |S|/U_LL on each would
   * not follow when it moves; its feeder stays, fixed at the demand engine's own per-line figures).
   */
  private static boolean movesAsPair(PanelSpaces panel, CircuitSpec circuit) {
    return panel != null
        && panel.lines() == 3
        && circuit.feedsBoardId() == null
        && circuit.status() == WayStatus.IN_USE
        && panel.fitOf(circuit.wayNumber(), 2) == PanelSpaces.Fit.FITS
        && panel.positionOf(circuit.wayNumber(), 2) == circuit.position();
  }

  /** A circuit's weight in amps: its share of demand on its line, or its connected current. */
  private static double amps(CircuitDemand circuit, Basis basis, double u0) {
    double watts = basis == Basis.CONNECTED ? circuit.connectedWatts() : circuit.demandWatts();
    double vars = basis == Basis.CONNECTED ? circuit.connectedVars() : circuit.demandVars();
    return Math.hypot(watts, vars) / u0;
  }

  static List<Placement> placementsOf(List<CircuitMove> moves) {
    return moves.stream()
        .filter(move -> move.toWay() != null)
        .map(move -> new Placement(move.circuitId(), move.toWay(), move.toPhase(), move.poles()))
        .toList();
  }

  static List<Placement> undoOf(List<CircuitMove> moves) {
    return moves.stream()
        .filter(move -> move.fromWay() != null && move.fromPhase() != null && move.toWay() != null)
        .map(
            move -> new Placement(move.circuitId(), move.fromWay(), move.fromPhase(), move.poles()))
        .toList();
  }
}
