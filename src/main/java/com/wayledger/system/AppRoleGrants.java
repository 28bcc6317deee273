package com.wayledger.system;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.flywaydb.core.api.callback.Callback;
import org.flywaydb.core.api.callback.Context;
import org.flywaydb.core.api.callback.Event;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;

/**
 * After every migration run on PostgreSQL, when the migrations run as a role other than the
 * application's (Flyway's own {@code spring.flyway.user}), gives the application's role exactly
 * what it needs: read and write on the schedule's tables, but only SELECT and INSERT on the change
 * log and on every other append-only table, and nothing on Flyway's history. The application's role
 * owns nothing, so it cannot alter, disable or drop a table, trigger or function. Repeated at every
 * start, so tables added by later migrations are covered. With one role for both (H2, or a
 * PostgreSQL set up with one user) there is nothing to grant.
 */
@Component
class AppRoleGrants implements Callback {

  private final String appRole;

  AppRoleGrants(@Value("${spring.datasource.username:}") String appRole) {
    this.appRole = appRole;
  }

  @Override
  public boolean supports(Event event, Context context) {
    return event == Event.AFTER_MIGRATE;
  }

  @Override
  public boolean canHandleInTransaction(Event event, Context context) {
    return true;
  }

  @Override
  public void handle(Event event, Context context) {
    try {
      Connection connection = context.getConnection();
      String product = connection.getMetaData().getDatabaseProductName();
      String owner = connection.getMetaData().getUserName();
      if (!product.toLowerCase(Locale.ROOT).contains("postgresql")
          || appRole.isBlank()
          || appRole.equals(owner)) {
        return;
      }
      try (PreparedStatement exists =
          connection.prepareStatement("SELECT 1 FROM pg_roles WHERE rolname = ?")) {
        exists.setString(1, appRole);
        try (ResultSet rs = exists.executeQuery()) {
          if (!rs.next()) {
            throw new IllegalStateException(
                "The application's database role " + appRole + " does not exist");
          }
        }
      }
      String role = quoted(appRole);
      String schema;
      try (Statement statement = connection.createStatement();
          ResultSet rs = statement.executeQuery("SELECT current_schema()")) {
        rs.next();
        schema = quoted(rs.getString(1));
      }
      String history = quoted(context.getConfiguration().getTable());
      List<String> sqls =
          new ArrayList<>(
              List.of(
                  "GRANT USAGE ON SCHEMA " + schema + " TO " + role,
                  "GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA "
                      + schema
                      + " TO "
                      + role,
                  "GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA " + schema + " TO " + role,
                  "REVOKE ALL ON TABLE " + schema + "." + history + " FROM " + role));
      for (String table : appendOnlyTables(connection)) {
        sqls.add("REVOKE ALL ON TABLE " + schema + "." + quoted(table) + " FROM " + role);
        sqls.add("GRANT SELECT, INSERT ON TABLE " + schema + "." + quoted(table) + " TO " + role);
      }
      for (String sql : sqls) {
        try (Statement statement = connection.createStatement()) {
          statement.execute(sql);
        }
      }
    } catch (SQLException e) {
      throw new IllegalStateException("Could not grant the application's role its rights", e);
    }
  }

  /**
   * The change log and every table guarded like it (a trigger named {@code
   * <table>_no_update_or_delete}, as the inspection records have): read and append only.
   */
  private static List<String> appendOnlyTables(Connection connection) throws SQLException {
    List<String> tables = new ArrayList<>(List.of("change_log"));
    try (Statement statement = connection.createStatement();
        ResultSet rs =
            statement.executeQuery(
                "SELECT DISTINCT c.relname FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid"
                    + " JOIN pg_namespace n ON n.oid = c.relnamespace"
                    + " WHERE n.nspname = current_schema()"
                    + " AND t.tgname = c.relname || '_no_update_or_delete'")) {
      while (rs.next()) {
        if (!tables.contains(rs.getString(1))) {
          tables.add(rs.getString(1));
        }
      }
    }
    return tables;
  }

  @Override
  public String getCallbackName() {
    return "application role grants";
  }

  private static String quoted(String identifier) {
    return "\"" + identifier.replace("\"", "\"\"") + "\"";
  }
}
