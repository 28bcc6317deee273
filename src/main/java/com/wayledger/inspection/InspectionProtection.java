package com.wayledger.inspection;

import com.wayledger.system.VersionedJavaMigration;
import java.sql.Connection;
import java.sql.Statement;
import java.util.List;
import org.flywaydb.core.api.migration.Context;
import org.springframework.stereotype.Component;

/**
 * Migration 11.1: on PostgreSQL the database itself refuses UPDATE, DELETE and TRUNCATE of the
 * inspection tables' rows (as migration 4.1 does for the change log), with triggers that raise an
 * exception, whoever is connected (the table owner included). H2 cannot read the PL/pgSQL it needs,
 * so on H2 this migration records itself and does nothing: there the guarantee is the application's
 * (no code path updates or deletes a row). A Java migration rather than per-vendor SQL folders so
 * that db/ keeps one script per version for both databases. Spring Boot hands JavaMigration beans
 * to Flyway.
 */
@Component
class InspectionProtection extends VersionedJavaMigration {

  InspectionProtection() {
    super("11.1", "protect inspections");
  }

  /** The append-only tables. */
  static final List<String> TABLES =
      List.of("inspection", "inspection_result", "inspection_observation");

  static final List<String> POSTGRESQL = statements();

  private static List<String> statements() {
    List<String> out = new java.util.ArrayList<>();
    out.add(
        """
        CREATE OR REPLACE FUNCTION inspection_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN
          RAISE EXCEPTION '% is append-only: % refused', TG_TABLE_NAME, TG_OP USING ERRCODE = 'insufficient_privilege';
        END
        $$""");
    for (String table : TABLES) {
      out.add(
          "CREATE TRIGGER "
              + table
              + "_no_update_or_delete BEFORE UPDATE OR DELETE ON "
              + table
              + " FOR EACH ROW EXECUTE FUNCTION inspection_refuse_change()");
      out.add(
          "CREATE TRIGGER "
              + table
              + "_no_truncate BEFORE TRUNCATE ON "
              + table
              + " FOR EACH STATEMENT EXECUTE FUNCTION inspection_refuse_change()");
    }
    return List.copyOf(out);
  }

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
