package com.wayledger.exchange;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * {@link RoundTripImportChecks} on PostgreSQL, where the change log is stamped and chained by the
 * database's trigger. Skips without a PostgreSQL database; fails in CI (CI=true).
 */
@EnabledWithPostgres
@SpringBootTest
@AutoConfigureMockMvc
@ActiveProfiles("test")
class PostgresRoundTripImportIntegrationTests extends RoundTripImportChecks {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }
}
