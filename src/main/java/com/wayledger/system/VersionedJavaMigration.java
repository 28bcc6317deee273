package com.wayledger.system;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Locale;
import org.flywaydb.core.api.MigrationVersion;
import org.flywaydb.core.api.migration.JavaMigration;

/**
 * What every Java migration of ours shares: its version and description, one transaction, and the
 * test for PostgreSQL (several migrations add to H2 only what H2 can read, and the triggers on
 * PostgreSQL). Each migration keeps its own checksum, so that a stored history still matches.
 */
public abstract class VersionedJavaMigration implements JavaMigration {

  private final MigrationVersion version;
  private final String description;

  protected VersionedJavaMigration(String version, String description) {
    this.version = MigrationVersion.fromVersion(version);
    this.description = description;
  }

  @Override
  public final MigrationVersion getVersion() {
    return version;
  }

  @Override
  public final String getDescription() {
    return description;
  }

  @Override
  public final boolean canExecuteInTransaction() {
    return true;
  }

  /** Whether the connection is to PostgreSQL (else H2, the only other database we run on). */
  protected static boolean onPostgres(Connection connection) throws SQLException {
    return connection
        .getMetaData()
        .getDatabaseProductName()
        .toLowerCase(Locale.ROOT)
        .contains("postgresql");
  }

  /** Runs the statements in order on one statement object. */
  protected static void execute(Statement statement, List<String> sqls) throws SQLException {
    for (String sql : sqls) {
      statement.execute(sql);
    }
  }
}
