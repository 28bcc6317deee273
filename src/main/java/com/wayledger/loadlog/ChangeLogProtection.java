package com.wayledger.loadlog;

import com.wayledger.system.VersionedJavaMigration;
import java.sql.Connection;
import java.sql.Statement;
import java.util.List;
import org.flywaydb.core.api.migration.Context;
import org.springframework.stereotype.Component;

/**
 * Migration 4.1: on PostgreSQL the database itself refuses UPDATE, DELETE and TRUNCATE of
 * change_log rows, with a trigger that raises an exception, whoever is connected (the table owner
 * included). H2 cannot read the PL/pgSQL it needs, so on H2 this migration records itself and does
 * nothing: there the guarantee is the application's (no code path updates or deletes a row). A Java
 * migration rather than per-vendor SQL folders so that db/ keeps one script per version for both
 * databases. Spring Boot hands JavaMigration beans to Flyway.
 */
@Component
class ChangeLogProtection extends VersionedJavaMigration {

  ChangeLogProtection() {
    super("4.1", "protect change log");
  }

  static final List<String> POSTGRESQL =
      List.of(
          """
          CREATE OR REPLACE FUNCTION change_log_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
          BEGIN
            RAISE EXCEPTION 'change_log is append-only: % refused', TG_OP USING ERRCODE = 'insufficient_privilege';
          END
          $$""",
          "CREATE TRIGGER change_log_no_update_or_delete BEFORE UPDATE OR DELETE ON change_log"
              + " FOR EACH ROW EXECUTE FUNCTION change_log_refuse_change()",
          "CREATE TRIGGER change_log_no_truncate BEFORE TRUNCATE ON change_log"
              + " FOR EACH STATEMENT EXECUTE FUNCTION change_log_refuse_change()");

  @Override
  public Integer getChecksum() {
    return String.join(";", POSTGRESQL).hashCode();
  }

  @Override
  public void migrate(Context context) throws Exception {
    Connection connection = context.getConnection();
    if (!onPostgres(connection)) {
      return;
    }
    try (Statement statement = connection.createStatement()) {
      execute(statement, POSTGRESQL);
    }
  }
}
