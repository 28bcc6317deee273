package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
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
 * On PostgreSQL the database itself refuses to change or remove change-log rows, even for the
 * connection that owns the table (migration 4.1). Skips without a PostgreSQL database; fails in CI
 * (CI=true).
 */
@EnabledWithPostgres
@SpringBootTest
@ActiveProfiles("test")
class PostgresChangeLogIntegrationTests {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }

  @Autowired SiteService sites;
  @Autowired JdbcClient jdbc;

  @Test
  void updateOfALogRowIsRefusedByTheDatabase() {
    long id = loggedEntry();
    assertThatThrownBy(
            () ->
                jdbc.sql("UPDATE change_log SET summary = 'rewritten' WHERE id = ?")
                    .param(id)
                    .update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
    assertThat(summaryOf(id)).as("row unchanged").doesNotContain("rewritten");
  }

  @Test
  void deleteOfALogRowIsRefusedByTheDatabase() {
    long id = loggedEntry();
    assertThatThrownBy(() -> jdbc.sql("DELETE FROM change_log WHERE id = ?").param(id).update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
    assertThat(
            jdbc.sql("SELECT COUNT(*) FROM change_log WHERE id = ?")
                .param(id)
                .query(Long.class)
                .single())
        .as("row still there")
        .isEqualTo(1L);
  }

  @Test
  void truncateOfTheLogIsRefusedByTheDatabase() {
    loggedEntry();
    assertThatThrownBy(() -> jdbc.sql("TRUNCATE change_log").update())
        .isInstanceOf(DataAccessException.class)
        .rootCause()
        .hasMessageContaining("append-only");
  }

  @Test
  void newEntriesCanStillBeAppended() {
    long before = jdbc.sql("SELECT COUNT(*) FROM change_log").query(Long.class).single();
    loggedEntry();
    assertThat(jdbc.sql("SELECT COUNT(*) FROM change_log").query(Long.class).single())
        .isEqualTo(before + 1);
  }

  private long loggedEntry() {
    Site site = sites.create(LogFixtures.site());
    return jdbc.sql("SELECT id FROM change_log WHERE site_id = ? AND kind = 'SITE_ADDED'")
        .param(site.getId())
        .query(Long.class)
        .single();
  }

  private String summaryOf(long id) {
    return jdbc.sql("SELECT summary FROM change_log WHERE id = ?")
        .param(id)
        .query(String.class)
        .single();
  }
}
