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
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.RecordedMccbSettings;
import com.wayledger.engine.protection.SiteFindings;
import com.wayledger.engine.rules.RuleSets;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.SiteGenerations;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Function;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Service;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.transaction.support.TransactionSynchronizationManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Runs the demand and protection engines on a stored site. A stored site's analysis is computed
 * once per change, not once per read: it is kept with the site's data generation
 * (system.SiteGenerations, moved on by every committed change), and a read at the same generation
 * takes the kept result, so it can never disagree with the committed schedule it came from.
 */
@Service
public class AnalysisService {

  private final SiteService sites;
  private final BoardRepository boards;
  private final DwellingRepository dwellings;
  private final MeasuredDemandRepository measured;
  private final MethodLibrary methodLibrary;
  private final SiteGenerations generations;
  private final AnalysisCache kept;
  private final TransactionTemplate readOnly;
  private final AtomicLong siteAnalysisRuns = new AtomicLong();

  public AnalysisService(
      SiteService sites,
      BoardRepository boards,
      DwellingRepository dwellings,
      MeasuredDemandRepository measured,
      MethodLibrary methodLibrary,
      ObjectProvider<SiteGenerations> generations,
      ObjectProvider<PlatformTransactionManager> transactions,
      @Value("${wayledger.analysis.kept-sites:64}") int keptSites,
      @Value("${wayledger.analysis.kept-views-per-site:16}") int keptViewsPerSite) {
    this.sites = sites;
    this.boards = boards;
    this.dwellings = dwellings;
    this.measured = measured;
    this.methodLibrary = methodLibrary;
    // Without a database (web slice tests) nothing is kept: every read computes.
    this.generations = generations.getIfAvailable();
    PlatformTransactionManager manager = transactions.getIfAvailable();
    this.kept =
        this.generations == null || manager == null
            ? new AnalysisCache(0)
            : new AnalysisCache(keptSites, keptViewsPerSite);
    this.readOnly = manager == null ? null : new TransactionTemplate(manager);
    if (readOnly != null) {
      readOnly.setReadOnly(true);
    }
  }

  /** The diversity methods a board may choose from: built-in and user-defined. */
  public DiversityMethodCatalog methods() {
    return methodLibrary.catalog();
  }

  /**
   * The analysis of a stored site as committed: kept per data generation. Inside a transaction that
   * may have changed data (not read-only), it is computed afresh and not kept, so an uncommitted or
   * rolled-back change never reaches another reader.
   */
  public SiteAnalysis ofSite(long siteId) {
    if (!mayKeep()) {
      return computeOfSite(siteId);
    }
    // The generation is read before the data, so what is kept is never older than its generation.
    long generation = generations.current(siteId);
    return kept.get(siteId, generation, () -> readOnly.execute(status -> computeOfSite(siteId)));
  }

  /**
   * Whether a read may use and keep an analysis: there is a database generation to key it by, and
   * the caller's transaction (if any) cannot have changed data.
   */
  private boolean mayKeep() {
    boolean mayHaveChanged =
        TransactionSynchronizationManager.isActualTransactionActive()
            && (!TransactionSynchronizationManager.isCurrentTransactionReadOnly()
                || SiteGenerations.changesPending());
    return !mayHaveChanged && generations != null && readOnly != null;
  }

  /**
   * How many times a stored site's analysis has been computed since start-up (reads that took a
   * kept result do not count).
   */
  public long siteAnalysisRuns() {
    return siteAnalysisRuns.get();
  }

  private SiteAnalysis computeOfSite(long siteId) {
    siteAnalysisRuns.incrementAndGet();
    Site site = sites.get(siteId);
    List<Board> onSite = boards.findBySite(siteId);
    onSite.forEach(board -> board.getCircuits().forEach(circuit -> circuit.getLoads().size()));
    SiteSpec spec = ScheduleMapper.toSpec(site, onSite);
    return analyse(spec, ScheduleMapper.mccbSettingsOf(onSite));
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

  /** The analysis of the site a board is on (see {@link #ofSite(long)}). */
  public SiteAnalysis ofBoard(long boardId) {
    if (mayKeep()) {
      SiteGenerations.Stamp stamp = stampOfBoard(boardId);
      return kept.get(
          stamp.siteId(),
          stamp.generation(),
          () -> readOnly.execute(status -> computeOfSite(stamp.siteId())));
    }
    Board board =
        boards
            .findById(boardId)
            .orElseThrow(() -> new com.wayledger.system.NotFoundException("Board", boardId));
    return ofSite(board.getSite().getId());
  }

  /** One query for a board's site and its generation: no entity loaded on a kept read. */
  private SiteGenerations.Stamp stampOfBoard(long boardId) {
    return generations
        .ofBoard(boardId)
        .orElseThrow(() -> new com.wayledger.system.NotFoundException("Board", boardId));
  }

  /**
   * A view of a board built from its site's analysis and its stored data, kept beside the analysis
   * under the same data generation (one query for the board's site and generation on a kept read).
   * The view must hold no entity: it outlives the read-only transaction it is built in. Where the
   * analysis is not kept (a transaction that may have changed data, no database), it is built
   * afresh in the caller's transaction, or a read-only one when there is none.
   *
   * @param key what else the view depends on besides the board and the data (its locale, …)
   * @param build builds the view from the site's analysis, reading the board's data itself
   */
  public <V> V keptBoardView(long boardId, Object key, Function<SiteAnalysis, V> build) {
    if (mayKeep()) {
      SiteGenerations.Stamp stamp = stampOfBoard(boardId);
      return kept.view(
          stamp.siteId(),
          stamp.generation(),
          List.of(boardId, key),
          () -> readOnly.execute(status -> computeOfSite(stamp.siteId())),
          results -> readOnly.execute(status -> build.apply(results)));
    }
    if (readOnly != null && !TransactionSynchronizationManager.isActualTransactionActive()) {
      return readOnly.execute(status -> build.apply(ofBoard(boardId)));
    }
    return build.apply(ofBoard(boardId));
  }

  /**
   * Both engines on an engine input, with the built-in and user-defined diversity methods and no
   * MCCB settings recorded (every MCCB assumed Ir = In, Ii = 10·In). For a spec with stored boards
   * behind it, pass their settings with {@link #analyse(SiteSpec, RecordedMccbSettings)}.
   */
  public SiteAnalysis analyse(SiteSpec spec) {
    return analyse(spec, RecordedMccbSettings.NONE);
  }

  /**
   * Both engines on an engine input with the MCCB settings recorded for it (see
   * ScheduleMapper.mccbSettingsOf).
   */
  public SiteAnalysis analyse(SiteSpec spec, RecordedMccbSettings recordedMccbSettings) {
    // the stored site's dwelling inputs and recorded demands go with every analysis of it (a
    // balancing plan, an export), so that each reads the same NEC figures as the board page
    Map<Long, com.wayledger.engine.dwelling.DwellingInputs> inputs = new HashMap<>();
    dwellings
        .findBySite(spec.id())
        .forEach(record -> inputs.put(record.getBoardId(), record.inputs()));
    Map<Long, List<com.wayledger.engine.dwelling.MeasuredMaximumDemand>> records = new HashMap<>();
    measured
        .findBySiteIdOrderByPeriodEndDescIdDesc(spec.id())
        .forEach(
            record ->
                records
                    .computeIfAbsent(record.getBoardId(), k -> new java.util.ArrayList<>())
                    .add(record.toEngine()));
    return analyse(spec, methods(), recordedMccbSettings, inputs, records);
  }

  /** Ids of the site's boards recorded as serving a dwelling unit (the NEC dwelling rules). */
  public java.util.Set<Long> dwellingBoardIds(long siteId) {
    java.util.Set<Long> ids = new java.util.HashSet<>();
    dwellings.findBySite(siteId).forEach(record -> ids.add(record.getBoardId()));
    return ids;
  }

  /**
   * The device (and, under the NEC set, conductor) proposed for a circuit by its site's rule set,
   * with the design current of this analysis; null when the circuit has no device.
   */
  public com.wayledger.engine.protection.DeviceProposal proposal(
      SiteAnalysis results, long circuitId, CircuitDemand demand) {
    com.wayledger.engine.CircuitSpec spec = null;
    for (com.wayledger.engine.BoardSpec board : results.spec().boards()) {
      for (com.wayledger.engine.CircuitSpec circuit : board.circuits()) {
        if (circuit.id() == circuitId) {
          spec = circuit;
        }
      }
    }
    if (spec == null || spec.device() == null) {
      return null;
    }
    Double designCurrent =
        demand != null && demand.isAssessed() ? demand.designCurrentAmps() : null;
    return RuleSets.of(results.spec().ruleSetKey())
        .propose(
            results.spec(),
            circuitId,
            new CircuitLoading(circuitId, designCurrent),
            ProtectionSettings.DEFAULTS,
            dwellingBoardIds(results.spec().id()));
  }

  /** Both engines on an engine input with no MCCB settings recorded. */
  public static SiteAnalysis analyse(SiteSpec spec, DiversityMethodCatalog methods) {
    return analyse(spec, methods, RecordedMccbSettings.NONE);
  }

  /** Both engines on an engine input; the demand engine's currents feed the protection checks. */
  public static SiteAnalysis analyse(
      SiteSpec spec, DiversityMethodCatalog methods, RecordedMccbSettings recordedMccbSettings) {
    return analyse(spec, methods, recordedMccbSettings, Map.of(), Map.of());
  }

  /**
   * Both engines on an engine input, with the NEC dwelling inputs of its dwelling boards (read by
   * the NEC diversity methods and the Article 220 worksheets) and the maximum demands recorded for
   * its boards (NEC 220.87).
   */
  public static SiteAnalysis analyse(
      SiteSpec spec,
      DiversityMethodCatalog methods,
      RecordedMccbSettings recordedMccbSettings,
      Map<Long, com.wayledger.engine.dwelling.DwellingInputs> dwellingInputs,
      Map<Long, List<com.wayledger.engine.dwelling.MeasuredMaximumDemand>> measuredDemands) {
    Map<Long, com.wayledger.engine.demand.DwellingParameters> parameters = new HashMap<>();
    dwellingInputs.forEach(
        (boardId, in) ->
            parameters.put(
                boardId,
                new com.wayledger.engine.demand.DwellingParameters(
                    in.floorAreaSquareFeet(), in.smallApplianceCircuits(), in.laundryCircuits())));
    SiteDemand demand =
        DemandEngine.evaluate(
            spec, methods, com.wayledger.engine.demand.DemandSettings.DEFAULTS, parameters);
    SiteFindings findings =
        RuleSets.of(spec.ruleSetKey())
            .check(
                spec,
                circuitLoadings(demand),
                boardLoadings(demand),
                recordedMccbSettings,
                ProtectionSettings.DEFAULTS,
                dwellingInputs.keySet());
    Map<Long, List<com.wayledger.engine.dwelling.Worksheet>> worksheets =
        dwellingInputs.isEmpty() && measuredDemands.isEmpty()
            ? Map.of()
            : com.wayledger.engine.dwelling.DwellingSite.worksheets(
                spec, dwellingInputs, measuredDemands);
    return new SiteAnalysis(spec, demand, findings, worksheets, dwellingInputs.keySet());
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
              board.lines() >= 2 ? board.neutralCurrentAmps() : null));
    }
    return loadings;
  }
}
