package com.wayledger.board;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * {@link ConcurrentSavesContract} on a real PostgreSQL server (see {@link PostgresDatabase}); skips
 * without one, fails in CI.
 */
@EnabledWithPostgres
class PostgresConcurrentSavesIntegrationTests extends ConcurrentSavesContract {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }
}
