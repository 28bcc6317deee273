package com.wayledger.loadlog;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import java.time.LocalDate;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * {@link BackDatedLogChecks} on PostgreSQL, where the chain trigger (migration 15) stamps the
 * entry, hashes the effective day with it and refuses a day after the day of recording. Skips
 * without a PostgreSQL database; fails in CI (CI=true).
 */
@EnabledWithPostgres
@SpringBootTest
@ActiveProfiles("test")
class PostgresBackDatedLogIntegrationTests extends BackDatedLogChecks {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }

  @org.junit.jupiter.api.Test
  void databaseRefusesAnEffectiveDayAfterTheDayOfRecordingWhateverTheClientSends() {
    long siteId = sites.create(LogFixtures.site()).getId();
    org.assertj.core.api.Assertions.assertThatThrownBy(
            () ->
                jdbc.sql(
                        "INSERT INTO change_log (site_id, username, kind, summary, effective_on)"
                            + " VALUES (?, 'someone', 'SITE_EDITED', 'forward-dated', ?)")
                    .params(
                        siteId,
                        java.sql.Date.valueOf(LocalDate.now(java.time.ZoneOffset.UTC).plusDays(5)))
                    .update())
        .isInstanceOf(org.springframework.dao.DataAccessException.class)
        .rootCause()
        .hasMessageContaining("after the day of recording");
  }

  @Override
  void rewriteEffectiveDay(long siteId, LocalDate day) {
    // as the owner, with the append-only guard lifted for this one statement (as an attacker with
    // the owner's rights could)
    jdbc.sql("ALTER TABLE change_log DISABLE TRIGGER change_log_no_update_or_delete").update();
    try {
      jdbc.sql("UPDATE change_log SET effective_on = ? WHERE site_id = ?")
          .params(java.sql.Date.valueOf(day), siteId)
          .update();
    } finally {
      jdbc.sql("ALTER TABLE change_log ENABLE TRIGGER change_log_no_update_or_delete").update();
    }
  }
}
