package com.wayledger.diagram;

import com.wayledger.board.AnalysisService;
import com.wayledger.board.Board;
import com.wayledger.board.BoardService;
import com.wayledger.board.BoardTreeNode;
import com.wayledger.board.Circuit;
import com.wayledger.board.DeviceDetails;
import com.wayledger.board.SiteAnalysis;
import com.wayledger.diagram.SiteDiagram.BoardBox;
import com.wayledger.diagram.SiteDiagram.Device;
import com.wayledger.diagram.SiteDiagram.LineBar;
import com.wayledger.diagram.SiteDiagram.Supply;
import com.wayledger.diagram.SiteDiagram.WayLine;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.engine.protection.CircuitFindings;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.SourcedValue;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Reads what the single-line diagram shows from the stored site and the site's one analysis (the
 * figures are the same as on the board pages, since they come from the same analysis).
 */
@Service
public class DiagramReader {

  private final SiteService sites;
  private final BoardService boards;
  private final AnalysisService analysis;

  public DiagramReader(SiteService sites, BoardService boards, AnalysisService analysis) {
    this.sites = sites;
    this.boards = boards;
    this.analysis = analysis;
  }

  /**
   * The diagram of a site.
   *
   * @param siteId the site
   * @param expandedBoardId the board whose ways to list one by one; null for none (an id of another
   *     site's board is ignored)
   */
  @Transactional(readOnly = true)
  public SiteDiagram read(long siteId, Long expandedBoardId) {
    Site site = sites.get(siteId);
    List<BoardTreeNode> tree = boards.tree(siteId);
    return build(site, tree, analysis.ofSite(siteId), expandedBoardId);
  }

  /** The diagram from already-read parts; the boards' circuits must be loaded or loadable. */
  static SiteDiagram build(
      Site site, List<BoardTreeNode> tree, SiteAnalysis results, Long expandedBoardId) {
    Supply supply =
        new Supply(
            earthingText(site),
            site.getNominalVoltageVolts(),
            site.getPhases(),
            site.getExternalLoopImpedanceOhms(),
            site.getProspectiveFaultCurrentKiloAmps(),
            site.getSupplyFuseRatingAmps());
    List<BoardBox> boxes = new ArrayList<>();
    Long expanded = null;
    for (BoardTreeNode node : tree) {
      boolean expand = Objects.equals(node.board().getId(), expandedBoardId);
      if (expand) {
        expanded = expandedBoardId;
      }
      boxes.add(box(node, results, expand));
    }
    return new SiteDiagram(site.getId(), site.getName(), supply, boxes, expanded);
  }

  private static BoardBox box(BoardTreeNode node, SiteAnalysis results, boolean expand) {
    Board board = node.board();
    long id = board.getId();
    BoardDemand demand = results.boardDemand(id);
    Double ratingAmps =
        demand == null || demand.incomer() == null ? null : demand.incomer().ratingAmps();
    List<LineBar> lines = new ArrayList<>();
    if (demand != null) {
      for (PhaseDemand phase : demand.phases()) {
        Double loading =
            ratingAmps == null || !(ratingAmps > 0)
                ? null
                : 100.0 * phase.currentAmps() / ratingAmps;
        lines.add(new LineBar(phase.phase().name(), phase.currentAmps(), loading));
      }
    }
    List<Finding> problems = results.problems(id);
    Verdict worst = problems.isEmpty() ? null : problems.get(0).verdict();
    Board parent = board.getParent();
    Device feedDevice = Device.NONE;
    if (parent != null && board.getFedFromCircuitId() != null) {
      feedDevice =
          parent.getCircuits().stream()
              .filter(circuit -> board.getFedFromCircuitId().equals(circuit.getId()))
              .findFirst()
              .map(circuit -> device(circuit.getDevice()))
              .orElse(Device.NONE);
    }
    SourcedValue drop =
        results
            .boardFindings(id)
            .map(findings -> findings.faultLevel().voltageDropFromOriginPercent())
            .orElse(null);
    int circuitCount =
        (int)
            board.getCircuits().stream()
                .filter(circuit -> circuit.getStatus() != WayStatus.EMPTY)
                .count();
    return new BoardBox(
        id,
        board.getReference(),
        board.getLocation() == null ? "" : board.getLocation(),
        parent == null ? null : parent.getId(),
        node.depth(),
        device(board.getIncomer()),
        board.getBusbarRatingAmps(),
        demand == null ? 0.0 : demand.demandWatts() / 1000.0,
        lines,
        worst,
        problems.size(),
        circuitCount,
        feedDevice,
        board.getFedFromCircuitId(),
        board.getSubmain() == null ? "" : board.getSubmain().label(board.cableUnits()),
        drop == null || !drop.isKnown() ? null : drop.value(),
        drop == null ? "no figures for this board" : drop.missing(),
        expand ? ways(board, results) : List.of());
  }

  private static List<WayLine> ways(Board board, SiteAnalysis results) {
    Map<Long, CircuitDemand> demands = results.circuitDemands(board.getId());
    Map<Long, CircuitFindings> findings = results.circuitFindings(board.getId());
    List<WayLine> ways = new ArrayList<>();
    for (Circuit circuit : board.getCircuits()) {
      if (circuit.getStatus() == WayStatus.EMPTY) {
        continue;
      }
      CircuitDemand demand = demands.get(circuit.getId());
      Verdict worst =
          findings.containsKey(circuit.getId())
              ? findings.get(circuit.getId()).findings().stream()
                  .map(Finding::verdict)
                  .filter(verdict -> verdict != Verdict.PASS)
                  .min(Comparator.naturalOrder())
                  .orElse(null)
              : null;
      ways.add(
          new WayLine(
              circuit.getId(),
              circuit.positionLabel(),
              circuit.getDescription() == null ? "" : circuit.getDescription(),
              device(circuit.getDevice()),
              demand != null && demand.isAssessed() ? demand.designCurrentAmps() : null,
              worst));
    }
    return ways;
  }

  private static Device device(DeviceDetails details) {
    if (details == null || details.getKind() == null) {
      return Device.NONE;
    }
    return new Device(details.getKind(), details.label());
  }

  private static String earthingText(Site site) {
    return site.getEarthingSystem() == null
        ? ""
        : site.getEarthingSystem().name().replace('_', '-');
  }
}
