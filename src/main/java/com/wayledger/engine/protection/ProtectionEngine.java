package com.wayledger.engine.protection;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.Phase;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.check.BoardLoadCheck;
import com.wayledger.engine.protection.check.SelectivityCheck;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.fault.BoardFaultLevel;
import com.wayledger.engine.protection.fault.FaultLevels;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Resolved;
import com.wayledger.engine.protection.result.SourcedValue;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Entry point of the protection and cable checks for a whole site. */
public final class ProtectionEngine {

  private ProtectionEngine() {}

  /**
   * {@link #check(SiteSpec, Map, Map, RecordedMccbSettings, ProtectionSettings)} with no MCCB
   * settings recorded.
   */
  public static SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      ProtectionSettings settings) {
    return check(site, loadingByCircuit, loadingByBoard, RecordedMccbSettings.NONE, settings);
  }

  /**
   * Runs every check on every board and circuit of the site. Never throws on incomplete data: a
   * check that lacks an input returns a {@code NOT_ASSESSED} finding naming it.
   *
   * @param loadingByCircuit design currents by circuit id (from the demand engine); absent = not
   *     known
   * @param loadingByBoard phase currents and unbalance by board id; absent = not known
   * @param mccbSettings MCCB settings recorded outside the schedule
   */
  public static SiteFindings check(
      SiteSpec site,
      Map<Long, CircuitLoading> loadingByCircuit,
      Map<Long, BoardLoading> loadingByBoard,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings) {
    Map<Long, BoardFaultLevel> levels =
        FaultLevels.of(site, boardCurrents(loadingByBoard), neutralCurrents(loadingByBoard));
    List<BoardFindings> boards = new ArrayList<>();
    for (BoardSpec board : site.boards()) {
      BoardFaultLevel level = levels.get(board.id());
      com.wayledger.engine.PositionWords words = com.wayledger.engine.PositionWords.of(site, board);
      List<CircuitFindings> circuits = new ArrayList<>();
      for (CircuitSpec circuit : board.circuits()) {
        if (circuit.status() == WayStatus.EMPTY) {
          continue;
        }
        CircuitLoading loading = loadingByCircuit.get(circuit.id());
        circuits.add(
            CircuitChecks.assess(
                    site.supply(),
                    circuit,
                    level,
                    loading == null ? null : loading.designCurrentAmps(),
                    mccbSettings.byCircuitId().get(circuit.id()),
                    settings)
                .placed(board.reference(), circuit.position(), circuit.description(), words));
      }
      List<Finding> own =
          boardFindings(
              board, level, loadingByBoard.get(board.id()), mccbSettings, settings, words);
      boards.add(new BoardFindings(board.id(), board.reference(), level, own, circuits, words));
    }
    return new SiteFindings(settings, supplyFuse(site, loadingByBoard), boards);
  }

  private static Map<Long, Double> neutralCurrents(Map<Long, BoardLoading> loadingByBoard) {
    Map<Long, Double> amps = new HashMap<>();
    loadingByBoard.forEach(
        (id, l) -> {
          Double neutral = l.neutralCurrentAmps();
          if (neutral == null && l.phaseCurrentsAmps().size() == 3) {
            // not worked out: the phasor sum never exceeds the largest line minus the smallest
            // at unity power factor, but with other angles it can reach the largest line — take
            // that bound, unless the lines are equal
            double max =
                l.phaseCurrentsAmps().values().stream().mapToDouble(d -> d).max().orElse(0);
            double min =
                l.phaseCurrentsAmps().values().stream().mapToDouble(d -> d).min().orElse(0);
            neutral = max - min < 1e-9 ? 0.0 : max;
          }
          if (neutral != null) {
            amps.put(id, neutral);
          }
        });
    return amps;
  }

  private static Map<Long, Double> boardCurrents(Map<Long, BoardLoading> loadingByBoard) {
    Map<Long, Double> amps = new HashMap<>();
    loadingByBoard.forEach(
        (id, l) -> {
          Double largest = l.largestPhaseAmps();
          if (largest != null) {
            amps.put(id, largest);
          }
        });
    return amps;
  }

  private static List<Finding> boardFindings(
      BoardSpec board,
      BoardFaultLevel level,
      BoardLoading loading,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings,
      com.wayledger.engine.PositionWords words) {
    List<Finding> findings = new ArrayList<>();
    Double largest = loading == null ? null : loading.largestPhaseAmps();
    String missingLoad =
        "design current of "
            + words.board()
            + " "
            + board.reference()
            + " (from the demand calculation)";

    if (board.incomer() != null && board.incomer().kind() != DeviceKind.RCD) {
      Resolved<DeviceCharacteristic> incomer =
          DeviceCharacteristic.of(
              board.incomer(),
              mccbSettings.incomerByBoardId().get(board.id()),
              settings.mccbInstantaneousMultiple());
      Double rating =
          incomer.isKnown()
              ? Double.valueOf(incomer.value().overloadSettingAmps())
              : board.incomer().ratedCurrentAmps();
      findings.add(
          rated(
              CheckKind.INCOMER_OVERLOAD,
              "incomer",
              largest,
              rating,
              missingLoad,
              "incomer rating",
              BoardLoadCheck.REFERENCE_OVERLOAD,
              words));
    }
    findings.add(
        rated(
            CheckKind.BUSBAR_OVERLOAD,
            "busbar",
            largest,
            board.busbarRatingAmps(),
            missingLoad,
            "busbar rating",
            BoardLoadCheck.REFERENCE_BUSBAR,
            words));
    // unbalance on every board of more than one line: three phases, or the two legs A and B of a
    // 120/240 V (or 120/208 V) panel, over which the demand engine and the balancer take the mean
    int lines = words.system().lineCount(board.phases());
    if (lines >= 2) {
      findings.add(
          loading == null || loading.unbalancePercent() == null
              ? Finding.notAssessed(
                  CheckKind.PHASE_UNBALANCE,
                  BoardLoadCheck.unbalanceOf(words)
                      + " of "
                      + words.board()
                      + " "
                      + board.reference(),
                  BoardLoadCheck.REFERENCE_UNBALANCE)
              : BoardLoadCheck.unbalance(
                  loading.unbalancePercent(), board.unbalanceLimitPercent(), words, lines));
    }
    findings.addAll(selectivity(board, level, mccbSettings, settings, words));
    return findings;
  }

  private static Finding rated(
      CheckKind check,
      String what,
      Double largest,
      Double rating,
      String missingLoad,
      String missingRating,
      String reference,
      com.wayledger.engine.PositionWords words) {
    if (rating == null) {
      return Finding.notAssessed(check, missingRating, reference);
    }
    if (largest == null) {
      return Finding.notAssessed(check, missingLoad, reference);
    }
    return BoardLoadCheck.overload(check, what, largest, rating, reference, words);
  }

  private static List<Finding> selectivity(
      BoardSpec board,
      BoardFaultLevel level,
      RecordedMccbSettings mccbSettings,
      ProtectionSettings settings,
      com.wayledger.engine.PositionWords words) {
    if (level.upstreamDevice() == null) {
      return List.of(
          Finding.notAssessed(
              CheckKind.SELECTIVITY,
              "incomer or feeding device of board " + board.reference(),
              SelectivityCheck.REFERENCE));
    }
    Resolved<DeviceCharacteristic> upstream =
        DeviceCharacteristic.of(
            level.upstreamDevice(),
            mccbSettings.incomerByBoardId().get(board.id()),
            settings.mccbInstantaneousMultiple());
    if (!upstream.isKnown()) {
      return List.of(
          Finding.notAssessedBecause(
              CheckKind.SELECTIVITY,
              "upstream device has no " + upstream.missing(),
              SelectivityCheck.REFERENCE));
    }
    SourcedValue ka = level.faultCurrentKiloAmps();
    if (!ka.isKnown()) {
      return List.of(
          Finding.notAssessed(CheckKind.SELECTIVITY, ka.missing(), SelectivityCheck.REFERENCE));
    }
    List<Finding> findings = new ArrayList<>();
    for (CircuitSpec c : board.circuits()) {
      if (c.status() != WayStatus.IN_USE || c.device() == null) {
        continue;
      }
      Resolved<DeviceCharacteristic> out =
          DeviceCharacteristic.of(
              c.device(),
              mccbSettings.byCircuitId().get(c.id()),
              settings.mccbInstantaneousMultiple());
      if (out.isKnown()) {
        Finding f = SelectivityCheck.assess(upstream.value(), out.value(), ka.value() * 1000.0);
        findings.add(
            new Finding(
                f.check(),
                f.verdict(),
                words.place(c.wayNumber(), c.position())
                    + " “"
                    + c.description()
                    + "”: "
                    + f.summary(),
                f.values(),
                f.reference(),
                f.remedy()));
      } else {
        findings.add(
            Finding.notAssessedBecause(
                CheckKind.SELECTIVITY,
                words.place(c.wayNumber(), c.position())
                    + " “"
                    + c.description()
                    + "” has no "
                    + out.missing(),
                SelectivityCheck.REFERENCE));
      }
    }
    return findings;
  }

  /**
   * The supply fuse carries the sum of the boards fed from the origin, phase by phase (no diversity
   * between them: the conservative side).
   */
  private static List<Finding> supplyFuse(SiteSpec site, Map<Long, BoardLoading> loadingByBoard) {
    Double fuse = site.supply().supplyFuseRatingAmps();
    if (fuse == null) {
      return List.of(
          Finding.notAssessed(
              CheckKind.SUPPLY_FUSE_OVERLOAD,
              "supply fuse rating",
              BoardLoadCheck.REFERENCE_OVERLOAD));
    }
    Map<Phase, Double> sum = new EnumMap<>(Phase.class);
    for (BoardSpec board : site.boards()) {
      if (board.parentBoardId() != null) {
        continue;
      }
      BoardLoading l = loadingByBoard.get(board.id());
      if (l == null || l.phaseCurrentsAmps().isEmpty()) {
        return List.of(
            Finding.notAssessed(
                CheckKind.SUPPLY_FUSE_OVERLOAD,
                "design current of board " + board.reference(),
                BoardLoadCheck.REFERENCE_OVERLOAD));
      }
      l.phaseCurrentsAmps().forEach((p, a) -> sum.merge(p, a, Double::sum));
    }
    if (sum.isEmpty()) {
      return List.of(
          Finding.notAssessed(
              CheckKind.SUPPLY_FUSE_OVERLOAD,
              "a board fed from the origin",
              BoardLoadCheck.REFERENCE_OVERLOAD));
    }
    double largest = sum.values().stream().mapToDouble(Double::doubleValue).max().orElseThrow();
    return List.of(
        BoardLoadCheck.overload(
            CheckKind.SUPPLY_FUSE_OVERLOAD,
            "supply fuse",
            largest,
            fuse,
            BoardLoadCheck.REFERENCE_OVERLOAD));
  }
}
