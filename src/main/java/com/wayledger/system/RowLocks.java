package com.wayledger.system;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.Locale;
import java.util.Set;
import javax.sql.DataSource;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;

/**
 * Row locks taken at the start of a change, before its entity is read, so that what the change
 * checks (a board's phase count, a position being free, the version the user saw) cannot move under
 * it. A shared lock on a parent (the board of a circuit, the site of a board) lets edits of
 * different children run side by side while an edit of the parent waits for them, and the other way
 * round; an exclusive lock on the record itself makes a second save of it wait and then see the
 * first one's version, so it becomes a conflict and never a silent overwrite. No lock moves a
 * version. PostgreSQL takes {@code FOR SHARE}; H2 has only {@code FOR UPDATE}, so there children of
 * one parent take turns instead of running side by side.
 */
@Component
public class RowLocks {

  private static final Set<String> TABLES =
      Set.of("site", "board", "circuit", "load_item", "diversity_method");

  private final JdbcClient jdbc;
  private final boolean sharedLocks;

  public RowLocks(JdbcClient jdbc, DataSource dataSource) {
    this.jdbc = jdbc;
    this.sharedLocks = isPostgres(dataSource);
  }

  /** Locks the row against changes by others until this transaction ends; false when absent. */
  public boolean shared(String table, Object id) {
    return lock(table, id, sharedLocks ? " FOR SHARE" : " FOR UPDATE");
  }

  /**
   * Locks the row for this transaction's change; false when absent. On PostgreSQL {@code FOR NO KEY
   * UPDATE}: the row's key does not change, so rows that merely refer to it (a change-log entry
   * naming the site) can still be inserted meanwhile, which keeps the change log's per-site lock
   * from ever waiting in a circle with this one.
   */
  public boolean exclusive(String table, Object id) {
    return lock(table, id, sharedLocks ? " FOR NO KEY UPDATE" : " FOR UPDATE");
  }

  private boolean lock(String table, Object id, String clause) {
    if (!TABLES.contains(table)) {
      throw new IllegalArgumentException("no row locks on " + table);
    }
    String key = table.equals("diversity_method") ? "method_key" : "id";
    return !jdbc.sql("SELECT 1 FROM " + table + " WHERE " + key + " = ?" + clause)
        .param(id)
        .query(Integer.class)
        .list()
        .isEmpty();
  }

  static boolean isPostgres(DataSource dataSource) {
    try (Connection connection = dataSource.getConnection()) {
      return connection
          .getMetaData()
          .getDatabaseProductName()
          .toLowerCase(Locale.ROOT)
          .contains("postgresql");
    } catch (SQLException unreadable) {
      return false;
    }
  }
}
