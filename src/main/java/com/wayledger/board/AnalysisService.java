package com.wayledger.board;

import com.wayledger.diversity.MethodLibrary;
import com.wayledger.engine.Phase;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.demand.BoardDemand;
import com.wayledger.engine.demand.CircuitDemand;
import com.wayledger.engine.demand.DemandEngine;
import com.wayledger.engine.demand.DiversityMethodCatalog;
import com.wayledger.engine.demand.PhaseDemand;
import com.wayledger.engine.demand.SiteDemand;
import com.wayledger.engine.protection.BoardLoading;
import com.wayledger.engine.protection.CircuitLoading;
import com.wayledger.engine.protection.ProtectionEngine;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Runs the demand and protection engines on a stored site. Results are recomputed on every read, so
 * they can never disagree with the schedule they came from.
 */
@Service
public class AnalysisService {

  private final SiteService sites;
  private final BoardRepository boards;
  private final MethodLibrary methodLibrary;

  public AnalysisService(SiteService sites, BoardRepository boards, MethodLibrary methodLibrary) {
    this.sites = sites;
    this.boards = boards;
    this.methodLibrary = methodLibrary;
  }

  /** The diversity methods a board may choose from: built-in and user-defined. */
  public DiversityMethodCatalog methods() {
    return methodLibrary.catalog();
  }

  @Transactional(readOnly = true)
  public SiteAnalysis ofSite(long siteId) {
    Site site = sites.get(siteId);
    List<Board> onSite = boards.findBySite(siteId);
    onSite.forEach(board -> board.getCircuits().forEach(circuit -> circuit.getLoads().size()));
    return analyse(
        ScheduleMapper.toSpec(site, onSite), methods(), ScheduleMapper.mccbSettingsOf(onSite));
  }

  /**
   * The MCCB settings recorded on a site's boards, for callers that re-run an engine on the site's
   * spec.
   */
  @Transactional(readOnly = true)
  public RecordedMccbSettings mccbSettingsOfSite(long siteId) {
    List<Board> onSite = boards.findBySite(siteId);
    onSite.forEach(board -> board.getCircuits().size());
    return ScheduleMapper.mccbSettingsOf(onSite);
  }

  @Transactional(readOnly = true)
  public SiteAnalysis ofBoard(long boardId) {
    Board board =
        boards
            .findById(boardId)
            .orElseThrow(() -> new com.wayledger.system.NotFoundException("Board", boardId));
    return ofSite(board.getSite().getId());
  }

  /**
   * Both engines on an engine input, with the built-in and user-defined diversity methods and no
   * MCCB settings recorded (every MCCB assumed Ir = In, Ii = 10·In). For a spec with stored boards
   * behind it, pass their settings with {@link #analyse(SiteSpec, RecordedMccbSettings)}.
   */
  public SiteAnalysis analyse(SiteSpec spec) {
    return analyse(spec, methods(), RecordedMccbSettings.NONE);
  }

  /**
   * Both engines on an engine input with the MCCB settings recorded for it (see
   * ScheduleMapper.mccbSettingsOf).
   */
  public SiteAnalysis analyse(SiteSpec spec, RecordedMccbSettings recordedMccbSettings) {
    return analyse(spec, methods(), recordedMccbSettings);
  }

  /** Both engines on an engine input with no MCCB settings recorded. */
  public static SiteAnalysis analyse(SiteSpec spec, DiversityMethodCatalog methods) {
    return analyse(spec, methods, RecordedMccbSettings.NONE);
  }

  /** Both engines on an engine input; the demand engine's currents feed the protection checks. */
  public static SiteAnalysis analyse(
      SiteSpec spec, DiversityMethodCatalog methods, RecordedMccbSettings recordedMccbSettings) {
    SiteDemand demand = DemandEngine.evaluate(spec, methods);
    SiteFindings findings =
        ProtectionEngine.check(
            spec,
            circuitLoadings(demand),
            boardLoadings(demand),
            recordedMccbSettings,
            ProtectionSettings.DEFAULTS);
    return new SiteAnalysis(spec, demand, findings);
  }

  private static Map<Long, CircuitLoading> circuitLoadings(SiteDemand demand) {
    Map<Long, CircuitLoading> loadings = new HashMap<>();
    for (BoardDemand board : demand.boards()) {
      for (CircuitDemand circuit : board.circuits()) {
        Double designCurrent = circuit.isAssessed() ? circuit.designCurrentAmps() : null;
        loadings.put(circuit.circuitId(), new CircuitLoading(circuit.circuitId(), designCurrent));
      }
    }
    return loadings;
  }

  private static Map<Long, BoardLoading> boardLoadings(SiteDemand demand) {
    Map<Long, BoardLoading> loadings = new HashMap<>();
    for (BoardDemand board : demand.boards()) {
      Map<Phase, Double> currents = new EnumMap<>(Phase.class);
      for (PhaseDemand phase : board.phases()) {
        currents.put(phase.phase(), phase.currentAmps());
      }
      loadings.put(
          board.boardId(),
          new BoardLoading(
              board.boardId(),
              currents,
              board.unbalancePercent(),
              board.lines() == 3 ? board.neutralCurrentAmps() : null));
    }
    return loadings;
  }
}
