package com.wayledger.inspection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * On PostgreSQL the database itself refuses to change or remove inspection rows, even for the
 * connection that owns the tables (migration 11.1). Uses the demo's inspections. Skips without a
 * PostgreSQL database; fails in CI (CI=true).
 */
@EnabledWithPostgres
@SpringBootTest
@ActiveProfiles({"test", "demo"})
class PostgresInspectionIntegrationTests {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }

  @Autowired JdbcClient jdbc;

  @ParameterizedTest
  @ValueSource(strings = {"inspection", "inspection_result", "inspection_observation"})
  void updateIsRefusedByTheDatabase(String table) {
    long id = anyRow(table);
    assertThatThrownBy(
            () -> jdbc.sql("UPDATE " + table + " SET id = id WHERE id = ?").param(id).update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
  }

  @ParameterizedTest
  @ValueSource(strings = {"inspection_observation", "inspection_result", "inspection"})
  void deleteIsRefusedByTheDatabase(String table) {
    long id = anyRow(table);
    assertThatThrownBy(() -> jdbc.sql("DELETE FROM " + table + " WHERE id = ?").param(id).update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM " + table + " WHERE id = ?")
                .param(id)
                .query(Long.class)
                .single())
        .as("row still there")
        .isEqualTo(1L);
  }

  @ParameterizedTest
  @ValueSource(strings = {"inspection_observation", "inspection_result", "inspection"})
  void truncateIsRefusedByTheDatabase(String table) {
    anyRow(table);
    assertThatThrownBy(() -> jdbc.sql("TRUNCATE " + table + " CASCADE").update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
  }

  private long anyRow(String table) {
    return jdbc.sql("SELECT MIN(id) FROM " + table).query(Long.class).single();
  }
}
