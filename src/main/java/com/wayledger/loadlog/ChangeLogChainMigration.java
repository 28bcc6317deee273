package com.wayledger.loadlog;

import com.wayledger.system.VersionedJavaMigration;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.flywaydb.core.api.migration.Context;
import org.springframework.stereotype.Component;

/**
 * Migration 8.1: chains the entries written before (site_seq, previous_hash, entry_hash, see {@link
 * LogChain}), then makes a place in a site's chain unique. On PostgreSQL it also installs the
 * trigger that stamps every new entry whatever the client sent: the time (the database's clock),
 * the database role, the user name (the transaction's {@code wayledger.username} setting, else the
 * role), the place in the chain and both hashes, under a per-site lock so that concurrent entries
 * of one site form one line. The functions and the trigger belong to the role that runs the
 * migrations; the application's role cannot replace, disable or drop them (see docs/security.md).
 */
@Component
class ChangeLogChainMigration extends VersionedJavaMigration {

  ChangeLogChainMigration() {
    super("8.1", "chain change log");
  }

  static final List<String> POSTGRESQL =
      List.of(
          """
          CREATE OR REPLACE FUNCTION change_log_field(v text) RETURNS text
            LANGUAGE sql IMMUTABLE SET search_path = pg_catalog AS
          $$ SELECT CASE WHEN v IS NULL THEN '~'
                    ELSE octet_length(convert_to(v, 'UTF8'))::text || ':' || v END $$""",
          """
          CREATE OR REPLACE FUNCTION change_log_chain() RETURNS trigger
            LANGUAGE plpgsql SET search_path FROM CURRENT AS $$
          DECLARE
            prev_seq bigint;
            prev_hash varchar(64);
          BEGIN
            PERFORM pg_advisory_xact_lock(1467, (NEW.site_id % 2147483647)::int);
            NEW.happened_at := clock_timestamp();
            NEW.db_user := session_user;
            NEW.username := left(coalesce(nullif(current_setting('wayledger.username', true), ''),
                                          session_user::text), 60);
            SELECT site_seq, entry_hash INTO prev_seq, prev_hash FROM change_log
              WHERE site_id = NEW.site_id ORDER BY site_seq DESC NULLS LAST LIMIT 1;
            NEW.site_seq := coalesce(prev_seq, 0) + 1;
            NEW.previous_hash := prev_hash;
            NEW.entry_hash := encode(sha256(convert_to(concat_ws('|',
                change_log_field(NEW.site_seq::text), change_log_field(NEW.site_id::text),
                change_log_field(NEW.board_id::text), change_log_field(NEW.circuit_id::text),
                change_log_field(to_char(NEW.happened_at AT TIME ZONE 'UTC',
                                         'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')),
                change_log_field(NEW.username), change_log_field(NEW.db_user),
                change_log_field(NEW.kind), change_log_field(NEW.summary),
                change_log_field(NEW.before_snapshot), change_log_field(NEW.after_snapshot),
                change_log_field(NEW.reason), change_log_field(NEW.previous_hash)), 'UTF8')), 'hex');
            RETURN NEW;
          END
          $$""",
          "CREATE TRIGGER change_log_chain BEFORE INSERT ON change_log"
              + " FOR EACH ROW EXECUTE FUNCTION change_log_chain()");

  @Override
  public Integer getChecksum() {
    return String.join(";", POSTGRESQL).hashCode();
  }

  @Override
  public void migrate(Context context) throws Exception {
    Connection connection = context.getConnection();
    boolean postgres = onPostgres(connection);
    try (Statement statement = connection.createStatement()) {
      if (postgres) {
        // Migration 4.1's guard refuses UPDATE; the owner lifts it for this one backfill only.
        statement.execute("ALTER TABLE change_log DISABLE TRIGGER change_log_no_update_or_delete");
      }
      chainExisting(connection);
      if (postgres) {
        statement.execute("ALTER TABLE change_log ENABLE TRIGGER change_log_no_update_or_delete");
      }
      statement.execute(
          "CREATE UNIQUE INDEX change_log_chain_idx ON change_log (site_id, site_seq)");
      if (postgres) {
        execute(statement, POSTGRESQL);
      }
    }
  }

  private static void chainExisting(Connection connection) throws Exception {
    Map<Long, Long> lastSeq = new HashMap<>();
    Map<Long, String> lastHash = new HashMap<>();
    try (Statement read = connection.createStatement();
        ResultSet rs =
            read.executeQuery(
                "SELECT id, site_id, board_id, circuit_id, happened_at, username, kind, summary,"
                    + " before_snapshot, after_snapshot, reason FROM change_log ORDER BY site_id, id");
        PreparedStatement write =
            connection.prepareStatement(
                "UPDATE change_log SET site_seq = ?, previous_hash = ?, entry_hash = ? WHERE id = ?")) {
      while (rs.next()) {
        long siteId = rs.getLong("site_id");
        long seq = lastSeq.getOrDefault(siteId, 0L) + 1;
        String previous = lastHash.get(siteId);
        LogChain.Fields fields =
            new LogChain.Fields(
                seq,
                siteId,
                rs.getObject("board_id", Long.class),
                rs.getObject("circuit_id", Long.class),
                rs.getTimestamp("happened_at").toInstant(),
                rs.getString("username"),
                null,
                rs.getString("kind"),
                rs.getString("summary"),
                rs.getString("before_snapshot"),
                rs.getString("after_snapshot"),
                rs.getString("reason"),
                previous);
        String hash = fields.hash();
        write.setLong(1, seq);
        write.setString(2, previous);
        write.setString(3, hash);
        write.setLong(4, rs.getLong("id"));
        write.executeUpdate();
        lastSeq.put(siteId, seq);
        lastHash.put(siteId, hash);
      }
    }
  }
}
