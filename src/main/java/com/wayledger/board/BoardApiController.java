package com.wayledger.board;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.WayStatus;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/** Boards, circuits and loads over JSON: the same operations and rules as the schedule pages. */
@RestController
@RequestMapping("/api")
@Tag(name = "Boards", description = "Boards, their circuits and loads")
public class BoardApiController {

  private final BoardService boards;
  private final ScheduleService schedule;
  private final BoardRepository boardRepository;
  private final com.wayledger.site.SiteService sites;

  public BoardApiController(
      BoardService boards,
      ScheduleService schedule,
      BoardRepository boardRepository,
      com.wayledger.site.SiteService sites) {
    this.boards = boards;
    this.schedule = schedule;
    this.boardRepository = boardRepository;
    this.sites = sites;
  }

  /**
   * A board in a list.
   *
   * @param supplySystem the system the board is on: its own ({@code fields.supplySystem}) or, when
   *     it records none, its site's
   * @param lineNames its lines as people name them, in the order of the codes L1, L2, L3 the API
   *     uses elsewhere ("A", "B" on a 120/240 V panel; "L1", "L2", "L3" on an IEC board)
   */
  public record BoardSummary(
      long id,
      String reference,
      String location,
      int phases,
      int wayCount,
      Long parentBoardId,
      Double incomerRatingAmps,
      long version,
      com.wayledger.engine.SupplySystem supplySystem,
      List<String> lineNames) {

    static BoardSummary of(Board board) {
      return new BoardSummary(
          board.getId(),
          board.getReference(),
          board.getLocation(),
          board.getPhases(),
          board.getWayCount(),
          board.getParent() == null ? null : board.getParent().getId(),
          board.getIncomer() == null ? null : board.getIncomer().getRatingAmps(),
          board.getVersion(),
          board.system(),
          java.util.Arrays.stream(com.wayledger.engine.Phase.values())
              .limit(board.lineCount())
              .map(board::lineName)
              .toList());
    }
  }

  public record LoadView(
      long id,
      String description,
      LoadCategory category,
      int quantity,
      double ratingValue,
      RatingUnit ratingUnit,
      double powerFactor,
      Double startUpSurgeMultiple,
      Double startUpSurgeMillis,
      boolean continuous,
      long version) {

    static LoadView of(LoadItem load) {
      return new LoadView(
          load.getId(),
          load.getDescription(),
          load.getCategory(),
          load.getQuantity(),
          load.getRatingValue(),
          load.getRatingUnit(),
          load.getPowerFactor(),
          load.getStartUpSurgeMultiple(),
          load.getStartUpSurgeMillis(),
          load.isContinuous(),
          load.getVersion());
    }
  }

  /** A load line's new values with the version they were read at. */
  public record LoadChange(@NotNull Long version, @Valid @NotNull LoadForm load) {}

  /**
   * A circuit as stored.
   *
   * @param position its lines as a code (L1, L1_L2, THREE_POLE), the API's contract
   * @param lines the same lines as people name them on its board: "B", "A–B" on a panelboard (in
   *     the order of its spaces), "L2", "L1–L2" on an IEC board
   */
  public record CircuitView(
      long id,
      int wayNumber,
      PhasePosition position,
      String lines,
      String description,
      WayStatus status,
      boolean lockedForBalancing,
      String device,
      String cable,
      CircuitForm fields,
      List<LoadView> loads) {

    static CircuitView of(Circuit circuit) {
      return new CircuitView(
          circuit.getId(),
          circuit.getWayNumber(),
          circuit.getPosition(),
          circuit.linesLabel(),
          circuit.getDescription(),
          circuit.getStatus(),
          circuit.isLockedForBalancing(),
          circuit.getDevice() == null ? null : circuit.getDevice().label(),
          circuit.getCable() == null
              ? null
              : circuit.getCable().label(circuit.getBoard().cableUnits()),
          CableUnitsOfForms.shown(CircuitForm.of(circuit), circuit.getBoard().cableUnits()),
          circuit.getLoads().stream().map(LoadView::of).toList());
    }
  }

  public record BoardDetail(BoardSummary board, BoardForm fields, List<CircuitView> circuits) {}

  @GetMapping("/sites/{siteId}/boards")
  @Operation(summary = "The boards of a site")
  public List<BoardSummary> onSite(@PathVariable long siteId) {
    return boards.onSite(siteId).stream().map(BoardSummary::of).toList();
  }

  @GetMapping("/boards/{id}")
  @Transactional(readOnly = true)
  @Operation(summary = "A board with its circuits and loads")
  public BoardDetail get(@PathVariable long id) {
    Board board =
        boardRepository
            .findWithCircuits(id)
            .orElseThrow(() -> new com.wayledger.system.NotFoundException("Board", id));
    return new BoardDetail(
        BoardSummary.of(board),
        CableUnitsOfForms.shown(BoardForm.of(board), board.cableUnits()),
        board.getCircuits().stream().map(CircuitView::of).toList());
  }

  @PostMapping("/sites/{siteId}/boards")
  @ResponseStatus(HttpStatus.CREATED)
  @Operation(summary = "Create a board on a site (editor)")
  public BoardSummary create(@PathVariable long siteId, @Valid @RequestBody BoardForm form) {
    return BoardSummary.of(
        boards.create(siteId, CableUnitsOfForms.stored(form, sites.get(siteId).cableUnits())));
  }

  @PutMapping("/boards/{id}")
  @Operation(summary = "Replace a board's fields (editor)")
  public BoardSummary update(@PathVariable long id, @Valid @RequestBody BoardForm form) {
    return BoardSummary.of(
        boards.update(id, CableUnitsOfForms.stored(form, boards.get(id).cableUnits())));
  }

  @PostMapping("/boards/{id}/circuits")
  @ResponseStatus(HttpStatus.CREATED)
  @Operation(summary = "Add a circuit, optionally with its first load (editor)")
  public long addCircuit(@PathVariable long id, @Valid @RequestBody CircuitForm form) {
    return schedule
        .addCircuit(id, CableUnitsOfForms.stored(form, boards.get(id).cableUnits()))
        .getId();
  }

  @GetMapping("/circuits/{id}")
  @Operation(summary = "A circuit with its loads; fields.version is what a change must send back")
  public CircuitView circuit(@PathVariable long id) {
    return schedule.readCircuit(id, CircuitView::of);
  }

  @PutMapping("/circuits/{id}")
  @Operation(
      summary =
          "Replace a circuit's fields (editor); send the version you read. A stale version gets"
              + " 409 with the values saved meanwhile in \"current\"")
  public CircuitView updateCircuit(@PathVariable long id, @Valid @RequestBody CircuitForm form) {
    if (form.version() == null) {
      throw new com.wayledger.system.RuleViolation("version", "api.version.required");
    }
    var units = schedule.readCircuit(id, circuit -> circuit.getBoard().cableUnits());
    schedule.updateCircuit(id, CableUnitsOfForms.stored(form, units));
    return circuit(id);
  }

  @GetMapping("/loads/{id}")
  @Operation(summary = "One load line with its version")
  public LoadView load(@PathVariable long id) {
    return LoadView.of(schedule.load(id));
  }

  @PutMapping("/loads/{id}")
  @Operation(
      summary =
          "Replace a load line (editor); send the version you read. A stale version gets 409 with"
              + " the values saved meanwhile in \"current\"")
  public LoadView updateLoad(@PathVariable long id, @Valid @RequestBody LoadChange change) {
    schedule.updateLoad(id, change.version(), change.load(), null);
    return load(id);
  }

  @DeleteMapping("/circuits/{id}")
  @ResponseStatus(HttpStatus.NO_CONTENT)
  @Operation(summary = "Delete a circuit and its loads (editor)")
  public void deleteCircuit(@PathVariable long id) {
    schedule.deleteCircuit(id);
  }

  @PostMapping("/circuits/{id}/loads")
  @ResponseStatus(HttpStatus.CREATED)
  @Operation(summary = "Add a load to a circuit (editor)")
  public long addLoad(@PathVariable long id, @Valid @RequestBody LoadForm form) {
    return schedule.addLoad(id, form).getId();
  }
}
