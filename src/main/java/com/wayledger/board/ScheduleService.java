package com.wayledger.board;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.system.NotFoundException;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import jakarta.persistence.EntityManager;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import java.util.Objects;
import java.util.Set;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Every change to a board's circuits and loads goes through here, so that the rules of a schedule (one
 * circuit per position, ways within the board, a device wherever the position is not empty) live in one
 * place. Each method is one transaction: a change is stored whole or not at all.
 */
@Service
public class ScheduleService {

  private final BoardRepository boards;
  private final CircuitRepository circuits;
  private final LoadItemRepository loads;
  private final JdbcClient jdbc;
  private final EntityManager entityManager;
  private final Validator validator;

  public ScheduleService(
      BoardRepository boards,
      CircuitRepository circuits,
      LoadItemRepository loads,
      JdbcClient jdbc,
      EntityManager entityManager,
      Validator validator) {
    this.boards = boards;
    this.circuits = circuits;
    this.loads = loads;
    this.jdbc = jdbc;
    this.entityManager = entityManager;
    this.validator = validator;
  }

  @Transactional(readOnly = true)
  public Circuit circuit(long id) {
    return circuits.findById(id).orElseThrow(() -> new NotFoundException("Circuit", id));
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
    Board board = boards.findById(boardId).orElseThrow(() -> new NotFoundException("Board", boardId));
    checkCircuitRules(board, form, null);
    LoadForm firstLoad = form.hasFirstLoad() ? checkedFirstLoad(form) : null;
    Circuit circuit = new Circuit(board);
    circuit.apply(form);
    if (firstLoad != null) {
      circuit.addLoad(new LoadItem(firstLoad));
    }
    circuits.save(circuit);
    occupy(board, circuit);
    board.markScheduleChanged();
    return circuit;
  }

  @Transactional
  public Circuit updateCircuit(long circuitId, CircuitForm form) {
    Circuit circuit = circuit(circuitId);
    if (form.version() != null && !Objects.equals(form.version(), circuit.getVersion())) {
      throw new StaleEditException("Circuit " + circuit.getDescription());
    }
    Board board = circuit.getBoard();
    checkCircuitRules(board, form, circuitId);
    circuit.apply(form);
    if (form.hasFirstLoad()) {
      circuit.addLoad(new LoadItem(checkedFirstLoad(form)));
    }
    occupy(board, circuit);
    board.markScheduleChanged();
    return circuit;
  }

  /**
   * Fits another protective device to an in-use circuit (for instance an accepted proposal), keeping its
   * cable and loads; refused when the circuit changed since the proposal was shown.
   */
  @Transactional
  public Circuit replaceDevice(long circuitId, long expectedVersion, com.wayledger.engine.DeviceSpec device) {
    Circuit circuit = circuit(circuitId);
    if (circuit.getVersion() != expectedVersion) {
      throw new StaleEditException("Circuit " + circuit.getDescription());
    }
    if (circuit.getStatus() == WayStatus.EMPTY) {
      throw new RuleViolation("deviceKind", "circuit.device.emptyPosition");
    }
    circuit.replaceDevice(DeviceDetails.fromSpec(device));
    circuit.getBoard().markScheduleChanged();
    entityManager.flush();
    return circuit;
  }

  /** Deletes a circuit with its loads; returns the id of the board it was on. */
  @Transactional
  public long deleteCircuit(long circuitId) {
    Circuit circuit = circuit(circuitId);
    Board board = circuit.getBoard();
    jdbc.sql("UPDATE board SET fed_from_circuit_id = NULL WHERE fed_from_circuit_id = ?")
        .param(circuitId)
        .update();
    circuits.delete(circuit);
    board.markScheduleChanged();
    return board.getId();
  }

  @Transactional
  public LoadItem addLoad(long circuitId, LoadForm form) {
    Circuit circuit = circuit(circuitId);
    if (circuit.getStatus() != WayStatus.IN_USE) {
      throw new RuleViolation("description", "load.circuit.notInUse");
    }
    LoadItem load = new LoadItem(form);
    circuit.addLoad(load);
    circuit.getBoard().markScheduleChanged();
    entityManager.flush();
    return load;
  }

  @Transactional
  public LoadItem updateLoad(long loadId, LoadForm form) {
    LoadItem load = load(loadId);
    load.apply(form);
    load.getCircuit().getBoard().markScheduleChanged();
    return load;
  }

  /** Deletes a load; returns the id of the circuit it was on. */
  @Transactional
  public long deleteLoad(long loadId) {
    LoadItem load = load(loadId);
    Circuit circuit = load.getCircuit();
    circuit.getLoads().remove(load);
    circuit.getBoard().markScheduleChanged();
    return circuit.getId();
  }

  private void checkCircuitRules(Board board, CircuitForm form, Long circuitId) {
    if (form.wayNumber() > board.getWayCount()) {
      throw new RuleViolation("wayNumber", "circuit.way.beyondBoard", board.getWayCount());
    }
    if (!board.isThreePhase() && form.position() != PhasePosition.L1) {
      throw new RuleViolation("position", "circuit.position.singlePhaseBoard");
    }
    if (form.status() != WayStatus.EMPTY && form.deviceKind() == null) {
      throw new RuleViolation("deviceKind", "circuit.device.required");
    }
    if (form.deviceKind() == DeviceKind.RCD && form.deviceResidualMilliAmps() == null) {
      throw new RuleViolation("deviceResidualMilliAmps", "circuit.device.residualRequired");
    }
    for (Phase phase : form.position().phases()) {
      Long holder =
          jdbc.sql(
                  "SELECT circuit_id FROM way_slot WHERE board_id = ? AND way_number = ? AND phase = ?")
              .params(board.getId(), form.wayNumber(), phase.name())
              .query(Long.class)
              .optional()
              .orElse(null);
      if (holder != null && !holder.equals(circuitId)) {
        throw new RuleViolation("wayNumber", "circuit.position.occupied", form.wayNumber(), phase.name());
      }
    }
  }

  private LoadForm checkedFirstLoad(CircuitForm form) {
    LoadForm load = form.firstLoad();
    Set<ConstraintViolation<LoadForm>> problems = validator.validate(load);
    if (!problems.isEmpty()) {
      ConstraintViolation<LoadForm> first =
          problems.stream()
              .sorted((a, b) -> a.getPropertyPath().toString().compareTo(b.getPropertyPath().toString()))
              .findFirst()
              .orElseThrow();
      String field = first.getPropertyPath().toString();
      throw new RuleViolation(
          "load" + Character.toUpperCase(field.charAt(0)) + field.substring(1), "load.invalid",
          first.getMessage());
    }
    if (form.status() != WayStatus.IN_USE) {
      throw new RuleViolation("loadDescription", "load.circuit.notInUse");
    }
    return load;
  }

  /** Rewrites the circuit's rows in way_slot; the primary key there refuses a second circuit per position. */
  private void occupy(Board board, Circuit circuit) {
    try {
      entityManager.flush();
      jdbc.sql("DELETE FROM way_slot WHERE circuit_id = ?").param(circuit.getId()).update();
      for (Phase phase : circuit.getPosition().phases()) {
        jdbc.sql("INSERT INTO way_slot (board_id, way_number, phase, circuit_id) VALUES (?, ?, ?, ?)")
            .params(board.getId(), circuit.getWayNumber(), phase.name(), circuit.getId())
            .update();
      }
    } catch (DataIntegrityViolationException raced) {
      throw new RuleViolation(
          "wayNumber", "circuit.position.occupied", circuit.getWayNumber(), circuit.getPosition().name());
    }
  }
}
