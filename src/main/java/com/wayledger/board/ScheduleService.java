package com.wayledger.board;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.system.ChangeKind;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RowLocks;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.ScheduleChanged;
import com.wayledger.system.StaleEditException;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import java.util.Objects;
import java.util.Set;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Every change to a board's circuits and loads goes through here, so that the rules of a schedule
 * (one circuit per position, ways within the board, a device wherever the position is not empty)
 * live in one place. Each method is one transaction: a change is stored whole or not at all,
 * together with its entry in the change log (a {@link ScheduleChanged} event, recorded by the
 * loadlog package in the same transaction). The optional {@code reason} (a work order, say) goes
 * into that entry.
 */
@Service
public class ScheduleService {

  private final BoardRepository boards;
  private final CircuitRepository circuits;
  private final LoadItemRepository loads;
  private final JdbcClient jdbc;
  private final RowLocks locks;
  private final Validator validator;
  private final ApplicationEventPublisher events;
  private final DwellingRepository dwellings;

  public ScheduleService(
      BoardRepository boards,
      CircuitRepository circuits,
      LoadItemRepository loads,
      JdbcClient jdbc,
      RowLocks locks,
      Validator validator,
      ApplicationEventPublisher events,
      DwellingRepository dwellings) {
    this.events = events;
    this.dwellings = dwellings;
    this.boards = boards;
    this.circuits = circuits;
    this.loads = loads;
    this.jdbc = jdbc;
    this.locks = locks;
    this.validator = validator;
  }

  @Transactional(readOnly = true)
  public Circuit circuit(long id) {
    return circuits.findById(id).orElseThrow(() -> new NotFoundException("Circuit", id));
  }

  /** The values the circuit takes from its board's or site's defaults. */
  @Transactional(readOnly = true)
  public java.util.List<Inheritance.InheritedValue> inheritedBy(long circuitId) {
    return Inheritance.of(circuit(circuitId));
  }

  /** Every form input the circuit's checks still lack (defaults counted), all at once. */
  @Transactional(readOnly = true)
  public java.util.List<String> missingInputs(long circuitId) {
    Circuit circuit = circuit(circuitId);
    return MissingInputs.of(
        circuit,
        MissingInputs.locationChecked(
            circuit.getBoard(), dwellings.existsById(circuit.getBoard().getId())));
  }

  /** A view of the circuit made inside a transaction, so that its loads can be read. */
  @Transactional(readOnly = true)
  public <T> T readCircuit(long id, java.util.function.Function<Circuit, T> view) {
    return view.apply(circuit(id));
  }

  /** The circuit's load lines, in order, loaded for display outside the transaction. */
  @Transactional(readOnly = true)
  public java.util.List<LoadItem> loadsOf(long circuitId) {
    return java.util.List.copyOf(circuit(circuitId).getLoads());
  }

  @Transactional(readOnly = true)
  public LoadItem load(long id) {
    return loads.findById(id).orElseThrow(() -> new NotFoundException("Load", id));
  }

  @Transactional
  public Circuit addCircuit(long boardId, CircuitForm form) {
    return addCircuit(boardId, form, null);
  }

  @Transactional
  public Circuit addCircuit(long boardId, CircuitForm form, String reason) {
    Board board = lockedBoard(boardId, false);
    checkCircuitRules(board, form, null);
    LoadForm firstLoad = form.hasFirstLoad() ? checkedFirstLoad(form) : null;
    Circuit circuit = new Circuit(board);
    circuit.apply(form);
    if (firstLoad != null) {
      circuit.addLoad(new LoadItem(firstLoad));
    }
    circuits.save(circuit);
    occupy(board, circuit);
    logged(circuit, ChangeKind.CIRCUIT_ADDED, "added", null, snapshot(circuit), reason);
    return circuit;
  }

  @Transactional
  public Circuit updateCircuit(long circuitId, CircuitForm form) {
    return updateCircuit(circuitId, form, null);
  }

  @Transactional
  public Circuit updateCircuit(long circuitId, CircuitForm form, String reason) {
    Circuit circuit = lockedCircuit(circuitId);
    if (form.version() != null && !Objects.equals(form.version(), circuit.getVersion())) {
      throw new StaleEditException("Circuit " + circuit.getDescription(), savedAsShown(circuit));
    }
    Board board = circuit.getBoard();
    checkCircuitRules(board, form, circuitId);
    checkFedBoardSystem(circuit, form.position());
    if (!form.hasFirstLoad() && CircuitForm.of(circuit).sameRowAs(form)) {
      return circuit; // nothing changed: nothing stored, nothing in the change log
    }
    var before = snapshot(circuit);
    CircuitForm beforeForm = CircuitForm.of(circuit);
    circuit.apply(form);
    if (form.hasFirstLoad()) {
      circuit.addLoad(new LoadItem(checkedFirstLoad(form)));
    }
    occupy(board, circuit);
    logged(
        circuit,
        ChangeKind.CIRCUIT_EDITED,
        changedWhat(
            CableUnitsOfForms.shown(beforeForm, board.cableUnits()),
            savedAsShown(circuit),
            form.hasFirstLoad()),
        before,
        snapshot(circuit),
        reason);
    return circuit;
  }

  /**
   * Fits another protective device to an in-use circuit (for instance an accepted proposal),
   * keeping its cable and loads; refused when the circuit changed since the proposal was shown.
   */
  @Transactional
  public Circuit replaceDevice(
      long circuitId, long expectedVersion, com.wayledger.engine.DeviceSpec device) {
    return replaceDevice(circuitId, expectedVersion, device, null);
  }

  /**
   * As {@link #replaceDevice(long, long, com.wayledger.engine.DeviceSpec)}, also fitting the
   * proposal's conductor (its size and metal; the rest of the cable as recorded) when it has one.
   */
  @Transactional
  public Circuit replaceDevice(
      long circuitId,
      long expectedVersion,
      com.wayledger.engine.DeviceSpec device,
      com.wayledger.engine.CableSpec conductor) {
    Circuit circuit = lockedCircuit(circuitId);
    if (circuit.getVersion() != expectedVersion) {
      throw new StaleEditException("Circuit " + circuit.getDescription(), savedAsShown(circuit));
    }
    if (circuit.getStatus() == WayStatus.EMPTY) {
      throw new RuleViolation("deviceKind", "circuit.device.emptyPosition");
    }
    com.wayledger.engine.CircuitSpec before = snapshot(circuit);
    circuit.replaceDevice(DeviceDetails.fromSpec(device), device.faultInterrupter());
    if (conductor != null) {
      circuit.replaceConductor(conductor.lineCsaSquareMillimetres(), conductor.material());
    }
    logged(
        circuit,
        ChangeKind.CIRCUIT_EDITED,
        "device replaced by the proposal " + circuit.getDevice().label(),
        before,
        snapshot(circuit),
        "device proposal accepted");
    return circuit;
  }

  /**
   * Moves single-pole circuits of one board to other ways and lines in one transaction (a balancing
   * plan or its undo): all of them or none; on a three-line panelboard two-pole, line-to-line
   * breakers too, each to a top space and the pair of lines its two spaces give. Refused when the
   * board changed since the plan was shown, when a circuit is locked, three-pole or on another
   * board, when a breaker would run off the panel, or when a target space is taken by a circuit
   * that stays.
   */
  @Transactional
  public void rearrange(
      long boardId, String expectedScheduleToken, java.util.List<Placement> placements) {
    rearrange(boardId, expectedScheduleToken, placements, null);
  }

  /**
   * As {@link #rearrange(long, String, java.util.List)}, with the reason recorded in the change
   * log.
   */
  @Transactional
  public void rearrange(
      long boardId,
      String expectedScheduleToken,
      java.util.List<Placement> placements,
      String reason) {
    Board board = lockedBoard(boardId, true);
    if (!scheduleToken(boardId).equals(expectedScheduleToken)) {
      throw new StaleEditException("Board " + board.getReference());
    }
    java.util.List<Circuit> moving = new java.util.ArrayList<>();
    for (Placement placement : placements) {
      Circuit circuit = circuit(placement.circuitId());
      if (!circuit.getBoard().getId().equals(boardId)) {
        throw new RuleViolation("placements", "balance.circuit.otherBoard", placement.circuitId());
      }
      // a two-pole, line-to-line breaker moves as a pair on a three-line panelboard only
      boolean pair =
          placement.poles() == 2
              && circuit.getPosition().isLineToLine()
              && board.isPanelboard()
              && board.panelSpaces().lines() == 3;
      if (circuit.isLockedForBalancing()
          || !(pair || (placement.poles() == 1 && circuit.getPosition().isSinglePole()))) {
        throw new RuleViolation("placements", "balance.circuit.fixed", circuit.getDescription());
      }
      if (placement.wayNumber() < 1 || placement.wayNumber() > board.getWayCount()) {
        throw new RuleViolation("placements", "circuit.way.beyondBoard", board.getWayCount());
      }
      if (board.isPanelboard()) {
        // a move on a panelboard is to a space; the space decides the line
        com.wayledger.engine.PanelSpaces panel = board.panelSpaces();
        if (panel.lineOf(placement.wayNumber()) != placement.phase()) {
          throw new RuleViolation("placements", "panel.move.wrongLine", placement.wayNumber());
        }
        if (pair
            && panel.fitOf(placement.wayNumber(), 2) != com.wayledger.engine.PanelSpaces.Fit.FITS) {
          throw new RuleViolation("placements", "circuit.way.beyondBoard", board.getWayCount());
        }
      } else if (!board.isThreePhase() && placement.phase() != com.wayledger.engine.Phase.L1) {
        throw new RuleViolation("placements", "circuit.position.singlePhaseBoard");
      }
      moving.add(circuit);
    }
    java.util.List<com.wayledger.engine.CircuitSpec> before =
        moving.stream().map(this::snapshot).toList();
    for (Circuit circuit : moving) {
      jdbc.sql("DELETE FROM way_slot WHERE circuit_id = ?").param(circuit.getId()).update();
    }
    for (int i = 0; i < moving.size(); i++) {
      moving.get(i).moveTo(placements.get(i).wayNumber(), placements.get(i).position());
    }
    for (Circuit circuit : moving) {
      occupy(board, circuit);
    }
    java.util.List<com.wayledger.engine.CircuitSpec> after =
        moving.stream().map(this::snapshot).toList();
    events.publishEvent(
        new ScheduleChanged(
            board.getSite().getId(),
            board.getId(),
            null,
            ChangeKind.BALANCING_APPLIED,
            "Phase balancing: " + moving.size() + " circuit(s) moved",
            before,
            after,
            reason));
  }

  /**
   * Applies edits to many circuits of one board as one change (a schedule brought back from a
   * spreadsheet): circuits added, changed (their own fields and their load lines, line by line) and
   * removed, all of them or none, recorded as one change-log entry of kind {@link
   * ChangeKind#IMPORT} whose snapshots list the circuits before (changed and removed) and after
   * (added and changed). Refused as stale when a circuit's edition is no longer the one the edit
   * was made from, and by the usual schedule rules (one circuit per position, ways within the
   * board, a device wherever the position is not empty).
   *
   * @return the number of circuits added, changed and removed
   */
  @Transactional
  public int[] applyEdits(
      long boardId, java.util.List<CircuitEdit> edits, String summary, String reason) {
    Board board = lockedBoard(boardId, true);
    java.util.List<Circuit> changed = new java.util.ArrayList<>();
    java.util.List<CircuitEdit> changes = new java.util.ArrayList<>();
    java.util.List<Circuit> removed = new java.util.ArrayList<>();
    for (CircuitEdit edit : edits) {
      if (edit.isAdded()) {
        continue;
      }
      Circuit circuit = circuit(edit.circuitId());
      if (!circuit.getBoard().getId().equals(boardId)) {
        throw new NotFoundException("Circuit", edit.circuitId());
      }
      if (edit.expectedVersion() != null
          && !edit.expectedVersion().equals(circuit.recordVersion())) {
        throw new StaleEditException("Circuit " + circuit.getDescription(), savedAsShown(circuit));
      }
      if (edit.isRemoved()) {
        removed.add(circuit);
      } else {
        changed.add(circuit);
        changes.add(edit);
      }
    }
    java.util.List<com.wayledger.engine.CircuitSpec> before = new java.util.ArrayList<>();
    changed.forEach(circuit -> before.add(snapshot(circuit)));
    removed.forEach(circuit -> before.add(snapshot(circuit)));
    // free every position that moves or goes before taking any, so that two circuits may swap
    for (Circuit circuit : changed) {
      jdbc.sql("DELETE FROM way_slot WHERE circuit_id = ?").param(circuit.getId()).update();
    }
    for (Circuit circuit : removed) {
      jdbc.sql("DELETE FROM way_slot WHERE circuit_id = ?").param(circuit.getId()).update();
      jdbc.sql("UPDATE board SET fed_from_circuit_id = NULL WHERE fed_from_circuit_id = ?")
          .param(circuit.getId())
          .update();
      board.getCircuits().remove(circuit);
      circuits.delete(circuit);
    }
    java.util.List<Circuit> touched = new java.util.ArrayList<>();
    for (int i = 0; i < changed.size(); i++) {
      Circuit circuit = changed.get(i);
      CircuitEdit edit = changes.get(i);
      checkCircuitRules(board, edit.circuit(), circuit.getId());
      checkFedBoardSystem(circuit, edit.circuit().position());
      checkLoads(edit);
      circuit.apply(edit.circuit());
      replaceLoads(circuit, edit.loads());
      occupy(board, circuit);
      touched.add(circuit);
    }
    int added = 0;
    for (CircuitEdit edit : edits) {
      if (!edit.isAdded()) {
        continue;
      }
      checkCircuitRules(board, edit.circuit(), null);
      checkLoads(edit);
      Circuit circuit = new Circuit(board);
      circuit.apply(edit.circuit());
      edit.loads().forEach(load -> circuit.addLoad(new LoadItem(load)));
      circuits.save(circuit);
      occupy(board, circuit);
      touched.add(circuit);
      added++;
    }
    java.util.List<com.wayledger.engine.CircuitSpec> after =
        touched.stream().map(this::snapshot).toList();
    events.publishEvent(
        new ScheduleChanged(
            board.getSite().getId(),
            board.getId(),
            null,
            ChangeKind.IMPORT,
            summary,
            before,
            after,
            reason));
    return new int[] {added, changed.size(), removed.size()};
  }

  private void checkLoads(CircuitEdit edit) {
    if (!edit.loads().isEmpty() && edit.circuit().status() != WayStatus.IN_USE) {
      throw new RuleViolation("loads", "load.circuit.notInUse");
    }
    for (LoadForm load : edit.loads()) {
      Set<ConstraintViolation<LoadForm>> problems = validator.validate(load);
      if (!problems.isEmpty()) {
        throw new RuleViolation("loads", "load.invalid", problems.iterator().next().getMessage());
      }
    }
  }

  /** The circuit's load lines made equal to {@code wanted}, line by line, keeping their ids. */
  private void replaceLoads(Circuit circuit, java.util.List<LoadForm> wanted) {
    java.util.List<LoadItem> stored = new java.util.ArrayList<>(circuit.getLoads());
    for (int i = 0; i < Math.max(stored.size(), wanted.size()); i++) {
      if (i >= wanted.size()) {
        circuit.getLoads().remove(stored.get(i));
      } else if (i >= stored.size()) {
        LoadItem load = new LoadItem(wanted.get(i));
        circuit.addLoad(load);
        loads.save(load);
      } else if (!LoadForm.of(stored.get(i)).equals(wanted.get(i))) {
        stored.get(i).apply(wanted.get(i));
      }
    }
  }

  /** Deletes a circuit with its loads; returns the id of the board it was on. */
  @Transactional
  public long deleteCircuit(long circuitId) {
    return deleteCircuit(circuitId, null);
  }

  /** Deletes a circuit with its loads; returns the id of the board it was on. */
  @Transactional
  public long deleteCircuit(long circuitId, String reason) {
    Circuit circuit = lockedCircuit(circuitId);
    Board board = circuit.getBoard();
    logged(circuit, ChangeKind.CIRCUIT_REMOVED, "removed", snapshot(circuit), null, reason);
    jdbc.sql("UPDATE board SET fed_from_circuit_id = NULL WHERE fed_from_circuit_id = ?")
        .param(circuitId)
        .update();
    circuits.delete(circuit);
    return board.getId();
  }

  @Transactional
  public LoadItem addLoad(long circuitId, LoadForm form) {
    return addLoad(circuitId, form, null);
  }

  @Transactional
  public LoadItem addLoad(long circuitId, LoadForm form, String reason) {
    Circuit circuit = lockedCircuit(circuitId);
    if (circuit.getStatus() != WayStatus.IN_USE) {
      throw new RuleViolation("description", "load.circuit.notInUse");
    }
    var before = snapshot(circuit);
    LoadItem load = new LoadItem(form);
    circuit.addLoad(load);
    loads.save(load);
    logged(
        circuit,
        ChangeKind.LOAD_ADDED,
        "load “" + load.getDescription() + "” added",
        before,
        snapshot(circuit),
        reason);
    return load;
  }

  @Transactional
  public LoadItem updateLoad(long loadId, LoadForm form) {
    return updateLoad(loadId, form, null);
  }

  @Transactional
  public LoadItem updateLoad(long loadId, LoadForm form, String reason) {
    return updateLoad(loadId, null, form, reason);
  }

  /**
   * Saves an edited load line; refused as stale when {@code expectedVersion} is given and the line
   * was saved by someone else since (the exception carries the values saved meanwhile).
   */
  @Transactional
  public LoadItem updateLoad(long loadId, Long expectedVersion, LoadForm form, String reason) {
    LoadItem load = lockedLoad(loadId);
    if (expectedVersion != null && expectedVersion != load.getVersion()) {
      throw new StaleEditException("Load " + load.getDescription(), LoadForm.of(load));
    }
    var before = snapshot(load.getCircuit());
    load.apply(form);
    logged(
        load.getCircuit(),
        ChangeKind.LOAD_EDITED,
        "load “" + load.getDescription() + "” changed",
        before,
        snapshot(load.getCircuit()),
        reason);
    return load;
  }

  /** Deletes a load; returns the id of the circuit it was on. */
  @Transactional
  public long deleteLoad(long loadId) {
    return deleteLoad(loadId, null);
  }

  /** Deletes a load; returns the id of the circuit it was on. */
  @Transactional
  public long deleteLoad(long loadId, String reason) {
    LoadItem load = lockedLoad(loadId);
    Circuit circuit = load.getCircuit();
    var before = snapshot(circuit);
    circuit.getLoads().remove(load);
    logged(
        circuit,
        ChangeKind.LOAD_REMOVED,
        "load “" + load.getDescription() + "” removed",
        before,
        snapshot(circuit),
        reason);
    return circuit.getId();
  }

  /**
   * A token that changes whenever anything a balancing plan depends on changes (any circuit or load
   * line of the board saved, added or removed): the plan shown is applied only while it still
   * matches. Made from the records' own versions, so no board-wide version has to move on every
   * circuit edit.
   */
  @Transactional(readOnly = true)
  public String scheduleToken(long boardId) {
    StringBuilder state = new StringBuilder();
    jdbc.sql("SELECT id, version FROM circuit WHERE board_id = ? ORDER BY id")
        .param(boardId)
        .query(
            (java.sql.ResultSet rs) -> {
              state.append('c').append(rs.getLong(1)).append('.').append(rs.getLong(2));
            });
    jdbc.sql(
            "SELECT l.id, l.version FROM load_item l JOIN circuit c ON c.id = l.circuit_id"
                + " WHERE c.board_id = ? ORDER BY l.id")
        .param(boardId)
        .query(
            (java.sql.ResultSet rs) -> {
              state.append('l').append(rs.getLong(1)).append('.').append(rs.getLong(2));
            });
    try {
      byte[] digest =
          java.security.MessageDigest.getInstance("SHA-256")
              .digest(state.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
      return java.util.HexFormat.of().formatHex(digest, 0, 12);
    } catch (java.security.NoSuchAlgorithmException impossible) {
      throw new IllegalStateException(impossible);
    }
  }

  // --- row locks: parent shared, the record itself exclusive, always in this order ---

  private Board lockedBoard(long boardId, boolean exclusive) {
    // The site first: every change of a site also moves the site's data generation (a row update
    // just before commit) and appends to its change log under a per-site lock, so every change
    // takes the site row at its start, then the board, then the record. One order, no deadlock;
    // changes of one site wait for each other instead of being refused.
    Long siteId =
        boards.findSiteIdOf(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    locks.exclusive("site", siteId);
    boolean found = exclusive ? locks.exclusive("board", boardId) : locks.shared("board", boardId);
    if (!found) {
      throw new NotFoundException("Board", boardId);
    }
    return boards.findById(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
  }

  private Circuit lockedCircuit(long circuitId) {
    Long boardId =
        jdbc.sql("SELECT board_id FROM circuit WHERE id = ?")
            .param(circuitId)
            .query(Long.class)
            .optional()
            .orElseThrow(() -> new NotFoundException("Circuit", circuitId));
    lockedBoard(boardId, false);
    if (!locks.exclusive("circuit", circuitId)) {
      throw new NotFoundException("Circuit", circuitId);
    }
    return circuit(circuitId);
  }

  private LoadItem lockedLoad(long loadId) {
    Long boardId =
        jdbc.sql(
                "SELECT c.board_id FROM load_item l JOIN circuit c ON c.id = l.circuit_id"
                    + " WHERE l.id = ?")
            .param(loadId)
            .query(Long.class)
            .optional()
            .orElseThrow(() -> new NotFoundException("Load", loadId));
    lockedBoard(boardId, false);
    if (!locks.exclusive("load_item", loadId)) {
      throw new NotFoundException("Load", loadId);
    }
    return load(loadId);
  }

  // --- change log (loadlog): each change publishes one event, recorded in this transaction ---

  private com.wayledger.engine.CircuitSpec snapshot(Circuit circuit) {
    Long feeds =
        circuit.getId() == null
            ? null
            : jdbc.sql("SELECT id FROM board WHERE fed_from_circuit_id = ?")
                .param(circuit.getId())
                .query(Long.class)
                .optional()
                .orElse(null);
    return ScheduleMapper.snapshotOf(circuit, feeds);
  }

  /** The stored row in its site's units: what a 409 hands back as the values saved meanwhile. */
  private static CircuitForm savedAsShown(Circuit circuit) {
    return CableUnitsOfForms.shown(CircuitForm.of(circuit), circuit.getBoard().cableUnits());
  }

  /** "changed In (A) 16 → 20; Device MCB → RCBO", so a log line says what changed. */
  static String changedWhat(CircuitForm before, CircuitForm after, boolean loadAdded) {
    String fields =
        com.wayledger.system.RecordDiff.describe(after.changedFields(before), "circuit", 6);
    if (fields.isEmpty()) {
      return loadAdded ? "load added" : "changed";
    }
    return "changed " + fields + (loadAdded ? "; load added" : "");
  }

  private void logged(
      Circuit circuit, ChangeKind kind, String what, Object before, Object after, String reason) {
    Board board = circuit.getBoard();
    String summary =
        // in the board's words, as its page names the position: "Space 5 A" on a panelboard
        (board.isPanelboard() ? "Space " : "Way ")
            + circuit.positionLabel()
            + " “"
            + circuit.getDescription()
            + "”: "
            + what;
    events.publishEvent(
        new ScheduleChanged(
            board.getSite().getId(),
            board.getId(),
            circuit.getId(),
            kind,
            summary,
            before,
            after,
            reason));
  }

  /**
   * A way that feeds a board may take another position only where that board's supply system can
   * still come from it (two poles of a 208Y/120 V panel feed a 120/208 V panel, three poles a
   * 208Y/120 V one): else the move is refused beside the position, naming the board and its system,
   * and nothing is saved. Balancing never moves a feeder of a board off its pair or lines (one-pole
   * breakers and two-pole loads only), so its feed keeps its system.
   */
  private void checkFedBoardSystem(Circuit circuit, PhasePosition newPosition) {
    if (newPosition == null || newPosition == circuit.getPosition()) {
      return;
    }
    java.util.Optional<Board> fed =
        jdbc.sql("SELECT id FROM board WHERE fed_from_circuit_id = ?")
            .param(circuit.getId())
            .query(Long.class)
            .optional()
            .flatMap(boards::findById);
    if (fed.isEmpty()) {
      return;
    }
    com.wayledger.engine.SupplySystem fedSystem = fed.get().system();
    java.util.List<com.wayledger.engine.SupplySystem> possible =
        circuit.getBoard().system().suppliesThrough(newPosition);
    if (fedSystem != null && !possible.contains(fedSystem)) {
      throw new RuleViolation(
          "position",
          "circuit.position.feedsOtherSystem",
          fed.get().getReference(),
          com.wayledger.system.EnumWords.standard().of(fedSystem),
          possible.stream()
              .map(s -> com.wayledger.system.EnumWords.standard().of(s))
              .collect(java.util.stream.Collectors.joining(" or ")));
    }
  }

  private void checkCircuitRules(Board board, CircuitForm form, Long circuitId) {
    if (board.isPanelboard()) {
      checkPanelSpaces(board, form, circuitId);
    } else if (form.wayNumber() > board.getWayCount()) {
      throw new RuleViolation("wayNumber", "circuit.way.beyondBoard", board.getWayCount());
    }
    // on a panelboard the lines follow from the space, but a position naming a line the board has
    // not (B–C on a 120/240 V panel) is refused, not silently moved
    if (!board.getPositions().contains(form.position())) {
      throw new RuleViolation(
          "position",
          board.lineCount() == 1
              ? "circuit.position.singlePhaseBoard"
              : "circuit.position.notOnThisBoard");
    }
    if (form.status() != WayStatus.EMPTY && form.deviceKind() == null) {
      throw new RuleViolation("deviceKind", "circuit.device.required");
    }
    if (form.deviceKind() == DeviceKind.RCD && form.deviceResidualMilliAmps() == null) {
      throw new RuleViolation("deviceResidualMilliAmps", "circuit.device.residualRequired");
    }
    com.wayledger.engine.rules.RuleSet rules =
        com.wayledger.engine.rules.RuleSets.of(board.getSite().getRuleSet());
    if (form.location() != null && !rules.circuitLocations().contains(form.location())) {
      throw new RuleViolation("location", "circuit.location.otherRuleSet", rules.title());
    }
    if (form.deviceFaultInterrupter() != null && form.status() != WayStatus.EMPTY) {
      if (!rules.usesAwgAndFeet()) {
        throw new RuleViolation(
            "deviceFaultInterrupter", "circuit.device.faultInterrupterNecOnly", rules.title());
      }
      if (form.deviceKind() == DeviceKind.FUSE || form.deviceKind() == DeviceKind.RCD) {
        throw new RuleViolation(
            "deviceFaultInterrupter", "circuit.device.faultInterrupterBreakerOnly");
      }
    }
    if (form.cableConduit() != null
        && form.status() == WayStatus.IN_USE
        && !rules.usesAwgAndFeet()) {
      throw new RuleViolation("cableConduit", "circuit.cable.conduitNecOnly", rules.title());
    }
    MccbSettingRules.check(
        form.deviceKind(),
        form.deviceRatingAmps(),
        form.deviceOverloadSettingAmps(),
        form.deviceInstantaneousSettingAmps(),
        "deviceOverloadSettingAmps",
        "deviceInstantaneousSettingAmps");
    for (Phase phase :
        board.isPanelboard() ? java.util.Set.<Phase>of() : form.position().phases()) {
      Long holder =
          jdbc.sql(
                  "SELECT circuit_id FROM way_slot WHERE board_id = ? AND way_number = ? AND phase = ?")
              .params(board.getId(), form.wayNumber(), phase.name())
              .query(Long.class)
              .optional()
              .orElse(null);
      if (holder != null && !holder.equals(circuitId)) {
        throw new RuleViolation(
            "wayNumber", "circuit.position.occupied", form.wayNumber(), phase.name());
      }
    }
  }

  /**
   * A panelboard breaker (its first space is the way number, its poles those of the position) must
   * fit the panel and share no space with another breaker; its lines follow from the spaces.
   */
  private void checkPanelSpaces(Board board, CircuitForm form, Long circuitId) {
    com.wayledger.engine.PanelSpaces panel = board.panelSpaces();
    int first = form.wayNumber();
    int poles = form.position().poles();
    switch (panel.fitOf(first, poles)) {
      case NO_SUCH_SPACE ->
          throw new RuleViolation("wayNumber", "panel.space.notOnPanel", panel.spaceCount());
      case TOO_MANY_POLES ->
          throw new RuleViolation("position", "panel.poles.tooMany", board.lineCount());
      case RUNS_PAST_BOTTOM ->
          throw new RuleViolation(
              "wayNumber", "panel.space.runsPastBottom", first, poles, panel.spaceCount());
      case FITS -> {}
    }
    for (Circuit other : circuits.findByBoard(board.getId())) {
      if (other.getId().equals(circuitId)) {
        continue;
      }
      int otherPoles = other.getPosition().poles();
      if (panel.fitOf(other.getWayNumber(), otherPoles)
          != com.wayledger.engine.PanelSpaces.Fit.FITS) {
        continue; // stored before spaces were checked; the database slots still guard it
      }
      int shared = panel.sharedSpace(first, poles, other.getWayNumber(), otherPoles);
      if (shared > 0) {
        throw new RuleViolation("wayNumber", "panel.space.taken", shared, other.getDescription());
      }
    }
  }

  private LoadForm checkedFirstLoad(CircuitForm form) {
    LoadForm load = form.firstLoad();
    Set<ConstraintViolation<LoadForm>> problems = validator.validate(load);
    if (!problems.isEmpty()) {
      ConstraintViolation<LoadForm> first =
          problems.stream()
              .sorted(
                  (a, b) ->
                      a.getPropertyPath().toString().compareTo(b.getPropertyPath().toString()))
              .findFirst()
              .orElseThrow();
      String field = first.getPropertyPath().toString();
      throw new RuleViolation(
          "load" + Character.toUpperCase(field.charAt(0)) + field.substring(1),
          "load.invalid",
          first.getMessage());
    }
    if (form.status() != WayStatus.IN_USE) {
      throw new RuleViolation("loadDescription", "load.circuit.notInUse");
    }
    return load;
  }

  /**
   * Rewrites the circuit's rows in way_slot; the primary key there refuses a second circuit per
   * position.
   */
  private void occupy(Board board, Circuit circuit) {
    try {
      jdbc.sql("DELETE FROM way_slot WHERE circuit_id = ?").param(circuit.getId()).update();
      if (board.isPanelboard()) {
        // one row per space the breaker takes, keyed by that space and its line: a space holds
        // one pole, so the primary key refuses two breakers sharing a space
        com.wayledger.engine.PanelSpaces panel = board.panelSpaces();
        for (int space : panel.spacesOf(circuit.getWayNumber(), circuit.getPosition().poles())) {
          jdbc.sql(
                  "INSERT INTO way_slot (board_id, way_number, phase, circuit_id) VALUES (?, ?, ?, ?)")
              .params(board.getId(), space, panel.lineOf(space).name(), circuit.getId())
              .update();
        }
        return;
      }
      for (Phase phase : circuit.getPosition().phases()) {
        jdbc.sql(
                "INSERT INTO way_slot (board_id, way_number, phase, circuit_id) VALUES (?, ?, ?, ?)")
            .params(board.getId(), circuit.getWayNumber(), phase.name(), circuit.getId())
            .update();
      }
    } catch (DataIntegrityViolationException raced) {
      throw new RuleViolation(
          "wayNumber",
          "circuit.position.occupied",
          circuit.getWayNumber(),
          circuit.getPosition().label());
    }
  }
}
