package com.wayledger.board;

import com.wayledger.diversity.MethodLibrary;
import com.wayledger.engine.PhasePosition;
import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.system.ChangeKind;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RowLocks;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.ScheduleChanged;
import com.wayledger.system.StaleEditException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Collectors;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Creates, edits and finds boards, and keeps the board tree of a site a tree. Each change publishes
 * a {@link ScheduleChanged} event for the change log, with the optional reason the user gave.
 */
@Service
public class BoardService {

  private final BoardRepository boards;
  private final CircuitRepository circuits;
  private final SiteService sites;
  private final MethodLibrary methods;
  private final ApplicationEventPublisher events;
  private final RowLocks locks;

  public BoardService(
      BoardRepository boards,
      CircuitRepository circuits,
      SiteService sites,
      MethodLibrary methods,
      ApplicationEventPublisher events,
      RowLocks locks) {
    this.events = events;
    this.locks = locks;
    this.boards = boards;
    this.circuits = circuits;
    this.sites = sites;
    this.methods = methods;
  }

  @Transactional(readOnly = true)
  public Board get(long id) {
    return boards.findById(id).orElseThrow(() -> new NotFoundException("Board", id));
  }

  @Transactional(readOnly = true)
  public List<Board> onSite(long siteId) {
    return boards.findBySite(siteId);
  }

  /**
   * Every circuit on the site's boards that could feed another board, by board and way, for the
   * board form's "fed from way" choice.
   */
  @Transactional(readOnly = true)
  public List<FeedOption> feedOptions(long siteId) {
    List<FeedOption> options = new java.util.ArrayList<>();
    for (Board board : boards.findBySite(siteId)) {
      for (Circuit circuit : circuits.findByBoard(board.getId())) {
        options.add(
            new FeedOption(
                board.getId(),
                board.getReference(),
                circuit.getId(),
                circuit.getWayNumber(),
                circuit.getPosition(),
                circuit.getDescription() == null ? "" : circuit.getDescription(),
                circuit.getStatus()));
      }
    }
    return options;
  }

  /** The site's boards in tree order (each parent before its children), with their depth. */
  @Transactional(readOnly = true)
  public List<BoardTreeNode> tree(long siteId) {
    List<Board> all = boards.findBySite(siteId);
    Map<Long, List<Board>> byParent =
        all.stream()
            .filter(board -> board.getParent() != null)
            .collect(Collectors.groupingBy(board -> board.getParent().getId()));
    List<BoardTreeNode> ordered = new ArrayList<>();
    all.stream()
        .filter(board -> board.getParent() == null)
        .sorted(Comparator.comparing(Board::getReference))
        .forEach(root -> walk(root, 0, byParent, ordered));
    return ordered;
  }

  private static void walk(
      Board board, int depth, Map<Long, List<Board>> byParent, List<BoardTreeNode> ordered) {
    ordered.add(new BoardTreeNode(board, depth));
    byParent.getOrDefault(board.getId(), List.of()).stream()
        .sorted(Comparator.comparing(Board::getReference))
        .forEach(child -> walk(child, depth + 1, byParent, ordered));
  }

  @Transactional
  public Board create(long siteId, BoardForm form) {
    return create(siteId, form, null);
  }

  @Transactional
  public Board create(long siteId, BoardForm form, String reason) {
    if (!locks.exclusive("site", siteId)) {
      throw new NotFoundException("Site", siteId);
    }
    Site site = sites.get(siteId);
    Board parent = checkRules(site, form, null);
    Board board = new Board(site);
    board.apply(form, parent);
    Board saved = boards.saveAndFlush(board);
    logged(saved, ChangeKind.BOARD_ADDED, "added", null, ScheduleMapper.headerOf(saved), reason);
    return saved;
  }

  @Transactional
  public Board update(long boardId, BoardForm form) {
    return update(boardId, form, null);
  }

  @Transactional
  public Board update(long boardId, BoardForm form, String reason) {
    // The site, then the board (the order every change takes, see ScheduleService): circuits being
    // saved finish first, so checks of its circuits see them, and the supply cannot change
    // meanwhile.
    Long siteId =
        boards.findSiteIdOf(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    locks.exclusive("site", siteId);
    if (!locks.exclusive("board", boardId)) {
      throw new NotFoundException("Board", boardId);
    }
    Board board = get(boardId);
    if (form.version() != null && !Objects.equals(form.version(), board.getVersion())) {
      throw new StaleEditException(
          "Board " + board.getReference(),
          CableUnitsOfForms.shown(BoardForm.of(board), board.cableUnits()));
    }
    Board parent = checkRules(board.getSite(), form, board);
    var before = ScheduleMapper.headerOf(board);
    BoardForm beforeForm = BoardForm.of(board);
    String parentBefore = board.getParent() == null ? null : board.getParent().getReference();
    board.apply(form, parent);
    Board saved = boards.saveAndFlush(board);
    // ids mean nothing to a reader: the parent is named, the feeding way left to the detail view
    String fields =
        com.wayledger.system.RecordDiff.describe(
            com.wayledger.system.RecordDiff.between(
                CableUnitsOfForms.shown(beforeForm, saved.cableUnits()),
                CableUnitsOfForms.shown(BoardForm.of(saved), saved.cableUnits()),
                java.util.Set.of("version", "parentBoardId", "fedFromCircuitId")),
            "board",
            6);
    String parentAfter = saved.getParent() == null ? null : saved.getParent().getReference();
    if (!java.util.Objects.equals(parentBefore, parentAfter)) {
      fields =
          (fields.isEmpty() ? "" : fields + "; ")
              + "fed from "
              + (parentBefore == null ? "the origin" : parentBefore)
              + " → "
              + (parentAfter == null ? "the origin" : parentAfter);
    }
    logged(
        saved,
        ChangeKind.BOARD_EDITED,
        fields.isEmpty() ? "changed" : "changed " + fields,
        before,
        ScheduleMapper.headerOf(saved),
        reason);
    return saved;
  }

  /**
   * Replaces the board's defaults (cable conditions, start-up multiples) that its circuits inherit
   * before the site's; recorded in the change log unless nothing changed.
   */
  @Transactional
  public Board updateDefaults(long boardId, com.wayledger.site.DefaultsForm form, String reason) {
    Board board = get(boardId);
    var before =
        com.wayledger.site.DefaultsForm.of(board.getDefaults(), board.getStartUpMultiples());
    if (before.equals(form)) {
      return board;
    }
    var header = ScheduleMapper.headerOf(board);
    board.applyDefaults(form);
    Board saved = boards.saveAndFlush(board);
    logged(
        saved,
        ChangeKind.BOARD_EDITED,
        "defaults changed: "
            + com.wayledger.system.RecordDiff.describe(
                com.wayledger.system.RecordDiff.between(before, form, java.util.Set.of()),
                "defaults",
                6),
        header,
        ScheduleMapper.headerOf(saved),
        reason);
    return saved;
  }

  /** Deletes a board that feeds no other board; returns its site's id. */
  @Transactional
  public long delete(long boardId) {
    return delete(boardId, null);
  }

  /** Deletes a board that feeds no other board; returns its site's id. */
  @Transactional
  public long delete(long boardId, String reason) {
    boards.findSiteIdOf(boardId).ifPresent(siteId -> locks.exclusive("site", siteId));
    if (!locks.exclusive("board", boardId)) {
      throw new NotFoundException("Board", boardId);
    }
    Board board = get(boardId);
    if (boards.countChildren(boardId) > 0) {
      throw new RuleViolation("reference", "board.delete.hasChildren");
    }
    long siteId = board.getSite().getId();
    logged(
        board, ChangeKind.BOARD_REMOVED, "removed", ScheduleMapper.headerOf(board), null, reason);
    boards.delete(board);
    return siteId;
  }

  private void logged(
      Board board, ChangeKind kind, String what, Object before, Object after, String reason) {
    events.publishEvent(
        new ScheduleChanged(
            board.getSite().getId(),
            board.getId(),
            null,
            kind,
            "Board “" + board.getReference() + "”: " + what,
            before,
            after,
            reason));
  }

  /**
   * A three-phase board turned single-phase keeps only L1: circuits on L2, L3 or all three lines,
   * and three-phase boards fed from it, must be moved or changed first; the message names them.
   */
  private void checkCanBecomeSinglePhase(Board board) {
    List<String> ways =
        circuits.findByBoard(board.getId()).stream()
            .filter(circuit -> circuit.getPosition() != PhasePosition.L1)
            .map(circuit -> circuit.getWayNumber() + " " + circuit.getPosition().label())
            .distinct()
            .toList();
    if (!ways.isEmpty()) {
      throw new RuleViolation("phases", "board.phases.circuitsBeyondL1", String.join(", ", ways));
    }
    List<String> children =
        boards.findBySite(board.getSite().getId()).stream()
            .filter(
                child ->
                    child.getParent() != null
                        && child.getParent().getId().equals(board.getId())
                        && child.isThreePhase())
            .map(Board::getReference)
            .sorted()
            .toList();
    if (!children.isEmpty()) {
      throw new RuleViolation(
          "phases", "board.phases.childrenThreePhase", String.join(", ", children));
    }
  }

  /** The lowest space of a panelboard a breaker reaches down to (0 when it holds none). */
  private int lowestSpaceTaken(Board board) {
    int lowest = 0;
    for (Circuit circuit : circuits.findByBoard(board.getId())) {
      lowest = Math.max(lowest, circuit.getWayNumber() + 2 * (circuit.getPosition().poles() - 1));
    }
    return lowest;
  }

  private Board checkRules(Site site, BoardForm form, Board existing) {
    if (form.phases() != 1 && form.phases() != 3) {
      throw new RuleViolation("phases", "board.phases.invalid");
    }
    com.wayledger.engine.SupplySystem system =
        form.supplySystem() != null ? form.supplySystem() : site.getSupplySystem();
    if (form.phases() == 3 && site.getPhases() == 1 && form.supplySystem() == null) {
      throw new RuleViolation("phases", "board.phases.beyondSupply");
    }
    checkOwnSupplySystem(site, form, system);
    if (form.diversityMethod() != null
        && !form.diversityMethod().isBlank()
        && methods.catalog().find(form.diversityMethod()).isEmpty()) {
      throw new RuleViolation("diversityMethod", "method.unknown");
    }
    MccbSettingRules.check(
        form.incomerKind(),
        form.incomerRatingAmps(),
        form.incomerOverloadSettingAmps(),
        form.incomerInstantaneousSettingAmps(),
        "incomerOverloadSettingAmps",
        "incomerInstantaneousSettingAmps");
    String reference = form.reference().strip();
    boolean taken =
        existing == null
            ? boards.existsBySiteIdAndReferenceIgnoreCase(site.getId(), reference)
            : boards.existsBySiteIdAndReferenceIgnoreCaseAndIdNot(
                site.getId(), reference, existing.getId());
    if (taken) {
      throw new RuleViolation("reference", "board.reference.taken");
    }
    if (existing != null && form.phases() == 1 && existing.isThreePhase()) {
      checkCanBecomeSinglePhase(existing);
    }
    boolean panelboard =
        !com.wayledger.engine.SiteSpec.DEFAULT_RULE_SET_KEY.equals(site.getRuleSet())
            && system.lineCount(form.phases()) >= 2;
    if (panelboard && form.wayCount() % 2 != 0) {
      // two spaces to a row: a panelboard's space count is even (common practice: 24, 30, 42)
      throw new RuleViolation("wayCount", "board.spaceCount.even");
    }
    if (existing != null && panelboard) {
      int lowestSpace = lowestSpaceTaken(existing);
      if (form.wayCount() < lowestSpace) {
        throw new RuleViolation("wayCount", "board.spaceCount.belowUsed", lowestSpace);
      }
    } else if (existing != null) {
      Integer highestWay = circuits.highestWay(existing.getId());
      if (highestWay != null && form.wayCount() < highestWay) {
        throw new RuleViolation("wayCount", "board.wayCount.belowUsed", highestWay);
      }
    }
    if (form.parentBoardId() == null) {
      if (form.fedFromCircuitId() != null) {
        throw new RuleViolation("fedFromCircuitId", "board.fedFrom.withoutParent");
      }
      // a board fed from the origin is a service of its own: any system of the site's rule set
      // (checked above)
      return null;
    }
    Board parent =
        boards
            .findById(form.parentBoardId())
            .filter(candidate -> candidate.getSite().getId().equals(site.getId()))
            .orElseThrow(() -> new RuleViolation("parentBoardId", "board.parent.unknown"));
    for (Board up = parent; up != null; up = up.getParent()) {
      if (existing != null && up.getId().equals(existing.getId())) {
        throw new RuleViolation("parentBoardId", "board.parent.cycle");
      }
    }
    if (form.phases() == 3 && !parent.isThreePhase()) {
      throw new RuleViolation("phases", "board.phases.beyondParent");
    }
    if (form.fedFromCircuitId() != null) {
      boolean onParent =
          circuits
              .findById(form.fedFromCircuitId())
              .map(circuit -> circuit.getBoard().getId().equals(parent.getId()))
              .orElse(false);
      if (!onParent) {
        throw new RuleViolation("fedFromCircuitId", "board.fedFrom.notOnParent");
      }
    }
    com.wayledger.engine.PhasePosition feed =
        form.fedFromCircuitId() == null
            ? null
            : circuits.findById(form.fedFromCircuitId()).map(Circuit::getPosition).orElse(null);
    java.util.List<com.wayledger.engine.SupplySystem> suppliable =
        parent.system().suppliesThrough(feed);
    if (!suppliable.contains(system)) {
      throw new RuleViolation(
          "supplySystem",
          "board.supplySystem.notFromFeed",
          suppliable.stream()
              .map(s -> com.wayledger.system.EnumWords.standard().of(s))
              .collect(java.util.stream.Collectors.joining(" or ")));
    }
    return parent;
  }

  /**
   * A board's own supply system belongs to the site's rule set and has the site's voltage to
   * neutral (the checks and the demand take U0 from the site), and a single-phase three-wire system
   * has no third line.
   */
  private static void checkOwnSupplySystem(
      Site site, BoardForm form, com.wayledger.engine.SupplySystem system) {
    if (form.supplySystem() != null) {
      boolean ofRuleSet =
          com.wayledger.engine.rules.RuleSets.of(site.getRuleSet())
              .supplySystems()
              .contains(form.supplySystem());
      if (!ofRuleSet) {
        throw new RuleViolation("supplySystem", "board.supplySystem.notOfRuleSet");
      }
      Double volts = form.supplySystem().lineToNeutralVolts();
      if (volts != null && Math.abs(volts - site.getNominalVoltageVolts()) > 0.5) {
        throw new RuleViolation(
            "supplySystem", "board.supplySystem.otherVoltage", site.getNominalVoltageVolts());
      }
    }
    if (system.hasTwoLines() && form.phases() == 3) {
      throw new RuleViolation("phases", "board.phases.twoLineSystem");
    }
  }
}
