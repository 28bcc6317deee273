package com.wayledger.board;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * Migration 17 on PostgreSQL: the widened CHECK constraints take the new load category and
 * change-log kind and still refuse unknown ones, and recorded maximum demands are append-only in
 * the database itself. Skips without a PostgreSQL database; fails in CI (CI=true).
 */
@EnabledWithPostgres
@SpringBootTest
@ActiveProfiles({"test", "demo"})
class PostgresDwellingIntegrationTests {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }

  @Autowired JdbcClient jdbc;

  private long anyLoad() {
    return jdbc.sql("SELECT MIN(id) FROM load_item").query(Long.class).single();
  }

  @Test
  void aLoadMayBeAClothesDryerButNotAnUnknownCategory() {
    long id = anyLoad();
    String before =
        jdbc.sql("SELECT category FROM load_item WHERE id = ?")
            .param(id)
            .query(String.class)
            .single();

    jdbc.sql("UPDATE load_item SET category = 'CLOTHES_DRYER' WHERE id = ?").param(id).update();
    assertThatThrownBy(
            () ->
                jdbc.sql("UPDATE load_item SET category = 'HOVERCRAFT' WHERE id = ?")
                    .param(id)
                    .update())
        .isInstanceOf(DataAccessException.class);

    jdbc.sql("UPDATE load_item SET category = ? WHERE id = ?").param(before).param(id).update();
  }

  @Test
  void recordedMaximumDemandsCannotBeChangedOrRemoved() {
    long siteId = jdbc.sql("SELECT MIN(id) FROM site").query(Long.class).single();
    long boardId =
        jdbc.sql("SELECT MIN(id) FROM board WHERE site_id = ?")
            .param(siteId)
            .query(Long.class)
            .single();
    jdbc.sql(
            "INSERT INTO measured_demand (site_id, board_id, username, period_start, period_end,"
                + " maximum_demand, demand_unit) VALUES (?, ?, 'fm', DATE '2025-01-01',"
                + " DATE '2025-12-31', 20, 'KVA')")
        .param(siteId)
        .param(boardId)
        .update();
    long id = jdbc.sql("SELECT MAX(id) FROM measured_demand").query(Long.class).single();

    assertThatThrownBy(
            () ->
                jdbc.sql("UPDATE measured_demand SET maximum_demand = 1 WHERE id = ?")
                    .param(id)
                    .update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
    assertThatThrownBy(
            () -> jdbc.sql("DELETE FROM measured_demand WHERE id = ?").param(id).update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM change_log WHERE kind = 'NOT_A_KIND'")
                .query(Long.class)
                .single())
        .isZero();
    assertThatThrownBy(
            () ->
                jdbc.sql(
                        "INSERT INTO change_log (site_id, username, kind, summary) VALUES (?, 'x',"
                            + " 'NOT_A_KIND', 'x')")
                    .param(siteId)
                    .update())
        .isInstanceOf(DataAccessException.class);
  }
}
