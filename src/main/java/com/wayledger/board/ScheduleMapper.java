package com.wayledger.board;

import com.wayledger.engine.BoardSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.SupplySpec;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.device.MccbSettings;
import com.wayledger.site.Site;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The one place where stored sites, boards, circuits and loads become engine inputs. Entities never
 * reach calculation code; every screen, export and API result that computes anything goes through
 * here.
 */
public final class ScheduleMapper {

  private ScheduleMapper() {}

  /**
   * The whole site as the engine sees it; {@code boards} are the site's boards with their circuits.
   */
  public static SiteSpec toSpec(Site site, List<Board> boards) {
    Map<Long, Long> childByFeedingCircuit =
        boards.stream()
            .filter(board -> board.getFedFromCircuitId() != null)
            .collect(Collectors.toMap(Board::getFedFromCircuitId, Board::getId, (a, b) -> a));
    List<BoardSpec> boardSpecs =
        boards.stream().map(board -> toSpec(board, childByFeedingCircuit)).toList();
    return new SiteSpec(
        site.getId(),
        site.getName(),
        supplyOf(site),
        site.getDefaultDiversityMethod(),
        boardSpecs,
        site.getRuleSet());
  }

  /**
   * The moulded-case breaker settings recorded on these boards (their circuits' devices and their
   * incomers), keyed by circuit and board id. A device is included only when it is an MCCB with
   * both Ir and Ii recorded (the services refuse one without the other); any other MCCB is left
   * out, so the protection engine assumes Ir = In and Ii = 10·In for it and its findings say
   * "assumed".
   */
  public static RecordedMccbSettings mccbSettingsOf(List<Board> boards) {
    Map<Long, MccbSettings> byCircuit = new HashMap<>();
    Map<Long, MccbSettings> byBoard = new HashMap<>();
    for (Board board : boards) {
      if (board.getIncomer() != null && board.getIncomer().mccbSettings() != null) {
        byBoard.put(board.getId(), board.getIncomer().mccbSettings());
      }
      for (Circuit circuit : board.getCircuits()) {
        if (circuit.getDevice() != null && circuit.getDevice().mccbSettings() != null) {
          byCircuit.put(circuit.getId(), circuit.getDevice().mccbSettings());
        }
      }
    }
    return new RecordedMccbSettings(byCircuit, byBoard);
  }

  /**
   * The same site with some circuits placed elsewhere (a balancing plan: single-pole circuits, and
   * two-pole ones on a three-line panelboard, which take the pair starting on the placement's
   * line), so the engines can say what the board would carry after the moves without anything being
   * stored.
   */
  public static SiteSpec withPlacements(SiteSpec site, List<Placement> placements) {
    Map<Long, Placement> byCircuit =
        placements.stream().collect(Collectors.toMap(Placement::circuitId, p -> p, (a, b) -> b));
    List<BoardSpec> boards =
        site.boards().stream()
            .map(
                board ->
                    board.withCircuits(
                        board.circuits().stream()
                            .map(
                                circuit -> {
                                  Placement placement = byCircuit.get(circuit.id());
                                  return placement == null
                                      ? circuit
                                      : new CircuitSpec(
                                          circuit.id(),
                                          placement.wayNumber(),
                                          placement.position(),
                                          circuit.description(),
                                          circuit.status(),
                                          circuit.lockedForBalancing(),
                                          circuit.device(),
                                          circuit.cable(),
                                          circuit.loads(),
                                          circuit.feedsBoardId(),
                                          circuit.measuredLoopImpedanceOhms(),
                                          circuit.ringFinal(),
                                          circuit.location());
                                })
                            .toList()))
            .toList();
    return site.withBoards(boards);
  }

  public static SupplySpec supplyOf(Site site) {
    return new SupplySpec(
        site.getEarthingSystem(),
        site.getNominalVoltageVolts(),
        site.getPhases(),
        site.getFrequencyHertz(),
        site.getExternalLoopImpedanceOhms(),
        site.getProspectiveFaultCurrentKiloAmps(),
        site.getSupplyFuseRatingAmps(),
        site.getSupplySystem());
  }

  // --- change log (loadlog) support: snapshots are engine records, so a replay maps nothing twice
  // ---

  /** A circuit as the engine sees it, kept as the change log's before/after snapshot. */
  public static CircuitSpec snapshotOf(Circuit circuit, Long feedsBoardId) {
    return toSpec(circuit, feedsBoardId, false);
  }

  /** A board without its circuits, kept as the change log's before/after snapshot. */
  public static BoardSpec headerOf(Board board) {
    // never touches board.getCircuits(): loading them would keep them in the session of a board
    // being deleted
    return new BoardSpec(
        board.getId(),
        board.getReference(),
        board.getPhases(),
        board.getWayCount(),
        board.getBusbarRatingAmps(),
        board.getIncomer() == null
            ? null
            : board.getIncomer().toSpec(board.getPhases() == 3 ? 3 : 1),
        board.getParent() == null ? null : board.getParent().getId(),
        board.getSubmain() == null ? null : board.getSubmain().toSpec(),
        board.getUnbalanceLimitPercent(),
        board.getCoincidenceFactor(),
        board.getDiversityMethod(),
        board.getMeasuredExternalLoopImpedanceOhms(),
        board.getMeasuredFaultCurrentKiloAmps(),
        List.of(),
        incomerIr(board),
        board.getSupplySystem());
  }

  /**
   * A board rebuilt from a logged header and the circuits it held at one moment (the log's replay).
   */
  public static BoardSpec replayed(BoardSpec header, java.util.Collection<CircuitSpec> circuits) {
    return header.withCircuits(
        circuits.stream()
            .sorted(
                java.util.Comparator.comparingInt(CircuitSpec::wayNumber)
                    .thenComparing(CircuitSpec::position))
            .toList());
  }

  private static BoardSpec toSpec(Board board, Map<Long, Long> childByFeedingCircuit) {
    List<CircuitSpec> circuits =
        board.getCircuits().stream()
            .map(circuit -> toSpec(circuit, childByFeedingCircuit.get(circuit.getId()), true))
            .toList();
    return new BoardSpec(
        board.getId(),
        board.getReference(),
        board.getPhases(),
        board.getWayCount(),
        board.getBusbarRatingAmps(),
        board.getIncomer() == null
            ? null
            : board.getIncomer().toSpec(board.getPhases() == 3 ? 3 : 1),
        board.getParent() == null ? null : board.getParent().getId(),
        board.getSubmain() == null ? null : board.getSubmain().toSpec(),
        board.getUnbalanceLimitPercent(),
        board.getCoincidenceFactor(),
        board.getDiversityMethod(),
        board.getMeasuredExternalLoopImpedanceOhms(),
        board.getMeasuredFaultCurrentKiloAmps(),
        circuits,
        incomerIr(board),
        board.getSupplySystem());
  }

  private static Double incomerIr(Board board) {
    return board.getIncomer() == null || board.getIncomer().mccbSettings() == null
        ? null
        : board.getIncomer().mccbSettings().longTimeSettingAmps();
  }

  /**
   * A circuit as the engine sees it. With {@code withDefaults} every input the circuit leaves empty
   * comes from its board's or site's defaults ({@link Inheritance}); without, exactly what is
   * stored (the change log's snapshots).
   */
  private static CircuitSpec toSpec(Circuit circuit, Long feedsBoardId, boolean withDefaults) {
    Board board = circuit.getBoard();
    List<LoadSpec> loads =
        circuit.getLoads().stream()
            .map(
                load ->
                    toSpec(
                        load,
                        withDefaults
                            ? Inheritance.startUpMultiple(load, board)
                            : load.getStartUpSurgeMultiple()))
            .toList();
    int poles = circuit.getPosition().poles();
    return new CircuitSpec(
        circuit.getId(),
        circuit.getWayNumber(),
        circuit.getPosition(),
        circuit.getDescription(),
        circuit.getStatus(),
        circuit.isLockedForBalancing(),
        circuit.getDevice() == null || circuit.getDevice().toSpec(poles) == null
            ? null
            : circuit.getDevice().toSpec(poles).withFaultInterrupter(circuit.getFaultInterrupter()),
        inConduit(
            withDefaults
                ? Inheritance.effectiveCable(circuit.getCable(), board)
                : circuit.getCable() == null ? null : circuit.getCable().toSpec(),
            circuit.getConduit()),
        loads,
        feedsBoardId,
        circuit.getMeasuredLoopImpedanceOhms(),
        circuit.isRingFinal(),
        withDefaults ? Inheritance.effectiveLocation(circuit, board) : circuit.getLocation());
  }

  private static com.wayledger.engine.CableSpec inConduit(
      com.wayledger.engine.CableSpec cable, com.wayledger.engine.Conduit conduit) {
    return cable == null || conduit == null ? cable : cable.inConduit(conduit);
  }

  private static LoadSpec toSpec(LoadItem load, Double startUpMultiple) {
    return new LoadSpec(
        load.getDescription(),
        load.getCategory(),
        load.getQuantity(),
        load.getRatingValue(),
        load.getRatingUnit(),
        load.getPowerFactor(),
        startUpMultiple,
        load.getStartUpSurgeMillis(),
        load.isContinuous(),
        load.getMotorHorsepower());
  }
}
