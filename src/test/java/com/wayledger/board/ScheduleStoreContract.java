package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.site.Site;
import com.wayledger.site.SiteForm;
import com.wayledger.site.SiteService;
import com.wayledger.system.RuleViolation;
import com.wayledger.system.StaleEditException;
import java.io.IOException;
import java.util.Arrays;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.core.io.support.PathMatchingResourcePatternResolver;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;

/**
 * What the stored schedule must guarantee on every supported database: migrations applied,
 * constraints enforced by the database itself, the one-circuit-per-position rule, cascades and
 * optimistic locking. Each database gets a subclass; all of them run these same tests.
 */
@SpringBootTest
@ActiveProfiles("test")
abstract class ScheduleStoreContract {

  @Autowired SiteService sites;
  @Autowired BoardService boards;
  @Autowired ScheduleService schedule;
  @Autowired JdbcClient jdbc;

  Site site;
  Board board;

  @BeforeEach
  void freshSiteAndBoard() {
    String name = "Store test " + UUID.randomUUID();
    site =
        sites.create(
            new SiteForm(
                name,
                null,
                EarthingSystem.TN_S,
                230.0,
                3,
                50.0,
                0.8,
                6.0,
                100.0,
                null,
                null,
                null));
    board = boards.create(site.getId(), board("DB-T", null));
  }

  static BoardForm board(String reference, Long parentId) {
    return new BoardForm(
        reference,
        "Test room",
        3,
        6,
        100.0,
        DeviceKind.MCCB,
        null,
        63.0,
        3,
        10.0,
        null,
        null,
        parentId,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        10.0,
        1.0,
        null,
        null,
        null,
        null);
  }

  static CircuitForm circuit(int way, PhasePosition position, String description) {
    CircuitForm blank = CircuitForm.blankAt(way, position);
    return new CircuitForm(
        way,
        position,
        description,
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        TripCurve.B,
        16.0,
        1,
        6.0,
        null,
        null,
        2.5,
        1.5,
        null,
        null,
        20.0,
        null,
        null,
        null,
        null,
        null,
        "Sockets",
        LoadCategory.SOCKET_OUTLETS,
        1,
        2000.0,
        RatingUnit.W,
        0.95,
        blank.version());
  }

  @Test
  void everyMigrationInDbFolderIsApplied() throws IOException {
    long scripts =
        Arrays.stream(
                new PathMatchingResourcePatternResolver()
                    .getResources("classpath:db/migration/V*.sql"))
            .count();
    Long applied =
        jdbc.sql("SELECT COUNT(*) FROM flyway_schema_history WHERE type = 'SQL' AND success = TRUE")
            .query(Long.class)
            .single();
    assertThat(applied).as("applied migrations vs scripts in db/").isEqualTo(scripts).isPositive();
  }

  @Test
  void circuitWithItsFirstLoadIsStoredAndReadBack() {
    Circuit saved =
        schedule.addCircuit(board.getId(), circuit(2, PhasePosition.L2, "Kitchen sockets"));
    Long loads =
        jdbc.sql("SELECT COUNT(*) FROM load_item WHERE circuit_id = ?")
            .param(saved.getId())
            .query(Long.class)
            .single();
    String phase =
        jdbc.sql("SELECT phase FROM way_slot WHERE circuit_id = ?")
            .param(saved.getId())
            .query(String.class)
            .single();
    assertThat(loads).as("first load stored with the circuit").isEqualTo(1L);
    assertThat(phase).as("position recorded in way_slot").isEqualTo("L2");
  }

  @Test
  void circuitLocationIsStoredReadBackChangedAndCleared() {
    Circuit saved =
        schedule.addCircuit(
            board.getId(),
            circuit(6, PhasePosition.L3, "Shower room lights")
                .at(com.wayledger.engine.CircuitLocation.BATH_OR_SHOWER));
    String stored =
        jdbc.sql("SELECT location FROM circuit WHERE id = ?")
            .param(saved.getId())
            .query(String.class)
            .single();
    assertThat(stored).as("location column").isEqualTo("BATH_OR_SHOWER");
    CircuitForm read = CircuitForm.of(schedule.circuit(saved.getId()));
    assertThat(read.location()).isEqualTo(com.wayledger.engine.CircuitLocation.BATH_OR_SHOWER);

    schedule.updateCircuit(saved.getId(), read.at(com.wayledger.engine.CircuitLocation.OUTDOORS));
    assertThat(schedule.circuit(saved.getId()).getLocation())
        .isEqualTo(com.wayledger.engine.CircuitLocation.OUTDOORS);
    schedule.updateCircuit(saved.getId(), CircuitForm.of(schedule.circuit(saved.getId())).at(null));
    assertThat(schedule.circuit(saved.getId()).getLocation()).as("cleared: not recorded").isNull();
  }

  @Test
  void secondCircuitOnAnOccupiedPositionIsRefused() {
    schedule.addCircuit(board.getId(), circuit(3, PhasePosition.L1, "First"));
    assertThatThrownBy(
            () -> schedule.addCircuit(board.getId(), circuit(3, PhasePosition.L1, "Second")))
        .isInstanceOf(RuleViolation.class)
        .extracting(e -> ((RuleViolation) e).messageCode())
        .isEqualTo("circuit.position.occupied");
    assertThat(circuitCount()).as("nothing half-saved").isEqualTo(1L);
  }

  @Test
  void threePoleCircuitBlocksEachLineOfItsWay() {
    schedule.addCircuit(board.getId(), circuit(4, PhasePosition.THREE_POLE, "Oven"));
    assertThatThrownBy(
            () -> schedule.addCircuit(board.getId(), circuit(4, PhasePosition.L3, "Lights")))
        .isInstanceOf(RuleViolation.class);
  }

  @Test
  void databaseItselfRefusesASecondCircuitInOnePosition() {
    Circuit first = schedule.addCircuit(board.getId(), circuit(5, PhasePosition.L1, "First"));
    assertThatThrownBy(
            () ->
                jdbc.sql(
                        "INSERT INTO way_slot (board_id, way_number, phase, circuit_id) VALUES (?, 5, 'L1', ?)")
                    .params(board.getId(), first.getId())
                    .update())
        .isInstanceOf(DataIntegrityViolationException.class);
  }

  @Test
  void mccbSettingsAreStoredReadBackAndRefusedAtZeroByTheDatabase() {
    CircuitForm mccb =
        new CircuitForm(
            1,
            PhasePosition.THREE_POLE,
            "Feeder",
            WayStatus.IN_USE,
            false,
            DeviceKind.MCCB,
            null,
            125.0,
            3,
            25.0,
            null,
            null,
            35.0,
            16.0,
            null,
            null,
            20.0,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            false,
            100.0,
            625.0);
    Circuit saved = schedule.addCircuit(board.getId(), mccb);
    assertThat(
            jdbc.sql("SELECT device_overload_setting_amps FROM circuit WHERE id = ?")
                .param(saved.getId())
                .query(Double.class)
                .single())
        .isEqualTo(100.0);
    assertThat(
            jdbc.sql("SELECT device_instantaneous_setting_amps FROM circuit WHERE id = ?")
                .param(saved.getId())
                .query(Double.class)
                .single())
        .isEqualTo(625.0);
    assertThat(schedule.circuit(saved.getId()).getDevice().label())
        .isEqualTo("MCCB 125 A (Ir 100 A, Ii 625 A)");

    Board fed =
        boards.update(
            board.getId(),
            BoardForm.of(boards.get(board.getId())).withIncomerMccbSettings(63.0, 315.0));
    assertThat(
            jdbc.sql("SELECT incomer_instantaneous_setting_amps FROM board WHERE id = ?")
                .param(fed.getId())
                .query(Double.class)
                .single())
        .isEqualTo(315.0);

    assertThatThrownBy(
            () ->
                jdbc.sql("UPDATE circuit SET device_overload_setting_amps = 0 WHERE id = ?")
                    .param(saved.getId())
                    .update())
        .as("Ir 0 A")
        .isInstanceOf(DataIntegrityViolationException.class);
    assertThatThrownBy(
            () ->
                jdbc.sql("UPDATE board SET incomer_instantaneous_setting_amps = -5 WHERE id = ?")
                    .param(board.getId())
                    .update())
        .as("Ii -5 A")
        .isInstanceOf(DataIntegrityViolationException.class);
  }

  @Test
  void databaseRefusesZeroRatingAndPowerFactorAboveOne() {
    assertThatThrownBy(
            () ->
                jdbc.sql(
                        "INSERT INTO circuit (board_id, way_number, position, description, status, device_kind, device_rating_amps)"
                            + " VALUES (?, 1, 'L1', 'Bad', 'IN_USE', 'MCB', 0)")
                    .param(board.getId())
                    .update())
        .as("device rating 0 A")
        .isInstanceOf(DataIntegrityViolationException.class);
    Circuit circuit = schedule.addCircuit(board.getId(), circuit(1, PhasePosition.L1, "Good"));
    assertThatThrownBy(
            () ->
                jdbc.sql(
                        "INSERT INTO load_item (circuit_id, line_number, description, category, quantity, rating_value,"
                            + " rating_unit, power_factor) VALUES (?, 9, 'Bad', 'OTHER', 1, 100, 'W', 1.2)")
                    .param(circuit.getId())
                    .update())
        .as("power factor 1.2")
        .isInstanceOf(DataIntegrityViolationException.class);
  }

  @Test
  void deletingABoardRemovesItsCircuitsAndLoads() {
    Circuit circuit = schedule.addCircuit(board.getId(), circuit(2, PhasePosition.L1, "Going"));
    boards.delete(board.getId());
    Long loads =
        jdbc.sql("SELECT COUNT(*) FROM load_item WHERE circuit_id = ?")
            .param(circuit.getId())
            .query(Long.class)
            .single();
    assertThat(circuitCount()).isZero();
    assertThat(loads).isZero();
  }

  @Test
  void staleSiteEditIsRefusedAndKeepsTheNewerValues() {
    SiteForm opened = SiteForm.of(sites.get(site.getId()));
    SiteForm first = withNotes(opened, "first editor");
    sites.update(site.getId(), first);
    assertThatThrownBy(() -> sites.update(site.getId(), withNotes(opened, "second editor")))
        .isInstanceOf(StaleEditException.class);
    assertThat(sites.get(site.getId()).getNotes()).isEqualTo("first editor");
  }

  @Test
  void boardTreeListsParentsBeforeTheirChildren() {
    Board child = boards.create(site.getId(), board("A-CHILD", board.getId()));
    boards.create(site.getId(), board("B-ROOT", null));
    assertThat(boards.tree(site.getId()))
        .extracting(node -> node.board().getReference() + "@" + node.depth())
        .containsExactly("B-ROOT@0", "DB-T@0", "A-CHILD@1");
    assertThat(child.getParent().getId()).isEqualTo(board.getId());
  }

  @Test
  void aBoardCannotBeFedFromItsOwnChild() {
    Board child = boards.create(site.getId(), board("CHILD", board.getId()));
    BoardForm loop = board("DB-T", child.getId());
    BoardForm withVersion =
        new BoardForm(
            loop.reference(),
            loop.location(),
            loop.phases(),
            loop.wayCount(),
            loop.busbarRatingAmps(),
            loop.incomerKind(),
            loop.incomerCurve(),
            loop.incomerRatingAmps(),
            loop.incomerPoles(),
            loop.incomerBreakingCapacityKiloAmps(),
            null,
            null,
            child.getId(),
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            null,
            10.0,
            1.0,
            null,
            null,
            null,
            null);
    assertThatThrownBy(() -> boards.update(board.getId(), withVersion))
        .isInstanceOf(RuleViolation.class)
        .extracting(e -> ((RuleViolation) e).messageCode())
        .isEqualTo("board.parent.cycle");
  }

  private long circuitCount() {
    return jdbc.sql("SELECT COUNT(*) FROM circuit WHERE board_id = ?")
        .param(board.getId())
        .query(Long.class)
        .single();
  }

  private static SiteForm withNotes(SiteForm form, String notes) {
    return new SiteForm(
        form.name(),
        form.address(),
        form.earthingSystem(),
        form.nominalVoltageVolts(),
        form.phases(),
        form.frequencyHertz(),
        form.externalLoopImpedanceOhms(),
        form.prospectiveFaultCurrentKiloAmps(),
        form.supplyFuseRatingAmps(),
        form.defaultDiversityMethod(),
        notes,
        form.version());
  }
}
