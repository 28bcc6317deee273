package com.wayledger.support;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import org.testcontainers.DockerClientFactory;
import org.testcontainers.postgresql.PostgreSQLContainer;

/**
 * The PostgreSQL database the tests use, found in this order: the one named by
 * WAYLEDGER_TEST_POSTGRES_URL (set by .ci/run to a fresh database on the local server; user and
 * password from WAYLEDGER_TEST_POSTGRES_USER / _PASSWORD, default postgres/none), else a
 * Testcontainers PostgreSQL when a Docker engine answers, else none.
 */
public final class PostgresDatabase {

  public static final String URL_VARIABLE = "WAYLEDGER_TEST_POSTGRES_URL";

  /** Connection details of a reachable database. */
  public record Connection(String url, String username, String password) {}

  private static Connection found;
  private static String whyNot;
  private static PostgreSQLContainer container;

  private PostgresDatabase() {}

  /** The database to use, or null with {@link #whyMissing()} saying why. */
  public static synchronized Connection find() {
    if (found != null || whyNot != null) {
      return found;
    }
    String url = System.getenv(URL_VARIABLE);
    if (url != null && !url.isBlank()) {
      Connection candidate =
          new Connection(
              url,
              envOr("WAYLEDGER_TEST_POSTGRES_USER", "postgres"),
              envOr("WAYLEDGER_TEST_POSTGRES_PASSWORD", ""));
      String problem = reach(candidate);
      if (problem == null) {
        found = candidate;
      } else {
        whyNot = URL_VARIABLE + " is set but " + url + " cannot be reached: " + problem;
      }
      return found;
    }
    if (dockerAvailable()) {
      container = new PostgreSQLContainer("postgres:16-alpine");
      container.start();
      found =
          new Connection(container.getJdbcUrl(), container.getUsername(), container.getPassword());
      return found;
    }
    whyNot =
        "no PostgreSQL for tests: set "
            + URL_VARIABLE
            + " (as .ci/run does) or run a Docker engine";
    return null;
  }

  public static String whyMissing() {
    return whyNot;
  }

  /** The database, or the test skips (fails in CI) with the reason. */
  public static Connection require() {
    Connection connection = find();
    RealParts.require(connection != null, whyMissing());
    return connection;
  }

  private static boolean dockerAvailable() {
    try {
      return DockerClientFactory.instance().isDockerAvailable();
    } catch (RuntimeException | LinkageError noDocker) {
      return false;
    }
  }

  private static String reach(Connection candidate) {
    try (java.sql.Connection ignored =
        DriverManager.getConnection(candidate.url(), candidate.username(), candidate.password())) {
      return null;
    } catch (SQLException e) {
      return e.getMessage();
    }
  }

  private static String envOr(String name, String fallback) {
    String value = System.getenv(name);
    return value == null ? fallback : value;
  }
}
