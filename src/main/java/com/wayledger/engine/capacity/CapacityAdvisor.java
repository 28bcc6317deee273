package com.wayledger.engine.capacity;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethodCatalog;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardFindings;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.DeviceProposal;
import com.wayledger.engine.protection.DeviceProposer;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.protection.check.ResidualCurrentRules;
import com.wayledger.engine.protection.device.McbStandard;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Tries a new load at every candidate position and ranks the results.
 *
 * <p>Ranking, best first: fewest new danger findings; then fewest new warnings (an overloaded way
 * or incomer is a warning, and must not rank above a clean candidate); then the lowest largest
 * phase current on the board after the change; then the lowest unbalance after; then spare ways
 * before shared circuits before new circuits (the least work), then way order. Empty positions on
 * the same line of a board are electrically alike to the engine, so only the first free one per
 * line (per three-pole way) is offered.
 */
public final class CapacityAdvisor {

  private CapacityAdvisor() {}

  /**
   * @param site the site as stored
   * @param boardIds the boards to look on; empty for every board of the site
   * @param load the new load
   */
  public static CapacityAnswer ask(
      SiteSpec site,
      Set<Long> boardIds,
      NewLoad load,
      DiversityMethodCatalog methods,
      ProtectionSettings settings) {
    return ask(site, boardIds, load, methods, RecordedMccbSettings.NONE, settings);
  }

  /**
   * As above, with the MCCB settings recorded on the site (a new trial circuit has none, so it is
   * assumed).
   */
  public static CapacityAnswer ask(
      SiteSpec site,
      Set<Long> boardIds,
      NewLoad load,
      DiversityMethodCatalog methods,
      RecordedMccbSettings mccb,
      ProtectionSettings settings) {
    Analysis before = Analysis.of(site, methods, mccb, settings);
    List<String> notes = new ArrayList<>();
    List<CandidateOutcome> outcomes = new ArrayList<>();
    for (BoardSpec board : site.boards()) {
      if (!boardIds.isEmpty() && !boardIds.contains(board.id())) {
        continue;
      }
      com.wayledger.engine.PositionWords words = com.wayledger.engine.PositionWords.of(site, board);
      if (load.threePhase() && !board.isThreePhase()) {
        notes.add(
            board.reference()
                + ": a single-phase "
                + words.board()
                + " cannot take a three-phase load");
        continue;
      }
      List<Candidate> candidates = candidates(board, load, words, site.panelSpacesOf(board));
      if (candidates.isEmpty()) {
        notes.add(
            board.reference()
                + ": no spare "
                + words.position()
                + ", free position or circuit of the same kind");
      }
      for (Candidate candidate : candidates) {
        outcomes.add(evaluate(site, board, candidate, load, before, methods, mccb, settings));
      }
    }
    return new CapacityAnswer(
        load, outcomes.stream().map(CapacityAdvisor::withReason).sorted(RANKING).toList(), notes);
  }

  static final Comparator<CandidateOutcome> RANKING =
      Comparator.comparing((CandidateOutcome o) -> o.isAcceptable() ? 0 : 1)
          .thenComparingLong(CandidateOutcome::newDangerCount)
          .thenComparingLong(CandidateOutcome::newWarningCount)
          .thenComparingDouble(o -> round(o.largestPhaseAmps()))
          .thenComparingDouble(
              o -> o.unbalancePercentAfter() == null ? 0.0 : round(o.unbalancePercentAfter()))
          .thenComparing(o -> kindOrder(o.candidate().kind()))
          .thenComparing(o -> o.candidate().boardReference())
          .thenComparingInt(o -> o.candidate().wayNumber())
          .thenComparing(o -> o.candidate().position());

  /** Rounded to 0.01 so that equal figures reached by different sums do not reorder candidates. */
  private static double round(double value) {
    return Math.rint(value * 100.0) / 100.0;
  }

  private static int kindOrder(CandidateKind kind) {
    return switch (kind) {
      case SPARE_WAY -> 0;
      case SHARED_CIRCUIT -> 1;
      case EMPTY_POSITION -> 2;
    };
  }

  /** The candidate positions of one board of ways (not a panelboard) for the load, in way order. */
  static List<Candidate> candidates(
      BoardSpec board, NewLoad load, com.wayledger.engine.PositionWords words) {
    return candidates(board, load, words, null);
  }

  /**
   * The candidate positions of one board for the load, in way order; on a panelboard ({@code panel}
   * not null) the free spaces as the panel lays them out, each on the line of its row.
   */
  static List<Candidate> candidates(
      BoardSpec board,
      NewLoad load,
      com.wayledger.engine.PositionWords words,
      com.wayledger.engine.PanelSpaces panel) {
    Map<String, CircuitSpec> held = new HashMap<>();
    Map<String, CircuitSpec> emptyRecords = new HashMap<>();
    for (CircuitSpec circuit : board.circuits()) {
      for (Phase phase : circuit.position().phases()) {
        (circuit.status() == WayStatus.EMPTY ? emptyRecords : held)
            .put(key(circuit.wayNumber(), phase), circuit);
      }
    }
    List<Candidate> found = new ArrayList<>();
    for (CircuitSpec circuit : board.circuits()) {
      boolean fits = load.threePhase() == (circuit.position() == PhasePosition.THREE_POLE);
      if (!fits || circuit.device() == null || circuit.feedsBoardId() != null) {
        continue;
      }
      if (circuit.status() == WayStatus.SPARE_DEVICE) {
        found.add(existing(board, circuit, words, CandidateKind.SPARE_WAY));
      } else if (circuit.status() == WayStatus.IN_USE
          && circuit.loads().stream().anyMatch(l -> l.category() == load.category())) {
        found.add(existing(board, circuit, words, CandidateKind.SHARED_CIRCUIT));
      }
    }
    if (panel != null) {
      found.addAll(freeSpaces(board, load, words, panel));
    } else {
      List<Phase> lines = board.isThreePhase() ? List.of(Phase.values()) : List.of(Phase.L1);
      if (load.threePhase()) {
        for (int way = 1; way <= board.wayCount(); way++) {
          final int w = way;
          if (lines.stream().noneMatch(p -> held.containsKey(key(w, p)))) {
            CircuitSpec record = emptyRecords.get(key(way, Phase.L1));
            found.add(empty(board, words, way, PhasePosition.THREE_POLE, record));
            break;
          }
        }
      } else {
        for (Phase phase : lines) {
          for (int way = 1; way <= board.wayCount(); way++) {
            if (!held.containsKey(key(way, phase))) {
              CircuitSpec record = emptyRecords.get(key(way, phase));
              boolean recordFits = record != null && record.position().isSinglePole();
              found.add(
                  empty(board, words, way, PhasePosition.on(phase), recordFits ? record : null));
              break;
            }
          }
        }
      }
    }
    found.sort(Comparator.comparingInt(Candidate::wayNumber).thenComparing(Candidate::position));
    return found;
  }

  /**
   * A panelboard's free spaces for a new load: for a one-pole load the first free space on each of
   * its lines (space 1 is line A, space 3 line B, … — the line is the space's row, never chosen
   * apart from it); for a three-phase load the first three vertically adjacent free spaces. A space
   * is taken when any recorded breaker that is not an empty record covers it.
   */
  private static List<Candidate> freeSpaces(
      BoardSpec board,
      NewLoad load,
      com.wayledger.engine.PositionWords words,
      com.wayledger.engine.PanelSpaces panel) {
    java.util.Set<Integer> taken = new java.util.HashSet<>();
    Map<Integer, CircuitSpec> emptyRecords = new HashMap<>();
    for (CircuitSpec circuit : board.circuits()) {
      int poles = circuit.position().poles();
      if (panel.fitOf(circuit.wayNumber(), poles) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
        continue;
      }
      if (circuit.status() == WayStatus.EMPTY) {
        emptyRecords.put(circuit.wayNumber(), circuit);
      } else {
        taken.addAll(panel.spacesOf(circuit.wayNumber(), poles));
      }
    }
    List<Candidate> found = new ArrayList<>();
    int poles = load.threePhase() ? 3 : 1;
    java.util.Set<Phase> linesFound = java.util.EnumSet.noneOf(Phase.class);
    for (int space = 1; space <= panel.spaceCount(); space++) {
      if (panel.fitOf(space, poles) != com.wayledger.engine.PanelSpaces.Fit.FITS
          || panel.spacesOf(space, poles).stream().anyMatch(taken::contains)) {
        continue;
      }
      PhasePosition position = panel.positionOf(space, poles);
      if (poles == 3 || linesFound.add(panel.lineOf(space))) {
        CircuitSpec record = emptyRecords.get(space);
        boolean recordFits = record != null && record.position() == position;
        found.add(empty(board, words, space, position, recordFits ? record : null));
        if (poles == 3 || linesFound.size() == panel.lines()) {
          break;
        }
      }
    }
    return found;
  }

  private static String key(int way, Phase phase) {
    return way + ":" + phase;
  }

  private static Candidate existing(
      BoardSpec board,
      CircuitSpec circuit,
      com.wayledger.engine.PositionWords words,
      CandidateKind kind) {
    return new Candidate(
        board.id(),
        board.reference(),
        kind,
        circuit.wayNumber(),
        circuit.position(),
        circuit.id(),
        circuit.description(),
        circuit.device(),
        false,
        "",
        words);
  }

  private static Candidate empty(
      BoardSpec board,
      com.wayledger.engine.PositionWords words,
      int way,
      PhasePosition position,
      CircuitSpec record) {
    return new Candidate(
        board.id(),
        board.reference(),
        CandidateKind.EMPTY_POSITION,
        way,
        position,
        record == null ? null : record.id(),
        null,
        null,
        true,
        "",
        words);
  }

  /** Id given to a new circuit in the trial copy of the site: below every stored id. */
  static long trialId(SiteSpec site) {
    long lowest = 0;
    for (BoardSpec board : site.boards()) {
      for (CircuitSpec circuit : board.circuits()) {
        lowest = Math.min(lowest, circuit.id());
      }
    }
    return lowest - 1;
  }

  /** The site with the load placed at the candidate; {@code device} protects a new circuit. */
  static SiteSpec withLoad(
      SiteSpec site,
      BoardSpec board,
      Candidate candidate,
      NewLoad load,
      DeviceSpec device,
      long newId) {
    List<CircuitSpec> circuits = new ArrayList<>();
    boolean placed = false;
    for (CircuitSpec circuit : board.circuits()) {
      if (candidate.circuitId() != null && circuit.id() == candidate.circuitId()) {
        circuits.add(placedOn(circuit, candidate, load, device));
        placed = true;
      } else {
        circuits.add(circuit);
      }
    }
    if (!placed) {
      circuits.add(
          new CircuitSpec(
              newId,
              candidate.wayNumber(),
              candidate.position(),
              load.description(),
              WayStatus.IN_USE,
              false,
              device,
              null,
              List.of(load.toLoadSpec()),
              null,
              null,
              false,
              load.location()));
    }
    BoardSpec changed = board.withCircuits(circuits);
    List<BoardSpec> boards =
        site.boards().stream().map(b -> b.id() == board.id() ? changed : b).toList();
    return site.withBoards(boards);
  }

  private static CircuitSpec placedOn(
      CircuitSpec circuit, Candidate candidate, NewLoad load, DeviceSpec device) {
    List<com.wayledger.engine.LoadSpec> loads = new ArrayList<>(circuit.loads());
    loads.add(load.toLoadSpec());
    return switch (candidate.kind()) {
      case SHARED_CIRCUIT ->
          new CircuitSpec(
              circuit.id(),
              circuit.wayNumber(),
              circuit.position(),
              circuit.description(),
              WayStatus.IN_USE,
              circuit.lockedForBalancing(),
              circuit.device(),
              circuit.cable(),
              loads,
              null,
              circuit.measuredLoopImpedanceOhms(),
              circuit.ringFinal(),
              circuit.location());
      case SPARE_WAY ->
          new CircuitSpec(
              circuit.id(),
              circuit.wayNumber(),
              circuit.position(),
              load.description(),
              WayStatus.IN_USE,
              circuit.lockedForBalancing(),
              circuit.device(),
              circuit.cable(),
              List.of(load.toLoadSpec()),
              null,
              circuit.measuredLoopImpedanceOhms(),
              circuit.ringFinal(),
              load.location());
      case EMPTY_POSITION ->
          new CircuitSpec(
              circuit.id(),
              candidate.wayNumber(),
              candidate.position(),
              load.description(),
              WayStatus.IN_USE,
              false,
              device,
              null,
              List.of(load.toLoadSpec()),
              null,
              null,
              false,
              load.location());
    };
  }

  private static CandidateOutcome evaluate(
      SiteSpec site,
      BoardSpec board,
      Candidate candidate,
      NewLoad load,
      Analysis before,
      DiversityMethodCatalog methods,
      RecordedMccbSettings mccb,
      ProtectionSettings settings) {
    long newId = trialId(site);
    long wayId = candidate.circuitId() != null ? candidate.circuitId() : newId;
    Candidate placed = candidate;
    if (candidate.kind() == CandidateKind.EMPTY_POSITION) {
      SiteSpec trial = withLoad(site, board, candidate, load, null, newId);
      SiteDemand demand = DemandEngine.evaluate(trial, methods);
      double ib = designCurrent(demand, board.id(), wayId);
      placed = proposeDevice(trial, candidate, wayId, ib, load, settings);
    }
    SiteSpec trial = withLoad(site, board, placed, load, placed.device(), newId);
    Analysis after = Analysis.of(trial, methods, mccb, settings);
    BoardDemand boardBefore = before.demand().board(board.id());
    BoardDemand boardAfter = after.demand().board(board.id());
    double ib = designCurrent(after.demand(), board.id(), wayId);
    Double in = placed.device() == null ? null : placed.device().ratedCurrentAmps();
    return new CandidateOutcome(
        placed,
        ib,
        in,
        in == null || in <= 0 ? null : 100.0 * ib / in,
        currents(boardBefore),
        currents(boardAfter),
        boardAfter.incomer().loadingPercent(),
        boardAfter.busbar().loadingPercent(),
        supplyLoading(after.findings()),
        boardAfter.unbalancePercent(),
        newProblems(before.findings(), after.findings(), wayId),
        "",
        blockers(site, board, after, wayId, ib, in));
  }

  /**
   * What the change would take beyond its rating on the way's path to the origin (the way, this
   * board's and every parent board's incomer and busbar, the supply fuse), and any new danger.
   */
  static List<String> blockers(
      SiteSpec site, BoardSpec board, Analysis after, long wayId, double ib, Double in) {
    List<String> blockers = new ArrayList<>();
    if (in != null && in > 0 && ib > in + 1e-9) {
      blockers.add(
          "load its way beyond its rating (Ib " + fixed(ib) + " A > In " + fixed(in) + " A)");
    }
    Map<Long, BoardSpec> byId = new HashMap<>();
    site.boards().forEach(b -> byId.put(b.id(), b));
    java.util.Set<Long> path = new java.util.HashSet<>();
    for (BoardSpec b = board; b != null && path.add(b.id()); ) {
      BoardDemand d = after.demand().board(b.id());
      if (d != null) {
        overloaded(blockers, b.reference() + " incomer", d.incomer());
        overloaded(blockers, b.reference() + " busbar", d.busbar());
        overloaded(blockers, "the supply fuse", d.supplyFuse());
      }
      b = b.parentBoardId() == null ? null : byId.get(b.parentBoardId());
    }
    Double supply = supplyLoading(after.findings());
    if (supply != null
        && supply > 100.0 + 1e-9
        && blockers.stream().noneMatch(x -> x.contains("supply fuse"))) {
      blockers.add(
          "take the supply fuse to "
              + String.format(Locale.ROOT, "%.0f", supply)
              + " % of its rating");
    }
    return blockers;
  }

  private static void overloaded(
      List<String> blockers, String what, com.wayledger.engine.demand.RatingLoading loading) {
    if (loading != null && loading.isOverloaded()) {
      blockers.add(
          "take "
              + what
              + " to "
              + String.format(Locale.ROOT, "%.0f", loading.loadingPercent())
              + " % of its rating");
    }
  }

  private static double designCurrent(SiteDemand demand, long boardId, long circuitId) {
    BoardDemand board = demand.board(boardId);
    return board.circuits().stream()
        .filter(c -> c.circuitId() == circuitId && c.isAssessed())
        .mapToDouble(CircuitDemand::designCurrentAmps)
        .findFirst()
        .orElse(0.0);
  }

  /**
   * A device for a new circuit: the protection engine's proposal where it can make one (it needs
   * the cable, which a new circuit does not have yet), otherwise the smallest standard MCB rating
   * not below Ib, type B, or C or D where the start-up surge would reach the lower edge of B's (or
   * C's) instantaneous band.
   */
  static Candidate proposeDevice(
      SiteSpec trial,
      Candidate candidate,
      long wayId,
      double ib,
      NewLoad load,
      ProtectionSettings settings) {
    int poles = candidate.position() == PhasePosition.THREE_POLE ? 3 : 1;
    com.wayledger.engine.rules.RuleSet rules =
        com.wayledger.engine.rules.RuleSets.of(trial.ruleSetKey());
    DeviceProposal proposal =
        rules.propose(trial, wayId, new CircuitLoading(wayId, ib), settings, java.util.Set.of());
    if (proposal.found()) {
      return withDevice(
          candidate,
          proposal.device(),
          "device proposed by the protection checks for the recorded cable");
    }
    if (rules.usesAwgAndFeet()) {
      // the NEC set proposes no IEC device: the smallest 240.6(A) standard breaker not below Ib
      Integer rating = com.wayledger.engine.nec.OvercurrentLimits.nextStandardRatingAtOrAbove(ib);
      if (rating != null) {
        return withDevice(
            candidate,
            new DeviceSpec(DeviceKind.MCCB, null, (double) rating, poles, null, null, null),
            "breaker "
                + rating
                + " A: the smallest NEC 240.6(A) standard rating not below Ib "
                + fixed(ib)
                + " A; its conductor is to be sized by the circuit's checks");
      }
    }
    double surgeAmps = load.startUpSurgeMultiple() == null ? 0.0 : load.startUpSurgeMultiple() * ib;
    for (double rating : McbStandard.STANDARD_RATINGS_AMPS) {
      if (rating < ib) {
        continue;
      }
      for (TripCurve curve : TripCurve.values()) {
        if (surgeAmps < curve.lowestInstantMultiple() * rating) {
          // a category that needs 30 mA additional protection gets it in the device itself
          // where it goes cannot be told: 30 mA on the safe side, named in the proposal
          ResidualCurrentRules.Rule rcd =
              ResidualCurrentRules.needsLocation(
                      List.of(load.toLoadSpec()), load.location(), rating)
                  ? ResidualCurrentRules.LOCATION_NOT_RECORDED
                  : ResidualCurrentRules.forCircuit(List.of(load.toLoadSpec()), load.location());
          boolean rcbo = rcd != null && rcd.covers(rating);
          DeviceSpec device =
              rcbo
                  ? new DeviceSpec(
                      DeviceKind.RCBO,
                      curve,
                      rating,
                      poles,
                      null,
                      DeviceProposer.PROPOSED_RESIDUAL_MILLIAMPS,
                      com.wayledger.engine.RcdType.A)
                  : new DeviceSpec(DeviceKind.MCB, curve, rating, poles, null, null, null);
          return withDevice(
              candidate,
              device,
              (rcbo
                      ? "RCBO 30 mA type A ("
                          + (rcd == ResidualCurrentRules.LOCATION_NOT_RECORDED
                              ? rcd.words() + ", "
                              : "")
                          + rcd.reference()
                          + ") type "
                      : "MCB type ")
                  + curve
                  + " "
                  + fixed(rating)
                  + " A: the smallest standard rating not below Ib "
                  + fixed(ib)
                  + " A"
                  + (surgeAmps > 0
                      ? " whose instantaneous band starts above the start-up surge of "
                          + fixed(surgeAmps)
                          + " A"
                      : "")
                  + ". The cable must be sized for it (Iz ≥ In, voltage drop, Zs)"
                  + " and the breaking capacity chosen for the fault level at the board");
        }
      }
    }
    return withDevice(
        candidate,
        null,
        "no standard MCB up to 125 A fits Ib "
            + fixed(ib)
            + " A: a moulded-case breaker and a designed circuit are needed");
  }

  private static Candidate withDevice(Candidate candidate, DeviceSpec device, String note) {
    return new Candidate(
        candidate.boardId(),
        candidate.boardReference(),
        candidate.kind(),
        candidate.wayNumber(),
        candidate.position(),
        candidate.circuitId(),
        candidate.circuitDescription(),
        device,
        true,
        note,
        candidate.words());
  }

  private static Map<Phase, Double> currents(BoardDemand board) {
    Map<Phase, Double> amps = new EnumMap<>(Phase.class);
    for (PhaseDemand phase : board.phases()) {
      amps.put(phase.phase(), phase.currentAmps());
    }
    return amps;
  }

  private static Double supplyLoading(SiteFindings findings) {
    return findings.siteFindings().stream()
        .filter(
            f -> f.check() == CheckKind.SUPPLY_FUSE_OVERLOAD && f.verdict() != Verdict.NOT_ASSESSED)
        .findFirst()
        .map(f -> 100.0 * f.value("largest phase current") / f.value("supply fuse rating"))
        .orElse(null);
  }

  /**
   * Danger and warning findings after the change that were not there before at that grade or worse;
   * a finding is identified by where it is (site, board, circuit, and the way for selectivity) and
   * its check.
   */
  static List<Finding> newProblems(SiteFindings before, SiteFindings after, long changedCircuitId) {
    Map<String, Verdict> was = new HashMap<>();
    index(
        before,
        (key, finding) -> was.merge(key, finding.verdict(), (a, b) -> a.compareTo(b) <= 0 ? a : b));
    List<Finding> added = new ArrayList<>();
    index(
        after,
        (key, finding) -> {
          boolean problem =
              finding.verdict() == Verdict.DANGER || finding.verdict() == Verdict.WARNING;
          Verdict earlier = was.get(key);
          if (problem && (earlier == null || earlier.compareTo(finding.verdict()) > 0)) {
            added.add(finding);
          }
        });
    added.sort(Comparator.comparing(Finding::verdict));
    return added;
  }

  private static void index(
      SiteFindings findings, java.util.function.BiConsumer<String, Finding> each) {
    findings.siteFindings().forEach(f -> each.accept("site:" + f.check(), f));
    for (BoardFindings board : findings.boards()) {
      for (Finding f : board.findings()) {
        String way =
            f.check() == CheckKind.SELECTIVITY
                    && (f.summary().startsWith("way ") || f.summary().startsWith("space "))
                ? f.summary()
                    .substring(
                        0,
                        f.summary().indexOf(':') < 0
                            ? f.summary().length()
                            : f.summary().indexOf(':'))
                : "";
        each.accept("board:" + board.boardId() + ":" + f.check() + ":" + way, f);
      }
      for (CircuitFindings circuit : board.circuits()) {
        circuit
            .findings()
            .forEach(f -> each.accept("circuit:" + circuit.circuitId() + ":" + f.check(), f));
      }
    }
  }

  private static CandidateOutcome withReason(CandidateOutcome o) {
    CandidateOutcome blocked =
        new CandidateOutcome(
            o.candidate(),
            o.designCurrentAmps(),
            o.ratedCurrentAmps(),
            o.wayLoadingPercent(),
            o.phaseCurrentsBeforeAmps(),
            o.phaseCurrentsAfterAmps(),
            o.incomerLoadingPercent(),
            o.busbarLoadingPercent(),
            o.supplyLoadingPercent(),
            o.unbalancePercentAfter(),
            o.newFindings(),
            "",
            withDanger(o));
    return new CandidateOutcome(
        o.candidate(),
        o.designCurrentAmps(),
        o.ratedCurrentAmps(),
        o.wayLoadingPercent(),
        o.phaseCurrentsBeforeAmps(),
        o.phaseCurrentsAfterAmps(),
        o.incomerLoadingPercent(),
        o.busbarLoadingPercent(),
        o.supplyLoadingPercent(),
        o.unbalancePercentAfter(),
        o.newFindings(),
        reason(blocked),
        blocked.blockers());
  }

  private static List<String> withDanger(CandidateOutcome o) {
    if (o.newDangerCount() == 0) {
      return o.blockers();
    }
    List<String> all = new ArrayList<>(o.blockers());
    all.add(
        "add a danger finding ("
            + o.newFindings().stream()
                .filter(f -> f.verdict() == Verdict.DANGER)
                .findFirst()
                .map(Finding::summary)
                .orElse("")
            + ")");
    return all;
  }

  /** One line: where, the way's loading, the worst line after, and what it would set off. */
  static String reason(CandidateOutcome o) {
    Candidate c = o.candidate();
    StringBuilder text = new StringBuilder();
    text.append(
        switch (c.kind()) {
          case SPARE_WAY -> "Spare " + c.words().position() + " " + c.label();
          case SHARED_CIRCUIT -> "Share " + c.label() + " (" + c.circuitDescription() + ")";
          case EMPTY_POSITION -> "New circuit at " + c.label();
        });
    text.append(": Ib ").append(fixed(o.designCurrentAmps())).append(" A");
    if (o.ratedCurrentAmps() != null) {
      text.append(" on In ").append(fixed(o.ratedCurrentAmps())).append(" A");
    }
    Phase worst =
        o.phaseCurrentsAfterAmps().entrySet().stream()
            .max(Map.Entry.comparingByValue())
            .map(Map.Entry::getKey)
            .orElse(null);
    if (worst != null) {
      text.append("; largest line ")
          .append(c.words().line(worst))
          .append(' ')
          .append(fixed(o.largestPhaseAmps()))
          .append(" A");
      if (o.incomerLoadingPercent() != null) {
        text.append(" (")
            .append(String.format(Locale.ROOT, "%.0f", o.incomerLoadingPercent()))
            .append(" % of the incomer)");
      }
    }
    if (o.unbalancePercentAfter() != null) {
      text.append(", unbalance ")
          .append(String.format(Locale.ROOT, "%.1f", o.unbalancePercentAfter()))
          .append(" %");
    }
    if (!o.isAcceptable()) {
      text.append("; not offered: it would ").append(String.join("; ", o.blockers()));
    }
    if (o.isClean()) {
      text.append("; adds no danger or warning finding");
    } else {
      Finding first = o.newFindings().get(0);
      text.append("; would add ")
          .append(o.newDangerCount())
          .append(" danger and ")
          .append(o.newWarningCount())
          .append(" warning finding(s), first: ")
          .append(first.summary());
    }
    return text.toString();
  }

  private static String fixed(double v) {
    return String.format(Locale.ROOT, "%.1f", v);
  }

  /** Demand and protection results of one site, as the stored-site analysis computes them. */
  record Analysis(SiteDemand demand, SiteFindings findings) {

    static Analysis of(
        SiteSpec site,
        DiversityMethodCatalog methods,
        RecordedMccbSettings mccb,
        ProtectionSettings settings) {
      SiteDemand demand = DemandEngine.evaluate(site, methods);
      Map<Long, CircuitLoading> circuits = new HashMap<>();
      Map<Long, BoardLoading> boards = new HashMap<>();
      for (BoardDemand board : demand.boards()) {
        for (CircuitDemand circuit : board.circuits()) {
          circuits.put(
              circuit.circuitId(),
              new CircuitLoading(
                  circuit.circuitId(), circuit.isAssessed() ? circuit.designCurrentAmps() : null));
        }
        Map<Phase, Double> currents = new EnumMap<>(Phase.class);
        board.phases().forEach(p -> currents.put(p.phase(), p.currentAmps()));
        boards.put(
            board.boardId(),
            new BoardLoading(
                board.boardId(),
                currents,
                board.unbalancePercent(),
                board.lines() >= 2 ? board.neutralCurrentAmps() : null));
      }
      return new Analysis(
          demand,
          com.wayledger.engine.rules.RuleSets.of(site.ruleSetKey())
              .check(site, circuits, boards, mccb, settings));
    }
  }
}
