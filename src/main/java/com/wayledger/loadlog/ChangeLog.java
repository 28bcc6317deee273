package com.wayledger.loadlog;

import com.wayledger.system.ChangeKind;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/** Reads the change log. There is deliberately no method that changes or removes an entry. */
@Service
public class ChangeLog {

  /** Most entries one page or API answer shows. */
  static final int PAGE_LIMIT = 500;

  private final JdbcClient jdbc;

  public ChangeLog(JdbcClient jdbc) {
    this.jdbc = jdbc;
  }

  /** Entries of a site matching the filter, newest first, at most {@link #PAGE_LIMIT}. */
  @Transactional(readOnly = true)
  public List<ChangeLogEntry> ofSite(long siteId, LogFilter filter) {
    StringBuilder sql = new StringBuilder("SELECT * FROM change_log WHERE site_id = ?");
    List<Object> params = new ArrayList<>(List.of(siteId));
    if (filter.boardId() != null) {
      sql.append(" AND board_id = ?");
      params.add(filter.boardId());
    }
    if (filter.username() != null && !filter.username().isBlank()) {
      sql.append(" AND username = ?");
      params.add(filter.username().strip());
    }
    if (filter.from() != null) {
      sql.append(" AND happened_at >= ?");
      params.add(Timestamp.from(filter.from().atStartOfDay(ZoneOffset.UTC).toInstant()));
    }
    if (filter.to() != null) {
      sql.append(" AND happened_at < ?");
      params.add(Timestamp.from(filter.to().plusDays(1).atStartOfDay(ZoneOffset.UTC).toInstant()));
    }
    if (filter.kind() != null) {
      sql.append(" AND kind = ?");
      params.add(filter.kind().name());
    }
    sql.append(" ORDER BY id DESC LIMIT ").append(PAGE_LIMIT);
    return jdbc.sql(sql.toString()).params(params).query(ChangeLog::entry).list();
  }

  /** Every entry about a board, oldest first: the input of the history replay. */
  @Transactional(readOnly = true)
  public List<ChangeLogEntry> boardHistory(long boardId) {
    return jdbc.sql("SELECT * FROM change_log WHERE board_id = ? ORDER BY id")
        .param(boardId)
        .query(ChangeLog::entry)
        .list();
  }

  /**
   * The board's position in the log: the id of the newest entry about it (its own changes and its
   * circuits' and loads'), or 0 when there is none. A printed door chart carries it, so a later
   * reader can tell what changed since.
   */
  @Transactional(readOnly = true)
  public long latestPosition(long boardId) {
    Long newest =
        jdbc.sql("SELECT MAX(id) FROM change_log WHERE board_id = ?")
            .param(boardId)
            .query(Long.class)
            .optional()
            .orElse(null);
    return newest == null ? 0L : newest;
  }

  /** Entries about a board after a log position, oldest first, at most {@link #PAGE_LIMIT}. */
  @Transactional(readOnly = true)
  public List<ChangeLogEntry> boardHistorySince(long boardId, long position) {
    return jdbc.sql(
            "SELECT * FROM change_log WHERE board_id = ? AND id > ? ORDER BY id LIMIT "
                + PAGE_LIMIT)
        .params(boardId, position)
        .query(ChangeLog::entry)
        .list();
  }

  /** One entry by its id. */
  @Transactional(readOnly = true)
  public java.util.Optional<ChangeLogEntry> find(long id) {
    return jdbc.sql("SELECT * FROM change_log WHERE id = ?")
        .param(id)
        .query(ChangeLog::entry)
        .optional();
  }

  /** The users who appear in a site's log, for the filter's choices. */
  @Transactional(readOnly = true)
  public List<String> usersOf(long siteId) {
    return jdbc.sql("SELECT DISTINCT username FROM change_log WHERE site_id = ? ORDER BY username")
        .param(siteId)
        .query(String.class)
        .list();
  }

  /**
   * Walks the site's chain in order and recomputes every hash: the first entry that is missing, out
   * of place, pointing at the wrong predecessor or no longer matching its hash is reported.
   */
  @Transactional(readOnly = true)
  public LogVerification verify(long siteId) {
    long[] checked = {0};
    String[] previousHash = {null};
    long[] expectedSeq = {1};
    LogVerification[] broken = {null};
    jdbc.sql("SELECT * FROM change_log WHERE site_id = ? ORDER BY site_seq NULLS FIRST, id")
        .param(siteId)
        .query(
            (ResultSet rs) -> {
              if (broken[0] != null) {
                return;
              }
              checked[0]++;
              long id = rs.getLong("id");
              Long seq = rs.getObject("site_seq", Long.class);
              String hash = rs.getString("entry_hash");
              LogVerification.Problem problem = null;
              if (seq == null || hash == null) {
                problem = LogVerification.Problem.UNCHAINED;
              } else if (seq != expectedSeq[0]) {
                problem = LogVerification.Problem.GAP;
              } else if (!java.util.Objects.equals(
                  previousHash[0], rs.getString("previous_hash"))) {
                problem = LogVerification.Problem.LINK;
              } else if (!hash.equals(fieldsOf(rs, seq).hash())) {
                problem = LogVerification.Problem.ALTERED;
              }
              if (problem != null) {
                broken[0] = new LogVerification(siteId, checked[0], false, id, seq, problem, null);
                return;
              }
              previousHash[0] = hash;
              expectedSeq[0]++;
            });
    return broken[0] != null
        ? broken[0]
        : new LogVerification(siteId, checked[0], true, null, null, null, previousHash[0]);
  }

  private static LogChain.Fields fieldsOf(ResultSet rs, long seq) throws SQLException {
    return new LogChain.Fields(
        seq,
        rs.getLong("site_id"),
        rs.getObject("board_id", Long.class),
        rs.getObject("circuit_id", Long.class),
        rs.getTimestamp("happened_at").toInstant(),
        rs.getString("username"),
        rs.getString("db_user"),
        rs.getString("kind"),
        rs.getString("summary"),
        rs.getString("before_snapshot"),
        rs.getString("after_snapshot"),
        rs.getString("reason"),
        rs.getString("previous_hash"),
        effectiveOn(rs));
  }

  private static ChangeLogEntry entry(ResultSet rs, int row) throws SQLException {
    return new ChangeLogEntry(
        rs.getLong("id"),
        rs.getLong("site_id"),
        (Long) rs.getObject("board_id", Long.class),
        (Long) rs.getObject("circuit_id", Long.class),
        rs.getTimestamp("happened_at").toInstant(),
        rs.getString("username"),
        ChangeKind.valueOf(rs.getString("kind")),
        rs.getString("summary"),
        rs.getString("before_snapshot"),
        rs.getString("after_snapshot"),
        rs.getString("reason"),
        effectiveOn(rs));
  }

  private static java.time.LocalDate effectiveOn(ResultSet rs) throws SQLException {
    java.sql.Date day = rs.getDate("effective_on");
    return day == null ? null : day.toLocalDate();
  }
}
