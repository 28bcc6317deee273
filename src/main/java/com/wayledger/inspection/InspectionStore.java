package com.wayledger.inspection;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.inspection.BoardResults;
import com.wayledger.engine.inspection.CircuitResults;
import com.wayledger.engine.inspection.Outcome;
import com.wayledger.engine.inspection.Urgency;
import java.sql.Date;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.util.List;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * Stores and reads inspections. Append-only: this class only INSERTs and SELECTs; there is
 * deliberately no method that changes or removes a record (on PostgreSQL the database refuses it
 * too, migration 11.1).
 */
@Repository
public class InspectionStore {

  static final JsonMapper JSON =
      JsonMapper.builder()
          .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
          .disable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
          .build();

  private final JdbcClient jdbc;

  public InspectionStore(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** Writes a new record with its rows; returns its id. Call inside the caller's transaction. */
  long insert(InspectionRecord r) {
    KeyHolder key = new GeneratedKeyHolder();
    BoardResults b = r.boardResults();
    jdbc.sql(
            "INSERT INTO inspection (site_id, board_id, board_reference, inspected_on, inspector,"
                + " instruments, test_celsius, insulation_test_volts, ze_ohms, pfc_kiloamps,"
                + " electrode_ohms, main_bonding_present, outcome, schedule_log_entry_id,"
                + " corrects_id, notes, recorded_by, recorded_at)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
        .params(
            r.siteId(),
            r.boardId(),
            r.boardReference(),
            Date.valueOf(r.inspectedOn()),
            r.inspector(),
            r.instruments(),
            r.testCelsius(),
            r.insulationTestVolts(),
            b.externalLoopImpedanceOhms(),
            b.prospectiveFaultKiloAmps(),
            b.earthElectrodeOhms(),
            b.mainBondingPresent(),
            r.outcome().name(),
            r.scheduleLogEntryId(),
            r.correctsId(),
            r.notes(),
            r.recordedBy(),
            Timestamp.from(r.recordedAt()))
        .update(key, "id");
    long id = key.getKey().longValue();
    int line = 0;
    for (ResultRow row : r.results()) {
      CircuitResults m = row.results();
      jdbc.sql(
              "INSERT INTO inspection_result (inspection_id, circuit_id, line_number, way_label,"
                  + " description, circuit_snapshot, r1_plus_r2_ohms, r2_ohms, ring_line_ohms,"
                  + " ring_neutral_ohms, ring_protective_ohms, ir_line_line_megaohms,"
                  + " ir_line_earth_megaohms, ir_neutral_earth_megaohms, polarity_correct, zs_ohms,"
                  + " rcd_rated_ms, rcd_five_times_ms, rcd_button_works, rcd_delayed)"
                  + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
          .params(
              id,
              row.circuitId(),
              ++line,
              row.wayLabel(),
              row.description(),
              JSON.writeValueAsString(row.recorded()),
              m.r1PlusR2Ohms(),
              m.r2Ohms(),
              m.ringLineOhms(),
              m.ringNeutralOhms(),
              m.ringProtectiveOhms(),
              m.insulationLineLineMegaohms(),
              m.insulationLineEarthMegaohms(),
              m.insulationNeutralEarthMegaohms(),
              m.polarityCorrect(),
              m.loopImpedanceOhms(),
              m.rcdRatedMillis(),
              m.rcdFiveTimesMillis(),
              m.rcdButtonWorks(),
              m.rcdDelayed())
          .update();
    }
    line = 0;
    for (Observation o : r.observations()) {
      jdbc.sql(
              "INSERT INTO inspection_observation (inspection_id, line_number, circuit_id,"
                  + " way_label, urgency, text, origin) VALUES (?, ?, ?, ?, ?, ?, ?)")
          .params(
              id,
              ++line,
              o.circuitId(),
              o.wayLabel(),
              o.urgency().name(),
              o.text(),
              o.origin().name())
          .update();
    }
    return id;
  }

  /** A record with its rows. */
  public Optional<InspectionRecord> find(long id) {
    return jdbc.sql("SELECT * FROM inspection WHERE id = ?")
        .param(id)
        .query(InspectionStore::header)
        .optional()
        .map(
            h ->
                new InspectionRecord(
                    h.id(),
                    h.siteId(),
                    h.boardId(),
                    h.boardReference(),
                    h.inspectedOn(),
                    h.inspector(),
                    h.instruments(),
                    h.testCelsius(),
                    h.insulationTestVolts(),
                    h.boardResults(),
                    h.outcome(),
                    h.scheduleLogEntryId(),
                    h.correctsId(),
                    h.notes(),
                    h.recordedBy(),
                    h.recordedAt(),
                    results(id),
                    observations(id)));
  }

  /** A board's records without their rows, newest inspection first. */
  public List<InspectionRecord> ofBoard(long boardId) {
    return jdbc.sql(
            "SELECT * FROM inspection WHERE board_id = ? ORDER BY inspected_on DESC, id DESC")
        .param(boardId)
        .query(InspectionStore::header)
        .list();
  }

  /** The ids of the records that correct each record of a board (corrected id → correcting id). */
  public java.util.Map<Long, Long> correctionsOnBoard(long boardId) {
    java.util.Map<Long, Long> out = new java.util.HashMap<>();
    jdbc.sql(
            "SELECT corrects_id, id FROM inspection WHERE board_id = ? AND corrects_id IS NOT NULL"
                + " ORDER BY id")
        .param(boardId)
        .query(
            (rs, n) -> {
              out.put(rs.getLong(1), rs.getLong(2));
              return null;
            })
        .list();
    return out;
  }

  private List<ResultRow> results(long inspectionId) {
    return jdbc.sql("SELECT * FROM inspection_result WHERE inspection_id = ? ORDER BY line_number")
        .param(inspectionId)
        .query(
            (rs, n) ->
                new ResultRow(
                    rs.getLong("circuit_id"),
                    rs.getString("way_label"),
                    rs.getString("description"),
                    JSON.readValue(rs.getString("circuit_snapshot"), CircuitSpec.class),
                    new CircuitResults(
                        dbl(rs, "r1_plus_r2_ohms"),
                        dbl(rs, "r2_ohms"),
                        dbl(rs, "ring_line_ohms"),
                        dbl(rs, "ring_neutral_ohms"),
                        dbl(rs, "ring_protective_ohms"),
                        dbl(rs, "ir_line_line_megaohms"),
                        dbl(rs, "ir_line_earth_megaohms"),
                        dbl(rs, "ir_neutral_earth_megaohms"),
                        bool(rs, "polarity_correct"),
                        dbl(rs, "zs_ohms"),
                        dbl(rs, "rcd_rated_ms"),
                        dbl(rs, "rcd_five_times_ms"),
                        bool(rs, "rcd_button_works"),
                        rs.getBoolean("rcd_delayed"))))
        .list();
  }

  private List<Observation> observations(long inspectionId) {
    return jdbc.sql(
            "SELECT * FROM inspection_observation WHERE inspection_id = ? ORDER BY line_number")
        .param(inspectionId)
        .query(
            (rs, n) ->
                new Observation(
                    (Long) rs.getObject("circuit_id", Long.class),
                    rs.getString("way_label"),
                    Urgency.valueOf(rs.getString("urgency")),
                    rs.getString("text"),
                    ObservationOrigin.valueOf(rs.getString("origin"))))
        .list();
  }

  private static InspectionRecord header(ResultSet rs, int row) throws SQLException {
    return new InspectionRecord(
        rs.getLong("id"),
        rs.getLong("site_id"),
        rs.getLong("board_id"),
        rs.getString("board_reference"),
        rs.getDate("inspected_on").toLocalDate(),
        rs.getString("inspector"),
        rs.getString("instruments"),
        rs.getDouble("test_celsius"),
        dbl(rs, "insulation_test_volts"),
        new BoardResults(
            dbl(rs, "ze_ohms"),
            dbl(rs, "pfc_kiloamps"),
            dbl(rs, "electrode_ohms"),
            bool(rs, "main_bonding_present")),
        Outcome.valueOf(rs.getString("outcome")),
        (Long) rs.getObject("schedule_log_entry_id", Long.class),
        (Long) rs.getObject("corrects_id", Long.class),
        rs.getString("notes"),
        rs.getString("recorded_by"),
        rs.getTimestamp("recorded_at").toInstant(),
        List.of(),
        List.of());
  }

  private static Double dbl(ResultSet rs, String column) throws SQLException {
    return (Double) rs.getObject(column, Double.class);
  }

  private static Boolean bool(ResultSet rs, String column) throws SQLException {
    return (Boolean) rs.getObject(column, Boolean.class);
  }
}
