package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.wayledger.site.Site;
import com.wayledger.site.SiteService;
import com.wayledger.support.EnabledWithPostgres;
import com.wayledger.support.PostgresDatabase;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.Locale;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.ActiveProfiles;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * The change log attacked from the database, on PostgreSQL set up as docs/deployment-postgresql.md
 * says: the migrations run as an owner role, the application connects as a role that owns nothing.
 * The test makes both roles and a database of its own, named after the test database, and removes
 * them afterwards. Each attack the application's role could try is refused by the database; a
 * back-dated insert under another name is stamped with the real time and author; a change made
 * around all of that by a superuser or the owner is found by the chain check, at the right entry.
 */
@EnabledWithPostgres
@SpringBootTest
@ActiveProfiles("test")
@DirtiesContext(classMode = DirtiesContext.ClassMode.AFTER_CLASS)
class PostgresLogGuardIntegrationTests {

  /** SQLSTATE insufficient_privilege: "permission denied", "must be owner of …". */
  private static final String REFUSED = "42501";

  private static Guarded guarded;

  record Guarded(
      PostgresDatabase.Connection admin,
      String url,
      String database,
      String owner,
      String ownerPassword,
      String app,
      String appPassword) {}

  @DynamicPropertySource
  static void ownerAndAppRoles(DynamicPropertyRegistry registry) throws SQLException {
    guarded = create(PostgresDatabase.require());
    registry.add("spring.datasource.url", guarded::url);
    registry.add("spring.datasource.username", guarded::app);
    registry.add("spring.datasource.password", guarded::appPassword);
    registry.add("spring.flyway.user", guarded::owner);
    registry.add("spring.flyway.password", guarded::ownerPassword);
  }

  private static Guarded create(PostgresDatabase.Connection admin) throws SQLException {
    String base = admin.url().replaceAll("^.*/([^/?]+)(\\?.*)?$", "$1").toLowerCase(Locale.ROOT);
    base = base.replaceAll("[^a-z0-9_]", "_");
    String database = base + "_guard";
    Guarded g =
        new Guarded(
            admin,
            admin.url().replaceAll("/([^/?]+)(\\?.*)?$", "/" + database + "$2"),
            database,
            base + "_owner",
            "owner-" + Long.toHexString(System.nanoTime()),
            base + "_app",
            "app-" + Long.toHexString(System.nanoTime()));
    try (Connection c =
            DriverManager.getConnection(admin.url(), admin.username(), admin.password());
        Statement s = c.createStatement()) {
      dropAll(s, g);
      s.execute("CREATE ROLE " + g.owner() + " LOGIN PASSWORD '" + g.ownerPassword() + "'");
      s.execute("CREATE ROLE " + g.app() + " LOGIN PASSWORD '" + g.appPassword() + "'");
      // Needed by a non-superuser test role with CREATEROLE to hand the database to the owner and
      // to end their sessions at the end; a superuser has both anyway.
      s.execute("GRANT " + g.owner() + ", " + g.app() + " TO CURRENT_USER");
      s.execute("CREATE DATABASE " + database + " OWNER " + g.owner());
    }
    try (Connection c = DriverManager.getConnection(g.url(), g.owner(), g.ownerPassword());
        Statement s = c.createStatement()) {
      s.execute("ALTER SCHEMA public OWNER TO " + g.owner());
      s.execute("REVOKE CREATE ON SCHEMA public FROM PUBLIC");
    }
    return g;
  }

  private static void dropAll(Statement s, Guarded g) throws SQLException {
    s.execute("DROP DATABASE IF EXISTS " + g.database() + " WITH (FORCE)");
    s.execute("DROP ROLE IF EXISTS " + g.app());
    s.execute("DROP ROLE IF EXISTS " + g.owner());
  }

  @AfterAll
  static void removeRolesAndDatabase() throws SQLException {
    if (guarded == null) {
      return;
    }
    PostgresDatabase.Connection admin = guarded.admin();
    try (Connection c =
            DriverManager.getConnection(admin.url(), admin.username(), admin.password());
        Statement s = c.createStatement()) {
      dropAll(s, guarded);
    }
  }

  @Autowired SiteService sites;
  @Autowired ChangeLog log;

  // --- the application's role cannot rewrite the log ---

  @ParameterizedTest(name = "refused for the app role: {0}")
  @ValueSource(
      strings = {
        "ALTER TABLE change_log DISABLE TRIGGER change_log_no_update_or_delete",
        "ALTER TABLE change_log DISABLE TRIGGER change_log_chain",
        "ALTER TABLE change_log DISABLE TRIGGER ALL",
        "DROP TRIGGER change_log_no_update_or_delete ON change_log",
        "DROP TRIGGER change_log_chain ON change_log",
        "CREATE OR REPLACE FUNCTION change_log_refuse_change() RETURNS trigger LANGUAGE plpgsql"
            + " AS $$ BEGIN RETURN NEW; END $$",
        "CREATE OR REPLACE FUNCTION change_log_chain() RETURNS trigger LANGUAGE plpgsql"
            + " AS $$ BEGIN RETURN NEW; END $$",
        "DROP FUNCTION change_log_chain() CASCADE",
        "DROP TABLE change_log",
        "ALTER TABLE change_log RENAME TO change_log_old",
        "ALTER TABLE change_log ALTER COLUMN summary DROP NOT NULL",
        "CREATE TABLE change_log_copy (id BIGINT)",
        "UPDATE change_log SET summary = 'rewritten'",
        "DELETE FROM change_log",
        "TRUNCATE change_log"
      })
  void theApplicationsRoleCannot(String attack) throws SQLException {
    Site site = sites.create(LogFixtures.site());
    try (Connection app = appConnection();
        Statement s = app.createStatement()) {
      assertThatThrownBy(() -> s.execute(attack))
          .as(attack)
          .isInstanceOf(SQLException.class)
          .satisfies(e -> assertThat(((SQLException) e).getSQLState()).isEqualTo(REFUSED));
    }
    assertThat(triggersEnabled()).as("both guards still in place").isEqualTo(2);
    assertThat(log.verify(site.getId()).intact()).as("chain intact after: " + attack).isTrue();
  }

  @Test
  void theApplicationsRoleCannotGrantItselfMore() throws SQLException {
    try (Connection app = appConnection();
        Statement s = app.createStatement()) {
      // PostgreSQL answers a grant without the right to grant with a warning, not an error.
      s.execute("GRANT UPDATE, DELETE, TRUNCATE ON change_log TO PUBLIC");
      try (ResultSet rs =
          s.executeQuery(
              "SELECT has_table_privilege(current_user, 'change_log', 'UPDATE')"
                  + " OR has_table_privilege(current_user, 'change_log', 'DELETE')"
                  + " OR has_table_privilege(current_user, 'change_log', 'TRUNCATE')")) {
        rs.next();
        assertThat(rs.getBoolean(1)).as("still only SELECT and INSERT").isFalse();
      }
      assertThatThrownBy(() -> s.execute("UPDATE change_log SET summary = 'x'"))
          .isInstanceOf(SQLException.class);
    }
  }

  @Test
  void everyAppendOnlyTableIsReadAndAppendOnlyForTheApplicationsRole() throws SQLException {
    try (Connection admin = adminConnection();
        PreparedStatement q =
            admin.prepareStatement(
                "SELECT c.relname, has_table_privilege(?, c.oid, 'SELECT'),"
                    + " has_table_privilege(?, c.oid, 'INSERT'),"
                    + " has_table_privilege(?, c.oid, 'UPDATE')"
                    + " OR has_table_privilege(?, c.oid, 'DELETE')"
                    + " OR has_table_privilege(?, c.oid, 'TRUNCATE')"
                    + " FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid"
                    + " WHERE t.tgname = c.relname || '_no_update_or_delete'")) {
      for (int i = 1; i <= 5; i++) {
        q.setString(i, guarded.app());
      }
      int tables = 0;
      try (ResultSet rs = q.executeQuery()) {
        while (rs.next()) {
          tables++;
          assertThat(rs.getBoolean(2) && rs.getBoolean(3))
              .as(rs.getString(1) + " readable")
              .isTrue();
          assertThat(rs.getBoolean(4)).as(rs.getString(1) + " not changeable").isFalse();
        }
      }
      assertThat(tables).as("the change log at least").isPositive();
    }
  }

  @Test
  void theApplicationsRoleOwnsNothing() throws SQLException {
    try (Connection admin = adminConnection();
        PreparedStatement q =
            admin.prepareStatement(
                "SELECT (SELECT count(*) FROM pg_class WHERE relowner = r.oid)"
                    + " + (SELECT count(*) FROM pg_proc WHERE proowner = r.oid)"
                    + " + (SELECT count(*) FROM pg_namespace WHERE nspowner = r.oid)"
                    + " FROM pg_roles r WHERE rolname = ?")) {
      q.setString(1, guarded.app());
      try (ResultSet rs = q.executeQuery()) {
        assertThat(rs.next()).isTrue();
        assertThat(rs.getLong(1)).as("tables, functions, schemas owned by the app role").isZero();
      }
    }
  }

  @Test
  void aBackDatedInsertUnderAnotherNameIsStampedWithTheRealTimeAndAuthor() throws SQLException {
    Site site = sites.create(LogFixtures.site());
    long id;
    try (Connection app = appConnection();
        PreparedStatement insert =
            app.prepareStatement(
                "INSERT INTO change_log (site_id, happened_at, username, db_user, kind, summary,"
                    + " site_seq, previous_hash, entry_hash) VALUES (?, TIMESTAMPTZ '2001-02-03"
                    + " 04:05:06+00', 'chief-inspector', 'postgres', 'SITE_EDITED', 'forged', 1,"
                    + " 'abc', 'def') RETURNING id")) {
      insert.setLong(1, site.getId());
      try (ResultSet rs = insert.executeQuery()) {
        rs.next();
        id = rs.getLong(1);
      }
    }
    ChangeLogEntry entry = log.find(id).orElseThrow();
    assertThat(Duration.between(entry.happenedAt(), Instant.now()).abs())
        .as("the database's clock, not the client's date")
        .isLessThan(Duration.ofMinutes(5));
    assertThat(entry.username()).as("the role that wrote it").isEqualTo(guarded.app());
    LogVerification verification = log.verify(site.getId());
    assertThat(verification.intact()).as("the entry took its real place in the chain").isTrue();
    assertThat(verification.entriesChecked()).as("SITE_ADDED, then the insert").isEqualTo(2);
  }

  // --- what a superuser or the owner changes around the guards is found ---

  @Test
  @WithMockUser("dora")
  void entriesWrittenByTheApplicationCarryTheSignedInUserAndVerify() {
    Site site = sites.create(LogFixtures.site());
    sites.update(site.getId(), LogFixtures.site(), "WO-1 “Küche” ½");
    assertThat(log.ofSite(site.getId(), new LogFilter(null, null, null, null, null)))
        .as("user name from the application, stamped by the database")
        .allSatisfy(e -> assertThat(e.username()).isEqualTo("dora"));
    LogVerification verification = log.verify(site.getId());
    assertThat(verification.intact()).as("hashes made by the trigger check in Java").isTrue();
    assertThat(verification.entriesChecked()).isEqualTo(2);
    assertThat(verification.headHash()).hasSize(64);
  }

  @Test
  void anEntryRewrittenAroundTheGuardsIsReportedWhereItHappened() throws SQLException {
    Site site = sites.create(LogFixtures.site());
    sites.update(site.getId(), LogFixtures.site(), "first");
    sites.update(site.getId(), LogFixtures.site(), "second");
    long middle = entryAt(site.getId(), 2);
    asOwner(
        "ALTER TABLE change_log DISABLE TRIGGER change_log_no_update_or_delete",
        "UPDATE change_log SET reason = 'rewritten' WHERE id = " + middle,
        "ALTER TABLE change_log ENABLE TRIGGER change_log_no_update_or_delete");

    LogVerification verification = log.verify(site.getId());
    assertThat(verification.intact()).isFalse();
    assertThat(verification.brokenAtEntryId()).isEqualTo(middle);
    assertThat(verification.brokenAtSequence()).isEqualTo(2L);
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.ALTERED);
  }

  @Test
  void anEntryRemovedAroundTheGuardsIsReportedAtTheNextOne() throws SQLException {
    Site site = sites.create(LogFixtures.site());
    sites.update(site.getId(), LogFixtures.site(), "first");
    sites.update(site.getId(), LogFixtures.site(), "second");
    long middle = entryAt(site.getId(), 2);
    long last = entryAt(site.getId(), 3);
    asOwner(
        "ALTER TABLE change_log DISABLE TRIGGER change_log_no_update_or_delete",
        "DELETE FROM change_log WHERE id = " + middle,
        "ALTER TABLE change_log ENABLE TRIGGER change_log_no_update_or_delete");

    LogVerification verification = log.verify(site.getId());
    assertThat(verification.brokenAtEntryId()).isEqualTo(last);
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.GAP);
  }

  @Test
  void anEntryInsertedWithTheChainTriggerOffIsReported() throws SQLException {
    Site site = sites.create(LogFixtures.site());
    asOwner(
        "ALTER TABLE change_log DISABLE TRIGGER change_log_chain",
        "INSERT INTO change_log (site_id, username, kind, summary) VALUES ("
            + site.getId()
            + ", 'ghost', 'SITE_EDITED', 'slipped in')",
        "ALTER TABLE change_log ENABLE TRIGGER change_log_chain");

    LogVerification verification = log.verify(site.getId());
    assertThat(verification.intact()).isFalse();
    assertThat(verification.problem()).isEqualTo(LogVerification.Problem.UNCHAINED);
  }

  private long entryAt(long siteId, long seq) {
    return log.ofSite(siteId, new LogFilter(null, null, null, null, null)).stream()
        .filter(e -> e.id() > 0)
        .mapToLong(ChangeLogEntry::id)
        .sorted()
        .skip(seq - 1)
        .findFirst()
        .orElseThrow();
  }

  private int triggersEnabled() throws SQLException {
    try (Connection admin = adminConnection();
        Statement s = admin.createStatement();
        ResultSet rs =
            s.executeQuery(
                "SELECT count(*) FROM pg_trigger WHERE tgrelid = 'change_log'::regclass"
                    + " AND tgname IN ('change_log_no_update_or_delete', 'change_log_chain')"
                    + " AND tgenabled = 'O'")) {
      rs.next();
      return rs.getInt(1);
    }
  }

  private void asOwner(String... statements) throws SQLException {
    try (Connection owner =
            DriverManager.getConnection(guarded.url(), guarded.owner(), guarded.ownerPassword());
        Statement s = owner.createStatement()) {
      for (String sql : statements) {
        s.execute(sql);
      }
    }
  }

  private static Connection appConnection() throws SQLException {
    return DriverManager.getConnection(guarded.url(), guarded.app(), guarded.appPassword());
  }

  private static Connection adminConnection() throws SQLException {
    return DriverManager.getConnection(
        guarded.url(), guarded.admin().username(), guarded.admin().password());
  }
}
