package com.wayledger.inspection;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * The results import on PostgreSQL: the same workbook, the same grading, the same all-or-nothing
 * refusal. Skips without a PostgreSQL database; fails in CI (CI=true).
 */
@EnabledWithPostgres
class PostgresResultImportIntegrationTests extends ResultImportIntegrationTests {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }
}
