package com.wayledger.engine.protection.fault;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.protection.cable.CableImpedance;
import com.wayledger.engine.protection.cable.ConductorResistance;
import com.wayledger.engine.protection.cable.VoltageDrop;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

/**
 * Walks a site's board tree from the origin and works out each board's {@link BoardFaultLevel}.
 *
 * <p>Ze(board) = Ze(parent, or origin) + (R1+R2) of the submain at operating temperature. The
 * prospective fault current goes the other way: the source impedance U0/Ipf(parent) plus the
 * submain's line resistance at 20 °C (cold, so the current is the largest possible): twice R1 for a
 * single-phase board (line and neutral), R1 once for a three-phase board (per-phase impedance of a
 * symmetrical fault). A board with no parent and no submain cable is taken to be at the origin.
 */
public final class FaultLevels {

  private final SiteSpec site;
  private final Map<Long, BoardSpec> boardsById = new LinkedHashMap<>();
  private final Map<Long, Double> boardCurrentAmps;
  private final Map<Long, Double> neutralCurrentAmps;
  private final Map<Long, BoardFaultLevel> done = new HashMap<>();
  private final Set<Long> visiting = new HashSet<>();

  private FaultLevels(
      SiteSpec site, Map<Long, Double> boardCurrentAmps, Map<Long, Double> neutralCurrentAmps) {
    this.site = site;
    this.boardCurrentAmps = boardCurrentAmps;
    this.neutralCurrentAmps = neutralCurrentAmps;
    site.boards().forEach(b -> boardsById.put(b.id(), b));
  }

  /**
   * Fault levels of every board of the site.
   *
   * @param boardCurrentAmps each board's largest phase design current, A, for the submain voltage
   *     drop; a board absent from the map has its voltage drop (and its sub-boards') reported
   *     missing
   */
  public static Map<Long, BoardFaultLevel> of(SiteSpec site, Map<Long, Double> boardCurrentAmps) {
    return of(site, boardCurrentAmps, Map.of());
  }

  /**
   * As {@link #of(SiteSpec, Map)}, with each three-phase board's neutral current, A: a submain to
   * an unbalanced board then adds the neutral's share to the line-to-neutral drop. A three-phase
   * board absent from this map is taken as balanced.
   */
  public static Map<Long, BoardFaultLevel> of(
      SiteSpec site, Map<Long, Double> boardCurrentAmps, Map<Long, Double> neutralCurrentAmps) {
    FaultLevels walk = new FaultLevels(site, boardCurrentAmps, neutralCurrentAmps);
    Map<Long, BoardFaultLevel> result = new LinkedHashMap<>();
    for (BoardSpec board : site.boards()) {
      result.put(board.id(), walk.levelOf(board));
    }
    return result;
  }

  private BoardFaultLevel levelOf(BoardSpec board) {
    BoardFaultLevel known = done.get(board.id());
    if (known != null) {
      return known;
    }
    if (!visiting.add(board.id())) {
      String noun = com.wayledger.engine.PositionWords.of(site, board).board();
      String loop =
          "a " + noun + " tree without loops (" + noun + " " + board.reference() + " feeds itself)";
      return new BoardFaultLevel(
          board.id(),
          SourcedValue.missing(loop),
          SourcedValue.missing(loop),
          SourcedValue.missing(loop),
          null,
          null);
    }
    BoardFaultLevel level = compute(board);
    visiting.remove(board.id());
    done.put(board.id(), level);
    return level;
  }

  private BoardFaultLevel compute(BoardSpec board) {
    SupplySpec supply = site.supply();
    double u0 = supply.nominalVoltageToEarthVolts();
    BoardSpec parent = board.parentBoardId() == null ? null : boardsById.get(board.parentBoardId());
    CircuitSpec feedingWay = parent == null ? null : feedingWay(parent, board.id());
    CableSpec submain =
        board.submainCable() != null
            ? board.submainCable()
            : feedingWay == null ? null : feedingWay.cable();
    boolean atOrigin = board.parentBoardId() == null && submain == null;

    SourcedValue upstreamZe;
    SourcedValue upstreamKa;
    SourcedValue upstreamDrop;
    Double upstreamResidual;
    java.util.List<String> assumptions = new java.util.ArrayList<>();
    java.util.List<String> dropNotes = new java.util.ArrayList<>();
    if (board.parentBoardId() == null) {
      upstreamZe =
          supply.externalLoopImpedanceOhms() == null
              ? SourcedValue.missing("Ze at the origin")
              : SourcedValue.calculated(supply.externalLoopImpedanceOhms());
      upstreamKa =
          supply.prospectiveFaultCurrentKiloAmps() == null
              ? SourcedValue.missing("prospective fault current at the origin")
              : SourcedValue.calculated(supply.prospectiveFaultCurrentKiloAmps());
      upstreamDrop = SourcedValue.calculated(0.0);
      upstreamResidual = null;
    } else if (parent == null) {
      String why =
          "parent "
              + com.wayledger.engine.PositionWords.of(site, board).board()
              + " "
              + board.parentBoardId()
              + " of "
              + board.reference()
              + " (not on the site)";
      upstreamZe = SourcedValue.missing(why);
      upstreamKa = SourcedValue.missing(why);
      upstreamDrop = SourcedValue.missing(why);
      upstreamResidual = null;
    } else {
      BoardFaultLevel p = levelOf(parent);
      assumptions.addAll(p.assumptions());
      dropNotes.addAll(p.dropNotes());
      upstreamZe = p.externalLoopImpedanceOhms();
      upstreamKa = p.faultCurrentKiloAmps();
      upstreamDrop = p.voltageDropFromOriginPercent();
      upstreamResidual =
          smaller(
              p.upstreamResidualMilliAmps(),
              residualOf(feedingWay == null ? null : feedingWay.device()));
    }

    String submainName = "submain to " + board.reference();
    if (!atOrigin && submain != null && submain.insulation() == null) {
      assumptions.add(submainName + ": " + ConductorResistance.ASSUMED_HOT_INSULATION);
    }
    SourcedValue ze;
    if (board.measuredExternalLoopImpedanceOhms() != null) {
      ze = SourcedValue.measured(board.measuredExternalLoopImpedanceOhms());
    } else if (atOrigin) {
      ze = upstreamZe;
    } else if (!upstreamZe.isKnown()) {
      ze = upstreamZe;
    } else {
      ze =
          SourcedValue.calculated(
              prefix(submainName, CableImpedance.r1PlusR2Ohms(submain))
                  .map(r -> upstreamZe.value() + r));
    }

    SourcedValue ka;
    if (board.measuredFaultCurrentKiloAmps() != null) {
      ka = SourcedValue.measured(board.measuredFaultCurrentKiloAmps());
    } else if (atOrigin || !upstreamKa.isKnown()) {
      ka = upstreamKa;
    } else {
      double sourceOhms = u0 / (upstreamKa.value() * 1000.0);
      double conductors = board.isThreePhase() ? 1.0 : 2.0;
      ka =
          SourcedValue.calculated(
              prefix(submainName, CableImpedance.lineOhmsCold(submain))
                  .map(r1 -> u0 / (sourceOhms + conductors * r1) / 1000.0));
    }

    SourcedValue drop;
    if (atOrigin || !upstreamDrop.isKnown()) {
      drop = upstreamDrop;
    } else {
      drop =
          SourcedValue.calculated(
              prefix(submainName, submainDropPercent(board, submain, u0))
                  .map(d -> upstreamDrop.value() + d));
    }

    DeviceSpec upstreamDevice =
        board.incomer() != null ? board.incomer() : feedingWay == null ? null : feedingWay.device();
    Double residual = smaller(upstreamResidual, residualOf(board.incomer()));
    Double neutral = neutralCurrentAmps.get(board.id());
    Double amps = boardCurrentAmps.get(board.id());
    if (!atOrigin
        && drop.isKnown()
        && board.isThreePhase()
        && neutral != null
        && amps != null
        && neutral > NEUTRAL_NEGLIGIBLE_AMPS) {
      dropNotes.add(
          submainName
              + " unbalanced: line-to-neutral drop (IL "
              + String.format(java.util.Locale.ROOT, "%.1f", amps)
              + " A + IN "
              + String.format(java.util.Locale.ROOT, "%.1f", neutral)
              + " A)·z·L");
    }
    return new BoardFaultLevel(
        board.id(), ze, ka, drop, upstreamDevice, residual, assumptions, dropNotes);
  }

  private Resolved<Double> submainDropPercent(BoardSpec board, CableSpec submain, double u0) {
    Double amps = boardCurrentAmps.get(board.id());
    if (amps == null) {
      return Resolved.missing(
          "design current of "
              + com.wayledger.engine.PositionWords.of(site, board).board()
              + " "
              + board.reference());
    }
    if (submain == null) {
      return Resolved.missing("cable");
    }
    if (submain.lengthMetres() == null) {
      return Resolved.missing("cable length");
    }
    boolean three = board.isThreePhase();
    double neutral = neutralCurrentAmps.getOrDefault(board.id(), 0.0);
    if (three && neutral > NEUTRAL_NEGLIGIBLE_AMPS) {
      // unbalanced: line-to-neutral drop of the heaviest line, go on its line conductor and return
      // on the neutral, each conductor at half the single-phase mV/A/m: (IL + IN)·z·L. Adding the
      // magnitudes bounds the phasor sum IL·Z + IN·Z from above (the safe side).
      return VoltageDrop.milliVoltsPerAmpMetre(
              submain.material(), submain.lineCsaSquareMillimetres(), submain.insulation(), false)
          .map(mv -> VoltageDrop.percent(mv / 2.0, amps + neutral, submain.lengthMetres(), u0));
    }
    return VoltageDrop.milliVoltsPerAmpMetre(
            submain.material(), submain.lineCsaSquareMillimetres(), submain.insulation(), three)
        .map(
            mv ->
                VoltageDrop.percent(
                    mv, amps, submain.lengthMetres(), three ? Math.sqrt(3.0) * u0 : u0));
  }

  /** A neutral current below this is taken as a balanced board (√3 formula), A. */
  static final double NEUTRAL_NEGLIGIBLE_AMPS = 0.01;

  private static CircuitSpec feedingWay(BoardSpec parent, long boardId) {
    for (CircuitSpec c : parent.circuits()) {
      if (c.feedsBoardId() != null && c.feedsBoardId() == boardId) {
        return c;
      }
    }
    return null;
  }

  private static Resolved<Double> prefix(String where, Resolved<Double> r) {
    return r.isKnown() ? r : Resolved.missing(r.missing() + " of the " + where);
  }

  /** IΔn of a residual-current device, mA; null for anything else. */
  static Double residualOf(DeviceSpec device) {
    if (device == null || device.kind() == null || !device.kind().isResidualCurrent()) {
      return null;
    }
    return device.residualCurrentMilliAmps();
  }

  private static Double smaller(Double a, Double b) {
    if (a == null) {
      return b;
    }
    return b == null ? a : Math.min(a, b);
  }
}
