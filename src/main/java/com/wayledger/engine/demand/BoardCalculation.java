package com.wayledger.engine.demand;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.PositionWords;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * Demand of one board. Diversity reaches the phases line by line: each rule gives every load line
 * its own demand, and the line keeps its power factor, so the per-phase sums add up to the board
 * total exactly.
 */
final class BoardCalculation {

  private static final Comparator<CircuitSpec> WAY_ORDER =
      Comparator.comparingInt(CircuitSpec::wayNumber)
          .thenComparing(c -> c.position() == null ? -1 : c.position().ordinal())
          .thenComparingLong(CircuitSpec::id);

  private BoardCalculation() {}

  record Context(
      double nominalVoltageVolts,
      DiversityMethod method,
      DwellingParameters dwelling,
      DemandSettings settings,
      SupplySpec supply,
      Map<Long, BoardDemand> evaluatedSubBoards,
      List<String> notes,
      PositionWords words) {}

  static BoardDemand evaluate(BoardSpec board, Context context) {
    double u0 = context.nominalVoltageVolts();
    DiversityMethod method = context.method();
    SupplySystem system = systemOf(board, context);
    int boardLines = system.lineCount(board.phases());
    List<String> notAssessed = new ArrayList<>();
    List<String> notes = new ArrayList<>(context.notes());
    PositionWords words = context.words();

    CircuitSpec[] circuits = board.circuits().toArray(new CircuitSpec[0]);
    Arrays.sort(circuits, WAY_ORDER);
    int n = circuits.length;
    PhasePosition[] position = new PhasePosition[n];
    String[] reason = new String[n];
    int[] firstLine = new int[n + 1];
    BoardDemand[] subBoard = new BoardDemand[n];
    LoadLines lines = new LoadLines();
    java.util.Set<Long> carried = new java.util.HashSet<>();

    for (int c = 0; c < n; c++) {
      CircuitSpec circuit = circuits[c];
      firstLine[c] = lines.size;
      boolean nothingFed = circuit.loads().isEmpty() && circuit.feedsBoardId() == null;
      if (nothingFed && (circuit.status() != WayStatus.IN_USE || circuit.position() == null)) {
        position[c] = effectivePosition(circuit.position(), boardLines);
        continue;
      }
      if (circuit.position() == null) {
        reason[c] =
            "not assessed — missing position (line "
                + words.linesInWords(boardLines == 2 ? 2 : 3).replace(" and ", ", ")
                + " or "
                + (boardLines == 2 ? "two-pole" : "three-pole")
                + ")";
      } else if (boardLines == 1 && circuit.position() == PhasePosition.THREE_POLE) {
        reason[c] = "not assessed — three-pole position on a single-phase " + words.board();
      } else if (boardLines == 1 && circuit.position().isLineToLine()) {
        reason[c] = "not assessed — two-pole position on a single-phase two-wire " + words.board();
      } else if (boardLines == 2 && !fitsSplitPhase(circuit.position())) {
        reason[c] =
            "not assessed — position "
                + words.lines(circuit.position())
                + (system.isSplitPhase() ? " on a split-phase " : " on a single-phase three-wire ")
                + words.board()
                + " (lines "
                + words.linesInWords(2)
                + " only)";
      }
      position[c] = reason[c] == null ? effectivePosition(circuit.position(), boardLines) : null;
      double perAmp = LinePhasors.voltAmperesPerAmp(system, position[c], u0);
      if (reason[c] == null) {
        for (LoadSpec load : circuit.loads()) {
          ConnectedLoad connected = ConnectedLoad.ofPerAmp(load, perAmp);
          if (!connected.isAssessed()) {
            reason[c] =
                "not assessed — load \""
                    + load.description()
                    + "\": missing or invalid "
                    + connected.missingInput();
            break;
          }
        }
      }
      if (reason[c] != null) {
        // the line goes with the place unless the position itself is what is wrong
        PhasePosition named = position[c] == null ? null : circuit.position();
        notAssessed.add(
            words.place(circuit.wayNumber(), named)
                + " ("
                + circuit.description()
                + "): "
                + reason[c]);
        continue;
      }
      for (LoadSpec load : circuit.loads()) {
        ConnectedLoad connected = ConnectedLoad.ofPerAmp(load, perAmp);
        lines.add(
            c, load.category(), load.quantity(), connected.activeWatts(), connected.reactiveVars());
      }
      if (circuit.feedsBoardId() != null) {
        if (!carried.add(circuit.feedsBoardId())) {
          notes.add(
              words.place(circuit.wayNumber(), circuit.position())
                  + " feeds "
                  + words.subBoard()
                  + " #"
                  + circuit.feedsBoardId()
                  + " like an earlier "
                  + words.position()
                  + "; its demand is carried once, by the earlier "
                  + words.position());
          continue;
        }
        subBoard[c] = context.evaluatedSubBoards().get(circuit.feedsBoardId());
        if (subBoard[c] == null) {
          notAssessed.add(
              words.place(circuit.wayNumber(), circuit.position())
                  + ": the demand of "
                  + words.subBoard()
                  + " #"
                  + circuit.feedsBoardId()
                  + " is not available and is not included");
        }
      }
    }
    firstLine[n] = lines.size;
    int circuitLineCount = lines.size;

    List<CategoryGroup> groups = method.groups();
    int[] groupOfCategory = new int[LoadCategory.values().length];
    Arrays.fill(groupOfCategory, -1);
    for (int g = groups.size() - 1; g >= 0; g--) {
      for (LoadCategory category : groups.get(g).categories()) {
        groupOfCategory[category.ordinal()] = g;
      }
    }
    double[] groupConnected = new double[groups.size()];
    double[] groupBasis = new double[groups.size()];
    double[] groupDemand = new double[groups.size()];
    String[] groupReason = new String[groups.size()];
    boolean[] consumed = new boolean[circuitLineCount];
    int[] members = new int[Math.max(1, circuitLineCount + 1)];

    // within-circuit rules shape each way's own design current
    double[] designWatts = new double[n];
    double[] designVars = new double[n];
    for (int g = 0; g < groups.size(); g++) {
      CategoryGroup group = groups.get(g);
      if (group.scope() != RuleScope.WITHIN_CIRCUIT) {
        continue;
      }
      for (int c = 0; c < n; c++) {
        int count = 0;
        for (int i = firstLine[c]; i < firstLine[c + 1]; i++) {
          if (groupOfCategory[lines.category[i].ordinal()] == g) {
            members[count++] = i;
          }
        }
        if (count == 0) {
          continue;
        }
        double voltAmperesPerAmp = LinePhasors.voltAmperesPerAmp(system, position[c], u0);
        double connected = sumApparent(lines, members, count);
        double demand =
            GroupDemandCalculator.apply(group.rule(), lines, members, count, voltAmperesPerAmp);
        for (int m = 0; m < count; m++) {
          consumed[members[m]] = true;
        }
        if (group.rule() instanceof DiversityRule.FirstAmps firstAmps
            && firstAmps.socketAdderAmps() > 0) {
          double[] socket =
              socketAllowance(
                  lines,
                  firstLine[c],
                  firstLine[c + 1],
                  consumed,
                  firstAmps.socketAdderAmps() * voltAmperesPerAmp);
          connected += socket[0];
          demand += socket[1];
        }
        groupConnected[g] += connected;
        groupBasis[g] += connected;
        groupDemand[g] += demand;
      }
    }
    for (int c = 0; c < n; c++) {
      for (int i = firstLine[c]; i < firstLine[c + 1]; i++) {
        double factor = consumed[i] ? factorOf(lines, i) : 1.0;
        designWatts[c] += lines.activeWatts[i] * factor;
        designVars[c] += lines.reactiveVars[i] * factor;
      }
    }

    // across-circuit rules shape the incomer demand
    double allowance = 0.0;
    for (int g = 0; g < groups.size(); g++) {
      CategoryGroup group = groups.get(g);
      if (group.scope() != RuleScope.ACROSS_CIRCUITS) {
        continue;
      }
      int count = 0;
      for (int i = 0; i < circuitLineCount; i++) {
        if (!consumed[i] && groupOfCategory[lines.category[i].ordinal()] == g) {
          members[count++] = i;
        }
      }
      double connected = sumApparent(lines, members, count);
      groupConnected[g] = connected;
      DwellingBasis basis = group.dwellingBasis();
      if (basis == null) {
        groupBasis[g] = connected;
        groupDemand[g] =
            GroupDemandCalculator.apply(group.rule(), lines, members, count, u0 * boardLines);
        continue;
      }
      String missing = missingDwellingInputs(context.dwelling());
      if (missing != null) {
        groupReason[g] = "not assessed — missing " + missing + "; loads taken at 100 %";
        notAssessed.add(group.label() + ": " + groupReason[g]);
        groupBasis[g] = connected;
        groupDemand[g] =
            GroupDemandCalculator.apply(
                new DiversityRule.NoDiversity(), lines, members, count, u0 * boardLines);
        continue;
      }
      DwellingParameters dwelling = context.dwelling();
      double dwellingLoad =
          dwelling.floorAreaSquareFeet() * basis.voltAmperesPerSquareFoot()
              + (dwelling.smallApplianceCircuits() + dwelling.laundryCircuits())
                  * basis.voltAmperesPerApplianceCircuit();
      int[] replaced = new int[count];
      int replacedCount = 0;
      int kept = 0;
      double replacedApparent = 0.0;
      for (int m = 0; m < count; m++) {
        int i = members[m];
        if (basis.replacedCategories().contains(lines.category[i])) {
          replaced[replacedCount++] = i;
          replacedApparent += lines.apparentVoltAmperes[i];
        } else {
          members[kept++] = i;
        }
      }
      int dwellingLine = lines.add(-1, LoadCategory.LIGHTING, 1, dwellingLoad, 0.0);
      members[kept++] = dwellingLine;
      groupBasis[g] = sumApparent(lines, members, kept);
      groupDemand[g] =
          GroupDemandCalculator.apply(group.rule(), lines, members, kept, u0 * boardLines);
      double dwellingDemand = lines.demandVoltAmperes[dwellingLine];
      if (replacedApparent > 0) {
        for (int r = 0; r < replacedCount; r++) {
          int i = replaced[r];
          lines.demandVoltAmperes[i] =
              dwellingDemand * lines.apparentVoltAmperes[i] / replacedApparent;
        }
      } else {
        allowance += dwellingDemand;
      }
      if (members.length < lines.size + 1) {
        members = Arrays.copyOf(members, lines.size + 1);
      }
    }

    double[] phaseWatts = new double[3];
    double[] phaseVars = new double[3];
    double connectedWatts = 0.0;
    double connectedVars = 0.0;
    List<CircuitDemand> circuitResults = new ArrayList<>(n);
    for (int c = 0; c < n; c++) {
      CircuitSpec circuit = circuits[c];
      if (reason[c] != null) {
        circuitResults.add(
            new CircuitDemand(
                circuit.id(),
                circuit.wayNumber(),
                circuit.description(),
                position[c],
                reason[c],
                0,
                0,
                0,
                0,
                0,
                0,
                circuit.feedsBoardId(),
                0));
        continue;
      }
      double ownWatts = 0.0;
      double ownVars = 0.0;
      double demandWatts = 0.0;
      double demandVars = 0.0;
      for (int i = firstLine[c]; i < firstLine[c + 1]; i++) {
        ownWatts += lines.activeWatts[i];
        ownVars += lines.reactiveVars[i];
        double factor = factorOf(lines, i);
        demandWatts += lines.activeWatts[i] * factor;
        demandVars += lines.reactiveVars[i] * factor;
      }
      LinePhasors.add(system, position[c], demandWatts, demandVars, phaseWatts, phaseVars);
      double subBoardApparent = 0.0;
      BoardDemand child = subBoard[c];
      double perLineVolts = LinePhasors.voltAmperesPerAmp(system, position[c], u0);
      // the sub-board's lines land on the lines the feeding position connects them to, in order
      // (a 120/208 V panel on B–C of a 208Y/120 V one loads B and C), each with its own current
      List<Phase> fed = position[c] == null ? List.of() : linesOf(position[c]);
      boolean lineByLine = child != null && fed.size() > 1 && child.phases().size() == fed.size();
      if (child != null && fed.size() > 1 && !lineByLine) {
        notes.add(
            words.place(circuit.wayNumber(), circuit.position())
                + " feeds a "
                + words.board()
                + " of "
                + child.phases().size()
                + " line(s) from "
                + fed.size()
                + " poles; its demand is taken as one load in that position, not line by line");
      }
      // a multi-pole feeder's Ib is its heaviest line, not the average of its lines
      Double heaviestLineAmps = null;
      if (lineByLine) {
        double k = child.coincidenceFactor();
        double[] ownWatts3 = new double[3];
        double[] ownVars3 = new double[3];
        LinePhasors.add(system, position[c], designWatts[c], designVars[c], ownWatts3, ownVars3);
        double heaviest = 0.0;
        for (int j = 0; j < fed.size(); j++) {
          PhaseDemand line = child.phases().get(j);
          int to = fed.get(j).ordinal();
          double lineWatts = ownWatts3[to] + line.demandWatts() * k;
          double lineVars = ownVars3[to] + line.demandVars() * k;
          heaviest = Math.max(heaviest, Math.hypot(lineWatts, lineVars) / u0);
        }
        heaviestLineAmps = heaviest;
      }
      if (child != null) {
        double k = child.coincidenceFactor();
        double childWatts = child.demandWatts() * k;
        double childVars = child.demandVars() * k;
        subBoardApparent = Math.hypot(childWatts, childVars);
        ownWatts += child.connectedWatts();
        ownVars += child.connectedVars();
        demandWatts += childWatts;
        demandVars += childVars;
        designWatts[c] += childWatts;
        designVars[c] += childVars;
        if (lineByLine) {
          for (int j = 0; j < fed.size(); j++) {
            PhaseDemand line = child.phases().get(j);
            phaseWatts[fed.get(j).ordinal()] += line.demandWatts() * k;
            phaseVars[fed.get(j).ordinal()] += line.demandVars() * k;
          }
        } else {
          LinePhasors.add(system, position[c], childWatts, childVars, phaseWatts, phaseVars);
        }
      }
      connectedWatts += ownWatts;
      connectedVars += ownVars;
      circuitResults.add(
          new CircuitDemand(
              circuit.id(),
              circuit.wayNumber(),
              circuit.description(),
              position[c],
              null,
              ownWatts,
              ownVars,
              Math.hypot(ownWatts, ownVars) / perLineVolts,
              heaviestLineAmps != null
                  ? heaviestLineAmps
                  : Math.hypot(designWatts[c], designVars[c]) / perLineVolts,
              demandWatts,
              demandVars,
              circuit.feedsBoardId(),
              subBoardApparent));
    }
    if (allowance > 0) {
      for (int k = 0; k < boardLines; k++) {
        phaseWatts[k] += allowance / boardLines;
      }
      notes.add(
          "dwelling unit load of "
              + Math.round(allowance)
              + " VA after diversity carried by no circuit; spread evenly over the lines at unity power factor");
    }
    return assemble(
        board,
        context,
        u0,
        boardLines,
        circuitResults,
        groups,
        groupConnected,
        groupBasis,
        groupDemand,
        groupReason,
        phaseWatts,
        phaseVars,
        connectedWatts,
        connectedVars,
        allowance,
        notAssessed,
        notes);
  }

  private static BoardDemand assemble(
      BoardSpec board,
      Context context,
      double u0,
      int boardLines,
      List<CircuitDemand> circuitResults,
      List<CategoryGroup> groups,
      double[] groupConnected,
      double[] groupBasis,
      double[] groupDemand,
      String[] groupReason,
      double[] phaseWatts,
      double[] phaseVars,
      double connectedWatts,
      double connectedVars,
      double allowance,
      List<String> notAssessed,
      List<String> notes) {
    List<GroupDemand> groupResults = new ArrayList<>(groups.size());
    for (int g = 0; g < groups.size(); g++) {
      CategoryGroup group = groups.get(g);
      groupResults.add(
          new GroupDemand(
              group.label(),
              group.categories(),
              group.scope(),
              group.rule().describe(),
              groupConnected[g],
              groupBasis[g],
              groupDemand[g],
              groupReason[g]));
    }
    // the rating that actually trips: Ir for a moulded-case incomer with its setting recorded
    Double incomerRating = board.incomerTripRatingAmps();
    Phase[] phases = Phase.values();
    List<PhaseDemand> phaseResults = new ArrayList<>(boardLines);
    SupplySystem system = systemOf(board, context);
    // connected per line lands as the demand does: a two-pole circuit puts S/2 on each line of a
    // split-phase board and S/√3 at ∓30° on two lines of a wye, not S on both (LinePhasors)
    double[] connectedLineWatts = new double[3];
    double[] connectedLineVars = new double[3];
    for (CircuitDemand circuit : circuitResults) {
      if (!circuit.isAssessed() || circuit.position() == null) {
        continue;
      }
      LinePhasors.add(
          system,
          circuit.position(),
          circuit.connectedWatts(),
          circuit.connectedVars(),
          connectedLineWatts,
          connectedLineVars);
    }
    double[] currents = new double[3];
    double highest = 0.0;
    double totalWatts = 0.0;
    double totalVars = 0.0;
    for (int k = 0; k < boardLines; k++) {
      currents[k] = Math.hypot(phaseWatts[k], phaseVars[k]) / u0;
      highest = Math.max(highest, currents[k]);
      totalWatts += phaseWatts[k];
      totalVars += phaseVars[k];
      Double headroomAmps = incomerRating == null ? null : incomerRating - currents[k];
      Double headroomKilowatts = headroomAmps == null ? null : headroomAmps * u0 / 1000.0;
      Double loadingPercent =
          incomerRating == null || !(incomerRating > 0)
              ? null
              : 100.0 * currents[k] / incomerRating;
      phaseResults.add(
          new PhaseDemand(
              phases[k],
              phaseWatts[k],
              phaseVars[k],
              currents[k],
              headroomAmps,
              headroomKilowatts,
              loadingPercent,
              Math.hypot(connectedLineWatts[k], connectedLineVars[k]) / u0));
    }
    double neutral =
        boardLines >= 2
            ? LinePhasors.neutralCurrentAmps(system, boardLines, phaseWatts, phaseVars, u0)
            : currents[0];
    Double unbalance = null;
    if (boardLines == 3) {
      unbalance = PhaseCurrents.unbalancePercent(currents[0], currents[1], currents[2]);
    } else if (boardLines == 2) {
      unbalance = PhaseCurrents.unbalancePercent(currents[0], currents[1]);
    }
    double limit =
        board.unbalanceLimitPercent() > 0
            ? board.unbalanceLimitPercent()
            : context.settings().unbalanceLimitPercent();
    double coincidence = board.coincidenceFactor();
    if (!(coincidence > 0 && coincidence <= 1)) {
      notes.add(
          "coincidence factor "
              + coincidence
              + " is outside (0, 1]; "
              + context.settings().coincidenceFactor()
              + " used");
      coincidence = context.settings().coincidenceFactor();
    }
    RatingLoading incomer =
        board.incomer() == null
            ? RatingLoading.notApplicable("incomer", "not assessed — missing incomer")
            : RatingLoading.of(
                board.incomerOverloadSettingAmps() != null ? "incomer (Ir)" : "incomer",
                incomerRating,
                highest);
    RatingLoading busbar = RatingLoading.of("busbar", board.busbarRatingAmps(), highest);
    RatingLoading supplyFuse;
    if (board.parentBoardId() != null) {
      supplyFuse =
          RatingLoading.notApplicable(
              "supply fuse",
              "not applicable — fed from a "
                  + context.words().position()
                  + " of its parent "
                  + context.words().board());
    } else if (context.supply() == null) {
      supplyFuse = RatingLoading.notApplicable("supply fuse", "not assessed — missing supply");
    } else {
      supplyFuse =
          RatingLoading.of("supply fuse", context.supply().supplyFuseRatingAmps(), highest);
    }
    DiversityMethod method = context.method();
    return new BoardDemand(
        board.id(),
        board.reference(),
        boardLines,
        u0,
        method.key(),
        method.name(),
        method.source(),
        coincidence,
        circuitResults,
        groupResults,
        phaseResults,
        connectedWatts,
        connectedVars,
        totalWatts,
        totalVars,
        allowance,
        neutral,
        unbalance,
        limit,
        incomer,
        busbar,
        supplyFuse,
        notAssessed,
        notes,
        system);
  }

  /** The board's own supply system, else the site's (the IEC wye when no supply is known). */
  private static SupplySystem systemOf(BoardSpec board, Context context) {
    return board.systemOn(
        context.supply() == null ? SupplySystem.IEC_WYE : context.supply().system());
  }

  /**
   * The parent's lines a position connects a sub-board's lines to, in the sub-board's line order: a
   * three-pole position L1, L2, L3; a two-pole one its first line then its second; a single-pole
   * one its line.
   */
  private static List<Phase> linesOf(PhasePosition position) {
    if (position == PhasePosition.THREE_POLE) {
      return List.of(Phase.values());
    }
    if (position.isLineToLine()) {
      return List.of(position.fromLine(), position.toLine());
    }
    return List.of(position.phases().iterator().next());
  }

  private static PhasePosition effectivePosition(PhasePosition position, int boardLines) {
    if (position == null) {
      return null;
    }
    return boardLines == 1 && position.isSinglePole() ? PhasePosition.L1 : position;
  }

  /** Positions a split-phase board can hold: A, B, or the two-pole A–B. */
  private static boolean fitsSplitPhase(PhasePosition position) {
    return position == PhasePosition.L1
        || position == PhasePosition.L2
        || position == PhasePosition.L1_L2;
  }

  /** Replaces a cooker circuit's socket-outlet loads by the allowance, never more than they are. */
  private static double[] socketAllowance(
      LoadLines lines, int from, int to, boolean[] consumed, double allowanceVoltAmperes) {
    double socketApparent = 0.0;
    for (int i = from; i < to; i++) {
      if (!consumed[i] && lines.category[i] == LoadCategory.SOCKET_OUTLETS) {
        socketApparent += lines.apparentVoltAmperes[i];
      }
    }
    if (socketApparent == 0) {
      return new double[] {0.0, 0.0};
    }
    double demand = Math.min(allowanceVoltAmperes, socketApparent);
    for (int i = from; i < to; i++) {
      if (!consumed[i] && lines.category[i] == LoadCategory.SOCKET_OUTLETS) {
        lines.demandVoltAmperes[i] = demand * lines.apparentVoltAmperes[i] / socketApparent;
        consumed[i] = true;
      }
    }
    return new double[] {socketApparent, demand};
  }

  private static double factorOf(LoadLines lines, int i) {
    double apparent = lines.apparentVoltAmperes[i];
    return apparent > 0 ? lines.demandVoltAmperes[i] / apparent : 0.0;
  }

  private static double sumApparent(LoadLines lines, int[] members, int count) {
    double sum = 0.0;
    for (int m = 0; m < count; m++) {
      sum += lines.apparentVoltAmperes[members[m]];
    }
    return sum;
  }

  private static String missingDwellingInputs(DwellingParameters dwelling) {
    List<String> missing = new ArrayList<>(3);
    if (dwelling == null
        || dwelling.floorAreaSquareFeet() == null
        || !(dwelling.floorAreaSquareFeet() >= 0)) {
      missing.add("floor area");
    }
    if (dwelling == null
        || dwelling.smallApplianceCircuits() == null
        || dwelling.smallApplianceCircuits() < 0) {
      missing.add("number of small-appliance circuits");
    }
    if (dwelling == null || dwelling.laundryCircuits() == null || dwelling.laundryCircuits() < 0) {
      missing.add("number of laundry circuits");
    }
    return missing.isEmpty() ? null : String.join(", ", missing);
  }
}
