package com.wayledger.hardening;

import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * The hostile-input contract on a real PostgreSQL server, which unlike H2 cannot store U+0000 at
 * all (see {@link PostgresDatabase} for which server).
 */
@EnabledWithPostgres
class PostgresHostileInputIntegrationTests extends HostileInputContract {

  @DynamicPropertySource
  static void postgres(DynamicPropertyRegistry registry) {
    PostgresDatabase.Connection database = PostgresDatabase.require();
    registry.add("spring.datasource.url", database::url);
    registry.add("spring.datasource.username", database::username);
    registry.add("spring.datasource.password", database::password);
  }
}
