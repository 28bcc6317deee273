package com.wayledger.system;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
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
 * log and nothing on Flyway's history. The application's role owns nothing, so it cannot alter,
 * disable or drop a table, trigger or function. Repeated at every start, so tables added by later
 * migrations are covered. With one role for both (H2, or a PostgreSQL set up with one user) there
 * is nothing to grant.
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
      for (String sql :
          List.of(
              "GRANT USAGE ON SCHEMA " + schema + " TO " + role,
              "GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA "
                  + schema
                  + " TO "
                  + role,
              "GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA " + schema + " TO " + role,
              "REVOKE ALL ON TABLE " + schema + ".change_log FROM " + role,
              "GRANT SELECT, INSERT ON TABLE " + schema + ".change_log TO " + role,
              "REVOKE ALL ON TABLE " + schema + "." + history + " FROM " + role)) {
        try (Statement statement = connection.createStatement()) {
          statement.execute(sql);
        }
      }
    } catch (java.sql.SQLException e) {
      throw new IllegalStateException("Could not grant the application's role its rights", e);
    }
  }

  @Override
  public String getCallbackName() {
    return "application role grants";
  }

  private static String quoted(String identifier) {
    return "\"" + identifier.replace("\"", "\"\"") + "\"";
  }
}
