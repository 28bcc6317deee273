package com.wayledger.loadlog;

import com.wayledger.system.VersionedJavaMigration;
import java.sql.Connection;
import java.sql.Statement;
import java.util.List;
import org.flywaydb.core.api.migration.Context;
import org.springframework.stereotype.Component;

/**
 * Migration 15: a change-log entry may carry the day the change took effect on site ({@code
 * effective_on}), beside the time the database stamps ({@code happened_at}), for entries recorded
 * after the fact. The stamp stays the database's own; the effective day joins the entry's hash
 * (only when set, so every entry written before keeps its hash), and on PostgreSQL the chain
 * trigger refuses an effective day later than the day of recording: back-dating, never
 * forward-dating.
 */
@Component
class ChangeLogEffectiveDateMigration extends VersionedJavaMigration {

  ChangeLogEffectiveDateMigration() {
    super("15", "change log effective day");
  }

  static final List<String> POSTGRESQL =
      List.of(
          """
          CREATE OR REPLACE FUNCTION change_log_chain() RETURNS trigger
            LANGUAGE plpgsql SET search_path FROM CURRENT AS $$
          DECLARE
            prev_seq bigint;
            prev_hash varchar(64);
          BEGIN
            PERFORM pg_advisory_xact_lock(1467, (NEW.site_id % 2147483647)::int);
            NEW.happened_at := clock_timestamp();
            IF NEW.effective_on IS NOT NULL
               AND NEW.effective_on > (NEW.happened_at AT TIME ZONE 'UTC')::date THEN
              RAISE EXCEPTION 'change_log: effective day % is after the day of recording',
                NEW.effective_on USING ERRCODE = 'check_violation';
            END IF;
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
                change_log_field(NEW.reason), change_log_field(NEW.previous_hash),
                CASE WHEN NEW.effective_on IS NULL THEN NULL
                     ELSE change_log_field(to_char(NEW.effective_on, 'YYYY-MM-DD')) END),
                'UTF8')), 'hex');
            RETURN NEW;
          END
          $$""");

  @Override
  public Integer getChecksum() {
    return String.join(";", POSTGRESQL).hashCode();
  }

  @Override
  public void migrate(Context context) throws Exception {
    Connection connection = context.getConnection();
    boolean postgres = onPostgres(connection);
    try (Statement statement = connection.createStatement()) {
      statement.execute("ALTER TABLE change_log ADD COLUMN effective_on DATE");
      if (postgres) {
        execute(statement, POSTGRESQL);
      }
    }
  }
}
